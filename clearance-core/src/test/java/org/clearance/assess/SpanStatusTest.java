package org.clearance.assess;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.clearance.InputException;
import org.clearance.clearance.ConditionDistance;
import org.clearance.clearance.NearPointFile;
import org.clearance.clearance.NearPointWriter;
import org.clearance.clearance.PointClearance;
import org.clearance.clearance.SpanStatus;
import org.clearance.run.RunFixture;
import org.clearance.rules.RuleProfile;
import org.clearance.rules.RuleProfileReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** How a span's status follows from the engine, the profile and its points: never clear. */
class SpanStatusTest {

  @TempDir Path dir;

  private static RuleProfile profile(String... lines) {
    List<String> all = new ArrayList<>(List.of("name: t", "title: T", "source: S"));
    all.addAll(List.of(lines));
    return RuleProfileReader.parse(String.join("\n", all), "t.yaml");
  }

  private static final String REF = "  - {name: ref, priority: 1, violation_reference: true, "
      + "conditions: [all], radial_m: 3}";

  private RunAssessment assess(RunFixture f, RuleProfile p) throws IOException {
    f.write(dir);
    return RunAssessor.assess(f.model(), dir.resolve(NearPointFile.FILE_NAME), p,
        AssessOptions.defaults());
  }

  private static SpanResult span(RunAssessment a, String id) {
    return a.spans().stream().filter(s -> s.id().equals(id)).findFirst().orElseThrow();
  }

  @Test
  void lineBelowTheProfileVoltageIsNotAssessed() throws IOException {
    RunAssessment a = assess(RunFixture.metric(), profile("applies_from_kv: 200", "zones:",
        REF));
    SpanResult r = span(a, "KV-10-11");
    assertEquals(SpanStatus.NOT_ASSESSED, r.status());
    assertTrue(r.reason().startsWith("rule profile t: "), r.reason());
    assertEquals(List.of(), r.sites(), "a span not covered has no findings at all");
  }

  @Test
  void referenceZoneInAConditionTheRunLacksIsNotAssessed() throws IOException {
    RunAssessment a = assess(RunFixture.metric(), profile("zones:",
        "  - {name: ref, priority: 1, violation_reference: true, conditions: [ice], "
            + "radial_m: 3}"));
    SpanResult r = span(a, "KV-12-13");
    assertEquals(SpanStatus.NOT_ASSESSED, r.status());
    assertTrue(r.reason().contains("no condition the violation-reference zone ref"),
        r.reason());
  }

  @Test
  void zoneInAConditionTheRunLacksMakesTheSpanIncomplete() throws IOException {
    RunAssessment a = assess(RunFixture.metric(), profile("zones:", REF,
        "  - {name: iced, priority: 2, conditions: [ice], radial_m: 5}"));
    SpanResult r = span(a, "KV-12-13");
    assertEquals(SpanStatus.INCOMPLETE, r.status());
    assertTrue(r.reason().contains("zone iced not checked"), r.reason());
    assertTrue(!r.clear());
  }

  @Test
  void zoneWiderThanTheStoredDistancesMakesTheSpanIncomplete() throws IOException {
    // Regression: a zone reaching beyond the keep radius (15 m in the fixture) found no points
    // there, because none were stored, and the span could read clear.
    RunAssessment a = assess(RunFixture.metric(), profile("zones:", REF,
        "  - {name: wide, priority: 2, conditions: [all], radial_m: 20}"));
    SpanResult r = span(a, "KV-12-13");
    assertEquals(SpanStatus.INCOMPLETE, r.status());
    assertTrue(r.reason().contains("zone wide reaches 20.00 m from the conductors, beyond the "
        + "15.00 m"), r.reason());
    assertTrue(r.reason().contains("--keep-radius 20 or more"), r.reason());
    assertTrue(!r.clear());
  }

  @Test
  void pointsWithoutDistancesMakeTheSpanIncomplete() throws IOException {
    RunFixture f = RunFixture.metric();
    // the engine could not compute any distance for one point of the clear span (NaN)
    PointClearance p = f.points.stream().filter(q -> q.spanId().equals("KV-12-13"))
        .findFirst().orElseThrow();
    List<ConditionDistance> nan = new ArrayList<>();
    for (ConditionDistance d : p.distances()) {
      nan.add(new ConditionDistance(d.condition(), d.group(), Double.NaN, Double.NaN,
          Double.NaN, d.conductor(), Double.NaN));
    }
    f.points.set(f.points.indexOf(p), new PointClearance(p.spanId(), p.x(), p.y(), p.z(),
        p.classification(), p.heightAboveGround(), nan));
    SpanResult r = span(assess(f, profile("zones:", REF)), "KV-12-13");
    assertEquals(SpanStatus.INCOMPLETE, r.status());
    assertEquals(1, r.pointsNotAssessed());
    assertTrue(r.reason().startsWith("1 vegetation point not checked"), r.reason());
  }

  @Test
  void nearPointsOfAnotherRunAreAnInputError() throws IOException {
    RunFixture f = RunFixture.metric();
    f.write(dir);
    Path other = dir.resolve("other.bin");
    try (NearPointWriter w = new NearPointWriter(other, new NearPointFile(List.of("survey"),
        List.of("survey"), List.of("X"), List.of("A")))) {
      w.write(List.of());
    }
    InputException e = assertThrows(InputException.class, () -> RunAssessor.assess(f.model(),
        other, profile("zones:", REF), AssessOptions.defaults()));
    assertTrue(e.getMessage().contains("different runs"), e.getMessage());
  }
}
