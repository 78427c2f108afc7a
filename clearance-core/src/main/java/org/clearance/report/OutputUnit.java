package org.clearance.report;

import java.util.Locale;
import org.clearance.survey.LinearUnit;

/**
 * Conversion and formatting of output numbers: lengths from metres to the report unit, column
 * suffixes ({@code _m} or {@code _ft}, {@code area_m2} or {@code area_ft2}), fixed decimals with
 * {@link Locale#ROOT}, and an empty text for a value that was not computed (NaN).
 */
final class OutputUnit {

  private final LinearUnit unit;

  OutputUnit(LinearUnit unit) {
    this.unit = unit;
  }

  LinearUnit unit() {
    return unit;
  }

  /** {@code m} or {@code ft}. */
  String symbol() {
    return unit.symbol();
  }

  /** A column name with the unit suffix: {@code name_m} or {@code name_ft}. */
  String column(String name) {
    return name + "_" + unit.symbol();
  }

  /** The area column name: {@code area_m2} or {@code area_ft2}. */
  String areaColumn() {
    return "area_" + unit.symbol() + "2";
  }

  /** A length in metres in the output unit. */
  double length(double metres) {
    return unit.fromMetres(metres);
  }

  /** An area in square metres in the output unit squared. */
  double area(double squareMetres) {
    return squareMetres / (unit.metres() * unit.metres());
  }

  /** A length in metres as text in the output unit, 3 decimals; empty when NaN. */
  String lengthText(double metres) {
    return fixed(length(metres), 3);
  }

  /**
   * A span minimum as text: beyond the keep radius the engine stored nothing and the value is
   * only a bound, written "&gt; R" with R the keep radius (issue 9 item 7); empty when NaN.
   *
   * @param metres the minimum, m
   * @param keepRadiusM the run's keep radius, m
   */
  String minimumText(double metres, double keepRadiusM) {
    return metres > keepRadiusM ? "> " + lengthText(keepRadiusM) : lengthText(metres);
  }

  /** An area in square metres as text in the output unit, 2 decimals; empty when NaN. */
  String areaText(double squareMetres) {
    return fixed(area(squareMetres), 2);
  }

  /** A finite number in its shortest plain decimal form ({@code 115}, {@code 2.4}). */
  static String plain(double v) {
    if (!Double.isFinite(v)) {
      return fixed(v, 0);
    }
    return java.math.BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
  }

  /** A number with fixed decimals, {@link Locale#ROOT}; empty for NaN, signed words never. */
  static String fixed(double v, int decimals) {
    if (Double.isNaN(v)) {
      return "";
    }
    if (Double.isInfinite(v)) {
      return v > 0 ? "inf" : "-inf";
    }
    String s = String.format(Locale.ROOT, "%." + decimals + "f", v);
    return s.equals("-0") || s.matches("-0\\.0+") ? s.substring(1) : s;
  }
}
