package org.clearance.ground;

import java.util.Locale;

/**
 * Parameters of the Simple Morphological Filter (SMRF; Pingel, Clarke &amp; McBride 2013, "An
 * improved simple morphological filter for the terrain classification of airborne LIDAR data",
 * ISPRS J. Photogramm. Remote Sens. 77:21-30). All lengths are metres: a survey in feet is read
 * into metres before it reaches the filter, so these values need no conversion.
 *
 * @param cellSize raster cell side, metres, finite, 0.05-10 (default 1.0)
 * @param slope terrain slope threshold, rise over run, finite, &gt; 0 (default 0.15)
 * @param elevationThreshold eta, the height band around the final surface that counts as ground,
 *     metres, finite, &gt;= 0 (default 0.5)
 * @param elevationScalar kappa, extra band per unit of local slope, metres, finite, &gt;= 0
 *     (default 1.25)
 * @param maxWindow radius of the largest opening window, metres, finite, &gt;= cellSize
 *     (default 18): objects up to about twice this wide are removed
 */
public record SmrfOptions(
    double cellSize,
    double slope,
    double elevationThreshold,
    double elevationScalar,
    double maxWindow) {

  /** Smallest accepted cell, metres: finer cells cost memory without helping a 1 m filter. */
  private static final double MIN_CELL = 0.05;
  /** Largest accepted cell, metres: coarser cells cannot resolve terrain under a line. */
  private static final double MAX_CELL = 10;
  /** Slack when dividing the window by the cell, so that 18 m / 0.1 m gives 180 cells, not 181. */
  private static final double ROUNDING_SLACK = 1e-9;

  /**
   * @throws IllegalArgumentException when a parameter is out of range
   */
  public SmrfOptions {
    if (!(Double.isFinite(cellSize) && cellSize >= MIN_CELL && cellSize <= MAX_CELL)) {
      throw new IllegalArgumentException("SMRF cell size must be in [0.05, 10] m: " + cellSize);
    }
    if (!(Double.isFinite(slope) && slope > 0)) {
      throw new IllegalArgumentException("SMRF slope must be finite and > 0: " + slope);
    }
    if (!(Double.isFinite(elevationThreshold) && elevationThreshold >= 0)) {
      throw new IllegalArgumentException(
          "SMRF elevation threshold must be finite and >= 0: " + elevationThreshold);
    }
    if (!(Double.isFinite(elevationScalar) && elevationScalar >= 0)) {
      throw new IllegalArgumentException(
          "SMRF elevation scalar must be finite and >= 0: " + elevationScalar);
    }
    if (!(Double.isFinite(maxWindow) && maxWindow >= cellSize)) {
      throw new IllegalArgumentException(
          "SMRF max window must be finite and >= the cell size: " + maxWindow);
    }
  }

  /**
   * The defaults documented for SMRF in methods.md 4.3: cell 1 m, slope 0.15, eta 0.5 m, kappa
   * 1.25 m, max window 18 m.
   */
  public static SmrfOptions defaults() {
    return new SmrfOptions(1.0, 0.15, 0.5, 1.25, 18.0);
  }

  /** The largest opening radius in cells: the max window divided by the cell size, rounded up. */
  public int maxRadiusCells() {
    return (int) Math.ceil(maxWindow / cellSize - ROUNDING_SLACK);
  }

  /** One line for reports, e.g. {@code cell 1.00 m, slope 0.150, eta 0.50 m, ...}. */
  public String describe() {
    return String.format(Locale.ROOT,
        "cell %.2f m, slope %.3f, elevation threshold %.2f m, scalar %.2f m, max window %.1f m",
        cellSize, slope, elevationThreshold, elevationScalar, maxWindow);
  }
}
