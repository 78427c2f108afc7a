package org.clearance.sag;

import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.function.DoubleUnaryOperator;
import org.clearance.line.ConductorPosition;
import org.clearance.line.ConductorThermal;
import org.clearance.line.LineSpec;
import org.clearance.line.Span;
import org.clearance.line.SurveyTemperatureSpec;
import org.clearance.line.SurveyTemperatureSpec.HeatInputs;
import org.clearance.line.SurveyTemperatureSpec.HeatModel;
import org.clearance.line.SurveyTemperatureSpec.Source;
import org.clearance.line.TensionSection;
import org.clearance.survey.GpsTime;
import org.clearance.survey.LonLat;

/**
 * The conductor temperature at survey time of each span and conductor position, and of each
 * tension section: the line specification's given value (measured or assumed, with its range), or
 * a steady-state heat balance ({@link HeatBalance}, IEEE Std 738-2012, or {@link
 * CigreHeatBalance}, CIGRE TB 601, as the specification chooses) at each span's own flight time.
 *
 * <p>Computed case, per span: the flight time is the mean GPS time of the span's wire points; the
 * sun from that instant and the span's middle latitude and longitude (through the survey CRS, or
 * the specification's); the conductor azimuth from the span's first to its second structure, as a
 * true bearing; the current of the specification's current (or current file at the flight time)
 * for a phase position, divided among a bundle's sub-conductors, and none for a shield wire; the
 * line altitude as the conductor's elevation.
 *
 * <p>Per tension section: one change of state per section and conductor needs one survey state.
 * The conductor length that sets the section's tension is the sum of its spans' lengths, and
 * thermal strain adds up span by span (alpha sum(L_i dT_i)), so the section's survey temperature
 * is the length-weighted mean of its spans' temperatures: the uniform temperature with the same
 * total thermal elongation (the ruling-span assumption of equal tension along the section, which
 * suspension strings give). Its standard uncertainty is the length-weighted mean of the spans'
 * (the spans share the weather and load inputs, so their errors are taken as fully correlated,
 * which is the larger of the two extremes). Spans without a flight time are left out of the mean;
 * a section with none is unknown.
 *
 * <p>Uncertainty: every input range is read as a uniform distribution, so its standard uncertainty
 * is the range over sqrt(3); each input is moved to both ends of its range with the others at
 * their values, and sigma_i = |T(high) - T(low)| / (2 sqrt(3)) (a secant over the whole range,
 * which stays honest where the balance is not linear, such as wind near calm);
 * sigma = sqrt(sum sigma_i^2), the inputs taken as independent (JCGM 100:2008, GUM, clause 5.1.2).
 */
public final class SurveyTemperatures {

  /** A current file's end values still hold this long before or after it, s (a SCADA record
   * every few minutes to an hour). */
  static final long CURRENT_TOLERANCE_S = 3600;
  private static final double SQRT3 = Math.sqrt(3);

  /** The survey's time encoding: how LAS GPS times become UTC. */
  public record Clock(boolean adjustedGpsTime) {}

  private final Clock clock;
  private final Optional<LonLat> lonLat;
  private final String lonLatNote;
  private final Map<String, Double> spanGpsTimes;

  /**
   * @param clock how the survey's GPS times read
   * @param lonLat the survey CRS to WGS 84 transform, or empty
   * @param lonLatNote why there is no transform (for messages)
   * @param spanGpsTimes per span id, its mean GPS time of flight, s (NaN or absent when unknown)
   */
  public SurveyTemperatures(Clock clock, Optional<LonLat> lonLat, String lonLatNote,
      Map<String, Double> spanGpsTimes) {
    this.clock = clock;
    this.lonLat = lonLat;
    this.lonLatNote = lonLatNote;
    this.spanGpsTimes = Map.copyOf(spanGpsTimes);
  }

  /** Given temperatures only (no survey clock or CRS needed). */
  public static SurveyTemperatures givenOnly() {
    return new SurveyTemperatures(new Clock(true), Optional.empty(), "not needed", Map.of());
  }

  /**
   * The survey temperature of a conductor position in a tension section: the length-weighted mean
   * of its spans' (see the class comment).
   *
   * @param spec the line specification
   * @param section the tension section
   * @param position the conductor position (for its type, role and bundle), or null for a
   *     conductor the specification lacks
   */
  public TemperatureEstimate estimate(LineSpec spec, TensionSection section,
      ConductorPosition position) {
    if (spec.surveyTemperature().source() != Source.COMPUTED || section.spans().size() == 1) {
      return estimate(spec, section.spans().get(0), position);
    }
    List<TemperatureEstimate> known = new ArrayList<>();
    List<Double> lengths = new ArrayList<>();
    TemperatureEstimate firstMissing = null;
    for (Span span : section.spans()) {
      TemperatureEstimate t = estimate(spec, span, position);
      if (t.isKnown()) {
        known.add(t);
        lengths.add(span.lengthM());
      } else if (firstMissing == null) {
        firstMissing = t;
      }
    }
    if (known.isEmpty()) {
      return firstMissing;
    }
    return combine(known, lengths, section.spans().size(),
        spec.surveyTemperature().heat().orElseThrow().model().title());
  }

  /** The length-weighted mean of span temperatures and of their sigmas (class comment). */
  static TemperatureEstimate combine(List<TemperatureEstimate> spans, List<Double> lengths,
      int spansInSection, String model) {
    double total = 0;
    double t = 0;
    double sigma = 0;
    double low = Double.POSITIVE_INFINITY;
    double high = Double.NEGATIVE_INFINITY;
    int top = 0;
    for (int k = 0; k < spans.size(); k++) {
      double w = lengths.get(k);
      total += w;
      t += w * spans.get(k).temperatureC();
      sigma += w * spans.get(k).sigmaC();
      low = Math.min(low, spans.get(k).temperatureC());
      high = Math.max(high, spans.get(k).temperatureC());
      if (w * spans.get(k).sigmaC() > lengths.get(top) * spans.get(top).sigmaC()) {
        top = k;
      }
    }
    String detail = String.format(Locale.ROOT, "length-weighted mean of %d of %d spans' %s heat"
        + " balances at their own flight times (%.1f to %.1f degC)", spans.size(), spansInSection,
        model, low, high);
    return new TemperatureEstimate(t / total, sigma / total, Source.COMPUTED,
        spans.get(top).dominant(), detail);
  }

  /**
   * The survey temperature of a conductor position in one span: given, or the heat balance at the
   * span's own flight time.
   *
   * @param spec the line specification
   * @param span the span
   * @param position the conductor position, or null for a conductor the specification lacks
   */
  public TemperatureEstimate estimate(LineSpec spec, Span span, ConductorPosition position) {
    SurveyTemperatureSpec st = spec.surveyTemperature();
    switch (st.source()) {
      case NONE:
        return TemperatureEstimate.missing(Source.NONE,
            "no survey conductor temperature given (survey_conductor_temperature_c)");
      case MEASURED:
      case ASSUMED:
        return new TemperatureEstimate(st.temperatureC(), st.rangeC() / SQRT3, st.source(),
            "survey temperature range", String.format(Locale.ROOT, "%s %.1f +- %.1f degC",
                st.source().name().toLowerCase(Locale.ROOT), st.temperatureC(), st.rangeC()));
      default:
        break;
    }
    if (position == null) {
      return TemperatureEstimate.missing(Source.COMPUTED,
          "the conductor is not in the line specification, so its type is unknown");
    }
    try {
      return computed(spec, st.heat().orElseThrow(), span, position);
    } catch (IllegalArgumentException | IllegalStateException e) {
      return TemperatureEstimate.missing(Source.COMPUTED, "survey temperature not computed: "
          + e.getMessage());
    }
  }

  private TemperatureEstimate computed(LineSpec spec, HeatInputs in, Span span,
      ConductorPosition position) {
    ConductorThermal thermal = position.conductor().thermal().orElseThrow(() ->
        new IllegalArgumentException("conductor type " + position.conductor().code()
            + " has no heat-balance data"));
    Instant when = flightTime(span, in.surveyDate());
    double[] geo = place(span, in);
    double azimuth = geo[2];
    double current = 0;
    if (position.isPhase()) {
      double total = in.currents().isPresent()
          ? in.currents().get().at(when, CURRENT_TOLERANCE_S) : in.currentA();
      current = total / position.bundle();
    }
    boolean cigre = in.model() == HeatModel.CIGRE_601;
    SolarPosition sun = SolarPosition.at(when, geo[0], geo[1], cigre
        ? SolarPosition.CIGRE_601_DECLINATION_DEG : SolarPosition.IEEE_738_DECLINATION_DEG);
    double diameter = position.conductor().diameter();
    double elevation = spec.altitudeM();
    double windAngle = Double.isNaN(in.windFromDeg()) ? Math.PI / 4
        : angleToAxis(Math.toRadians(in.windFromDeg()), azimuth);
    double windAngleRange = Double.isNaN(in.windFromDeg()) ? Math.PI / 4
        : Math.toRadians(in.windFromRangeDeg());
    double i0 = current;
    Model m = (a, ta, v, phi, alpha, eps) -> balance(in, diameter,
        thermal.withSurface(clamp01(alpha), clamp01(eps)), Math.max(0, a), ta, Math.max(0, v),
        Math.max(0, Math.min(Math.PI / 2, phi)), elevation, sun, azimuth)
        .conductorTemperature();
    double t0 = m.at(i0, in.airTemperatureC(), in.windSpeed(), windAngle,
        thermal.absorptivity(), thermal.emissivity());
    List<String> names = new ArrayList<>();
    List<Double> sigmas = new ArrayList<>();
    add(names, sigmas, "line current", i0 * in.currentRangeFraction(),
        d -> m.at(i0 + d, in.airTemperatureC(), in.windSpeed(), windAngle,
            thermal.absorptivity(), thermal.emissivity()));
    add(names, sigmas, "air temperature", in.airTemperatureRangeC(),
        d -> m.at(i0, in.airTemperatureC() + d, in.windSpeed(), windAngle,
            thermal.absorptivity(), thermal.emissivity()));
    add(names, sigmas, "wind speed", in.windSpeedRange(),
        d -> m.at(i0, in.airTemperatureC(), in.windSpeed() + d, windAngle,
            thermal.absorptivity(), thermal.emissivity()));
    add(names, sigmas, "wind direction", windAngleRange,
        d -> m.at(i0, in.airTemperatureC(), in.windSpeed(), windAngle + d,
            thermal.absorptivity(), thermal.emissivity()));
    add(names, sigmas, "absorptivity", in.absorptivityRange(),
        d -> m.at(i0, in.airTemperatureC(), in.windSpeed(), windAngle,
            thermal.absorptivity() + d, thermal.emissivity()));
    add(names, sigmas, "emissivity", in.emissivityRange(),
        d -> m.at(i0, in.airTemperatureC(), in.windSpeed(), windAngle,
            thermal.absorptivity(), thermal.emissivity() + d));
    double var = 0;
    int top = 0;
    for (int k = 0; k < sigmas.size(); k++) {
      var += sigmas.get(k) * sigmas.get(k);
      if (sigmas.get(k) > sigmas.get(top)) {
        top = k;
      }
    }
    String detail = String.format(Locale.ROOT, "%s heat balance at %s: %.0f A,"
        + " air %.1f degC, wind %.1f m/s at %.0f deg to the conductor, sun %.1f deg high",
        in.model().title(), when, current, in.airTemperatureC(), in.windSpeed(),
        Math.toDegrees(windAngle), Math.toDegrees(sun.altitudeRad()));
    return new TemperatureEstimate(t0, Math.sqrt(var), Source.COMPUTED, names.get(top), detail);
  }

  /** The chosen model's balance (a horizontal conductor). */
  private static SteadyHeatBalance balance(HeatInputs in, double diameter,
      ConductorThermal thermal, double current, double air, double wind, double windAngle,
      double elevation, SolarPosition sun, double azimuth) {
    if (in.model() == HeatModel.CIGRE_601) {
      return new CigreHeatBalance(diameter, in.outerStrandDiameterM(), thermal,
          new CigreHeatBalance.Conditions(current, air, wind, windAngle, elevation, 0, sun,
              azimuth, in.groundAlbedo(), in.clearnessRatio()));
    }
    return new HeatBalance(diameter, thermal, new HeatBalance.Conditions(current, air, wind,
        windAngle, elevation, sun, azimuth));
  }

  /** The conductor temperature as a function of the varied inputs. */
  @FunctionalInterface
  private interface Model {
    double at(double current, double air, double wind, double windAngle, double absorptivity,
        double emissivity);
  }

  private static void add(List<String> names, List<Double> sigmas, String name, double range,
      DoubleUnaryOperator t) {
    names.add(name);
    sigmas.add(range > 0 ? Math.abs(t.applyAsDouble(range) - t.applyAsDouble(-range))
        / (2 * SQRT3) : 0.0);
  }

  private static double clamp01(double v) {
    return Math.max(0.01, Math.min(1, v));
  }

  /** Angle between a wind blowing from {@code fromRad} and a conductor along {@code axisRad}, in
   * [0, pi/2] (the wind's line of travel is the same line as where it comes from). */
  static double angleToAxis(double fromRad, double axisRad) {
    double d = Math.abs(fromRad - axisRad) % Math.PI;
    return Math.min(d, Math.PI - d);
  }

  private Instant flightTime(Span span, Optional<LocalDate> day) {
    Double t = spanGpsTimes.get(span.id());
    if (t == null || !Double.isFinite(t)) {
      throw new IllegalArgumentException("no GPS time on the points of span " + span.id()
          + ", so its flight time is unknown");
    }
    return GpsTime.toUtc(t, clock.adjustedGpsTime(), day).orElseThrow(() ->
        new IllegalArgumentException("the LAS files store GPS week time; give survey_date in"
            + " survey_heat_balance to date the flight"));
  }

  /** Latitude, longitude (degrees) of the span's middle and its true azimuth (radians). */
  private double[] place(Span span, HeatInputs in) {
    double x0 = span.from().x();
    double y0 = span.from().y();
    double x1 = span.to().x();
    double y1 = span.to().y();
    if (lonLat.isEmpty()) {
      if (Double.isNaN(in.latitudeDeg())) {
        throw new IllegalArgumentException("latitude and longitude unknown (" + lonLatNote
            + "); give latitude_deg and longitude_deg in survey_heat_balance");
      }
      // Grid azimuth stands for the true one: without the CRS the convergence is unknown.
      double grid = Math.atan2(x1 - x0, y1 - y0);
      return new double[] {in.latitudeDeg(), in.longitudeDeg(), grid};
    }
    double[] a = lonLat.get().of(x0, y0);
    double[] b = lonLat.get().of(x1, y1);
    if (!(Double.isFinite(a[0]) && Double.isFinite(b[0]))) {
      throw new IllegalArgumentException("the survey CRS cannot place span " + span.id()
          + " on the globe");
    }
    double lat = 0.5 * (a[1] + b[1]);
    double lon = 0.5 * (a[0] + b[0]);
    double bearing = Math.atan2(Math.toRadians(b[0] - a[0]) * Math.cos(Math.toRadians(lat)),
        Math.toRadians(b[1] - a[1]));
    return new double[] {Double.isNaN(in.latitudeDeg()) ? lat : in.latitudeDeg(),
        Double.isNaN(in.longitudeDeg()) ? lon : in.longitudeDeg(), bearing};
  }
}
