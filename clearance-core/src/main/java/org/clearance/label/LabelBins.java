package org.clearance.label;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.util.List;
import java.util.function.Consumer;
import org.clearance.ground.GroundModel;
import org.clearance.line.SpanFrame;
import org.clearance.survey.PointChunk;
import org.clearance.wire.SetAside;

/**
 * One reading thread's part of the single pass: each point looked at ({@link LabelPoints#kind},
 * {@link LabelPoints#looked}) goes to the store of every block whose window holds it, with its
 * zone in that window ({@link LabelWindow#zone}), so each block later finds exactly the points
 * that reading the survey for that block alone would give. The points are gathered per block in
 * small columns and written to the {@link LabelStore} a segment at a time; at most
 * {@link #PENDING_POINTS} points wait per thread.
 */
final class LabelBins implements Consumer<PointChunk> {

  /** Most points waiting in one thread's columns before all are written (about 2 MiB). */
  static final int PENDING_POINTS = 1 << 16;

  private final List<SpanFrame> frames;
  private final double regionM;
  private final GroundModel ground;
  private final SetAside setAside;
  private final boolean judgeVegetationLabels;
  private final PlanGrid grid;
  private final List<LabelWindow> windows;
  private final LabelStore store;
  private final LabelPoints[] pending;
  private final ByteBuffer buffer = LabelStore.segmentBuffer();
  private int pendingPoints;
  /** Points looked at (each counted once, in the block of its owner span). */
  long looked;
  /** Later returns among {@link #looked}. */
  long later;
  /** Points of pulses with several returns among those looked at. */
  long multiPulse;

  LabelBins(List<SpanFrame> frames, double regionM, GroundModel ground, SetAside setAside,
      boolean judgeVegetationLabels, PlanGrid grid, List<LabelWindow> windows,
      LabelStore store) {
    this.frames = frames;
    this.regionM = regionM;
    this.ground = ground;
    this.setAside = setAside;
    this.judgeVegetationLabels = judgeVegetationLabels;
    this.grid = grid;
    this.windows = windows;
    this.store = store;
    this.pending = new LabelPoints[windows.size()];
  }

  @Override
  public void accept(PointChunk chunk) {
    short[] cls = chunk.classification();
    byte[] flags = chunk.flags();
    for (int i = 0; i < chunk.size(); i++) {
      byte kind = LabelPoints.kind(cls[i], flags[i], judgeVegetationLabels);
      if (kind < 0) {
        continue;
      }
      double px = chunk.x()[i];
      double py = chunk.y()[i];
      double pz = chunk.z()[i];
      int cell = grid.cellOf(px, py);
      int owner = grid.owner(cell, px, py);
      if (owner < 0) {
        continue;
      }
      double h = ground.heightAboveGround(px, py, pz);
      if (!LabelPoints.looked(kind, h, setAside, px, py, pz)) {
        continue;
      }
      byte n = chunk.returnNumber()[i];
      byte of = chunk.numberOfReturns()[i];
      looked++;
      later += n >= 2 ? 1 : 0;
      multiPulse += n >= 2 || of >= 2 ? 1 : 0;
      for (int t = grid.windowsFrom(cell); t < grid.windowsTo(cell); t++) {
        int b = grid.window(t);
        byte zone = windows.get(b).zone(px, py, owner);
        if (zone != LabelWindow.OUTSIDE) {
          add(b, px, py, pz, h, n, of, kind, zone);
        }
      }
    }
  }

  private void add(int block, double px, double py, double pz, double h, byte n, byte of,
      byte kind, byte zone) {
    LabelPoints p = pending[block];
    if (p == null) {
      p = LabelPoints.holder(256);
      pending[block] = p;
    }
    p.add(px, py, pz, h, n, of, kind, zone);
    pendingPoints++;
    if (p.size == LabelStore.SEGMENT_POINTS) {
      write(block);
    }
    if (pendingPoints >= PENDING_POINTS) {
      flush();
    }
  }

  private void write(int block) {
    LabelPoints p = pending[block];
    try {
      store.append(block, p, buffer);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    pendingPoints -= p.size;
    p.size = 0;
  }

  /** Writes every waiting point to the store and lets its columns go. */
  void flush() {
    for (int b = 0; b < pending.length; b++) {
      if (pending[b] != null) {
        write(b);
        pending[b] = null;
      }
    }
  }
}
