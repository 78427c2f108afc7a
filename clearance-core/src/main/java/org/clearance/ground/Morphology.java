package org.clearance.ground;

import java.util.Arrays;

/**
 * Grey-scale erosion, dilation, opening and closing of a dense raster with a disk-shaped
 * structuring element (cells whose centre offset satisfies dx^2 + dy^2 &lt;= r^2).
 *
 * <p>The disk is cut into horizontal runs (one per row offset dy, half-length
 * floor(sqrt(r^2 - dy^2))). The sliding row minima for half-lengths 0, 1, ..., r are grown one
 * step at a time (min over [c-k, c+k] = min of the k-1 result and the two new end cells), and each
 * is folded into the result for the row offsets that use it, so one erosion costs O(r) per cell
 * instead of O(r^2). Cells outside the raster are ignored (the window is cut at the edges). Rasters are row-major ({@code index = row * width + col}) and must hold no NaN.
 */
final class Morphology {
  private Morphology() {}

  /** Minimum over the disk of radius {@code radius} cells (&gt;= 0) around each cell. */
  static float[] erode(float[] src, int width, int height, int radius) {
    if (radius < 0) {
      throw new IllegalArgumentException("radius must be >= 0: " + radius);
    }
    // Rows as separate arrays: folding one row into another then indexes both with the same
    // index, a loop the JIT compiles to vector instructions (with offsets into one array it
    // cannot rule out overlap and stays scalar: the fold was a third of SMRF's samples).
    float[][] out = new float[height][];
    // run[r][c] holds the minimum of source row r over [c - k, c + k], grown one k at a time.
    float[][] run = new float[height][];
    for (int r = 0; r < height; r++) {
      out[r] = new float[width];
      Arrays.fill(out[r], Float.POSITIVE_INFINITY);
      run[r] = Arrays.copyOfRange(src, r * width, (r + 1) * width);
    }
    for (int k = 0; k <= radius; k++) {
      if (k > 0) {
        for (int r = 0; r < height; r++) {
          widen(src, r * width, run[r], width, k);
        }
      }
      for (int dy = -radius; dy <= radius; dy++) {
        if (halfWidth(radius, dy) != k) {
          continue;
        }
        // out[r] = min(out[r], run[r + dy]), rows outside the raster ignored.
        for (int r = Math.max(0, -dy); r < Math.min(height, height - dy); r++) {
          fold(out[r], run[r + dy], width);
        }
      }
    }
    float[] flat = new float[src.length];
    for (int r = 0; r < height; r++) {
      System.arraycopy(out[r], 0, flat, r * width, width);
    }
    return flat;
  }

  /** Grows one row's sliding minimum from half-width k - 1 to k; the row starts at src[o]. */
  private static void widen(float[] src, int o, float[] run, int width, int k) {
    for (int c = 0; c < Math.min(k, width); c++) {
      if (c + k < width && src[o + c + k] < run[c]) {
        run[c] = src[o + c + k];
      }
    }
    for (int c = k; c < width - k; c++) {
      run[c] = Math.min(run[c], Math.min(src[o + c - k], src[o + c + k]));
    }
    for (int c = Math.max(k, width - k); c < width; c++) {
      if (src[o + c - k] < run[c]) {
        run[c] = src[o + c - k];
      }
    }
  }

  /** into[c] = min(into[c], row[c]). */
  private static void fold(float[] into, float[] row, int width) {
    for (int c = 0; c < width; c++) {
      into[c] = Math.min(into[c], row[c]);
    }
  }

  /** Maximum over the disk of radius {@code radius} cells around each cell. */
  static float[] dilate(float[] src, int width, int height, int radius) {
    return negate(erode(negate(src), width, height, radius));
  }

  /** Opening (erosion then dilation): removes bumps narrower than the disk. */
  static float[] open(float[] src, int width, int height, int radius) {
    return dilate(erode(src, width, height, radius), width, height, radius);
  }

  /** Closing (dilation then erosion): fills pits narrower than the disk. */
  static float[] close(float[] src, int width, int height, int radius) {
    return erode(dilate(src, width, height, radius), width, height, radius);
  }

  /** Largest dx with dx^2 + dy^2 &lt;= r^2 (the half-length of the disk's run at row offset dy). */
  static int halfWidth(int r, int dy) {
    int v = r * r - dy * dy;
    int k = (int) Math.sqrt(v);
    while ((k + 1) * (k + 1) <= v) {
      k++;
    }
    while (k * k > v) {
      k--;
    }
    return k;
  }

  private static float[] negate(float[] a) {
    float[] out = new float[a.length];
    for (int i = 0; i < a.length; i++) {
      out[i] = -a[i];
    }
    return out;
  }
}
