package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.clearance.line.SpanFrame;
import org.clearance.survey.PointChunk;
import org.junit.jupiter.api.Test;

/**
 * A conductor sagging below the wire-candidate floor ({@link LowWirePoints}, issue 9: the demo
 * feeder's neutral at 2.7-3.0 m over a dip, seed 43, measured as vegetation). Its points below
 * the floor on the fitted curve are set aside as wire; grass and shrubs under it are measured,
 * and so is a point on the curve that a shrub touches (within 0.3 m). Geometry made up: an 80 m
 * span (the demo feeder's 60-90 m), a neutral attached 5 m up with catenary parameter 300 m
 * (sag 2.67 m, lowest 2.33 m above ground), 3 cm Gaussian noise (the demo feeder's wire noise,
 * 2-4 cm), seeded.
 */
class LowWirePointsTest {
  private static final double GROUND_Z = 100.0;
  private static final double FLOOR_M = 3.0;
  private static final double NOISE_M = 0.03;
  private static final SpanFrame FRAME = SpanFrame.between(1000, 2000, 1080, 2000);
  private static final ConductorCurve NEUTRAL = new ConductorCurve(FRAME,
      Catenary.through(0, GROUND_Z + 5, 80, GROUND_Z + 5, 300));

  /** A return this near the true curve is the neutral's, m: 2.4 standard deviations of the
   * noise across and up (computed: 0.1 / hypot(0.03, 0.03)). */
  private static final double ON_TRUTH_M = 0.1;
  /** A return farther than this from the true curve is no neutral return, m (10 sigma). */
  private static final double OFF_TRUTH_M = 0.3;

  private final SplittableRandom rng = new SplittableRandom(43);

  /** Adds a point to the candidates or, below the floor, to the low points; returns its key. */
  private static void add(SpanPoints p, double s, double e, double z, long key) {
    double h = z - GROUND_Z;
    (h >= FLOOR_M ? p : p.low()).add(s, e, z, h, CandidateCollector.UNCLASSIFIED, key);
  }

  private static SetAside run(SpanPoints p) {
    p.sort();
    boolean[] on = new boolean[p.size()];
    SetAside out = SetAside.none();
    PointEvidence.setAside(p, on, on, on, SetAside.none(), FLOOR_M, 80, Double.NaN, FRAME,
        List.of(NEUTRAL), null, out);
    return out;
  }

  @Test
  void lowPointsOnTheFittedCurveAreWireAndUndergrowthIsMeasured() {
    SpanPoints p = new SpanPoints(GROUND_Z);
    List<Long> lowWire = new ArrayList<>();
    long key = 1;
    for (double s = 3; s <= 77; s += 0.5) {
      double z = NEUTRAL.curve().z(s) + NOISE_M * rng.nextGaussian();
      if (s >= 50 && s <= 52) {
        continue; // the stretch the shrub below touches is added with it
      }
      add(p, s, NOISE_M * rng.nextGaussian(), z, key);
      if (z - GROUND_Z < FLOOR_M) {
        lowWire.add(key);
      }
      key++;
    }
    // grass 0.3-1.4 m high under the lowest part: never within the curve's 0.16 m
    List<Long> grass = new ArrayList<>();
    for (int k = 0; k < 200; k++) {
      double s = rng.nextDouble(25, 55);
      add(p, s, rng.nextDouble(-2, 2), GROUND_Z + rng.nextDouble(0.3, 1.4), 1000L + k);
      grass.add(1000L + k);
    }
    // a shrub whose top reaches the neutral at station 51: a dome of 0.8 m radius, 150 returns
    // (75 per m^2); the returns of its top within 0.16 m of the curve are measured as well, as
    // the rest of the shrub lies within 0.3 m of them
    List<Long> shrub = new ArrayList<>();
    List<double[]> shrubAt = new ArrayList<>();
    double top = NEUTRAL.curve().z(51) - GROUND_Z;
    for (int k = 0; k < 150; k++) {
      double up = rng.nextDouble(0, 1);
      double r = 0.8 * Math.sqrt(1 - up * up);
      double a = rng.nextDouble(0, 2 * Math.PI);
      double[] at = {51 + r * Math.cos(a), r * Math.sin(a), GROUND_Z + top - 0.8 + 0.8 * up};
      add(p, at[0], at[1], at[2], 2000L + k);
      shrub.add(2000L + k);
      shrubAt.add(at);
    }
    // the neutral's points over the shrub, on the curve: touched where a shrub return off the
    // curve (farther than 0.16 m) is within the touch distance (0.3 m), wire elsewhere (a return
    // on the curve cannot be told from the wire: it touches nothing, and is measured as its
    // shrub touches it)
    List<Long> overShrub = new ArrayList<>();
    List<Boolean> touches = new ArrayList<>();
    for (double s = 50; s <= 52; s += 0.25) {
      double z = NEUTRAL.curve().z(s);
      add(p, s, 0, z, 3000L + overShrub.size());
      overShrub.add(3000L + overShrub.size());
      boolean near = false;
      for (double[] at : shrubAt) {
        boolean onCurve = Math.abs(at[1]) <= WirePiece.TOL_M
            && Math.abs(at[2] - NEUTRAL.curve().z(at[0])) <= WirePiece.TOL_M;
        near |= !onCurve && Math.sqrt((at[0] - s) * (at[0] - s) + at[1] * at[1] + (at[2] - z) * (at[2] - z))
            <= PointEvidence.TOUCH_M;
      }
      touches.add(near);
    }
    SetAside out = run(p);
    assertTrue(lowWire.size() >= 40, "low wire points " + lowWire.size());
    for (long k : lowWire) {
      assertEquals(SetAside.Reason.WIRE, out.reason(k), "low wire point " + k);
    }
    for (long k : grass) {
      assertEquals(SetAside.Reason.NONE, out.reason(k), "grass " + k);
      assertEquals(false, out.touchedWire(k));
    }
    for (long k : shrub) {
      assertEquals(SetAside.Reason.NONE, out.reason(k), "shrub " + k);
    }
    int touched = 0;
    for (int k = 0; k < overShrub.size(); k++) {
      long w = overShrub.get(k);
      assertEquals(touches.get(k) ? SetAside.Reason.NONE : SetAside.Reason.WIRE,
          out.reason(w), "wire over the shrub " + w);
      assertEquals(touches.get(k), out.touchedWire(w), "wire over the shrub " + w);
      touched += touches.get(k) ? 1 : 0;
    }
    assertTrue(touched >= 3, "wire points the shrub touches: " + touched);
  }

  /** Without a fitted curve nothing below the floor is set aside. */
  @Test
  void withoutAFitNothingBelowTheFloorIsSetAside() {
    SpanPoints p = new SpanPoints(GROUND_Z);
    for (double s = 25; s <= 55; s += 0.5) {
      add(p, s, 0, NEUTRAL.curve().z(s), (long) (s * 10));
    }
    p.sort();
    boolean[] none = new boolean[p.size()];
    SetAside out = SetAside.none();
    PointEvidence.setAside(p, none, none, none, SetAside.none(), FLOOR_M, 80, Double.NaN, FRAME,
        List.of(), null, out);
    assertEquals(0, out.wireCount());
  }

  /**
   * The whole finder on a made-up feeder-like line of 80 m spans in an unclassified survey: a
   * neutral attached 5 m up under three phases at 20 m, hanging 2.8-5 m above ground (catenary
   * parameter 360 m; 26 m of each span below the floor, like the demo's neutral over a dip), or
   * 3.4-5 m (500 m, low in its whole span). It is fitted in every span, and
   * every unclassified return within {@value #ON_TRUTH_M} m of its true curve below the 3 m floor
   * (at least 1 m up) is set aside as wire; no point below the floor farther than {@value
   * #OFF_TRUTH_M} m from it is (the touch distance: no neutral return lies that far off).
   */
  @Test
  void lowNeutralIsFoundAndItsLowPointsAreWire() {
    for (double c : new double[] {360, 500}) {
      List<SyntheticCorridor.Position> positions = new ArrayList<>(
          SyntheticCorridor.standardPositions().subList(0, 3));
      positions.add(new SyntheticCorridor.Position("N", false, 3.0, 5.0, c, 8, 1, 0));
      int n = 4;
      double[] x = new double[n];
      double[] y = new double[n];
      for (int i = 0; i < n; i++) {
        x[i] = 500_000 + 80 * i * 0.8;
        y[i] = 4_000_000 + 80 * i * 0.6;
      }
      SyntheticCorridor corridor = new SyntheticCorridor(x, y, new double[n], positions,
          SyntheticCorridor.Mode.UNCLASSIFIED, 43, new double[n - 1][4][0], new double[n - 1]);
      WireResult r = new WireFinder(Fixtures.options(false)).find(corridor,
          Fixtures.layout(corridor), corridor);
      SyntheticCorridor.Position neutral = positions.get(3);
      for (int k = 0; k < n - 1; k++) {
        FittedConductor f = r.spans().get(k).conductor("N").orElseThrow();
        assertTrue(f.isFitted(), "c " + c + " span " + k + " " + f.reason());
      }
      int[] counts = new int[3]; // low returns on the neutral, set aside; others set aside
      corridor.stream(() -> chunk -> {
        for (int i = 0; i < chunk.size(); i++) {
          double h = corridor.heightAboveGround(chunk.x()[i], chunk.y()[i], chunk.z()[i]);
          if (h >= FLOOR_M || h < LowWirePoints.MIN_HEIGHT_M) {
            continue;
          }
          boolean wire = SetAside.Reason.WIRE == r.setAside().reason(
              SetAside.key(chunk.x()[i], chunk.y()[i], chunk.z()[i]));
          double d = fromTruth(corridor, neutral, chunk, i);
          if (d <= ON_TRUTH_M) {
            counts[0]++;
            counts[1] += wire ? 1 : 0;
          } else if (d > OFF_TRUTH_M) {
            counts[2] += wire ? 1 : 0;
          }
        }
      });
      if (c == 360) {
        assertTrue(counts[0] > 100, "low neutral returns " + counts[0]);
      }
      assertEquals(counts[0], counts[1], "c " + c + ": low neutral returns set aside");
      assertEquals(0, counts[2], "c " + c + ": other low points set aside");
    }
  }

  /** Distance of point i from the position's true curve, m (across and up, least over the
   * spans). */
  private static double fromTruth(SyntheticCorridor c, SyntheticCorridor.Position p,
      PointChunk chunk, int i) {
    double best = Double.POSITIVE_INFINITY;
    for (int k = 0; k < c.spans(); k++) {
      ConductorCurve t = c.truth(k, p);
      double s = t.plan().station(chunk.x()[i], chunk.y()[i]);
      if (s >= 0 && s <= t.length()) {
        best = Math.min(best, Math.hypot(t.plan().offset(chunk.x()[i], chunk.y()[i]),
            chunk.z()[i] - t.z(s)));
      }
    }
    return best;
  }
}
