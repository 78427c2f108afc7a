package org.clearance.assess;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.clearance.clearance.SpanStatus;

/**
 * The order in which spans need attention: spans NOT ASSESSED first (nothing is known about
 * them), then by the priority of their most urgent site (1 first), then by that site's deficit
 * (largest first), then by their number of sites (most first); among spans still tied, INCOMPLETE
 * before ASSESSED (an incomplete span is never clear), then the model's order.
 */
public final class SpanRanking {

  /** The ranking order. */
  public static final Comparator<SpanResult> ORDER = Comparator
      .comparingInt((SpanResult r) -> r.status() == SpanStatus.NOT_ASSESSED ? 0 : 1)
      .thenComparingInt(r -> r.worst().map(CutSite::priority).orElse(Integer.MAX_VALUE))
      .thenComparingDouble(r -> -r.worst().map(CutSite::deficitM).orElse(0.0))
      .thenComparingInt(r -> -r.sites().size())
      .thenComparingInt(r -> r.status() == SpanStatus.INCOMPLETE ? 0 : 1);

  private SpanRanking() {}

  /**
   * Sorts spans into the ranking order (stable: ties keep their order) and numbers them from 1.
   */
  public static List<SpanResult> rank(List<SpanResult> spans) {
    List<SpanResult> sorted = new ArrayList<>(spans);
    sorted.sort(ORDER);
    List<SpanResult> out = new ArrayList<>(sorted.size());
    for (int i = 0; i < sorted.size(); i++) {
      out.add(sorted.get(i).withRank(i + 1));
    }
    return List.copyOf(out);
  }
}
