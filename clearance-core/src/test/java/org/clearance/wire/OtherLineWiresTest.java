package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.clearance.line.ConductorPosition;
import org.clearance.line.SpanFrame;
import org.junit.jupiter.api.Test;

/**
 * Two lines in one run (issue 15, the demo's feeder under the transmission line): an extra of one
 * line's span that is a conductor of another line's span is recognised, and only then. Curves
 * computed here (exact catenaries), no outside reference needed: the rule is geometric.
 */
class OtherLineWiresTest {

  private static ConductorCurve curve(double offsetM, double dz, double length) {
    SpanFrame plan = SpanFrame.between(0, offsetM, length, offsetM);
    return new ConductorCurve(plan, Catenary.through(0, 20 + dz, length, 18 + dz, 1500));
  }

  private static FittedConductor conductor(String name, Optional<String> position,
      Optional<ConductorCurve> curve, Optional<WireExtent> points) {
    return new FittedConductor(name, ConductorPosition.Role.PHASE, position, curve,
        Optional.empty(), WireQuality.none(), 0, curve.isPresent() ? WireStatus.FITTED
        : WireStatus.NOT_ASSESSED, curve.isPresent() ? Optional.empty()
        : Optional.of("too few points"), Optional.empty(), points);
  }

  @Test
  void curvesOfOneWireAreOneWireAndNeighboursAreNot() {
    ConductorCurve a = curve(0, 0, 300);
    // the same wire fitted over a part of the span by the other line's finder
    assertTrue(OtherLineWires.sameWire(curve(0, 0.05, 300), a));
    // a distribution phase 0.35 m beside it, the closest spacing of the feeder framings
    assertFalse(OtherLineWires.sameWire(curve(0.35, 0, 300), a));
    // a conductor 1 m below
    assertFalse(OtherLineWires.sameWire(curve(0, -1, 300), a));
  }

  @Test
  void anExtraWithoutCurveIsMatchedByItsPoints() {
    ConductorCurve a = curve(0, 0, 300);
    WireExtent on = new WireExtent(10, 0, a.z(10), 40, 0, a.z(40), 40, 0, a.z(40));
    WireExtent off = new WireExtent(10, 1, a.z(10), 40, 1, a.z(40), 40, 1, a.z(40));
    FittedConductor other = conductor("SW2", Optional.of("SW2"), Optional.of(a),
        Optional.empty());
    assertTrue(OtherLineWires.sameWire(conductor("extra1", Optional.empty(), Optional.empty(),
        Optional.of(on)), other));
    assertFalse(OtherLineWires.sameWire(conductor("extra1", Optional.empty(), Optional.empty(),
        Optional.of(off)), other));
    // neither fitted: the same points
    FittedConductor unfitted = conductor("SW2", Optional.of("SW2"), Optional.empty(),
        Optional.of(on));
    assertTrue(OtherLineWires.sameWire(conductor("extra1", Optional.empty(), Optional.empty(),
        Optional.of(on)), unfitted));
  }

  @Test
  void aSingleLineRunKeepsItsExtras() {
    List<SpanWires> spans = List.of();
    assertEquals(spans, OtherLineWires.withoutOtherLinesWires(spans));
  }
}
