package org.clearance.report;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.clearance.assess.CutSite;
import org.clearance.assess.FindingInterval;
import org.clearance.assess.RunAssessment;
import org.clearance.assess.WorkItem;
import org.clearance.assess.WorkList;
import org.clearance.survey.SurveyUnits;

/**
 * The text of {@code worklist.csv}: one line per tree or vegetation patch ({@link WorkList}),
 * with every reason, the governing conductor, the work and its figures, and where to find it.
 * Lengths in the report unit ({@code _m} or {@code _ft}); x, y, z in the survey CRS's own units,
 * named in the column ({@code x_m}, {@code x_ft}, {@code x_ftUS}); longitude and latitude in
 * degrees. Text cells are neutralised against formula injection as in the other tables. An
 * empty field is a value not computed or not applicable; {@code years_to_violation}
 * is {@code never} when growth never brings the vegetation in. {@code verdict},
 * {@code clearance_low} and {@code clearance_high} are those of the governing finding in
 * {@code sites.csv} (the interval at the rule profile's confidence).
 */
final class WorkListCsv {

  /** Decimals of lengths and coordinates: millimetres. */
  private static final int LENGTH_DECIMALS = 3;
  /** Decimals of longitude and latitude: 1e-8 degree is about a millimetre. */
  private static final int DEGREE_DECIMALS = 8;

  private WorkListCsv() {}

  /** The header for an output unit and the survey's units. */
  static List<String> header(ReportOptions options, SurveyUnits su) {
    OutputUnit u = new OutputUnit(options.outputUnit());
    String h = su.horizontal().symbol();
    String v = su.vertical().symbol();
    return List.of("item_id", "span_id", "tree_id", "priority", "zone", "reasons", "work",
        "condition", "conductor", "circuit", u.column("clearance"), u.column("required"),
        u.column("deficit"), u.column("side_trim"), u.column("cut_to_height_now"),
        u.column("cut_to_height_cycle"), u.column("fall_in_distance"), u.column("fall_in_reach"),
        u.column("veg_height"), "x_" + h, "y_" + h, "z_" + v, "lon_deg", "lat_deg",
        u.column("station"), u.column("span_chainage"), "nearest_structure", "side",
        u.column("offset"), "right_of_way", "n_points", u.areaColumn(), "years_to_violation",
        "sites", "verdict", u.column("clearance_low"), u.column("clearance_high"));
  }

  /** The rows, header first. */
  static List<List<String>> rows(RunAssessment run, ReportOptions options) {
    OutputUnit u = new OutputUnit(options.outputUnit());
    SurveyUnits su = run.model().units();
    List<List<String>> out = new ArrayList<>();
    out.add(header(options, su));
    Map<String, CutSite> sites = new HashMap<>();
    run.sites().forEach(s -> sites.put(s.siteId(), s));
    for (WorkItem w : WorkList.of(run, options.linkDistanceM())) {
      Optional<FindingInterval> interval = governing(w, sites);
      List<String> row = new ArrayList<>(List.of(t(w.itemId()), t(w.spanId()), t(w.treeId()),
          Integer.toString(w.priority()), t(w.zone()), t(w.reasons()), w.work().words(),
          t(w.condition()), t(w.conductor()),
          w.circuit() > 0 ? Integer.toString(w.circuit()) : "", u.lengthText(w.clearanceM()),
          u.lengthText(w.requiredM()), u.lengthText(w.deficitM()), u.lengthText(w.sideTrimM()),
          u.lengthText(w.cutToNowM()), u.lengthText(w.cutToCycleM()),
          u.lengthText(w.fallInDistanceM()), u.lengthText(w.fallInReachM()),
          u.lengthText(w.vegHeightM()),
          OutputUnit.fixed(su.horizontal().fromMetres(w.x()), LENGTH_DECIMALS),
          OutputUnit.fixed(su.horizontal().fromMetres(w.y()), LENGTH_DECIMALS),
          OutputUnit.fixed(su.vertical().fromMetres(w.z()), LENGTH_DECIMALS),
          OutputUnit.fixed(w.lon(), DEGREE_DECIMALS), OutputUnit.fixed(w.lat(), DEGREE_DECIMALS),
          u.lengthText(w.stationM()), u.lengthText(w.chainageM()), t(w.nearestStructure()),
          w.side().word(), u.lengthText(w.offsetM()), w.rightOfWay().words(),
          w.points().isPresent() ? Integer.toString(w.points().getAsInt()) : "",
          u.areaText(w.areaM2()), CsvOutputs.years(w.yearsToViolation()),
          t(String.join(" ", w.siteIds()))));
      row.add(interval.map(i -> i.verdict().words()).orElse(""));
      row.add(u.lengthText(interval.map(FindingInterval::lowM).orElse(Double.NaN)));
      row.add(u.lengthText(interval.map(FindingInterval::highM).orElse(Double.NaN)));
      out.add(row);
    }
    return out;
  }

  /**
   * The interval of the item's governing finding: its first grow-in site in site order, the one
   * its clearance, required and deficit come from (empty for a fall-in-only item or a run
   * without confidence).
   */
  private static Optional<FindingInterval> governing(WorkItem w, Map<String, CutSite> sites) {
    for (String id : w.siteIds()) {
      CutSite s = sites.get(id);
      if (s != null && s.kind() == CutSite.Kind.GROW_IN) {
        return s.interval();
      }
    }
    return Optional.empty();
  }

  /** A text cell neutralised against formula injection, as in the other tables. */
  private static String t(String text) {
    return CsvOutputs.t(text);
  }
}
