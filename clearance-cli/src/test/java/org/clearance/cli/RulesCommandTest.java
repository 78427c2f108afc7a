package org.clearance.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.clearance.run.RunFixture;
import org.clearance.rules.RuleProfiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code clearance rules list | show | validate | explain}. */
class RulesCommandTest {

  @TempDir Path tmp;

  private static CliRun run(String... args) {
    return CliRun.of(args);
  }

  @Test
  void listNamesEveryBuiltInProfile() {
    CliRun r = run("rules", "list");
    assertEquals(0, r.exit(), r.err());
    for (String name : RuleProfiles.names()) {
      assertTrue(r.out().contains(name), name);
    }
    assertTrue(r.out().contains("California PRC 4293"), r.out());
  }

  @Test
  void showPrintsTheResolvedProfile() {
    CliRun r = run("rules", "show", "example-utility");
    assertEquals(0, r.exit(), r.err());
    // inherited from ca-prc4293 and the example's own zones, growth and fall-in
    assertTrue(r.out().contains("builds on: example-utility -> ca-prc4293"), r.out());
    assertTrue(r.out().contains("[1] prc4293 - violation reference"), r.out());
    // PRC 4293: 10 ft = 3.048 m at 110 kV and above (check-values.md section 4, published)
    assertTrue(r.out().contains("110 kV and above: 3.048 m"), r.out());
    assertTrue(r.out().contains("[2] work-trigger"), r.out());
    assertTrue(r.out().contains("the distance of zone prc4293 + one trim cycle"), r.out());
    assertTrue(r.out().contains("class 5: 0.9 / 0.45"), r.out());
    assertTrue(r.out().contains("Trim cycle: 3 years"), r.out());
    assertTrue(r.out().contains("Fall-in: checked in report groups survey, hot"), r.out());
  }

  @Test
  void validateAcceptsAGoodFileAndNamesTheKeyOfABadOne() throws IOException {
    Path good = Files.writeString(tmp.resolve("good.yaml"), String.join("\n",
        "name: good", "title: T", "source: S", "zones:",
        "  - {name: z, priority: 1, violation_reference: true, conditions: [all], "
            + "radial_m: 2}", ""));
    CliRun ok = run("rules", "validate", good.toString());
    assertEquals(0, ok.exit(), ok.err());
    assertTrue(ok.out().contains("valid rule profile good (1 zone;"), ok.out());
    Path bad = Files.writeString(tmp.resolve("bad.yaml"), String.join("\n",
        "name: bad", "title: T", "source: S", "zones:",
        "  - {name: z, priority: 1, violation_reference: true, conditions: [all], "
            + "radial_m: 2, colour: red}", ""));
    CliRun no = run("rules", "validate", bad.toString());
    assertEquals(2, no.exit());
    assertTrue(no.err().contains("bad.yaml"), no.err());
    assertTrue(no.err().contains("colour"), no.err());
    assertFalse(no.err().contains("\tat "), "no stack trace");
    assertEquals(2, run("rules", "validate", tmp.resolve("none.yaml").toString()).exit());
  }

  @Test
  void explainADescribedSpan() {
    CliRun r = run("rules", "explain", "--profile", "ca-prc4293",
        "--voltage-kv", "115", "--length-m", "200");
    assertEquals(0, r.exit(), r.err());
    // PRC 4293 (published): 10 ft at 110 kV and above, 4 ft (1.2192 m) from 2.4 to < 72 kV
    assertTrue(r.out().contains("less than 3.048 m"), r.out());
    CliRun low = run("rules", "explain", "--profile", "ca-prc4293",
        "--voltage-kv", "69", "--length-m", "120", "--altitude-m", "300");
    assertTrue(low.out().contains("less than 1.219 m"), low.out());
    CliRun below = run("rules", "explain", "--profile", "ca-prc4293",
        "--voltage-kv", "1", "--length-m", "50");
    assertEquals(0, below.exit());
    assertTrue(below.out().contains("NOT ASSESSED"), below.out());
  }

  @Test
  void explainASpanOfARunFolder() throws IOException {
    Path dir = RunFixture.metric().write(Files.createDirectory(tmp.resolve("run")));
    CliRun r = run("rules", "explain", "--profile", "example-utility",
        "--run", dir.toString(), "--span", "KV-10-11");
    assertEquals(0, r.exit(), r.err());
    assertTrue(r.out().contains("Span KV-10-11 of line KV"), r.out());
    assertTrue(r.out().contains("work-trigger"), r.out());
    CliRun missing = run("rules", "explain", "--profile", "example-utility",
        "--run", dir.toString(), "--span", "KV-99");
    assertEquals(2, missing.exit());
    assertTrue(missing.err().contains("no span 'KV-99'"), missing.err());
    assertTrue(missing.err().contains("KV-10-11"), missing.err());
    assertEquals(2, run("rules", "explain", "--profile", "ca-prc4293", "--run",
        dir.toString(), "--span", "KV-10-11", "--voltage-kv", "5").exit());
    assertEquals(2, run("rules", "explain", "--profile", "ca-prc4293").exit());
  }
}
