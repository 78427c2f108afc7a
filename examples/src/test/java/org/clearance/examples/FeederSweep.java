package org.clearance.examples;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.clearance.survey.LinearUnit;
import org.clearance.wire.SpanWires;
import org.clearance.wire.WireResult;

/**
 * The sweep behind the figures of docs/wire-finder.md, "Distribution feeder" and "Crossing
 * wires" (issue 15): the wire finder on demo feeders of several seeds, compared with the truth
 * as {@link FeederAccuracyTest} does. Not a test; run with the examples' test class path:
 * {@code FeederSweep FRAMING SPANS m|ft MODE[,MODE...] SEED...}. Prints one line per run
 * (conductors with at least 30 % coverage, matched, fitted, sags within 5 cm, worst sag error,
 * misses), one {@code crossing} line per span with a crossing found or a true service line, and
 * the totals.
 */
public final class FeederSweep {
  private FeederSweep() {}

  public static void main(String[] a) throws Exception {
    Framing framing = Framing.valueOf(a[0]);
    int spans = Integer.parseInt(a[1]);
    LinearUnit unit = a[2].equals("ft") ? LinearUnit.US_SURVEY_FOOT : LinearUnit.METRE;
    String[] modes = a[3].split(",");
    int eligible = 0;
    int matched = 0;
    int fitted = 0;
    int sagWithin = 0;
    for (int k = 4; k < a.length; k++) {
      long seed = Long.parseLong(a[k]);
      for (String mode : modes) {
        FeederOptions o = FeederOptions.defaults().withSeed(seed).withSpanCount(spans)
            .withFraming(framing).withMode(ClassificationMode.valueOf(mode)).withUnit(unit);
        Path dir = Files.createTempDirectory("feeder-sweep");
        FeederScene scene = FeederScene.create(o);
        WireResult r = unit != LinearUnit.METRE ? FeederAccuracyTest.findInFiles(o, dir)
            : FeederAccuracyTest.find(scene, dir);
        FeederAccuracyTest.Figures f = FeederAccuracyTest.compare(scene, r);
        for (int q = 0; q < r.spans().size(); q++) {
          SpanWires sw = r.spans().get(q);
          boolean service = scene.spans().get(q).service().isPresent();
          if (!sw.crossings().isEmpty() || service) {
            System.out.println("crossing " + sw.span().id() + " truth " + (service
                ? "service line" : "none") + " found " + sw.crossings());
          }
        }
        eligible += f.eligible();
        matched += f.matched();
        fitted += f.fitted();
        sagWithin += f.sagWithin();
        System.out.printf(Locale.ROOT, "seed %d %s %s %s: %d eligible %d matched %d fitted"
            + " %d sag ok worst %.3f misses %s%n", seed, framing, mode, unit.symbol(),
            f.eligible(), f.matched(), f.fitted(), f.sagWithin(), f.worstSag(), f.misses());
      }
    }
    System.out.printf(Locale.ROOT, "TOTAL %d eligible %d matched %d fitted %d sag ok%n",
        eligible, matched, fitted, sagWithin);
  }
}
