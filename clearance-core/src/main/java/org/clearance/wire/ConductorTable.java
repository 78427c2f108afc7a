package org.clearance.wire;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.clearance.io.AtomicFiles;
import org.clearance.io.CsvCells;
import org.clearance.survey.SurveyUnits;

/**
 * The conductors file: one row per conductor per span (docs/wire-finder.md). Distances are in
 * metres; coordinates are in the survey CRS's own units (metres divided by the survey's linear
 * unit). A value not computed is an empty field. Numbers use {@link Locale#ROOT}; a text field
 * holding a comma, quote or line break is quoted (RFC 4180), one that a spreadsheet would run as a
 * formula is neutralised ({@link CsvCells}).
 */
public final class ConductorTable {

  /** File name in a run folder. */
  public static final String FILE_NAME = "conductors.csv";

  /**
   * The columns, in order, for a survey whose coordinates are in metres: coordinate columns end
   * in the survey's unit symbol ({@code attach_a_x_m}, {@code _ft}, {@code _ftUS}; {@link
   * #columns}).
   */
  public static final List<String> COLUMNS = columns(SurveyUnits.metres("columns"));

  private ConductorTable() {}

  /** The columns, in order, with the survey's own units in the coordinate columns' names. */
  public static List<String> columns(SurveyUnits units) {
    String h = units.horizontal().symbol();
    String v = units.vertical().symbol();
    List<String> c = new ArrayList<>(List.of("span_id", "from_structure", "to_structure",
        "conductor", "n_points", "coverage_pct", "rms_m", "max_gap_m"));
    for (String end : List.of("attach_a", "attach_b")) {
      c.addAll(List.of(end + "_x_" + h, end + "_y_" + h, end + "_z_" + v));
    }
    c.addAll(List.of("catenary_c_m", "sag_mid_m", "status", "reason"));
    for (String at : List.of("low", "first_point", "last_point")) {
      c.addAll(List.of(at + "_x_" + h, at + "_y_" + h, at + "_z_" + v));
    }
    return List.copyOf(c);
  }

  /** The whole file as text: the header row, then one row per conductor, spans in order. */
  public static String csv(WireResult result, SurveyUnits units) {
    List<String> columns = columns(units);
    StringBuilder b = new StringBuilder(String.join(",", columns)).append('\n');
    double h = units.horizontal().metres();
    double v = units.vertical().metres();
    for (SpanWires sw : result.spans()) {
      for (FittedConductor c : sw.conductors()) {
        WireQuality q = c.quality();
        String[] row = new String[columns.size()];
        java.util.Arrays.fill(row, "");
        row[0] = text(sw.span().id());
        row[1] = text(sw.span().from().id());
        row[2] = text(sw.span().to().id());
        row[3] = text(c.name());
        row[4] = Integer.toString(q.points());
        row[5] = num(q.coveragePct(), 1);
        row[6] = num(q.rmsM(), 3);
        row[7] = num(q.maxGapM(), 2);
        c.curve().ifPresent(cc -> {
          double len = cc.length();
          row[8] = num(cc.x(0) / h, 3);
          row[9] = num(cc.y(0) / h, 3);
          row[10] = num(cc.zA() / v, 3);
          row[11] = num(cc.x(len) / h, 3);
          row[12] = num(cc.y(len) / h, 3);
          row[13] = num(cc.zB() / v, 3);
          row[14] = num(cc.curve().c(), 1);
          row[15] = num(cc.midSpanSag(), 3);
          double low = Math.min(Math.max(cc.curve().s0(), 0), len);
          point(row, 18, cc.x(low), cc.y(low), cc.z(low), h, v);
        });
        row[16] = c.status().label();
        row[17] = text(c.reason().orElse(""));
        c.points().ifPresent(p -> {
          if (c.curve().isEmpty()) {
            point(row, 18, p.lowX(), p.lowY(), p.lowZ(), h, v);
          }
          point(row, 21, p.firstX(), p.firstY(), p.firstZ(), h, v);
          point(row, 24, p.lastX(), p.lastY(), p.lastZ(), h, v);
        });
        b.append(String.join(",", row)).append('\n');
      }
    }
    return b.toString();
  }

  /** Fills three coordinate columns from metres, in the survey's units. */
  private static void point(String[] row, int at, double x, double y, double z, double h,
      double v) {
    row[at] = num(x / h, 3);
    row[at + 1] = num(y / h, 3);
    row[at + 2] = num(z / v, 3);
  }

  /**
   * Writes the file: to a temporary file in the same folder, then moved into place, so a
   * failure never leaves a partial file under the final name.
   *
   * @throws UncheckedIOException when the file cannot be written
   */
  public static void write(Path file, WireResult result, SurveyUnits units) {
    try {
      AtomicFiles.writeString(file, csv(result, units));
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /** A number with fixed decimals, or an empty field when not finite. */
  static String num(double value, int decimals) {
    if (!Double.isFinite(value)) {
      return "";
    }
    String s = String.format(Locale.ROOT, "%." + decimals + "f", value);
    return s.startsWith("-") && s.matches("-0\\.?0*") ? s.substring(1) : s;
  }

  /** A text field: quoted when it must be, neutralised against formula injection. */
  static String text(String s) {
    return CsvCells.text(s);
  }
}
