package org.clearance.assess;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.clearance.clearance.ConditionDistance;
import org.clearance.clearance.PointClearance;
import org.clearance.clearance.SpanContext;
import org.clearance.clearance.UncertaintyFile;
import org.clearance.rules.PointFinding;
import org.clearance.rules.RuleProfile;
import org.clearance.rules.RuleProfiles;
import org.clearance.rules.SpanRules;
import org.clearance.rules.ZoneEvaluator;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Findings with confidence (issue 14): a point is a violation when the upper end of its interval
 * is inside the zone, a possible violation when the zone's distance lies within the interval,
 * clear otherwise. Zone: PRC 4293 at 230 kV, 3.048 m radial in every condition (10 ft,
 * published); 95 % two-sided, k = 1.960 (normal quantile, JCGM 100:2008 Table G.1).
 *
 * <p>Hand-computable sigma [computed]: the stored conductor uncertainty is 0.10 m at every
 * station, the point lies straight above the conductor (|v| / d = 1), the point accuracy is
 * 0.10 m vertical: sigma = sqrt(0.10^2 + 0.10^2) = 0.1414 m, k sigma = 0.2772 m.
 */
class DistanceIntervalsTest {

  @TempDir Path dir;
  private DistanceIntervals intervals;
  private SpanRules rules;

  @BeforeEach
  void setUp() throws IOException {
    Path profile = Files.writeString(dir.resolve("p95.yaml"), "name: p95\ntitle: test\n"
        + "source: a test\nextends: ca-prc4293\nconfidence_percent: 95\n");
    RuleProfile p = RuleProfiles.byNameOrPath(profile.toString());
    assertEquals(1.959964, p.coverageFactor(), 1e-6); // normal quantile at 0.975 [published]
    StringBuilder u = new StringBuilder("# horizontal_rmse_m,0.15\n# vertical_rmse_m,0.10\n"
        + "span_id,conductor,condition,input,length_m,swings");
    for (int j = 0; j < 11; j++) {
      u.append(",s").append(j).append("_m");
    }
    u.append("\nS1,A,hot,survey temperature,200,false");
    for (int j = 0; j < 11; j++) {
      u.append(",0.1");
    }
    u.append('\n');
    Path file = Files.writeString(dir.resolve(UncertaintyFile.FILE_NAME), u.toString());
    intervals = new DistanceIntervals(UncertaintyFile.read(file).orElseThrow(),
        p.coverageFactor(), 95);
    rules = new ZoneEvaluator(p).forSpan(new SpanContext("S1", "L1", 230, 0, 200));
  }

  private DistanceIntervals.Outcome at(double hotDistance) {
    PointClearance p = new PointClearance("S1", 0, 0, 0, 5, 10, List.of(
        new ConditionDistance("survey", "survey", 8, 0, 8, "A", 100),
        new ConditionDistance("hot", "hot", hotDistance, 0, hotDistance, "A", 100)));
    return intervals.evaluate(rules, p);
  }

  @Test
  void wellInsideIsAViolation() {
    DistanceIntervals.Outcome o = at(2.0); // 2.0 + 0.277 < 3.048
    assertEquals(PointFinding.Verdict.INSIDE_ZONE, o.finding().verdict());
    FindingInterval i = o.interval().orElseThrow();
    assertEquals(FindingInterval.Verdict.VIOLATION, i.verdict());
    assertEquals(0.1414, i.sigmaM(), 1e-4);
    assertEquals(2.0 - 0.2772, i.lowM(), 1e-4);
    assertEquals(2.0 + 0.2772, i.highM(), 1e-4);
    assertEquals("survey temperature", i.dominant()); // ties go to the first input
  }

  @Test
  void insideButWithinTheIntervalIsPossible() {
    FindingInterval i = at(2.9).interval().orElseThrow(); // 2.9 + 0.277 > 3.048
    assertEquals(FindingInterval.Verdict.POSSIBLE_VIOLATION, i.verdict());
  }

  @Test
  void outsideButWithinTheIntervalIsPossibleAndKeepsItsMeasuredDistance() {
    DistanceIntervals.Outcome o = at(3.2); // 3.2 - 0.277 < 3.048
    assertEquals(PointFinding.Verdict.INSIDE_ZONE, o.finding().verdict());
    assertEquals(FindingInterval.Verdict.POSSIBLE_VIOLATION, o.interval().orElseThrow().verdict());
    assertEquals(3.2, o.finding().violation().orElseThrow().actualM(), 1e-9);
    // deficit from the lower bound: 3.048 - (3.2 - 0.2772)
    assertEquals(3.048 - 3.2 + 0.2772, o.finding().violation().orElseThrow().deficitM(), 1e-4);
  }

  @Test
  void outsideTheWholeIntervalIsClear() {
    DistanceIntervals.Outcome o = at(3.4); // 3.4 - 0.277 > 3.048
    assertEquals(PointFinding.Verdict.CLEAR, o.finding().verdict());
    assertTrue(o.interval().isEmpty());
  }
}
