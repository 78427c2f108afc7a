package org.clearance.sag;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.clearance.line.ConductorThermal;
import org.junit.jupiter.api.Test;

/**
 * IEEE Std 738-2012 heat balance against the standard's Annex B example.
 *
 * <p>Inputs and published results of IEEE Std 738-2012 Annex B as reproduced in the acceptance
 * tests of the open-source ampacity library statnett/linerate
 * ({@code tests/acceptance_tests/test_ieee_ampacity_cases.py}) [published]: Drake, D = 28.12 mm,
 * emissivity = absorptivity = 0.5, R(25 degC) = 7.284e-5 ohm/m, R(75 degC) = 8.689e-5 ohm/m; air
 * 40 degC, wind 0.61 m/s perpendicular to the line, elevation 0, clear atmosphere, latitude 43 N,
 * 10 June (day 161), 14:00 solar time, line east-west. At 1000 A the Annex gives a conductor
 * temperature of 100.7 degC with solar heating 13.74 W/m and convective cooling 83.06 W/m. The
 * Annex prints them rounded to 0.1 degC and 0.01 W/m; the tolerances allow that rounding plus the
 * rounding of the Annex's intermediate air properties (0.06 W/m, 0.1 degC).
 *
 * <p>The Annex's sun geometry is not known here exactly: the reproduction gives latitude, date and
 * hour but places both ends of the span at one point, so the line azimuth is not stated. With the
 * standard's equations (16a)-(20) the sun at 43 N, 10 June, 14:00 gives q_s between 11.90 W/m
 * (line along the sun's azimuth) and 14.00 W/m (line square to the sun) for Drake at alpha = 0.5
 * (12.43 east-west, 13.53 north-south); 13.74 needs a
 * line azimuth of about 172 or 309 deg, which the reproduction does not name. The reference
 * library's own fixture (declination amplitude 23.3 deg, the 2016 date as day 162, coincident
 * ends read as azimuth 0) computes 13.52 W/m by the same equations and passes only through its
 * 0.5 W/m tolerance. The solar formulas are therefore checked against that library's unit
 * examples of equations (18) and (20) and its fixture, and the Annex's balance with its published
 * q_s.
 */
class HeatBalanceTest {

  private static final ConductorThermal DRAKE_B = new ConductorThermal(7.284e-5, 8.689e-5, 0.5,
      0.5, "IEEE 738-2012 Annex B");
  private static final double DIAMETER_B = 0.02812;

  private static HeatBalance annexB(double currentA) {
    SolarPosition sun = SolarPosition.of(161, 14.0, 43.0);
    return new HeatBalance(DIAMETER_B, DRAKE_B, new HeatBalance.Conditions(currentA, 40.0, 0.61,
        Math.PI / 2, 0.0, sun, Math.toRadians(90)));
  }

  @Test
  void annexBConvectiveCooling() {
    assertEquals(83.06, annexB(1000).convectiveCooling(100.7), 0.06); // Annex B [published]
  }

  @Test
  void annexBConductorTemperatureWithTheAnnexSolarHeating() {
    // Annex B [published]: q_s = 13.74 W/m, 1000 A -> 100.7 degC
    assertEquals(100.7, annexB(1000).conductorTemperature(13.74), 0.1);
  }

  @Test
  void annexBConductorTemperatureWithTheSunComputed() {
    // The same with q_s from the sun at 43 N, 10 June, 14:00, line north-south (12.4-13.5 W/m
    // for any line azimuth, against the Annex's 13.74): 1.3 W/m less heating moves the balance by
    // well under 1 degC, so the Annex's 100.7 degC holds to 1 degC.
    HeatBalance b = new HeatBalance(DIAMETER_B, DRAKE_B, new HeatBalance.Conditions(1000, 40.0,
        0.61, Math.PI / 2, 0.0, SolarPosition.of(161, 14.0, 43.0), 0));
    assertEquals(13.53, b.solarHeating(), 0.01); // [computed] 0.5 x 995.83 x 0.9663 x 0.02812
    assertEquals(100.7, b.conductorTemperature(), 1.0); // Annex B [published], see above
  }

  @Test
  void annexBSolarHeatingAsTheReferenceLibraryComputesIt() {
    // statnett/linerate tests/acceptance_tests/test_ieee_ampacity_cases.py: the Annex's 13.738 W/m
    // within 0.5 W/m [published, that library's tolerance]; its fixture's sun [computed here]:
    // declination 23.3 sin((284 + 162) / 365 x 360 deg), 14:00 at longitude 0, azimuth 0.
    SolarPosition sun = SolarPosition.of(162, 14.0, 43.0, SolarPosition.CIGRE_601_DECLINATION_DEG);
    HeatBalance b = new HeatBalance(DIAMETER_B, DRAKE_B, new HeatBalance.Conditions(1000, 40.0,
        0.61, Math.PI / 2, 0.0, sun, 0));
    assertEquals(13.52, b.solarHeating(), 0.01); // [computed] 0.5 x 995.65 x 0.9657 x 0.02812
    assertEquals(13.738, b.solarHeating(), 0.5); // Annex B via linerate [published]
  }

  @Test
  void noLineAzimuthGivesMoreThanTheSunSquareOn() {
    // [computed] q_s = alpha Q_s sin(theta) D is largest for theta = 90 deg:
    // 0.5 x 995.83 x 0.02812 = 14.00 W/m at 43 N, 10 June, 14:00; smallest along the sun's
    // azimuth, theta = Hc = 58.17 deg: 14.00 x sin(58.17 deg) = 11.90 W/m.
    double max = 0;
    double min = Double.MAX_VALUE;
    for (int deg = 0; deg < 180; deg++) {
      double q = new HeatBalance(DIAMETER_B, DRAKE_B, new HeatBalance.Conditions(1000, 40.0,
          0.61, Math.PI / 2, 0.0, SolarPosition.of(161, 14.0, 43.0), Math.toRadians(deg)))
          .solarHeating();
      max = Math.max(max, q);
      min = Math.min(min, q);
    }
    assertEquals(14.00, max, 0.01);
    assertEquals(11.90, min, 0.01);
  }

  @Test
  void theWorkedCaseOfTheProjectNotes() {
    // Project reference notes, IEEE 738 worked case [case from memory, values computed there]:
    // Drake, R(25) = 7.283e-5, R(75) = 8.688e-5 ohm/m, D = 28.14 mm, air 40 degC, wind 0.61 m/s
    // perpendicular, sea level, clear, 30 N, 10 June, 11:00 solar time, line east-west:
    // epsilon = alpha = 0.5 carries 992.6 A at 100 degC; 0.8 carries 1025.6 A. Within 0.5 % of
    // the current is 1 degC of temperature here (dT/dI about 0.13 degC/A).
    for (double[] c : new double[][] {{0.5, 992.6}, {0.8, 1025.6}}) {
      ConductorThermal drake = new ConductorThermal(7.283e-5, 8.688e-5, c[0], c[0], "notes");
      HeatBalance b = new HeatBalance(0.02814, drake, new HeatBalance.Conditions(c[1], 40, 0.61,
          Math.PI / 2, 0, SolarPosition.of(161, 11.0, 30.0), Math.toRadians(90)));
      assertEquals(100.0, b.conductorTemperature(), 1.0);
    }
  }

  @Test
  void clearSkyFluxAndElevationFactorOfTheReferenceLibrary() {
    // statnett/linerate tests/equations/ieee738/test_solar_heating.py examples of IEEE 738-2012
    // equations (18), clear atmosphere, and (20) [computed by that library]:
    // sin Hc = 0.7885372342 -> Q_s = 974.5452942944816 W/m^2; H_e = 250 m -> K = 1.0280075.
    assertEquals(974.5452942944816, HeatBalance.clearSkyFlux(Math.asin(0.7885372342)), 1e-6);
    assertEquals(1.0280075, HeatBalance.elevationFactor(250), 1e-7);
  }

  @Test
  void annexBRadiativeAndJouleAtTheBalance() {
    // [computed] q_r = 17.8 x 0.02812 x 0.5 x ((373.7/100)^4 - (313/100)^4) = 24.45 W/m;
    // q_j = 1000^2 x (7.284e-5 + 2.81e-7 x 75.7) = 94.11 W/m; 13.74 + 94.11 = 83.06 + 24.79.
    HeatBalance b = annexB(1000);
    assertEquals(94.11, b.jouleHeating(100.7), 0.01);
    double t = b.conductorTemperature();
    assertEquals(b.solarHeating() + b.jouleHeating(t),
        b.convectiveCooling(t) + b.radiativeCooling(t), 1e-3);
  }

  @Test
  void solarAltitudeAndAzimuthOfAnnexB() {
    // [computed] from IEEE 738-2012 (16a)-(17b): delta = 23.46 sin(445/365 x 360) = 23.02 deg,
    // omega = 30 deg; sin Hc = cos43 cos23.02 cos30 + sin43 sin23.02 -> Hc = 58.18 deg;
    // chi = sin30 / (sin43 cos30 - cos43 tan23.02) = 1.786, C = 180 -> Zc = 240.76 deg.
    SolarPosition sun = SolarPosition.of(161, 14.0, 43.0);
    assertEquals(58.18, Math.toDegrees(sun.altitudeRad()), 0.02);
    assertEquals(240.76, Math.toDegrees(sun.azimuthRad()), 0.05);
  }

  @Test
  void noCurrentNoSunGivesTheAirTemperature() {
    // [computed] with I = 0 and the sun below the horizon nothing heats the conductor.
    SolarPosition night = SolarPosition.of(161, 0.0, 43.0);
    HeatBalance b = new HeatBalance(DIAMETER_B, DRAKE_B,
        new HeatBalance.Conditions(0, 12.5, 2.0, Math.PI / 2, 0, night, 0));
    assertEquals(12.5, b.conductorTemperature(), 1e-4);
  }

  @Test
  void moreWindCoolsMore() {
    SolarPosition sun = SolarPosition.of(161, 14.0, 43.0);
    double calm = new HeatBalance(DIAMETER_B, DRAKE_B, new HeatBalance.Conditions(800, 20, 0.2,
        Math.PI / 2, 0, sun, 0)).conductorTemperature();
    double windy = new HeatBalance(DIAMETER_B, DRAKE_B, new HeatBalance.Conditions(800, 20, 4,
        Math.PI / 2, 0, sun, 0)).conductorTemperature();
    assertEquals(1, Math.signum(calm - windy), 0);
  }

  @Test
  void aCurrentNoConductorCarriesIsRefused() {
    SolarPosition sun = SolarPosition.of(161, 14.0, 43.0);
    HeatBalance b = new HeatBalance(DIAMETER_B, DRAKE_B, new HeatBalance.Conditions(100_000, 20,
        0.6, Math.PI / 2, 0, sun, 0));
    assertThrows(IllegalStateException.class, b::conductorTemperature);
  }
}
