package org.clearance.examples;

import java.util.List;
import java.util.Objects;
import org.clearance.wire.ConductorCurve;

/**
 * One conductor of the demo feeder in one span at the survey state (truth): an exact catenary
 * through its attachments, and how it was sampled.
 *
 * @param position position name ({@code A}, {@code B}, {@code C}, {@code N})
 * @param neutral true for the neutral
 * @param conductorCode conductor type code
 * @param curve the curve; stations run from attachment A (0) to attachment B
 * @param pointsPerMetre mean survey points per metre of wire outside gaps
 * @param noiseSigmaM standard deviation of the point noise along each axis, m
 * @param gaps stretches with no points, sorted, not overlapping, within [0, length]
 */
public record FeederWire(String position, boolean neutral, String conductorCode,
    ConductorCurve curve, double pointsPerMetre, double noiseSigmaM, List<WireGap> gaps) {

  public FeederWire {
    Objects.requireNonNull(position, "position");
    Objects.requireNonNull(curve, "curve");
    gaps = List.copyOf(gaps);
  }

  /** Fraction of the span's horizontal length with points, 0-1. */
  public double coverage() {
    double gap = 0;
    for (WireGap g : gaps) {
      gap += g.length();
    }
    return 1.0 - gap / curve.length();
  }

  /** True when station s (m) lies in a gap. */
  public boolean inGap(double s) {
    for (WireGap g : gaps) {
      if (g.contains(s)) {
        return true;
      }
    }
    return false;
  }
}
