package org.clearance.wire;

import java.util.HashMap;
import java.util.Map;
import java.util.function.Consumer;
import org.clearance.ground.HeightModel;
import org.clearance.survey.PointChunk;

/**
 * A test stand-in for the ground model: the lowest point per plan cell of the ground class
 * (ASPRS 2), or of all points when the survey has no class 2, looked up in the point's cell or
 * the nearest filled cell within a few rings. Good to a few decimetres on flat ground, which is
 * all the wire finder needs from heights (a candidate threshold and structure ground).
 */
final class LowestGroundGrid implements Consumer<PointChunk>, HeightModel {
  private static final int GROUND = 2;
  private static final int RINGS = 6;

  private final double cell;
  private final Map<Long, double[]> ground = new HashMap<>();
  private final Map<Long, double[]> any = new HashMap<>();

  LowestGroundGrid(double cell) {
    this.cell = cell;
  }

  /** Feeds every chunk of a source to a new grid. */
  static LowestGroundGrid of(PointSource source, double cell) {
    LowestGroundGrid g = new LowestGroundGrid(cell);
    source.stream(() -> g::accept);
    return g;
  }

  private long key(long cx, long cy) {
    return (cx << 32) ^ (cy & 0xFFFFFFFFL);
  }

  @Override
  public synchronized void accept(PointChunk c) {
    for (int i = 0; i < c.size(); i++) {
      long k = key((long) Math.floor(c.x()[i] / cell), (long) Math.floor(c.y()[i] / cell));
      Map<Long, double[]> m = c.classification()[i] == GROUND ? ground : any;
      double[] v = m.computeIfAbsent(k, q -> new double[] {Double.POSITIVE_INFINITY});
      v[0] = Math.min(v[0], c.z()[i]);
    }
  }

  @Override
  public double heightAboveGround(double x, double y, double z) {
    Map<Long, double[]> m = ground.isEmpty() ? any : ground;
    long cx = (long) Math.floor(x / cell);
    long cy = (long) Math.floor(y / cell);
    for (int r = 0; r <= RINGS; r++) {
      double best = Double.POSITIVE_INFINITY;
      for (long dx = -r; dx <= r; dx++) {
        for (long dy = -r; dy <= r; dy++) {
          if (Math.max(Math.abs(dx), Math.abs(dy)) != r) {
            continue;
          }
          double[] v = m.get(key(cx + dx, cy + dy));
          if (v != null) {
            best = Math.min(best, v[0]);
          }
        }
      }
      if (best < Double.POSITIVE_INFINITY) {
        return z - best;
      }
    }
    return Double.NaN;
  }
}
