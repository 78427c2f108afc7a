package org.clearance.sag;

import org.clearance.line.ConductorType;
import org.clearance.line.LineCondition;

/**
 * The load per length on a conductor in one line condition: a vertical part (bare weight plus ice)
 * and a transverse (horizontal, across the span) part from wind.
 *
 * <p>Formulas of docs/methods.md sections 3.6 and 3.7: ice weight
 * w_ice = rho_ice g pi t (D + t); wind load q (D + 2 t) on the iced diameter; resultant
 * sqrt(vertical^2 + transverse^2); swing (blowout) angle from vertical
 * phi = atan(transverse / vertical).
 *
 * @param vertical vertical load per length, N/m (&gt; 0)
 * @param transverse transverse (wind) load per length, N/m (&ge; 0)
 */
public record ConductorLoading(double vertical, double transverse) {

  public ConductorLoading {
    if (!(Double.isFinite(vertical) && vertical > 0)) {
      throw new IllegalArgumentException("vertical load must be positive: " + vertical + " N/m");
    }
    if (!(Double.isFinite(transverse) && transverse >= 0)) {
      throw new IllegalArgumentException("transverse load must be >= 0: " + transverse + " N/m");
    }
  }

  /**
   * The loading of a conductor type in a line condition. Ice (thickness NaN counts as none) adds
   * to the vertical load for every kind; the wind pressure is used only by {@code WIND}
   * conditions. An ice density of NaN means glaze ice, {@link LineCondition#GLAZE_ICE_DENSITY}.
   *
   * @param type conductor data (diameter, weight)
   * @param condition the line condition
   * @throws IllegalArgumentException when a WIND condition has no finite, non-negative pressure,
   *     or the ice values are negative or not finite
   */
  public static ConductorLoading of(ConductorType type, LineCondition condition) {
    double t = iceThickness(condition);
    double density = Double.isNaN(condition.iceDensityKgM3())
        ? LineCondition.GLAZE_ICE_DENSITY : condition.iceDensityKgM3();
    double vertical = type.weightPerLength()
        + (t > 0 ? iceWeight(density, t, type.diameter()) : 0.0);
    double transverse = 0.0;
    if (condition.kind() == LineCondition.Kind.WIND) {
      double q = condition.windPressurePa();
      if (!(Double.isFinite(q) && q >= 0)) {
        throw new IllegalArgumentException("condition '" + condition.name()
            + "' needs a wind pressure (Pa, >= 0): " + q);
      }
      transverse = windLoad(q, type.diameter(), t);
    }
    return new ConductorLoading(vertical, transverse);
  }

  /** Radial ice thickness of a condition, m: NaN counts as no ice. */
  static double iceThickness(LineCondition condition) {
    double t = condition.iceThicknessM();
    if (Double.isNaN(t)) {
      return 0.0;
    }
    if (!(Double.isFinite(t) && t >= 0)) {
      throw new IllegalArgumentException("condition '" + condition.name()
          + "': ice thickness must be finite and >= 0: " + t + " m");
    }
    return t;
  }

  /**
   * Weight per length of a uniform radial ice coat, N/m: rho g pi t (D + t) (methods.md 3.7).
   *
   * @param density ice density, kg/m^3 (&gt; 0; glaze 913)
   * @param thickness radial ice thickness t, m (&ge; 0)
   * @param diameter bare conductor diameter D, m (&gt; 0)
   */
  public static double iceWeight(double density, double thickness, double diameter) {
    requirePositive("ice density", density);
    requireNonNegative("ice thickness", thickness);
    requirePositive("diameter", diameter);
    return density * ConductorType.STANDARD_GRAVITY * Math.PI * thickness * (diameter + thickness);
  }

  /**
   * Transverse wind load per length, N/m: q (D + 2 t), the pressure on the projected area of the
   * (iced) conductor (methods.md 3.6).
   *
   * @param pressure wind pressure on the projected area, Pa (&ge; 0)
   * @param diameter bare conductor diameter D, m (&gt; 0)
   * @param thickness radial ice thickness t, m (&ge; 0)
   */
  public static double windLoad(double pressure, double diameter, double thickness) {
    requireNonNegative("wind pressure", pressure);
    requirePositive("diameter", diameter);
    requireNonNegative("ice thickness", thickness);
    return pressure * (diameter + 2 * thickness);
  }

  /** Resultant load per length, N/m: sqrt(vertical^2 + transverse^2). */
  public double resultant() {
    return Math.hypot(vertical, transverse);
  }

  /** Swing (blowout) angle of the loaded conductor from vertical, radians in [0, pi/2). */
  public double swingAngle() {
    return Math.atan2(transverse, vertical);
  }

  private static void requirePositive(String name, double v) {
    if (!(Double.isFinite(v) && v > 0)) {
      throw new IllegalArgumentException(name + " must be positive and finite: " + v);
    }
  }

  private static void requireNonNegative(String name, double v) {
    if (!(Double.isFinite(v) && v >= 0)) {
      throw new IllegalArgumentException(name + " must be finite and >= 0: " + v);
    }
  }
}
