package org.clearance.examples;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import org.clearance.InputException;
import org.clearance.io.AtomicFiles;
import org.clearance.survey.LasWriter;
import org.clearance.survey.LasWriterOptions;
import org.clearance.survey.PointFormat;

/**
 * Writes the demo corridor's files into a folder: the LAS survey ({@value #SURVEY}), the
 * structures ({@value #STRUCTURES}), the line specification ({@value #LINE_SPEC}) and the truth
 * ({@value #TRUTH}). See docs/demo-corridor.md.
 *
 * <p>Each file is written to a temporary file in the folder and moved into place when complete,
 * so no half-written file is ever visible; existing files of the same names are replaced.
 */
public final class DemoCorridor {
  public static final String SURVEY = "survey.las";
  public static final String STRUCTURES = "structures.csv";
  public static final String LINE_SPEC = "line.yaml";
  public static final String TRUTH = "truth.json";
  /** LAS system identifier: generated, not surveyed (LAS 1.4 R15 suggests OTHER for such). */
  static final String SYSTEM_ID = "OTHER";
  static final String SOFTWARE = "Clearance demo generator";
  /** GPS epoch (1980-01-06 UTC) and the offset of adjusted standard GPS time, s. */
  private static final Instant GPS_EPOCH = Instant.parse("1980-01-06T00:00:00Z");
  private static final double ADJUSTED_GPS_OFFSET_S = 1e9;
  /** LAS coordinate offsets are rounded to this, m. */
  private static final double OFFSET_ROUNDING_M = 1000;

  private DemoCorridor() {}

  /**
   * The files written and the number of survey points.
   *
   * @param survey the LAS survey
   * @param structures the structures file
   * @param lineSpec the line specification
   * @param truth the truth
   * @param pointCount points in the survey
   */
  public record DemoFiles(Path survey, Path structures, Path lineSpec, Path truth,
      long pointCount) {}

  /**
   * Generates the demo corridor for the options and writes its four files into {@code dir}
   * (created when missing).
   *
   * @throws InputException when {@code dir} exists and is not a folder
   * @throws UncheckedIOException when a file cannot be written (no partial file is left)
   */
  public static DemoFiles write(Path dir, DemoOptions options) {
    if (Files.exists(dir) && !Files.isDirectory(dir)) {
      throw new InputException(dir, null, null, "is not a folder");
    }
    DemoScene scene = DemoScene.create(options);
    try {
      Files.createDirectories(dir);
      Path survey = dir.resolve(SURVEY);
      PointTally tally;
      LasWriter las = LasWriter.create(survey, lasOptions(scene));
      try {
        tally = new PointTally((chunk, ids) -> las.write(chunk));
        scene.points(tally);
      } catch (RuntimeException e) {
        las.abort();
        throw e;
      }
      las.close();
      Path structures = dir.resolve(STRUCTURES);
      AtomicFiles.write(structures, out -> text(out, w -> LineFiles.writeStructures(w, scene)));
      Path lineSpec = dir.resolve(LINE_SPEC);
      AtomicFiles.write(lineSpec, out -> text(out, w -> LineFiles.writeLineSpec(w, scene)));
      Path truth = dir.resolve(TRUTH);
      AtomicFiles.write(truth, out -> text(out, w -> TruthFile.write(w, scene, tally)));
      return new DemoFiles(survey, structures, lineSpec, truth, tally.total());
    } catch (IOException e) {
      throw new UncheckedIOException("cannot write the demo corridor to " + dir, e);
    }
  }

  /** LAS 1.4, point format 6, 1 mm steps, the CRS's WKT, dated on the survey day. */
  static LasWriterOptions lasOptions(DemoScene scene) {
    double sx = 0;
    double sy = 0;
    for (DemoStructure t : scene.structures()) {
      sx += t.x();
      sy += t.y();
    }
    int n = scene.structures().size();
    double ox = Math.round(sx / n / OFFSET_ROUNDING_M) * OFFSET_ROUNDING_M;
    double oy = Math.round(sy / n / OFFSET_ROUNDING_M) * OFFSET_ROUNDING_M;
    return LasWriterOptions.of(4, PointFormat.F6).withCrs(scene.units()).withOffset(ox, oy, 0)
        .withSystemId(SYSTEM_ID).withSoftware(SOFTWARE).withAdjustedGpsTime(true)
        .withCreationDate(surveyDay(scene));
  }

  /** The UTC day of the first flight strip (leap seconds ignored: a date only). */
  static LocalDate surveyDay(DemoScene scene) {
    double gps = scene.strips().get(0).startTime() + ADJUSTED_GPS_OFFSET_S;
    return GPS_EPOCH.plusSeconds((long) gps).atZone(ZoneOffset.UTC).toLocalDate();
  }

  /** Text content written through a UTF-8 writer. */
  private interface TextContent {
    void writeTo(Writer w) throws IOException;
  }

  private static void text(java.io.OutputStream out, TextContent content) throws IOException {
    Writer w = new BufferedWriter(new OutputStreamWriter(out, StandardCharsets.UTF_8));
    content.writeTo(w);
    w.flush();
  }
}
