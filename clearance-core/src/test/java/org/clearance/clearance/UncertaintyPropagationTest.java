package org.clearance.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import org.clearance.line.ConductorLibrary;
import org.clearance.line.ConductorType;
import org.clearance.line.LineCondition;
import org.clearance.line.SpanFrame;
import org.clearance.sag.ConditionSolver;
import org.clearance.sag.ConditionState;
import org.clearance.sag.SectionSurvey;
import org.clearance.wire.Catenary;
import org.clearance.wire.CatenaryCovariance;
import org.clearance.wire.ConductorCurve;
import org.junit.jupiter.api.Test;

/** Linearised propagation of the inputs to the conductor position (methods.md section 7.2). */
class UncertaintyPropagationTest {

  private static final ConductorType DRAKE = ConductorLibrary.builtin().find("Drake")
      .orElseThrow();
  /** check-values.md section 2: Drake-like w = 15.9652 N/m, H = 28 000 N, level 300 m span. */
  private static final double W = 1.628 * 9.80665;
  private static final ConductorCurve SPAN = new ConductorCurve(SpanFrame.between(0, 0, 300, 0),
      Catenary.through(0, 50, 300, 50, 28_000 / W));
  private static final CatenaryCovariance COV = new CatenaryCovariance(0.04, 1e-4, 25, 0, 0, 0);
  private static final UncertaintyPropagation PROPAGATION = new UncertaintyPropagation(
      new ConditionSolver(ConditionSolver.Options.DEFAULT), UncertaintyOptions.DEFAULT);

  @Test
  void theSurveyStateCarriesTheFitsOwnSigma() {
    StateUncertainty u = PROPAGATION.survey(SPAN, Optional.of(COV));
    for (double s : new double[] {0, 60, 150, 270, 300}) {
      // [computed] first-order sigma_z(s) of the covariance itself (CatenaryCovariance.sigmaZ);
      // the propagation moves the curve by one Cholesky column at a time: same to 1 %.
      assertEquals(COV.sigmaZ(SPAN.curve(), s), u.total(s), 0.01 * COV.sigmaZ(SPAN.curve(), s));
    }
  }

  @Test
  void theSurveyTemperatureMovesTheHotSagByTheQuickFormula() {
    // methods.md section 3.5 [computed there]: dD/dtheta = S alpha / (16 D / (3 S) + S H /
    // (D EA)); at the hot state of this span (75 degC: H = 21 117 N, D = 8.51 m, check-values.md
    // section 2) 0.0329 m/degC. One standard uncertainty of the survey temperature (5.77 degC,
    // an assumed +-10 degC) moves the mid-span of the hot curve by about that times 5.77 m:
    // 0.19 m; the parabolic quick formula holds to 15 %.
    LineCondition hot = new LineCondition("hot", LineCondition.Kind.TEMPERATURE, 75, 0,
        Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
    SectionSurvey section = new SectionSurvey(300, 28_000 * DRAKE.weightPerLength() / W, 15);
    ConditionState base = new ConditionSolver(ConditionSolver.Options.DEFAULT).state(SPAN, DRAKE,
        section, hot);
    double sigmaT = 10 / Math.sqrt(3);
    StateUncertainty u = PROPAGATION.condition(SPAN, Optional.empty(), DRAKE, section, sigmaT,
        hot, base);
    int t = UncertaintyPropagation.INPUTS.indexOf("survey temperature");
    assertEquals(0.0329 * sigmaT, u.sigma(t, 150), 0.15 * 0.0329 * sigmaT);
    // The attachments do not move with the temperature.
    assertEquals(0, u.sigma(t, 0), 1e-9);
    assertTrue(u.sigma(UncertaintyPropagation.INPUTS.indexOf("conductor modulus"), 150) > 0);
  }
}
