package org.clearance.examples;

import java.util.HashMap;
import java.util.Map;
import org.clearance.survey.PointChunk;

/**
 * Scenes shared by the tests of this package (built once per test JVM): the default demo, and a
 * small, sparse one for tests that generate several times.
 */
final class Scenes {
  private static DemoScene defaultScene;
  private static Census defaultCensus;
  private static final Map<DemoOptions, DemoScene> SMALL = new HashMap<>();

  private Scenes() {}

  /** Options of the small scene: 4 spans, 1 pulse/m^2. */
  static DemoOptions small(long seed) {
    return DemoOptions.defaults().withSeed(seed).withSpanCount(4).withPointDensity(1.0);
  }

  static synchronized DemoScene defaults() {
    if (defaultScene == null) {
      defaultScene = DemoScene.create(DemoOptions.defaults());
    }
    return defaultScene;
  }

  static synchronized DemoScene of(DemoOptions options) {
    return SMALL.computeIfAbsent(options, DemoScene::create);
  }

  /** Per-object statistics of the default scene's points (one generation pass). */
  static synchronized Census defaultCensus() {
    if (defaultCensus == null) {
      Census c = new Census(defaults());
      defaults().points(c);
      defaultCensus = c;
    }
    return defaultCensus;
  }

  /** Statistics gathered in one pass over a scene's points. */
  static final class Census implements PointSink {
    final DemoScene scene;
    final long[] byKind = new long[TruthId.Kind.values().length];
    /** Per wire (span * 16 + index): count, sum of squared distance, max distance. */
    final Map<Integer, double[]> wires = new HashMap<>();
    /** Per wire: 5 m station bins that hold points. */
    final Map<Integer, boolean[]> bins = new HashMap<>();
    /** Per wire: points whose station lies more than 0.3 m inside a gap. */
    long pointsInGaps;
    /** Least distance from a TREE point to any conductor of its span and neighbours, m. */
    double closestTreePoint = Double.POSITIVE_INFINITY;
    long total;

    Census(DemoScene scene) {
      this.scene = scene;
    }

    @Override
    public void accept(PointChunk chunk, int[] ids) {
      for (int i = 0; i < chunk.size(); i++) {
        TruthId.Kind kind = TruthId.kind(ids[i]);
        byKind[kind.ordinal()]++;
        if (kind == TruthId.Kind.WIRE) {
          wire(ids[i], chunk.x()[i], chunk.y()[i], chunk.z()[i]);
        } else if (kind == TruthId.Kind.TREE) {
          tree(ids[i], chunk.x()[i], chunk.y()[i], chunk.z()[i]);
        }
      }
      total += chunk.size();
    }

    private void wire(int id, double x, double y, double z) {
      DemoWire w = scene.spans().get(TruthId.wireSpan(id)).wires().get(TruthId.wireIndex(id));
      double d = CurveDistance.distance(w.curve(), x, y, z);
      double[] s = wires.computeIfAbsent(TruthId.index(id), k -> new double[3]);
      s[0]++;
      s[1] += d * d;
      s[2] = Math.max(s[2], d);
      double st = w.curve().plan().station(x, y);
      boolean[] b = bins.computeIfAbsent(TruthId.index(id),
          k -> new boolean[(int) Math.ceil(w.length() / 5) + 1]);
      b[Math.max(0, Math.min(b.length - 1, (int) (st / 5)))] = true;
      for (WireGap g : w.gaps()) {
        if (st > g.startStation() + 0.3 && st < g.endStation() - 0.3) {
          pointsInGaps++;
        }
      }
    }

    private void tree(int id, double x, double y, double z) {
      DemoTree t = scene.trees().get(TruthId.index(id));
      if (t.apexDistanceM() > 10) {
        return; // only trees near the wires can hold the closest point
      }
      for (int i = Math.max(0, t.span() - 1);
          i <= Math.min(scene.spans().size() - 1, t.span() + 1); i++) {
        for (DemoWire w : scene.spans().get(i).wires()) {
          closestTreePoint = Math.min(closestTreePoint,
              CurveDistance.distance(w.curve(), x, y, z));
        }
      }
    }
  }
}
