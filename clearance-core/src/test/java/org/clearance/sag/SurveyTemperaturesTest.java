package org.clearance.sag;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Random;
import org.clearance.line.ConductorLibrary;
import org.clearance.line.ConductorPosition;
import org.clearance.line.ConductorType;
import org.clearance.line.LineLayout;
import org.clearance.line.LineSpec;
import org.clearance.line.SpanLayout;
import org.clearance.line.Structure;
import org.clearance.line.StructureType;
import org.clearance.line.SurveyTemperatureSpec;
import org.clearance.line.SurveyTemperatureSpec.HeatInputs;
import org.clearance.line.SurveyTemperatureSpec.Source;
import org.clearance.line.TensionSection;
import org.clearance.survey.GpsTime;
import org.junit.jupiter.api.Test;

/** Survey temperatures per tension section: given ones, and the IEEE 738-2012 balance. */
class SurveyTemperaturesTest {

  private static final ConductorType DRAKE = ConductorLibrary.builtin().find("Drake")
      .orElseThrow();
  private static final ConductorPosition A = new ConductorPosition("A",
      ConductorPosition.Role.PHASE, 1, DRAKE, 0, 20, 1, Double.NaN, Double.NaN, 0);
  private static final ConductorPosition SHIELD = new ConductorPosition("SW",
      ConductorPosition.Role.SHIELD, 1, DRAKE, 0, 30, 1, Double.NaN, Double.NaN, 0);
  /** 2026-06-10T14:00:00Z in adjusted GPS time: [computed] 16 957 days x 86 400 + 50 400 s
   * after the GPS epoch, plus 18 leap seconds, minus 1e9. */
  private static final double GPS_14H = 16_957L * 86_400 + 50_400 + 18 - 1e9;

  private static TensionSection section(LineSpec spec) {
    // A north-south span (grid azimuth 0) of 300 m.
    Structure a = new Structure("T1", "", 0, StructureType.SUSPENSION, 0, 0, 10, Map.of(), "t", 1);
    Structure b = new Structure("T2", "", 1, StructureType.SUSPENSION, 0, 300, 10, Map.of(), "t",
        2);
    LineLayout line = SpanLayout.build(List.of(a, b), List.of(spec)).lines().get(0);
    return line.sections().get(0);
  }

  private static LineSpec spec(SurveyTemperatureSpec st) {
    return new LineSpec("L", "", 230, 0, st.temperatureC(), Double.NaN, List.of(A, SHIELD),
        List.of(), "t",
        st);
  }

  private static HeatInputs annexWeather(double windFromDeg) {
    return new HeatInputs(1000, Optional.empty(), 0.1, 40, 3, 0.61, 0.3, windFromDeg, 20, 0.2,
        0.2, Optional.empty(), 43, 0);
  }

  private static SurveyTemperatures at(double gps) {
    return new SurveyTemperatures(new SurveyTemperatures.Clock(true), Optional.empty(), "no CRS",
        Map.of("T1-T2", gps));
  }

  @Test
  void aGivenTemperatureHasTheUniformRangesSigma() {
    LineSpec spec = spec(SurveyTemperatureSpec.given(Source.MEASURED, 31, 3));
    TemperatureEstimate t = SurveyTemperatures.givenOnly().estimate(spec, section(spec), A);
    assertEquals(31, t.temperatureC(), 0);
    assertEquals(3 / Math.sqrt(3), t.sigmaC(), 1e-12); // JCGM 100:2008 4.3.7, uniform +-a
    assertEquals(Source.MEASURED, t.source());
  }

  @Test
  void theComputedTemperatureIsTheHeatBalanceAtTheFlightTime() {
    assertEquals(Instant.parse("2026-06-10T14:00:00Z"),
        GpsTime.toUtc(GPS_14H, true, Optional.empty()).orElseThrow());
    LineSpec spec = spec(new SurveyTemperatureSpec(Source.COMPUTED, Double.NaN, Double.NaN,
        Optional.of(annexWeather(90))));
    TemperatureEstimate t = at(GPS_14H).estimate(spec, section(spec), A);
    // The same balance by hand: 43 N, longitude 0, 10 June (day 161), 14:00 UTC plus the equation
    // of time; wind from the east across a north-south line; Drake of the library at 1000 A.
    SolarPosition sun = SolarPosition.at(Instant.parse("2026-06-10T14:00:00Z"), 43, 0);
    double direct = new HeatBalance(DRAKE.diameter(), DRAKE.thermal().orElseThrow(),
        new HeatBalance.Conditions(1000, 40, 0.61, Math.PI / 2, 0, sun, 0))
        .conductorTemperature();
    assertEquals(direct, t.temperatureC(), 1e-6);
    // IEEE 738-2012 Annex B's weather and load give about 100.7 degC [published]; the library's
    // Drake (D = 28.14 mm) and the sun of that hour differ a little from the Annex's.
    assertEquals(100.7, t.temperatureC(), 1.5);
    assertEquals(Source.COMPUTED, t.source());
    assertTrue(t.sigmaC() > 0);
    assertTrue(t.detail().contains("2026-06-10T14:00"), t.detail());
  }

  @Test
  void aShieldWireCarriesNoCurrent() {
    LineSpec spec = spec(new SurveyTemperatureSpec(Source.COMPUTED, Double.NaN, Double.NaN,
        Optional.of(annexWeather(90))));
    TemperatureEstimate t = at(GPS_14H).estimate(spec, section(spec), SHIELD);
    // Sun only: a few degrees above the 40 degC air [computed: q_s 13.5 W/m against about
    // 1.4 W/m per degC of convection and radiation].
    assertTrue(t.temperatureC() > 40 && t.temperatureC() < 52, "" + t.temperatureC());
  }

  @Test
  void theLinearSigmaMatchesMonteCarloOverTheRanges() {
    // Monte Carlo over the same uniform ranges (10 000 draws, fixed seed): the secant sigma of the
    // class agrees within 10 % (the balance is close to linear over these ranges).
    HeatInputs in = annexWeather(90);
    LineSpec spec = spec(new SurveyTemperatureSpec(Source.COMPUTED, Double.NaN, Double.NaN,
        Optional.of(in)));
    TemperatureEstimate t = at(GPS_14H).estimate(spec, section(spec), A);
    SolarPosition sun = SolarPosition.at(Instant.parse("2026-06-10T14:00:00Z"), 43, 0);
    Random r = new Random(11);
    int n = 10_000;
    double sum = 0;
    double sum2 = 0;
    for (int k = 0; k < n; k++) {
      double current = 1000 * (1 + 0.1 * (2 * r.nextDouble() - 1));
      double air = 40 + 3 * (2 * r.nextDouble() - 1);
      double wind = 0.61 + 0.3 * (2 * r.nextDouble() - 1);
      double angle = Math.min(Math.PI / 2, Math.PI / 2 - Math.toRadians(20) * r.nextDouble());
      double alpha = 0.5 + 0.2 * (2 * r.nextDouble() - 1);
      double eps = 0.5 + 0.2 * (2 * r.nextDouble() - 1);
      double v = new HeatBalance(DRAKE.diameter(), DRAKE.thermal().orElseThrow()
          .withSurface(alpha, eps), new HeatBalance.Conditions(current, air, wind, angle, 0, sun,
          0)).conductorTemperature();
      sum += v;
      sum2 += v * v;
    }
    double mcSigma = Math.sqrt(sum2 / n - (sum / n) * (sum / n));
    assertEquals(mcSigma, t.sigmaC(), 0.1 * mcSigma);
    assertEquals("wind speed", t.dominant()); // 0.61 +- 0.3 m/s: the largest relative range
  }

  @Test
  void noFlightTimeMeansNoComputedTemperature() {
    LineSpec spec = spec(new SurveyTemperatureSpec(Source.COMPUTED, Double.NaN, Double.NaN,
        Optional.of(annexWeather(90))));
    TemperatureEstimate t = at(Double.NaN).estimate(spec, section(spec), A);
    assertFalse(t.isKnown());
    assertTrue(t.detail().contains("flight time is unknown"), t.detail());
    HeatInputs weekTime = new HeatInputs(500, Optional.empty(), 0.1, 20, 3, 2, 1, Double.NaN, 45,
        0.2, 0.2, Optional.of(LocalDate.of(2026, 6, 10)), 43, 0);
    LineSpec spec2 = spec(new SurveyTemperatureSpec(Source.COMPUTED, Double.NaN, Double.NaN,
        Optional.of(weekTime)));
    TemperatureEstimate w = new SurveyTemperatures(new SurveyTemperatures.Clock(false),
        Optional.empty(), "no CRS", Map.of("T1-T2", 3 * 86_400.0 + 50_418))
        .estimate(spec2, section(spec2), A);
    assertTrue(w.detail().contains("2026-06-10T14:00"), w.detail());
  }

  @Test
  void eachSpanHasItsOwnFlightTimeAndTheSectionTheLengthWeightedMean() {
    // Two spans of one section, 300 m and 100 m, the first flown at 02:00 UTC (night at
    // longitude 0), the second at 14:00 (sun): the spans differ by the solar heating; the
    // section's state
    // is sum(L_i T_i) / sum(L_i) [computed: the uniform temperature with the same thermal
    // elongation alpha sum(L_i dT_i)], its sigma the length-weighted mean of the spans'.
    LineSpec spec = spec(new SurveyTemperatureSpec(Source.COMPUTED, Double.NaN, Double.NaN,
        Optional.of(annexWeather(90))));
    Structure a = new Structure("T1", "", 0, StructureType.DEAD_END, 0, 0, 10, Map.of(), "t", 1);
    Structure b = new Structure("T2", "", 1, StructureType.SUSPENSION, 0, 300, 10, Map.of(), "t",
        2);
    Structure c = new Structure("T3", "", 2, StructureType.DEAD_END, 0, 400, 10, Map.of(), "t",
        3);
    LineLayout line = SpanLayout.build(List.of(a, b, c), List.of(spec)).lines().get(0);
    TensionSection section = line.sections().get(0);
    assertEquals(2, section.spans().size());
    SurveyTemperatures st = new SurveyTemperatures(new SurveyTemperatures.Clock(true),
        Optional.empty(), "no CRS", Map.of("T1-T2", GPS_14H - 43_200, "T2-T3", GPS_14H));
    TemperatureEstimate first = st.estimate(spec, section.spans().get(0), A);
    TemperatureEstimate second = st.estimate(spec, section.spans().get(1), A);
    assertTrue(first.detail().contains("2026-06-10T02:00"), first.detail());
    assertTrue(second.detail().contains("2026-06-10T14:00"), second.detail());
    assertTrue(second.temperatureC() - first.temperatureC() > 1, first + " " + second);
    TemperatureEstimate whole = st.estimate(spec, section, A);
    assertEquals((300 * first.temperatureC() + 100 * second.temperatureC()) / 400,
        whole.temperatureC(), 1e-9);
    assertEquals((300 * first.sigmaC() + 100 * second.sigmaC()) / 400, whole.sigmaC(), 1e-9);
    assertTrue(whole.detail().startsWith("length-weighted mean of 2 of 2 spans' IEEE 738"),
        whole.detail());
    // A span without a GPS time is left out of the mean; none at all leaves the section unknown.
    SurveyTemperatures half = new SurveyTemperatures(new SurveyTemperatures.Clock(true),
        Optional.empty(), "no CRS", Map.of("T2-T3", GPS_14H));
    assertEquals(second.temperatureC(), half.estimate(spec, section, A).temperatureC(), 1e-9);
    assertFalse(at(Double.NaN).estimate(spec, section, A).isKnown());
  }

  @Test
  void theCigreModelIsUsedWhenTheSpecificationAsksForIt() {
    // The same flight with model cigre601: the span's temperature is CIGRE TB 601's balance with
    // the sun by the brochure's declination (23.3 deg) and the specification's albedo and
    // clearness [computed by CigreHeatBalance, checked against TB 601 Annex E elsewhere].
    HeatInputs in = annexWeather(90).withModel(SurveyTemperatureSpec.HeatModel.CIGRE_601, 0.2,
        1.0, 0.0044);
    LineSpec spec = spec(new SurveyTemperatureSpec(Source.COMPUTED, Double.NaN, Double.NaN,
        Optional.of(in)));
    TemperatureEstimate t = at(GPS_14H).estimate(spec, section(spec), A);
    SolarPosition sun = SolarPosition.at(Instant.parse("2026-06-10T14:00:00Z"), 43, 0,
        SolarPosition.CIGRE_601_DECLINATION_DEG);
    double direct = new CigreHeatBalance(DRAKE.diameter(), 0.0044, DRAKE.thermal().orElseThrow(),
        new CigreHeatBalance.Conditions(1000, 40, 0.61, Math.PI / 2, 0, 0, sun, 0, 0.2, 1.0))
        .conductorTemperature();
    assertEquals(direct, t.temperatureC(), 1e-6);
    assertTrue(t.detail().startsWith("CIGRE TB 601 heat balance"), t.detail());
    TemperatureEstimate ieee = at(GPS_14H).estimate(spec(new SurveyTemperatureSpec(
        Source.COMPUTED, Double.NaN, Double.NaN, Optional.of(annexWeather(90)))), section(spec),
        A);
    assertTrue(Math.abs(ieee.temperatureC() - t.temperatureC()) < 5,
        ieee.temperatureC() + " vs " + t.temperatureC());
  }
}
