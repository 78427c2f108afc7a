package org.clearance.sag;

import java.util.List;
import org.clearance.wire.ConductorCurve;

/**
 * The horizontal tension of one conductor position of a tension section at survey time, estimated
 * from the catenaries fitted to its spans.
 *
 * <p>Method. Under the ruling-span assumption (methods.md 3.4) every span of a section carries the
 * same horizontal tension H, so with one weight per length w every span has the same catenary
 * constant c = H / w; the fitted constants c_i differ only by fitting error and by what the
 * assumption leaves out. The section constant is the mean of the c_i weighted by S_i^3, the same
 * weights the ruling span S_R = sqrt(sum S_i^3 / sum S_i) gives each span: the slack a span adds to
 * the section, L_i - S_i = S_i^3 / (24 c_i^2) (parabolic form of methods.md 3.2), is what the
 * change-of-state balances, so the S^3-weighted mean keeps the section's total slack to first order
 * in the spread: sum S_i^3 / c_i^2 = (sum S_i^3) / cbar^2 (1 + O(spread^2)). It also trusts long
 * spans most, whose deeper sag makes c the best determined (relative error of c equals the
 * relative error of the sag). H_s = w cbar.
 *
 * @param spanCount number of fitted spans used (&ge; 1)
 * @param meanConstant S^3-weighted mean catenary constant cbar, m
 * @param constantSpread S^3-weighted standard deviation of the c_i about cbar, m (0 for one span)
 * @param minConstant smallest fitted c_i, m
 * @param maxConstant largest fitted c_i, m
 * @param weightPerLength conductor weight per length w used, N/m, or NaN when unknown
 * @param horizontalTension survey horizontal tension H_s = w cbar, N, or NaN when w is unknown
 * @param tensionSpread w times {@code constantSpread}, N, or NaN when w is unknown
 */
public record SectionTension(
    int spanCount,
    double meanConstant,
    double constantSpread,
    double minConstant,
    double maxConstant,
    double weightPerLength,
    double horizontalTension,
    double tensionSpread) {

  /**
   * Estimates the survey tension from the fitted spans of one conductor position of a section.
   *
   * @param fittedSpans the spans' fitted curves; each gives its catenary constant and plan length
   * @param weightPerLength bare conductor weight per length, N/m (&gt; 0), or NaN when the
   *     conductor is unknown (then only the catenary constants are given)
   * @return the estimate
   * @throws IllegalArgumentException when the list is empty or the weight is not positive
   */
  public static SectionTension estimate(List<ConductorCurve> fittedSpans, double weightPerLength) {
    if (fittedSpans.isEmpty()) {
      throw new IllegalArgumentException("no fitted span in the tension section");
    }
    if (!(Double.isNaN(weightPerLength) || (Double.isFinite(weightPerLength)
        && weightPerLength > 0))) {
      throw new IllegalArgumentException("weight per length must be positive or NaN: "
          + weightPerLength);
    }
    double sumWeights = 0;
    double sumWeightedC = 0;
    double min = Double.POSITIVE_INFINITY;
    double max = Double.NEGATIVE_INFINITY;
    for (ConductorCurve span : fittedSpans) {
      double s = span.length();
      double c = span.curve().c();
      double weight = s * s * s;
      sumWeights += weight;
      sumWeightedC += weight * c;
      min = Math.min(min, c);
      max = Math.max(max, c);
    }
    double mean = sumWeightedC / sumWeights;
    double sumWeightedSq = 0;
    for (ConductorCurve span : fittedSpans) {
      double s = span.length();
      double d = span.curve().c() - mean;
      sumWeightedSq += s * s * s * d * d;
    }
    double spread = Math.sqrt(sumWeightedSq / sumWeights);
    return new SectionTension(fittedSpans.size(), mean, spread, min, max, weightPerLength,
        weightPerLength * mean, weightPerLength * spread);
  }

  /** Spread of the constants relative to the mean, dimensionless (0 for one span). */
  public double relativeSpread() {
    return constantSpread / meanConstant;
  }
}
