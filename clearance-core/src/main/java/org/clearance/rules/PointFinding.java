package org.clearance.rules;

import java.util.List;
import java.util.Optional;

/**
 * What a rule profile says about one vegetation point.
 *
 * @param verdict the outcome
 * @param violation the most urgent zone the point is inside, when the verdict is
 *     {@link Verdict#INSIDE_ZONE}
 * @param yearsToViolation years until the point grows into the violation-reference zone: 0
 *     when inside it now, +infinity when growth never brings it in, NaN when not computed (no
 *     growth rates, or the reference zone could not be assessed for the point)
 * @param notAssessedReason why the point was not assessed, when the verdict is
 *     {@link Verdict#NOT_ASSESSED}
 * @param gaps zones that apply but could not be checked for this point
 */
public record PointFinding(
    Verdict verdict,
    Optional<ZoneViolation> violation,
    double yearsToViolation,
    Optional<String> notAssessedReason,
    List<ZoneGap> gaps) {

  /** The outcome for a point. */
  public enum Verdict {
    /** Inside at least one zone. */
    INSIDE_ZONE,
    /** Outside every zone checked, and the violation-reference zone was checked. */
    CLEAR,
    /** The violation-reference zone could not be checked: never read as clear. */
    NOT_ASSESSED
  }

  public PointFinding {
    gaps = List.copyOf(gaps);
    if ((verdict == Verdict.INSIDE_ZONE) != violation.isPresent()) {
      throw new IllegalArgumentException("a violation goes with INSIDE_ZONE only");
    }
    if ((verdict == Verdict.NOT_ASSESSED) != notAssessedReason.isPresent()) {
      throw new IllegalArgumentException("a reason goes with NOT_ASSESSED only");
    }
  }

  static PointFinding notAssessed(String reason, List<ZoneGap> gaps) {
    return new PointFinding(Verdict.NOT_ASSESSED, Optional.empty(), Double.NaN,
        Optional.of(reason), gaps);
  }
}
