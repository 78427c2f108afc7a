package org.clearance.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.clearance.InputException;
import org.clearance.clearance.NearPointFile;
import org.clearance.io.AtomicFiles;
import org.clearance.report.ReportOptions;
import org.clearance.report.ReportStage;
import org.clearance.rules.RuleProfile;
import org.clearance.rules.RuleProfiles;
import org.clearance.run.RunModel;
import org.clearance.run.RunModelJson;
import org.clearance.run.RunRecord;
import org.clearance.run.RunRecordJson;
import org.clearance.survey.LinearUnit;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine;

/**
 * {@code clearance evaluate RUN_DIR --rules PROFILE|FILE [--out NEW_DIR] [--units m|ft]}:
 * applies a rule profile to the distances a finished check stored in its run folder
 * ({@code model.json} and {@code near-points.bin}) and writes the work list, span table,
 * GeoPackage, GeoJSON, HTML report and {@code run.json} again - in place, or into a new folder
 * that gets copies of the measured files. The survey is not read.
 */
@Command(
    name = "evaluate",
    description = {
      "Applies a rule profile to a finished run folder's stored distances and writes its work "
          + "list and reports again, without reading the survey.",
      "Without --out the folder's outputs are replaced; with --out a new folder gets copies of "
          + "model.json, near-points.bin and conductors.csv and the new outputs."
    },
    mixinStandardHelpOptions = true)
public final class EvaluateCommand implements Callable<Integer> {

  /** Files a run folder holds from the check that the evaluation carries over. */
  static final List<String> MEASURED = List.of(RunModel.FILE_NAME, NearPointFile.FILE_NAME,
      "conductors.csv");

  @Parameters(paramLabel = "RUN_DIR", description = "Run folder of a finished check.")
  Path runDir;

  @Option(names = "--rules", required = true, paramLabel = "PROFILE|FILE",
      description = "Built-in rule profile name (see 'clearance rules list') or profile file.")
  String rules;

  @Option(names = "--out", paramLabel = "NEW_DIR",
      description = "Write into this new (or empty) folder instead of in place.")
  Path out;

  @Option(names = "--units", paramLabel = "m|ft", converter = OutputUnitConverter.class,
      description = "Unit of lengths in the outputs: m (default) or ft (international foot).")
  LinearUnit units = LinearUnit.METRE;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() throws IOException {
    Path model = runDir.resolve(RunModel.FILE_NAME);
    Path near = runDir.resolve(NearPointFile.FILE_NAME);
    if (!Files.isDirectory(runDir)) {
      throw new InputException(runDir, null, null, "not a folder");
    }
    for (Path p : List.of(model, near)) {
      if (!Files.isRegularFile(p)) {
        throw new InputException(p, null, null, "missing: " + runDir
            + " is not the run folder of a finished check");
      }
    }
    RuleProfile profile = RuleProfiles.byNameOrPath(rules);
    RunRecord.Builder record = RunRecord.builder("evaluate", ClearanceCommand.version());
    record.parameter("run_dir", runDir.toString()).parameter("rules", rules)
        .parameter("units", units.symbol()).profile(profile);
    for (String name : MEASURED) {
      Path p = runDir.resolve(name);
      if (Files.isRegularFile(p)) {
        record.input(name, p);
      }
    }
    Path oldRecord = runDir.resolve(RunRecord.FILE_NAME);
    if (Files.isRegularFile(oldRecord)) {
      record.input(RunRecord.FILE_NAME, oldRecord);
      record.source(RunRecordJson.read(oldRecord));
    }
    Path profileFile = Path.of(rules);
    if (!RuleProfiles.names().contains(rules) && Files.isRegularFile(profileFile)) {
      record.input("rules", profileFile);
    }
    RunModel runModel = RunModelJson.read(model);
    Path target = runDir;
    if (out != null && !sameFolder(out, runDir)) {
      target = prepare(out);
      record.parameter("out", out.toString());
      for (String name : MEASURED) {
        Path p = runDir.resolve(name);
        if (Files.isRegularFile(p)) {
          AtomicFiles.write(target.resolve(name), o -> Files.copy(p, o));
          record.output(name);
        }
      }
    }
    ReportStage.Outcome outcome = ReportStage.run(target, runModel, profile,
        ReportOptions.defaults().withUnit(units), spec.commandLine().getOut());
    outcome.written().forEach(record::output);
    record.timing("evaluate", outcome.seconds()).output(RunRecord.FILE_NAME);
    RunRecordJson.write(target, record.build());
    return ClearanceCommand.EXIT_OK;
  }

  private static boolean sameFolder(Path a, Path b) throws IOException {
    return Files.exists(a) && Files.isSameFile(a, b);
  }

  /** Creates the output folder, which must not hold files already. */
  private static Path prepare(Path dir) throws IOException {
    if (Files.exists(dir)) {
      if (!Files.isDirectory(dir)) {
        throw new InputException("--out", null, null, dir + " exists and is not a folder");
      }
      try (var entries = Files.list(dir)) {
        if (entries.findAny().isPresent()) {
          throw new InputException("--out", null, null, dir + " is not empty; give a new "
              + "folder, or leave --out out to evaluate in place");
        }
      }
    }
    return Files.createDirectories(dir);
  }

  /** Reads {@code m} or {@code ft}: the report units. */
  static final class OutputUnitConverter implements CommandLine.ITypeConverter<LinearUnit> {
    @Override
    public LinearUnit convert(String value) {
      LinearUnit u = LinearUnit.parse(value).orElse(null);
      if (u == LinearUnit.METRE || u == LinearUnit.FOOT) {
        return u;
      }
      throw new CommandLine.TypeConversionException("'" + value + "': reports are written in "
          + "m or ft (international foot)");
    }
  }
}
