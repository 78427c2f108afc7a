package org.clearance.survey;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.OptionalLong;

/**
 * What a survey holds, from one full read of its points: counts, classes, extent and GPS time
 * range in the files' own units, units and CRS as far as known, and point density.
 *
 * <p>Density is points per square metre of <em>occupied</em> area: the plan is cut into square
 * cells of {@link #cellSize()} metres and only cells holding at least one point count, so a
 * narrow corridor survey is not diluted by the empty corners of its bounding box. It needs the
 * horizontal unit; where that is unknown, density and area are NaN and the cell count empty.
 *
 * @param files one entry per file, in the order given
 * @param pointCount number of points read
 * @param classCounts points per class code present, ascending by code
 * @param extent smallest and largest x, y, z of the points, file units (NaN for no points)
 * @param gpsTimeMin earliest GPS time, seconds; NaN when no file carries GPS time
 * @param gpsTimeMax latest GPS time, seconds; NaN when no file carries GPS time
 * @param withheldCount points flagged withheld
 * @param horizontal unit of x and y, when stated or given
 * @param vertical unit of z, when stated or given
 * @param horizontalSource how the horizontal unit was found, or why it is not known
 * @param verticalSource how the vertical unit was found, or why it is not known
 * @param crsName CRS name from the first file, or an empty string
 * @param epsg EPSG code of the projected CRS, when stated
 * @param cellSize side of the density grid cells, metres
 * @param occupiedCells cells holding at least one point; empty without a horizontal unit
 * @param occupiedArea area of the occupied cells, square metres; NaN without a horizontal unit
 * @param density points per square metre of occupied area; NaN without a horizontal unit
 */
public record SurveySummary(
    List<FileSummary> files,
    long pointCount,
    List<ClassCount> classCounts,
    Bounds extent,
    double gpsTimeMin,
    double gpsTimeMax,
    long withheldCount,
    Optional<LinearUnit> horizontal,
    Optional<LinearUnit> vertical,
    String horizontalSource,
    String verticalSource,
    String crsName,
    OptionalInt epsg,
    double cellSize,
    OptionalLong occupiedCells,
    double occupiedArea,
    double density) {

  /** Side of the density grid cells: 5 m, coarse enough that gaps between lidar scan lines fill. */
  public static final double DENSITY_CELL_M = 5.0;

  /**
   * One file of the survey.
   *
   * @param path the file
   * @param version LAS version, e.g. {@code "1.4"}
   * @param pointFormat point data record format, 0-10
   * @param recordLength record length, bytes
   * @param pointCount points in the file
   * @param crsRecords which CRS records the file carries and which governs
   * @param adjustedGpsTime whether its GPS times are adjusted standard GPS time (global encoding
   *     bit 0), from which dates follow ({@link GpsTime}); otherwise GPS week seconds
   */
  public record FileSummary(
      Path path, String version, int pointFormat, int recordLength, long pointCount,
      String crsRecords, boolean adjustedGpsTime) {}

  /**
   * The UTC days of the earliest and latest GPS time, when every file stores adjusted standard
   * GPS time; empty otherwise (week seconds carry no date).
   */
  public java.util.Optional<java.time.LocalDate[]> acquisitionDays() {
    if (Double.isNaN(gpsTimeMin) || files.isEmpty()
        || !files.stream().allMatch(FileSummary::adjustedGpsTime)) {
      return java.util.Optional.empty();
    }
    return java.util.Optional.of(new java.time.LocalDate[] {
        GpsTime.utcDayOfAdjusted(gpsTimeMin).orElseThrow(),
        GpsTime.utcDayOfAdjusted(gpsTimeMax).orElseThrow()});
  }

  /**
   * Points of one class.
   *
   * @param code ASPRS class code, 0-255
   * @param name ASPRS class name (see {@link AsprsClasses})
   * @param count points
   */
  public record ClassCount(int code, String name, long count) {}

  public SurveySummary {
    files = List.copyOf(files);
    classCounts = List.copyOf(classCounts);
    Objects.requireNonNull(extent, "extent");
    Objects.requireNonNull(horizontal, "horizontal");
    Objects.requireNonNull(vertical, "vertical");
    Objects.requireNonNull(horizontalSource, "horizontalSource");
    Objects.requireNonNull(verticalSource, "verticalSource");
    Objects.requireNonNull(crsName, "crsName");
    Objects.requireNonNull(epsg, "epsg");
    Objects.requireNonNull(occupiedCells, "occupiedCells");
  }

  /**
   * Reads a survey and summarises it. Units are resolved as {@link Survey#open} does, except that
   * a unit nobody states is left empty instead of being an error.
   *
   * @param paths the LAS files, at least one
   * @param choice units the user gave, if any
   * @param threads reading threads, 1 to 256
   * @throws org.clearance.InputException for malformed files, geographic coordinates,
   *     conflicting units or tiles that disagree
   */
  public static SurveySummary compute(List<Path> paths, UnitsChoice choice, int threads) {
    List<LasFile> files = Survey.openAll(paths);
    UnitsResolver.Resolved units = UnitsResolver.resolve(files, choice, false);
    double cellInFileUnits = units.horizontal().map(u -> DENSITY_CELL_M / u.metres())
        .orElse(Double.NaN);
    PointStreamer streamer = new PointStreamer(files, 1, 1, Survey.DEFAULT_CHUNK_POINTS);
    List<SummaryAccumulator> parts = new ArrayList<>();
    streamer.readParallel(threads, () -> {
      SummaryAccumulator a = new SummaryAccumulator(cellInFileUnits);
      parts.add(a);
      return a;
    });
    SummaryAccumulator all = new SummaryAccumulator(cellInFileUnits);
    for (SummaryAccumulator a : parts) {
      all.merge(a);
    }
    boolean legacy = false;
    boolean extended = false;
    List<FileSummary> fileSummaries = new ArrayList<>();
    for (LasFile f : files) {
      LasHeader h = f.header();
      legacy |= !h.pointFormat().isExtended();
      extended |= h.pointFormat().isExtended();
      fileSummaries.add(new FileSummary(f.path(), h.version(), h.pointFormat().id(),
          h.recordLength(), h.pointCount(), f.crs().records(), h.adjustedGpsTime()));
    }
    List<ClassCount> classes = new ArrayList<>();
    long[] counts = all.classCounts();
    for (int code = 0; code < counts.length; code++) {
      if (counts[code] > 0) {
        classes.add(new ClassCount(code, AsprsClasses.name(code, legacy, extended),
            counts[code]));
      }
    }
    OptionalLong cells = units.horizontal().isPresent() ? OptionalLong.of(all.cellCount())
        : OptionalLong.empty();
    double area = cells.isPresent() ? cells.getAsLong() * DENSITY_CELL_M * DENSITY_CELL_M
        : Double.NaN;
    double density = area > 0 ? all.count() / area : Double.NaN;
    return new SurveySummary(fileSummaries, all.count(), classes, all.extent(), all.gpsMin(),
        all.gpsMax(), all.withheld(), units.horizontal(), units.vertical(),
        units.horizontalSource(), units.verticalSource(),
        units.crs().name(), units.crs().epsg(), DENSITY_CELL_M, cells, area, density);
  }
}
