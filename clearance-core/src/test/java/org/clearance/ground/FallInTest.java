package org.clearance.ground;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class FallInTest {
  // A 20 m tree standing at (100, 200) on ground at 50 m.
  private static final Tree TREE = new Tree(100, 200, 70, 50, 20, 3);

  @ParameterizedTest
  @CsvSource({
    // conductor x, y, z; clearance m; distance from base m; margin m; candidate
    // methods.md 5.2: candidate when distance <= height + clearance (values computed).
    // 3-4-5 triangle scaled: 12 m across, 16 m up -> 20 m: exactly the height.
    "112, 200, 66, 0, 20, 0, true",
    // 15 m across, 20 m up -> 25 m; with 4.3 ft = 1.31 m clearance, still 3.69 m short.
    "100, 215, 70, 1.31, 25, -3.69, false",
    // 5 m across, 12 m up -> 13 m; 2 m clearance: reaches 9 m past.
    "105, 200, 62, 2, 13, 9, true"
  })
  void fallInReach(double cx, double cy, double cz, double clearance, double distance,
      double margin, boolean candidate) {
    double d = FallIn.distanceFromBase(TREE, cx, cy, cz);
    assertEquals(distance, d, 1e-9);
    assertEquals(margin, FallIn.reachMargin(TREE, d, clearance), 1e-9);
    assertEquals(candidate, FallIn.isCandidate(TREE, d, clearance));
  }

  @org.junit.jupiter.api.Test
  void rejectsNegativeOrUnknownDistances() {
    assertThrows(IllegalArgumentException.class, () -> FallIn.isCandidate(TREE, -1, 0));
    assertThrows(IllegalArgumentException.class, () -> FallIn.isCandidate(TREE, Double.NaN, 0));
    assertThrows(IllegalArgumentException.class, () -> FallIn.isCandidate(TREE, 5, -0.1));
    assertTrue(FallIn.isCandidate(TREE, 21.3, 1.31));
    assertFalse(FallIn.isCandidate(TREE, 21.32, 1.31));
  }
}
