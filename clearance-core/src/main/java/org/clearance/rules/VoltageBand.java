package org.clearance.rules;

import java.util.Locale;

/**
 * A band of nominal phase-to-phase line voltages, kV. The lower edge is always included; the
 * upper edge is excluded ({@code below_kv} in a profile) or included ({@code max_kv}). A voltage
 * exactly on the edge between two bands written with {@code below_kv} therefore belongs to the
 * upper band.
 *
 * @param minKv lower edge, kV (&gt;= 0, included)
 * @param maxKv upper edge, kV (&gt; minKv, may be +infinity)
 * @param maxIncluded whether a voltage equal to {@code maxKv} is in the band
 */
public record VoltageBand(double minKv, double maxKv, boolean maxIncluded) {

  /** Every voltage. */
  public static final VoltageBand ALL =
      new VoltageBand(0, Double.POSITIVE_INFINITY, false);

  public VoltageBand {
    if (!(Double.isFinite(minKv) && minKv >= 0 && maxKv > minKv)) {
      throw new IllegalArgumentException("bad voltage band " + minKv + " - " + maxKv);
    }
  }

  /** Whether the band holds a voltage, kV. */
  public boolean contains(double kv) {
    return kv >= minKv && belowTop(kv);
  }

  /** Whether a voltage is under the band's upper edge (ignoring the lower edge). */
  public boolean belowTop(double kv) {
    return maxIncluded ? kv <= maxKv : kv < maxKv;
  }

  /** Whether some voltage lies in both bands. */
  public boolean overlaps(VoltageBand other) {
    // Both bands include their lower edge, so a non-empty intersection holds the larger one.
    double lowest = Math.max(minKv, other.minKv);
    return contains(lowest) && other.contains(lowest);
  }

  /** Plain words, e.g. {@code "72 kV to below 110 kV"}. */
  public String describe() {
    if (maxKv == Double.POSITIVE_INFINITY) {
      return minKv == 0 ? "any voltage" : kv(minKv) + " and above";
    }
    return kv(minKv) + (maxIncluded ? " to " : " to below ") + kv(maxKv)
        + (maxIncluded ? " inclusive" : "");
  }

  /** A voltage in words, e.g. {@code 12.47 kV}. */
  public static String kv(double kv) {
    return String.format(Locale.ROOT, "%s kV", trim(kv));
  }

  static String trim(double x) {
    String s = String.format(Locale.ROOT, "%.3f", x);
    return s.contains(".") ? s.replaceAll("0+$", "").replaceAll("\\.$", "") : s;
  }
}
