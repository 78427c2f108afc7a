package org.clearance.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.clearance.assess.RunAssessment;
import org.clearance.assess.RunAssessor;
import org.clearance.rules.RuleProfiles;
import org.clearance.run.RunFixture;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** report.html: self-contained, and rendered by headless Chromium (Debian chromium). */
class HtmlReportTest {

  private static final Path CHROMIUM = Path.of("/usr/bin/chromium");

  @TempDir Path dir;
  private String html;

  @BeforeEach
  void write() throws IOException {
    RunFixture f = RunFixture.metric();
    f.write(dir);
    ReportStage.run(dir, f.model(), RuleProfiles.builtin("example-utility"),
        ReportOptions.defaults(), null);
    html = Files.readString(dir.resolve("report.html"));
  }

  @Test
  void selfContained() {
    assertFalse(html.contains("<script"), "no scripts");
    assertFalse(html.contains("<link"), "no linked style sheets");
    assertFalse(html.contains(" src="), "no external images or frames");
    assertFalse(html.contains("url("), "no external resources in CSS");
    // the only URL is the SVG namespace name, which is never fetched
    Matcher m = Pattern.compile("https?://[^\"']*").matcher(html);
    while (m.find()) {
      assertEquals("http://www.w3.org/2000/svg", m.group());
    }
  }

  @Test
  void drawsPlanAndProfileForTheSpanWithFindingsOnly() {
    assertEquals(2, count(html, "<svg "), "two views of the one span with sites");
    assertTrue(html.contains("aria-label=\"Plan view of span KV-10-11\""));
    assertTrue(html.contains("aria-label=\"Profile view of span KV-10-11\""));
  }

  @Test
  void spansBeyondTheDrawingLimitAreListedNotDrawn() throws IOException {
    RunFixture f = RunFixture.metric();
    ReportOptions none = new ReportOptions(org.clearance.survey.LinearUnit.METRE, 1.5, 10, 0,
        600);
    RunAssessment a = RunAssessor.assess(f.model(), dir.resolve("near-points.bin"),
        RuleProfiles.builtin("example-utility"), none.assessOptions());
    String page = HtmlReport.page(a, none, java.time.Instant.EPOCH);
    assertEquals(0, count(page, "<svg "));
    assertTrue(page.contains("Only the first 0 spans with findings are drawn"));
    assertTrue(a.drawings().isEmpty());
  }

  @Test
  void chromiumRendersTheSummaryProfileCautionsAndNotAssessedSpans() throws Exception {
    // CI installs the tool and sets CLEARANCE_REQUIRE_EXTERNAL_TOOLS: there its absence fails.
    if (System.getenv("CLEARANCE_REQUIRE_EXTERNAL_TOOLS") != null) {
      assertTrue(Files.isExecutable(CHROMIUM), "chromium is required in CI but not installed");
    }
    Assumptions.assumeTrue(Files.isExecutable(CHROMIUM), "chromium is not installed");
    Path profileDir = Files.createTempDirectory(dir, "chromium-user");
    Process p = new ProcessBuilder(CHROMIUM.toString(), "--headless", "--no-sandbox",
        "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
        "--disable-component-update", "--disable-sync", "--user-data-dir=" + profileDir,
        "--dump-dom", dir.resolve("report.html").toUri().toString())
        .redirectError(ProcessBuilder.Redirect.DISCARD).start();
    String dom = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
    assertTrue(p.waitFor(120, TimeUnit.SECONDS), "chromium did not finish");
    assertEquals(0, p.exitValue());
    String text = dom.replaceAll("(?s)<style.*?</style>", " ").replaceAll("<[^>]+>", " ")
        .replace("&nbsp;", " ").replace("&amp;", "&").replace("&#39;", "'")
        .replaceAll("\\s+", " ");
    for (String expected : List.of(
        "Summary", "spans in the run", "NOT ASSESSED",
        "example-utility", "Corvane Ridge Electric vegetation zones (invented example)",
        "content SHA-256", RuleProfiles.builtin("example-utility").contentHash(),
        "This is a screening aid",
        "qualified line-clearance personnel govern",
        "Workers keep the minimum approach distances",
        "span KV-11-12", "no conductor points found in the span",
        "Spans in order of attention", "KV-10-11.1", "fall-in")) {
      assertTrue(text.contains(expected), "rendered page lacks: " + expected);
    }
  }

  private static int count(String s, String what) {
    int n = 0;
    for (int i = s.indexOf(what); i >= 0; i = s.indexOf(what, i + 1)) {
      n++;
    }
    return n;
  }
}
