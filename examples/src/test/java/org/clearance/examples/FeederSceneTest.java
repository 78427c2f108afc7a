package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.clearance.InputException;
import org.clearance.line.ConductorLibrary;
import org.clearance.line.ConductorPosition;
import org.clearance.line.LineSpec;
import org.clearance.line.LineSpecReader;
import org.clearance.line.Structure;
import org.clearance.line.StructureReader;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.Survey;
import org.clearance.survey.UnitsChoice;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/** The demo distribution feeder: the scenario's ranges, its points against its truth, files. */
class FeederSceneTest {

  @TempDir Path dir;

  @ParameterizedTest
  @EnumSource(Framing.class)
  void scenarioStaysInTheIssueRanges(Framing framing) {
    // issue 15: poles 10-14 m, spans 25-200 m, conductors 0.3-2.5 m apart, neutral below
    for (long seed = 1; seed <= 5; seed++) {
      FeederScene s = FeederScene.create(FeederOptions.defaults().withSeed(seed)
          .withSpanCount(20).withFraming(framing));
      for (FeederPole p : s.poles()) {
        assertTrue(p.heightM() >= 10 && p.heightM() <= 14, p.toString());
        assertTrue(2 * p.radiusM() >= 0.25 && 2 * p.radiusM() <= 0.45, p.toString());
      }
      for (FeederScene.Span sp : s.spans()) {
        assertTrue(sp.lengthM() >= 25 && sp.lengthM() <= 200, sp.id());
      }
      List<FeederScene.Position> pos = s.positions();
      assertEquals(4, pos.size());
      for (int i = 0; i < pos.size(); i++) {
        double nearest = Double.POSITIVE_INFINITY;
        for (int j = 0; j < pos.size(); j++) {
          if (j != i) {
            nearest = Math.min(nearest, Math.hypot(pos.get(i).offsetM() - pos.get(j).offsetM(),
                pos.get(i).belowTopM() - pos.get(j).belowTopM()));
          }
        }
        assertTrue(nearest >= 0.3 && nearest <= 2.5, framing + " " + i + ": " + nearest);
        if (!pos.get(i).neutral()) {
          assertTrue(pos.get(3).belowTopM() >= pos.get(i).belowTopM() + 1.0);
        }
      }
    }
  }

  @Test
  void wirePointsLieOnTheirCurves() {
    FeederScene s = FeederScene.create(FeederOptions.defaults().withSpanCount(4));
    double[] worst = new double[1];
    long[] wires = new long[2];
    s.points((chunk, ids) -> {
      for (int i = 0; i < chunk.size(); i++) {
        if (TruthId.kind(ids[i]) != TruthId.Kind.WIRE) {
          continue;
        }
        FeederScene.Span sp = s.spans().get(TruthId.wireSpan(ids[i]));
        int k = TruthId.wireIndex(ids[i]);
        var curve = k == FeederScene.SERVICE_WIRE ? sp.service().orElseThrow()
            : sp.wires().get(k).curve();
        worst[0] = Math.max(worst[0], CurveDistance.distance(curve, chunk.x()[i], chunk.y()[i],
            chunk.z()[i]));
        wires[k == FeederScene.SERVICE_WIRE ? 1 : 0]++;
        assertEquals(14, chunk.classification()[i]);
      }
    });
    assertTrue(wires[0] > 500 && wires[1] > 20, wires[0] + " " + wires[1]);
    // noise at most 0.04 m per axis: 3D distance beyond 6 sigma would be a placement error
    assertTrue(worst[0] < 0.3, "worst " + worst[0]);
  }

  @Test
  void filesReadBackInUsSurveyFeet() {
    FeederOptions o = FeederOptions.defaults().withSpanCount(3).withUnit(
        LinearUnit.US_SURVEY_FOOT);
    FeederScene s = FeederScene.create(o);
    DemoCorridor.DemoFiles f = FeederFiles.write(dir, o);
    Survey survey = Survey.open(List.of(f.survey()), UnitsChoice.fromFile());
    assertEquals(LinearUnit.US_SURVEY_FOOT, survey.units().horizontal());
    List<Structure> poles = StructureReader.read(f.structures(), survey.units());
    assertEquals(s.poles().size(), poles.size());
    // structures are read into metres: 1 ftUS = 1200/3937 m (exact by definition)
    assertEquals(s.poles().get(1).x(), poles.get(1).x(), 0.002);
    LineSpec spec = LineSpecReader.read(f.lineSpec(), ConductorLibrary.builtin());
    assertEquals(ConductorPosition.Role.NEUTRAL, spec.conductors().get(3).role());
    assertEquals(f.pointCount(), survey.pointCount());
  }

  @Test
  void badOptionsNameTheOption() {
    InputException e = assertThrows(InputException.class,
        () -> FeederOptions.defaults().withSpanCount(1));
    assertTrue(e.getMessage().contains("spanCount"), e.getMessage());
    e = assertThrows(InputException.class,
        () -> FeederOptions.defaults().withUnit(LinearUnit.FOOT));
    assertTrue(e.getMessage().contains("unit"), e.getMessage());
  }
}
