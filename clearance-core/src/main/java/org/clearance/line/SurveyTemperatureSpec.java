package org.clearance.line;

import java.time.LocalDate;
import java.util.Objects;
import java.util.Optional;

/**
 * How a line specification says the conductor temperature at survey time is known: given (measured
 * or assumed) with a range, or computed by the heat balance of IEEE Std 738-2012 or CIGRE TB 601
 * from the weather and load at each span's flight time (docs/line-inputs.md).
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
    /** Computed by a steady-state heat balance (IEEE Std 738-2012 or CIGRE TB 601). */
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

  /** Which published steady-state heat balance computes the survey temperature. */
  public enum HeatModel {
    /** IEEE Std 738-2012 (the default). */
    IEEE_738,
    /** CIGRE Technical Brochure 601 (2014). */
    CIGRE_601;

    /** The name in line specifications and reports: {@code ieee738} or {@code cigre601}. */
    public String key() {
      return this == IEEE_738 ? "ieee738" : "cigre601";
    }

    /** The name for reports: {@code IEEE 738-2012} or {@code CIGRE TB 601}. */
    public String title() {
      return this == IEEE_738 ? "IEEE 738-2012" : "CIGRE TB 601";
    }
  }

  /** Default ground albedo of the CIGRE TB 601 model: between the brochure's forest (0.1) and
   * soil and grass (0.2) [CIGRE TB 601 Table 3 as linerate documents it]. */
  public static final double DEFAULT_ALBEDO = 0.15;
  /** Default clearness ratio of the CIGRE TB 601 model: a clear sky. */
  public static final double DEFAULT_CLEARNESS = 1.0;

  /**
   * The weather, load and surface inputs of the heat balance, each with a plus-or-minus range.
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
   * @param model the heat balance: IEEE Std 738-2012 or CIGRE TB 601
   * @param groundAlbedo ground albedo F of the CIGRE model, 0-1
   * @param clearnessRatio clearness ratio N_s of the CIGRE model (1 clear sky), 0-1.5
   * @param outerStrandDiameterM diameter of the outer strands for the CIGRE model's roughness, m;
   *     NaN when not given (then Table 4's rough row R_s &gt; 0.05, which cools the most)
   */
  public record HeatInputs(
      double currentA, Optional<CurrentSeries> currents, double currentRangeFraction,
      double airTemperatureC, double airTemperatureRangeC,
      double windSpeed, double windSpeedRange,
      double windFromDeg, double windFromRangeDeg,
      double absorptivityRange, double emissivityRange,
      Optional<LocalDate> surveyDate, double latitudeDeg, double longitudeDeg,
      HeatModel model, double groundAlbedo, double clearnessRatio, double outerStrandDiameterM) {
    public HeatInputs {
      Objects.requireNonNull(currents, "currents");
      Objects.requireNonNull(surveyDate, "surveyDate");
      Objects.requireNonNull(model, "model");
      if (Double.isNaN(currentA) == currents.isEmpty()) {
        throw new IllegalArgumentException("a current or a current file, not both");
      }
    }

    /** The IEEE Std 738-2012 balance with these inputs. */
    public HeatInputs(double currentA, Optional<CurrentSeries> currents,
        double currentRangeFraction, double airTemperatureC, double airTemperatureRangeC,
        double windSpeed, double windSpeedRange, double windFromDeg, double windFromRangeDeg,
        double absorptivityRange, double emissivityRange, Optional<LocalDate> surveyDate,
        double latitudeDeg, double longitudeDeg) {
      this(currentA, currents, currentRangeFraction, airTemperatureC, airTemperatureRangeC,
          windSpeed, windSpeedRange, windFromDeg, windFromRangeDeg, absorptivityRange,
          emissivityRange, surveyDate, latitudeDeg, longitudeDeg, HeatModel.IEEE_738,
          DEFAULT_ALBEDO, DEFAULT_CLEARNESS, Double.NaN);
    }

    /** The same inputs with another model and its site data. */
    public HeatInputs withModel(HeatModel newModel, double albedo, double clearness,
        double outerStrandM) {
      return new HeatInputs(currentA, currents, currentRangeFraction, airTemperatureC,
          airTemperatureRangeC, windSpeed, windSpeedRange, windFromDeg, windFromRangeDeg,
          absorptivityRange, emissivityRange, surveyDate, latitudeDeg, longitudeDeg, newModel,
          albedo, clearness, outerStrandM);
    }
  }
}
