package org.clearance.survey;

import java.util.function.Consumer;

/** One reading thread's running totals for {@link SurveySummary}; points in file units. */
final class SummaryAccumulator implements Consumer<PointChunk> {
  private final double cell;
  private final long[] classes = new long[256];
  private final LongHashSet cells = new LongHashSet();
  private long count;
  private long withheld;
  private double minX = Double.POSITIVE_INFINITY;
  private double minY = Double.POSITIVE_INFINITY;
  private double minZ = Double.POSITIVE_INFINITY;
  private double maxX = Double.NEGATIVE_INFINITY;
  private double maxY = Double.NEGATIVE_INFINITY;
  private double maxZ = Double.NEGATIVE_INFINITY;
  private double gpsMin = Double.POSITIVE_INFINITY;
  private double gpsMax = Double.NEGATIVE_INFINITY;

  /** @param cell grid cell side in file units, or NaN to skip the grid */
  SummaryAccumulator(double cell) {
    this.cell = cell;
  }

  @Override
  public void accept(PointChunk c) {
    double[] x = c.x();
    double[] y = c.y();
    double[] z = c.z();
    short[] cls = c.classification();
    byte[] flags = c.flags();
    double[] gps = c.gpsTime();
    boolean grid = !Double.isNaN(cell);
    for (int i = 0; i < c.size(); i++) {
      minX = Math.min(minX, x[i]);
      minY = Math.min(minY, y[i]);
      minZ = Math.min(minZ, z[i]);
      maxX = Math.max(maxX, x[i]);
      maxY = Math.max(maxY, y[i]);
      maxZ = Math.max(maxZ, z[i]);
      classes[cls[i] & 0xFF]++;
      if ((flags[i] & PointChunk.FLAG_WITHHELD) != 0) {
        withheld++;
      }
      if (!Double.isNaN(gps[i])) {
        gpsMin = Math.min(gpsMin, gps[i]);
        gpsMax = Math.max(gpsMax, gps[i]);
      }
      if (grid) {
        long cx = (long) Math.floor(x[i] / cell);
        long cy = (long) Math.floor(y[i] / cell);
        cells.add(cx << 32 ^ (cy & 0xFFFFFFFFL));
      }
    }
    count += c.size();
  }

  void merge(SummaryAccumulator o) {
    for (int k = 0; k < classes.length; k++) {
      classes[k] += o.classes[k];
    }
    cells.addAll(o.cells);
    count += o.count;
    withheld += o.withheld;
    minX = Math.min(minX, o.minX);
    minY = Math.min(minY, o.minY);
    minZ = Math.min(minZ, o.minZ);
    maxX = Math.max(maxX, o.maxX);
    maxY = Math.max(maxY, o.maxY);
    maxZ = Math.max(maxZ, o.maxZ);
    gpsMin = Math.min(gpsMin, o.gpsMin);
    gpsMax = Math.max(gpsMax, o.gpsMax);
  }

  long[] classCounts() {
    return classes.clone();
  }

  long count() {
    return count;
  }

  long withheld() {
    return withheld;
  }

  long cellCount() {
    return cells.size();
  }

  Bounds extent() {
    return count == 0 ? Bounds.empty() : new Bounds(minX, minY, minZ, maxX, maxY, maxZ);
  }

  double gpsMin() {
    return gpsMin <= gpsMax ? gpsMin : Double.NaN;
  }

  double gpsMax() {
    return gpsMin <= gpsMax ? gpsMax : Double.NaN;
  }
}
