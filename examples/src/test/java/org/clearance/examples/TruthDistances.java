package org.clearance.examples;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.clearance.clearance.CatenaryDistance;
import org.clearance.clearance.ConditionDistance;
import org.clearance.clearance.ConditionModels;
import org.clearance.clearance.ConditionSet;
import org.clearance.clearance.ConductorDistance;
import org.clearance.clearance.ConductorModel;
import org.clearance.clearance.ConductorState;
import org.clearance.clearance.SurveyedConductor;
import org.clearance.line.ConductorLibrary;
import org.clearance.line.ConductorPosition.Role;
import org.clearance.line.LineSpec;
import org.clearance.line.LineSpecReader;
import org.clearance.line.SpanFrame;
import org.clearance.line.SpanLayout;
import org.clearance.line.StructureReader;
import org.clearance.run.ConductorRecord;
import org.clearance.run.SpanRecord;
import org.clearance.sag.ConditionSolver;

/**
 * Distances from points to the demo's TRUE conductors in every condition of a run: the
 * generator's exact catenaries in the surveyed state, and their hot, ice and wind states from the
 * same sag models the check uses ("with the same physics inputs", issue 4). The surveyed state is
 * measured with the generator's own distance routine ({@link CurveDistance}), independent of the
 * engine.
 */
final class TruthDistances {

  private final DemoRuns.Run run;
  private final ConditionSet conditions;
  /** Per span: conductor names, and per conductor and condition the state (null if none). */
  private final List<List<String>> names = new ArrayList<>();
  private final List<List<ConductorState[]>> states = new ArrayList<>();
  private final List<List<CatenaryDistance[]>> kernels = new ArrayList<>();

  /**
   * @param run a finished demo check
   * @param fittedOnly only the conductors the check fitted (to compare like with like), or every
   *     conductor of the truth
   */
  TruthDistances(DemoRuns.Run run, boolean fittedOnly) {
    this.run = run;
    this.conditions = run.model().conditions();
    DemoScene scene = run.scene();
    LineSpec spec = LineSpecReader.read(run.input().resolve(DemoCorridor.LINE_SPEC),
        ConductorLibrary.builtin());
    SpanLayout layout = SpanLayout.build(StructureReader.read(
        run.input().resolve(DemoCorridor.STRUCTURES), scene.units()), List.of(spec));
    Map<String, List<SurveyedConductor>> truth = new HashMap<>();
    List<SpanRecord> spans = run.model().spans();
    for (int i = 0; i < spans.size(); i++) {
      List<SurveyedConductor> list = new ArrayList<>();
      for (ConductorRecord c : spans.get(i).conductors()) {
        // the energised conductors: the ones the engine's minima and stored distances count
        // (issue 15; shield wires are measured apart)
        if ((!fittedOnly || c.fitted()) && hasWire(scene.spans().get(i), c.name())
            && Role.ofName(c.role()) == Role.PHASE) {
          DemoWire w = scene.spans().get(i).wire(c.name());
          list.add(new SurveyedConductor(c.name(), c.name(), c.role(), w.curve()));
        }
      }
      truth.put(spans.get(i).id(), list);
    }
    Map<String, List<ConductorModel>> models = ConditionModels.build(layout, truth,
        conditions, new ConditionSolver(ConditionSolver.Options.DEFAULT));
    int n = conditions.size();
    for (SpanRecord s : spans) {
      List<String> ns = new ArrayList<>();
      List<ConductorState[]> ss = new ArrayList<>();
      List<CatenaryDistance[]> ks = new ArrayList<>();
      for (ConductorModel m : models.get(s.id())) {
        ConductorState[] st = new ConductorState[n];
        CatenaryDistance[] row = new CatenaryDistance[n];
        for (int k = 0; k < n; k++) {
          Optional<ConductorState> o = m.states().get(k);
          if (o.isPresent()) {
            st[k] = o.get();
            row[k] = new CatenaryDistance(o.get().curve());
          }
        }
        ns.add(m.name());
        ss.add(st);
        ks.add(row);
      }
      names.add(ns);
      states.add(ss);
      kernels.add(ks);
    }
  }

  /** Whether the truth has a conductor of this name (the check may find extras it lacks). */
  private static boolean hasWire(DemoSpan span, String name) {
    return span.wires().stream().anyMatch(w -> w.position().equals(name));
  }

  /** The plan frame of span {@code sp}, from its first structure's centre to its second's. */
  SpanFrame frame(int sp) {
    SpanRecord s = run.model().spans().get(sp);
    return SpanFrame.between(s.from().x(), s.from().y(), s.to().x(), s.to().y());
  }

  /** Whether a plan point lies within {@code margin} m of span {@code sp}'s stations. */
  boolean nearSpan(int sp, double x, double y, double margin) {
    double s = frame(sp).station(x, y);
    return s >= -margin && s <= run.model().spans().get(sp).context().lengthM() + margin;
  }

  /** Least distance from (x, y, z), m, to span {@code sp}'s true conductors in condition k. */
  double distance(int sp, int k, double x, double y, double z) {
    double best = Double.POSITIVE_INFINITY;
    List<ConductorState[]> ss = states.get(sp);
    for (int j = 0; j < ss.size(); j++) {
      ConductorState st = ss.get(j)[k];
      if (st == null) {
        continue;
      }
      double d;
      double wind = SurveyWind.swingRad(run.options(), sp);
      if (k == 0 && wind != 0) {
        d = kernels.get(sp).get(j)[0].distance(x, y, z, wind); // the wire as surveyed
      } else if (k == 0) {
        d = CurveDistance.distance(st.curve(), x, y, z);
      } else {
        CatenaryDistance kernel = kernels.get(sp).get(j)[k];
        d = kernel.distance(x, y, z, kernel.closestSwingAngle(x, y, z, st.swingMin(),
            st.swingMax()));
      }
      best = Math.min(best, d);
    }
    return best;
  }

  /** The distances of (x, y, z) in every condition, as the engine stores them. */
  List<ConditionDistance> all(int sp, double x, double y, double z) {
    List<ConditionDistance> out = new ArrayList<>();
    double stationFrame = frame(sp).station(x, y);
    for (int k = 0; k < conditions.size(); k++) {
      ConductorDistance best = null;
      String name = "";
      List<ConductorState[]> ss = states.get(sp);
      for (int j = 0; j < ss.size(); j++) {
        ConductorState st = ss.get(j)[k];
        if (st == null) {
          continue;
        }
        CatenaryDistance kernel = kernels.get(sp).get(j)[k];
        double wind = SurveyWind.swingRad(run.options(), sp);
        ConductorDistance d = kernel.closest(x, y, z, k == 0 && wind != 0 ? wind
            : kernel.closestSwingAngle(x, y, z, st.swingMin(), st.swingMax()));
        if (best == null || d.distance() < best.distance()) {
          best = d;
          name = names.get(sp).get(j);
        }
      }
      out.add(best == null
          ? new ConditionDistance(conditions.names().get(k), conditions.groups().get(k),
              Double.NaN, Double.NaN, Double.NaN, "", Double.NaN)
          : new ConditionDistance(conditions.names().get(k), conditions.groups().get(k),
              best.distance(), best.horizontal(), best.vertical(), name, stationFrame));
    }
    return out;
  }
}
