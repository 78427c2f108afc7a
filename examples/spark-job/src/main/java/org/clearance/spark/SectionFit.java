package org.clearance.spark;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.clearance.clearance.SurveyedConductor;
import org.clearance.line.SpanFrame;
import org.clearance.wire.Catenary;
import org.clearance.wire.CatenaryCovariance;
import org.clearance.wire.ConductorCurve;

/**
 * One span's fitted conductors as its tension section needs them (the input of the ruling span
 * and the change of state), in a form that crosses the shuffle: every number of the fitted
 * curve, so the section's tasks rebuild exactly the curves the span's task fitted.
 *
 * @param span the span's key in the job
 * @param spanId the span's id
 * @param meanGps the span's flight time, s, or NaN (the section's survey temperature)
 * @param conductors the fitted conductors
 */
record SectionFit(int span, String spanId, double meanGps, List<Conductor> conductors)
    implements Serializable {

  SectionFit {
    conductors = List.copyOf(conductors);
  }

  /**
   * A fitted conductor: names as in {@link SurveyedConductor}; its plan frame (origin and
   * direction, m), catenary (vertex station and elevation, catenary constant, m), the fit's
   * parameter covariance (six entries, m^2; null when the fit gave none) and its swing as
   * surveyed, rad.
   */
  record Conductor(String name, String position, String role, double ox, double oy, double ux,
      double uy, double length, double s0, double z0, double c, double[] covariance,
      double surveySwingRad) implements Serializable {

    static Conductor of(SurveyedConductor s) {
      SpanFrame f = s.curve().plan();
      Catenary k = s.curve().curve();
      double[] cov = s.covariance().map(v -> new double[] {v.varS0(), v.varZ0(), v.varC(),
          v.covS0Z0(), v.covS0C(), v.covZ0C()}).orElse(null);
      return new Conductor(s.name(), s.position(), s.role(), f.originX(), f.originY(), f.ux(),
          f.uy(), f.length(), k.s0(), k.z0(), k.c(), cov, s.surveySwingRad());
    }

    SurveyedConductor toSurveyed() {
      Optional<CatenaryCovariance> cov = covariance == null ? Optional.empty()
          : Optional.of(new CatenaryCovariance(covariance[0], covariance[1], covariance[2],
              covariance[3], covariance[4], covariance[5]));
      return new SurveyedConductor(name, position, role, new ConductorCurve(
          new SpanFrame(ox, oy, ux, uy, length), new Catenary(s0, z0, c)), cov, surveySwingRad);
    }
  }

  static SectionFit of(int span, String spanId, double meanGps, List<SurveyedConductor> fitted) {
    List<Conductor> list = new ArrayList<>();
    fitted.forEach(s -> list.add(Conductor.of(s)));
    return new SectionFit(span, spanId, meanGps, list);
  }
}
