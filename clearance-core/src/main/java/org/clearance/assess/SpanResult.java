package org.clearance.assess;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalInt;
import org.clearance.clearance.ConditionMinimum;
import org.clearance.clearance.SpanStatus;
import org.clearance.run.ConductorRecord;
import org.clearance.run.SpanRecord;

/**
 * The outcome of one span under a rule profile.
 *
 * @param span the span as the engine measured it
 * @param status {@link SpanStatus#ASSESSED} only when the engine measured everything and the
 *     profile could check every zone at every point; {@link SpanStatus#INCOMPLETE} when findings
 *     stand but something was not checked; {@link SpanStatus#NOT_ASSESSED} when the span could
 *     not be checked at all (or no profile was given). Only an assessed span without sites is
 *     clear.
 * @param reason why the span is not (fully) assessed, empty otherwise
 * @param sites its sites, most urgent first (priority, then deficit, largest first)
 * @param rank place in the run's ranking (1 = needs attention first), empty without a profile
 * @param pointsChecked vegetation points of the span checked against the profile
 * @param pointsNotAssessed points that could not be checked against the violation-reference
 *     zone
 */
public record SpanResult(
    SpanRecord span, SpanStatus status, String reason, List<CutSite> sites, OptionalInt rank,
    long pointsChecked, long pointsNotAssessed) {

  public SpanResult {
    Objects.requireNonNull(span, "span");
    Objects.requireNonNull(status, "status");
    Objects.requireNonNull(reason, "reason");
    sites = List.copyOf(sites);
    Objects.requireNonNull(rank, "rank");
  }

  /** The span id. */
  public String id() {
    return span.id();
  }

  /** The most urgent site, if any. */
  public Optional<CutSite> worst() {
    return sites.isEmpty() ? Optional.empty() : Optional.of(sites.get(0));
  }

  /** Whether the span is assessed and has no site: the only case reported clear. */
  public boolean clear() {
    return status == SpanStatus.ASSESSED && sites.isEmpty();
  }

  /** The same result at a rank. */
  public SpanResult withRank(int r) {
    return new SpanResult(span, status, reason, sites, OptionalInt.of(r), pointsChecked,
        pointsNotAssessed);
  }

  /**
   * The condition of the smallest clearance over all conditions the engine measured, or empty
   * when no vegetation point was measured.
   */
  public Optional<ConditionMinimum> governingMinimum() {
    ConditionMinimum best = null;
    for (ConditionMinimum m : span.minima()) {
      if (!Double.isNaN(m.distance()) && (best == null || m.distance() < best.distance())) {
        best = m;
      }
    }
    return Optional.ofNullable(best);
  }

  /** The smallest clearance over the conditions of a report group, m, or NaN. */
  public double minimumOfGroup(String group) {
    double best = Double.NaN;
    for (ConditionMinimum m : span.minima()) {
      if (m.group().equals(group) && !Double.isNaN(m.distance())) {
        best = Double.isNaN(best) ? m.distance() : Math.min(best, m.distance());
      }
    }
    return best;
  }

  /**
   * Whether the span's number of sites means anything: a profile was applied and the span was
   * at least partly assessed (a NOT ASSESSED span without sites has no count, not zero).
   */
  public boolean sitesCounted() {
    return rank.isPresent() && (status != SpanStatus.NOT_ASSESSED || !sites.isEmpty());
  }

  /** Conductors fitted in the span. */
  public int conductorsFitted() {
    return (int) span.conductors().stream().filter(ConductorRecord::fitted).count();
  }
}
