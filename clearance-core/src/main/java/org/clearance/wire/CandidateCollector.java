package org.clearance.wire;

import java.util.List;
import java.util.Objects;
import java.util.function.Consumer;
import org.clearance.ground.HeightModel;
import org.clearance.ground.SparseGrid;
import org.clearance.line.SpanFrame;
import org.clearance.survey.PointChunk;

/**
 * Keeps, per span, the survey points that may lie on a wire while the survey streams by
 * (package-private). One collector per reading thread; {@link #absorb} merges them.
 *
 * <p>Kept: points labelled as wires (ASPRS class 13 or 14) anywhere in a span's corridor, and
 * points never classified or unclassified (class 0 or 1) at least the corridor's minimum height
 * above ground. Every other class was given a meaning by the survey's classifier (ground,
 * vegetation, building, noise, tower, ...) and is not a wire; withheld points are skipped.
 * Every other point that is not ground, noise or a labelled wire (ASPRS class 2, 7, 18, 13,
 * 14), in a corridor below the candidate height or in the {@value StandingGrid#BAND_M} m band
 * around it, goes to the corridor's {@link StandingGrid}: the evidence of what stands under and
 * beside a small group of candidates ({@link PointEvidence}). Unlabelled points below the
 * candidate height near the conductors' offsets are kept apart as well ({@link SpanPoints#low}):
 * a conductor sagging below that height passes through them ({@link LowWirePoints}). Points of
 * class 0 or 1 at least the minimum height above ground in the band of {@link CrossingBand#BAND_M}
 * around a corridor are kept apart: the clearance engine measures them, and a wire crossing the
 * span is followed into them ({@link CrossingBand}).
 */
final class CandidateCollector implements Consumer<PointChunk> {
  /** ASPRS class 0: created, never classified. */
  static final int NEVER_CLASSIFIED = 0;
  /** ASPRS class 1: unclassified. */
  static final int UNCLASSIFIED = 1;
  /** ASPRS class 2: ground. */
  static final int GROUND = 2;
  /** ASPRS class 7: low point (noise). */
  static final int LOW_NOISE = 7;
  /** ASPRS class 18: high noise. */
  static final int HIGH_NOISE = 18;

  private final List<SpanCorridor> corridors;
  private final CorridorIndex index;
  private final HeightModel heights;
  private final SpanPoints[] points;
  /** Per corridor, the open points in the band of {@link CrossingBand#BAND_M} around it. */
  private final SpanPoints[] outer;
  private final long[] seen;
  private final boolean[] sortedOnce;

  CandidateCollector(List<SpanCorridor> corridors, CorridorIndex index, HeightModel heights) {
    this.corridors = List.copyOf(corridors);
    this.index = Objects.requireNonNull(index, "index");
    this.heights = Objects.requireNonNull(heights, "heights");
    this.points = new SpanPoints[corridors.size()];
    this.outer = new SpanPoints[corridors.size()];
    this.seen = new long[corridors.size()];
    this.sortedOnce = new boolean[corridors.size()];
    SparseGrid standing = StandingGrid.newRaster();
    for (int k = 0; k < points.length; k++) {
      points[k] = new SpanPoints(corridors.get(k).zRef(), StandingGrid.shared(standing, k));
      outer[k] = new SpanPoints(corridors.get(k).zRef());
    }
  }

  @Override
  public void accept(PointChunk chunk) {
    double[] x = chunk.x();
    double[] y = chunk.y();
    double[] z = chunk.z();
    short[] cls = chunk.classification();
    byte[] flags = chunk.flags();
    for (int i = 0, n = chunk.size(); i < n; i++) {
      if ((flags[i] & PointChunk.FLAG_WITHHELD) != 0) {
        continue;
      }
      int[] near = index.at(x[i], y[i]);
      if (near.length == 0) {
        continue;
      }
      int k = cls[i];
      boolean label = k == SpanPoints.SHIELD_CLASS || k == SpanPoints.CONDUCTOR_CLASS;
      boolean open = k == NEVER_CLASSIFIED || k == UNCLASSIFIED;
      boolean standing = !label && k != GROUND && k != LOW_NOISE && k != HIGH_NOISE;
      double hag = Double.NaN;
      boolean hagDone = false;
      for (int c : near) {
        SpanCorridor corridor = corridors.get(c);
        SpanFrame f = corridor.frame();
        double s = f.station(x[i], y[i]);
        double e = f.offset(x[i], y[i]);
        boolean inside = corridor.contains(s, e);
        boolean band = !inside && standing && corridor.contains(s, e, StandingGrid.BAND_M);
        boolean beyond = !inside && open && corridor.contains(s, e, CrossingBand.BAND_M);
        if (!inside && !band && !beyond) {
          continue;
        }
        if (inside) {
          seen[c]++;
        }
        if (!label && !standing) {
          continue;
        }
        if (!hagDone) {
          hag = heights.heightAboveGround(x[i], y[i], z[i]);
          hagDone = true;
        }
        if (inside && (label || open && hag >= corridor.minHeightM())) {
          points[c].add(s, e, z[i], hag, k, SetAside.key(x[i], y[i], z[i]));
          continue;
        }
        if (inside || band) {
          points[c].standing().add(s, e, hag);
          if (inside && open && corridor.holdsLow(e, hag)) {
            points[c].low().add(s, e, z[i], hag, k, SetAside.key(x[i], y[i], z[i]));
          }
        }
        if (beyond && hag >= corridor.minHeightM()) {
          outer[c].add(s, e, z[i], hag, k, SetAside.key(x[i], y[i], z[i]));
        }
      }
    }
  }

  /** Moves everything another collector (same corridors) holds into this one. */
  void absorb(CandidateCollector other) {
    for (int k = 0; k < points.length; k++) {
      points[k].addAll(other.points[k]);
      outer[k].addAll(other.outer[k]);
      seen[k] += other.seen[k];
    }
  }

  /** The candidates of corridor k, sorted by station (sorts in place, once). */
  SpanPoints sorted(int k) {
    if (!sortedOnce[k]) {
      points[k].sort();
      outer[k].sort();
      sortedOnce[k] = true;
    }
    return points[k];
  }

  /** The open points of the band around corridor k ({@link CrossingBand}), sorted by station
   * (sorts in place, once: call after {@link #sorted}). */
  SpanPoints outer(int k) {
    if (!sortedOnce[k]) {
      throw new IllegalStateException("outer before sorted: " + k);
    }
    return outer[k];
  }

  /** Drops the candidates of corridor k once its span is done, so memory falls as spans end
   * (its standing grid stays, in the shared raster, outside the heap once that is large). */
  void release(int k) {
    points[k] = new SpanPoints(corridors.get(k).zRef(), points[k].standing());
    outer[k] = new SpanPoints(corridors.get(k).zRef());
  }

  /** Number of survey points of any class that fell inside corridor k. */
  long seen(int k) {
    return seen[k];
  }
}
