package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.clearance.line.Span;
import org.clearance.line.SpanLayout;
import org.clearance.survey.PointChunk;
import org.junit.jupiter.api.Test;

/** Which survey points are kept per span while the survey streams by. */
class CandidateCollectorTest {

  @Test
  void keepsWireLabelsAndHighUnclassifiedPointsInTheCorridorOnly() {
    SyntheticCorridor c = SyntheticCorridor.standard(SyntheticCorridor.Mode.LABELLED, 1);
    SpanLayout layout = Fixtures.layout(c);
    WireFinder finder = new WireFinder(Fixtures.options(false));
    Span span = layout.spans().get(0);
    SpanCorridor corridor = finder.corridor(span, layout.lines().get(0).spec(), c);
    // spec offsets up to 7 m plus the 8 m margin; unlabelled points from 0.25 x 20 m = 5 m up
    assertEquals(15, corridor.halfWidthM(), 1e-12);
    assertEquals(5, corridor.minHeightM(), 1e-12);
    CandidateCollector cc = new CandidateCollector(List.of(corridor),
        new CorridorIndex(List.of(corridor.corners())), c);
    PointChunk chunk = new PointChunk(16);
    double[][] at = {
      {100, 0, 6, 1}, // unclassified, 6 m up: kept
      {100, 0, 4, 1}, // unclassified, 4 m up: too low
      {100, 0, 4, 14}, // labelled conductor, any height: kept
      {100, 14.9, 10, 0}, // never classified, inside the half-width: kept
      {100, 15.1, 10, 13}, // labelled shield, outside the half-width
      {-2.5, 0, 10, 14}, // 2.5 m before the first structure: beyond the 2 m margin
      {100, 0, 10, 5}, // high vegetation: classified as something else
      {100, 0, 10, 15}, // tower
      {100, 0, 10, 1} // withheld below
    };
    for (double[] a : at) {
      double x = span.frame().x(a[0], a[1]);
      double y = span.frame().y(a[0], a[1]);
      chunk.add(x, y, c.groundZ(x, y) + a[2], (int) a[3]);
    }
    chunk.flags()[at.length - 1] = PointChunk.FLAG_WITHHELD;
    cc.accept(chunk);
    SpanPoints p = cc.sorted(0);
    assertEquals(3, p.size());
    // every point of any class inside the corridor box counts as seen, withheld ones not
    assertEquals(6, cc.seen(0));
    assertEquals(14, p.cls(0), "sorted by station, then offset, elevation");
    assertEquals(4, p.hag(0), 1e-6);
  }

  /** What stands under or beside the candidates goes to the span's {@link StandingGrid}. */
  @Test
  void recordsStandingPointsThatAreNotCandidates() {
    SyntheticCorridor c = SyntheticCorridor.standard(SyntheticCorridor.Mode.LABELLED, 1);
    SpanLayout layout = Fixtures.layout(c);
    WireFinder finder = new WireFinder(Fixtures.options(false));
    Span span = layout.spans().get(0);
    SpanCorridor corridor = finder.corridor(span, layout.lines().get(0).spec(), c);
    CandidateCollector cc = new CandidateCollector(List.of(corridor),
        new CorridorIndex(List.of(corridor.corners(StandingGrid.BAND_M))), c);
    PointChunk chunk = new PointChunk(16);
    double[][] at = {
      {100, 0, 4, 1}, // unclassified crown, 4 m up (below the 5 m candidate floor): standing
      {110, 0, 9, 5}, // high vegetation label above the floor: standing, not a candidate
      {120, 15.5, 9, 1}, // unclassified, in the 1 m band outside the 15 m half-width: standing
      {130, 16.5, 9, 1}, // beyond the band: nothing
      {140, 0, 3, 2}, // ground class: nothing
      {150, 0, 3, 18}, // high noise: nothing
      {160, 0, 3, 14}, // labelled conductor: a candidate, not standing
      {170, 0, 0.2, 1} // unclassified ground return: under the grid's 0.5 m floor
    };
    for (double[] a : at) {
      double x = span.frame().x(a[0], a[1]);
      double y = span.frame().y(a[0], a[1]);
      chunk.add(x, y, c.groundZ(x, y) + a[2], (int) a[3]);
    }
    cc.accept(chunk);
    SpanPoints p = cc.sorted(0);
    assertEquals(1, p.size());
    StandingGrid g = p.standing();
    assertEquals(3, g.cells());
    assertEquals(4, g.highestIn(99.5, 100.5, -0.5, 0.5), 1e-3);
    assertEquals(9, g.highestIn(109.5, 110.5, -0.5, 0.5), 1e-3);
    assertEquals(9, g.highestIn(119.5, 120.5, 15, 16), 1e-3);
    // the band point is not inside the corridor: not counted as seen
    assertEquals(6, cc.seen(0));
  }
}
