package org.clearance.examples;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.clearance.line.SpanFrame;
import org.clearance.wire.Catenary;
import org.clearance.wire.ConductorCurve;

/**
 * Builds the demo line on the terrain: structures with heights, tension sections with tensions at
 * the survey temperature, and every conductor of every span as an exact catenary through its
 * attachment points (c = H / w, docs/methods.md section 2.5), with its sampling plan.
 */
final class LineBuilder {
  /** Temperature at which section tensions are chosen, degC. */
  static final double REFERENCE_TEMPERATURE_C = 15.0;
  /** Phase horizontal tension at the reference temperature, fraction of rated strength. */
  static final double MIN_TENSION_FRACTION = 0.18;
  static final double MAX_TENSION_FRACTION = 0.25;
  /** Shield sag over phase sag at the reference temperature (common practice, no source). */
  static final double MIN_SHIELD_SAG_RATIO = 0.8;
  static final double MAX_SHIELD_SAG_RATIO = 0.9;
  /** Lowest phase height over ground wanted at the survey state, m (common practice, no source). */
  static final double MIN_GROUND_CLEARANCE_M = 9.0;
  /** Body extension step and cap, m. */
  static final double EXTENSION_STEP_M = 3.0;
  static final double MAX_EXTENSION_M = 15.0;
  /** Passes of the raise-the-towers loop: each pass raises at most one step. */
  private static final int HEIGHT_PASSES = 6;
  /** Station step of the ground clearance check, m. */
  private static final double CLEARANCE_STEP_M = 2.0;
  /** Share of (span, conductor) pairs sampled with a long gap, coverage below 30 %. */
  static final double LOW_COVERAGE_SHARE = 0.08;
  static final double MIN_LOW_COVERAGE = 0.08;
  static final double MAX_LOW_COVERAGE = 0.28;

  private final SplittableRandom rng;
  private final RoutePlan route;
  private final Terrain terrain;
  private final List<DemoPosition> positions;
  private final double densityScale;

  /** The built line. */
  record Layout(List<DemoStructure> structures, List<TensionSection> sections,
      List<DemoSpan> spans, double surveyTemperatureC) {}

  LineBuilder(SplittableRandom rng, RoutePlan route, Terrain terrain,
      List<DemoPosition> positions, double densityScale) {
    this.rng = rng;
    this.route = route;
    this.terrain = terrain;
    this.positions = positions;
    this.densityScale = densityScale;
  }

  Layout build(String lineId) {
    int n = route.spanCount();
    double surveyT = Math.round(2 * rng.nextDouble(24, 32)) / 2.0;
    double[] extension = new double[n + 1];
    for (int i = 0; i <= n; i++) {
      extension[i] = rng.nextDouble() < 0.3 ? EXTENSION_STEP_M : 0;
    }
    List<TensionSection> sections = sections(surveyT);
    List<DemoStructure> structures = structures(extension);
    for (int pass = 0; pass < HEIGHT_PASSES; pass++) {
      boolean raised = false;
      for (int i = 0; i < n; i++) {
        if (lowestClearance(structures, sections, i) < MIN_GROUND_CLEARANCE_M) {
          for (int k = i; k <= i + 1; k++) {
            if (extension[k] < MAX_EXTENSION_M) {
              extension[k] += EXTENSION_STEP_M;
              raised = true;
            }
          }
        }
      }
      if (!raised) {
        break;
      }
      structures = structures(extension);
    }
    List<DemoSpan> spans = new ArrayList<>();
    int pairs = n * positions.size();
    boolean[] lowCoverage = new boolean[pairs];
    int wanted = Math.max(2, (int) Math.round(LOW_COVERAGE_SHARE * pairs));
    for (int k = 0; k < wanted; k++) {
      lowCoverage[rng.nextInt(pairs)] = true;
    }
    for (int i = 0; i < n; i++) {
      List<DemoWire> wires = new ArrayList<>();
      for (int p = 0; p < positions.size(); p++) {
        ConductorCurve curve = curve(structures, sections, i, positions.get(p));
        wires.add(wire(positions.get(p), curve, section(sections, i),
            lowCoverage[i * positions.size() + p]));
      }
      String id = lineId + "/" + structures.get(i).id() + "-" + structures.get(i + 1).id();
      spans.add(new DemoSpan(i, id, i, i + 1, section(sections, i).index(), route.spanLength(i),
          wires));
    }
    return new Layout(structures, sections, spans, surveyT);
  }

  private List<TensionSection> sections(double surveyT) {
    List<TensionSection> out = new ArrayList<>();
    int start = 0;
    for (int i = 1; i <= route.spanCount(); i++) {
      if (!route.deadEnd[i]) {
        continue;
      }
      double[] lengths = new double[i - start];
      for (int k = start; k < i; k++) {
        lengths[k - start] = route.spanLength(k);
      }
      double rs = ChangeOfState.rulingSpan(lengths);
      DemoPosition phase = first(DemoPosition.Role.PHASE);
      DemoPosition shield = first(DemoPosition.Role.SHIELD);
      double hPhase = rng.nextDouble(MIN_TENSION_FRACTION, MAX_TENSION_FRACTION)
          * phase.type().ratedStrength();
      double cPhase = hPhase / phase.type().weightPerLength();
      double ratio = rng.nextDouble(MIN_SHIELD_SAG_RATIO, MAX_SHIELD_SAG_RATIO);
      double hShield = shield.type().weightPerLength() * cPhase / ratio;
      out.add(new TensionSection(out.size(), start, i, rs, REFERENCE_TEMPERATURE_C, hPhase,
          hShield,
          ChangeOfState.tension(phase.type(), rs, hPhase, REFERENCE_TEMPERATURE_C, surveyT),
          ChangeOfState.tension(shield.type(), rs, hShield, REFERENCE_TEMPERATURE_C, surveyT)));
      start = i;
    }
    return out;
  }

  private DemoPosition first(DemoPosition.Role role) {
    return positions.stream().filter(p -> p.role() == role).findFirst().orElseThrow();
  }

  private static TensionSection section(List<TensionSection> sections, int span) {
    for (TensionSection s : sections) {
      if (span >= s.firstStructure() && span < s.lastStructure()) {
        return s;
      }
    }
    throw new IllegalStateException("span " + span + " in no section");
  }

  private List<DemoStructure> structures(double[] extension) {
    List<DemoStructure> out = new ArrayList<>();
    for (int i = 0; i <= route.spanCount(); i++) {
      double[] a = route.along(i);
      out.add(new DemoStructure(String.format(Locale.ROOT, "T%03d", 101 + i), i + 1, route.x[i],
          route.y[i], terrain.z(route.x[i], route.y[i]),
          route.deadEnd[i] ? DemoStructure.Type.DEAD_END : DemoStructure.Type.SUSPENSION,
          route.deflection(i), a[0], a[1], DemoPosition.ARM_HEIGHT_M + extension[i],
          extension[i]));
    }
    return out;
  }

  private ConductorCurve curve(List<DemoStructure> structures, List<TensionSection> sections,
      int span, DemoPosition p) {
    double ux = route.ux(span);
    double uy = route.uy(span);
    double[] a = TowerGeometry.attachment(structures.get(span), p, TowerGeometry.Side.AHEAD, ux,
        uy);
    double[] b = TowerGeometry.attachment(structures.get(span + 1), p, TowerGeometry.Side.BACK,
        ux, uy);
    SpanFrame plan = SpanFrame.between(a[0], a[1], b[0], b[1]);
    double c = section(sections, span).tension(p.role()) / p.type().weightPerLength();
    return new ConductorCurve(plan, Catenary.through(0, a[2], plan.length(), b[2], c));
  }

  private double lowestClearance(List<DemoStructure> structures, List<TensionSection> sections,
      int span) {
    double lowest = Double.POSITIVE_INFINITY;
    for (DemoPosition p : positions) {
      if (p.role() != DemoPosition.Role.PHASE) {
        continue;
      }
      ConductorCurve c = curve(structures, sections, span, p);
      for (double s = 0; s <= c.length(); s += CLEARANCE_STEP_M) {
        lowest = Math.min(lowest, c.z(s) - terrain.z(c.x(s), c.y(s)));
      }
    }
    return lowest;
  }

  private DemoWire wire(DemoPosition p, ConductorCurve curve, TensionSection section,
      boolean lowCoverage) {
    double len = curve.length();
    List<WireGap> gaps = new ArrayList<>();
    if (lowCoverage) {
      double keep = rng.nextDouble(MIN_LOW_COVERAGE, MAX_LOW_COVERAGE) * len;
      double start = rng.nextDouble(0, len - keep);
      if (start > 0) {
        gaps.add(new WireGap(0, start));
      }
      gaps.add(new WireGap(start + keep, len));
    } else {
      double u = rng.nextDouble();
      int count = u < 0.35 ? 0 : u < 0.7 ? 1 : u < 0.9 ? 2 : 3;
      double[][] raw = new double[count][];
      for (int k = 0; k < count; k++) {
        double g = rng.nextDouble(2, 30);
        double s = rng.nextDouble(0, len - g);
        raw[k] = new double[] {s, s + g};
      }
      Arrays.sort(raw, (x, y) -> Double.compare(x[0], y[0]));
      for (double[] g : raw) {
        WireGap last = gaps.isEmpty() ? null : gaps.get(gaps.size() - 1);
        if (last != null && g[0] <= last.endStation()) {
          gaps.set(gaps.size() - 1, new WireGap(last.startStation(),
              Math.max(last.endStation(), g[1])));
        } else {
          gaps.add(new WireGap(g[0], g[1]));
        }
      }
    }
    double perMetre = (p.role() == DemoPosition.Role.PHASE ? rng.nextDouble(1, 4)
        : rng.nextDouble(1, 2.5)) * densityScale;
    double sigma = rng.nextDouble(0.02, 0.05);
    return new DemoWire(p.name(), p.role(), p.type().code(), curve, section.tension(p.role()),
        p.type().weightPerLength(), perMetre, sigma, gaps);
  }
}
