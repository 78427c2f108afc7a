package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.clearance.survey.PointChunk;
import org.junit.jupiter.api.Test;

/**
 * Wood poles located from constructed points (issue 15): flat ground at z = 0, a line along +x
 * with three conductors 1 m apart at 10 m, a structures-file position at the origin. A bare
 * trunk 2 m beside the line is a thin column too, but the wires do not converge on it.
 */
class PoleFinderTest {

  private static final PoleFinder.Site SITE = new PoleFinder.Site(
      Fixtures.structure("P1", 1, 0, 0), 1, 0, 9.0, 10.5, 1.0, false);

  private static void column(PointChunk c, double x, double y) {
    for (int k = 0; k < 14; k++) {
      double a = Math.toRadians(77 * k);
      c.add(x + 0.15 * Math.cos(a), y + 0.15 * Math.sin(a), 0.7 + 0.8 * k, 1);
    }
  }

  private static void wires(PointChunk c, double y0) {
    for (double x = -7; x <= 7; x += 0.25) {
      for (double off = -1; off <= 1; off += 1) {
        c.add(x, y0 + off, 10.0, 1);
      }
    }
  }

  private static PoleFinder.Result locate(PointChunk c) {
    List<PoleFinder.Result> r = PoleFinder.locate(PointSource.sequential(k -> k.accept(c)),
        List.of(SITE), (x, y, z) -> z);
    return r.get(0);
  }

  @Test
  void aPoleWithItsWiresRepairsThePosition() {
    PointChunk c = new PointChunk(1000);
    column(c, 0.8, -0.3);
    wires(c, -0.3);
    column(c, 0.5, 2.3);    // a bare trunk 2.6 m beside the line
    PoleFinder.Result r = locate(c);
    assertEquals(PoleFinder.Outcome.FOUND, r.outcome(), r.why());
    // constructed points lie exactly on the 0.15 m circle: the centre to rounding
    assertEquals(0.8, r.x(), 0.02);
    assertEquals(-0.3, r.y(), 0.02);
    assertEquals(Math.hypot(0.8, 0.3), r.shiftM(), 0.02);
  }

  @Test
  void aTrunkBesideTheWiresIsNotTaken() {
    PointChunk c = new PointChunk(1000);
    wires(c, 0);
    column(c, 0.5, 2.0);    // no pole, a trunk 2 m beside the line
    assertEquals(PoleFinder.Outcome.NOT_FOUND, locate(c).outcome());
  }

  @Test
  void twoPolesUnderTheWiresAreAmbiguous() {
    PointChunk c = new PointChunk(1000);
    wires(c, 0);
    column(c, -1.0, 0.0);
    column(c, 1.0, 0.0);
    assertEquals(PoleFinder.Outcome.AMBIGUOUS, locate(c).outcome());
  }
}
