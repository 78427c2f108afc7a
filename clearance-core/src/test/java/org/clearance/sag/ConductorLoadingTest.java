package org.clearance.sag;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.clearance.line.ConductorType;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ConductorLoadingTest {

  private static final double G = ConductorType.STANDARD_GRAVITY;

  // check-values.md section 2, blowout [computed]: D = 28.14 mm, w = 15.965 N/m.
  @ParameterizedTest
  @CsvSource({
      "190.0, 5.347, 18.52",
      "287.0, 8.076, 26.83",
      "430.9, 12.126, 37.22"})
  void blowoutTable(double pressurePa, double windNm, double angleDeg) {
    double wind = ConductorLoading.windLoad(pressurePa, 0.02814, 0.0);
    ConductorLoading loading = new ConductorLoading(15.965, wind);
    assertEquals(windNm, wind, 0.0005);
    assertEquals(angleDeg, Math.toDegrees(loading.swingAngle()), 0.005);
  }

  // Chakrabarti et al., Textbook on Power System Engineering, Ex. 5.6 (inputs [published],
  // outputs [computed] in check-values.md section 2): d = 0.889 cm, 0.428 kg/m, ice 1 cm at
  // 913.5 kg/m^3, wind 39 kg/m^2 on the iced diameter. Loads in kgf/m = N/m divided by g.
  @Test
  void textbookIceAndWind() {
    double ice = ConductorLoading.iceWeight(913.5, 0.01, 0.00889) / G;
    double wind = ConductorLoading.windLoad(39 * G, 0.00889, 0.01) / G;
    ConductorLoading loading = new ConductorLoading(0.428 + ice, wind);
    assertEquals(0.5421, ice, 0.00005);
    assertEquals(1.1267, wind, 0.00005);
    assertEquals(1.4868, loading.resultant(), 0.00005);
    assertEquals(49.27, Math.toDegrees(loading.swingAngle()), 0.005);
  }

  // Same example, sags with T = 1973 / 2 kgf on S = 200 m: bare 2.169 m, iced 4.917 m, slant
  // (resultant) 7.536 m. The book uses the parabola wS^2/8T; the catenary sag is larger by about
  // D S^2 / (48 c^2) (series of cosh), 0.0004 / 0.004 / 0.014 m here, hence 0.02 m.
  @Test
  void textbookSags() {
    double tension = 1973.0 / 2;
    double ice = ConductorLoading.iceWeight(913.5, 0.01, 0.00889) / G;
    double wind = ConductorLoading.windLoad(39 * G, 0.00889, 0.01) / G;
    double resultant = new ConductorLoading(0.428 + ice, wind).resultant();
    assertEquals(2.169, new TensionState(tension, 0, 0.428).levelSag(200), 0.02);
    assertEquals(4.917, new TensionState(tension, 0, 0.428 + ice).levelSag(200), 0.02);
    assertEquals(7.536, new TensionState(tension, 0, resultant).levelSag(200), 0.02);
  }

  // Loading of a condition: vertical = bare + rho g pi t (D + t), transverse = q (D + 2t)
  // (methods.md 3.6, 3.7). Hand computation: Drake 1.628 kg/m -> 15.96523 N/m; 12.7 mm glaze
  // ice: 913 * 9.80665 * pi * 0.0127 * 0.04084 = 14.5892 N/m; 287 Pa on 53.54 mm = 15.3660 N/m.
  @Test
  void conditionLoading() {
    ConductorLoading loading =
        ConductorLoading.of(SagFixtures.drake(), SagFixtures.wind("blowout", 15, 287, 0.0127));
    assertEquals(15.96523 + 14.5892, loading.vertical(), 0.0005);
    assertEquals(15.3660, loading.transverse(), 0.0005);
    ConductorLoading iceOnly =
        ConductorLoading.of(SagFixtures.drake(), SagFixtures.ice("ice", -5, 0.0127));
    assertEquals(0.0, iceOnly.transverse(), 0.0);
    assertEquals(15.96523 + 14.5892, iceOnly.vertical(), 0.0005);
  }

  // Check-values.md section 2, swing geometry [computed]: sag 5 m swung 30 deg about the chord ->
  // horizontal displacement 2.5000 m, vertical rise 0.6699 m.
  @Test
  void swingGeometry() {
    SwingOffset offset = SwingOffset.of(5.0, Math.toRadians(30));
    assertEquals(2.5000, offset.horizontal(), 0.00005);
    assertEquals(0.6699, offset.rise(), 0.00005);
  }

  @Test
  void rejectsBadInput() {
    assertThrows(IllegalArgumentException.class,
        () -> ConductorLoading.iceWeight(913, -0.001, 0.02));
    assertThrows(IllegalArgumentException.class,
        () -> ConductorLoading.windLoad(Double.NaN, 0.02, 0));
    assertThrows(IllegalArgumentException.class, () -> new ConductorLoading(0.0, 1.0));
    assertThrows(IllegalArgumentException.class, () -> SwingOffset.of(1.0, 2.0));
    assertThrows(IllegalArgumentException.class, () -> ConductorLoading.of(SagFixtures.drake(),
        SagFixtures.wind("blowout", 15, Double.NaN, 0.0)));
  }
}
