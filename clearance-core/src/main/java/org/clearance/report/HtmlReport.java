package org.clearance.report;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.clearance.assess.CutSite;
import org.clearance.assess.RunAssessment;
import org.clearance.assess.RunAssessor;
import org.clearance.assess.SpanResult;
import org.clearance.clearance.ConditionMinimum;
import org.clearance.clearance.SpanStatus;
import org.clearance.io.AtomicFiles;
import org.clearance.rules.SpanRules;
import org.clearance.rules.ZoneEvaluator;
import org.clearance.run.RunFacts;
import org.clearance.run.SpanRecord;

/**
 * Writes {@code report.html}: one self-contained page (inline CSS and SVG, no scripts, no
 * external resources) with the cautions, a summary, the spans that need attention because they
 * are NOT ASSESSED or INCOMPLETE, the ranked span table, a section per span with findings (site
 * table, plan and profile views) and the rule profile used.
 */
public final class HtmlReport {

  /** File name inside a run folder. */
  public static final String FILE_NAME = "report.html";

  private HtmlReport() {}

  /** Writes the page into a run folder. */
  public static void write(Path runDir, RunAssessment run, ReportOptions options)
      throws IOException {
    AtomicFiles.writeString(runDir.resolve(FILE_NAME), page(run, options, Instant.now()));
  }

  /** The page's text. */
  public static String page(RunAssessment run, ReportOptions options, Instant generated) {
    OutputUnit u = new OutputUnit(options.outputUnit());
    String day = RunFacts.runDay(generated).toString();
    String title = HtmlHeader.title(run);
    StringBuilder b = new StringBuilder(1 << 16);
    b.append("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">")
        .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">")
        .append("<title>").append(Html.esc(title)).append(" &ndash; vegetation clearance "
            + "screening</title><style>").append(HtmlStyle.CSS)
        .append(HtmlStyle.print(title + " \u00b7 run " + day)).append("</style></head><body>\n");
    HtmlHeader.write(b, run, day);
    cautions(b, run);
    HtmlHeader.inputs(b, run);
    HtmlSections.summary(b, run);
    HtmlSections.attention(b, run);
    overview(b, run, u);
    spanTable(b, run, u);
    int drawn = 0;
    for (SpanResult r : run.spans()) {
      if (r.sites().isEmpty()) {
        continue;
      }
      if (drawn++ >= options.drawnSpans()) {
        b.append(Html.f("<p class=\"note\">Only the first %d spans with findings are drawn; "
            + "the work list holds every site.</p>", options.drawnSpans()));
        break;
      }
      spanSection(b, run, r, u);
    }
    HtmlSections.profile(b, run);
    HtmlSections.notes(b, run, u);
    b.append(Html.f("<footer>Clearance %s &middot; run %s (UTC)</footer>\n",
        Html.esc(run.model().toolVersion()), Html.esc(day)));
    b.append("</body></html>\n");
    return b.toString();
  }

  private static void cautions(StringBuilder b, RunAssessment run) {
    b.append("<section class=\"cautions\" id=\"cautions\"><h2>Before you use this report</h2>"
        + "<ul>");
    for (String c : ReportCautions.GENERAL) {
      b.append("<li>").append(Html.esc(c)).append("</li>");
    }
    run.profile().ifPresent(p -> p.origins().stream().filter(o -> !o.cautions().isEmpty())
        .forEach(o -> b.append("<li>Rule profile ").append(Html.esc(o.name())).append(": ")
            .append(Html.esc(o.cautions().strip())).append("</li>")));
    b.append("</ul></section>\n");
  }

  private static void overview(StringBuilder b, RunAssessment run, OutputUnit u) {
    String map = SvgOverview.svg(run, u);
    if (map.isEmpty()) {
      return;
    }
    var units = run.model().units();
    String crs = units.crsName().isEmpty() ? "the survey's coordinates (CRS not named)"
        : units.crsName() + (units.epsg().isPresent() ? " (EPSG:" + units.epsg().getAsInt() + ")"
            : "");
    b.append("<section id=\"overview\"><h2>Overview map</h2><div class=\"figblock\"><figure>")
        .append(map).append("<figcaption>Drawn in ").append(Html.esc(crs))
        .append(", grid north up, one scale on both axes; drawn from the run, no map tiles."
            + "</figcaption></figure><ul class=\"legend\">");
    legendItem(b, "line", Palette.CONDUCTOR, "span, ASSESSED");
    legendItem(b, "dash", "#8a6d1f", "span, INCOMPLETE");
    legendItem(b, "dash", Palette.NOT_ASSESSED, "span, NOT ASSESSED");
    legendItem(b, "dash", "#3d6b4f", "right-of-way edge (line specification's width)");
    if (run.profile().isPresent()) {
      for (var z : run.profile().get().zones()) {
        legendItem(b, "dot", Palette.zone(z.priority()), "site in zone " + z.name()
            + " (priority " + z.priority() + ")");
      }
      if (run.profile().get().fallIn().enabled()) {
        legendItem(b, "dot", Palette.FALL_IN, "fall-in tree");
      }
    }
    b.append("<li>&#9632; structure</li></ul></div></section>\n");
  }

  private static void legendItem(StringBuilder b, String kind, String colour, String text) {
    b.append("<li><i class=\"key ").append(kind).append("\" style=\"--c:").append(colour)
        .append("\"></i>").append(Html.esc(text)).append("</li>");
  }

  private static void spanTable(StringBuilder b, RunAssessment run, OutputUnit u) {
    b.append("<section id=\"spans\"><h2>Spans in order of attention</h2>");
    b.append("<table class=\"spans\"><thead><tr><th>rank</th><th>span</th><th>line</th>"
        + "<th>structures</th><th>length</th><th>status</th><th>most urgent zone</th>"
        + "<th>sites</th><th>deficit</th><th>closest vegetation</th><th>in condition</th>"
        + "</tr></thead><tbody>");
    for (SpanResult r : run.spans()) {
      String cls = switch (r.status()) {
        case NOT_ASSESSED -> "na";
        case INCOMPLETE -> "inc";
        default -> r.sites().isEmpty() ? "clear" : "found";
      };
      b.append("<tr class=\"").append(cls).append("\"><td>")
          .append(r.rank().isPresent() ? Integer.toString(r.rank().getAsInt()) : "&ndash;")
          .append("</td><td>");
      if (!r.sites().isEmpty()) {
        b.append("<a href=\"#span-").append(Html.esc(anchor(r.id()))).append("\">")
            .append(Html.esc(r.id())).append("</a>");
      } else {
        b.append(Html.esc(r.id()));
      }
      ConditionMinimum gov = r.governingMinimum().orElse(null);
      b.append("</td><td>").append(Html.esc(r.span().context().lineId())).append("</td><td>")
          .append(Html.esc(r.span().from().id())).append(" &rarr; ")
          .append(Html.esc(r.span().to().id())).append("</td><td class=\"num\">")
          .append(Html.len(u, r.span().context().lengthM())).append("</td><td>")
          .append(statusBadge(r)).append("</td><td>")
          .append(r.worst().map(w -> swatch(w) + Html.esc(w.zone())).orElse("&ndash;"))
          .append("</td><td class=\"num\">")
          .append(r.sitesCounted() ? Integer.toString(r.sites().size()) : "&ndash;")
          .append("</td><td class=\"num\">")
          .append(Html.len(u, r.worst().map(CutSite::deficitM).orElse(Double.NaN)))
          .append("</td><td class=\"num\">").append(Html.minimum(u, gov == null ? Double.NaN
              : gov.distance(), run.model().keepRadiusM())).append("</td><td>")
          .append(gov == null ? "&ndash;" : Html.esc(gov.condition())).append("</td></tr>");
    }
    b.append("</tbody></table></section>\n");
  }

  /**
   * The status as a labelled badge with the same word as every other output; the colour tells an
   * assessed span with sites from one without.
   */
  static String statusBadge(SpanResult r) {
    String cls = switch (r.status()) {
      case NOT_ASSESSED -> "na";
      case INCOMPLETE -> "inc";
      default -> r.sites().isEmpty() ? "clear" : "found";
    };
    return "<span class=\"badge " + cls + "\">" + r.status().word() + "</span>";
  }


  static String swatch(CutSite s) {
    return "<i class=\"sw\" style=\"background:" + Palette.site(s) + "\"></i>";
  }

  static String anchor(String id) {
    return id.replaceAll("[^A-Za-z0-9_.-]", "_");
  }

  private static void spanSection(StringBuilder b, RunAssessment run, SpanResult r,
      OutputUnit u) {
    SpanRecord s = r.span();
    b.append("<section class=\"span\" id=\"span-").append(Html.esc(anchor(r.id())))
        .append("\"><h2>Span ").append(Html.esc(r.id())).append(" <small>")
        .append(Html.esc(s.lineName().isEmpty() ? s.context().lineId() : s.lineName()))
        .append(", ").append(Html.esc(s.from().id())).append(" &rarr; ")
        .append(Html.esc(s.to().id())).append(", ").append(Html.len(u, s.context().lengthM()))
        .append("</small> ").append(statusBadge(r)).append("</h2>");
    if (!r.reason().isEmpty()) {
      b.append("<p class=\"reason\">").append(Html.esc(r.reason())).append("</p>");
    }
    for (String note : s.notes()) {
      b.append("<p class=\"note\">").append(Html.esc(note)).append("</p>");
    }
    HtmlSections.siteTable(b, r, u);
    // on a span of several voltages, the zone band of the highest voltage the profile covers
    SpanRules rules = run.profile().map(p -> org.clearance.rules.CircuitRules.forSpan(
        new ZoneEvaluator(p), s.context()).main()).orElse(null);
    SvgSpanViews views = new SvgSpanViews(r, SvgSpanViews.governingIndex(r, run.model()),
        rules, run.drawings().get(r.id()), u);
    if (!views.drawable()) {
      b.append("<p class=\"note\">The span's structures coincide in plan: not drawn.</p>");
    } else {
      b.append("<div class=\"figblock\">");
      Map<String, SvgSpanViews.View> both = new LinkedHashMap<>();
      both.put("Plan", views.plan());
      both.put("Profile", views.profile());
      for (var e : both.entrySet()) {
        b.append("<figure>").append(e.getValue().svg()).append("<figcaption>")
            .append(e.getKey()).append(" view");
        double k = e.getValue().stretch();
        if (k > 1.05 || k < 0.95) {
          b.append(Html.f(" (%s stretched &times;%.1f against chainage)",
              e.getKey().equals("Plan") ? "offsets" : "heights", k));
        }
        if (e.getKey().equals("Profile") && r.sites().stream()
            .anyMatch(site -> site.kind() == CutSite.Kind.FALL_IN)) {
          b.append("; a fall-in tree is a faint dashed stem at its place along the span: it "
              + "stands at its offset from the centre line (table above, plan view), which a "
              + "profile cannot show, so a stem drawn across the wires is not under them");
        }
        b.append("</figcaption></figure>");
      }
      HtmlSections.legend(b, r, run, SvgSpanViews.governingIndex(r, run.model()));
      b.append("</div>");
      section(b, run, r, rules, u);
    }
    b.append("</section>\n");
  }

  private static void section(StringBuilder b, RunAssessment run, SpanResult r,
      SpanRules rules, OutputUnit u) {
    List<String> names = run.model().conditions().names();
    String svg = SvgSection.svg(r, rules, run.drawings().get(r.id()), u, names);
    if (svg.isEmpty()) {
      return;
    }
    CutSite site = r.sites().get(0);
    b.append("<div class=\"figblock\"><figure>").append(svg).append("<figcaption>")
        .append(Html.f("Cross-section at site %s (%s), looking from %s to %s, true scale: the "
            + "conductors where they are in each condition at this point of the span (a line "
            + "joins the ends of a swing range), the violation-reference zone around the "
            + "governing conductor in the governing condition, vegetation within %s m along the "
            + "span, and the site where it stands (a tree: stem and crown).",
            Html.esc(site.siteId()), Html.esc(site.zone()), Html.esc(r.span().from().id()),
            Html.esc(r.span().to().id()), OutputUnit.plain(SvgSection.SLICE_M)))
        .append("</figcaption></figure><ul class=\"legend\">");
    for (int k = 0; k < names.size(); k++) {
      legendItem(b, "dot", SvgSection.colour(k), "conductor, " + names.get(k));
    }
    b.append("</ul></div>");
  }

  /** Counts of sites per zone in priority order (for the summary and the console). */
  static Map<String, int[]> sitesPerZone(List<CutSite> sites) {
    Map<String, int[]> out = new LinkedHashMap<>();
    sites.stream().sorted(RunAssessor.SITE_ORDER).forEach(s ->
        out.computeIfAbsent(s.zone(), z -> new int[] {s.priority(), 0})[1]++);
    return out;
  }
}
