package org.clearance.sag;

/**
 * Displacement of a point hanging at a distance r below a pivot when the whole swings by an angle
 * phi from vertical about a horizontal axis through the pivot: horizontal r sin phi, rise
 * r (1 - cos phi) (methods.md 3.6). Used for a suspension insulator string (r = string length,
 * pivot = the cross-arm) and for a conductor point hanging a sag f below its chord.
 *
 * @param horizontal horizontal displacement away from the wind, m (&ge; 0)
 * @param rise vertical rise, m (&ge; 0)
 */
public record SwingOffset(double horizontal, double rise) {

  /** No displacement (fixed attachment or no wind). */
  public static final SwingOffset NONE = new SwingOffset(0.0, 0.0);

  public SwingOffset {
    if (!(Double.isFinite(horizontal) && horizontal >= 0)) {
      throw new IllegalArgumentException("horizontal offset must be >= 0: " + horizontal);
    }
    if (!(Double.isFinite(rise) && rise >= 0)) {
      throw new IllegalArgumentException("rise must be >= 0: " + rise);
    }
  }

  /**
   * The offset of a point at distance r below the pivot swung by phi.
   *
   * @param radius distance from pivot to the point, m (&ge; 0)
   * @param angle swing angle from vertical, radians in [0, pi/2]
   * @throws IllegalArgumentException when a value is out of range
   */
  public static SwingOffset of(double radius, double angle) {
    if (!(Double.isFinite(radius) && radius >= 0)) {
      throw new IllegalArgumentException("radius must be finite and >= 0: " + radius);
    }
    if (!(angle >= 0 && angle <= Math.PI / 2)) {
      throw new IllegalArgumentException("swing angle must be in [0, pi/2]: " + angle);
    }
    double half = Math.sin(0.5 * angle);
    // 1 - cos(phi) = 2 sin^2(phi / 2), without cancellation at small angles
    return new SwingOffset(radius * Math.sin(angle), 2 * radius * half * half);
  }
}
