package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;
import java.util.Optional;
import java.util.TreeMap;
import org.clearance.CheckInputs;
import org.clearance.CheckOptions;
import org.clearance.ClearanceCheck;
import org.clearance.survey.UnitsChoice;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 12: the faster check gives the outputs of the previous version byte for byte, on a
 * classified and a ground-only demo corridor and on a piece of the benchmark corridor (3 spans
 * at the benchmark's 6 points per square metre, 1.5 million points).
 *
 * <p>The SHA-256 of every output but {@code run.json} (timings) and {@code report.html} (the day
 * of the run) were recorded with the version before issue 12 (commit b5fc436, the same inputs,
 * 2 threads, the example profile). A change that alters results on purpose (a new wire finder,
 * labelling or rule) re-records them: the failure message lists the new hashes in this table's
 * form, to be pasted once the change of results is understood and intended. A speed change
 * never does.
 */
class PreviousVersionOutputsTest {

  /** Case, file, SHA-256 of the file as the version before issue 12 wrote it. */
  private static final List<String> RECORDED = List.of(
      "demo-classified conductors.csv da054cb4cb52bd9d5afecb399c14d1a37f62ea49df40c480de950c3b7adf01c9",
      "demo-classified model.json 84b4628d7791a50b004ae5fd476dc20ebe211962150b12fe8f00472306b2ed68",
      "demo-classified near-points.bin 27767f8bf8b1c800fcf9bccfa63c637eb6e7457750907ad303887dfcdffd9e37",
      "demo-classified sites.csv 8b370d4e995fa5cf0cc74463d1eb765155a5ba102cd13e360d44ffa82533d74e",
      "demo-classified sites.geojson c9cd1b3e478779dff8ffcef9ae83f71bce50ca52fcb0fd87bda73a267130be15",
      "demo-classified sites.gpkg a8bdf36d9456ee57419b23981a511530f5b87c50f61fdd0133753247533efc1e",
      "demo-classified spans.csv cd62052a704ad238eb3d1b4c661edd19780cb73b5fbab47e823f50df25d28738",
      "demo-classified uncertainty.csv c50ccdaf2d74a2c0e0e48c13169b9fe26caab23a4d070ceef702030dd1d08c3a",
      "demo-classified worklist.csv cc844749061d5f4e2672d7c9141994fceb52be28706e10e83504004db2ebcbde",
      "demo-ground-only conductors.csv 0399343de37aff7faedddd3d489843357eaabdf1f3e2d147713b8fad6ff49409",
      "demo-ground-only model.json d1446e1515d4614342f4b0fb5299edd9444db289436b03a10c3cd1c5a48213ae",
      "demo-ground-only near-points.bin a05ef44d6b93b89a9550ea904a1e99f9d058062313c9e0771ca5854ba27f1849",
      "demo-ground-only sites.csv ea207574b6e618eea716e2766a2f87c71191c38d1ffeee55ff5a6cbb7f822627",
      "demo-ground-only sites.geojson 1ccac2e818bdacf45b4fa4b7405d414f6e46ed3c2cfcf93b6b4dec4bfb280017",
      "demo-ground-only sites.gpkg a195c3789b798225e1aec21398bcf79a21639a002e0d3e315ec2126b11f8b9e5",
      "demo-ground-only spans.csv d0d324684645ad5f26d069f6d19d7516bfb6c0b8e1afdde5d6269c92ff0647ff",
      "demo-ground-only uncertainty.csv 2c9c57873fcb0d799300482814081ba5c6c15980b0e00a9c9d8cb215e1bba6d0",
      "demo-ground-only worklist.csv eeb2b9e1cbffa99cfdf06b34ac37975b96bfd015ac896655fd82ef38f1cf24d8",
      "bench-corridor conductors.csv 26d23db05a0b75af08bd5e5c5a5c9f9adafe581e4c57edc2e382a37066601f6a",
      "bench-corridor model.json d8f85f69e02233c489681f071727273f66c9ef560c2ff62b13aec3d0c299ca5d",
      "bench-corridor near-points.bin 6ecf89a4cf1f144a3c76542460808044e2cabc5e3031ac87efea6b9952787c74",
      "bench-corridor sites.csv 1549e15accca37d619685fbe015bf94895e4ec52e65d6fdc2274d2af01de84ca",
      "bench-corridor sites.geojson f7f1954fc4c9b18a365dfcbaf2abaa0a712d62156c7ea75e7f26278039ebacce",
      "bench-corridor sites.gpkg 7aa68f8086d45b6f4fd3118afe83274c0761feba90a4d64b16d45461b41e4f5c",
      "bench-corridor spans.csv eb2f7c42dd25e195d6ed15801031c50d4b76b668b3a7dd37f1aa05a8685704f5",
      "bench-corridor uncertainty.csv 5238af81f457ae2f5026ebbc028aecc1afac525ff32ddebe46749d4982b8a2f6",
      "bench-corridor worklist.csv 5209aabf05c9b73601ce18e0bdce5811d2756e3e45490111f316134b6ee7a305");

  private static final String PROFILE = "example-utility";

  @TempDir Path tmp;

  @Test
  void outputsAreThoseOfThePreviousVersion() throws IOException {
    TreeMap<String, String> actual = new TreeMap<>();
    hash("demo-classified",
        DemoRuns.of(DemoRuns.small(11L, ClassificationMode.FULL), PROFILE).runDir(), actual);
    hash("demo-ground-only",
        DemoRuns.of(DemoRuns.small(11L, ClassificationMode.GROUND_ONLY), PROFILE).runDir(),
        actual);
    hash("bench-corridor", benchCorridorRun(), actual);
    TreeMap<String, String> expected = new TreeMap<>();
    for (String line : RECORDED) {
      String[] f = line.split(" ");
      expected.put(f[0] + " " + f[1], f[2]);
    }
    StringBuilder now = new StringBuilder();
    actual.forEach((k, v) -> now.append("      \"").append(k).append(' ').append(v)
        .append("\",\n"));
    assertEquals(expected, actual, "outputs differ from the previous version's; now:\n" + now);
  }

  /** The benchmark's corridor (its seed and density), 3 spans, checked as the benchmark does. */
  private Path benchCorridorRun() throws IOException {
    DemoCorridor.DemoFiles files = DemoCorridor.write(tmp.resolve("input"),
        DemoOptions.defaults().withSpanCount(3).withPointDensity(Benchmark.DENSITY));
    Path run = tmp.resolve("run");
    new ClearanceCheck(CheckOptions.defaults(2), new PrintWriter(new StringWriter())).run(
        new CheckInputs(List.of(files.survey()), UnitsChoice.fromFile(), files.structures(),
            List.of(files.lineSpec()), Optional.empty(), Optional.of(PROFILE), run), "test");
    return run;
  }

  private static void hash(String name, Path runDir, TreeMap<String, String> into)
      throws IOException {
    try (var files = Files.list(runDir)) {
      for (Path p : files.sorted().toList()) {
        String file = p.getFileName().toString();
        if (file.equals("run.json") || file.equals("report.html")) {
          continue;
        }
        into.put(name + " " + file, sha256(Files.readAllBytes(p)));
      }
    }
  }

  private static String sha256(byte[] bytes) {
    try {
      return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException(e);
    }
  }
}
