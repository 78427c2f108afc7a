package org.clearance.assess;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import org.clearance.clearance.SpanStatus;
import org.clearance.run.RunFixture;
import org.clearance.run.RunModel;
import org.clearance.run.SpanRecord;
import org.clearance.run.TreeRecord;
import org.junit.jupiter.api.Test;

/** The work list gathers the sites of one tree into one item (issue 11). */
class WorkListTest {

  private static final double LINK_M = 1.5;

  private static CutSite site(String id, CutSite.Kind kind, int priority, String zone,
      String condition, double x, double y, double z, double deficit, double cut) {
    return new CutSite(id, "KV-10-11", kind, priority, zone, priority == 1, condition, 1,
        1 + deficit, deficit, x, y, z, Double.NaN, Double.NaN, 0, CutSite.Side.LEFT, 0, 10, cut,
        kind == CutSite.Kind.GROW_IN ? OptionalInt.of(5) : OptionalInt.empty(), 1, 0, "B1",
        cut);
  }

  private static List<WorkItem> items(List<CutSite> sites) {
    RunModel model = RunFixture.metric().model();
    SpanRecord span = model.spans().get(0);
    SpanResult r = new SpanResult(span, SpanStatus.ASSESSED, "", sites, OptionalInt.of(1), 10,
        0);
    RunAssessment run = new RunAssessment(model, Optional.empty(), List.of(r), Map.of(), "none",
        false);
    return WorkList.of(run, LINK_M);
  }

  @Test
  void aTreeInsideTwoZonesAndAbleToFallIsOneItemWithEveryReason() {
    // regression (issue 11): the urgent tree was also a separate fall-in row at the same place,
    // and a tree whose crown reached both sides of a phase was two rows
    TreeRecord t = RunFixture.metric().model().trees().get(0);
    double crown = t.crownRadiusM();
    List<CutSite> sites = List.of(
        site("KV-10-11.1", CutSite.Kind.GROW_IN, 1, "prc4293", "hot", t.x() + 0.5, t.y() - 1,
            t.topZ() - 2, 0.8, 4),
        site("KV-10-11.2", CutSite.Kind.GROW_IN, 3, "watch", "survey",
            t.x() - crown - LINK_M + 0.01, t.y(), t.topZ() - 3, 0.2, 6),
        site("KV-10-11.3", CutSite.Kind.FALL_IN, 4, CutSite.FALL_IN_ZONE, "hot", t.x(), t.y(),
            t.topZ(), 2.0, 9),
        site("KV-10-11.4", CutSite.Kind.GROW_IN, 2, "work-trigger", "hot", t.x() + 40, t.y(),
            t.topZ() - 3, 0.4, 7));
    List<WorkItem> items = items(sites);
    assertEquals(2, items.size(), "one tree and one patch");
    WorkItem tree = items.get(0);
    assertEquals(t.id(), tree.treeId());
    assertEquals("zone prc4293 (hot); zone watch (survey); fall-in (hot)", tree.reasons());
    assertEquals(List.of("KV-10-11.1", "KV-10-11.2", "KV-10-11.3"), tree.siteIds());
    assertEquals(WorkItem.Work.REMOVE_TREE, tree.work());
    assertEquals(1, tree.priority());
    assertEquals(0.8, tree.deficitM(), 0.0, "the most urgent zone's deficit");
    assertEquals(4, tree.cutToCycleM(), 0.0, "the lowest cut height of its sites");
    assertEquals(t.x(), tree.x(), 0.0, "located at the tree top");
    WorkItem patch = items.get(1);
    assertEquals("", patch.treeId());
    assertEquals(List.of("KV-10-11.4"), patch.siteIds());
    assertEquals(WorkItem.Work.CLEAR_TO_HEIGHT, patch.work());
    assertEquals("KV-10-11.W2", patch.itemId());
  }

  @Test
  void vegetationBesideTheZoneIsSideTrimmedByItsDeficit() {
    List<CutSite> sites = List.of(site("KV-10-11.1", CutSite.Kind.GROW_IN, 1, "prc4293",
        "blowout", 100, 900, 110, 0.7, Double.NaN));
    WorkItem w = items(sites).get(0);
    assertEquals(WorkItem.Work.SIDE_TRIM, w.work());
    assertEquals(0.7, w.sideTrimM(), 0.0);
  }
}
