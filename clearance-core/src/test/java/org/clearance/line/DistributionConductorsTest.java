package org.clearance.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The built-in distribution sizes (span-specs/conductors/distribution.csv): the sizes of the
 * trade, each consistent with its stranding, and loaded with the transmission sizes.
 */
class DistributionConductorsTest {

  private static final ConductorLibrary LIB = ConductorLibrary.builtin();
  /** Aluminium and steel densities, kg/m^3 (from memory, as acsr.csv's header). */
  private static final double AL_DENSITY = 2703;
  private static final double STEEL_DENSITY = 7780;

  @ParameterizedTest(name = "{0}")
  @CsvSource({
      // ASTM B232 ACSR 6/1 sizes [from memory]: code, strands, diameter mm, area mm^2, mass
      // kg/m, rated strength kN
      "Turkey,  7, 5.04, 15.52, 0.0536, 5.30",
      "Swan,    7, 6.36, 24.71, 0.0853, 8.30",
      "Sparrow, 7, 8.01, 39.22, 0.1356, 12.70",
      "Raven,   7, 10.11, 62.45, 0.2163, 19.50",
      "Quail,   7, 11.35, 78.64, 0.2724, 23.60",
      "Pigeon,  7, 12.75, 99.23, 0.3436, 29.40",
      "Penguin, 7, 14.31, 125.10, 0.4332, 37.10",
      // ASTM B231 AAC sizes [from memory]
      "Rose,    7, 5.89, 21.15, 0.0580, 3.91",
      "Iris,    7, 7.42, 33.63, 0.0925, 6.01",
      "Poppy,   7, 9.36, 53.49, 0.1470, 9.10",
      "Aster,   7, 10.51, 67.43, 0.1850, 11.10",
      "Oxlip,   7, 13.26, 107.22, 0.2950, 17.00",
      "Tulip,  19, 16.91, 170.50, 0.4700, 26.70",
      "Cosmos, 19, 20.14, 241.70, 0.6660, 35.60"})
  void sizesAreThoseOfTheTradeAndFitTheirStranding(String code, int strands, double dMm,
      double aMm2, double massKgM, double rbsKn) {
    ConductorType t = LIB.find(code).orElseThrow();
    assertEquals(dMm * 1e-3, t.diameter(), 0.005e-3);
    assertEquals(aMm2 * 1e-6, t.area(), 0.005e-6);
    assertEquals(massKgM, t.massPerLength(), 0.00005);
    assertEquals(rbsKn * 1e3, t.ratedStrength(), 5);
    assertTrue(t.source().contains("from memory"), t.source());
    // [computed] round strands: 7 strands -> D = 3 d, 19 strands -> D = 5 d; area n pi/4 d^2
    // within 0.2 % of the tabled area.
    double d = dMm / (strands == 7 ? 3 : 5);
    assertEquals(aMm2, strands * Math.PI / 4 * d * d, 0.002 * aMm2, code);
    // [computed] mass from the areas and densities falls short of the tabled mass by the
    // stranding lay increment, 0.5-3 % (from memory).
    double steel = t.hasCore() ? t.coreArea() * 1e6 : 0;
    double bare = (AL_DENSITY * (aMm2 - steel) + STEEL_DENSITY * steel) * 1e-6;
    double increment = massKgM / bare - 1;
    assertTrue(increment > 0.005 && increment < 0.03, code + " lay increment " + increment);
    // ACSR 6/1: one steel strand of the same diameter, pi/4 (D/3)^2 [computed].
    if (t.hasCore()) {
      assertEquals(Math.PI / 4 * d * d, steel, 0.006, code);
    }
  }

  @ParameterizedTest(name = "{0}")
  @CsvSource({"Poppy-TW, Poppy"})
  void coveredConductorCarriesItsCoverButNotMoreLoad(String covered, String bare) {
    ConductorType c = LIB.find(covered).orElseThrow();
    ConductorType b = LIB.find(bare).orElseThrow();
    // [computed] 3.81 mm XLPE (930 kg/m^3, from memory) over the bare conductor.
    assertEquals(b.diameter() + 2 * 3.81e-3, c.diameter(), 0.01e-3);
    double cover = Math.PI / 4 * (c.diameter() * c.diameter() - b.diameter() * b.diameter());
    assertEquals(b.massPerLength() + 930 * cover, c.massPerLength(), 0.0005);
    assertEquals(b.ratedStrength(), c.ratedStrength(), 1e-9);
    assertFalse(c.hasCore());
  }
}
