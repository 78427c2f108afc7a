package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.clearance.line.Span;
import org.clearance.line.SpanLayout;
import org.clearance.survey.PointChunk;
import org.junit.jupiter.api.Test;

/** Which survey points are kept per span while the survey streams by. */
class CandidateCollectorTest {

  /** The synthetic corridor's first span and its corridor. */
  private static final class Scene {
    final SyntheticCorridor c = SyntheticCorridor.standard(SyntheticCorridor.Mode.LABELLED, 1);
    final Span span;
    final SpanCorridor corridor;

    Scene() {
      SpanLayout layout = Fixtures.layout(c);
      span = layout.spans().get(0);
      corridor = new WireFinder(Fixtures.options(false))
          .corridor(span, layout.lines().get(0).spec(), c);
    }

    /** A collector of the corridor, the index reaching {@code bandM} beyond it, m. */
    CandidateCollector collector(double bandM) {
      return new CandidateCollector(List.of(corridor),
          new CorridorIndex(List.of(corridor.corners(bandM))), c);
    }

    /** Adds points {station, offset, height above ground, class} (m) to the chunk. */
    void add(PointChunk chunk, double[][] at) {
      for (double[] a : at) {
        double x = span.frame().x(a[0], a[1]);
        double y = span.frame().y(a[0], a[1]);
        chunk.add(x, y, c.groundZ(x, y) + a[2], (int) a[3]);
      }
    }
  }

  @Test
  void keepsWireLabelsAndHighUnclassifiedPointsInTheCorridorOnly() {
    Scene scene = new Scene();
    SpanCorridor corridor = scene.corridor;
    // spec offsets up to 7 m plus the 8 m margin; unlabelled points from 0.25 x 20 m = 5 m up
    assertEquals(15, corridor.halfWidthM(), 1e-12);
    assertEquals(5, corridor.minHeightM(), 1e-12);
    CandidateCollector cc = scene.collector(0);
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
    scene.add(chunk, at);
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
    Scene scene = new Scene();
    CandidateCollector cc = scene.collector(StandingGrid.BAND_M);
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
    scene.add(chunk, at);
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

  /**
   * Unlabelled points below the candidate floor, at least 1 m up and within 3 m across of the
   * widest nominal offset (7 m), are kept as low points ({@link LowWirePoints}), and stand in
   * the grid as before.
   */
  @Test
  void keepsLowUnclassifiedPointsNearTheConductorsApart() {
    Scene scene = new Scene();
    SpanCorridor corridor = scene.corridor;
    assertEquals(10, corridor.lowHalfWidthM(), 1e-12);
    CandidateCollector cc = scene.collector(StandingGrid.BAND_M);
    PointChunk chunk = new PointChunk(16);
    double[][] at = {
      {100, 0, 4, 1}, // unclassified, 4 m up, below the 5 m floor: low
      {101, -9.9, 1.2, 0}, // never classified, 1.2 m up, 9.9 m across: low
      {102, 10.2, 4, 1}, // 10.2 m across, beyond 7 + 3 m: standing only
      {103, 0, 0.8, 1}, // under 1 m: grass, standing only
      {104, 0, 4, 5}, // vegetation label: standing only
      {105, 0, 6, 1} // above the floor: a candidate
    };
    scene.add(chunk, at);
    cc.accept(chunk);
    SpanPoints p = cc.sorted(0);
    assertEquals(1, p.size());
    SpanPoints low = p.low();
    assertEquals(2, low.size());
    assertEquals(100, low.s(0), 1e-3);
    assertEquals(4, low.hag(0), 1e-3);
    assertEquals(1.2, low.hag(1), 1e-3);
    assertEquals(4, p.standing().highestIn(99.5, 100.5, -0.5, 0.5), 1e-3);
  }

  /**
   * The open points of the band beyond the corridor are kept apart ({@link CrossingBand}): the
   * clearance engine measures them (issue 9: a crossing service line 0.1-0.5 m beyond the
   * corridor's edge set span minima of the generated feeder).
   */
  @Test
  void keepsOpenPointsOfTheBandApart() {
    Scene scene = new Scene();
    CandidateCollector cc = scene.collector(CrossingBand.BAND_M);
    PointChunk chunk = new PointChunk(16);
    double[][] at = {
      {100, 14, 9, 1}, // inside the 15 m half-width: a candidate
      {110, 16, 9, 1}, // unclassified, 9 m up, 1 m beyond the edge: in the band
      {120, -19.9, 9, 0}, // never classified, 4.9 m beyond the edge: in the band
      {130, 20.5, 9, 1}, // 5.5 m beyond the edge: nothing
      {140, 17, 4, 1}, // in the band but below the 5 m candidate floor
      {150, 17, 9, 5}, // high vegetation label: not an open point
      {160, 17, 9, 14} // labelled conductor beyond the edge
    };
    scene.add(chunk, at);
    cc.accept(chunk);
    assertEquals(1, cc.sorted(0).size());
    SpanPoints band = cc.outer(0);
    assertEquals(2, band.size());
    assertEquals(110, band.s(0), 1e-3);
    assertEquals(-19.9, band.e(1), 1e-3);
    // only points inside the corridor count as seen
    assertEquals(1, cc.seen(0));
  }
}
