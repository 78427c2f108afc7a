package org.clearance.sag;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.clearance.line.ConductorThermal;
import org.junit.jupiter.api.Test;

/**
 * CIGRE TB 601 heat balance against the brochure's Annex E worked examples.
 *
 * <p>Inputs and published results of CIGRE TB 601 (2014) Annex E as reproduced in the acceptance
 * tests of the open-source ampacity library statnett/linerate
 * ({@code tests/acceptance_tests/test_cigre_ampacity_cases.py}) [published; that library checks
 * them to 0.5 W/m and 1.5 A and notes "noticeable round-off errors in the report"]. The brochure
 * prints the terms to 0.1 W/m (example b's radiation to 1 W/m) and the ratings to 1 A; the
 * tolerances below are that rounding plus the round-off the library notes, stated per quantity.
 *
 * <ul>
 *   <li>Example a: Drake, D = 28.1 mm, outer strands d = 4.4 mm, emissivity = absorptivity = 0.8,
 *       R(25 degC) = 7.283e-5, R(75 degC) = 8.688e-5 ohm/m; air 40 degC, wind 0.61 m/s at 60 deg
 *       to the line, sea level, clear (N_s = 1), albedo 0.1, latitude 30 N, 10 June 2016 (day
 *       162), 11:00 solar time, line east-west. At 100 degC: P_c = 77.6, P_r = 39.1,
 *       P_S = 27.2 W/m, R = 9.3905e-5 ohm/m, rating 976 A.</li>
 *   <li>Example b: the same conductor with d = 2.2 mm, emissivity = absorptivity = 0.9; air 20
 *       degC, wind 1.66 m/s at 80 deg, altitude 500 m, span inclined 10 deg, N_s = 0.5, albedo
 *       0.15, latitude 50 N, 3 October 2016 (day 277), 14:00, line north-south. At 100 degC:
 *       P_c = 172.1, P_r = 54, P_S = 13.7 W/m, rating 1504 A (the brochure prints 1054, a
 *       transposition the library notes).</li>
 * </ul>
 */
class CigreHeatBalanceTest {

  private static CigreHeatBalance exampleA() {
    ConductorThermal drake = new ConductorThermal(7.283e-5, 8.688e-5, 0.8, 0.8, "TB 601 Annex E");
    SolarPosition sun = SolarPosition.of(162, 11.0, 30.0, SolarPosition.CIGRE_601_DECLINATION_DEG);
    return new CigreHeatBalance(0.0281, 0.0044, drake, new CigreHeatBalance.Conditions(1000, 40,
        0.61, Math.toRadians(60), 0, 0, sun, Math.toRadians(90), 0.1, 1.0));
  }

  private static CigreHeatBalance exampleB() {
    ConductorThermal drake = new ConductorThermal(7.283e-5, 8.688e-5, 0.9, 0.9, "TB 601 Annex E");
    SolarPosition sun = SolarPosition.of(277, 14.0, 50.0, SolarPosition.CIGRE_601_DECLINATION_DEG);
    return new CigreHeatBalance(0.0281, 0.0022, drake, new CigreHeatBalance.Conditions(1000, 20,
        1.66, Math.toRadians(80), 500, Math.toRadians(10), sun, 0, 0.15, 0.5));
  }

  @Test
  void exampleAOfAnnexE() {
    CigreHeatBalance a = exampleA();
    // computed here: 77.67, 39.08, 27.21 W/m, 976.4 A
    assertEquals(77.6, a.convectiveCooling(100), 0.1); // TB 601 Annex E [published]
    assertEquals(39.1, a.radiativeCooling(100), 0.05); // TB 601 Annex E [published]
    assertEquals(27.2, a.solarHeating(), 0.05); // TB 601 Annex E [published]
    assertEquals(9.3905e-5, a.resistance(100), 1e-10); // TB 601 Annex E [published]
    assertEquals(976, a.steadyCurrent(100), 1.0); // TB 601 Annex E [published]
  }

  @Test
  void exampleBOfAnnexE() {
    CigreHeatBalance b = exampleB();
    // computed here: 172.18, 54.00, 13.54 W/m, 1504.8 A. The solar term takes the line as
    // horizontal (cos eta = cos H_s cos(gamma_s - gamma_c)); the brochure's span rises 10 deg,
    // which its general incidence formula counts: 0.16 W/m here, 0.1 % of the rating.
    assertEquals(172.1, b.convectiveCooling(100), 0.1); // TB 601 Annex E [published]
    assertEquals(54, b.radiativeCooling(100), 0.5); // TB 601 Annex E [published]
    assertEquals(13.7, b.solarHeating(), 0.2); // TB 601 Annex E [published], see above
    assertEquals(1504, b.steadyCurrent(100), 1.5); // TB 601 Annex E [published], see above
  }

  @Test
  void theRatingCurrentGivesBackTheTemperature() {
    // [computed] the balance solved for the temperature at the example's rating returns 100 degC.
    CigreHeatBalance a = exampleA();
    double rating = a.steadyCurrent(100);
    ConductorThermal drake = new ConductorThermal(7.283e-5, 8.688e-5, 0.8, 0.8, "TB 601 Annex E");
    SolarPosition sun = SolarPosition.of(162, 11.0, 30.0, SolarPosition.CIGRE_601_DECLINATION_DEG);
    CigreHeatBalance at = new CigreHeatBalance(0.0281, 0.0044, drake,
        new CigreHeatBalance.Conditions(rating, 40, 0.61, Math.toRadians(60), 0, 0, sun,
            Math.toRadians(90), 0.1, 1.0));
    assertEquals(100, at.conductorTemperature(), 1e-4);
  }

  @Test
  void roughnessOfTheExamples() {
    // [computed] R_s = d / (2 (D - d)): 4.4 / 47.4 = 0.0928; 2.2 / 51.8 = 0.0425.
    assertEquals(0.0928, exampleA().roughness(), 1e-4);
    assertEquals(0.0425, exampleB().roughness(), 1e-4);
  }

  @Test
  void bothModelsAgreeOnTheIeeeAnnexWeatherWithinAFewDegrees() {
    // [computed] IEEE 738 and CIGRE 601 are different fits of the same physics; on the IEEE 738
    // Annex B weather (1000 A, Drake, 0.5/0.5) they give temperatures within a few degC
    // (common practice, no source: published comparisons show a few percent in rating).
    ConductorThermal drake = new ConductorThermal(7.284e-5, 8.689e-5, 0.5, 0.5, "Annex B");
    SolarPosition sun = SolarPosition.of(161, 14.0, 43.0);
    double ieee = new HeatBalance(0.02812, drake, new HeatBalance.Conditions(1000, 40, 0.61,
        Math.PI / 2, 0, sun, 0)).conductorTemperature();
    double cigre = new CigreHeatBalance(0.02812, 0.0044, drake, new CigreHeatBalance.Conditions(
        1000, 40, 0.61, Math.PI / 2, 0, 0, sun, 0, 0.1, 1.0)).conductorTemperature();
    assertTrue(Math.abs(ieee - cigre) < 5, ieee + " vs " + cigre);
  }

  @Test
  void calmAirFallsBackOnTheLowWindRule() {
    // [computed] below 0.5 m/s the forced value at 45 deg replaces the one at the given angle:
    // parallel wind at 0.3 m/s cools as much as the same wind at 45 deg.
    ConductorThermal drake = new ConductorThermal(7.283e-5, 8.688e-5, 0.8, 0.8, "x");
    SolarPosition sun = SolarPosition.of(162, 11.0, 30.0);
    double parallel = new CigreHeatBalance(0.0281, 0.0044, drake, new CigreHeatBalance.Conditions(
        800, 25, 0.3, 0, 0, 0, sun, 0, 0.1, 1)).convectiveCooling(60);
    double at45 = new CigreHeatBalance(0.0281, 0.0044, drake, new CigreHeatBalance.Conditions(
        800, 25, 0.3, Math.PI / 4, 0, 0, sun, 0, 0.1, 1)).convectiveCooling(60);
    assertEquals(at45, parallel, 1e-9);
  }
}
