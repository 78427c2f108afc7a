package org.clearance.rules;

import java.util.Locale;

/**
 * An extra clearance in the middle part of a span that grows with span length, of the form
 * "in the middle {@code fraction} of the span add {@code perHundredM} metres for every 100 m of
 * span length beyond {@code beyondM}". Regulations that give a larger space towards mid-span,
 * where the conductor sags and sways most, have this structure (for example the Victorian
 * Electricity Safety (Electric Line Clearance) Regulations: docs/check-values.md
 * section 4, structure published, values not verified).
 *
 * @param middleFraction length of the middle part as a fraction of the span, centred on
 *     mid-span (0, 1]
 * @param perHundredM extra clearance per 100 m of span beyond {@code beyondM}, m (&gt;= 0)
 * @param beyondM span length above which the allowance starts, m (&gt;= 0)
 */
public record MidspanAllowance(double middleFraction, double perHundredM, double beyondM) {

  /** No allowance. */
  public static final MidspanAllowance NONE = new MidspanAllowance(1, 0, 0);

  /** Span length the allowance rate refers to, m. */
  private static final double RATE_LENGTH_M = 100.0;

  public MidspanAllowance {
    if (!(middleFraction > 0 && middleFraction <= 1)) {
      throw new IllegalArgumentException("middle fraction must be in (0, 1]: " + middleFraction);
    }
    if (!(Double.isFinite(perHundredM) && perHundredM >= 0)) {
      throw new IllegalArgumentException("allowance rate must be >= 0: " + perHundredM);
    }
    if (!(Double.isFinite(beyondM) && beyondM >= 0)) {
      throw new IllegalArgumentException("threshold span must be >= 0: " + beyondM);
    }
  }

  /** Whether this allowance never adds anything. */
  public boolean isNone() {
    return perHundredM == 0;
  }

  /**
   * The extra clearance at a station of a span, m.
   *
   * @param spanLengthM plan length of the span, m (&gt; 0)
   * @param stationM station of the conductor point from the span's first structure, m
   * @return the allowance, m (0 outside the middle part or for short spans; the full allowance
   *     when the station is unknown (NaN), the conservative choice)
   */
  public double at(double spanLengthM, double stationM) {
    double full = fullAllowance(spanLengthM);
    if (full == 0 || Double.isNaN(stationM)) {
      return full;
    }
    double margin = spanLengthM * (1 - middleFraction) / 2;
    return stationM >= margin && stationM <= spanLengthM - margin ? full : 0;
  }

  /** The allowance in the middle part of a span of the given length, m. */
  public double fullAllowance(double spanLengthM) {
    return perHundredM * Math.max(0, spanLengthM - beyondM) / RATE_LENGTH_M;
  }

  /** Plain words. */
  public String describe() {
    if (isNone()) {
      return "none";
    }
    return String.format(Locale.ROOT,
        "middle %.1f %% of the span: + %s m per 100 m of span length beyond %s m",
        middleFraction * 100, VoltageBand.trim(perHundredM), VoltageBand.trim(beyondM));
  }
}
