package org.clearance.examples;

import java.util.Locale;
import java.util.Objects;

/**
 * A lattice tower of the demo line (truth).
 *
 * @param id structure id as written in structures.csv
 * @param sequence order along the line, 1-based
 * @param x easting of the tower centre, m
 * @param y northing of the tower centre, m
 * @param groundZ ground elevation at the centre, m
 * @param type suspension or dead-end
 * @param deflectionRad line deflection at the tower, radians, positive when the line turns left
 *     (0 at tangent and end towers)
 * @param alongX x of the unit plan vector along the line at the tower (bisector of the two spans)
 * @param alongY y of that unit vector
 * @param armHeightM height of the phase cross arm above {@code groundZ}, m
 * @param extensionM body extension over the standard tower, m (0, 3, 6, ...)
 */
public record DemoStructure(
    String id,
    int sequence,
    double x,
    double y,
    double groundZ,
    Type type,
    double deflectionRad,
    double alongX,
    double alongY,
    double armHeightM,
    double extensionM) {

  /** Suspension (tangent) or dead-end (angle, end) structure. */
  public enum Type {
    SUSPENSION,
    DEAD_END;

    /** The name used in structures.csv ({@code suspension}, {@code dead_end}). */
    public String csvName() {
      return name().toLowerCase(Locale.ROOT);
    }
  }

  public DemoStructure {
    Objects.requireNonNull(id, "id");
    Objects.requireNonNull(type, "type");
  }

  /** Unit plan vector across the line, to the left looking forward: x component. */
  public double acrossX() {
    return -alongY;
  }

  /** Unit plan vector across the line, to the left looking forward: y component. */
  public double acrossY() {
    return alongX;
  }

  /** Elevation of the phase cross arm, m. */
  public double armZ() {
    return groundZ + armHeightM;
  }

  /** Elevation of the shield-wire peaks, m. */
  public double peakZ() {
    return armZ() + DemoPosition.PEAK_ABOVE_ARM_M;
  }

  /**
   * Factor on nominal offsets so that attachments keep their perpendicular distance from both
   * spans at an angle tower: 1 / cos(deflection / 2).
   */
  public double offsetScale() {
    return 1.0 / Math.cos(0.5 * deflectionRad);
  }
}
