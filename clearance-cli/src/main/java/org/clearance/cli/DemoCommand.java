package org.clearance.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.clearance.CheckInputs;
import org.clearance.ClearanceCheck;
import org.clearance.OutFolder;
import org.clearance.examples.ClassificationMode;
import org.clearance.examples.DemoNetwork;
import org.clearance.examples.DemoOptions;
import org.clearance.survey.UnitsChoice;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code clearance demo}: writes the invented demo corridor and runs the whole check on it.
 */
@Command(
    name = "demo",
    description = {
      "Writes the bundled demo corridor (an invented 230 kV line and a distribution feeder "
          + "built partly under it, with their survey, structures and line specifications) into "
          + "DIR/input and runs the whole check on both lines into DIR/run.",
    },
    mixinStandardHelpOptions = true)
public final class DemoCommand implements Callable<Integer> {

  /** The rule profile the demo uses unless told. */
  static final String DEFAULT_PROFILE = "example-utility-95";

  @Option(names = "--out", paramLabel = "DIR", defaultValue = "demo-run",
      description = "Folder for the demo (default: ${DEFAULT-VALUE}).")
  Path out;

  @Option(names = "--seed", paramLabel = "N", description = "Scenario seed (default: the demo's).")
  Long seed;

  @Option(names = "--spans", paramLabel = "N", description = "Number of spans of the 230 kV line (default 12); the feeder fits "
          + "itself in.")
  Integer spans;

  @Option(names = "--density", paramLabel = "PTS_PER_M2",
      description = "Ground point density, points per square metre (default 3).")
  Double density;

  @Option(names = "--mode", paramLabel = "full|wires-unlabelled|ground-only|unclassified",
      defaultValue = "full",
      description = "How the demo survey is classified (default: ${DEFAULT-VALUE}).")
  String mode;

  @Option(names = "--rules", paramLabel = "NAME|FILE", defaultValue = DEFAULT_PROFILE,
      description = "Rule profile (default: ${DEFAULT-VALUE}).")
  String rules;

  @Option(names = "--generate-only", description = "Write the demo inputs, do not run the check.")
  boolean generateOnly;

  @Mixin CheckSettings settings;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() throws IOException {
    PrintWriter console = spec.commandLine().getOut();
    DemoOptions options = DemoOptions.defaults();
    if (seed != null) {
      options = options.withSeed(seed);
    }
    if (spans != null) {
      options = options.withSpanCount(spans);
    }
    if (density != null) {
      options = options.withPointDensity(density);
    }
    options = options.withMode(mode());
    OutFolder.check(out, "--out");
    Path input = out.resolve("input");
    DemoNetwork.Files files = DemoNetwork.write(input, options);
    console.printf(Locale.ROOT, "demo corridor written to %s (%,d points)%n",
        input.toAbsolutePath().normalize(), files.pointCount());
    if (generateOnly) {
      console.flush();
      return ClearanceCommand.EXIT_OK;
    }
    Path run = out.resolve("run");
    CheckInputs inputs = new CheckInputs(List.of(files.survey()), UnitsChoice.fromFile(),
        files.structures(), files.lineSpecs(), Optional.empty(), Optional.of(rules),
        run);
    new ClearanceCheck(settings.options(spec), console).run(inputs, ClearanceCommand.version());
    console.println("report: " + run.resolve("report.html").toAbsolutePath().normalize());
    console.flush();
    return ClearanceCommand.EXIT_OK;
  }

  private ClassificationMode mode() {
    switch (mode.toLowerCase(Locale.ROOT)) {
      case "full":
        return ClassificationMode.FULL;
      case "wires-unlabelled":
        return ClassificationMode.WIRES_UNLABELLED;
      case "ground-only":
        return ClassificationMode.GROUND_ONLY;
      case "unclassified":
        return ClassificationMode.UNCLASSIFIED;
      default:
        throw new CommandLine.ParameterException(spec.commandLine(),
            "--mode must be full, wires-unlabelled, ground-only or unclassified: " + mode);
    }
  }
}
