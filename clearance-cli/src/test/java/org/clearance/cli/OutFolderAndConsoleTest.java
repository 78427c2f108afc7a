package org.clearance.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.clearance.examples.DemoCorridor;
import org.clearance.examples.DemoOptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 10: an {@code --out} that cannot be written is refused before any computation, with a
 * message naming it; and no Java object's text (a record's {@code Name[field=...]}, an
 * {@code Optional[...]}, an {@code Object@1a2b3c}) ever reaches the console on an error path.
 */
class OutFolderAndConsoleTest {

  /** A record's toString ({@code SpanRecord[id=...}), an Optional's, or Object's default. */
  private static final Pattern JAVA_TEXT = Pattern.compile(
      "[a-zA-Z]+\\[[a-z]+=|Optional(Int|Double)?\\[|Optional\\.empty|\\b[A-Z][A-Za-z]+@[0-9a-f]{4,}"
          + "|\\bat org\\.clearance\\.|Exception\\b|sun\\.nio");

  @TempDir static Path shared;
  @TempDir Path dir;
  private static DemoCorridor.DemoFiles demo;

  @BeforeAll
  static void smallDemo() {
    demo = DemoCorridor.write(shared.resolve("input"),
        DemoOptions.defaults().withSpanCount(3).withPointDensity(1.0));
  }

  /** The inputs of a check; the survey named may not exist, to show --out is checked first. */
  private static List<String> inputs(String command, String survey, Path out) {
    return new ArrayList<>(List.of(command, "--survey", survey, "--structures",
        demo.structures().toString(), "--line", demo.lineSpec().toString(), "--out",
        out.toString(), "--threads", "1"));
  }

  private static void assertRefused(CliRun r, Path out, String words) {
    assertEquals(ClearanceCommand.EXIT_INPUT, r.exit(), r.out() + r.err());
    assertEquals(1, r.err().strip().lines().count(), "one line: " + r.err());
    assertTrue(r.err().startsWith("clearance: " + out + ", field '--out': "), r.err());
    assertTrue(r.err().contains(words), r.err());
    assertFalse(JAVA_TEXT.matcher(r.err()).find(), r.err());
  }

  @Test
  void danglingSymbolicLinkIsRefusedBeforeAnyInputIsRead() throws IOException {
    // regression (issue 10 item 13): a dangling-symlink --out was found only at the end
    Path out = Files.createSymbolicLink(dir.resolve("out"), dir.resolve("gone").resolve("x"));
    String missingSurvey = dir.resolve("not-read.las").toString();
    for (String command : List.of("check", "wires")) {
      CliRun r = CliRun.of(inputs(command, missingSurvey, out).toArray(new String[0]));
      assertRefused(r, out, "is a symbolic link to " + dir.resolve("gone").resolve("x")
          + ", which does not exist");
    }
    CliRun demoRun = CliRun.of("demo", "--spans", "3", "--out", out.toString());
    assertRefused(demoRun, out, "symbolic link");
    assertFalse(Files.exists(dir.resolve("gone")), "nothing created behind the link");
  }

  @Test
  void outWhereNoFileCanBeCreatedIsRefusedNamingIt() {
    // /proc takes no new files, not even from root (Linux procfs); its permission bits say
    // otherwise, so the check must try
    Path proc = Path.of("/proc");
    if (!Files.isDirectory(proc)) {
      return;
    }
    String missingSurvey = dir.resolve("not-read.las").toString();
    for (Path out : List.of(proc.resolve("x"), proc.resolve("x").resolve("y"))) {
      for (String command : List.of("check", "wires")) {
        CliRun r = CliRun.of(inputs(command, missingSurvey, out).toArray(new String[0]));
        assertRefused(r, out, "cannot be written: no file can be created in /proc");
      }
    }
  }

  @Test
  void outBelowAFileIsRefused() throws IOException {
    Path file = Files.writeString(dir.resolve("a-file.txt"), "mine");
    Path out = file.resolve("run");
    CliRun r = CliRun.of(inputs("check", dir.resolve("not-read.las").toString(), out)
        .toArray(new String[0]));
    assertRefused(r, out, "cannot be created: " + file + " is a file, not a folder");
    assertEquals("mine", Files.readString(file));
  }

  @Test
  void evaluateRefusesAnUnwritableOutBeforeReadingTheRun() throws IOException {
    Path out = Files.createSymbolicLink(dir.resolve("out"), dir.resolve("gone"));
    CliRun r = CliRun.of("evaluate", dir.resolve("no-run").toString(), "--rules",
        "example-utility", "--out", out.toString());
    assertEquals(ClearanceCommand.EXIT_INPUT, r.exit(), r.err());
    assertTrue(r.err().contains("no-run"), "the missing run folder is named first: " + r.err());
    Path run = Files.createDirectories(dir.resolve("run"));
    r = CliRun.of("evaluate", run.toString(), "--rules", "example-utility", "--out",
        out.toString());
    assertRefused(r, out, "symbolic link");
  }

  @Test
  void aFileOfTheWrongKindSaysWhatWasExpected() {
    // issue 11: a line specification given as the structures (or conductor) table was reported
    // as "a quote inside an unquoted field"
    CliRun r = CliRun.of("check", "--survey", demo.survey().toString(), "--structures",
        demo.lineSpec().toString(), "--line", demo.lineSpec().toString(), "--out",
        dir.resolve("run").toString());
    assertEquals(ClearanceCommand.EXIT_INPUT, r.exit(), r.err());
    assertTrue(r.err().contains(demo.lineSpec() + ", line ") && r.err().contains(
        "expected the structures table (CSV with a header line, or GeoJSON), but this looks "
            + "like a YAML file"), r.err());
    List<String> conductors = inputs("check", demo.survey().toString(), dir.resolve("run"));
    conductors.addAll(List.of("--conductors", demo.lineSpec().toString()));
    r = CliRun.of(conductors.toArray(new String[0]));
    assertTrue(r.err().contains("expected a conductor table (CSV with a header line)"), r.err());
  }

  /** Every error path below prints one or two lines of words, never a Java object's text. */
  @Test
  void errorPathsNeverPrintJavaObjects() throws IOException {
    Path bad = Files.writeString(dir.resolve("bad.yaml"), "name: [unclosed\n");
    Path csvAsYaml = demo.structures();
    Path yamlAsCsv = demo.lineSpec();
    Path run = dir.resolve("run");
    Path notRun = Files.createDirectories(dir.resolve("not-a-run"));
    Files.writeString(notRun.resolve("model.json"), "{\"format\":\"clearance-run-model/2\"}");
    Files.writeString(notRun.resolve("near-points.bin"), "CLRNEAR2");
    String survey = demo.survey().toString();
    List<List<String>> cases = new ArrayList<>();
    cases.add(inputs("check", dir.resolve("missing.las").toString(), run));
    cases.add(inputs("check", yamlAsCsv.toString(), run));
    cases.add(List.of("check", "--survey", survey, "--structures", yamlAsCsv.toString(),
        "--line", demo.lineSpec().toString(), "--out", run.toString()));
    cases.add(List.of("check", "--survey", survey, "--structures", csvAsYaml.toString(),
        "--line", csvAsYaml.toString(), "--out", run.toString()));
    cases.add(List.of("check", "--survey", survey, "--structures", csvAsYaml.toString(),
        "--line", bad.toString(), "--out", run.toString()));
    List<String> withRules = inputs("check", survey, run);
    withRules.addAll(List.of("--rules", bad.toString()));
    cases.add(withRules);
    List<String> noProfile = inputs("check", survey, run);
    noProfile.addAll(List.of("--rules", "no-such-profile"));
    cases.add(noProfile);
    List<String> conductors = inputs("check", survey, run);
    conductors.addAll(List.of("--conductors", yamlAsCsv.toString()));
    cases.add(conductors);
    List<String> accuracy = inputs("check", survey, run);
    accuracy.addAll(List.of("--survey-accuracy", "x"));
    cases.add(accuracy);
    cases.add(List.of("check", "--survy", survey));
    cases.add(List.of("survey", yamlAsCsv.toString()));
    cases.add(List.of("survey", dir.resolve("missing.las").toString()));
    cases.add(List.of("evaluate", notRun.toString(), "--rules", "example-utility"));
    cases.add(List.of("evaluate", dir.resolve("nothing").toString(), "--rules",
        "example-utility"));
    cases.add(List.of("rules", "show", "no-such-profile"));
    cases.add(List.of("rules", "validate", bad.toString()));
    cases.add(List.of("rules", "explain", "--rules", "example-utility"));
    cases.add(List.of("demo", "--spans", "-1", "--out", dir.resolve("demo").toString()));
    int errors = 0;
    for (List<String> c : cases) {
      CliRun r = CliRun.of(c.toArray(new String[0]));
      String printed = r.out() + r.err();
      assertFalse(JAVA_TEXT.matcher(printed).find(), String.join(" ", c) + " printed: "
          + printed);
      assertTrue(printed.strip().lines().count() <= 2, String.join(" ", c) + ": " + printed);
      errors += r.exit() == ClearanceCommand.EXIT_INPUT ? 1 : 0;
    }
    assertEquals(cases.size(), errors, "every case is an input error (exit 2)");
    try (Stream<Path> s = Files.list(dir)) {
      assertFalse(s.anyMatch(p -> p.getFileName().toString().contains("staging")),
          "no staging folder left");
    }
  }
}
