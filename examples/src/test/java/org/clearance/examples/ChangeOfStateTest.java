package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.clearance.line.ConductorType;
import org.junit.jupiter.api.Test;

class ChangeOfStateTest {

  @Test
  void drakeFrom15To75DegreesMatchesTheParabolicCubic() {
    // check-values.md section 2, change of state [computed]: Drake-like w = 1.628 kg/m,
    // A = 468.6 mm^2, E = 70 GPa (assumed), alpha = 18.9e-6 /degC, S = 300 m, H1 = 28 000 N at
    // 15 degC -> 75 degC: parabolic cubic gives H2 = 21 117.6 N.
    ConductorType drake = new ConductorType("Drake", 28.14e-3, 468.6e-6, 1.628, 138.8e3, 70e9,
        18.9e-6, Double.NaN, Double.NaN, Double.NaN, "check-values.md section 2");
    assertEquals(21_117.6, ChangeOfState.tension(drake, 300, 28_000, 15, 75), 0.1);
    // Back again gives the start tension (the state function is conserved).
    double h2 = ChangeOfState.tension(drake, 300, 28_000, 15, 75);
    assertEquals(28_000, ChangeOfState.tension(drake, 300, h2, 75, 15), 1e-6);
  }

  @Test
  void rulingSpansMatchTheReferenceCases() {
    // check-values.md section 2, ruling span [computed]: 250, 300, 350, 400 m -> 339.116 m;
    // 600, 800, 1000 ft -> 848.53 ft.
    assertEquals(339.116, ChangeOfState.rulingSpan(250, 300, 350, 400), 0.0005);
    assertEquals(848.53, ChangeOfState.rulingSpan(600, 800, 1000), 0.005);
    // One span: the ruling span is the span (definition, methods.md section 3.4).
    assertEquals(312.5, ChangeOfState.rulingSpan(312.5), 1e-12);
  }
}
