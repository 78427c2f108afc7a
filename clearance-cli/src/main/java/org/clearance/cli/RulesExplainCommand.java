package org.clearance.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;
import org.clearance.InputException;
import org.clearance.clearance.SpanContext;
import org.clearance.rules.RuleExplainer;
import org.clearance.rules.RuleProfiles;
import org.clearance.run.RunModel;
import org.clearance.run.RunModelJson;
import org.clearance.run.SpanRecord;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine;

/**
 * {@code clearance rules explain}: which zones and distances a profile applies to a span, and
 * why - for a span of a run folder ({@code --run DIR --span ID}) or for a span described by its
 * voltage, altitude and length.
 */
@Command(name = "explain", description = {"Explains which zones and distances a rule profile "
    + "applies to a span and why.", "Give --run and --span, or --voltage-kv and --length-m "
    + "(with --altitude-m for altitude-banded tables)."}, mixinStandardHelpOptions = true)
public final class RulesExplainCommand implements Callable<Integer> {

  @Option(names = "--profile", required = true, paramLabel = "NAME|FILE",
      description = "Built-in profile name or profile file.")
  String profile;

  @Option(names = "--run", paramLabel = "DIR", description = "Run folder of a check.")
  Path run;

  @Option(names = "--span", paramLabel = "ID", description = "Span id in the run folder.")
  String span;

  @Option(names = "--voltage-kv", paramLabel = "KV", description = "Nominal voltage, kV.")
  Double voltageKv;

  @Option(names = "--altitude-m", paramLabel = "M", description = "Altitude above sea level, m "
      + "(default: unknown).")
  Double altitudeM;

  @Option(names = "--length-m", paramLabel = "M", description = "Span plan length, m.")
  Double lengthM;

  @Option(names = "--line-id", paramLabel = "ID", description = "Line id (for profiles that "
      + "cover named lines; default: none).")
  String lineId;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() throws Exception {
    SpanContext context = run != null ? fromRun() : described();
    spec.commandLine().getOut().print(RuleExplainer.explain(RuleProfiles.byNameOrPath(profile),
        context));
    spec.commandLine().getOut().flush();
    return ClearanceCommand.EXIT_OK;
  }

  private SpanContext fromRun() throws Exception {
    if (span == null) {
      throw new InputException("--span", null, null, "give the span id with --run");
    }
    if (voltageKv != null || altitudeM != null || lengthM != null || lineId != null) {
      throw new InputException("--run", null, null, "give either --run with --span, or "
          + "--voltage-kv and --length-m, not both");
    }
    Path file = run.resolve(RunModel.FILE_NAME);
    if (!java.nio.file.Files.isRegularFile(file)) {
      throw new InputException(file, null, null, "missing: " + run
          + " is not the run folder of a check");
    }
    RunModel model = RunModelJson.read(file);
    for (SpanRecord s : model.spans()) {
      if (s.id().equals(span)) {
        return s.context();
      }
    }
    String some = model.spans().stream().limit(8).map(SpanRecord::id)
        .collect(Collectors.joining(", "));
    throw new InputException("--span", null, null, "no span '" + span + "' in " + run
        + " (spans: " + some + (model.spans().size() > 8 ? ", ..." : "") + ")");
  }

  private SpanContext described() {
    if (span != null) {
      throw new InputException("--span", null, null, "--span needs --run");
    }
    if (voltageKv == null || lengthM == null) {
      throw new InputException("--voltage-kv", null, null, "give --run and --span, or "
          + "--voltage-kv and --length-m");
    }
    if (!(voltageKv > 0 && Double.isFinite(voltageKv))) {
      throw new InputException("--voltage-kv", null, null, "must be a positive number of kV");
    }
    if (!(lengthM > 0 && Double.isFinite(lengthM))) {
      throw new InputException("--length-m", null, null, "must be a positive number of metres");
    }
    if (altitudeM != null && !Double.isFinite(altitudeM)) {
      throw new InputException("--altitude-m", null, null, "must be a number of metres");
    }
    return new SpanContext("(described)", lineId == null ? "(none)" : lineId, voltageKv,
        altitudeM == null ? Double.NaN : altitudeM, lengthM);
  }
}
