package org.clearance.sag;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import org.clearance.line.ConductorType;
import org.clearance.line.LineCondition;
import org.clearance.wire.ConductorCurve;
import org.junit.jupiter.api.Test;

class ConditionSolverTest {

  private static final ConductorType DRAKE = SagFixtures.drake();
  private static final double W = DRAKE.weightPerLength();
  private static final double H_S = 28000;
  private static final double C_S = H_S / W;
  private static final SectionSurvey SECTION = new SectionSurvey(300, H_S, 15);

  /** check-values.md section 2 inclined span: S = 300 m, far support 30 m higher, C = H / w. */
  private static final ConductorCurve INCLINED = SagFixtures.span(300, 100, 130, C_S);

  private static void assertSameAttachments(ConductorCurve expected, ConductorCurve actual) {
    assertEquals(expected.x(0), actual.x(0), 1e-9);
    assertEquals(expected.y(0), actual.y(0), 1e-9);
    assertEquals(expected.x(expected.length()), actual.x(actual.length()), 1e-9);
    assertEquals(expected.y(expected.length()), actual.y(actual.length()), 1e-9);
    assertEquals(expected.zA(), actual.zA(), 1e-9);
    assertEquals(expected.zB(), actual.zB(), 1e-9);
  }

  private static double sectionTension(double temperature, double weight) {
    return ChangeOfState.solve(ConductorMechanics.of(DRAKE), 300, new TensionState(H_S, 15, W),
        temperature, weight).horizontalTension();
  }

  // check-values.md section 2 [computed]: the inclined fixture has mid-span sag 6.4504 m (a check
  // of the fixture, not of this package).
  @Test
  void fixtureIsTheCheckValueSpan() {
    assertEquals(6.4504, INCLINED.midSpanSag(), 0.00005);
  }

  // Brief: the regenerated hot curve passes through the same attachments (1e-9 m), its mid-span
  // sag grows; c' = c (H2 / H_s) (methods.md 3.5 item 5).
  @Test
  void hotInclinedSpan() {
    ConditionState hot =
        ConditionSolver.solve(INCLINED, DRAKE, SECTION, SagFixtures.temperature("hot", 75, 0));
    double h2 = sectionTension(75, W);
    assertSameAttachments(INCLINED, hot.curve());
    assertEquals(C_S * h2 / H_S, hot.curve().curve().c(), 1e-9 * C_S);
    assertTrue(hot.curve().midSpanSag() > INCLINED.midSpanSag() + 2.0);
    assertEquals(h2, hot.horizontalTension(), 0.0);
    assertEquals(W, hot.weightPerLength(), 0.0);
    assertEquals(0.0, hot.swingAngle(), 0.0);
  }

  // check-values.md section 2 [computed]: on the level 300 m ruling span itself the hot sag is
  // 8.5142 m (see ChangeOfStateTest.drakeExactLength for the 0.001 m tolerance).
  @Test
  void hotLevelRulingSpan() {
    ConductorCurve level = SagFixtures.span(300, 50, 50, C_S);
    ConditionState hot =
        ConditionSolver.solve(level, DRAKE, SECTION, SagFixtures.temperature("hot", 75, 0));
    assertEquals(8.5142, hot.curve().midSpanSag(), 0.001);
  }

  // Brief: zero temperature change returns the surveyed curve (1e-9 m); here exactly itself.
  @Test
  void zeroChangeReturnsSurveyedCurve() {
    ConditionState same =
        ConditionSolver.solve(INCLINED, DRAKE, SECTION, SagFixtures.temperature("hot", 15, 0));
    assertSame(INCLINED, same.curve());
    assertEquals(H_S, same.horizontalTension(), 0.0);
    ConditionState noIce =
        ConditionSolver.solve(INCLINED, DRAKE, SECTION, SagFixtures.ice("ice", 15, 0.0));
    assertSameAttachments(INCLINED, noIce.curve());
    assertEquals(INCLINED.midSpanSag(), noIce.curve().midSpanSag(), 1e-9);
  }

  // A span whose fitted c is 10 % above the section mean keeps that ratio in the new condition.
  @Test
  void spanKeepsItsOffsetFromTheSectionMean() {
    ConductorCurve stiff = SagFixtures.span(250, 80, 95, 1.1 * C_S);
    LineCondition hot = SagFixtures.temperature("hot", 90, 0);
    double cMean = ConditionSolver.solve(INCLINED, DRAKE, SECTION, hot).curve().curve().c()
        * (C_S / INCLINED.curve().c());
    double cSpan = ConditionSolver.solve(stiff, DRAKE, SECTION, hot).curve().curve().c();
    assertEquals(1.1, cSpan / cMean, 1e-12);
  }

  // Creep as an equivalent temperature (methods.md 3.5 item 4): 60 + 15 degC = 75 degC.
  @Test
  void creepAllowanceAddsToTemperature() {
    ConditionState crept = ConditionSolver.solve(INCLINED, DRAKE, SECTION,
        SagFixtures.temperature("hot", 60, 15));
    ConditionState hot =
        ConditionSolver.solve(INCLINED, DRAKE, SECTION, SagFixtures.temperature("hot", 75, 0));
    assertEquals(hot.curve().curve().c(), crept.curve().curve().c(), 1e-9);
    assertTrue(crept.basis().contains("creep"), crept.basis());
  }

  // Ice: w2 = w + rho g pi t (D + t) (methods.md 3.7); deeper than bare at the same temperature.
  @Test
  void iceCondition() {
    ConditionState iced =
        ConditionSolver.solve(INCLINED, DRAKE, SECTION, SagFixtures.ice("ice", -5, 0.0127));
    ConditionState bare =
        ConditionSolver.solve(INCLINED, DRAKE, SECTION, SagFixtures.temperature("cold", -5, 0));
    double w2 = W + ConductorLoading.iceWeight(913, 0.0127, 0.02814);
    assertEquals(w2, iced.weightPerLength(), 1e-12);
    assertEquals(sectionTension(-5, w2), iced.horizontalTension(), 1e-9);
    assertEquals(C_S * (iced.horizontalTension() / H_S) * (W / w2), iced.curve().curve().c(),
        1e-9);
    assertTrue(iced.curve().midSpanSag() > bare.curve().midSpanSag());
    assertSameAttachments(INCLINED, iced.curve());
    assertEquals(0.0, iced.swingAngle(), 0.0);
  }

  // check-values.md section 2 blowout [computed]: D = 28.14 mm, 287 Pa -> 8.076 N/m, 26.83 deg.
  @Test
  void windCondition() {
    ConditionState blown = ConditionSolver.solve(INCLINED, DRAKE, SECTION,
        SagFixtures.wind("blowout", 15, 287, Double.NaN));
    assertEquals(26.83, Math.toDegrees(blown.swingAngle()), 0.005);
    double wr = Math.hypot(W, 287 * 0.02814);
    assertEquals(wr, blown.weightPerLength(), 1e-12);
    assertEquals(sectionTension(15, wr), blown.horizontalTension(), 1e-9);
    assertEquals(C_S * (blown.horizontalTension() / H_S) * (W / wr), blown.curve().curve().c(),
        1e-9);
    assertSameAttachments(INCLINED, blown.curve());
    assertEquals(ConditionState.SwingSide.BOTH, blown.swingSide());
  }

  @Test
  void swingNeedsNoConductorData() {
    ConditionState swung = ConditionSolver.solve(INCLINED, null, SectionSurvey.unknown(),
        SagFixtures.swing("swing", Math.toRadians(30)));
    assertSame(INCLINED, swung.curve());
    assertEquals(Math.toRadians(30), swung.swingAngle(), 0.0);
    assertTrue(Double.isNaN(swung.horizontalTension()));
    assertTrue(Double.isNaN(swung.weightPerLength()));
  }

  // Extra sag: same attachments, vertical mid-span sag larger by X (Catenary.withMidSpanSag).
  @Test
  void extraSagNeedsNoConductorData() {
    ConditionState deeper = ConditionSolver.solve(INCLINED, null, SectionSurvey.unknown(),
        SagFixtures.extraSag("sag+", 1.5));
    assertSameAttachments(INCLINED, deeper.curve());
    assertEquals(INCLINED.midSpanSag() + 1.5, deeper.curve().midSpanSag(), 1e-9);
    assertEquals(0.0, deeper.swingAngle(), 0.0);
  }

  @Test
  void missingDataIsNamed() {
    assertMessage("condition 'hot' needs conductor data: conductor type unknown",
        INCLINED, null, SECTION, SagFixtures.temperature("hot", 75, 0));
    assertMessage("condition 'hot' needs the conductor temperature during the survey"
        + " (survey_conductor_temperature_c)", INCLINED, DRAKE,
        new SectionSurvey(300, H_S, Double.NaN), SagFixtures.temperature("hot", 75, 0));
    assertMessage("condition 'hot' needs the survey tension of its tension section", INCLINED,
        DRAKE, new SectionSurvey(300, Double.NaN, 15), SagFixtures.temperature("hot", 75, 0));
    assertMessage("condition 'hot' needs the ruling span of its tension section", INCLINED,
        DRAKE, new SectionSurvey(Double.NaN, H_S, 15), SagFixtures.temperature("hot", 75, 0));
    assertMessage("condition 'ice' needs an ice thickness (ice_thickness_mm)", INCLINED, DRAKE,
        SECTION, SagFixtures.ice("ice", -5, Double.NaN));
    assertMessage("condition 'hot' needs a conductor temperature (temperature_c)", INCLINED,
        DRAKE, SECTION, SagFixtures.temperature("hot", Double.NaN, 0));
    assertMessage("condition 'tilt' needs a swing angle between 0 and 90 degrees"
        + " (swing_angle_deg)", INCLINED, null, SECTION, SagFixtures.swing("tilt", Double.NaN));
    assertMessage("condition 'sag+' needs a positive extra sag (extra_sag_m)", INCLINED, null,
        SECTION, SagFixtures.extraSag("sag+", -1));
  }

  @Test
  void impossibleChangeOfStateNamesTheCondition() {
    IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
        () -> ConditionSolver.solve(INCLINED, DRAKE, SECTION,
            SagFixtures.temperature("melt", 20_000, 0)));
    assertTrue(e.getMessage().startsWith("condition 'melt': no solution within physical bounds"),
        e.getMessage());
    ConditionSolver knee = new ConditionSolver(new ConditionSolver.Options(
        new ChangeOfState.Options(ChangeOfState.Method.CATENARY_LENGTH, 90)));
    IllegalArgumentException noCore = assertThrows(IllegalArgumentException.class,
        () -> knee.state(INCLINED, SagFixtures.drakeNoCore(), SECTION,
            SagFixtures.temperature("hot", 75, 0)));
    assertTrue(noCore.getMessage().startsWith("condition 'hot': the knee-point model needs"),
        noCore.getMessage());
  }

  // Report text uses Locale.ROOT: run under a German default locale (decimal comma) to prove it.
  @Test
  void basisTextIsLocaleIndependent() {
    Locale saved = Locale.getDefault();
    try {
      Locale.setDefault(Locale.GERMANY);
      ConditionState hot =
          ConditionSolver.solve(INCLINED, DRAKE, SECTION, SagFixtures.temperature("hot", 75, 0));
      assertEquals("change of state to 75.0 degC, ruling span 300.0 m, H 28000 N -> "
          + String.format(Locale.ROOT, "%.0f", hot.horizontalTension()) + " N", hot.basis());
    } finally {
      Locale.setDefault(saved);
    }
  }

  private static void assertMessage(String expected, ConductorCurve span, ConductorType type,
      SectionSurvey section, LineCondition condition) {
    IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
        () -> ConditionSolver.solve(span, type, section, condition));
    assertEquals(expected, e.getMessage());
  }
}
