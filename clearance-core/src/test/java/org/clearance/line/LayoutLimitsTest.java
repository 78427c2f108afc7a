package org.clearance.line;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.List;
import org.clearance.survey.SurveyUnits;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Span ids that would collide, spans too long to be real and coordinates out of range. */
class LayoutLimitsTest {

  private static final SurveyUnits METRES = SurveyUnits.metres("test");

  @TempDir Path dir;

  private SpanLayout layout(Path file) {
    return SpanLayout.build(StructureReader.read(file, METRES),
        List.of(SpanLayoutTest.spec("L", "l.yaml")));
  }

  /** Bug (issue 10 item 4): A, B-C, A-B, C gave two spans "A-B-C"; one overwrote the other. */
  @Test
  void collidingSpanIdsAreRefused() {
    Path f = InputErrors.write(dir, "s.csv",
        "structure_id,x,y\nA,0,0\nB-C,100,0\nA-B,200,0\nC,300,0\n");
    InputErrors.check(f, 4, "structure_id", "gets the id 'A-B-C', which the span from 'A' to"
        + " 'B-C'", () -> layout(f));
  }

  @Test
  void idsWithDashesThatDoNotCollideAreKept() {
    Path f = InputErrors.write(dir, "s.csv",
        "structure_id,x,y\nT-1,0,0\nT-2,100,0\nT-3,200,0\n");
    assertEquals(List.of("T-1-T-2", "T-2-T-3"),
        layout(f).spans().stream().map(Span::id).toList());
  }

  /** Bug (issue 10 item 7): x = 1487195 for 487195 ran 35 s and died of OutOfMemoryError. */
  @Test
  void spanLongerThanAnyRealOneIsRefused() {
    Path f = InputErrors.write(dir, "s.csv",
        "structure_id,x,y\nP1,487000,4100000\nP2,1487195,4100100\nP3,487400,4100200\n");
    InputErrors.check(f, 3, "x", "stands 1000195 m from 'P1'", () -> layout(f));
  }

  @Test
  void longCrossingSpanIsAccepted() {
    // 5 376 m: about the longest span in service (from memory), inside the 6 000 m limit
    Path f = InputErrors.write(dir, "s.csv", "structure_id,x,y\nP1,0,0\nP2,5376,0\n");
    assertEquals(5376, layout(f).spans().get(0).lengthM(), 1e-9);
  }

  @Test
  void coordinateBeyondAnyProjectionIsRefused() {
    Path f = InputErrors.write(dir, "s.csv", "structure_id,x,y\nP1,1e300,0\nP2,100,0\n");
    InputErrors.check(f, 2, "x", "outside the plausible range", () -> layout(f));
  }

  @Test
  void elevationBeyondAnyGroundIsRefused() {
    Path f = InputErrors.write(dir, "s.csv",
        "structure_id,x,y,ground_z\nP1,0,0,120\nP2,100,0,120000\n");
    InputErrors.check(f, 3, "ground_z", "120000 m is outside", () -> layout(f));
  }
}
