package org.clearance.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.clearance.RunFolder;
import org.clearance.examples.DemoCorridor;
import org.clearance.examples.DemoOptions;
import org.clearance.run.RunRecord;
import org.clearance.run.RunRecordJson;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Kill test (issue 10, item 2): {@code clearance check} and {@code clearance evaluate} run as
 * child JVMs on a small demo corridor and are killed (SIGKILL) at seeded random moments. After
 * each kill the run folder, once repaired as the next command repairs it, must hold one whole
 * run - the previous one or the new one, byte for byte, never a mix or half of one - and no
 * input or user file may be gone; the rerun must then succeed without a stack trace and leave
 * nothing beside the folder but its lock file. The same inputs must also give the same bytes
 * (item 11): two checks are compared file by file.
 */
class RunFolderKillTest {

  /** Seed of the kill moments; fixed in CI. */
  private static final long SEED = 20261204L;
  /** Kills of each command: enough moments across a run within about a minute of CI time. */
  private static final int KILLS = 6;
  /** Longest a child may take before the test calls it a hang, s. */
  private static final long HANG_S = 300;
  /** Files every run writes the same way from the same inputs (times live in run.json and
   * report.html). */
  private static final List<String> DETERMINISTIC = List.of("model.json", "near-points.bin",
      "conductors.csv", "spans.csv", "worklist.csv", "sites.gpkg");
  private static final String OLD_PROFILE = "ca-prc4293";
  private static final String NEW_PROFILE = "example-utility";

  @TempDir Path tmp;
  private DemoCorridor.DemoFiles demo;

  private List<String> checkArgs(Path out, String profile) {
    return List.of("check", "--survey", demo.survey().toString(), "--structures",
        demo.structures().toString(), "--line", demo.lineSpec().toString(), "--out",
        out.toString(), "--threads", "2", "--rules", profile);
  }

  private static CliRun inProcess(List<String> args) {
    CliRun r = CliRun.of(args.toArray(new String[0]));
    assertEquals(0, r.exit(), r.err());
    assertFalse(r.err().contains("\tat "), r.err());
    return r;
  }

  /** Starts {@code clearance args} in a child JVM with the test's class path. */
  private Process child(List<String> args) throws IOException {
    List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin",
        "java").toString(), "-Xmx512m", "-XX:TieredStopAtLevel=1", "-cp",
        System.getProperty("java.class.path"),
        ClearanceCommand.class.getName()));
    cmd.addAll(args);
    return new ProcessBuilder(cmd).redirectErrorStream(true)
        .redirectOutput(tmp.resolve("child.log").toFile()).start();
  }

  private static void awaitEnd(Process p, String label) throws InterruptedException {
    if (!p.waitFor(HANG_S, TimeUnit.SECONDS)) {
      p.destroyForcibly();
      fail(label + ": no end within " + HANG_S + " s");
    }
  }

  private static Map<String, byte[]> files(Path dir) throws IOException {
    Map<String, byte[]> out = new TreeMap<>();
    try (Stream<Path> s = Files.walk(dir)) {
      for (Path p : s.filter(Files::isRegularFile).toList()) {
        out.put(dir.relativize(p).toString(), Files.readAllBytes(p));
      }
    }
    return out;
  }

  private static Set<String> names(Path dir) throws IOException {
    try (Stream<Path> s = Files.list(dir)) {
      return new TreeSet<>(s.map(p -> p.getFileName().toString()).toList());
    }
  }

  private static Path copy(Path from, Path to) throws IOException {
    Files.createDirectories(to);
    try (Stream<Path> s = Files.list(from)) {
      for (Path p : s.toList()) {
        Files.copy(p, to.resolve(p.getFileName()));
      }
    }
    return to;
  }

  /** A file's bytes (model.json holds no day of the run: the same inputs give the same bytes). */
  private static byte[] comparable(Path f) throws IOException {
    return Files.readAllBytes(f);
  }

  /** The folder holds exactly the run of {@code ref}: its files, the same deterministic bytes. */
  private static void assertSameRun(Path ref, Path out, String label) throws IOException {
    RunRecord record = RunRecordJson.read(out.resolve("run.json"));
    assertEquals(new TreeSet<>(record.outputs()), names(out), label + ": whole run");
    assertEquals(names(ref), names(out), label);
    for (String f : DETERMINISTIC) {
      assertArrayEquals(comparable(ref.resolve(f)), comparable(out.resolve(f)), label + ": " + f);
    }
  }

  /** After the repair the next command does, the previous run or the new one, whole. */
  private static void assertOldOrNew(Path out, Path old, Path fresh, String label)
      throws IOException {
    RunFolder.open(out, "RUN_DIR").close(); // the repair the next command does first
    assertTrue(Files.isDirectory(out), label + ": the run folder is never lost");
    RunRecord record = RunRecordJson.read(out.resolve("run.json"));
    String profile = record.profile().orElseThrow().name();
    assertSameRun(profile.equals(NEW_PROFILE) ? fresh : old, out, label + " (" + profile
        + " run)");
  }

  @Test
  void killedRunsLeaveWholeRunFoldersAndRerunsSucceed() throws Exception {
    demo = DemoCorridor.write(tmp.resolve("input"),
        DemoOptions.defaults().withSpanCount(3).withPointDensity(1.0));
    Map<String, byte[]> inputs = files(tmp.resolve("input"));
    Path old = tmp.resolve("ref-old");
    inProcess(checkArgs(old, OLD_PROFILE));
    Path fresh = tmp.resolve("ref-new");
    inProcess(checkArgs(fresh, NEW_PROFILE));
    Path evaluated = copy(old, tmp.resolve("ref-evaluated"));
    inProcess(List.of("evaluate", evaluated.toString(), "--rules", NEW_PROFILE));

    // same inputs, same bytes: a child JVM's check equals the in-process one
    Path again = tmp.resolve("ref-new-child");
    long t0 = System.nanoTime();
    Process first = child(checkArgs(again, NEW_PROFILE));
    awaitEnd(first, "full child check");
    double checkS = (System.nanoTime() - t0) / 1e9;
    assertEquals(0, first.exitValue(), Files.readString(tmp.resolve("child.log")));
    assertSameRun(fresh, again, "second check");
    t0 = System.nanoTime();
    Path evalAgain = copy(old, tmp.resolve("ref-evaluated-child"));
    Process ev = child(List.of("evaluate", evalAgain.toString(), "--rules", NEW_PROFILE));
    awaitEnd(ev, "full child evaluate");
    double evaluateS = (System.nanoTime() - t0) / 1e9;
    assertEquals(0, ev.exitValue(), Files.readString(tmp.resolve("child.log")));
    assertSameRun(evaluated, evalAgain, "second evaluate");

    Random r = new Random(SEED);
    int killed = 0;
    for (int i = 0; i < 2 * KILLS; i++) {
      boolean check = i < KILLS;
      Path parent = Files.createDirectories(tmp.resolve("kill" + i));
      Path out = copy(old, parent.resolve("run"));
      Files.writeString(parent.resolve("notes.txt"), "crew notes");
      List<String> args = check ? checkArgs(out, NEW_PROFILE)
          : List.of("evaluate", out.toString(), "--rules", NEW_PROFILE);
      long delayMs = (long) (r.nextDouble() * 1000 * (check ? checkS : evaluateS));
      String label = (check ? "check" : "evaluate") + " killed after " + delayMs + " ms";
      Process p = child(args);
      if (!p.waitFor(delayMs, TimeUnit.MILLISECONDS)) {
        p.destroyForcibly();
        killed++;
      }
      awaitEnd(p, label);
      assertOldOrNew(out, old, check ? fresh : evaluated, label);
      // the rerun
      inProcess(args);
      assertSameRun(check ? fresh : evaluated, out, label + ", rerun");
      assertEquals(Set.of(".run.lock", "notes.txt", "run"), names(parent), label);
      assertEquals("crew notes", Files.readString(parent.resolve("notes.txt")));
    }
    Map<String, byte[]> after = files(tmp.resolve("input"));
    assertEquals(inputs.keySet(), after.keySet(), "no input file deleted");
    for (String k : inputs.keySet()) {
      assertTrue(Arrays.equals(inputs.get(k), after.get(k)), "input " + k + " unchanged");
    }
    System.out.printf("kill test: %d runs started, %d killed before their end "
        + "(check %.1f s, evaluate %.1f s per child run)%n", 2 * KILLS, killed, checkS,
        evaluateS);
    assertTrue(killed >= KILLS, "most runs were killed mid-way: " + killed);
  }
}
