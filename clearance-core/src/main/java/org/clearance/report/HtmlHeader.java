package org.clearance.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.clearance.assess.RunAssessment;
import org.clearance.line.LineCondition;
import org.clearance.rules.RuleProfile;
import org.clearance.run.LineFacts;
import org.clearance.run.RunFacts;
import org.clearance.run.RunRecord;

/**
 * The report's header: what was checked, as values an auditor can compare with the inputs. The
 * line (name and id, nominal voltage per circuit, conductor types, survey conductor temperature,
 * right-of-way width, every line condition with its parameters), the survey (acquisition days,
 * CRS and units), the run (tool version, run day, rule profile, input files with SHA-256).
 */
final class HtmlHeader {

  private HtmlHeader() {}

  /** The title: the lines' names, or the span ids' lines when the model has no facts. */
  static String title(RunAssessment run) {
    List<String> names = new ArrayList<>();
    for (LineFacts l : run.model().facts().lines()) {
      names.add(l.name().isEmpty() ? "line " + l.lineId() : l.name() + " (" + l.lineId() + ")");
    }
    if (names.isEmpty()) {
      run.spans().stream().map(s -> s.span().lineName().isEmpty() ? s.span().context().lineId()
          : s.span().lineName()).distinct().forEach(names::add);
    }
    return names.isEmpty() ? "no line" : String.join(", ", names);
  }

  static void write(StringBuilder b, RunAssessment run, String runDay) {
    RunFacts f = run.model().facts();
    b.append("<header><p class=\"kicker\">Vegetation clearance screening</p>");
    b.append("<h1>").append(Html.esc(title(run))).append("</h1>");
    b.append("<p class=\"sub\">").append(run.profile().map(p -> "Checked against "
        + Html.esc(p.title()) + " (rule profile " + Html.esc(p.name()) + ")")
        .orElse("Distances measured; no rule profile applied")).append("</p>");
    b.append("<dl class=\"meta\">");
    meta(b, "run day", runDay + " (UTC)");
    meta(b, "tool", "Clearance " + run.model().toolVersion());
    meta(b, "survey acquired", acquired(f));
    meta(b, "survey CRS", crs(run));
    meta(b, "x, y / z units", run.model().units().horizontal().symbol() + " / "
        + run.model().units().vertical().symbol());
    meta(b, "rule profile", run.profile().map(RuleProfile::name).orElse("none"));
    meta(b, "spans", Integer.toString(run.spans().size()));
    meta(b, "vegetation", run.model().vegetation());
    meta(b, "ground", run.model().groundSource());
    b.append("</dl>");
    b.append("<p class=\"note\">").append(Html.esc(yearsBase(f))).append("</p>");
    b.append("</header>\n");
  }

  /** The section with the line specifications and input files (after the cautions). */
  static void inputs(StringBuilder b, RunAssessment run) {
    RunFacts f = run.model().facts();
    b.append("<section id=\"inputs\"><h2>What was checked</h2>");
    if (f.lines().isEmpty()) {
      b.append("<p class=\"note\">This run folder does not record its line specifications; "
          + "run the check again to have them stated here.</p>");
    }
    for (LineFacts l : f.lines()) {
      b.append("<h3>").append(Html.esc(l.name().isEmpty() ? l.lineId() : l.name()))
          .append(" <small>line id ").append(Html.esc(l.lineId())).append("</small></h3>");
      b.append("<dl class=\"facts\">");
      fact(b, "nominal voltage", circuits(l));
      fact(b, "conductors", conductors(l));
      fact(b, "survey conductor temperature", Double.isNaN(l.surveyConductorTemperatureC())
          ? "not given" : OutputUnit.plain(l.surveyConductorTemperatureC()) + " \u00b0C");
      fact(b, "right-of-way", Double.isNaN(l.rowHalfWidthM()) ? "width not given"
          : OutputUnit.plain(l.rowHalfWidthM()) + " m either side of the centre line");
      b.append("</dl>");
      conditions(b, l);
    }
    b.append("<h3>Input files</h3><table class=\"inputs\"><thead><tr><th>role</th><th>file</th>"
        + "<th>bytes</th><th>SHA-256</th></tr></thead><tbody>");
    for (RunRecord.InputFile i : f.inputs()) {
      b.append("<tr><td>").append(Html.esc(i.role())).append("</td><td>")
          .append(Html.esc(i.path())).append("</td><td class=\"num\">").append(i.bytes())
          .append("</td><td class=\"hash\">").append(Html.esc(i.sha256())).append("</td></tr>");
    }
    run.profile().ifPresent(p -> b.append("<tr><td>rule profile</td><td>")
        .append(Html.esc(p.origins().get(0).shownLocation())).append("</td><td class=\"num\">")
        .append("&ndash;</td><td class=\"hash\">").append(Html.esc(p.contentHash()))
        .append(" <small>(of the profile texts)</small></td></tr>"));
    b.append("</tbody></table></section>\n");
  }

  /** "115 kV (circuit 1: A, B, C)" per circuit. */
  static String circuits(LineFacts l) {
    Map<Integer, List<String>> byCircuit = new TreeMap<>();
    for (LineFacts.Position p : l.positions()) {
      if (p.role().equals("phase")) {
        byCircuit.computeIfAbsent(p.circuit(), k -> new ArrayList<>()).add(p.position());
      }
    }
    List<String> parts = new ArrayList<>();
    for (var e : byCircuit.entrySet()) {
      parts.add("circuit " + e.getKey() + " (" + String.join(", ", e.getValue()) + "): "
          + OutputUnit.plain(l.circuitVoltageKv(e.getKey())) + " kV");
    }
    return parts.isEmpty() ? OutputUnit.plain(l.nominalVoltageKv()) + " kV"
        : String.join("; ", parts);
  }

  /** "Drake: A, B, C (bundle of 2); 3/8 EHS: SW1 (shield)". */
  static String conductors(LineFacts l) {
    Map<String, List<String>> byType = new LinkedHashMap<>();
    for (LineFacts.Position p : l.positions()) {
      String where = p.position() + (p.role().equals("phase") ? "" : " (" + p.role() + ")")
          + (p.bundle() > 1 ? " (bundle of " + p.bundle() + ")" : "");
      byType.computeIfAbsent(p.conductor(), k -> new ArrayList<>()).add(where);
    }
    List<String> parts = new ArrayList<>();
    byType.forEach((type, where) -> parts.add(type + ": " + String.join(", ", where)));
    return String.join("; ", parts);
  }

  private static void conditions(StringBuilder b, LineFacts l) {
    if (l.conditions().isEmpty()) {
      b.append("<p>Line conditions: none given; only the surveyed state is checked.</p>");
      return;
    }
    b.append("<table class=\"conditions\"><thead><tr><th>condition</th><th>kind</th>"
        + "<th>conductor temperature</th><th>creep allowance</th><th>wind pressure</th>"
        + "<th>radial ice</th><th>swing angle</th><th>extra sag</th></tr></thead><tbody>");
    for (LineCondition c : l.conditions()) {
      b.append("<tr><td>").append(Html.esc(c.name())).append("</td><td>")
          .append(c.kind().name().toLowerCase(Locale.ROOT).replace('_', ' ')).append("</td>");
      cell(b, c.temperatureC(), 1, "\u00b0C");
      cell(b, c.kind() == LineCondition.Kind.TEMPERATURE || c.kind() == LineCondition.Kind.ICE
          ? c.creepAllowanceC() : Double.NaN, 1, "\u00b0C");
      cell(b, c.windPressurePa(), 1, "Pa");
      cell(b, c.kind() == LineCondition.Kind.ICE || c.iceThicknessM() > 0
          ? c.iceThicknessM() * 1000 : Double.NaN, 1, "mm");
      cell(b, Math.toDegrees(c.swingAngleRad()), 1, "\u00b0");
      cell(b, c.extraSagM(), 2, "m");
      b.append("</tr>");
    }
    b.append("</tbody></table>");
  }

  private static void cell(StringBuilder b, double v, int decimals, String unit) {
    b.append("<td class=\"num\">").append(Double.isNaN(v) ? "&ndash;"
        : OutputUnit.fixed(v, decimals) + "&nbsp;" + Html.esc(unit)).append("</td>");
  }

  static String acquired(RunFacts f) {
    if (f.firstSurveyDay().isEmpty()) {
      return f.acquisitionNote();
    }
    String first = f.firstSurveyDay().get().toString();
    String last = f.lastSurveyDay().map(Object::toString).orElse(first);
    return (first.equals(last) ? first : first + " to " + last) + " (UTC)";
  }

  /** The sentence saying from when years to violation count. */
  static String yearsBase(RunFacts f) {
    return f.firstSurveyDay().map(d -> "Years to violation count from the survey's first day, "
        + d + ": a site due in 2.0 years is due two years after that day, not after the run.")
        .orElse("Years to violation count from the day the survey was flown (the files do not "
            + "give that day: " + f.acquisitionNote() + ").");
  }

  private static String crs(RunAssessment run) {
    var units = run.model().units();
    String crs = units.crsName().isEmpty() ? "not named" : units.crsName();
    if (units.epsg().isPresent()) {
      crs += " (EPSG:" + units.epsg().getAsInt() + ")";
    }
    return crs;
  }

  private static void meta(StringBuilder b, String name, String value) {
    b.append("<div><dt>").append(Html.esc(name)).append("</dt><dd>").append(Html.esc(value))
        .append("</dd></div>");
  }

  private static void fact(StringBuilder b, String name, String value) {
    b.append("<dt>").append(Html.esc(name)).append("</dt><dd>").append(Html.esc(value))
        .append("</dd>");
  }
}
