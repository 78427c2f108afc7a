package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.Random;
import org.clearance.clearance.CatenaryDistance;
import org.clearance.clearance.ConductorDistance;
import org.clearance.clearance.DistanceUncertainty;
import org.clearance.clearance.StateUncertainty;
import org.clearance.clearance.UncertaintyOptions;
import org.clearance.clearance.UncertaintyPropagation;
import org.clearance.line.ConductorLibrary;
import org.clearance.line.ConductorType;
import org.clearance.line.LineCondition;
import org.clearance.sag.ConditionSolver;
import org.clearance.sag.ConditionState;
import org.clearance.sag.SectionSurvey;
import org.clearance.wire.Catenary;
import org.clearance.wire.CatenaryCovariance;
import org.clearance.wire.ConductorCurve;
import org.junit.jupiter.api.Test;

/**
 * The linearised clearance uncertainty against Monte Carlo on the demo corridor: for every planted
 * grow-in tree of a small demo scene, the standard deviation of its apex's distance to its nearest
 * phase conductor in the hot and ice conditions, over draws of every input from the same
 * distributions (survey temperature, modulus, expansion, weight, catenary fit parameters, point
 * position), against {@link DistanceUncertainty}; agreement within 10 % (issue 14).
 *
 * <p>The fit covariance is the least-squares one (methods.md section 2.3) of the demo's own wire
 * sampling: the demo's points per metre and noise along the whole span.
 */
class UncertaintyMonteCarloTest {

  private static final int DRAWS = 3000;
  /** Monte Carlo's own scatter with 3000 draws is about 1.3 % of sigma; 10 % is the issue's
   * agreement. */
  private static final double AGREEMENT = 0.10;
  private static final double SURVEY_SIGMA_C = 10 / Math.sqrt(3); // assumed, +-10 degC

  @Test
  void linearPropagationAgreesWithMonteCarloOnTheDemo() {
    DemoScene scene = Scenes.defaults();
    ConductorType drake = ConductorLibrary.builtin().find("Drake").orElseThrow();
    ConditionSolver solver = new ConditionSolver(ConditionSolver.Options.DEFAULT);
    UncertaintyOptions options = UncertaintyOptions.DEFAULT;
    UncertaintyPropagation propagation = new UncertaintyPropagation(solver, options);
    List<LineCondition> conditions = List.of(
        new LineCondition("hot", LineCondition.Kind.TEMPERATURE, 100, 10, Double.NaN, Double.NaN,
            Double.NaN, Double.NaN, Double.NaN),
        new LineCondition("ice", LineCondition.Kind.ICE, 0, 0, 0.0127, 913, Double.NaN,
            Double.NaN, Double.NaN));
    int compared = 0;
    double worst = 0;
    for (DemoTree tree : scene.trees()) {
      if (tree.role() != DemoTree.Role.GROW_IN) {
        continue;
      }
      DemoSpan span = scene.spans().get(tree.nearestSpan());
      DemoWire wire = span.wire(tree.nearestPosition());
      if (wire.role() != DemoPosition.Role.PHASE) {
        continue;
      }
      TensionSection ts = scene.sections().get(span.section());
      SectionSurvey section = new SectionSurvey(ts.rulingSpanM(), ts.phaseTensionN(),
          scene.surveyTemperatureC());
      CatenaryCovariance cov = fitCovariance(wire);
      for (LineCondition condition : conditions) {
        ConditionState base = solver.state(wire.curve(), drake, section, condition);
        StateUncertainty u = propagation.condition(wire.curve(), Optional.of(cov), drake, section,
            SURVEY_SIGMA_C, condition, base);
        ConductorDistance d = CatenaryDistance.between(base.curve(), tree.x(), tree.y(),
            tree.baseZ() + tree.heightM());
        double linear = DistanceUncertainty.of(u, options, d.distance(), d.horizontal(),
            d.vertical(), d.station()).sigma();
        double mc = monteCarlo(tree, wire.curve(), cov, drake, section, condition, solver,
            options, new Random(tree.id() * 31L + condition.name().hashCode()));
        assertEquals(mc, linear, AGREEMENT * mc, () -> "tree " + tree.id() + " " + condition.name()
            + ": Monte Carlo " + mc + " m, linear " + linear + " m");
        worst = Math.max(worst, Math.abs(linear - mc) / mc);
        compared++;
      }
    }
    // The default demo plants 7 grow-in trees by phase conductors (14 tree-conditions; measured
    // worst disagreement 2.6 %).
    assertTrue(compared >= 10, "grow-in trees compared: " + compared);
    System.out.printf("uncertainty: %d tree-conditions, worst |linear - MC| / MC = %.3f%n",
        compared, worst);
  }

  private static double monteCarlo(DemoTree tree, ConductorCurve curve, CatenaryCovariance cov,
      ConductorType type, SectionSurvey section, LineCondition condition, ConditionSolver solver,
      UncertaintyOptions o, Random r) {
    double[][] l = cholesky(cov);
    double sum = 0;
    double sum2 = 0;
    for (int k = 0; k < DRAWS; k++) {
      double[] g = {r.nextGaussian(), r.nextGaussian(), r.nextGaussian()};
      double[] dp = new double[3];
      for (int i = 0; i < 3; i++) {
        for (int j = 0; j < 3; j++) {
          dp[i] += l[i][j] * g[j];
        }
      }
      Catenary c = curve.curve();
      ConductorCurve moved = new ConductorCurve(curve.plan(), new Catenary(c.s0() + dp[0],
          c.z0() + dp[1], c.c() + dp[2]));
      double fm = 1 + o.modulusRelative() * r.nextGaussian();
      double fe = 1 + o.expansionRelative() * r.nextGaussian();
      double fw = 1 + o.massRelative() * r.nextGaussian();
      ConductorType t = new ConductorType(type.code(), type.diameter(), type.area(),
          type.massPerLength() * fw, type.ratedStrength(), type.finalModulus() * fm,
          type.thermalExpansion() * fe, type.coreArea(), type.coreModulus() * fm,
          type.coreThermalExpansion() * fe, type.source(), type.thermal());
      SectionSurvey s = new SectionSurvey(section.rulingSpan(),
          section.horizontalTension() * (moved.curve().c() / c.c()) * fw,
          section.conductorTemperatureC() + SURVEY_SIGMA_C * r.nextGaussian());
      ConditionState state = solver.state(moved, t, s, condition);
      double d = new CatenaryDistance(state.curve()).distance(
          tree.x() + o.horizontalRmseM() * r.nextGaussian(),
          tree.y() + o.horizontalRmseM() * r.nextGaussian(),
          tree.baseZ() + tree.heightM() + o.verticalRmseM() * r.nextGaussian());
      sum += d;
      sum2 += d * d;
    }
    double mean = sum / DRAWS;
    return Math.sqrt(Math.max(0, sum2 / DRAWS - mean * mean) * DRAWS / (DRAWS - 1.0));
  }

  /**
   * Least-squares covariance sigma^2 (J^T J)^-1 of (s0, z0, c) for points every 1 / density m
   * along the span with vertical noise sigma (methods.md section 2.3), J the gradient of z.
   */
  static CatenaryCovariance fitCovariance(DemoWire wire) {
    Catenary c = wire.curve().curve();
    double length = wire.curve().length();
    int n = Math.max(10, (int) (length * wire.pointsPerMetre()));
    double[][] jtj = new double[3][3];
    for (int i = 0; i < n; i++) {
      double s = (i + 0.5) * length / n;
      double t = (s - c.s0()) / c.c();
      double[] g = {-Math.sinh(t), 1, Math.cosh(t) - 1 - t * Math.sinh(t)};
      for (int a = 0; a < 3; a++) {
        for (int b = 0; b < 3; b++) {
          jtj[a][b] += g[a] * g[b];
        }
      }
    }
    double[][] inv = invert(jtj);
    double v = wire.noiseSigmaM() * wire.noiseSigmaM();
    return new CatenaryCovariance(v * inv[0][0], v * inv[1][1], v * inv[2][2], v * inv[0][1],
        v * inv[0][2], v * inv[1][2]);
  }

  private static double[][] invert(double[][] m) {
    double a = m[0][0];
    double b = m[0][1];
    double c = m[0][2];
    double d = m[1][0];
    double e = m[1][1];
    double f = m[1][2];
    double g = m[2][0];
    double h = m[2][1];
    double k = m[2][2];
    double det = a * (e * k - f * h) - b * (d * k - f * g) + c * (d * h - e * g);
    return new double[][] {
        {(e * k - f * h) / det, (c * h - b * k) / det, (b * f - c * e) / det},
        {(f * g - d * k) / det, (a * k - c * g) / det, (c * d - a * f) / det},
        {(d * h - e * g) / det, (b * g - a * h) / det, (a * e - b * d) / det}};
  }

  private static double[][] cholesky(CatenaryCovariance cov) {
    double[][] l = new double[3][3];
    for (int j = 0; j < 3; j++) {
      double d = cov.get(j, j);
      for (int k = 0; k < j; k++) {
        d -= l[j][k] * l[j][k];
      }
      if (!(d > 0)) {
        continue;
      }
      l[j][j] = Math.sqrt(d);
      for (int i = j + 1; i < 3; i++) {
        double v = cov.get(i, j);
        for (int k = 0; k < j; k++) {
          v -= l[i][k] * l[j][k];
        }
        l[i][j] = v / l[j][j];
      }
    }
    return l;
  }
}
