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
    boolean ruled = run.profile().isPresent();
    if (ruled) {
      line(b, "Rule profile %s: %s", run.profile().get().name(), run.profile().get().title());
    } else {
      line(b, "No rule profile: distances were measured, no span was checked against a zone. "
          + "Check them with: clearance evaluate RUN_FOLDER --rules NAME|FILE "
          + "(clearance rules list names the built-in profiles).");
    }
    long na = count(run, SpanStatus.NOT_ASSESSED);
    long inc = count(run, SpanStatus.INCOMPLETE);
    long as = count(run, SpanStatus.ASSESSED);
    long clear = run.spans().stream().filter(SpanResult::clear).count();
    if (ruled) {
      line(b, "%d span%s: %d %s, %d %s, %d %s (%d with sites, %d clear)", run.spans().size(),
          run.spans().size() == 1 ? "" : "s", na, SpanStatus.NOT_ASSESSED.word(), inc,
          SpanStatus.INCOMPLETE.word(), as, SpanStatus.ASSESSED.word(), as - clear, clear);
      Map<String, int[]> perZone = HtmlReport.sitesPerZone(run.sites());
      List<String> parts = new ArrayList<>();
      perZone.forEach((z, c) -> parts.add(z + " " + c[1]));
      line(b, "Sites per zone: %s", parts.isEmpty() ? "none" : String.join(", ", parts));
      run.profile().filter(p -> !Double.isNaN(p.confidencePercent())).ifPresent(p -> line(b,
          "At %s %% confidence: %d violation site(s), %d possible violation site(s) (the zone "
              + "lies within the distance's interval)", OutputUnit.plain(p.confidencePercent()),
          run.sites().stream().filter(x -> x.interval().isPresent() && !x.possibleOnly())
              .count(), run.sites().stream().filter(CutSite::possibleOnly).count()));
    }
    for (SpanStatus s : List.of(SpanStatus.NOT_ASSESSED, SpanStatus.INCOMPLETE)) {
      // without a profile every span is NOT ASSESSED for that one reason, said above: list only
      // the spans the check itself could not assess
      List<SpanResult> list = run.spans().stream().filter(r -> ruled ? r.status() == s
          : r.span().status() == s).toList();
      if (list.isEmpty()) {
        continue;
      }
      b.append('\n');
      line(b, "%s (never clear):", s.word());
      int w = width(list);
      for (SpanResult r : list) {
        line(b, "  %-" + w + "s  %s", r.id(), ruled ? r.reason() : r.span().reason());
      }
    }
    if (ruled && !run.spans().isEmpty()) {
      b.append('\n');
      int n = Math.min(options.consoleSpans(), run.spans().size());
      List<SpanResult> shown = run.spans().subList(0, n);
      line(b, "Spans in order of attention (first %d of %d):", n, run.spans().size());
      int w = width(shown);
      int zw = Math.max("most urgent zone".length(), shown.stream().mapToInt(r -> r.worst()
          .map(CutSite::zone).orElse("-").length()).max().orElse(0));
      String row = "  %4s  %-" + w + "s  %-12s  %-" + zw + "s  %5s  %s";
      line(b, row, "rank", "span", "status", "most urgent zone", "sites", u.column("deficit"));
      for (SpanResult r : shown) {
        line(b, row, Integer.toString(r.rank().orElse(0)), r.id(), r.status().word(),
            r.worst().map(CutSite::zone).orElse("-"),
            r.sitesCounted() ? Integer.toString(r.sites().size()) : "-",
            r.worst().map(x -> u.lengthText(x.deficitM())).orElse("-"));
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

  private static long count(RunAssessment run, SpanStatus s) {
    return run.spans().stream().filter(r -> r.status() == s).count();
  }

  /** Width of the span id column: the longest id, at least the header's. */
  private static int width(List<SpanResult> spans) {
    return Math.max("span".length(), spans.stream().mapToInt(r -> r.id().length()).max()
        .orElse(0));
  }

  private static void line(StringBuilder b, String format, Object... args) {
    b.append(Html.f(format, args)).append('\n');
  }
}
