package org.clearance.io;

import java.util.regex.Pattern;

/**
 * Text cells of the CSV files Clearance writes, safe to open in a spreadsheet.
 *
 * <p>Quoting follows RFC 4180 section 2: a cell holding a comma, quote or line break is enclosed
 * in double quotes, a quote inside doubled. Formula injection: a spreadsheet runs a cell that
 * starts with {@code =}, {@code +}, {@code -} or {@code @} as a formula (and a leading tab or
 * carriage return can hide such a start), so an id from an input file such as
 * {@code =HYPERLINK(...)} could act when a crew opens the work list. As the OWASP "CSV Injection"
 * guidance advises, such a text cell gets a leading apostrophe, which spreadsheets show as text
 * and do not evaluate. Numbers are never passed through here (a negative number stays a number);
 * a text cell that is a plain number such as {@code -12} is left as it is, since a spreadsheet
 * reads it as that number and runs nothing.
 */
public final class CsvCells {

  /** A plain decimal number, optionally signed, with an optional exponent. */
  private static final Pattern PLAIN_NUMBER =
      Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?");

  private CsvCells() {}

  /** A text cell: neutralised when it could start a formula, then quoted when it must be. */
  public static String text(String s) {
    return quote(neutral(s));
  }

  /** The text with a leading apostrophe when a spreadsheet would take it for a formula. */
  static String neutral(String s) {
    if (s.isEmpty()) {
      return s;
    }
    char c = s.charAt(0);
    boolean risky = c == '=' || c == '@' || c == '\t' || c == '\r'
        || ((c == '+' || c == '-') && !PLAIN_NUMBER.matcher(s).matches());
    return risky ? "'" + s : s;
  }

  /** The cell quoted when it holds a comma, quote or line break (RFC 4180 section 2). */
  static String quote(String s) {
    if (s.indexOf(',') < 0 && s.indexOf('"') < 0 && s.indexOf('\n') < 0
        && s.indexOf('\r') < 0) {
      return s;
    }
    return '"' + s.replace("\"", "\"\"") + '"';
  }
}
