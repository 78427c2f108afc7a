package org.clearance.sag;

/**
 * The steady-state heat balance of a bare overhead conductor, per unit length: convective plus
 * radiative cooling equals solar plus Joule heating. Both IEEE Std 738-2012 ({@link HeatBalance})
 * and CIGRE Technical Brochure 601 ({@link CigreHeatBalance}) write it so (IEEE 738 equation (1),
 * CIGRE 601 equation (1) without the corona and magnetic terms); they differ in how each term is
 * computed.
 */
public interface SteadyHeatBalance {

  /** Bisection stops when the bracket is this narrow, degC: far below any input's precision. */
  double TEMPERATURE_TOLERANCE_C = 1e-6;
  /** Bisection steps at most: halving 600 degC to 1e-6 takes 30. */
  int MAX_STEPS = 200;
  /** Highest conductor temperature searched above the air, degC: beyond any conductor's limit. */
  double MAX_RISE_C = 600;

  /** Air temperature, degC. */
  double airTemperatureC();

  /** Current per conductor, A. */
  double currentA();

  /** AC resistance per length at a conductor temperature, ohm/m. */
  double resistance(double conductorC);

  /** Joule heating I^2 R(T_c) at a conductor temperature, W/m. */
  default double jouleHeating(double conductorC) {
    return currentA() * currentA() * resistance(conductorC);
  }

  /** Solar heating, W/m (0 at night). */
  double solarHeating();

  /** Convective cooling at a conductor temperature, W/m (0 at or below the air temperature). */
  double convectiveCooling(double conductorC);

  /** Radiative cooling at a conductor temperature, W/m (negative below the air temperature). */
  double radiativeCooling(double conductorC);

  /**
   * The steady conductor temperature at which cooling equals heating, degC.
   *
   * @throws IllegalStateException when no temperature up to 600 degC above the air balances (a
   *     current far above any rating)
   */
  default double conductorTemperature() {
    return conductorTemperature(solarHeating());
  }

  /**
   * The steady conductor temperature with a given solar heating (a measured or published value),
   * degC, by bisection: cooling minus heating increases with the conductor temperature.
   *
   * @param solarHeating solar heating, W/m (&gt;= 0)
   * @throws IllegalStateException as {@link #conductorTemperature()}
   */
  default double conductorTemperature(double solarHeating) {
    double lo = airTemperatureC();
    double hi = lo + MAX_RISE_C;
    if (imbalance(hi, solarHeating) < 0) {
      throw new IllegalStateException("no heat balance below " + hi + " degC: current "
          + currentA() + " A is far above the conductor's rating");
    }
    for (int i = 0; i < MAX_STEPS && hi - lo > TEMPERATURE_TOLERANCE_C; i++) {
      double mid = 0.5 * (lo + hi);
      if (imbalance(mid, solarHeating) < 0) {
        lo = mid;
      } else {
        hi = mid;
      }
    }
    return 0.5 * (lo + hi);
  }

  /**
   * The steady current that holds the conductor at a temperature (the rating, or ampacity), A:
   * I = sqrt((q_c + q_r - q_s) / R(T_c)); 0 when the sun alone holds it there or hotter. The
   * current of the conditions is not used.
   *
   * @param conductorC conductor temperature, degC (above the air temperature)
   */
  default double steadyCurrent(double conductorC) {
    double heat = convectiveCooling(conductorC) + radiativeCooling(conductorC) - solarHeating();
    return heat > 0 ? Math.sqrt(heat / resistance(conductorC)) : 0;
  }

  /** Cooling minus heating at a conductor temperature, W/m: increasing in T_c. */
  private double imbalance(double conductorC, double solarHeating) {
    return convectiveCooling(conductorC) + radiativeCooling(conductorC) - solarHeating
        - jouleHeating(conductorC);
  }
}
