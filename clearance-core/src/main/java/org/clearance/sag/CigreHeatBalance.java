package org.clearance.sag;

import java.util.Objects;
import org.clearance.line.ConductorThermal;

/**
 * The steady-state heat balance of a bare overhead conductor by CIGRE Technical Brochure 601
 * ("Guide for thermal rating calculations of overhead lines", WG B2.43, 2014), section 3, without
 * the corona and magnetic terms and with the conductor temperature uniform across its section:
 * P_c + P_r = P_S + P_J.
 *
 * <ul>
 *   <li>Convection (3.5): P_c = pi lambda_f (T_s - T_a) Nu. Forced: Nu_90 = B Re^n with B, n from
 *       Table 4 by Reynolds number and roughness R_s = d / (2 (D - d)), d the outer strand
 *       diameter; the angle of attack delta corrects it, Nu_delta = Nu_90 (A1 + B1 sin^m delta)
 *       (0.42, 0.68, 1.08 up to 24 deg; 0.42, 0.58, 0.90 above). Natural (Table 5):
 *       Nu_0 = A (Gr Pr)^m, for an inclined stranded conductor times (1 - 1.76e-6 beta^2.5),
 *       beta in degrees. The larger of forced and natural is used; below 0.5 m/s the larger of
 *       Nu_45, 0.55 Nu_90 and the natural value (the brochure's low-wind rule, from memory).</li>
 *   <li>Air at the film temperature T_f = (T_s + T_a) / 2: lambda_f = 2.368e-2 + 7.23e-5 T_f -
 *       2.763e-8 T_f^2, mu_f = 17.239e-6 + 4.635e-8 T_f - 2.03e-11 T_f^2, density as IEEE 738
 *       with the altitude y, nu_f = mu_f / density, Pr = 1005 mu_f / lambda_f.</li>
 *   <li>Radiation (3.4): P_r = pi D sigma_B epsilon [(T_s + 273)^4 - (T_a + 273)^4].</li>
 *   <li>Solar (3.3): P_S = alpha_s I_T D, I_T = I_B (sin eta + (pi/2) F sin H_s) + I_d (1 +
 *       (pi/2) F), direct I_B(0) = N_s 1280 sin H_s / (sin H_s + 0.314) raised with altitude,
 *       I_B = I_B(0) (1 + 1.4e-4 y (1367 / I_B(0) - 1)), diffuse I_d = (430.5 - 0.3288 I_B)
 *       sin H_s, cos eta = cos H_s cos(gamma_s - gamma_c) (a horizontal conductor).</li>
 *   <li>Resistance linear through the 25 and 75 degC values.</li>
 * </ul>
 * The formulas are as the open-source library statnett/linerate implements and documents them
 * (module {@code linerate.equations.cigre601}); the low-wind rule is recalled, not checked.
 */
public final class CigreHeatBalance implements SteadyHeatBalance {

  /** Stefan-Boltzmann constant as CIGRE TB 601 writes it, W/(m^2 K^4). */
  private static final double STEFAN_BOLTZMANN = 5.6697e-8;
  /** Specific heat of air at constant pressure, J/(kg K) (CIGRE TB 601, for the Prandtl number). */
  private static final double AIR_SPECIFIC_HEAT = 1005;
  /** Standard gravity, m/s^2. */
  private static final double GRAVITY = 9.807;
  /** Below this wind speed the brochure's low-wind rule applies, m/s. */
  private static final double LOW_WIND_M_S = 0.5;
  /** Roughness above which Table 4's very-rough row applies (dimensionless). */
  private static final double ROUGH_LIMIT = 0.05;

  /**
   * The weather, load, site and sun at one moment.
   *
   * @param currentA current per conductor, A (&gt;= 0)
   * @param airTemperatureC air temperature, degC
   * @param windSpeed wind speed, m/s (&gt;= 0)
   * @param attackRad angle of attack of the wind on the conductor axis, radians, 0 to pi/2
   * @param altitudeM conductor altitude above sea level, m
   * @param inclinationRad conductor inclination to the horizontal, radians, 0 to 80 deg
   * @param sun solar altitude and azimuth
   * @param conductorAzimuthRad azimuth of the conductor axis, radians clockwise from north
   * @param albedo ground albedo F, 0-1 (CIGRE TB 601: forest 0.1, soil and grass 0.2)
   * @param clearness clearness ratio N_s (1 clear, about 0.5 industrial or hazy), 0-1.5
   */
  public record Conditions(double currentA, double airTemperatureC, double windSpeed,
      double attackRad, double altitudeM, double inclinationRad, SolarPosition sun,
      double conductorAzimuthRad, double albedo, double clearness) {
    public Conditions {
      Objects.requireNonNull(sun, "sun");
      if (!(currentA >= 0 && Double.isFinite(currentA))) {
        throw new IllegalArgumentException("current must be >= 0 A: " + currentA);
      }
      if (!(windSpeed >= 0 && Double.isFinite(windSpeed))) {
        throw new IllegalArgumentException("wind speed must be >= 0 m/s: " + windSpeed);
      }
      if (!(attackRad >= 0 && attackRad <= Math.PI / 2 + 1e-12)) {
        throw new IllegalArgumentException("angle of attack must be 0 to pi/2: " + attackRad);
      }
      if (!(inclinationRad >= 0 && inclinationRad <= Math.toRadians(80))) {
        throw new IllegalArgumentException("inclination must be 0 to 80 deg: " + inclinationRad);
      }
      if (!(albedo >= 0 && albedo <= 1) || !(clearness >= 0 && clearness <= 1.5)) {
        throw new IllegalArgumentException("albedo must be 0-1 and clearness 0-1.5");
      }
      if (!Double.isFinite(airTemperatureC) || !Double.isFinite(altitudeM)
          || !Double.isFinite(conductorAzimuthRad)) {
        throw new IllegalArgumentException("air temperature, altitude and azimuth must be finite");
      }
    }
  }

  private final double diameter;
  private final double roughness;
  private final ConductorThermal thermal;
  private final Conditions at;

  /**
   * @param diameter conductor outside diameter D, m (&gt; 0)
   * @param outerStrandDiameter diameter d of the outer layer's strands, m (0 &lt; d &lt; D), or NaN
   *     when not known: then Table 4's row for R_s &gt; 0.05 (most stranded conductors of two or
   *     more layers; it cools the most above Re = 2650, so the survey temperature errs low, which
   *     overstates the sag increase to a hot condition)
   * @param thermal resistance and surface data
   * @param at weather, load, site and sun
   */
  public CigreHeatBalance(double diameter, double outerStrandDiameter, ConductorThermal thermal,
      Conditions at) {
    if (!(Double.isFinite(diameter) && diameter > 0)) {
      throw new IllegalArgumentException("diameter must be positive: " + diameter);
    }
    if (!Double.isNaN(outerStrandDiameter)
        && !(outerStrandDiameter > 0 && outerStrandDiameter < diameter)) {
      throw new IllegalArgumentException("outer strand diameter must be in (0, D): "
          + outerStrandDiameter);
    }
    this.diameter = diameter;
    this.roughness = outerStrandDiameter / (2 * (diameter - outerStrandDiameter));
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

  @Override
  public double resistance(double conductorC) {
    return thermal.resistance(conductorC);
  }

  /** Roughness R_s = d / (2 (D - d)) (CIGRE TB 601 section 3.5); NaN when d is not known. */
  public double roughness() {
    return roughness;
  }

  /** Solar heating P_S, W/m (CIGRE TB 601 equations (9)-(13)); 0 at night. */
  @Override
  public double solarHeating() {
    double sinH = Math.sin(at.sun().altitudeRad());
    if (!(sinH > 0)) {
      return 0;
    }
    double direct0 = at.clearness() * 1280 * sinH / (sinH + 0.314);
    double y = 1.4e-4 * at.altitudeM();
    double direct = direct0 * (1 - y) + 1367 * y;
    double diffuse = Math.max(0, 430.5 - 0.3288 * direct) * sinH;
    double cosEta = Math.cos(at.sun().altitudeRad())
        * Math.cos(at.sun().azimuthRad() - at.conductorAzimuthRad());
    double sinEta = Math.sqrt(Math.max(0, 1 - cosEta * cosEta));
    double halfPiF = 0.5 * Math.PI * at.albedo();
    double global = direct * (sinEta + halfPiF * sinH) + diffuse * (1 + halfPiF);
    return thermal.absorptivity() * global * diameter;
  }

  /** Convective cooling P_c, W/m (CIGRE TB 601 equations (17)-(24)). */
  @Override
  public double convectiveCooling(double conductorC) {
    double ta = at.airTemperatureC();
    double dt = conductorC - ta;
    if (!(dt > 0)) {
      return 0;
    }
    double film = 0.5 * (conductorC + ta);
    double conductivity = 2.368e-2 + 7.23e-5 * film - 2.763e-8 * film * film;
    double viscosity = 17.239e-6 + 4.635e-8 * film - 2.03e-11 * film * film;
    double y = at.altitudeM();
    double density = (1.293 - 1.525e-4 * y + 6.379e-9 * y * y) / (1 + 0.00367 * film);
    double kinematic = viscosity / density;
    double reynolds = at.windSpeed() * diameter / kinematic;
    double nu90 = perpendicularNusselt(reynolds, roughness);
    double forced = at.windSpeed() < LOW_WIND_M_S
        ? Math.max(nu90 * attackFactor(Math.PI / 4), 0.55 * nu90)
        : nu90 * attackFactor(at.attackRad());
    double grashof = diameter * diameter * diameter * dt * GRAVITY
        / ((film + 273) * kinematic * kinematic);
    double prandtl = AIR_SPECIFIC_HEAT * viscosity / conductivity;
    double beta = Math.toDegrees(at.inclinationRad());
    double natural = naturalNusselt(grashof * prandtl) * (1 - 1.76e-6 * Math.pow(beta, 2.5));
    return Math.PI * conductivity * dt * Math.max(forced, natural);
  }

  /** Radiative cooling P_r, W/m (CIGRE TB 601 equation (27)); negative below the air. */
  @Override
  public double radiativeCooling(double conductorC) {
    double ts = conductorC + 273;
    double ta = at.airTemperatureC() + 273;
    return Math.PI * diameter * STEFAN_BOLTZMANN * thermal.emissivity()
        * (ts * ts * ts * ts - ta * ta * ta * ta);
  }

  /** Nu_90 = B Re^n of CIGRE TB 601 Table 4 for a stranded conductor of roughness R_s. */
  static double perpendicularNusselt(double reynolds, double roughness) {
    double b;
    double n;
    if (reynolds < 2650) {
      b = 0.641;
      n = 0.471;
    } else if (roughness <= ROUGH_LIMIT) { // false for NaN: the rough row
      b = 0.178;
      n = 0.633;
    } else {
      b = 0.048;
      n = 0.800;
    }
    return b * Math.pow(reynolds, n);
  }

  /** The angle-of-attack factor A1 + B1 sin^m delta of CIGRE TB 601 equation (22). */
  static double attackFactor(double attackRad) {
    double s = Math.sin(attackRad);
    return attackRad <= Math.toRadians(24) ? 0.42 + 0.68 * Math.pow(s, 1.08)
        : 0.42 + 0.58 * Math.pow(s, 0.90);
  }

  /** Nu_0 = A (Gr Pr)^m of CIGRE TB 601 Table 5 (horizontal conductor). */
  static double naturalNusselt(double grPr) {
    if (grPr >= 1e7) {
      return 0.125 * Math.pow(grPr, 0.333);
    }
    if (grPr >= 1e4) {
      return 0.480 * Math.pow(grPr, 0.250);
    }
    if (grPr >= 1e2) {
      return 0.850 * Math.pow(grPr, 0.188);
    }
    return 1.020 * Math.pow(Math.max(0, grPr), 0.148);
  }
}
