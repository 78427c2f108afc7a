package org.clearance.ground;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class OptionsTest {

  @Test
  void smrfDefaultsAreTheDocumentedOnes() {
    // methods.md 4.3 (documented defaults of a common SMRF implementation) [seen there]:
    // cell 1.0 m, slope 0.15, elevation threshold 0.5 m, scalar 1.25, max window 18 m.
    SmrfOptions o = SmrfOptions.defaults();
    assertEquals(1.0, o.cellSize(), 0);
    assertEquals(0.15, o.slope(), 0);
    assertEquals(0.5, o.elevationThreshold(), 0);
    assertEquals(1.25, o.elevationScalar(), 0);
    assertEquals(18.0, o.maxWindow(), 0);
    assertEquals(18, o.maxRadiusCells());
    assertEquals(180, new SmrfOptions(0.1, 0.15, 0.5, 1.25, 18).maxRadiusCells());
  }

  @ParameterizedTest
  @CsvSource({
    "0, 0.15, 0.5, 1.25, 18",
    "NaN, 0.15, 0.5, 1.25, 18",
    "1, 0, 0.5, 1.25, 18",
    "1, 0.15, -0.1, 1.25, 18",
    "1, 0.15, 0.5, Infinity, 18",
    "1, 0.15, 0.5, 1.25, 0.5"
  })
  void smrfRejectsOutOfRange(double cell, double slope, double eta, double kappa, double w) {
    assertThrows(IllegalArgumentException.class, () -> new SmrfOptions(cell, slope, eta, kappa, w));
  }

  @Test
  void groundOptionsValidate() {
    GroundOptions d = GroundOptions.defaults();
    assertThrows(IllegalArgumentException.class,
        () -> new GroundOptions(d.source(), d.smrf(), 10, 5, 0.01));
    assertThrows(IllegalArgumentException.class,
        () -> new GroundOptions(d.source(), d.smrf(), 256, -1, 0.01));
    assertThrows(IllegalArgumentException.class,
        () -> new GroundOptions(d.source(), d.smrf(), 256, 5, 0));
    assertThrows(NullPointerException.class,
        () -> new GroundOptions(null, d.smrf(), 256, 5, 0.01));
    // Overlap: twice the 18-cell opening radius plus one (computed).
    assertEquals(37, d.overlapCells());
  }

  @ParameterizedTest
  @CsvSource({
    // height m, window radius m = 0.5 (2.51 + 0.009 h^2) (Popescu & Wynne 2004 regression as
    // quoted in methods.md 5.1; values computed)
    "2, 1.273",
    "10, 1.705",
    "20, 3.055",
    "30, 5.305",
    "60, 17.455"
  })
  void popescuWynneWindow(double h, double radius) {
    assertEquals(radius, TreeOptions.windowRadius(h), 1e-9);
  }

  @Test
  void treeOptionsValidate() {
    assertThrows(IllegalArgumentException.class, () -> new TreeOptions(0.05, 2, 60, 128, 1));
    assertThrows(IllegalArgumentException.class, () -> new TreeOptions(0.5, 0, 60, 128, 1));
    assertThrows(IllegalArgumentException.class, () -> new TreeOptions(0.5, 2, 2, 128, 1));
    assertThrows(IllegalArgumentException.class, () -> new TreeOptions(0.5, 2, 60, 10, 1));
    assertThrows(IllegalArgumentException.class, () -> new TreeOptions(0.5, 2, 60, 128, 0));
    // 17.455 m / 0.5 m rounded up (computed).
    assertEquals(35, TreeOptions.defaults().maxWindowCells());
  }
}
