package org.clearance.clearance;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.util.function.Consumer;
import org.clearance.ground.HeightModel;
import org.clearance.line.PlanCellIndex;
import org.clearance.survey.PointChunk;
import org.clearance.wire.SetAside;

/**
 * One worker's share of {@code pole-points.bin}: every vegetation point within the keep radius
 * in plan of a structure centre and at most the keep height above ground, with its plan
 * distance from the centre, for pole-clearing zones (docs/rules.md). A point counts as
 * vegetation as the clearance engine counts it: a labelled one by its label; one of an inferred
 * class (class 0/1 where vegetation is inferred, a class-2 label not believed: docs/labelling.md)
 * at least {@link VegetationSelector#UNCLASSIFIED_MIN_HEIGHT} above ground; in either, not set
 * aside by the labelling step. Inferred points within the pole column radius of the centre are the
 * pole itself and are only counted.
 */
final class PoleCollector implements Consumer<PointChunk> {

  /** Records buffered before they go to the writer. */
  private static final int FLUSH_RECORDS = 4096;

  private final PolePointFile layout;
  private final HeightModel heights;
  private final VegetationSelector vegetation;
  private final SetAside setAside;
  private final PolePointWriter out;
  private final PlanCellIndex cells;
  private final double cell;
  private final long[] column;
  /** The four cells of the last point looked at (see {@link #noStructureNear}). */
  private long lastCx = Long.MIN_VALUE;
  private long lastCy = Long.MIN_VALUE;
  private long lastSx;
  private long lastSy;
  private boolean lastEmpty;
  private final ByteBuffer buffer = ByteBuffer.allocate(FLUSH_RECORDS * PolePointFile.RECORD_BYTES)
      .order(ByteOrder.LITTLE_ENDIAN);

  PoleCollector(PlanCellIndex cells, HeightModel heights, VegetationSelector vegetation,
      SetAside setAside, PolePointWriter out) {
    this.layout = out.layout();
    this.heights = heights;
    this.vegetation = vegetation;
    this.setAside = setAside;
    this.out = out;
    this.cells = cells;
    this.cell = 2 * layout.keepRadiusM();
    this.column = new long[layout.structures().size()];
  }

  /**
   * The plan grid of structure indices, cell size twice the keep radius: a point reaches only
   * its own cell and the three neighbours towards the nearer cell edges, four lookups (a
   * primitive table: a boxed {@code Long} key per lookup was 5 % of the clearance stage).
   */
  static PlanCellIndex grid(PolePointFile layout) {
    double c = 2 * layout.keepRadiusM();
    PlanCellIndex.Builder cells = new PlanCellIndex.Builder(c);
    for (int i = 0; i < layout.structures().size(); i++) {
      PolePointFile.Pole p = layout.structures().get(i);
      cells.add(PlanCellIndex.cellOf(p.x(), c), PlanCellIndex.cellOf(p.y(), c), i);
    }
    return cells.build();
  }

  @Override
  public void accept(PointChunk chunk) {
    double[] xs = chunk.x();
    double[] ys = chunk.y();
    double[] zs = chunk.z();
    short[] cls = chunk.classification();
    byte[] flags = chunk.flags();
    for (int i = 0; i < chunk.size(); i++) {
      if ((flags[i] & PointChunk.FLAG_WITHHELD) != 0 || !vegetation.candidateClass(cls[i])) {
        continue;
      }
      point(xs[i], ys[i], zs[i], cls[i]);
    }
  }

  private void point(double x, double y, double z, int cls) {
    double gx = x / cell;
    double gy = y / cell;
    long cx = (long) Math.floor(gx);
    long cy = (long) Math.floor(gy);
    long sx = gx - cx < 0.5 ? -1 : 1;
    long sy = gy - cy < 0.5 ? -1 : 1;
    if (noStructureNear(cx, cy, sx, sy)) {
      return;
    }
    double r = layout.keepRadiusM();
    double r2 = r * r;
    double hag = Double.NaN;
    boolean hagDone = false;
    boolean inferred = vegetation.inferredClass(cls);
    for (long dx = 0; dx != 2 * sx; dx += sx) {
      for (long dy = 0; dy != 2 * sy; dy += sy) {
        int[] in = cells.atCell(cx + dx, cy + dy);
        for (int s : in) {
          PolePointFile.Pole p = layout.structures().get(s);
          double ex = x - p.x();
          double ey = y - p.y();
          double d2 = ex * ex + ey * ey;
          if (!(d2 <= r2)) {
            continue;
          }
          if (!hagDone) {
            hag = heights.heightAboveGround(x, y, z);
            hagDone = true;
            // as the clearance engine counts vegetation: an inferred point (class 0/1, or a
            // class-2 label not believed) at least the least height above ground; a labelled
            // one as labelled; in either, nothing the labelling step set aside
            if (hag > layout.keepHeightM() || inferred && !(cls == VegetationSelector.GROUND
                ? vegetation.groundLabelDoubted(hag)
                : hag >= VegetationSelector.UNCLASSIFIED_MIN_HEIGHT)
                || vegetation.inferred()
                && setAside.reason(SetAside.key(x, y, z)) != SetAside.Reason.NONE) {
              return;
            }
          }
          double plan = Math.sqrt(d2);
          if (inferred && plan < layout.columnRadiusM()) {
            column[s]++;
            continue;
          }
          buffer.putInt(s).putDouble(x).putDouble(y).putDouble(z).putShort((short) cls)
              .putFloat((float) hag).putFloat((float) plan);
          if (!buffer.hasRemaining()) {
            flush();
          }
        }
      }
    }
  }

  /**
   * Whether the four cells a point reaches, its own (cx, cy) and the neighbours towards (sx, sy),
   * hold no structure: most points are far from every structure, and consecutive points (in
   * flight order) mostly reach the same four cells, so the answer is kept for the last ones.
   */
  private boolean noStructureNear(long cx, long cy, long sx, long sy) {
    if (cx == lastCx && cy == lastCy && sx == lastSx && sy == lastSy) {
      return lastEmpty;
    }
    lastCx = cx;
    lastCy = cy;
    lastSx = sx;
    lastSy = sy;
    lastEmpty = cells.atCell(cx, cy).length == 0 && cells.atCell(cx + sx, cy).length == 0
        && cells.atCell(cx, cy + sy).length == 0 && cells.atCell(cx + sx, cy + sy).length == 0;
    return lastEmpty;
  }

  /** Hands the buffered records and column counts to the writer. */
  void flush() {
    try {
      out.write(buffer, column);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    buffer.clear();
    java.util.Arrays.fill(column, 0);
  }
}
