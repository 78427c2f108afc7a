package org.clearance.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.clearance.InputException;
import org.clearance.OutFolder;
import org.clearance.clearance.SpanStatus;
import org.clearance.ground.GroundModel;
import org.clearance.ground.GroundModelBuilder;
import org.clearance.ground.GroundOptions;
import org.clearance.line.SpanLayout;
import org.clearance.line.StructureReader;
import org.clearance.survey.Survey;
import org.clearance.wire.ConductorTable;
import org.clearance.wire.FittedConductor;
import org.clearance.wire.SpanWires;
import org.clearance.wire.StructureChange;
import org.clearance.wire.WireFinder;
import org.clearance.wire.WireFinderOptions;
import org.clearance.wire.WireResult;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code clearance wires}: finds and fits the conductors of every span and writes
 * {@code conductors.csv} (docs/wire-finder.md), with a short summary per span on the console.
 */
@Command(
    name = "wires",
    description = {
      "Finds the conductors of every span in a lidar survey, fits a catenary to each and writes "
          + "OUT/conductors.csv: points, coverage, residual, largest gap, attachments, catenary "
          + "constant, mid-span sag, and whether each conductor could be assessed.",
      "Works whether or not the survey labels its wires (ASPRS classes 13 and 14)."
    },
    mixinStandardHelpOptions = true)
public final class WiresCommand implements Callable<Integer> {
  /** Name of the output file in the output folder. */
  public static final String CONDUCTORS_FILE = ConductorTable.FILE_NAME;

  @Mixin LineInputOptions inputs;

  @Option(names = "--out", required = true, paramLabel = "DIR",
      description = "Output folder (created when missing).")
  Path out;

  @Option(names = "--threads", paramLabel = "N",
      description = "Worker threads, 1 to 256 (default: cores, at most 4).")
  Integer threads;

  @Option(names = "--keep-structure-positions",
      description = "Use the structures file's positions as given: do not move or add "
          + "structures from tower points in the survey.")
  boolean keepPositions;

  @Mixin UnitsOptions units;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() {
    int n = threads != null ? threads
        : Math.min(SurveyCommand.DEFAULT_MAX_THREADS, Runtime.getRuntime().availableProcessors());
    if (n < 1 || n > WireFinderOptions.MAX_THREADS) {
      throw new CommandLine.ParameterException(spec.commandLine(),
          "--threads must be 1 to 256: " + n);
    }
    OutFolder.check(out, "--out");
    Survey s = Survey.open(inputs.survey, units.choice());
    SpanLayout layout = SpanLayout.build(StructureReader.read(inputs.structures, s.units()),
        inputs.specs());
    GroundModel ground = GroundModelBuilder.build(s, GroundOptions.defaults(), n);
    WireFinderOptions options = WireFinderOptions.defaults(n);
    if (keepPositions) {
      WireFinderOptions.Structures st = options.structures();
      options = options.withStructures(new WireFinderOptions.Structures(false,
          st.searchRadiusM(), st.toleranceM(), st.minTowerPoints()));
    }
    WireResult result = WireFinder.find(s, layout, ground::heightAboveGround, options);
    try {
      Files.createDirectories(out);
    } catch (java.io.IOException e) {
      throw new InputException(out, null, "--out", "cannot create the folder: " + e.getMessage());
    }
    Path file = out.resolve(CONDUCTORS_FILE);
    ConductorTable.write(file, result, s.units());
    PrintWriter w = spec.commandLine().getOut();
    w.print(summary(result, file));
    w.flush();
    return ClearanceCommand.EXIT_OK;
  }

  /** The console summary: structure changes, one line per span, the file written. */
  static String summary(WireResult result, Path file) {
    StringBuilder b = new StringBuilder();
    for (StructureChange c : result.structureChanges()) {
      b.append(c.describe()).append(System.lineSeparator());
    }
    int rows = 0;
    for (SpanWires sw : result.spans()) {
      long fitted = sw.conductors().stream().filter(FittedConductor::isFitted).count();
      rows += sw.conductors().size();
      // the status words of every output, from the one place that judges a span's wires
      // (check starts from the same status and may only make it worse)
      String word = SpanStatus.ofWires(sw).word();
      b.append(String.format(Locale.ROOT, "span %s: %s, %d of %d conductors fitted, %s%n",
          sw.span().id(), word, fitted,
          sw.conductors().size(), sw.labelled() ? "wires labelled in the survey"
              : "wires found from their shape"));
      if (sw.reason().isPresent()) {
        b.append("  ").append(sw.reason().get()).append(System.lineSeparator());
      }
    }
    b.append(String.format(Locale.ROOT, "wrote %s (%d conductor rows)%n", file, rows));
    return b.toString();
  }
}
