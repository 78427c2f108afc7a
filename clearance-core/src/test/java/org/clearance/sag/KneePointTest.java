package org.clearance.sag;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The bimetallic knee point: above the knee temperature the steel core alone carries the tension
 * (methods.md 3.5 item 5). The core expands less (11.5e-6 vs 18.9e-6 /degC) and is less stiff, so
 * above the knee the sag grows more slowly than the single-material model predicts.
 */
class KneePointTest {

  private static final double W = SagFixtures.drake().weightPerLength();
  private static final ConductorMechanics DRAKE = ConductorMechanics.of(SagFixtures.drake());
  private static final TensionState SURVEY = new TensionState(28000, 15, W);
  private static final double KNEE = 90;

  private static ChangeOfState knee(ChangeOfState.Method method) {
    return new ChangeOfState(DRAKE, 300, new ChangeOfState.Options(method, KNEE));
  }

  private static ChangeOfState plain(ChangeOfState.Method method) {
    return new ChangeOfState(DRAKE, 300, new ChangeOfState.Options(method, Double.NaN));
  }

  // Below the knee both models are the same model: identical tension.
  @Test
  void sameBelowKnee() {
    for (ChangeOfState.Method m : ChangeOfState.Method.values()) {
      for (double t : new double[] {-20, 15, 50, 89.9, KNEE}) {
        assertEquals(plain(m).to(SURVEY, t, W).horizontalTension(),
            knee(m).to(SURVEY, t, W).horizontalTension(), 0.0);
      }
    }
  }

  // Above the knee: less sag than the plain model (the brief expected more; physics says less,
  // see the class comment), and the difference grows with temperature.
  @Test
  void lessSagAboveKnee() {
    double previous = 0;
    for (double t : new double[] {100, 150, 200}) {
      double withKnee = knee(ChangeOfState.Method.CATENARY_LENGTH).to(SURVEY, t, W).levelSag(300);
      double without = plain(ChangeOfState.Method.CATENARY_LENGTH).to(SURVEY, t, W).levelSag(300);
      assertTrue(withKnee < without, t + " degC: " + withKnee + " vs " + without);
      assertTrue(without - withKnee > previous);
      previous = without - withKnee;
    }
  }

  // Above the knee the sag rate follows the core's own properties: methods.md 3.5 item 6,
  // dD/dtheta = S alpha / (16 D / 3S + S H / (D EA)) with the core's EA and alpha (parabolic
  // theory, first order, so 2 %).
  @Test
  void sagRateAboveKneeFollowsCore() {
    ChangeOfState cos = knee(ChangeOfState.Method.CATENARY_LENGTH);
    TensionState at = cos.to(SURVEY, 150, W);
    double rate = (cos.to(SURVEY, 151, W).levelSag(300) - cos.to(SURVEY, 149, W).levelSag(300))
        / 2;
    double d = at.levelSag(300);
    double expected = 300 * DRAKE.coreThermalExpansion()
        / (16 * d / (3 * 300) + 300 * at.horizontalTension() / (d * DRAKE.coreAxialStiffness()));
    assertEquals(expected, rate, 0.02 * expected);
  }

  // The path through the knee is continuous, and it works from above the knee downwards.
  @Test
  void continuousAndReversible() {
    ChangeOfState cos = knee(ChangeOfState.Method.CATENARY_LENGTH);
    double below = cos.to(SURVEY, KNEE - 1e-6, W).horizontalTension();
    double above = cos.to(SURVEY, KNEE + 1e-6, W).horizontalTension();
    assertEquals(below, above, 1e-3);
    TensionState hot = cos.to(SURVEY, 150, W);
    assertEquals(28000, cos.to(hot, 15, W).horizontalTension(), 1e-6);
  }

  @Test
  void needsCoreData() {
    ConductorMechanics noCore = ConductorMechanics.of(SagFixtures.drakeNoCore());
    assertThrows(IllegalArgumentException.class, () -> new ChangeOfState(noCore, 300,
        new ChangeOfState.Options(ChangeOfState.Method.CATENARY_LENGTH, KNEE)));
  }
}
