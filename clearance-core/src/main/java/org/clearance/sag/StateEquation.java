package org.clearance.sag;

import java.util.Locale;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.clearance.io.Hyperbolic;

/**
 * The two change-of-state equations of a single-material conductor on a level ruling span, each
 * solved for the new horizontal tension by Brent's method inside physical bounds.
 *
 * <p>Exact catenary length (methods.md 3.3): L(H) = 2c sinh(S / 2c) with c = H / w; elastic
 * elongation integrated along the catenary dL_e(H) = H (S + c sinh(S / c)) / (2 EA). The
 * unstressed length at the known state, L_u1 = L(H1) - dL_e(H1), is referred to 20 degC,
 * L_r = L_u1 / (1 + alpha (theta1 - 20)); the new tension solves
 * f(H) = L(H) - dL_e(H) - L_r (1 + alpha (theta2 - 20)) = 0, where f falls strictly as H grows
 * while S / c &lt; 1.9 (beyond that the elastic term falls with H).
 *
 * <p>Parabolic cubic (methods.md 3.2, the classic textbook form):
 * H2^2 [H2 + EA w1^2 S^2 / (24 H1^2) - H1 + EA alpha (theta2 - theta1)] = EA w2^2 S^2 / 24.
 */
final class StateEquation {

  /**
   * Largest S / c searched: sag about 20 % of the span, deeper than any strung conductor; below
   * S / c = 1.9 the exact f is strictly monotone, so the root in the bracket is unique.
   */
  static final double MAX_SPAN_OVER_C = 1.5;

  /** Sag-to-span ratio of a level catenary at S / c = MAX_SPAN_OVER_C (for messages). */
  private static final double MAX_SAG_RATIO =
      (Hyperbolic.cosh(MAX_SPAN_OVER_C / 2) - 1) / MAX_SPAN_OVER_C;

  /** Largest mean elastic strain searched: 5 %, far above the breaking strain of any conductor. */
  static final double MAX_STRAIN = 0.05;

  /**
   * Temperature at which the unstressed length is referred, degC: conductor data sheets state
   * lengths and expansion at 20 degC (common practice, no source). A fixed reference makes chained
   * changes of state path-independent (a round trip returns the start exactly).
   */
  static final double REFERENCE_TEMPERATURE = 20.0;

  /** Absolute accuracy of the solved tension, N: far below any physical meaning. */
  private static final double TENSION_ACCURACY = 1e-7;

  /** Relative accuracy of the solved tension: a few ulps of a double. */
  private static final double RELATIVE_ACCURACY = 1e-15;

  /** Brent evaluation cap: bisection alone would need about 60 steps over the bracket. */
  private static final int MAX_EVALUATIONS = 500;

  private StateEquation() {}

  /** Solves the exact catenary-length equation; see the class comment. */
  static double catenaryLength(double ea, double alpha, double span, TensionState from,
      double temperature, double weight) {
    double unstressed = length(from.horizontalTension(), from.weightPerLength(), span)
        - elasticElongation(from.horizontalTension(), from.weightPerLength(), span, ea);
    double atReference = unstressed / (1 + alpha * (from.temperatureC() - REFERENCE_TEMPERATURE));
    double target = atReference * (1 + alpha * (temperature - REFERENCE_TEMPERATURE));
    UnivariateFunction f = h -> length(h, weight, span) - elasticElongation(h, weight, span, ea)
        - target;
    return solve(f, ea, span, weight, "exact catenary length");
  }

  /** Solves the parabolic cubic; see the class comment. */
  static double parabolic(double ea, double alpha, double span, TensionState from,
      double temperature, double weight) {
    double h1 = from.horizontalTension();
    double w1 = from.weightPerLength();
    double k = ea * w1 * w1 * span * span / (24 * h1 * h1) - h1
        + ea * alpha * (temperature - from.temperatureC());
    double m = ea * weight * weight * span * span / 24;
    // written so that it falls with H like the exact form: -(H^2 (H + k) - m) / H^2
    UnivariateFunction f = h -> m / (h * h) - (h + k);
    return solve(f, ea, span, weight, "parabolic");
  }

  /** Conductor length of a level span, m: 2c sinh(S / 2c). */
  static double length(double h, double w, double span) {
    double c = h / w;
    return 2 * c * Hyperbolic.sinh(span / (2 * c));
  }

  /** Elastic elongation integrated along a level catenary span, m: H (S + c sinh(S/c)) / 2EA. */
  static double elasticElongation(double h, double w, double span, double ea) {
    double c = h / w;
    return h * (span + c * Hyperbolic.sinh(span / c)) / (2 * ea);
  }

  private static double solve(UnivariateFunction f, double ea, double span, double weight,
      String method) {
    double lo = weight * span / MAX_SPAN_OVER_C;
    double hi = MAX_STRAIN * ea;
    if (!(lo < hi)) {
      throw new IllegalArgumentException(String.format(Locale.ROOT,
          "no solution within physical bounds: span %.1f m with load %.3f N/m would need a"
              + " tension above %.0f %% strain", span, weight, 100 * MAX_STRAIN));
    }
    double fLo = f.value(lo);
    double fHi = f.value(hi);
    if (!(fLo > 0)) {
      throw new IllegalArgumentException(String.format(Locale.ROOT,
          "no solution within physical bounds (%s): the conductor would sag more than %.0f %% of"
              + " the %.1f m span", method, 100 * MAX_SAG_RATIO, span));
    }
    if (!(fHi < 0)) {
      throw new IllegalArgumentException(String.format(Locale.ROOT,
          "no solution within physical bounds (%s): the tension would exceed %.0f N (%.0f %%"
              + " strain)", method, hi, 100 * MAX_STRAIN));
    }
    try {
      return new BrentSolver(RELATIVE_ACCURACY, TENSION_ACCURACY)
          .solve(MAX_EVALUATIONS, f, lo, hi);
    } catch (TooManyEvaluationsException e) {
      throw new IllegalStateException("change of state did not converge (" + method + ")", e);
    }
  }
}
