package org.clearance.cli;

import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;
import org.clearance.CheckOptions;
import org.clearance.clearance.ClearanceEngine;
import org.clearance.clearance.UncertaintyOptions;
import org.clearance.report.ReportOptions;
import org.clearance.survey.LinearUnit;
import picocli.CommandLine;
import picocli.CommandLine.Option;

/** Options shared by the commands that run a check ({@code check}, {@code demo}). */
public final class CheckSettings {

  /** Threads unless told: the machine's cores, at most 4 (reading is the limit beyond). */
  static final int DEFAULT_MAX_THREADS = 4;

  @Option(names = "--units", paramLabel = "m|ft", defaultValue = "m",
      description = "Unit of distances, heights and areas in the work list, span table and "
          + "report (default: ${DEFAULT-VALUE}); x, y, z stay in the survey's own units.")
  String outputUnit;

  @Option(names = "--threads", paramLabel = "N",
      description = "Worker threads, 1 to 256 (default: cores, at most 4).")
  Integer threads;

  @Option(names = "--vegetation-classes", paramLabel = "LIST", split = ",",
      description = "ASPRS classes that hold vegetation, read only as named (default: 3,4,5 "
          + "where consistent, and points left in class 0/1 inferred from their geometry; a "
          + "survey without classes 3-5 is treated as unclassified).")
  Set<Integer> vegetationClasses;

  @Option(names = "--keep-radius", paramLabel = "M",
      description = "Store vegetation points within this distance of a conductor, m, for rule "
          + "evaluation and re-evaluation (default 10).")
  Double keepRadius;

  @Option(names = "--survey-accuracy", paramLabel = "H_M,V_M", split = ",",
      description = "Accuracy of the survey's points, RMSE in metres: horizontal per axis, "
          + "vertical (default 0.15,0.10: the ASPRS 10-cm vertical class); part of every "
          + "distance's uncertainty.")
  List<Double> surveyAccuracy;

  /** The check options these settings describe. */
  CheckOptions options(CommandLine.Model.CommandSpec spec) {
    int n = threads != null ? threads
        : Math.min(DEFAULT_MAX_THREADS, Runtime.getRuntime().availableProcessors());
    if (n < 1 || n > 256) {
      throw new CommandLine.ParameterException(spec.commandLine(),
          "--threads must be 1 to 256: " + n);
    }
    LinearUnit unit = outputUnit(spec);
    CheckOptions o = CheckOptions.defaults(n);
    if (vegetationClasses != null) {
      for (int c : vegetationClasses) {
        if (c < 0 || c > 255) {
          throw new CommandLine.ParameterException(spec.commandLine(),
              "--vegetation-classes: ASPRS classes are 0 to 255: " + c);
        }
      }
    }
    if (keepRadius != null) {
      if (!(keepRadius > 0 && keepRadius <= 100)) {
        throw new CommandLine.ParameterException(spec.commandLine(),
            "--keep-radius must be above 0 and at most 100 m: " + keepRadius);
      }
      ClearanceEngine.Options e = o.engine();
      o = new CheckOptions(o.threads(), o.vegetationClasses(), o.ground(), o.wires(),
          o.conditions(), new ClearanceEngine.Options(keepRadius, e.threads(),
              e.structureExclusion(),
              Math.max(keepRadius, e.treeReach())), o.trees(), o.report());
    }
    if (surveyAccuracy != null) {
      if (surveyAccuracy.size() != 2 || !(surveyAccuracy.get(0) >= 0
          && surveyAccuracy.get(0) <= 10 && surveyAccuracy.get(1) >= 0
          && surveyAccuracy.get(1) <= 10)) {
        throw new CommandLine.ParameterException(spec.commandLine(),
            "--survey-accuracy needs two RMSE values 0 to 10 m, horizontal,vertical: "
                + surveyAccuracy);
      }
      UncertaintyOptions u = o.uncertainty();
      o = o.with(new UncertaintyOptions(surveyAccuracy.get(0), surveyAccuracy.get(1),
          u.modulusRelative(), u.expansionRelative(), u.massRelative()));
    }
    return o.with(ReportOptions.defaults().withUnit(unit),
        vegetationClasses == null ? null : new TreeSet<>(vegetationClasses));
  }

  private LinearUnit outputUnit(CommandLine.Model.CommandSpec spec) {
    switch (outputUnit.toLowerCase(Locale.ROOT)) {
      case "m":
        return LinearUnit.METRE;
      case "ft":
        return LinearUnit.FOOT;
      default:
        throw new CommandLine.ParameterException(spec.commandLine(),
            "--units must be m or ft (international foot): " + outputUnit);
    }
  }
}
