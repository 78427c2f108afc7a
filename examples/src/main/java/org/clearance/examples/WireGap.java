package org.clearance.examples;

/**
 * A stretch of a conductor with no survey points.
 *
 * @param startStation start station along the conductor's plan line, m, from attachment A
 * @param endStation end station, m (&gt; start)
 */
public record WireGap(double startStation, double endStation) {

  public WireGap {
    if (!(Double.isFinite(startStation) && endStation > startStation)) {
      throw new IllegalArgumentException("bad gap " + startStation + ", " + endStation);
    }
  }

  /** Length of the gap along the plan line, m. */
  public double length() {
    return endStation - startStation;
  }

  /** True when station s lies inside the gap. */
  public boolean contains(double s) {
    return s >= startStation && s < endStation;
  }

  /**
   * The gaps of one demo feeder conductor (FeederScene): with {@code low}, one long gap leaving
   * 8-28 % of the length {@code len} (m) with points; otherwise, half the time, one gap of 2 m to
   * 15 m (at most a fifth of the length).
   */
  static java.util.List<WireGap> feederGaps(java.util.SplittableRandom rng, double len,
      boolean low) {
    java.util.List<WireGap> gaps = new java.util.ArrayList<>();
    if (low) {
      double keep = rng.nextDouble(0.08, 0.28) * len;
      double start = rng.nextDouble(0, len - keep);
      if (start > 0) {
        gaps.add(new WireGap(0, start));
      }
      gaps.add(new WireGap(start + keep, len));
    } else if (rng.nextDouble() < 0.5) {
      double g = rng.nextDouble(2, Math.min(15, 0.2 * len));
      double s = rng.nextDouble(0, len - g);
      gaps.add(new WireGap(s, s + g));
    }
    return gaps;
  }
}
