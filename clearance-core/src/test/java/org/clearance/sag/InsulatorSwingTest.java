package org.clearance.sag;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.clearance.line.SpanFrame;
import org.clearance.wire.ConductorCurve;
import org.junit.jupiter.api.Test;

class InsulatorSwingTest {

  private static final double W = SagFixtures.drake().weightPerLength();
  private static final ConductorCurve SPAN = SagFixtures.span(300, 100, 130, 28000 / W);

  private static ConditionState swungState(double angleDeg) {
    return ConditionSolver.solve(SPAN, null, SectionSurvey.unknown(),
        SagFixtures.swing("swing", Math.toRadians(angleDeg)));
  }

  // Simple form of methods.md 3.6: tan phi_i = wind x wind span / (weight x weight span); equal
  // spans give the conductor's own angle, a wind span twice the weight span doubles tan phi.
  @Test
  void stringAngle() {
    ConductorLoading loading = new ConductorLoading(15.965, 8.076);
    assertEquals(loading.swingAngle(), InsulatorSwing.angle(loading, 300, 300), 1e-15);
    assertEquals(Math.atan(2 * 8.076 / 15.965), InsulatorSwing.angle(loading, 400, 200), 1e-15);
  }

  // check-values.md section 2, swing geometry [computed]: 5 m swung 30 deg -> 2.5000 m across,
  // 0.6699 m up; here a 5 m string with equal spans at a 30 deg conductor swing.
  @Test
  void displacedAttachments() {
    SuspensionString string = SuspensionString.between(5.0, 280, 320);
    ConditionState left = InsulatorSwing.displaced(swungState(30), string, string,
        ConditionState.SwingSide.LEFT);
    SpanFrame old = SPAN.plan();
    ConductorCurve moved = left.curve();
    assertEquals(0.0, old.station(moved.x(0), moved.y(0)), 1e-9);
    assertEquals(2.5000, old.offset(moved.x(0), moved.y(0)), 0.00005);
    assertEquals(2.5000, old.offset(moved.x(moved.length()), moved.y(moved.length())), 0.00005);
    assertEquals(SPAN.zA() + 0.6699, moved.zA(), 0.00005);
    assertEquals(SPAN.zB() + 0.6699, moved.zB(), 0.00005);
    assertEquals(SPAN.curve().c(), moved.curve().c(), 0.0);
    assertEquals(ConditionState.SwingSide.LEFT, left.swingSide());

    ConditionState right = InsulatorSwing.displaced(swungState(30), string, string,
        ConditionState.SwingSide.RIGHT);
    assertEquals(-2.5000, old.offset(right.curve().x(0), right.curve().y(0)), 0.00005);
  }

  // A fixed attachment (null string) stays where it is.
  @Test
  void fixedAttachmentStays() {
    SuspensionString string = new SuspensionString(3.0, 300, 300);
    ConductorCurve moved = InsulatorSwing.displaced(swungState(40), string, null,
        ConditionState.SwingSide.LEFT).curve();
    assertEquals(SPAN.x(SPAN.length()), moved.x(moved.length()), 1e-9);
    assertEquals(SPAN.y(SPAN.length()), moved.y(moved.length()), 1e-9);
    assertEquals(SPAN.zB(), moved.zB(), 1e-9);
    assertEquals(3.0 * Math.sin(Math.toRadians(40)),
        SPAN.plan().offset(moved.x(0), moved.y(0)), 1e-9);
  }

  @Test
  void rejectsBothSidesAndBadSpans() {
    SuspensionString string = new SuspensionString(3.0, 300, 300);
    assertThrows(IllegalArgumentException.class, () -> InsulatorSwing.displaced(swungState(30),
        string, string, ConditionState.SwingSide.BOTH));
    assertThrows(IllegalArgumentException.class, () -> new SuspensionString(0, 300, 300));
    assertThrows(IllegalArgumentException.class,
        () -> InsulatorSwing.angle(new ConductorLoading(1, 1), 0, 300));
  }
}
