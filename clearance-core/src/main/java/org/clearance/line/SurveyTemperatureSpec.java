package org.clearance.line;

import java.time.LocalDate;
import java.util.Objects;
import java.util.Optional;

/**
 * How a line specification says the conductor temperature at survey time is known: given (measured
 * or assumed) with a range, or computed by the heat balance of IEEE Std 738-2012 from the weather
 * and load at each span's flight time (docs/line-inputs.md).
 *
 * <p>Ranges are plus-or-minus half-widths of a uniform distribution, so a range r has the standard
 * uncertainty r / sqrt(3).
 *
 * @param source given as measured, given as assumed, computed, or none (not given)
 * @param temperatureC the given temperature, degC; NaN when computed or none
 * @param rangeC plus-or-minus range of the given temperature, degC (&gt;= 0); NaN otherwise
 * @param heat the heat-balance inputs when computed, else empty
 */
public record SurveyTemperatureSpec(
    Source source, double temperatureC, double rangeC, Optional<HeatInputs> heat) {

  /** Where the survey temperature comes from. */
  public enum Source {
    /** Read from a sensor or a thermal camera at the time of the flight. */
    MEASURED,
    /** Set by the user without a measurement. */
    ASSUMED,
    /** Computed by the IEEE Std 738-2012 heat balance. */
    COMPUTED,
    /** Not given: no condition needing a change of state can be computed. */
    NONE
  }

  /** Default range of an assumed temperature, degC (common practice, no source: about the
   * spread of a conductor's rise over the air in light load and sun). */
  public static final double DEFAULT_ASSUMED_RANGE_C = 10;
  /** Default range of a measured temperature, degC (common practice, no source). */
  public static final double DEFAULT_MEASURED_RANGE_C = 3;

  public SurveyTemperatureSpec {
    Objects.requireNonNull(source, "source");
    Objects.requireNonNull(heat, "heat");
    if ((source == Source.COMPUTED) != heat.isPresent()) {
      throw new IllegalArgumentException("heat-balance inputs exactly when computed");
    }
  }

  /** Nothing given. */
  public static SurveyTemperatureSpec none() {
    return new SurveyTemperatureSpec(Source.NONE, Double.NaN, Double.NaN, Optional.empty());
  }

  /** A given temperature with its default range (measured or assumed). */
  public static SurveyTemperatureSpec given(Source source, double temperatureC, double rangeC) {
    return new SurveyTemperatureSpec(source, temperatureC, rangeC, Optional.empty());
  }

  /** An assumed temperature with the default range, or none for NaN. */
  public static SurveyTemperatureSpec assumed(double temperatureC) {
    return Double.isNaN(temperatureC) ? none()
        : given(Source.ASSUMED, temperatureC, DEFAULT_ASSUMED_RANGE_C);
  }

  /** Whether a temperature is known or can be computed. */
  public boolean isKnown() {
    return source != Source.NONE;
  }

  /**
   * The weather, load and surface inputs of the heat balance (IEEE Std 738-2012), each with a
   * plus-or-minus range.
   *
   * @param currentA line current per phase conductor (divided among a bundle's sub-conductors),
   *     A; NaN when {@code currents} gives it
   * @param currents current against time, or empty
   * @param currentRangeFraction range of the current as a fraction of it (&gt;= 0)
   * @param airTemperatureC air temperature, degC
   * @param airTemperatureRangeC its range, degC
   * @param windSpeed wind speed, m/s (&gt;= 0)
   * @param windSpeedRange its range, m/s
   * @param windFromDeg direction the wind blows from, degrees clockwise from true north; NaN when
   *     not known (then every angle to the conductor is taken as equally likely)
   * @param windFromRangeDeg its range, degrees
   * @param absorptivityRange range of the library's absorptivity
   * @param emissivityRange range of the library's emissivity
   * @param surveyDate the survey day, for LAS files whose GPS time is seconds of the GPS week;
   *     empty when not given
   * @param latitudeDeg latitude of the line, degrees; NaN to take it from the survey CRS
   * @param longitudeDeg longitude of the line, degrees; NaN to take it from the survey CRS
   */
  public record HeatInputs(
      double currentA, Optional<CurrentSeries> currents, double currentRangeFraction,
      double airTemperatureC, double airTemperatureRangeC,
      double windSpeed, double windSpeedRange,
      double windFromDeg, double windFromRangeDeg,
      double absorptivityRange, double emissivityRange,
      Optional<LocalDate> surveyDate, double latitudeDeg, double longitudeDeg) {
    public HeatInputs {
      Objects.requireNonNull(currents, "currents");
      Objects.requireNonNull(surveyDate, "surveyDate");
      if (Double.isNaN(currentA) == currents.isEmpty()) {
        throw new IllegalArgumentException("a current or a current file, not both");
      }
    }
  }
}
