package org.clearance.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The vegetation classes chosen for a survey (ASPRS LAS 1.4 R15 Table 17: 3, 4, 5). */
class VegetationSelectorTest {

  @Test
  void aSurveyWithVegetationClassesUsesThemAndSaysSoInWords() {
    long[] counts = new long[256];
    counts[2] = 100;
    counts[5] = 10;
    VegetationSelector s = VegetationSelector.forSurvey(counts, null);
    assertFalse(s.inferred());
    assertEquals("classes 3, 4, 5", s.describe());
  }

  @Test
  void aGroundOnlySurveyInfersVegetation() {
    long[] counts = new long[256];
    counts[1] = 100;
    counts[2] = 100;
    assertTrue(VegetationSelector.forSurvey(counts, null).inferred());
  }
}
