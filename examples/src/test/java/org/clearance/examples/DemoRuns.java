package org.clearance.examples;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.clearance.CheckInputs;
import org.clearance.CheckOptions;
import org.clearance.ClearanceCheck;
import org.clearance.run.RunModel;
import org.clearance.run.RunModelJson;
import org.clearance.survey.UnitsChoice;

/**
 * Whole checks of demo corridors, run once per options in a test JVM and shared by the accuracy
 * tests: the demo files, the run folder and its model.
 */
final class DemoRuns {

  /** A finished demo check. */
  record Run(DemoOptions options, DemoScene scene, Path input, Path runDir, RunModel model,
      String console) {}

  private static final Map<String, Run> RUNS = new HashMap<>();

  private DemoRuns() {}

  /** Small corridors for accuracy tests: 6 spans, 2 pulses per square metre. */
  static DemoOptions small(long seed, ClassificationMode mode) {
    return DemoOptions.defaults().withSeed(seed).withSpanCount(6).withPointDensity(2.0)
        .withMode(mode);
  }

  /** The run of these options with the given rule profile (or none), made once. */
  static synchronized Run of(DemoOptions options, String rules) {
    String key = options + "|" + rules;
    Run run = RUNS.get(key);
    if (run == null) {
      run = make(options, rules);
      RUNS.put(key, run);
    }
    return run;
  }

  private static Run make(DemoOptions options, String rules) {
    try {
      Path dir = Files.createTempDirectory("clearance-demo-run");
      dir.toFile().deleteOnExit();
      Path input = dir.resolve("input");
      DemoCorridor.DemoFiles files = DemoCorridor.write(input, options);
      Path runDir = dir.resolve("run");
      StringWriter text = new StringWriter();
      CheckInputs inputs = new CheckInputs(List.of(files.survey()), UnitsChoice.fromFile(),
          files.structures(), List.of(files.lineSpec()), Optional.empty(),
          Optional.ofNullable(rules), runDir);
      new ClearanceCheck(CheckOptions.defaults(2), new PrintWriter(text)).run(inputs, "test");
      RunModel model = RunModelJson.read(runDir.resolve(RunModel.FILE_NAME));
      return new Run(options, DemoScene.create(options), input, runDir, model, text.toString());
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }
}
