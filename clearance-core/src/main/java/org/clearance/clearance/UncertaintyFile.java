package org.clearance.clearance;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.clearance.InputException;

/**
 * {@code uncertainty.csv} in a run folder: per span, conductor and condition, each input's
 * standard uncertainty of the conductor position at {@link UncertaintyPropagation#STATIONS}
 * evenly spaced stations ({@link StateUncertainty}), and the survey point accuracy used; the rule
 * evaluation reads it to give every stored distance its uncertainty (docs/run-folder.md).
 *
 * <p>Comment lines {@code # horizontal_rmse_m,<m>} and {@code # vertical_rmse_m,<m>} give the
 * point accuracy; then a header {@code span_id,conductor,condition,input,length_m,swings,s0_m,...}
 * and one row per input. Numbers use {@code Locale.ROOT}.
 */
public final class UncertaintyFile {

  /** File name inside a run folder. */
  public static final String FILE_NAME = "uncertainty.csv";
  private static final String H = "horizontal_rmse_m";
  private static final String V = "vertical_rmse_m";
  private static final int FIXED = 6;

  private final Map<String, StateUncertainty> states;
  private final UncertaintyOptions options;

  private UncertaintyFile(Map<String, StateUncertainty> states, UncertaintyOptions options) {
    this.states = Map.copyOf(states);
    this.options = options;
  }

  /** The survey point accuracy the run used. */
  public UncertaintyOptions options() {
    return options;
  }

  /** The uncertainty of a conductor's state in a condition, if stored. */
  public Optional<StateUncertainty> state(String spanId, String conductor, String condition) {
    return Optional.ofNullable(states.get(key(spanId, conductor, condition)));
  }

  private static String key(String span, String conductor, String condition) {
    return span + "\u0000" + conductor + "\u0000" + condition;
  }

  /**
   * Writes the file.
   *
   * @param file target path
   * @param spans the measured spans with their conductor models
   * @param conditions the run's conditions
   * @param options the point accuracy
   */
  public static void write(Path file, List<SpanModel> spans, ConditionSet conditions,
      UncertaintyOptions options) throws IOException {
    try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
      w.write("# Clearance: standard uncertainty of each conductor's position (m) per input, at "
          + UncertaintyPropagation.STATIONS + " stations evenly spaced from attachment A to B\n");
      w.write(String.format(Locale.ROOT, "# %s,%s%n# %s,%s%n", H,
          Double.toString(options.horizontalRmseM()), V, Double.toString(options.verticalRmseM())));
      StringBuilder head = new StringBuilder("span_id,conductor,condition,input,length_m,swings");
      for (int j = 0; j < UncertaintyPropagation.STATIONS; j++) {
        head.append(",s").append(j).append("_m");
      }
      w.write(head.append('\n').toString());
      for (SpanModel span : spans) {
        for (ConductorModel c : span.conductors()) {
          for (int k = 0; k < conditions.size(); k++) {
            Optional<StateUncertainty> u = c.uncertainty(k);
            if (u.isEmpty()) {
              continue;
            }
            StateUncertainty s = u.get();
            for (int i = 0; i < s.inputs().size(); i++) {
              StringBuilder row = new StringBuilder();
              row.append(span.span().id()).append(',').append(c.name()).append(',')
                  .append(conditions.names().get(k)).append(',').append(s.inputs().get(i))
                  .append(',').append(Double.toString(s.length())).append(',')
                  .append(s.swings());
              for (double v : s.sigmas().get(i)) {
                row.append(',').append(String.format(Locale.ROOT, "%.5f", v));
              }
              w.write(row.append('\n').toString());
            }
          }
        }
      }
    }
  }

  /**
   * Reads the file of a run folder.
   *
   * @return the stored uncertainties, or empty when the run has no such file (an older run)
   * @throws InputException naming the line for a damaged file
   */
  public static Optional<UncertaintyFile> read(Path file) throws IOException {
    if (!Files.isRegularFile(file)) {
      return Optional.empty();
    }
    double h = Double.NaN;
    double v = Double.NaN;
    Map<String, List<String>> names = new HashMap<>();
    Map<String, List<double[]>> values = new HashMap<>();
    Map<String, double[]> lengthSwing = new HashMap<>();
    List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
    boolean header = false;
    for (int n = 0; n < lines.size(); n++) {
      String line = lines.get(n);
      String where = "line " + (n + 1);
      try {
        if (line.startsWith("# " + H + ",")) {
          h = Double.parseDouble(line.substring(H.length() + 3));
        } else if (line.startsWith("# " + V + ",")) {
          v = Double.parseDouble(line.substring(V.length() + 3));
        } else if (line.startsWith("#") || line.isBlank()) {
          continue;
        } else if (!header) {
          header = true;
        } else {
          String[] f = line.split(",", -1);
          if (f.length != FIXED + UncertaintyPropagation.STATIONS) {
            throw new InputException(file, where, null, "expected "
                + (FIXED + UncertaintyPropagation.STATIONS) + " fields, found " + f.length);
          }
          String k = key(f[0], f[1], f[2]);
          double[] p = new double[UncertaintyPropagation.STATIONS];
          for (int j = 0; j < p.length; j++) {
            p[j] = Double.parseDouble(f[FIXED + j]);
          }
          names.computeIfAbsent(k, x -> new ArrayList<>()).add(f[3]);
          values.computeIfAbsent(k, x -> new ArrayList<>()).add(p);
          lengthSwing.put(k, new double[] {Double.parseDouble(f[4]),
              Boolean.parseBoolean(f[5]) ? 1 : 0});
        }
      } catch (NumberFormatException e) {
        throw new InputException(file, where, null, "not a number: " + e.getMessage());
      }
    }
    if (!(h >= 0 && v >= 0)) {
      throw new InputException(file, null, H, "the point accuracy lines are missing");
    }
    Map<String, StateUncertainty> states = new HashMap<>();
    for (Map.Entry<String, List<String>> e : names.entrySet()) {
      double[] ls = lengthSwing.get(e.getKey());
      states.put(e.getKey(), new StateUncertainty(ls[0], e.getValue(), values.get(e.getKey()),
          ls[1] > 0));
    }
    UncertaintyOptions d = UncertaintyOptions.DEFAULT;
    return Optional.of(new UncertaintyFile(states, new UncertaintyOptions(h, v,
        d.modulusRelative(), d.expansionRelative(), d.massRelative())));
  }
}
