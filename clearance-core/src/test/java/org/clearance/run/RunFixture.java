package org.clearance.run;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.clearance.clearance.CatenaryDistance;
import org.clearance.clearance.ConditionDistance;
import org.clearance.clearance.ConditionMinimum;
import org.clearance.clearance.ConditionSet;
import org.clearance.clearance.ConductorDistance;
import org.clearance.clearance.ConductorState;
import org.clearance.clearance.NearPointFile;
import org.clearance.clearance.NearPointWriter;
import org.clearance.clearance.PointClearance;
import org.clearance.clearance.SpanContext;
import org.clearance.clearance.SpanStatus;
import org.clearance.line.LineCondition;
import org.clearance.line.SpanFrame;
import org.clearance.survey.SurveyUnits;
import org.clearance.wire.Catenary;
import org.clearance.wire.ConductorCurve;

/**
 * A small hand-made run folder on an invented line (Corvane Ridge Electric's "Kestrel Vale"
 * 115 kV line): structures KV-10 .. KV-13 200 m apart along grid east on flat ground at 100 m,
 * three phases 4 m apart attached at 120 m. Conditions: surveyed (c = 1000 m), hot (c = 700 m),
 * gale (c = 1000 m swinging up to 0.6 rad either way). Distances come from the engine's own
 * point-to-catenary kernel, so the stored file is what a check would write.
 *
 * <p>Span KV-10-11 holds a clump straight under the middle phase at mid-span (inside the PRC
 * 4293 distance when hot), a clump 5 m outside the right phase (watch band) and a tall tree
 * left of the line (fall-in); span KV-11-12 is NOT ASSESSED by the engine (no conductor found);
 * span KV-12-13 has only distant vegetation.
 */
public final class RunFixture {

  static final List<String> CONDITIONS = List.of("survey", "hot-75C", "gale");
  static final List<String> GROUPS = List.of("survey", "hot", "blowout");
  static final double C_SURVEY = 1000;
  static final double C_HOT = 700;
  static final double SWING = 0.6;
  public static final double ATTACH_Z = 120;
  public static final double GROUND = 100;
  public static final double KV = 115;
  public static final double[] PHASE_OFFSETS = {-4, 0, 4};
  public static final List<String> PHASES = List.of("B1", "B2", "B3");

  /** Tree T1: 18 m tall, base at station 150 of KV-10-11, 14 m left. */
  public static final double TREE_STATION = 150;
  public static final double TREE_OFFSET = 14;
  public static final double TREE_HEIGHT = 18;

  final double x0;
  final double y0;
  final SurveyUnits units;
  public final List<SpanRecord> spans = new ArrayList<>();
  public final List<PointClearance> points = new ArrayList<>();
  final List<TreeRecord> trees = new ArrayList<>();

  /** The standard run at an origin (metres) in a CRS. */
  public RunFixture(double x0, double y0, SurveyUnits units) {
    this.x0 = x0;
    this.y0 = y0;
    this.units = units;
    List<PointClearance> a = new ArrayList<>();
    // clump 1: 3 x 3 points, 0.5 m apart, at mid-span under B2; centre 110.5 m, others 110.2 m
    for (int i = -1; i <= 1; i++) {
      for (int j = -1; j <= 1; j++) {
        a.add(measure(0, 100 + 0.5 * i, 0.5 * j, i == 0 && j == 0 ? 110.5 : 110.2, 5));
      }
    }
    // clump 2: 2 x 2 points 0.6 m apart, 10 m right of the centre line at station 60, z 111 m
    for (int i = 0; i <= 1; i++) {
      for (int j = 0; j <= 1; j++) {
        a.add(measure(0, 60 + 0.6 * i, -10 - 0.6 * j, 111, 4));
      }
    }
    // distant low vegetation
    a.add(measure(0, 30, 12, 102, 3));
    a.add(measure(0, 170, -13, 101.5, 3));
    spans.add(span(0, "KV-10", "KV-11", true, a));
    spans.add(span(1, "KV-11", "KV-12", false, List.of()));
    List<PointClearance> c = new ArrayList<>();
    c.add(measure(2, 50, 14, 103, 3));
    c.add(measure(2, 120, -14, 104, 4));
    spans.add(span(2, "KV-12", "KV-13", true, c));
    points.addAll(a);
    points.addAll(c);
    PointClearance base = measure(0, TREE_STATION, TREE_OFFSET, GROUND, 5);
    List<Double> ds = base.distances().stream().map(ConditionDistance::distance).toList();
    trees.add(new TreeRecord("T1", "KV-10-11", x0 + TREE_STATION, y0 + TREE_OFFSET,
        GROUND + TREE_HEIGHT, GROUND, TREE_HEIGHT, 3.0, ds, base.distances().get(0).conductor()));
  }

  /** The standard run with metric units and no CRS. */
  public static RunFixture metric() {
    return new RunFixture(0, 0, SurveyUnits.metres("test"));
  }

  public static String spanId(int k) {
    return "KV-" + (10 + k) + "-" + (11 + k);
  }

  /** Right-of-way half width of the fixture's line, m. */
  public static final double ROW_HALF_WIDTH = 12;

  public RunModel model() {
    return new RunModel("test", units, new ConditionSet(CONDITIONS, GROUPS), 15, "ASPRS 3-5",
        "test ground", spans, trees, facts());
  }

  /** The line as its specification would state it: three phases of circuit 1, two conditions. */
  public static RunFacts facts() {
    List<LineFacts.Position> positions = new ArrayList<>();
    for (String p : PHASES) {
      positions.add(new LineFacts.Position(p, "phase", 1, "Linnet", 1));
    }
    LineFacts line = new LineFacts("KV", "Kestrel Vale 115 kV", KV, 20, ROW_HALF_WIDTH,
        positions, List.of(
            new LineCondition("hot-75C", LineCondition.Kind.TEMPERATURE, 75, 0, 0, 913,
                Double.NaN, Double.NaN, Double.NaN),
            new LineCondition("gale", LineCondition.Kind.SWING, Double.NaN, 0, 0, 913,
                Double.NaN, SWING, Double.NaN)));
    return new RunFacts(List.of(line), List.of(), Optional.of(java.time.LocalDate.of(2026, 5, 4)),
        Optional.of(java.time.LocalDate.of(2026, 5, 5)), "fixture");
  }

  /** Writes model.json and near-points.bin into a folder. */
  public Path write(Path dir) throws IOException {
    RunModelJson.write(model(), dir.resolve(RunModel.FILE_NAME));
    List<String> ids = spans.stream().map(SpanRecord::id).toList();
    try (NearPointWriter w = new NearPointWriter(dir.resolve(NearPointFile.FILE_NAME),
        new NearPointFile(CONDITIONS, GROUPS, ids, PHASES))) {
      w.write(points);
    }
    return dir;
  }

  /**
   * Writes a small pole-points.bin beside: the four structures, three grass points around the
   * first one, keep radius 5 m and height 4 m (labelled survey).
   */
  public Path writePolePoints(Path dir) throws IOException {
    List<org.clearance.clearance.PolePointFile.Pole> poles = new ArrayList<>();
    for (int k = 0; k <= 3; k++) {
      poles.add(new org.clearance.clearance.PolePointFile.Pole("KV", "KV-" + (10 + k),
          x0 + 200 * k, y0, 0));
    }
    try (org.clearance.clearance.PolePointWriter w = new org.clearance.clearance.PolePointWriter(
        dir.resolve(org.clearance.clearance.PolePointFile.FILE_NAME),
        new org.clearance.clearance.PolePointFile(5, 4, Double.NaN, poles))) {
      w.write(List.of(
          new org.clearance.clearance.PolePoint("KV", "KV-10", x0 + 1, y0, GROUND + 0.2, 3, 0.2,
              1),
          new org.clearance.clearance.PolePoint("KV", "KV-10", x0, y0 + 2, GROUND + 1.5, 4, 1.5,
              2),
          new org.clearance.clearance.PolePoint("KV", "KV-10", x0 - 4, y0, GROUND + 0.3, 3, 0.3,
              4)));
    }
    return dir;
  }

  SpanFrame frame(int k) {
    return SpanFrame.between(x0 + 200 * k, y0, x0 + 200 * (k + 1), y0);
  }

  /** The state of phase j of span k in condition c. */
  CurveRecord state(int k, int j, int c) {
    SpanFrame f = frame(k);
    double e = PHASE_OFFSETS[j];
    SpanFrame plan = SpanFrame.between(f.x(0, e), f.y(0, e), f.x(200, e), f.y(200, e));
    double cc = c == 1 ? C_HOT : C_SURVEY;
    ConductorCurve curve = new ConductorCurve(plan, Catenary.through(0, ATTACH_Z, 200, ATTACH_Z,
        cc));
    double swing = c == 2 ? SWING : 0;
    return CurveRecord.of(new ConductorState(curve, -swing, swing));
  }

  /** A vegetation point at (station, offset, z) of span k with its distances. */
  PointClearance measure(int k, double s, double e, double z, int cls) {
    SpanFrame f = frame(k);
    double x = f.x(s, e);
    double y = f.y(s, e);
    List<ConditionDistance> ds = new ArrayList<>();
    for (int c = 0; c < CONDITIONS.size(); c++) {
      ConductorDistance best = null;
      String name = "";
      for (int j = 0; j < PHASES.size(); j++) {
        CurveRecord r = state(k, j, c);
        CatenaryDistance kernel = new CatenaryDistance(r.toState().curve());
        double phi = kernel.closestSwingAngle(x, y, z, r.swingMin(), r.swingMax());
        ConductorDistance cd = kernel.closest(x, y, z, phi);
        if (best == null || cd.distance() < best.distance()) {
          best = cd;
          name = PHASES.get(j);
        }
      }
      ds.add(new ConditionDistance(CONDITIONS.get(c), GROUPS.get(c), best.distance(),
          best.horizontal(), best.vertical(), name, f.station(best.closestX(), best.closestY())));
    }
    return new PointClearance(spanId(k), x, y, z, cls, z - GROUND, ds);
  }

  private SpanRecord span(int k, String from, String to, boolean fitted,
      List<PointClearance> pts) {
    SpanFrame f = frame(k);
    List<ConductorRecord> conductors = new ArrayList<>();
    for (int j = 0; j < PHASES.size(); j++) {
      List<Optional<CurveRecord>> states = new ArrayList<>();
      List<Optional<String>> failures = new ArrayList<>();
      for (int c = 0; c < CONDITIONS.size(); c++) {
        states.add(fitted ? Optional.of(state(k, j, c)) : Optional.empty());
        failures.add(fitted ? Optional.empty() : Optional.of("not fitted"));
      }
      conductors.add(new ConductorRecord(PHASES.get(j), "phase",
          fitted ? "fitted" : "not_assessed", fitted ? "" : "no conductor points found",
          fitted ? 400 : 0, fitted ? 98 : 0, fitted ? 0.03 : Double.NaN,
          fitted ? 4 : Double.NaN, states, failures));
    }
    List<ConditionMinimum> minima = new ArrayList<>();
    for (int c = 0; c < CONDITIONS.size(); c++) {
      PointClearance best = null;
      for (PointClearance p : pts) {
        if (best == null || p.distances().get(c).distance() < best.distances().get(c)
            .distance()) {
          best = p;
        }
      }
      if (best == null) {
        minima.add(new ConditionMinimum(CONDITIONS.get(c), GROUPS.get(c), Double.NaN,
            Double.NaN, Double.NaN, "", Double.NaN, Double.NaN, Double.NaN));
      } else {
        ConditionDistance d = best.distances().get(c);
        minima.add(new ConditionMinimum(d.condition(), d.group(), d.distance(), d.horizontal(),
            d.vertical(), d.conductor(), best.x(), best.y(), best.z()));
      }
    }
    StructureRecord a = new StructureRecord(from, f.x(0, 0), f.y(0, 0), GROUND, "suspension");
    StructureRecord b = new StructureRecord(to, f.x(200, 0), f.y(200, 0), GROUND, "suspension");
    return new SpanRecord(new SpanContext(spanId(k), "KV", KV, 200, 200), "Kestrel Vale 115 kV",
        a, b, fitted ? SpanStatus.ASSESSED : SpanStatus.NOT_ASSESSED,
        fitted ? "" : "no conductor points found in the span", conductors, minima,
        pts.size() + 10L, pts.size(), List.of());
  }
}
