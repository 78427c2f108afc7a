package org.clearance.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.clearance.assess.CutSite;
import org.clearance.assess.RunAssessment;
import org.clearance.assess.SpanResult;
import org.clearance.clearance.SpanStatus;

/**
 * The short text the report stage prints: the profile, span counts, sites per zone, the spans
 * NOT ASSESSED and INCOMPLETE with their reasons, the first spans in ranking order, the files
 * written and the caution.
 */
public final class ConsoleSummary {

  /** Longest reason printed on one line, characters; the span table has the whole text. */
  static final int REASON_CHARS = 100;

  private ConsoleSummary() {}

  /**
   * The summary text.
   *
   * @param run the evaluated run
   * @param options report options (unit, number of spans listed)
   * @param written names of the files written
   * @param notes remarks about the outputs (e.g. a file not written and why)
   */
  public static String text(RunAssessment run, ReportOptions options, List<String> written,
      List<String> notes) {
    OutputUnit u = new OutputUnit(options.outputUnit());
    StringBuilder b = new StringBuilder();
    if (run.profile().isPresent()) {
      line(b, "Rule profile %s: %s", run.profile().get().name(), run.profile().get().title());
    } else {
      line(b, "No rule profile: distances measured, no span checked against a zone.");
    }
    long na = run.spans().stream().filter(r -> r.status() == SpanStatus.NOT_ASSESSED).count();
    long inc = run.spans().stream().filter(r -> r.status() == SpanStatus.INCOMPLETE).count();
    long found = run.spans().stream().filter(r -> !r.sites().isEmpty()).count();
    long clear = run.spans().stream().filter(SpanResult::clear).count();
    line(b, "%d span%s: %d NOT ASSESSED, %d INCOMPLETE, %d with sites, %d assessed and clear",
        run.spans().size(), run.spans().size() == 1 ? "" : "s", na, inc, found, clear);
    if (run.profile().isPresent()) {
      Map<String, int[]> perZone = HtmlReport.sitesPerZone(run.sites());
      List<String> parts = new ArrayList<>();
      perZone.forEach((z, c) -> parts.add(z + " " + c[1]));
      line(b, "Sites per zone: %s", parts.isEmpty() ? "none" : String.join(", ", parts));
    }
    for (SpanStatus s : List.of(SpanStatus.NOT_ASSESSED, SpanStatus.INCOMPLETE)) {
      List<SpanResult> list = run.spans().stream().filter(r -> r.status() == s).toList();
      if (list.isEmpty()) {
        continue;
      }
      b.append('\n');
      line(b, "%s (never clear):", s == SpanStatus.NOT_ASSESSED ? "NOT ASSESSED" : "INCOMPLETE");
      for (SpanResult r : list) {
        line(b, "  %-12s %s", r.id(), shorten(r.reason()));
      }
    }
    if (run.profile().isPresent() && !run.spans().isEmpty()) {
      b.append('\n');
      int n = Math.min(options.consoleSpans(), run.spans().size());
      line(b, "Spans in order of attention (first %d of %d):", n, run.spans().size());
      line(b, "  %4s  %-12s %-13s %-16s %5s  %s", "rank", "span", "status", "most urgent zone",
          "sites", u.column("deficit"));
      for (SpanResult r : run.spans().subList(0, n)) {
        String status = switch (r.status()) {
          case NOT_ASSESSED -> "NOT ASSESSED";
          case INCOMPLETE -> "INCOMPLETE";
          default -> r.sites().isEmpty() ? "clear" : "findings";
        };
        line(b, "  %4d  %-12s %-13s %-16s %5s  %s", r.rank().orElse(0), r.id(), status,
            r.worst().map(CutSite::zone).orElse("-"),
            r.sitesCounted() ? Integer.toString(r.sites().size()) : "-",
            r.worst().map(w -> u.lengthText(w.deficitM())).orElse("-"));
      }
    }
    b.append('\n');
    line(b, "Written: %s", String.join(", ", written));
    for (String note : notes) {
      line(b, "Note: %s", note);
    }
    line(b, "A screening aid: the utility's rules, the local regulator and qualified "
        + "line-clearance personnel govern; workers keep their minimum approach distances.");
    return b.toString();
  }

  private static String shorten(String s) {
    return s.length() <= REASON_CHARS ? s : s.substring(0, REASON_CHARS - 3) + "...";
  }

  private static void line(StringBuilder b, String format, Object... args) {
    b.append(Html.f(format, args)).append('\n');
  }
}
