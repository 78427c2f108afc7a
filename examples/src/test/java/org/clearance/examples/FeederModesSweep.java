package org.clearance.examples;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.clearance.survey.LinearUnit;

/**
 * The sweep behind the feeder figures of docs/labelling.md ("A crown is not a roof", issue 9):
 * the demo feeder of several seeds checked labelled and in the named classification modes, each
 * run scored as {@link FeederModesTruthTest} scores it (every finding printed: a span minimum
 * above the truth, a labelled zone site without a match, a zone site not on vegetation, a
 * fall-in site not at a tree of its height), and the totals per mode. Not a test; run with the
 * examples' test class path: {@code FeederModesSweep FRAMING SPANS m|ft MODE[,MODE...] SEED...}.
 */
public final class FeederModesSweep {
  private FeederModesSweep() {}

  public static void main(String[] a) throws Exception {
    Framing framing = Framing.valueOf(a[0]);
    int spans = Integer.parseInt(a[1]);
    LinearUnit unit = a[2].equals("ft") ? LinearUnit.US_SURVEY_FOOT : LinearUnit.METRE;
    List<ClassificationMode> modes = new ArrayList<>();
    for (String m : a[3].split(",")) {
      modes.add(ClassificationMode.valueOf(m));
    }
    // per mode (labelled first): the nine figures of a run, summed over the seeds
    long[][] total = new long[modes.size() + 1][9];
    for (int k = 4; k < a.length; k++) {
      FeederOptions o = FeederOptions.defaults().withSeed(Long.parseLong(a[k]))
          .withSpanCount(spans).withFraming(framing).withUnit(unit);
      Path dir = Files.createTempDirectory("feeder-modes-sweep");
      List<String> figures = FeederModesTruthTest.figures(dir, o, modes);
      for (int m = 0; m < figures.size(); m++) {
        int[] v = FeederModesTruthTest.numbers(figures.get(m));
        for (int q = 0; q < 9; q++) {
          total[m][q] += v[v.length - 9 + q];
        }
      }
    }
    for (int m = 0; m < total.length; m++) {
      long[] t = total[m];
      System.out.printf(Locale.ROOT, "TOTAL %s %s %s: zone sites %d, not on vegetation %d;"
          + " labelled zone sites without a match %d (spans left without one %d); fall-in sites"
          + " %d, not at a tree of that height %d; span minima compared %d, above the truth %d,"
          + " set by the line's own wire %d%n", framing, unit.symbol(),
          m == 0 ? "FULL" : modes.get(m - 1), t[0], t[1], t[2], t[3], t[4], t[5], t[6], t[7],
          t[8]);
    }
  }
}
