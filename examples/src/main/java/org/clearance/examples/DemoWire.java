package org.clearance.examples;

import java.util.List;
import java.util.Objects;
import org.clearance.wire.ConductorCurve;

/**
 * One conductor in one span at the survey state (truth): an exact catenary through its two
 * attachment points, and how it was sampled.
 *
 * @param position position name (see {@link DemoPosition})
 * @param role phase or shield
 * @param conductorCode conductor type code
 * @param curve the curve; stations run from attachment A (0) to attachment B
 * @param horizontalTensionN horizontal tension at the survey temperature, N
 * @param weightPerLengthNPerM bare weight per length, N/m
 * @param pointsPerMetre mean survey points per metre of wire outside gaps
 * @param noiseSigmaM standard deviation of the point noise along each axis, m
 * @param gaps stretches with no points, sorted, not overlapping, within [0, length]
 */
public record DemoWire(
    String position,
    DemoPosition.Role role,
    String conductorCode,
    ConductorCurve curve,
    double horizontalTensionN,
    double weightPerLengthNPerM,
    double pointsPerMetre,
    double noiseSigmaM,
    List<WireGap> gaps) {

  public DemoWire {
    Objects.requireNonNull(position, "position");
    Objects.requireNonNull(role, "role");
    Objects.requireNonNull(conductorCode, "conductorCode");
    Objects.requireNonNull(curve, "curve");
    gaps = List.copyOf(gaps);
  }

  /** Catenary constant c = H / w, m. */
  public double catenaryConstantM() {
    return curve.curve().c();
  }

  /** Vertical sag below the chord at the horizontal mid-point, m. */
  public double midSpanSagM() {
    return curve.midSpanSag();
  }

  /** Horizontal length between the attachments, m. */
  public double length() {
    return curve.length();
  }

  /** True when the catenary's vertex lies outside the span (uplift at the lower attachment). */
  public boolean uplift() {
    double s0 = curve.curve().s0();
    return s0 < 0 || s0 > curve.length();
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
