package org.clearance.assess;

import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import org.clearance.clearance.ConditionDistance;
import org.clearance.clearance.DistanceUncertainty;
import org.clearance.clearance.PointClearance;
import org.clearance.clearance.StateUncertainty;
import org.clearance.clearance.UncertaintyFile;
import org.clearance.line.ConductorPosition.Role;
import org.clearance.rules.PointFinding;
import org.clearance.rules.SpanRules;
import org.clearance.rules.ZoneViolation;

/**
 * Findings with confidence (docs/rules.md): every stored distance gets its standard uncertainty
 * ({@link DistanceUncertainty}) and the profile's coverage factor k; the rules are evaluated on
 * the point moved to the lower bounds d - k sigma of all its conditions (a zone that lies within
 * an interval catches it) and on the upper bounds d + k sigma (still inside: a violation).
 * Evaluating the same rules on shifted distances keeps every zone kind (radial, components,
 * span-position dependent) as it is.
 */
final class DistanceIntervals {

  private final UncertaintyFile uncertainty;
  private final double k;
  private final double confidencePercent;

  /**
   * @param uncertainty the run's stored conductor uncertainties and point accuracy
   * @param k coverage factor (&gt; 0)
   * @param confidencePercent the confidence level, %
   */
  DistanceIntervals(UncertaintyFile uncertainty, double k, double confidencePercent) {
    this.uncertainty = uncertainty;
    this.k = k;
    this.confidencePercent = confidencePercent;
  }

  /** What the rules say about a point with its intervals. */
  record Outcome(PointFinding finding, Optional<FindingInterval> interval) {}

  /**
   * Evaluates a point: the finding on its lower bounds (never less severe than the nominal one),
   * with the interval and verdict of the condition the finding names.
   */
  Outcome evaluate(SpanRules rules, PointClearance p) {
    PointClearance low = p.mapDistances(d -> moved(d, -k * sigma(p, d)));
    PointFinding atLow = rules.evaluate(low);
    if (atLow.verdict() != PointFinding.Verdict.INSIDE_ZONE) {
      return new Outcome(atLow, Optional.empty());
    }
    PointFinding nominal = rules.evaluate(p);
    PointFinding atHigh = rules.evaluate(p.mapDistances(d -> moved(d, k * sigma(p, d))));
    boolean nominallyInside = nominal.verdict() == PointFinding.Verdict.INSIDE_ZONE;
    PointFinding finding = nominallyInside ? nominal : atLow;
    ZoneViolation v = finding.violation().orElseThrow();
    int c = entryIndex(p, v.condition(), v.conductor());
    List<ConditionDistance> all = all(p);
    List<ConditionDistance> lowAll = all(low);
    if (!nominallyInside && c >= 0 && lowAll.get(c).distance() > 0) {
      // Inside only by its lower bound: report the distance as measured; the deficit stays the
      // one from the lower bound (what clears the point at the confidence level).
      double back = all.get(c).distance() / lowAll.get(c).distance();
      v = new ZoneViolation(v.zone(), v.condition(), v.group(), v.conductor(), v.stationM(),
          v.component(), v.actualM() * back, v.requiredM(), v.deficitM());
      finding = new PointFinding(finding.verdict(), Optional.of(v), finding.yearsToViolation(),
          finding.notAssessedReason(), finding.gaps());
    }
    DistanceUncertainty u = c < 0 ? null : uncertainty(p, all.get(c));
    double d = c < 0 ? Double.NaN : all.get(c).distance();
    double s = u == null ? Double.NaN : u.sigma();
    FindingInterval.Verdict verdict = atHigh.verdict() == PointFinding.Verdict.INSIDE_ZONE
        ? FindingInterval.Verdict.VIOLATION : FindingInterval.Verdict.POSSIBLE_VIOLATION;
    return new Outcome(finding, Optional.of(new FindingInterval(d, s, Math.max(0, d - k * s),
        d + k * s, confidencePercent, verdict, u == null ? "" : u.dominant())));
  }

  /** Every stored distance of a point, of every role, in a fixed order. */
  private static List<ConditionDistance> all(PointClearance p) {
    return p.distancesFor(EnumSet.allOf(Role.class));
  }

  /** The standard uncertainty of one stored distance, or null when it was not computed. */
  private DistanceUncertainty uncertainty(PointClearance p, ConditionDistance d) {
    if (Double.isNaN(d.distance())) {
      return null;
    }
    StateUncertainty state = uncertainty.state(p.spanId(), d.conductor(), d.condition())
        .orElse(null);
    return DistanceUncertainty.of(state, uncertainty.options(), d.distance(), d.horizontal(),
        d.vertical(), d.station());
  }

  private double sigma(PointClearance p, ConditionDistance d) {
    DistanceUncertainty u = uncertainty(p, d);
    return u == null ? 0 : u.sigma();
  }

  /** Index in {@link #all} of the distance of a condition to a named conductor, or -1. */
  private static int entryIndex(PointClearance p, String condition, String conductor) {
    List<ConditionDistance> all = all(p);
    for (int i = 0; i < all.size(); i++) {
      if (all.get(i).condition().equals(condition) && all.get(i).conductor().equals(conductor)) {
        return i;
      }
    }
    return -1;
  }

  /** The distance moved by delta along its own direction (components scaled alike). */
  private static ConditionDistance moved(ConditionDistance d, double delta) {
    double to = Math.max(0, d.distance() + delta);
    double f = d.distance() > 0 ? to / d.distance() : 1;
    return new ConditionDistance(d.condition(), d.group(), to, d.horizontal() * f,
        d.vertical() * f, d.conductor(), d.station());
  }

}
