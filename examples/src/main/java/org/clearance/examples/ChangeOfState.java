package org.clearance.examples;

import org.clearance.line.ConductorType;

/**
 * The parabolic change-of-state equation on a ruling span, used to carry a section's chosen
 * tension to the survey temperature. Source: docs/methods.md sections 3.2 and 3.4
 * (classic state equation, no creep, single modulus).
 *
 * <p>The conserved quantity is w^2 S^2 / (24 H^2) - H / (E A) - alpha theta: the parabolic slack
 * w^2 S^2 / (24 H^2) changes with the elastic strain H / (E A) and the thermal strain alpha theta.
 */
final class ChangeOfState {
  /** Bisection steps: halves the bracket [1 N, 1e9 N] far below 1e-9 N. */
  private static final int BISECTION_STEPS = 200;
  private static final double MIN_TENSION_N = 1.0;
  private static final double MAX_TENSION_N = 1e9;

  private ChangeOfState() {}

  /**
   * Horizontal tension at temperature {@code t2} given tension {@code h1} at {@code t1}.
   *
   * @param type conductor (weight, E A, alpha)
   * @param rulingSpan ruling span, m (&gt; 0)
   * @param h1 horizontal tension at t1, N (&gt; 0)
   * @param t1 temperature of the known state, degC
   * @param t2 temperature of the wanted state, degC
   * @return horizontal tension at t2, N
   */
  static double tension(ConductorType type, double rulingSpan, double h1, double t1, double t2) {
    if (!(Double.isFinite(rulingSpan) && rulingSpan > 0 && Double.isFinite(h1) && h1 > 0)) {
      throw new IllegalArgumentException("span and tension must be positive: " + rulingSpan
          + ", " + h1);
    }
    double target = state(type, rulingSpan, h1, t1);
    double lo = MIN_TENSION_N;
    double hi = MAX_TENSION_N;
    for (int i = 0; i < BISECTION_STEPS; i++) {
      double mid = 0.5 * (lo + hi);
      if (state(type, rulingSpan, mid, t2) > target) {
        lo = mid; // the state function falls as H grows
      } else {
        hi = mid;
      }
    }
    return 0.5 * (lo + hi);
  }

  private static double state(ConductorType type, double span, double h, double t) {
    double w = type.weightPerLength();
    return w * w * span * span / (24 * h * h) - h / type.axialStiffness()
        - type.thermalExpansion() * t;
  }

  /**
   * Ruling span sqrt(sum S_i^3 / sum S_i), m (methods.md section 3.4).
   *
   * @param spans span lengths, m, all &gt; 0, at least one
   */
  static double rulingSpan(double... spans) {
    if (spans.length == 0) {
      throw new IllegalArgumentException("no spans");
    }
    double cubes = 0;
    double sum = 0;
    for (double s : spans) {
      if (!(Double.isFinite(s) && s > 0)) {
        throw new IllegalArgumentException("span length must be positive: " + s);
      }
      cubes += s * s * s;
      sum += s;
    }
    return Math.sqrt(cubes / sum);
  }
}
