package org.clearance.report;

import java.util.Locale;

/** Small helpers for writing HTML and SVG text. */
final class Html {

  private Html() {}

  /** Text escaped for HTML element content and attribute values. */
  static String esc(String s) {
    StringBuilder b = new StringBuilder(s.length() + 16);
    for (int i = 0; i < s.length(); i++) {
      char c = s.charAt(i);
      switch (c) {
        case '&' -> b.append("&amp;");
        case '<' -> b.append("&lt;");
        case '>' -> b.append("&gt;");
        case '"' -> b.append("&quot;");
        case '\'' -> b.append("&#39;");
        default -> b.append(c);
      }
    }
    return b.toString();
  }

  /** A pixel coordinate with one decimal, {@link Locale#ROOT}. */
  static String px(double v) {
    return String.format(Locale.ROOT, "%.1f", v);
  }

  /** Formats with {@link Locale#ROOT}. */
  static String f(String format, Object... args) {
    return String.format(Locale.ROOT, format, args);
  }

  /** A length for reading: 2 decimals and the unit, or an en dash when not computed. */
  static String len(OutputUnit u, double metres) {
    return Double.isNaN(metres) ? "&ndash;" : OutputUnit.fixed(u.length(metres), 2) + "&nbsp;"
        + u.symbol();
  }

  /** A span minimum for reading: "&gt; R" beyond the keep radius R, where it is a bound. */
  static String minimum(OutputUnit u, double metres, double keepRadiusM) {
    return metres > keepRadiusM ? "&gt;&nbsp;" + len(u, keepRadiusM) : len(u, metres);
  }

  /** Years for reading: one decimal, "never", or an en dash when not computed. */
  static String years(double y) {
    if (Double.isNaN(y)) {
      return "&ndash;";
    }
    return y == Double.POSITIVE_INFINITY ? "never" : OutputUnit.fixed(y, 1);
  }
}
