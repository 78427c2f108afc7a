package org.clearance.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.clearance.InputException;
import org.clearance.OutFolder;
import org.clearance.RunFolder;
import org.clearance.clearance.NearPointFile;
import org.clearance.clearance.PolePointFile;
import org.clearance.clearance.PolePointReader;
import org.clearance.clearance.NearPointReader;
import org.clearance.clearance.UncertaintyFile;
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
          + "model.json, near-points.bin, conductors.csv and uncertainty.csv and the new outputs."
    },
    mixinStandardHelpOptions = true)
public final class EvaluateCommand implements Callable<Integer> {

  /** Files a run folder holds from the check that the evaluation carries over. */
  static final List<String> MEASURED = List.of(RunModel.FILE_NAME, NearPointFile.FILE_NAME,
      "conductors.csv", UncertaintyFile.FILE_NAME, PolePointFile.FILE_NAME);

  @Parameters(paramLabel = "RUN_DIR", description = "Run folder of a finished check.")
  Path runDir;

  @Option(names = "--rules", required = true, paramLabel = "NAME|FILE",
      description = "Built-in rule profile name (see 'clearance rules list') or profile file.")
  String rules;

  @Option(names = "--out", paramLabel = "NEW_DIR",
      description = "Write into this folder (new, empty, or an earlier run folder to replace) "
          + "instead of in place.")
  Path out;

  @Option(names = "--units", paramLabel = "m|ft", converter = OutputUnitConverter.class,
      description = "Unit of lengths in the outputs: m (default) or ft (international foot).")
  LinearUnit units = LinearUnit.METRE;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() throws IOException {
    if (!Files.isDirectory(runDir)) {
      throw new InputException(runDir, null, null, "not a folder");
    }
    if (out != null) {
      OutFolder.check(out, "--out");
    }
    boolean inPlace = out == null || sameFolder(out, runDir);
    try (RunFolder source = RunFolder.open(runDir, "RUN_DIR")) {
      Path dir = source.target();
      for (String name : List.of(RunModel.FILE_NAME, NearPointFile.FILE_NAME)) {
        Path p = dir.resolve(name);
        if (!Files.isRegularFile(p)) {
          throw new InputException(runDir.resolve(name), null, null, "missing: " + runDir
              + " is not the run folder of a finished check");
        }
      }
      RuleProfile profile = RuleProfiles.byNameOrPath(rules);
      Path uncertainty = dir.resolve(UncertaintyFile.FILE_NAME);
      if (!Double.isNaN(profile.coverageFactor()) && !Files.isRegularFile(uncertainty)) {
        // named here, in the source folder, not later in the staging folder
        throw new InputException(runDir.resolve(UncertaintyFile.FILE_NAME), null, null,
            "rule profile " + profile.name() + " asks for findings at a "
                + profile.confidencePercent() + " % confidence level, but the run folder has "
                + "no " + UncertaintyFile.FILE_NAME + " (made by an older version): run the "
                + "check again");
      }
      RunRecord.Builder record = RunRecord.builder("evaluate", ClearanceCommand.version());
      record.parameter("run_dir", runDir.toString()).parameter("rules", rules)
          .parameter("units", units.symbol()).profile(profile);
      for (String name : MEASURED) {
        Path p = dir.resolve(name);
        if (Files.isRegularFile(p)) {
          record.input(name, p);
        }
      }
      Path oldRecord = dir.resolve(RunRecord.FILE_NAME);
      if (Files.isRegularFile(oldRecord)) {
        record.input(RunRecord.FILE_NAME, oldRecord);
        record.source(RunRecordJson.read(oldRecord));
      }
      Path profileFile = Path.of(rules);
      if (!RuleProfiles.names().contains(rules) && Files.isRegularFile(profileFile)) {
        record.input("rules", profileFile);
      }
      RunModel runModel = RunModelJson.read(dir.resolve(RunModel.FILE_NAME));
      NearPointReader.verify(dir.resolve(NearPointFile.FILE_NAME));
      if (Files.isRegularFile(dir.resolve(PolePointFile.FILE_NAME))) {
        PolePointReader.forEach(dir.resolve(PolePointFile.FILE_NAME), p -> { });
      }
      if (inPlace) {
        evaluateInto(source.beginReplacing("RUN_DIR"), dir, runModel, profile, record, true);
        source.publish();
      } else {
        record.parameter("out", out.toString());
        try (RunFolder target = RunFolder.replace(out, "--out")) {
          evaluateInto(target.staging(), dir, runModel, profile, record, false);
          target.publish();
        }
      }
    }
    return ClearanceCommand.EXIT_OK;
  }

  /**
   * Writes the whole evaluated run into a staging folder: the measured files of the source
   * (linked when in place, where the source folder is replaced; copied otherwise), the evaluated
   * outputs and run.json.
   */
  private void evaluateInto(Path staging, Path source, RunModel runModel, RuleProfile profile,
      RunRecord.Builder record, boolean link) throws IOException {
    for (String name : MEASURED) {
      Path p = source.resolve(name);
      if (Files.isRegularFile(p)) {
        carry(p, staging.resolve(name), link);
        record.output(name);
      }
    }
    ReportStage.Outcome outcome = ReportStage.run(staging, runModel, profile,
        ReportOptions.defaults().withUnit(units), spec.commandLine().getOut());
    outcome.written().forEach(record::output);
    record.timing("evaluate", outcome.seconds()).output(RunRecord.FILE_NAME);
    RunRecordJson.write(staging, record.build());
  }

  /** A hard link where allowed (the source is about to be replaced), else a copy. */
  private static void carry(Path from, Path to, boolean link) throws IOException {
    if (link) {
      try {
        Files.createLink(to, from);
        return;
      } catch (IOException | UnsupportedOperationException e) {
        // another file system or no hard links: a copy does the same
      }
    }
    Files.copy(from, to);
  }

  private static boolean sameFolder(Path a, Path b) throws IOException {
    return Files.exists(a) && Files.isSameFile(a, b);
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
