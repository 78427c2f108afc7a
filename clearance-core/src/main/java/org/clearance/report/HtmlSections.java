package org.clearance.report;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.clearance.assess.CutSite;
import org.clearance.assess.FindingInterval;
import org.clearance.assess.RunAssessment;
import org.clearance.assess.SpanResult;
import org.clearance.clearance.SpanStatus;
import org.clearance.rules.GrowthRates;
import org.clearance.rules.ProfileOrigin;
import org.clearance.rules.RuleProfile;
import org.clearance.rules.Zone;

/** Sections of the HTML report besides the span table and span drawings. */
final class HtmlSections {

  private HtmlSections() {}

  static void summary(StringBuilder b, RunAssessment run) {
    long na = count(run, SpanStatus.NOT_ASSESSED);
    long inc = count(run, SpanStatus.INCOMPLETE);
    long as = count(run, SpanStatus.ASSESSED);
    long clear = run.spans().stream().filter(SpanResult::clear).count();
    b.append("<section id=\"summary\"><h2>Summary</h2><div class=\"tiles\">");
    tile(b, "spans in the run", run.spans().size(), "");
    tile(b, SpanStatus.NOT_ASSESSED.word(), na, na > 0 ? "na" : "");
    tile(b, SpanStatus.INCOMPLETE.word(), inc, inc > 0 ? "inc" : "");
    tile(b, SpanStatus.ASSESSED.word() + ", with sites", as - clear, as - clear > 0 ? "found" : "");
    tile(b, SpanStatus.ASSESSED.word() + ", clear", clear, "clear");
    b.append("</div>");
    b.append(Html.f("<p class=\"note\">Each span is counted once, by its status: %d + %d + %d "
        + "+ %d = %d. %d cut sites in %d spans (INCOMPLETE spans may have sites too).</p>", na,
        inc, as - clear, clear, run.spans().size(), run.sites().size(),
        run.spans().stream().filter(r -> !r.sites().isEmpty()).count()));
    if (run.profile().isEmpty()) {
      b.append("<p class=\"reason\">No rule profile was applied: clearances were measured but "
          + "no span was checked against any zone, so every span is NOT ASSESSED. Evaluate "
          + "the run folder with a profile to rank the spans.</p>");
    } else {
      Map<String, int[]> perZone = HtmlReport.sitesPerZone(run.sites());
      b.append("<table class=\"zones\"><thead><tr><th>priority</th><th>zone</th>"
          + "<th>sites</th></tr></thead><tbody>");
      for (Zone z : run.profile().get().zones()) {
        int[] c = perZone.get(z.name());
        b.append(Html.f("<tr><td class=\"num\">%d</td><td><i class=\"sw\" style=\"background:"
            + "%s\"></i>%s%s</td><td class=\"num\">%d</td></tr>", z.priority(),
            Palette.zone(z.priority()), Html.esc(z.name()),
            z.violationReference() ? " <small>(violation reference)</small>" : "",
            c == null ? 0 : c[1]));
      }
      if (run.profile().get().fallIn().enabled()) {
        int[] c = perZone.get(CutSite.FALL_IN_ZONE);
        b.append(Html.f("<tr><td class=\"num\">%d</td><td><i class=\"sw\" style=\"background:"
            + "%s\"></i>fall-in trees</td><td class=\"num\">%d</td></tr>",
            RunAssessment.fallInPriority(run.profile().get()), Palette.FALL_IN,
            c == null ? 0 : c[1]));
      }
      b.append("</tbody></table>");
    }
    b.append("</section>\n");
  }

  private static long count(RunAssessment run, SpanStatus s) {
    return run.spans().stream().filter(r -> r.status() == s).count();
  }

  private static void tile(StringBuilder b, String label, long n, String cls) {
    b.append("<div class=\"tile ").append(cls).append("\"><b>").append(n).append("</b><span>")
        .append(Html.esc(label)).append("</span></div>");
  }

  /** NOT ASSESSED and INCOMPLETE spans, each with its reason. */
  static void attention(StringBuilder b, RunAssessment run) {
    List<SpanResult> na = run.spans().stream()
        .filter(r -> r.status() == SpanStatus.NOT_ASSESSED).toList();
    List<SpanResult> inc = run.spans().stream()
        .filter(r -> r.status() == SpanStatus.INCOMPLETE).toList();
    if (na.isEmpty() && inc.isEmpty()) {
      return;
    }
    b.append("<section class=\"attention\" id=\"attention\"><h2>Spans not shown clear</h2>"
        + "<p>These spans could not be checked, or not fully. They are not clear: inspect them "
        + "by other means or fix the input and run again.</p>");
    for (var group : List.of(na, inc)) {
      if (group.isEmpty()) {
        continue;
      }
      b.append("<ul>");
      for (SpanResult r : group) {
        b.append("<li>").append(HtmlReport.statusBadge(r)).append(" <b>span ")
            .append(Html.esc(r.id())).append("</b> (").append(Html.esc(r.span().from().id()))
            .append(" &rarr; ").append(Html.esc(r.span().to().id())).append("): ")
            .append(Html.esc(r.reason().isEmpty() ? "no reason recorded" : r.reason()))
            .append("</li>");
      }
      b.append("</ul>");
    }
    b.append("</section>\n");
  }

  static void siteTable(StringBuilder b, SpanResult r, OutputUnit u) {
    b.append("<table class=\"sites\"><thead><tr><th>site</th><th>zone</th><th>condition</th>"
        + "<th>clearance</th><th>required</th><th>deficit</th><th>chainage</th><th>side</th>"
        + "<th>offset</th><th>vegetation height</th><th>cut to</th><th>points</th>"
        + "<th>years to violation</th><th>verdict (interval)</th></tr></thead><tbody>");
    for (CutSite s : r.sites()) {
      b.append("<tr><td>").append(Html.esc(s.siteId())).append("</td><td>")
          .append(HtmlReport.swatch(s)).append(Html.esc(s.zone())).append(zoneNote(r, s))
          .append("</td><td>")
          .append(Html.esc(s.condition())).append("</td><td class=\"num\">")
          .append(Html.len(u, s.minClearanceM())).append("</td><td class=\"num\">")
          .append(Html.len(u, s.requiredM())).append("</td><td class=\"num\">")
          .append(Html.len(u, s.deficitM())).append("</td><td class=\"num\">")
          .append(Html.len(u, s.chainageM())).append("</td><td>").append(s.side().word())
          .append("</td><td class=\"num\">").append(Html.len(u, s.offsetM()))
          .append("</td><td class=\"num\">").append(Html.len(u, s.vegHeightM()))
          .append("</td><td class=\"num\">").append(Html.len(u, s.cutToHeightM()))
          .append("</td><td class=\"num\">")
          .append(s.points().isPresent() ? Integer.toString(s.points().getAsInt()) : "tree")
          .append("</td><td class=\"num\">").append(Html.years(s.yearsToViolation()))
          .append("</td><td class=\"verdict\">").append(verdict(s, u)).append("</td></tr>");
    }
    b.append("</tbody></table>");
  }

  /**
   * What the zone cell adds (HTML): a pole-clearing site is around the pole; on a span whose
   * circuits carry different voltages, the conductor and its voltage (issue 15).
   */
  static String zoneNote(SpanResult r, CutSite s) {
    if (s.kind() == CutSite.Kind.POLE_CLEARING) {
      return " <small>(around the pole)</small>";
    }
    var c = r.span().context();
    if (!c.multiVoltage() || s.conductor().isEmpty()) {
      return "";
    }
    double kv = c.voltageOf(s.conductor());
    return " <small>(" + Html.esc(s.conductor())
        + (Double.isNaN(kv) ? "" : ", " + Html.esc(org.clearance.rules.VoltageBand.kv(kv)))
        + ")</small>";
  }

  /** A site's verdict with its interval and the input that dominates its uncertainty (HTML). */
  static String verdict(CutSite s, OutputUnit u) {
    if (s.interval().isEmpty()) {
      return "";
    }
    FindingInterval i = s.interval().get();
    return Html.esc(i.verdict().words()) + ": " + Html.len(u, i.lowM()) + " to "
        + Html.len(u, i.highM()) + " at " + Html.esc(OutputUnit.plain(i.confidencePercent()))
        + " % (standard uncertainty " + Html.len(u, i.sigmaM()) + "; "
        + Html.esc(i.dominant()) + " dominates)";
  }

  static void legend(StringBuilder b, SpanResult r, RunAssessment run, int governing) {
    b.append("<ul class=\"legend\">");
    item(b, "line", Palette.CONDUCTOR, "conductors as surveyed");
    if (governing > 0) {
      item(b, "dash", Palette.GOVERNING, "conductors in " + run.model().conditions().names()
          .get(governing) + " (governing condition)");
    }
    run.profile().flatMap(p -> p.referenceZones().stream().findFirst()).ifPresent(z ->
        item(b, "band", Palette.zone(z.priority()), "zone " + z.name()
            + " (violation reference) around the governing conductors"));
    item(b, "dot", Palette.VEGETATION, "other vegetation near the line (sample)");
    r.sites().stream().map(s -> s.zone()).distinct().forEach(z -> {
      CutSite s = r.sites().stream().filter(x -> x.zone().equals(z)).findFirst().orElseThrow();
      item(b, "dot", Palette.site(s), s.kind() == CutSite.Kind.FALL_IN
          ? "fall-in tree (crown in plan, stem in profile)"
          : s.kind() == CutSite.Kind.POLE_CLEARING ? "inside pole-clearing zone " + z
              + " (clear around the pole)" : "inside zone " + z);
    });
    b.append("</ul>");
  }

  private static void item(StringBuilder b, String kind, String colour, String text) {
    b.append("<li><i class=\"key ").append(kind).append("\" style=\"--c:").append(colour)
        .append("\"></i>").append(Html.esc(text)).append("</li>");
  }

  static void profile(StringBuilder b, RunAssessment run) {
    b.append("<section id=\"profile\"><h2>Rule profile</h2>");
    if (run.profile().isEmpty()) {
      b.append("<p>None was applied.</p></section>\n");
      return;
    }
    RuleProfile p = run.profile().get();
    b.append("<dl class=\"facts\">");
    fact(b, "name", p.name());
    fact(b, "title", p.title());
    fact(b, "content SHA-256", p.contentHash());
    b.append("</dl><table class=\"chain\"><thead><tr><th>file of the chain</th><th>from</th>"
        + "<th>source</th></tr></thead><tbody>");
    for (ProfileOrigin o : p.origins()) {
      b.append("<tr><td>").append(Html.esc(o.name())).append("</td><td>")
          .append(Html.esc(o.shownLocation())).append("</td><td>").append(Html.esc(o.source().strip()))
          .append("</td></tr>");
    }
    b.append("</tbody></table><table class=\"zones\"><thead><tr><th>priority</th><th>zone</th>"
        + "<th>applies in</th><th>voltages</th><th>note</th></tr></thead><tbody>");
    for (Zone z : p.zones()) {
      b.append(Html.f("<tr><td class=\"num\">%d</td><td>%s%s</td><td>%s</td><td>%s</td>"
          + "<td>%s</td></tr>", z.priority(), Html.esc(z.name()),
          z.violationReference() ? " <small>(violation reference)</small>" : "",
          Html.esc(z.measurement() instanceof org.clearance.rules.Measurement.PoleCylinder c
              ? "pole clearing: " + c.describe() : z.conditions().describe()),
          Html.esc(z.voltage().describe()), Html.esc(z.note())));
    }
    b.append("</tbody></table>");
    b.append("<p>").append(Html.esc(growth(p))).append(' ')
        .append(Html.esc(p.fallIn().enabled() ? "Fall-in is checked in "
            + p.fallIn().conditions().describe() + "." : "Fall-in is not part of the profile."))
        .append("</p>");
    b.append("<p class=\"note\">Use <code>clearance rules explain</code> to see which distance "
        + "applies to a span and why.</p></section>\n");
  }

  private static String growth(RuleProfile p) {
    if (p.growth().isEmpty()) {
      return "The profile gives no growth rates: years to violation are not computed and cut "
          + "heights add no growth.";
    }
    GrowthRates g = p.growth().get();
    StringBuilder s = new StringBuilder("Growth, m/year up and sideways: ");
    for (var e : new TreeMap<>(g.byClass()).entrySet()) {
      s.append(Html.f("class %d %.2f / %.2f; ", e.getKey(), e.getValue().verticalMPerYear(),
          e.getValue().lateralMPerYear()));
    }
    s.append(Html.f("other classes %.2f / %.2f.", g.fallback().verticalMPerYear(),
        g.fallback().lateralMPerYear()));
    if (Double.isFinite(p.trimCycleYears())) {
      s.append(Html.f(" Trim cycle %s years.", OutputUnit.fixed(p.trimCycleYears(), 1)));
    }
    return s.toString();
  }

  private static void fact(StringBuilder b, String name, String value) {
    b.append("<dt>").append(Html.esc(name)).append("</dt><dd>").append(Html.esc(value))
        .append("</dd>");
  }

  static void notes(StringBuilder b, RunAssessment run, OutputUnit u) {
    b.append("<section id=\"notes\"><h2>How the figures are made</h2><ul>");
    b.append("<li>A site is a clump of vegetation points inside a zone: points closer than the "
        + "link distance to one another (3D) belong to the same site. Its zone is the most "
        + "urgent zone any of its points is inside; clearance, required distance, deficit, "
        + "condition and location are those of the point deepest inside that zone.</li>");
    b.append("<li>Deficit = required distance minus clearance. Chainage is measured along the "
        + "span from its first structure; side and offset are looking from the first structure "
        + "to the second.</li>");
    b.append("<li>Cut to: the height above ground at which the vegetation's top must be cut so "
        + "that, after one trim cycle of upward growth at its class's rate, it is still outside "
        + "the violation-reference zone in every condition that zone applies in (0 = remove). "
        + "No height is given where the vegetation is beside the zone: trim it from the side."
        + "</li>");
    b.append("<li>Years to violation: when the site grows into the violation-reference zone at "
        + "the profile's rates (0 = inside it now).</li>");
    b.append("<li>Lengths are in ").append(u.symbol().equals("m") ? "metres" : "international "
        + "feet").append("; coordinates in the work list are in the survey's own CRS and units. ")
        .append(Html.esc("Longitude and latitude: " + run.lonLatNote() + "."))
        .append("</li></ul></section>\n");
  }
}
