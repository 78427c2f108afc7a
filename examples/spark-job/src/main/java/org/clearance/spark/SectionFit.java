package org.clearance.spark;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.List;
import org.clearance.clearance.SurveyedConductor;
import org.clearance.line.SpanFrame;
import org.clearance.wire.Catenary;
import org.clearance.wire.ConductorCurve;

/**
 * One span's fitted conductors as its tension section needs them (the input of the ruling span
 * and the change of state), in a form that crosses the shuffle: every number of the fitted
 * curve, so the section's tasks rebuild exactly the curves the span's task fitted.
 *
 * @param span the span's key in the job
 * @param spanId the span's id
 * @param conductors the fitted conductors
 */
record SectionFit(int span, String spanId, List<Conductor> conductors) implements Serializable {

  SectionFit {
    conductors = List.copyOf(conductors);
  }

  /**
   * A fitted conductor: names as in {@link SurveyedConductor}; its plan frame (origin and
   * direction, m) and catenary (vertex station and elevation, catenary constant, m).
   */
  record Conductor(String name, String position, String role, double ox, double oy, double ux,
      double uy, double length, double s0, double z0, double c) implements Serializable {

    static Conductor of(SurveyedConductor s) {
      SpanFrame f = s.curve().plan();
      Catenary k = s.curve().curve();
      return new Conductor(s.name(), s.position(), s.role(), f.originX(), f.originY(), f.ux(),
          f.uy(), f.length(), k.s0(), k.z0(), k.c());
    }

    SurveyedConductor toSurveyed() {
      return new SurveyedConductor(name, position, role, new ConductorCurve(
          new SpanFrame(ox, oy, ux, uy, length), new Catenary(s0, z0, c)));
    }
  }

  static SectionFit of(int span, String spanId, List<SurveyedConductor> fitted) {
    List<Conductor> list = new ArrayList<>();
    fitted.forEach(s -> list.add(Conductor.of(s)));
    return new SectionFit(span, spanId, list);
  }
}
