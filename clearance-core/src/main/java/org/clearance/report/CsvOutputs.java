package org.clearance.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.clearance.assess.CutSite;
import org.clearance.assess.FindingInterval;
import org.clearance.assess.RunAssessment;
import org.clearance.assess.SpanResult;
import org.clearance.clearance.ConditionMinimum;
import org.clearance.io.AtomicFiles;
import org.clearance.io.CsvCells;
import org.clearance.run.SpanRecord;
import org.clearance.survey.SurveyUnits;
import org.clearance.wire.Crossing;

/**
 * Writes {@code worklist.csv} (one line per tree or vegetation patch, {@link WorkListCsv}),
 * {@code sites.csv} (one line per cut site: each grow-in clump and each fall-in check) and
 * {@code spans.csv} (one line per span) of a run folder: UTF-8, comma-separated, a header
 * line, text fields quoted as RFC 4180 asks when they hold a comma, quote or line break and
 * neutralised against formula injection ({@link CsvCells}). Every length column names its unit
 * ({@code _m} or {@code _ft}); x, y and z are in the survey CRS's own units, named in the
 * column. An empty field is a value not computed; {@code years_to_violation} is {@code never}
 * when growth never brings the site in.
 */
public final class CsvOutputs {

  /** Work-list file name. */
  public static final String WORKLIST = "worklist.csv";
  /** Site table file name. */
  public static final String SITES = "sites.csv";
  /** Span table file name. */
  public static final String SPANS = "spans.csv";

  /** Decimals of lengths and coordinates: millimetres. */
  private static final int LENGTH_DECIMALS = 3;
  /** Decimals of longitude and latitude: 1e-8 degree is about a millimetre. */
  private static final int DEGREE_DECIMALS = 8;
  /** Decimals of years. */
  private static final int YEAR_DECIMALS = 2;

  private CsvOutputs() {}

  /** The site-table header for an output unit. */
  public static List<String> sitesHeader(ReportOptions options, SurveyUnits su) {
    OutputUnit u = new OutputUnit(options.outputUnit());
    String h = su.horizontal().symbol();
    return List.of("site_id", "span_id", "priority", "zone", "condition",
        u.column("min_clearance"), u.column("required"), u.column("deficit"), "x_" + h, "y_" + h,
        "z_" + su.vertical().symbol(), "lon_deg", "lat_deg", u.column("chainage"), "side",
        u.column("offset"), u.column("veg_height"), u.column("cut_to_height"), "n_points",
        u.areaColumn(), "years_to_violation", "conductor", u.column("cut_to_height_now"),
        "verdict", "confidence_percent", u.column("clearance_sigma"), u.column("clearance_low"),
        u.column("clearance_high"), "uncertainty_dominant", "kind");
  }

  /** The span-table header for an output unit and the survey's units. */
  public static List<String> spansHeader(ReportOptions options, SurveyUnits su) {
    List<String> h = new ArrayList<>(spansHeader(options));
    String hu = su.horizontal().symbol();
    OutputUnit u = new OutputUnit(options.outputUnit());
    h.addAll(List.of("points_set_aside_crossing", "n_crossings", "crossing_x_" + hu,
        "crossing_y_" + hu, "crossing_z_" + su.vertical().symbol(),
        u.column("crossing_separation"), "points_wire_touched_measured",
        "points_label_distrusted"));
    return h;
  }

  /** The span-table header for an output unit, without the crossing columns. */
  static List<String> spansHeader(ReportOptions options) {
    OutputUnit u = new OutputUnit(options.outputUnit());
    return List.of("span_id", "line_id", "from_structure", "to_structure", u.column("length"),
        "status", "reason", "n_conductors_fitted", u.column("min_clearance_survey"),
        u.column("min_clearance_hot"), u.column("min_clearance_blowout"),
        u.column("min_clearance_ice"), "governing_condition", "worst_zone", "n_sites", "rank",
        "worst_priority", u.column("worst_deficit"), "nominal_voltage_kv", "points_checked",
        "points_not_assessed", "n_possible_violation_sites", "points_set_aside_wire",
        "points_set_aside_structure", "points_set_aside_airborne", "points_set_aside_object",
        "survey_temperature_c", "survey_temperature_sigma_c", "survey_temperature_source",
        "section_survey_temperature_c", "section_survey_temperature_sigma_c");
  }

  /** The work list's text: one line per tree or vegetation patch. */
  public static String worklist(RunAssessment run, ReportOptions options) {
    StringBuilder b = new StringBuilder();
    for (List<String> r : WorkListCsv.rows(run, options)) {
      row(b, r);
    }
    return b.toString();
  }

  /** The site table's text. */
  public static String sites(RunAssessment run, ReportOptions options) {
    OutputUnit u = new OutputUnit(options.outputUnit());
    SurveyUnits su = run.model().units();
    StringBuilder b = new StringBuilder();
    row(b, sitesHeader(options, su));
    for (CutSite s : run.sites()) {
      row(b, List.of(t(s.siteId()), t(s.spanId()), Integer.toString(s.priority()), t(s.zone()),
          t(s.condition()), u.lengthText(s.minClearanceM()), u.lengthText(s.requiredM()),
          u.lengthText(s.deficitM()),
          OutputUnit.fixed(su.horizontal().fromMetres(s.x()), LENGTH_DECIMALS),
          OutputUnit.fixed(su.horizontal().fromMetres(s.y()), LENGTH_DECIMALS),
          OutputUnit.fixed(su.vertical().fromMetres(s.z()), LENGTH_DECIMALS),
          OutputUnit.fixed(s.lon(), DEGREE_DECIMALS), OutputUnit.fixed(s.lat(), DEGREE_DECIMALS),
          u.lengthText(s.chainageM()), t(s.side().word()), u.lengthText(s.offsetM()),
          u.lengthText(s.vegHeightM()), u.lengthText(s.cutToHeightM()),
          s.points().isPresent() ? Integer.toString(s.points().getAsInt()) : "",
          u.areaText(s.areaM2()), years(s.yearsToViolation()), t(s.conductor()),
          u.lengthText(s.cutToNowM()),
          s.interval().map(i -> i.verdict().words()).orElse(""),
          s.interval().map(i -> OutputUnit.plain(i.confidencePercent())).orElse(""),
          u.lengthText(s.interval().map(FindingInterval::sigmaM).orElse(Double.NaN)),
          u.lengthText(s.interval().map(FindingInterval::lowM).orElse(Double.NaN)),
          u.lengthText(s.interval().map(FindingInterval::highM).orElse(Double.NaN)),
          s.interval().map(FindingInterval::dominant).orElse(""), kind(s)));
    }
    return b.toString();
  }

  /** A site's kind in files: {@code grow-in}, {@code fall-in} or {@code pole-clearing}. */
  static String kind(CutSite s) {
    return s.kind().name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
  }

  /** The span table's text, in ranking order. */
  public static String spans(RunAssessment run, ReportOptions options) {
    OutputUnit u = new OutputUnit(options.outputUnit());
    boolean ruled = run.profile().isPresent();
    StringBuilder b = new StringBuilder();
    SurveyUnits su = run.model().units();
    row(b, spansHeader(options, su));
    for (SpanResult r : run.spans()) {
      SpanRecord s = r.span();
      List<String> f = new ArrayList<>();
      f.add(t(s.id()));
      f.add(t(s.context().lineId()));
      f.add(t(s.from().id()));
      f.add(t(s.to().id()));
      f.add(u.lengthText(s.context().lengthM()));
      f.add(r.status().word());
      f.add(t(r.reason()));
      f.add(Integer.toString(r.conductorsFitted()));
      for (String group : List.of("survey", "hot", "blowout", "ice")) {
        f.add(u.minimumText(r.minimumOfGroup(group), run.model().keepRadiusM()));
      }
      f.add(t(r.governingMinimum().map(ConditionMinimum::condition).orElse("")));
      f.add(t(ruled ? r.worst().map(CutSite::zone).orElse("") : ""));
      f.add(r.sitesCounted() ? Integer.toString(r.sites().size()) : "");
      f.add(r.rank().isPresent() ? Integer.toString(r.rank().getAsInt()) : "");
      f.add(r.worst().map(w -> Integer.toString(w.priority())).orElse(""));
      f.add(u.lengthText(r.worst().map(CutSite::deficitM).orElse(Double.NaN)));
      f.add(OutputUnit.plain(s.context().nominalVoltageKv()));
      f.add(ruled ? Long.toString(r.pointsChecked()) : "");
      f.add(ruled ? Long.toString(r.pointsNotAssessed()) : "");
      f.add(ruled && r.sitesCounted()
          ? Long.toString(r.sites().stream().filter(CutSite::possibleOnly).count()) : "");
      f.add(Long.toString(s.setAside().wire()));
      f.add(Long.toString(s.setAside().structure()));
      f.add(Long.toString(s.setAside().airborne()));
      f.add(Long.toString(s.setAside().object()));
      SpanRecord.SurveyTemperature st = s.temperature();
      f.add(temperature(st.spanC()));
      f.add(temperature(st.spanSigmaC()));
      f.add(t(st.source()));
      f.add(temperature(st.sectionC()));
      f.add(temperature(st.sectionSigmaC()));
      f.add(Long.toString(s.setAside().crossing()));
      f.add(Integer.toString(s.crossings().size()));
      Crossing c = s.crossings().stream().filter(k -> Double.isFinite(k.separationM()))
          .min(java.util.Comparator.comparingDouble(k -> Math.abs(k.separationM())))
          .orElse(s.crossings().isEmpty() ? null : s.crossings().get(0));
      f.add(c == null ? "" : OutputUnit.fixed(su.horizontal().fromMetres(c.x()),
          LENGTH_DECIMALS));
      f.add(c == null ? "" : OutputUnit.fixed(su.horizontal().fromMetres(c.y()),
          LENGTH_DECIMALS));
      f.add(c == null ? "" : OutputUnit.fixed(su.vertical().fromMetres(c.z()),
          LENGTH_DECIMALS));
      f.add(u.lengthText(c == null ? Double.NaN : c.separationM()));
      f.add(Long.toString(s.setAside().wireTouched()));
      f.add(Long.toString(s.setAside().labelsDistrusted()));
      row(b, f);
    }
    return b.toString();
  }

  /** A temperature or its uncertainty, degC to 0.01; empty when not known. */
  private static String temperature(double c) {
    return Double.isFinite(c) ? OutputUnit.fixed(c, 2) : "";
  }

  /** Writes the three files into a run folder. */
  public static void write(Path runDir, RunAssessment run, ReportOptions options)
      throws IOException {
    AtomicFiles.writeString(runDir.resolve(WORKLIST), worklist(run, options));
    AtomicFiles.writeString(runDir.resolve(SITES), sites(run, options));
    AtomicFiles.writeString(runDir.resolve(SPANS), spans(run, options));
  }

  /** Years as text: 2 decimals, {@code never} for +infinity, empty when not computed. */
  static String years(double y) {
    if (y == Double.POSITIVE_INFINITY) {
      return "never";
    }
    return OutputUnit.fixed(y, YEAR_DECIMALS);
  }

  /** One line of cells already written as CSV (text through {@link #t}, numbers as they are). */
  private static void row(StringBuilder b, List<String> cells) {
    b.append(String.join(",", cells)).append('\n');
  }

  /** A text cell: quoted as RFC 4180 asks, neutralised against formula injection. */
  static String t(String text) {
    return CsvCells.text(text);
  }
}
