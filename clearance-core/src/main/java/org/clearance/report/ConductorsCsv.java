package org.clearance.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.clearance.io.AtomicFiles;
import org.clearance.line.Span;
import org.clearance.survey.SurveyUnits;
import org.clearance.wire.ConductorCurve;
import org.clearance.wire.FittedConductor;
import org.clearance.wire.SpanWires;
import org.clearance.wire.WireResult;

/**
 * Writes {@code conductors.csv}: one line per conductor per span as the wire finder left it.
 * Distances in metres; attachment coordinates in the survey CRS's own units. {@code sag_mid_m}
 * is the vertical distance from the chord to the curve at the horizontal mid-point of the span.
 * Empty fields are values not computed.
 */
public final class ConductorsCsv {

  /** File name in a run folder. */
  public static final String FILE_NAME = "conductors.csv";

  /** The header, exactly as issue 3 fixes it. */
  public static final List<String> HEADER = List.of("span_id", "from_structure", "to_structure",
      "conductor", "n_points", "coverage_pct", "rms_m", "max_gap_m", "attach_a_x", "attach_a_y",
      "attach_a_z", "attach_b_x", "attach_b_y", "attach_b_z", "catenary_c_m", "sag_mid_m",
      "status", "reason");

  private ConductorsCsv() {}

  /** The table's text. */
  public static String text(WireResult wires, SurveyUnits units) {
    StringBuilder sb = new StringBuilder(String.join(",", HEADER)).append('\n');
    for (SpanWires sw : wires.spans()) {
      Span span = sw.span();
      for (FittedConductor c : sw.conductors()) {
        sb.append(CsvOutputs.quote(span.id())).append(',').append(CsvOutputs.quote(span.from().id()))
            .append(',').append(CsvOutputs.quote(span.to().id())).append(',')
            .append(CsvOutputs.quote(c.name())).append(',').append(c.quality().points()).append(',')
            .append(num(c.quality().coveragePct(), 1)).append(',')
            .append(num(c.quality().rmsM(), 3)).append(',')
            .append(num(c.quality().maxGapM(), 2)).append(',');
        if (c.curve().isPresent()) {
          ConductorCurve k = c.curve().get();
          double len = k.length();
          double h = units.horizontal().metres();
          double v = units.vertical().metres();
          sb.append(num(k.x(0) / h, 3)).append(',').append(num(k.y(0) / h, 3)).append(',')
              .append(num(k.zA() / v, 3)).append(',').append(num(k.x(len) / h, 3)).append(',')
              .append(num(k.y(len) / h, 3)).append(',').append(num(k.zB() / v, 3)).append(',')
              .append(num(k.curve().c(), 1)).append(',').append(num(k.midSpanSag(), 3))
              .append(',');
        } else {
          sb.append(",,,,,,,,");
        }
        sb.append(c.isFitted() ? "fitted" : "not_assessed").append(',')
            .append(CsvOutputs.quote(c.reason().orElse(""))).append('\n');
      }
    }
    return sb.toString();
  }

  /** Writes the table into a folder (temporary file, then moved into place). */
  public static void write(Path dir, WireResult wires, SurveyUnits units) throws IOException {
    AtomicFiles.writeString(dir.resolve(FILE_NAME), text(wires, units));
  }

  private static String num(double v, int decimals) {
    return Double.isFinite(v) ? String.format(Locale.ROOT, "%." + decimals + "f", v) : "";
  }
}
