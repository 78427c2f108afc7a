package org.clearance.line;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.clearance.InputException;
import org.clearance.io.Decimal;
import org.clearance.io.TextFiles;

/**
 * Line current against time, from a CSV file with the columns {@code time_utc} (ISO-8601 instant
 * such as {@code 2026-07-14T10:32:00Z}) and {@code current_a} (A, per phase conductor), in time
 * order; linear between records (docs/line-inputs.md).
 *
 * @param file the file, for messages
 * @param times record times, seconds since 1970-01-01T00:00:00Z, strictly increasing
 * @param currents current at each time, A (&gt;= 0)
 */
public record CurrentSeries(String file, long[] times, double[] currents) {

  /** Largest current accepted, A: the heaviest conductors carry a few kA; above is a unit slip. */
  static final double MAX_CURRENT_A = 20_000;

  public CurrentSeries {
    times = times.clone();
    currents = currents.clone();
  }

  /**
   * Reads the file.
   *
   * @throws InputException naming the file, line and column of any problem
   */
  public static CurrentSeries read(Path path) {
    String file = path.toString();
    CsvTable t;
    try {
      t = CsvTable.read(new BufferedReader(new StringReader(TextFiles.read(path, TextFiles.MAX_TABLE_BYTES,
          "a table of time and current (CSV text)"))), file);
    } catch (IOException e) {
      throw new AssertionError("reading a string cannot fail", e);
    }
    int tc = t.column("time_utc");
    int ic = t.column("current_a");
    for (String h : t.header()) {
      if (!h.equals("time_utc") && !h.equals("current_a")) {
        throw new InputException(file, "line " + t.headerLine(), h,
            "unknown column; the columns are time_utc, current_a");
      }
    }
    if (tc < 0 || ic < 0) {
      throw new InputException(file, "line " + t.headerLine(), tc < 0 ? "time_utc" : "current_a",
          "required column missing from the header");
    }
    List<long[]> ts = new ArrayList<>();
    List<Double> cs = new ArrayList<>();
    long last = Long.MIN_VALUE;
    for (CsvTable.Row row : t.rows()) {
      long time;
      try {
        time = Instant.parse(row.fields().get(tc)).getEpochSecond();
      } catch (DateTimeParseException e) {
        throw new InputException(file, row.where(), "time_utc", "'" + row.fields().get(tc)
            + "' is not an ISO-8601 UTC time such as 2026-07-14T10:32:00Z");
      }
      if (time <= last) {
        throw new InputException(file, row.where(), "time_utc",
            "times must increase from record to record");
      }
      last = time;
      String text = row.fields().get(ic);
      String problem = Decimal.problem(text, "A");
      if (problem != null) {
        throw new InputException(file, row.where(), "current_a", problem);
      }
      double a = Double.parseDouble(text);
      if (!(a >= 0 && a <= MAX_CURRENT_A)) {
        throw new InputException(file, row.where(), "current_a", String.format(Locale.ROOT,
            "must be between 0 and %.0f A: %s", MAX_CURRENT_A, text));
      }
      ts.add(new long[] {time});
      cs.add(a);
    }
    if (ts.isEmpty()) {
      throw new InputException(file, null, null, "no current records in the file");
    }
    long[] times = new long[ts.size()];
    double[] currents = new double[ts.size()];
    for (int i = 0; i < times.length; i++) {
      times[i] = ts.get(i)[0];
      currents[i] = cs.get(i);
    }
    return new CurrentSeries(file, times, currents);
  }

  /**
   * The current at an instant, A: linear between the records around it; a single record holds for
   * any time within {@code toleranceS} of it.
   *
   * @param instant the moment
   * @param toleranceS how far before the first or after the last record the end value still holds,
   *     s (&gt;= 0)
   * @throws IllegalArgumentException when the instant is outside the records (plus tolerance)
   */
  public double at(Instant instant, long toleranceS) {
    double t = instant.getEpochSecond() + instant.getNano() * 1e-9;
    int n = times.length;
    if (t < times[0] - toleranceS || t > times[n - 1] + toleranceS) {
      throw new IllegalArgumentException("the current file " + file + " covers "
          + Instant.ofEpochSecond(times[0]) + " to " + Instant.ofEpochSecond(times[n - 1])
          + ", not the flight time " + instant);
    }
    if (t <= times[0]) {
      return currents[0];
    }
    if (t >= times[n - 1]) {
      return currents[n - 1];
    }
    int i = 1;
    while (times[i] < t) {
      i++;
    }
    double f = (t - times[i - 1]) / (times[i] - times[i - 1]);
    return currents[i - 1] + f * (currents[i] - currents[i - 1]);
  }
}
