package org.clearance.ground;

/**
 * Fills the empty (NaN) cells of a dense raster with a smooth membrane through the known cells:
 * the discrete Laplace equation (each filled cell the mean of its four neighbours), known cells
 * held fixed, no flux across the raster's border. This is the "springs/Laplacian" style of image
 * inpainting that Pingel, Clarke &amp; McBride (2013, ISPRS J. 77:21-30) use for SMRF's voids and
 * provisional DEM. Planes and other discrete-harmonic surfaces are reproduced to within the
 * solver's tolerance (a fraction of a millimetre on tests).
 *
 * <p>Solved coarse to fine: each level's empty cells start from the filled half-resolution level
 * (2 x 2 means of known cells, interpolated bilinearly), then successive over-relaxation (SOR)
 * sweeps refine the empty cells within {@link #NEAR_CELLS} of known ones, so large holes converge
 * in a few dozen sweeps rather than thousands and far voids cost almost nothing.
 */
final class Inpainter {
  /** Stop a level when no cell moved more than this in a sweep, metres: well below survey noise. */
  static final double TOLERANCE = 1e-4;
  /** Sweep cap per level; coarse-to-fine starts converge far sooner, this only bounds the worst. */
  static final int MAX_SWEEPS = 500;
  /** SOR factor in (1, 2): 1.8 is near-optimal for grids of a few hundred cells a side. */
  static final double OVER_RELAXATION = 1.8;

  /**
   * On each level only empty cells this close to a known cell (cells, chessboard distance) are
   * relaxed; farther ones keep the coarser level's value, which carries the far field. Keeps the
   * voids around a diagonal corridor (most of a square block) cheap.
   */
  static final int NEAR_CELLS = 16;
  /** Neighbour bits of a cell with all four neighbours inside the raster. */
  private static final int ALL_SIDES = 15;

  private Inpainter() {}

  /**
   * Returns a copy of {@code z} (row-major, {@code width x height}) with its NaN cells filled; all
   * NaN when {@code z} holds no known cell.
   */
  static float[] fill(float[] z, int width, int height) {
    // Solve in doubles about the mean of the known cells: float steps at 2000 m are 1e-4 m,
    // as coarse as the tolerance itself.
    double sum = 0;
    int known = 0;
    for (float v : z) {
      if (!Float.isNaN(v)) {
        sum += v;
        known++;
      }
    }
    if (known == 0 || known == z.length) {
      return z.clone();
    }
    double offset = sum / known;
    double[] d = new double[z.length];
    for (int i = 0; i < z.length; i++) {
      d[i] = z[i] - offset;
    }
    double[] filled = fill(d, width, height);
    float[] out = new float[z.length];
    for (int i = 0; i < z.length; i++) {
      out[i] = Float.isNaN(z[i]) ? (float) (filled[i] + offset) : z[i];
    }
    return out;
  }

  private static double[] fill(double[] z, int width, int height) {
    double[] out = z.clone();
    int unknown = 0;
    for (double v : out) {
      if (Double.isNaN(v)) {
        unknown++;
      }
    }
    if (unknown == 0) {
      return out;
    }
    int[] holes = nearHoles(out, width, height, unknown);
    int cw = (width + 1) / 2;
    double[] coarse = fill(coarsen(out, width, height), cw, (height + 1) / 2);
    int ch = (height + 1) / 2;
    for (int i = 0; i < out.length; i++) {
      if (Double.isNaN(out[i])) {
        out[i] = prolong(coarse, cw, ch, i % width, i / width);
      }
    }
    relax(out, width, height, holes);
    return out;
  }

  /**
   * Empty cells within {@link #NEAR_CELLS} (chessboard distance) of a known cell, in index order,
   * found with a two-pass distance transform (Rosenfeld &amp; Pfaltz 1966, J. ACM 13(4):471-494).
   */
  private static int[] nearHoles(double[] z, int width, int height, int unknown) {
    int far = NEAR_CELLS + 1;
    int[] dist = new int[z.length];
    for (int r = 0; r < height; r++) {
      for (int c = 0; c < width; c++) {
        int i = r * width + c;
        int d = Double.isNaN(z[i]) ? far : 0;
        if (d > 0 && c > 0) {
          d = Math.min(d, dist[i - 1] + 1);
        }
        if (d > 0 && r > 0) {
          d = Math.min(d, dist[i - width] + 1);
          d = c > 0 ? Math.min(d, dist[i - width - 1] + 1) : d;
          d = c < width - 1 ? Math.min(d, dist[i - width + 1] + 1) : d;
        }
        dist[i] = Math.min(d, far);
      }
    }
    int[] holes = new int[unknown];
    int n = 0;
    for (int r = height - 1; r >= 0; r--) {
      for (int c = width - 1; c >= 0; c--) {
        int i = r * width + c;
        int d = dist[i];
        if (d > 0 && c < width - 1) {
          d = Math.min(d, dist[i + 1] + 1);
        }
        if (d > 0 && r < height - 1) {
          d = Math.min(d, dist[i + width] + 1);
          d = c < width - 1 ? Math.min(d, dist[i + width + 1] + 1) : d;
          d = c > 0 ? Math.min(d, dist[i + width - 1] + 1) : d;
        }
        dist[i] = d;
        if (d > 0 && d <= NEAR_CELLS) {
          holes[n++] = i;
        }
      }
    }
    int[] sorted = java.util.Arrays.copyOf(holes, n);
    java.util.Arrays.sort(sorted);
    return sorted;
  }

  /**
   * Bilinear value of the half-resolution raster at fine cell (c, r): coarse cell j's centre sits
   * at fine coordinate 2j + 0.5.
   */
  private static double prolong(double[] coarse, int cw, int ch, int c, int r) {
    double fx = Math.min(Math.max((c - 0.5) / 2, 0), cw - 1);
    double fy = Math.min(Math.max((r - 0.5) / 2, 0), ch - 1);
    int c0 = Math.min((int) fx, cw - 1);
    int r0 = Math.min((int) fy, ch - 1);
    int c1 = Math.min(c0 + 1, cw - 1);
    int r1 = Math.min(r0 + 1, ch - 1);
    double tx = fx - c0;
    double ty = fy - r0;
    return (1 - ty) * ((1 - tx) * coarse[r0 * cw + c0] + tx * coarse[r0 * cw + c1])
        + ty * ((1 - tx) * coarse[r1 * cw + c0] + tx * coarse[r1 * cw + c1]);
  }

  /**
   * Half-resolution raster: each cell the mean of its 2 x 2 children when all four are known, so
   * that its value belongs to its centre (a partial mean belongs to the known children's centroid
   * and would tilt the far field); partial means only when no cell has four known children.
   */
  private static double[] coarsen(double[] z, int width, int height) {
    int cw = (width + 1) / 2;
    int ch = (height + 1) / 2;
    double[] sum = new double[cw * ch];
    int[] count = new int[cw * ch];
    int[] size = new int[cw * ch];
    for (int r = 0; r < height; r++) {
      for (int c = 0; c < width; c++) {
        int j = (r / 2) * cw + c / 2;
        size[j]++;
        double v = z[r * width + c];
        if (!Double.isNaN(v)) {
          sum[j] += v;
          count[j]++;
        }
      }
    }
    boolean anyFull = false;
    for (int j = 0; j < sum.length; j++) {
      anyFull |= count[j] > 0 && count[j] == size[j];
    }
    for (int j = 0; j < sum.length; j++) {
      boolean use = anyFull ? count[j] == size[j] : count[j] > 0;
      sum[j] = use ? sum[j] / count[j] : Double.NaN;
    }
    return sum;
  }

  private static void relax(double[] z, int width, int height, int[] holes) {
    // Which of the four neighbours exist (bits: left, right, down, up); interior cells have all.
    byte[] sides = new byte[holes.length];
    for (int j = 0; j < holes.length; j++) {
      int r = holes[j] / width;
      int c = holes[j] - r * width;
      sides[j] = (byte) ((c > 0 ? 1 : 0) | (c < width - 1 ? 2 : 0) | (r > 0 ? 4 : 0)
          | (r < height - 1 ? 8 : 0));
    }
    for (int sweep = 0; sweep < MAX_SWEEPS; sweep++) {
      double maxChange = 0;
      for (int j = 0; j < holes.length; j++) {
        int i = holes[j];
        int s = sides[j];
        double mean;
        if (s == ALL_SIDES) {
          mean = 0.25 * (z[i - 1] + z[i + 1] + z[i - width] + z[i + width]);
        } else {
          double sum = 0;
          int n = 0;
          if ((s & 1) != 0) {
            sum += z[i - 1];
            n++;
          }
          if ((s & 2) != 0) {
            sum += z[i + 1];
            n++;
          }
          if ((s & 4) != 0) {
            sum += z[i - width];
            n++;
          }
          if ((s & 8) != 0) {
            sum += z[i + width];
            n++;
          }
          if (n == 0) {
            continue;
          }
          mean = sum / n;
        }
        double change = OVER_RELAXATION * (mean - z[i]);
        z[i] += change;
        if (change > maxChange) {
          maxChange = change;
        } else if (-change > maxChange) {
          maxChange = -change;
        }
      }
      if (maxChange < TOLERANCE) {
        return;
      }
    }
  }
}
