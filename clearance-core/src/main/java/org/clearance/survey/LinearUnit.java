package org.clearance.survey;

import java.util.Locale;
import java.util.Optional;

/**
 * Linear units a survey's coordinate reference system may use.
 *
 * <p>Conversion factors: 1 international foot = 0.3048 m exactly; 1 US survey foot = 1200/3937 m
 * (NIST; see docs/check-values.md section 1).
 */
public enum LinearUnit {
  METRE("m", 1.0, 9001),
  FOOT("ft", 0.3048, 9002),
  US_SURVEY_FOOT("ftUS", 1200.0 / 3937.0, 9003);

  private final String symbol;
  private final double metres;
  private final int epsgCode;

  LinearUnit(String symbol, double metres, int epsgCode) {
    this.symbol = symbol;
    this.metres = metres;
    this.epsgCode = epsgCode;
  }

  /** Short symbol used in messages and options: {@code m}, {@code ft}, {@code ftUS}. */
  public String symbol() {
    return symbol;
  }

  /** Length of one unit in metres. */
  public double metres() {
    return metres;
  }

  /** The EPSG (and GeoTIFF ProjLinearUnitsGeoKey) unit code: 9001, 9002 or 9003. */
  public int epsgCode() {
    return epsgCode;
  }

  /** Converts a value in this unit to metres. */
  public double toMetres(double value) {
    return value * metres;
  }

  /** Converts a value in metres to this unit. */
  public double fromMetres(double metresValue) {
    return metresValue / metres;
  }

  /** The unit with the given EPSG / GeoTIFF code, if it is one of ours. */
  public static Optional<LinearUnit> fromEpsgCode(int code) {
    for (LinearUnit u : values()) {
      if (u.epsgCode == code) {
        return Optional.of(u);
      }
    }
    return Optional.empty();
  }

  /**
   * Parses a unit as a user would type it: {@code m, metre, meter, ft, foot, international-foot,
   * usft, ftUS, us-survey-foot} (case-insensitive).
   */
  public static Optional<LinearUnit> parse(String text) {
    if (text == null) {
      return Optional.empty();
    }
    switch (text.trim().toLowerCase(Locale.ROOT).replace('_', '-').replace(' ', '-')) {
      case "m":
      case "metre":
      case "meter":
      case "metres":
      case "meters":
        return Optional.of(METRE);
      case "ft":
      case "foot":
      case "feet":
      case "international-foot":
      case "intl-ft":
        return Optional.of(FOOT);
      case "usft":
      case "ftus":
      case "us-ft":
      case "us-survey-foot":
      case "survey-foot":
      case "us-survey-feet":
        return Optional.of(US_SURVEY_FOOT);
      default:
        return Optional.empty();
    }
  }
}
