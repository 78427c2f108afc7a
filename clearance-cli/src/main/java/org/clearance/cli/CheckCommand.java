package org.clearance.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.clearance.CheckInputs;
import org.clearance.ClearanceCheck;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code clearance check}: the whole job on a corridor survey, from LAS files to a run folder with
 * the span table, the work list, GIS layers and the report.
 */
@Command(
    name = "check",
    description = {
      "Finds the conductors in a survey, models the line conditions, measures every vegetation "
          + "point near the line and, with a rule profile, ranks the spans and writes a cutting "
          + "work list and report into a run folder.",
      "A screening aid: the utility's rules, the local regulator and qualified line-clearance "
          + "personnel govern."
    },
    mixinStandardHelpOptions = true)
public final class CheckCommand implements Callable<Integer> {

  @Mixin LineInputOptions inputs;

  @Option(names = "--out", required = true, paramLabel = "DIR",
      description = "Run folder to write (new, or an earlier run folder to replace).")
  Path out;

  @Option(names = "--rules", paramLabel = "NAME|FILE",
      description = "Rule profile: a built-in name (see 'clearance rules list') or a file. "
          + "Without it the spans are measured but not judged.")
  String rules;

  @Mixin CheckSettings settings;

  @Mixin UnitsOptions units;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() throws IOException {
    PrintWriter console = spec.commandLine().getOut();
    CheckInputs files = new CheckInputs(inputs.survey, units.choice(), inputs.structures,
        inputs.lines, Optional.ofNullable(inputs.conductors), Optional.ofNullable(rules), out);
    new ClearanceCheck(settings.options(spec), console).run(files, ClearanceCommand.version());
    console.println("run folder: " + out.toAbsolutePath().normalize());
    console.flush();
    return ClearanceCommand.EXIT_OK;
  }
}
