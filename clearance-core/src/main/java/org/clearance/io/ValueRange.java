package org.clearance.io;

import java.util.Locale;

/**
 * The plausible range of one physical input value, with its unit and where the limits come from.
 * A value outside it is far more likely a typo or a unit slip (an exponent of {@code e-9} for
 * {@code e-6}, millimetres for metres) than a real line, so readers refuse it with a message
 * naming the range and its source.
 *
 * @param min smallest plausible value, in {@code unit}
 * @param max largest plausible value, in {@code unit}
 * @param unit the unit as written in messages, e.g. {@code "m"}, {@code "1/degC"}
 * @param source where the limits come from: a citation, or "common practice, no source"
 */
public record ValueRange(double min, double max, String unit, String source) {

  public ValueRange {
    if (!(min <= max)) {
      throw new IllegalArgumentException("min " + min + " above max " + max);
    }
  }

  /** True when {@code v} lies in [min, max] (NaN never does). */
  public boolean contains(double v) {
    return v >= min && v <= max;
  }

  /**
   * What is wrong with {@code v}, or null when it is plausible.
   *
   * @param v the value, in {@link #unit}
   */
  public String problem(double v) {
    if (contains(v)) {
      return null;
    }
    String u = unit.isEmpty() ? "" : " " + unit;
    return String.format(Locale.ROOT, "%s%s is outside the plausible range %s to %s%s (%s);"
        + " check the value and its unit", format(v), u, format(min), format(max), u, source);
  }

  /** A number in short plain text: up to 6 significant digits, no trailing zeros. */
  public static String format(double v) {
    if (v == Math.rint(v) && Math.abs(v) < 1e7) {
      return String.format(Locale.ROOT, "%d", (long) v);
    }
    String text = String.format(Locale.ROOT, "%.6g", v);
    int e = text.indexOf('e');
    String mantissa = e < 0 ? text : text.substring(0, e);
    if (mantissa.contains(".")) {
      mantissa = mantissa.replaceAll("\\.?0+$", "");
    }
    return e < 0 ? mantissa : mantissa + text.substring(e);
  }
}
