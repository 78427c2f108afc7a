package org.clearance.io;

import java.util.regex.Pattern;

/**
 * Strict parsing of plain decimal numbers as users write them in CSV and YAML files: an optional
 * sign, digits with an optional decimal point, an optional exponent. Rejects what
 * {@link Double#parseDouble} would also take but a user never means (hexadecimal, {@code NaN},
 * {@code Infinity}, a trailing {@code d} or {@code f}).
 */
public final class Decimal {

  private static final Pattern DECIMAL =
      Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");
  private static final Pattern INTEGER = Pattern.compile("[+-]?\\d{1,9}");
  /** A number followed by a word: what a user writes when they add a unit ("100 F", "3.2m"). */
  private static final Pattern NUMBER_WITH_UNIT =
      Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?\\s*[^\\d\\s.+-].*");

  private Decimal() {}

  /** True when the text (already trimmed) is a plain decimal number. */
  public static boolean isDecimal(String text) {
    return DECIMAL.matcher(text).matches();
  }

  /** True when the text (already trimmed) is a plain integer of at most nine digits. */
  public static boolean isInteger(String text) {
    return INTEGER.matcher(text).matches();
  }

  /** True when the text looks like a number with a unit or other word after it. */
  public static boolean looksLikeNumberWithUnit(String text) {
    return NUMBER_WITH_UNIT.matcher(text).matches();
  }

  /**
   * What is wrong with a text that should be a finite decimal number, or null when it is one.
   *
   * @param text trimmed field text
   * @param unit the unit the value is expected in, for the message, e.g. {@code "metres"}
   */
  public static String problem(String text, String unit) {
    if (text.isEmpty()) {
      return "no value; a number in " + unit + " is required";
    }
    if (!isDecimal(text)) {
      if (looksLikeNumberWithUnit(text)) {
        return "'" + text + "' is not a plain number; give the number alone, in " + unit;
      }
      return "'" + text + "' is not a number (expected a number in " + unit + ")";
    }
    if (!Double.isFinite(Double.parseDouble(text))) {
      return "'" + text + "' is too large to be a finite number";
    }
    return null;
  }
}
