package org.clearance.clearance;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.clearance.line.ConductorType;
import org.clearance.line.LineCondition;
import org.clearance.sag.ConditionSolver;
import org.clearance.sag.ConditionState;
import org.clearance.sag.SectionSurvey;
import org.clearance.wire.Catenary;
import org.clearance.wire.CatenaryCovariance;
import org.clearance.wire.ConductorCurve;

/**
 * Linearised propagation of the inputs' uncertainties to a conductor's curve in every condition
 * (methods.md section 7.2): the catenary fit's parameter covariance, the survey-time conductor
 * temperature, and the conductor's modulus, expansion and weight, each moved by one standard
 * uncertainty through the same change of state the condition uses; the change of the conductor's
 * position at evenly spaced stations is that input's contribution ({@link StateUncertainty}).
 *
 * <p>The fit's covariance of (s0, z0, c) is split into independent directions by a semidefinite
 * Cholesky factor; moving c moves the survey tension H_s = w c of the section by the same ratio
 * (the whole section, an upper bound for a section of several spans, each of which has its own
 * fit). A heavier conductor raises H_s with w. Where the condition swings the conductor, the
 * change of the swing angle times the sag below the chord adds to the position change. The
 * insulator-string displacement of a one-sided wind state is not re-derived for each input.
 */
public final class UncertaintyPropagation {

  /** Stations per span: every tenth of the span resolves the sag profile to well under 1 %. */
  public static final int STATIONS = 11;
  /** The input names, in the order of {@link StateUncertainty#inputs()}. */
  public static final List<String> INPUTS = List.of("catenary fit", "survey temperature",
      "conductor modulus", "conductor expansion", "conductor weight");
  /** Pivots below this share of the largest variance are taken as zero (fixed parameters). */
  private static final double PIVOT_FLOOR = 1e-12;

  private final ConditionSolver solver;
  private final UncertaintyOptions options;

  public UncertaintyPropagation(ConditionSolver solver, UncertaintyOptions options) {
    this.solver = Objects.requireNonNull(solver, "solver");
    this.options = Objects.requireNonNull(options, "options");
  }

  /** The surveyed state's uncertainty: the fit alone. */
  public StateUncertainty survey(ConductorCurve curve, Optional<CatenaryCovariance> covariance) {
    double length = curve.length();
    List<double[]> sig = new ArrayList<>();
    double[] fit = new double[STATIONS];
    for (double[] dir : directions(covariance)) {
      ConductorCurve moved = moved(curve, dir);
      for (int j = 0; j < STATIONS; j++) {
        double s = station(j, length);
        double d = moved.z(s) - curve.z(s);
        fit[j] = Math.hypot(fit[j], d);
      }
    }
    sig.add(fit);
    for (int k = 1; k < INPUTS.size(); k++) {
      sig.add(new double[STATIONS]);
    }
    return new StateUncertainty(length, INPUTS, sig, false);
  }

  /**
   * A condition state's uncertainty.
   *
   * @param curve the surveyed (fitted) curve
   * @param covariance its parameter covariance, or empty
   * @param type the conductor type, or null when unknown
   * @param section the section's survey data
   * @param sigmaTemperatureC standard uncertainty of the survey temperature, degC (NaN as 0)
   * @param condition the condition
   * @param base the state as computed (from the same inputs)
   * @throws IllegalArgumentException when a perturbed state cannot be solved
   */
  public StateUncertainty condition(ConductorCurve curve, Optional<CatenaryCovariance> covariance,
      ConductorType type, SectionSurvey section, double sigmaTemperatureC,
      LineCondition condition, ConditionState base) {
    double length = base.curve().length();
    List<double[]> sig = new ArrayList<>();
    double[] fit = new double[STATIONS];
    for (double[] dir : directions(covariance)) {
      ConductorCurve moved = moved(curve, dir);
      double ratio = moved.curve().c() / curve.curve().c();
      SectionSurvey s2 = withTension(section, section.horizontalTension() * ratio);
      accumulate(fit, base, solver.state(moved, type, s2, condition), length);
    }
    sig.add(fit);
    boolean changeOfState = type != null && condition.needsChangeOfState();
    double sigmaT = Double.isFinite(sigmaTemperatureC) ? sigmaTemperatureC : 0;
    sig.add(changeOfState && sigmaT > 0 ? profile(base, solver.state(curve, type,
        new SectionSurvey(section.rulingSpan(), section.horizontalTension(),
            section.conductorTemperatureC() + sigmaT), condition), length)
        : new double[STATIONS]);
    double rm = options.modulusRelative();
    double re = options.expansionRelative();
    double rw = options.massRelative();
    sig.add(changeOfState && rm > 0 ? profile(base, solver.state(curve,
        scaled(type, 1 + rm, 1, 1), section, condition), length) : new double[STATIONS]);
    sig.add(changeOfState && re > 0 ? profile(base, solver.state(curve,
        scaled(type, 1, 1 + re, 1), section, condition), length) : new double[STATIONS]);
    sig.add(changeOfState && rw > 0 ? profile(base, solver.state(curve,
        scaled(type, 1, 1, 1 + rw), withTension(section, section.horizontalTension() * (1 + rw)),
        condition), length) : new double[STATIONS]);
    return new StateUncertainty(length, INPUTS, sig, base.swingAngle() > 0);
  }

  private static double station(int j, double length) {
    return j * length / (STATIONS - 1);
  }

  private static double[] profile(ConditionState base, ConditionState moved, double length) {
    double[] p = new double[STATIONS];
    accumulate(p, base, moved, length);
    return p;
  }

  /** Adds in quadrature the position change between two states at the stations. */
  private static void accumulate(double[] into, ConditionState base, ConditionState moved,
      double length) {
    double dPhi = moved.swingAngle() - base.swingAngle();
    ConductorCurve b = base.curve();
    for (int j = 0; j < STATIONS; j++) {
      double s = station(j, length);
      double dz = moved.curve().z(s) - b.z(s);
      double sag = b.curve().sagBelowChord(0, b.length(), s);
      double swing = sag * dPhi;
      into[j] = Math.sqrt(into[j] * into[j] + dz * dz + swing * swing);
    }
  }

  private static SectionSurvey withTension(SectionSurvey s, double tension) {
    return Double.isFinite(tension) && tension > 0
        ? new SectionSurvey(s.rulingSpan(), tension, s.conductorTemperatureC()) : s;
  }

  private static ConductorCurve moved(ConductorCurve c, double[] d) {
    Catenary k = c.curve();
    return new ConductorCurve(c.plan(), new Catenary(k.s0() + d[0], k.z0() + d[1],
        Math.max(1e-3 * k.c(), k.c() + d[2])));
  }

  /** A conductor type with its modulus, expansion (whole and core) and mass scaled. */
  static ConductorType scaled(ConductorType t, double modulus, double expansion, double mass) {
    return new ConductorType(t.code(), t.diameter(), t.area(), t.massPerLength() * mass,
        t.ratedStrength(), t.finalModulus() * modulus, t.thermalExpansion() * expansion,
        t.coreArea(), t.coreModulus() * modulus, t.coreThermalExpansion() * expansion, t.source(),
        t.thermal());
  }

  /**
   * Independent one-sigma directions of the parameter covariance: the columns of a lower
   * triangular L with L L^T = Sigma (semidefinite: a direction whose pivot vanishes is skipped).
   */
  static List<double[]> directions(Optional<CatenaryCovariance> covariance) {
    List<double[]> out = new ArrayList<>();
    if (covariance.isEmpty()) {
      return out;
    }
    CatenaryCovariance cov = covariance.get();
    double[][] a = new double[3][3];
    double largest = 0;
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        a[i][j] = cov.get(i, j);
      }
      largest = Math.max(largest, a[i][i]);
    }
    double[][] l = new double[3][3];
    for (int j = 0; j < 3; j++) {
      double d = a[j][j];
      for (int k = 0; k < j; k++) {
        d -= l[j][k] * l[j][k];
      }
      if (!(d > PIVOT_FLOOR * largest)) {
        continue;
      }
      double root = Math.sqrt(d);
      l[j][j] = root;
      for (int i = j + 1; i < 3; i++) {
        double v = a[i][j];
        for (int k = 0; k < j; k++) {
          v -= l[i][k] * l[j][k];
        }
        l[i][j] = v / root;
      }
      out.add(new double[] {l[0][j], l[1][j], l[2][j]});
    }
    return out;
  }
}
