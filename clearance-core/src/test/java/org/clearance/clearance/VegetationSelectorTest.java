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
    // Issue 9: a survey with vegetation labels is read as partly labelled: its labels are used
    // and its class 0/1 is inferred, a class-2 point high above the ground too.
    assertEquals(VegetationSelector.Mode.MIXED, s.mode());
    assertTrue(s.inferred());
    assertTrue(s.candidateClass(5) && s.candidateClass(1) && s.candidateClass(0));
    assertFalse(s.inferredClass(5));
    assertTrue(s.inferredClass(1) && s.inferredClass(2));
    assertTrue(s.groundLabelDoubted(2.5));
    assertFalse(s.groundLabelDoubted(1.9));
    assertTrue(s.describe().startsWith("classes 3, 4, 5 as labelled where consistent; classes"
        + " 0/1 inferred"), s.describe());
  }

  @Test
  void classesTheUserNamesAreReadAsTheyAre() {
    long[] counts = new long[256];
    counts[1] = 100;
    counts[5] = 10;
    VegetationSelector s = VegetationSelector.forSurvey(counts, java.util.Set.of(3, 4, 5));
    assertEquals(VegetationSelector.Mode.LABELLED, s.mode());
    assertFalse(s.inferred());
    assertFalse(s.candidateClass(1) || s.candidateClass(2) || s.inferredClass(1));
    assertFalse(s.groundLabelDoubted(10));
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
