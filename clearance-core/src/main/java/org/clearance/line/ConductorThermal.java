package org.clearance.line;

import java.util.Objects;

/**
 * Electrical and surface data of a conductor type that the steady-state heat balance of IEEE Std
 * 738-2012 needs (clause 4.4.4 resistance, 4.4.2 radiation, 4.4.3 solar heating).
 *
 * <p>The AC resistance is given at the two temperatures conductor tables use, 25 and 75 degC, and
 * interpolated (or extrapolated) linearly in temperature, as IEEE Std 738-2012 equation (10)
 * prescribes.
 *
 * @param resistance25 AC resistance at 25 degC, ohm/m (&gt; 0)
 * @param resistance75 AC resistance at 75 degC, ohm/m (&gt;= resistance25)
 * @param absorptivity solar absorptivity, 0-1 (&gt; 0)
 * @param emissivity emissivity, 0-1 (&gt; 0)
 * @param source where the values come from, with confidence marks
 */
public record ConductorThermal(
    double resistance25, double resistance75, double absorptivity, double emissivity,
    String source) {

  /** Lower of the two table temperatures, degC. */
  public static final double LOW_TEMPERATURE_C = 25;
  /** Higher of the two table temperatures, degC. */
  public static final double HIGH_TEMPERATURE_C = 75;

  public ConductorThermal {
    Objects.requireNonNull(source, "source");
    if (!(Double.isFinite(resistance25) && resistance25 > 0)) {
      throw new IllegalArgumentException("resistance at 25 degC must be positive: " + resistance25);
    }
    if (!(Double.isFinite(resistance75) && resistance75 >= resistance25)) {
      throw new IllegalArgumentException("resistance at 75 degC must be at least that at 25 degC: "
          + resistance75);
    }
    if (!(absorptivity > 0 && absorptivity <= 1)) {
      throw new IllegalArgumentException("absorptivity must be in (0, 1]: " + absorptivity);
    }
    if (!(emissivity > 0 && emissivity <= 1)) {
      throw new IllegalArgumentException("emissivity must be in (0, 1]: " + emissivity);
    }
  }

  /**
   * AC resistance at a conductor temperature, ohm/m: linear through the 25 and 75 degC values
   * (IEEE Std 738-2012 equation (10)).
   *
   * @param temperatureC conductor temperature, degC
   */
  public double resistance(double temperatureC) {
    double slope = (resistance75 - resistance25) / (HIGH_TEMPERATURE_C - LOW_TEMPERATURE_C);
    return resistance25 + slope * (temperatureC - LOW_TEMPERATURE_C);
  }

  /** The same data with other surface properties (for uncertainty by perturbation). */
  public ConductorThermal withSurface(double newAbsorptivity, double newEmissivity) {
    return new ConductorThermal(resistance25, resistance75, newAbsorptivity, newEmissivity,
        source);
  }
}
