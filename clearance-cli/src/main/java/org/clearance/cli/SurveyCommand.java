package org.clearance.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamWriteFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectWriter;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.DecimalNode;
import com.fasterxml.jackson.databind.node.NullNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.clearance.io.JsonFiles;
import org.clearance.survey.Bounds;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.SurveySummary;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code clearance survey FILE...}: what a lidar survey holds, read from all its points.
 *
 * <p>Prints the files, point count, points per ASPRS class, extent and GPS time range in the
 * files' own units, the units and CRS as far as the files state them, and point density over the
 * occupied 5 m cells. Works without a units option (units the files do not state are reported as
 * such); with {@code --json} prints one JSON object instead.
 */
@Command(
    name = "survey",
    description = {
      "Summarises a lidar survey (one or more uncompressed LAS tiles read as one): points, "
          + "classes, extent, units and CRS, point density.",
      "Extent is in the files' own units. Density counts only occupied 5 m plan cells."
    },
    mixinStandardHelpOptions = true)
public final class SurveyCommand implements Callable<Integer> {
  /** Reading threads unless told: the machine's cores, at most 4 (the disk is the limit). */
  static final int DEFAULT_MAX_THREADS = 4;

  @Parameters(arity = "1..*", paramLabel = "FILE", description = "LAS files (tiles) of the survey.")
  List<Path> files;

  @Option(names = "--json", description = "Print one JSON object instead of text.")
  boolean json;

  @Option(names = "--threads", paramLabel = "N",
      description = "Reading threads, 1 to 256 (default: cores, at most 4).")
  Integer threads;

  @Mixin UnitsOptions units;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() {
    int n = threads != null ? threads
        : Math.min(DEFAULT_MAX_THREADS, Runtime.getRuntime().availableProcessors());
    if (n < 1 || n > 256) {
      throw new CommandLine.ParameterException(spec.commandLine(),
          "--threads must be 1 to 256: " + n);
    }
    SurveySummary s = SurveySummary.compute(files, units.choice(), n);
    PrintWriter out = spec.commandLine().getOut();
    out.print(json ? json(s) : text(s));
    out.flush();
    return ClearanceCommand.EXIT_OK;
  }

  // ---------------------------------------------------------------- text

  static String text(SurveySummary s) {
    StringBuilder b = new StringBuilder();
    line(b, "%d point%s in %d file%s", s.pointCount(), s.pointCount() == 1 ? "" : "s",
        s.files().size(), s.files().size() == 1 ? "" : "s");
    b.append('\n');
    line(b, "  %-44s %4s %7s %7s %12s", "file", "LAS", "format", "record", "points");
    for (SurveySummary.FileSummary f : s.files()) {
      line(b, "  %-44s %4s %7d %7d %12d", shortName(f.path()), f.version(), f.pointFormat(),
          f.recordLength(), f.pointCount());
    }
    b.append('\n');
    line(b, "units and CRS");
    line(b, "  x, y     %s", unitText(s.horizontal(), s.horizontalSource(), "--survey-units",
        "--horizontal-units"));
    line(b, "  z        %s", unitText(s.vertical(), s.verticalSource(), "--survey-units",
        "--vertical-units"));
    String crs = s.crsName().isEmpty() ? "not named in the files" : s.crsName();
    if (s.epsg().isPresent()) {
      crs += ", EPSG:" + s.epsg().getAsInt();
    }
    line(b, "  CRS      %s", crs);
    for (SurveySummary.FileSummary f : s.files()) {
      line(b, "  records  %s: %s", shortName(f.path()), f.crsRecords());
    }
    b.append('\n');
    Bounds e = s.extent();
    line(b, "extent (file units)");
    if (e.isEmpty()) {
      line(b, "  no points");
    } else {
      line(b, "  x  %s .. %s  (%s across)", fixed(e.minX(), 3), fixed(e.maxX(), 3),
          fixed(e.maxX() - e.minX(), 3));
      line(b, "  y  %s .. %s  (%s across)", fixed(e.minY(), 3), fixed(e.maxY(), 3),
          fixed(e.maxY() - e.minY(), 3));
      line(b, "  z  %s .. %s  (%s range)", fixed(e.minZ(), 3), fixed(e.maxZ(), 3),
          fixed(e.maxZ() - e.minZ(), 3));
    }
    if (Double.isNaN(s.gpsTimeMin())) {
      line(b, "GPS time: not recorded by these point formats");
    } else {
      var days = s.acquisitionDays();
      if (days.isPresent()) {
        line(b, "acquired: %s .. %s (UTC, from adjusted standard GPS time %s .. %s s)",
            days.get()[0], days.get()[1], fixed(s.gpsTimeMin(), 3), fixed(s.gpsTimeMax(), 3));
      } else {
        line(b, "acquired: date not known: the files store GPS week seconds (%s .. %s s) "
            + "without the week", fixed(s.gpsTimeMin(), 3), fixed(s.gpsTimeMax(), 3));
      }
    }
    if (s.occupiedCells().isPresent()) {
      line(b, "density: %s points per square metre over %d occupied %s m cells (%s ha)",
          fixed(s.density(), 2), s.occupiedCells().getAsLong(), fixed(s.cellSize(), 0),
          fixed(s.occupiedArea() / 10_000, 2));
    } else {
      line(b, "density: not computed, the horizontal unit is not known");
    }
    line(b, "withheld: %d point%s", s.withheldCount(), s.withheldCount() == 1 ? "" : "s");
    b.append('\n');
    line(b, "  %5s  %-44s %12s %8s", "class", "ASPRS name", "points", "share");
    for (SurveySummary.ClassCount c : s.classCounts()) {
      line(b, "  %5d  %-44s %12d %7s%%", c.code(), c.name(), c.count(),
          fixed(100.0 * c.count() / s.pointCount(), 1));
    }
    return b.toString();
  }

  private static String unitText(Optional<LinearUnit> unit, String source, String both,
      String axis) {
    if (unit.isEmpty()) {
      return "not stated (" + source + "); give " + both + " or " + axis + " to set it";
    }
    return unitName(unit.get()) + " (" + source + ")";
  }

  private static String unitName(LinearUnit u) {
    switch (u) {
      case METRE:
        return "metre";
      case FOOT:
        return "international foot";
      default:
        return "US survey foot";
    }
  }

  private static String shortName(Path p) {
    Path name = p.getFileName();
    return name == null ? p.toString() : name.toString();
  }

  private static void line(StringBuilder b, String format, Object... args) {
    b.append(String.format(Locale.ROOT, format, args)).append('\n');
  }

  private static String fixed(double v, int decimals) {
    return String.format(Locale.ROOT, "%." + decimals + "f", v);
  }

  // ---------------------------------------------------------------- JSON

  /** Writes numbers in plain decimal notation, indented, one member per line. */
  private static final ObjectWriter JSON = JsonFiles.MAPPER.writer()
      .with(StreamWriteFeature.WRITE_BIGDECIMAL_AS_PLAIN).withDefaultPrettyPrinter();

  /** The summary as one JSON object (RFC 8259), written through Jackson. */
  static String json(SurveySummary s) {
    ObjectNode o = JsonFiles.object();
    ArrayNode files = o.putArray("files");
    for (SurveySummary.FileSummary f : s.files()) {
      files.addObject().put("path", f.path().toString()).put("las_version", f.version())
          .put("point_format", f.pointFormat()).put("record_length", f.recordLength())
          .put("point_count", f.pointCount()).put("crs_records", f.crsRecords());
    }
    o.put("point_count", s.pointCount());
    ObjectNode counts = o.putObject("class_counts");
    ObjectNode names = o.putObject("class_names");
    for (SurveySummary.ClassCount c : s.classCounts()) {
      counts.put(Integer.toString(c.code()), c.count());
      names.put(Integer.toString(c.code()), c.name());
    }
    Bounds e = s.extent();
    o.set("min", e.isEmpty() ? NullNode.getInstance() : xyz(e.minX(), e.minY(), e.minZ()));
    o.set("max", e.isEmpty() ? NullNode.getInstance() : xyz(e.maxX(), e.maxY(), e.maxZ()));
    o.set("horizontal_unit", JsonFiles.text(s.horizontal().map(LinearUnit::symbol)
        .orElse(null)));
    o.set("vertical_unit", JsonFiles.text(s.vertical().map(LinearUnit::symbol).orElse(null)));
    o.put("horizontal_unit_source", s.horizontalSource());
    o.put("vertical_unit_source", s.verticalSource());
    o.set("crs_name", JsonFiles.text(s.crsName().isEmpty() ? null : s.crsName()));
    if (s.epsg().isPresent()) {
      o.put("epsg", s.epsg().getAsInt());
    } else {
      o.putNull("epsg");
    }
    if (Double.isNaN(s.gpsTimeMin())) {
      o.putNull("gps_time");
    } else {
      ObjectNode g = o.putObject("gps_time");
      g.set("min", num(s.gpsTimeMin()));
      g.set("max", num(s.gpsTimeMax()));
      g.put("adjusted_standard", s.acquisitionDays().isPresent());
      s.acquisitionDays().ifPresent(d -> g.put("first_day_utc", d[0].toString())
          .put("last_day_utc", d[1].toString()));
    }
    o.put("withheld_count", s.withheldCount());
    ObjectNode d = o.putObject("density");
    d.set("cell_size_m", num(s.cellSize()));
    if (s.occupiedCells().isPresent()) {
      d.put("occupied_cells", s.occupiedCells().getAsLong());
    } else {
      d.putNull("occupied_cells");
    }
    d.set("occupied_area_m2", num(s.occupiedArea()));
    d.set("points_per_m2", num(s.density()));
    return text(o);
  }

  private static ObjectNode xyz(double x, double y, double z) {
    ObjectNode o = JsonFiles.object();
    o.set("x", num(x));
    o.set("y", num(y));
    o.set("z", num(z));
    return o;
  }

  /** A number in plain decimal notation (shortest exact form), or null when not finite. */
  static JsonNode num(double v) {
    if (!Double.isFinite(v)) {
      return NullNode.getInstance();
    }
    return DecimalNode.valueOf(BigDecimal.valueOf(v).stripTrailingZeros());
  }

  /** The JSON text of a node, with a final line break. */
  static String text(JsonNode n) {
    try {
      return JSON.writeValueAsString(n) + "\n";
    } catch (JsonProcessingException e) {
      throw new IllegalStateException("a tree of plain nodes always serialises", e);
    }
  }
}
