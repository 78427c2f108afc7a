package org.clearance.sag;

import java.util.Objects;
import org.clearance.line.ConductorThermal;

/**
 * The steady-state heat balance of a bare overhead conductor by IEEE Std 738-2012 ("Standard for
 * Calculating the Current-Temperature Relationship of Bare Overhead Conductors"), SI form:
 * convective cooling q_c + radiative cooling q_r = solar heating q_s + Joule heating I^2 R(T_c)
 * (equation (1)). Solved here for the conductor temperature T_c at a given current (the survey
 * case), by bisection ({@link SteadyHeatBalance}).
 *
 * <ul>
 *   <li>Forced convection, equations (3a) and (3b), the larger of the two, with the wind direction
 *       factor K_angle = 1.194 - cos(phi) + 0.194 cos(2 phi) + 0.368 sin(2 phi) (4a); natural
 *       convection (5a); the larger of forced and natural is used (clause 4.4.3.1).</li>
 *   <li>Air properties at the film temperature (T_c + T_a) / 2: dynamic viscosity (13a), density
 *       with elevation (14a), thermal conductivity (15a).</li>
 *   <li>Radiation (7a): q_r = 17.8 D epsilon [((T_c + 273) / 100)^4 - ((T_a + 273) / 100)^4].</li>
 *   <li>Solar heating (8): q_s = alpha Q_se sin(theta) D, theta = arccos(cos Hc cos(Zc - Zl)) (9),
 *       Q_s by the clear-atmosphere polynomial of Table 3, corrected for elevation (20).</li>
 *   <li>Resistance linear in temperature through the 25 and 75 degC values (10).</li>
 * </ul>
 * Radial temperature differences in the conductor, magnetic heating of the steel core and
 * heat capacity (transients) are not modelled: the survey state is taken as steady.
 */
public final class HeatBalance implements SteadyHeatBalance {

  /** Clear-atmosphere total heat flux polynomial, W/m^2 in powers of Hc in degrees, IEEE Std
   * 738-2012 Table 3 (coefficients A to G). */
  private static final double[] CLEAR_ATMOSPHERE = {-42.2391, 63.8044, -1.9220, 3.46921e-2,
      -3.61118e-4, 1.94318e-6, -4.07608e-9};

  /**
   * The weather, load and sun at one moment.
   *
   * @param currentA line current per conductor, A (&gt;= 0)
   * @param airTemperatureC air temperature, degC
   * @param windSpeed wind speed, m/s (&gt;= 0)
   * @param windAngleRad angle between the wind direction and the conductor axis, radians, 0 to
   *     pi/2 (pi/2 = wind perpendicular to the conductor)
   * @param elevationM conductor elevation above sea level, m
   * @param sun solar altitude and azimuth
   * @param conductorAzimuthRad azimuth of the conductor axis, radians clockwise from north
   */
  public record Conditions(double currentA, double airTemperatureC, double windSpeed,
      double windAngleRad, double elevationM, SolarPosition sun, double conductorAzimuthRad) {
    public Conditions {
      Objects.requireNonNull(sun, "sun");
      if (!(currentA >= 0 && Double.isFinite(currentA))) {
        throw new IllegalArgumentException("current must be >= 0 A: " + currentA);
      }
      if (!(windSpeed >= 0 && Double.isFinite(windSpeed))) {
        throw new IllegalArgumentException("wind speed must be >= 0 m/s: " + windSpeed);
      }
      if (!(windAngleRad >= 0 && windAngleRad <= Math.PI / 2 + 1e-12)) {
        throw new IllegalArgumentException("wind angle must be 0 to pi/2: " + windAngleRad);
      }
      if (!Double.isFinite(airTemperatureC) || !Double.isFinite(elevationM)
          || !Double.isFinite(conductorAzimuthRad)) {
        throw new IllegalArgumentException("air temperature, elevation and azimuth must be finite");
      }
    }
  }

  private final double diameter;
  private final ConductorThermal thermal;
  private final Conditions at;

  /**
   * @param diameter conductor outside diameter D_0, m (&gt; 0)
   * @param thermal resistance and surface data
   * @param at weather, load and sun
   */
  public HeatBalance(double diameter, ConductorThermal thermal, Conditions at) {
    if (!(Double.isFinite(diameter) && diameter > 0)) {
      throw new IllegalArgumentException("diameter must be positive: " + diameter);
    }
    this.diameter = diameter;
    this.thermal = Objects.requireNonNull(thermal, "thermal");
    this.at = Objects.requireNonNull(at, "at");
  }

  @Override
  public double airTemperatureC() {
    return at.airTemperatureC();
  }

  @Override
  public double currentA() {
    return at.currentA();
  }

  /** AC resistance, linear through the 25 and 75 degC values (IEEE Std 738-2012 (10)), ohm/m. */
  @Override
  public double resistance(double conductorC) {
    return thermal.resistance(conductorC);
  }

  /** Solar heating q_s, W/m (IEEE Std 738-2012 equations (8), (9), (18), (20)); 0 at night. */
  @Override
  public double solarHeating() {
    double hc = at.sun().altitudeRad();
    if (!(hc > 0)) {
      return 0;
    }
    double qse = Math.max(0, elevationFactor(at.elevationM()) * clearSkyFlux(hc));
    double cosTheta = Math.cos(hc) * Math.cos(at.sun().azimuthRad() - at.conductorAzimuthRad());
    double sinTheta = Math.sqrt(Math.max(0, 1 - cosTheta * cosTheta));
    return thermal.absorptivity() * qse * sinTheta * diameter;
  }

  /**
   * Total solar and sky heat flux Q_s of a clear atmosphere, W/m^2 (IEEE Std 738-2012 equation
   * (18) with the clear-atmosphere coefficients of Table 3); may be negative for the sun on the
   * horizon, where the caller clips it.
   *
   * @param altitudeRad solar altitude Hc, radians
   */
  static double clearSkyFlux(double altitudeRad) {
    double hcDeg = Math.toDegrees(altitudeRad);
    double qs = 0;
    double p = 1;
    for (double coefficient : CLEAR_ATMOSPHERE) {
      qs += coefficient * p;
      p *= hcDeg;
    }
    return qs;
  }

  /** Elevation correction K_solar of the solar flux (IEEE Std 738-2012 equation (20)). */
  static double elevationFactor(double elevationM) {
    return 1 + 1.148e-4 * elevationM - 1.108e-8 * elevationM * elevationM;
  }

  /** Convective cooling q_c, W/m: the largest of (3a), (3b) and natural convection (5a). */
  @Override
  public double convectiveCooling(double conductorC) {
    double ta = at.airTemperatureC();
    double dt = conductorC - ta;
    if (!(dt > 0)) {
      return 0;
    }
    double film = 0.5 * (conductorC + ta);
    double he = at.elevationM();
    double viscosity = 1.458e-6 * Math.pow(film + 273, 1.5) / (film + 383.4);
    double density = (1.293 - 1.525e-4 * he + 6.379e-9 * he * he) / (1 + 0.00367 * film);
    double conductivity = 2.424e-2 + 7.477e-5 * film - 4.407e-9 * film * film;
    double reynolds = diameter * density * at.windSpeed() / viscosity;
    double phi = at.windAngleRad();
    double kAngle = 1.194 - Math.cos(phi) + 0.194 * Math.cos(2 * phi)
        + 0.368 * Math.sin(2 * phi);
    double qc1 = kAngle * (1.01 + 1.35 * Math.pow(reynolds, 0.52)) * conductivity * dt;
    double qc2 = kAngle * 0.754 * Math.pow(reynolds, 0.6) * conductivity * dt;
    double natural = 3.645 * Math.sqrt(density) * Math.pow(diameter, 0.75) * Math.pow(dt, 1.25);
    return Math.max(natural, Math.max(qc1, qc2));
  }

  /** Radiative cooling q_r, W/m (IEEE Std 738-2012 equation (7a)); negative below the air. */
  @Override
  public double radiativeCooling(double conductorC) {
    double tc = (conductorC + 273) / 100;
    double ta = (at.airTemperatureC() + 273) / 100;
    return 17.8 * diameter * thermal.emissivity() * (tc * tc * tc * tc - ta * ta * ta * ta);
  }
}
