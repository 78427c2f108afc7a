package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.clearance.line.ConductorPosition;
import org.clearance.line.ConductorPosition.Role;
import org.junit.jupiter.api.Test;

/** Matching wires to specification positions by their cross-sections at the structures. */
class PositionMatcherTest {
  private static final double GROUND_A = 100;
  private static final double GROUND_B = 110;

  private static PositionMatcher.Slot slot(String name, Role role, double offset,
      double height) {
    return new PositionMatcher.Slot(new ConductorPosition(name, role, 1,
        role == Role.PHASE ? Fixtures.DRAKE : Fixtures.PARTRIDGE, offset, height, 1, Double.NaN,
        Double.NaN), Double.NaN, Double.NaN);
  }

  /** A wire at offset e hanging h above the ground at both ends, plus a body extension. */
  private static PositionMatcher.Wire wire(double e, double h, double extension,
      Optional<Role> role) {
    return new PositionMatcher.Wire(e, e, GROUND_A + h + extension, GROUND_B + h + extension,
        role, true, true);
  }

  private static final List<PositionMatcher.Slot> DEMO_LIKE = List.of(
      slot("A", Role.PHASE, 8, 21.6), slot("B", Role.PHASE, 0, 21.6),
      slot("C", Role.PHASE, -8, 21.6), slot("SW1", Role.SHIELD, 5.5, 31),
      slot("SW2", Role.SHIELD, -5.5, 31));

  @Test
  void tallerTowersShiftEveryWireAlike() {
    // 9 m body extension at both ends, wires listed in no particular order
    List<PositionMatcher.Wire> w = List.of(wire(-5.4, 31, 9, Optional.empty()),
        wire(8.1, 21.5, 9, Optional.empty()), wire(0.2, 21.7, 9, Optional.empty()),
        wire(5.6, 31.1, 9, Optional.empty()), wire(-7.9, 21.6, 9, Optional.empty()));
    assertArrayEquals(new int[] {4, 0, 1, 3, 2},
        PositionMatcher.match(w, DEMO_LIKE, GROUND_A, GROUND_B));
  }

  @Test
  void missingWireLeavesItsPositionFreeAndAStrangerIsAnExtra() {
    List<PositionMatcher.Wire> w = List.of(wire(8.0, 21.6, 0, Optional.empty()),
        wire(-8.0, 21.6, 0, Optional.empty()), wire(30, 12, 0, Optional.empty()));
    assertArrayEquals(new int[] {0, 2, -1},
        PositionMatcher.match(w, DEMO_LIKE, GROUND_A, GROUND_B));
  }

  @Test
  void withoutGroundTheArrangementStillDecides() {
    // a vertical stack of three phases and an earth wire: only relative heights are known
    List<PositionMatcher.Slot> stack = List.of(slot("P1", Role.PHASE, 4.5, 21.5),
        slot("P2", Role.PHASE, 4.0, 28), slot("P3", Role.PHASE, 3.5, 34.5),
        slot("E", Role.SHIELD, 3.2, 40));
    List<PositionMatcher.Wire> w = List.of(
        new PositionMatcher.Wire(3.3, 3.3, 543.9, 543.9, Optional.empty(), true, true),
        new PositionMatcher.Wire(4.5, 4.5, 525.4, 525.4, Optional.empty(), true, true),
        new PositionMatcher.Wire(3.6, 3.6, 538.4, 538.4, Optional.empty(), true, true),
        new PositionMatcher.Wire(4.1, 4.1, 531.9, 531.9, Optional.empty(), true, true));
    assertArrayEquals(new int[] {3, 0, 2, 1},
        PositionMatcher.match(w, stack, Double.NaN, Double.NaN));
  }

  @Test
  void withoutAnyGeometryShieldsGoToTheHighestWires() {
    // Regression: with neither offset_m nor attach_height_m in the specification, positions
    // were filled left to right only, so an earth wire could take a phase position and a phase
    // a shield's (seen on the open corridor tile, all wires labelled 14).
    double n = Double.NaN;
    List<PositionMatcher.Slot> bare = List.of(slot("A", Role.PHASE, n, n),
        slot("B", Role.PHASE, n, n), slot("C", Role.PHASE, n, n), slot("E", Role.SHIELD, n, n));
    Optional<Role> labelledPhase = Optional.of(Role.PHASE);
    List<PositionMatcher.Wire> w = List.of(wire(-6, 20, 0, labelledPhase),
        wire(0, 20, 0, labelledPhase), wire(6, 20, 0, labelledPhase),
        wire(-7, 30, 0, labelledPhase));
    int[] got = PositionMatcher.match(w, bare, GROUND_A, GROUND_B);
    assertEquals(3, got[3], "the highest wire takes the shield position");
    for (int i = 0; i < 3; i++) {
      assertTrue(got[i] >= 0 && got[i] < 3, "phases take phase positions: " + got[i]);
    }
  }

  @Test
  void labelsAreAHintNotARule() {
    // an earth wire the vendor labelled 14 still takes the shield position it hangs at
    List<PositionMatcher.Wire> w = List.of(wire(5.5, 31, 0, Optional.of(Role.PHASE)));
    assertArrayEquals(new int[] {3}, PositionMatcher.match(w, DEMO_LIKE, GROUND_A, GROUND_B));
  }

  @Test
  void aShortPieceAtOneEndIsMatchedThereOnly() {
    // only near structure B: its extrapolated value at A (50 m too high) must not count
    PositionMatcher.Wire piece = new PositionMatcher.Wire(20, 0.1, GROUND_A + 71.6,
        GROUND_B + 21.6, Optional.empty(), false, true);
    assertArrayEquals(new int[] {1},
        PositionMatcher.match(List.of(piece), DEMO_LIKE, GROUND_A, GROUND_B));
  }

  @Test
  void structureCentreAFewMetresOffShiftsEveryOffsetAlike() {
    // the structures file puts both towers 2.5 m to the right of their centres: every wire
    // appears 2.5 m further left (A at 10.5 would cost (2.5 / 1)^2 = 6.25 without the shift)
    List<PositionMatcher.Wire> w = List.of(wire(10.5, 21.6, 0, Optional.empty()),
        wire(2.5, 21.6, 0, Optional.empty()), wire(-5.5, 21.6, 0, Optional.empty()),
        wire(8.0, 31, 0, Optional.empty()), wire(-3.0, 31, 0, Optional.empty()));
    assertArrayEquals(new int[] {0, 1, 2, 3, 4},
        PositionMatcher.match(w, DEMO_LIKE, GROUND_A, GROUND_B));
  }
}
