package org.clearance.examples;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.clearance.CheckInputs;
import org.clearance.CheckOptions;
import org.clearance.ClearanceCheck;
import org.clearance.clearance.ConditionMinimum;
import org.clearance.clearance.SpanStatus;
import org.clearance.run.ConductorRecord;
import org.clearance.run.RunModel;
import org.clearance.run.RunModelJson;
import org.clearance.run.SpanRecord;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.UnitsChoice;

/**
 * The sweep behind the figures of docs/wire-finder.md, "Points set aside" (issue 9, wires found
 * but not fitted): the whole check on demo feeders of several seeds, one framing and unit, in the
 * classification modes given. Not a test; run with the examples' test class path:
 * {@code UnfittedWireSweep FRAMING SPANS m|ft MODE[,MODE...] SEED...}. Prints per span compared
 * (true vegetation within 10 m of a fitted phase conductor) its status, the conductors not
 * fitted with their reason, the truth's and the check's minimum, the truth kind of the point
 * that sets it, and the points set aside as wire; then per run the span minima set by the line's
 * own wire and those above the truth by more than 5 cm.
 */
public final class UnfittedWireSweep {
  private UnfittedWireSweep() {}

  public static void main(String[] a) throws Exception {
    Framing framing = Framing.valueOf(a[0]);
    int spans = Integer.parseInt(a[1]);
    LinearUnit unit = a[2].equals("ft") ? LinearUnit.US_SURVEY_FOOT : LinearUnit.METRE;
    for (int k = 4; k < a.length; k++) {
      long seed = Long.parseLong(a[k]);
      for (String mode : a[3].split(",")) {
        FeederOptions o = FeederOptions.defaults().withSeed(seed).withSpanCount(spans)
            .withFraming(framing).withMode(ClassificationMode.valueOf(mode)).withUnit(unit);
        run(o, String.format(Locale.ROOT, "seed %d %s %s %s", seed, framing, mode,
            unit.symbol()));
      }
    }
  }

  private static void run(FeederOptions o, String tag) throws Exception {
    Path dir = Files.createTempDirectory("unfitted-sweep");
    FeederScene scene = FeederScene.create(o);
    Map<Long, Integer> idAt = new HashMap<>();
    scene.points((chunk, ids) -> {
      for (int i = 0; i < chunk.size(); i++) {
        if (TruthId.kind(ids[i]) != TruthId.Kind.GROUND) {
          idAt.put(key(chunk.x()[i], chunk.y()[i], chunk.z()[i]), ids[i]);
        }
      }
    });
    DemoCorridor.DemoFiles files = FeederFiles.write(dir.resolve("in"), o);
    Path out = dir.resolve("run");
    new ClearanceCheck(CheckOptions.defaults(2), new PrintWriter(new StringWriter())).run(
        new CheckInputs(List.of(files.survey()), UnitsChoice.fromFile(), files.structures(),
            List.of(files.lineSpec()), Optional.empty(), Optional.empty(), out), "sweep");
    RunModel model = RunModelJson.read(out.resolve(RunModel.FILE_NAME));
    double[] truth = FeederClearanceTest.truthMinima(scene, model, "phase");
    int onOwnWire = 0;
    int above = 0;
    int compared = 0;
    for (int i = 0; i < truth.length; i++) {
      SpanRecord span = model.spans().get(i);
      if (span.status() == SpanStatus.NOT_ASSESSED || !(truth[i] < 10)) {
        continue;
      }
      compared++;
      ConditionMinimum m = span.minima().get(0);
      Integer id = idAt(idAt, m.x(), m.y(), m.z());
      String what = id == null ? "ground" : TruthId.kind(id) + (TruthId.kind(id)
          == TruthId.Kind.WIRE ? " " + scene.spans().get(TruthId.wireSpan(id)).id() + "/"
          + TruthId.wireIndex(id) : "");
      StringBuilder unfitted = new StringBuilder(" [" + span.reason() + "]");
      for (ConductorRecord c : span.conductors()) {
        if (!c.fitted() || !c.reason().isEmpty()) {
          unfitted.append(' ').append(c.name()).append('(').append(c.role()).append(", ")
              .append(c.points()).append(" pts, ").append(c.coveragePct()).append(" %: ")
              .append(c.reason()).append(')');
        }
      }
      boolean own = id != null && TruthId.kind(id) == TruthId.Kind.WIRE;
      boolean high = m.distance() > truth[i] + FeederClearanceTest.TOL_M;
      onOwnWire += own ? 1 : 0;
      above += high ? 1 : 0;
      FeederScene.Span ts = scene.spans().get(i);
      FeederPole a = scene.poles().get(ts.from());
      FeederPole b = scene.poles().get(ts.to());
      org.clearance.line.SpanFrame f = org.clearance.line.SpanFrame.between(a.x(), a.y(), b.x(),
          b.y());
      System.out.printf(Locale.ROOT, "%s %s %s: truth %.3f m, check %.3f m at (%.2f %.2f %.2f)"
          + " on %s (station %.1f m, offset %.1f m, %.1f m above ground); set aside %s;"
          + " not fitted:%s%s%n", tag, span.id(), span.status(), truth[i],
          m.distance(), m.x(), m.y(), m.z(), what, f.station(m.x(), m.y()),
          f.offset(m.x(), m.y()), m.z() - scene.groundZ(m.x(), m.y()), span.setAside(), unfitted,
          own ? " OWN WIRE" : high ? " ABOVE" : "");
    }
    System.out.printf(Locale.ROOT, "%s: compared %d, set by own wire %d, above the truth %d%n",
        tag, compared, onOwnWire, above);
  }

  private static Integer idAt(Map<Long, Integer> idAt, double x, double y, double z) {
    long kx = Math.round(x * 1000);
    long ky = Math.round(y * 1000);
    long kz = Math.round(z * 1000);
    for (long p = -1; p <= 1; p++) {
      for (long q = -1; q <= 1; q++) {
        for (long r = -1; r <= 1; r++) {
          Integer id = idAt.get(packed(kx + p, ky + q, kz + r));
          if (id != null) {
            return id;
          }
        }
      }
    }
    return null;
  }

  private static long key(double x, double y, double z) {
    return packed(Math.round(x * 1000), Math.round(y * 1000), Math.round(z * 1000));
  }

  private static long packed(long mx, long my, long mz) {
    return mx * 1_000_003L * 1_000_003L + my * 1_000_003L + mz;
  }
}
