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
    float[] out = new float[src.length];
    Arrays.fill(out, Float.POSITIVE_INFINITY);
    // run[c] holds the minimum of src over [c - k, c + k] in its row, grown one k at a time.
    float[] run = src.clone();
    for (int k = 0; k <= radius; k++) {
      if (k > 0) {
        widen(src, run, width, height, k);
      }
      for (int dy = -radius; dy <= radius; dy++) {
        if (halfWidth(radius, dy) == k) {
          combine(run, out, width, height, dy);
        }
      }
    }
    return out;
  }

  /** Grows each row's sliding minimum from half-width k - 1 to k. */
  private static void widen(float[] src, float[] run, int width, int height, int k) {
    for (int r = 0; r < height; r++) {
      int o = r * width;
      for (int c = 0; c < Math.min(k, width); c++) {
        if (c + k < width && src[o + c + k] < run[o + c]) {
          run[o + c] = src[o + c + k];
        }
      }
      for (int c = k; c < width - k; c++) {
        run[o + c] = Math.min(run[o + c], Math.min(src[o + c - k], src[o + c + k]));
      }
      for (int c = Math.max(k, width - k); c < width; c++) {
        if (src[o + c - k] < run[o + c]) {
          run[o + c] = src[o + c - k];
        }
      }
    }
  }

  /** out[r] = min(out[r], run[r + dy]) row by row, rows outside the raster ignored. */
  private static void combine(float[] run, float[] out, int width, int height, int dy) {
    int rFrom = Math.max(0, -dy);
    int rTo = Math.min(height, height - dy);
    for (int r = rFrom; r < rTo; r++) {
      int o = r * width;
      int s = (r + dy) * width;
      for (int c = 0; c < width; c++) {
        out[o + c] = Math.min(out[o + c], run[s + c]);
      }
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
