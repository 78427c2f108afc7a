package org.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.clearance.clearance.ConductorModel;
import org.clearance.clearance.ConductorState;
import org.clearance.clearance.SpanContext;
import org.clearance.clearance.SpanModel;
import org.clearance.ground.GroundModel;
import org.clearance.ground.GroundModelBuilder;
import org.clearance.ground.GroundOptions;
import org.clearance.line.Span;
import org.clearance.line.SpanFrame;
import org.clearance.line.Structure;
import org.clearance.line.StructureType;
import org.clearance.survey.PointChunk;
import org.clearance.wire.Catenary;
import org.clearance.wire.ConductorCurve;
import org.junit.jupiter.api.Test;

class SurveyCoverageTest {

  private static final double L = 300;

  /** Flat ground points (class 2) every metre from station 0 to {@code surveyedTo}. */
  private static GroundModel ground(double surveyedTo) {
    GroundModelBuilder b = new GroundModelBuilder(GroundOptions.defaults());
    PointChunk chunk = new PointChunk(100_000);
    chunk.reset(0, 0);
    for (double x = -20; x <= surveyedTo; x += 1) {
      for (double y = -40; y <= 40; y += 1) {
        if (chunk.isFull()) {
          b.accept(chunk);
          chunk.reset(0, 0);
        }
        chunk.add(x, y, 10, 2);
      }
    }
    b.accept(chunk);
    return b.build();
  }

  private static SpanModel span() {
    Structure a = new Structure("T1", "", 0, StructureType.SUSPENSION, 0, 0, 10, Map.of(), "t", 1);
    Structure b = new Structure("T2", "", 0, StructureType.SUSPENSION, L, 0, 10, Map.of(), "t",
        2);
    ConductorCurve c = new ConductorCurve(SpanFrame.between(0, 0, L, 0),
        Catenary.through(0, 30, L, 30, 1500));
    ConductorModel m = new ConductorModel("A", "phase",
        List.of(Optional.of(ConductorState.hanging(c))), List.of(Optional.empty()));
    return new SpanModel(new Span("T1-T2", "L", a, b, SpanFrame.between(0, 0, L, 0), L, 0),
        new SpanContext("T1-T2", "L", 230, 0, L), List.of(m));
  }

  @Test
  void fullySurveyedSpanIsCovered() {
    assertEquals(1.0, SurveyCoverage.share(span(), ground(L + 20)), 0.0);
  }

  @Test
  void spanLeavingTheSurveyIsNotFullyCovered() {
    // Regression: a span whose far part lay outside the survey tile was reported ASSESSED, so
    // it could read clear although that part was never looked at.
    double share = SurveyCoverage.share(span(), ground(200));
    assertTrue(share < SurveyCoverage.MIN_SHARE, "share " + share);
    assertEquals(0.69, share, 0.04); // about 205 of 300 m, with the terrain's edge margin
  }
}
