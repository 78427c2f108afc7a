package org.clearance;

import java.util.Objects;
import java.util.Set;
import org.clearance.clearance.ClearanceEngine;
import org.clearance.clearance.UncertaintyOptions;
import org.clearance.ground.GroundOptions;
import org.clearance.ground.TreeOptions;
import org.clearance.report.ReportOptions;
import org.clearance.sag.ConditionSolver;
import org.clearance.wire.WireFinderOptions;

/**
 * Options of a clearance check, one record per stage.
 *
 * @param threads worker threads for reading and measuring (&gt;= 1)
 * @param vegetationClasses ASPRS classes taken as vegetation, read only as named; or null for
 *     the default (3, 4, 5 where consistent, with class 0/1 inferred; all inferred in a survey
 *     without vegetation classes: VegetationSelector)
 * @param ground ground model options
 * @param wires wire finder options
 * @param conditions line condition options
 * @param engine clearance engine options
 * @param trees tree finding options, or null to skip the fall-in check
 * @param report report options
 * @param uncertainty the input uncertainties the survey and the library do not state
 */
public record CheckOptions(
    int threads, Set<Integer> vegetationClasses, GroundOptions ground, WireFinderOptions wires,
    ConditionSolver.Options conditions, ClearanceEngine.Options engine, TreeOptions trees,
    ReportOptions report, UncertaintyOptions uncertainty) {

  public CheckOptions {
    if (threads < 1) {
      throw new IllegalArgumentException("threads must be at least 1: " + threads);
    }
    vegetationClasses = vegetationClasses == null ? null : Set.copyOf(vegetationClasses);
    Objects.requireNonNull(ground, "ground");
    Objects.requireNonNull(wires, "wires");
    Objects.requireNonNull(conditions, "conditions");
    Objects.requireNonNull(engine, "engine");
    Objects.requireNonNull(report, "report");
    Objects.requireNonNull(uncertainty, "uncertainty");
  }

  /** Options with the default input uncertainties. */
  public CheckOptions(int threads, Set<Integer> vegetationClasses, GroundOptions ground,
      WireFinderOptions wires, ConditionSolver.Options conditions, ClearanceEngine.Options engine,
      TreeOptions trees, ReportOptions report) {
    this(threads, vegetationClasses, ground, wires, conditions, engine, trees, report,
        UncertaintyOptions.DEFAULT);
  }

  /** The documented defaults of every stage with the given number of threads. */
  public static CheckOptions defaults(int threads) {
    return new CheckOptions(threads, null, GroundOptions.defaults(),
        WireFinderOptions.defaults(threads), ConditionSolver.Options.DEFAULT,
        ClearanceEngine.Options.defaults(threads), TreeOptions.defaults(),
        ReportOptions.defaults());
  }

  /** The same options with another report unit and vegetation classes. */
  public CheckOptions with(ReportOptions newReport, Set<Integer> classes) {
    return new CheckOptions(threads, classes, ground, wires, conditions, engine, trees,
        newReport, uncertainty);
  }

  /** The same options with other input uncertainties. */
  public CheckOptions with(UncertaintyOptions newUncertainty) {
    return new CheckOptions(threads, vegetationClasses, ground, wires, conditions, engine, trees,
        report, newUncertainty);
  }
}
