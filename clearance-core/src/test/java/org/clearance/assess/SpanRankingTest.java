package org.clearance.assess;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalInt;
import org.clearance.clearance.SpanContext;
import org.clearance.clearance.SpanStatus;
import org.clearance.run.SpanRecord;
import org.clearance.run.StructureRecord;
import org.junit.jupiter.api.Test;

/** Ranking order: NOT ASSESSED first, then priority, deficit, number of sites. */
class SpanRankingTest {

  private static SpanResult span(String id, SpanStatus status, double[]... sites) {
    SpanRecord rec = new SpanRecord(new SpanContext(id, "L", 115, 0, 100), "",
        new StructureRecord("a", 0, 0, 0, "suspension"),
        new StructureRecord("b", 100, 0, 0, "suspension"), status, "", List.of(), List.of(), 0,
        0, List.of());
    List<CutSite> list = new ArrayList<>();
    for (double[] s : sites) { // {priority, deficit}
      list.add(new CutSite(id + "." + (list.size() + 1), id, CutSite.Kind.GROW_IN, (int) s[0],
          "z" + (int) s[0], s[0] == 1, "survey", 1, 1 + s[1], s[1], 0, 0, 0, Double.NaN,
          Double.NaN, 50, CutSite.Side.LEFT, 1, 5, 2, OptionalInt.of(3), 1, 0));
    }
    return new SpanResult(rec, status, status == SpanStatus.ASSESSED ? "" : "why", list,
        OptionalInt.empty(), 10, 0);
  }

  @Test
  void rankingOrder() {
    // common practice, no source: what is unknown first, then the most urgent zone, then the
    // deepest deficit, then the most sites; incomplete before assessed among equals
    List<SpanResult> in = List.of(
        span("clear", SpanStatus.ASSESSED),
        span("p2-small", SpanStatus.ASSESSED, new double[] {2, 0.3}),
        span("p1-small", SpanStatus.ASSESSED, new double[] {1, 0.2}, new double[] {3, 1.0}),
        span("na-1", SpanStatus.NOT_ASSESSED),
        span("p1-deep", SpanStatus.ASSESSED, new double[] {1, 0.9}),
        span("incomplete-empty", SpanStatus.INCOMPLETE),
        span("p2-small-more", SpanStatus.ASSESSED, new double[] {2, 0.3}, new double[] {2, 0.1}),
        span("na-2", SpanStatus.NOT_ASSESSED),
        span("p1-deep-incomplete", SpanStatus.INCOMPLETE, new double[] {1, 0.9}));
    List<SpanResult> ranked = SpanRanking.rank(in);
    assertEquals(List.of("na-1", "na-2", "p1-deep-incomplete", "p1-deep", "p1-small",
        "p2-small-more", "p2-small", "incomplete-empty", "clear"),
        ranked.stream().map(SpanResult::id).toList());
    for (int i = 0; i < ranked.size(); i++) {
      assertEquals(i + 1, ranked.get(i).rank().getAsInt());
    }
  }

  @Test
  void onlyAnAssessedSpanWithoutSitesIsClear() {
    assertEquals(true, span("a", SpanStatus.ASSESSED).clear());
    assertEquals(false, span("b", SpanStatus.INCOMPLETE).clear());
    assertEquals(false, span("c", SpanStatus.NOT_ASSESSED).clear());
    assertEquals(false, span("d", SpanStatus.ASSESSED, new double[] {3, 0.1}).clear());
  }
}
