package org.clearance.ground;

import java.util.Locale;
import java.util.Objects;
import java.util.Optional;

/**
 * Where a {@link GroundModel}'s terrain came from, for the run report.
 *
 * @param kind class-2 points or the filter
 * @param filter the SMRF parameters when the filter made the terrain, else empty
 * @param points survey points considered (not noise, not withheld)
 * @param classifiedGroundPoints points of class 2 among them
 * @param surfaceCells raster cells holding at least one considered point
 * @param groundCells cells whose terrain value comes straight from ground points (class 2, or
 *     cells SMRF kept as ground)
 * @param filledCells cells whose terrain value was interpolated (under objects, small gaps)
 */
public record GroundSource(
    Kind kind,
    Optional<SmrfOptions> filter,
    long points,
    long classifiedGroundPoints,
    long surfaceCells,
    long groundCells,
    long filledCells) {

  /** How the terrain was made. */
  public enum Kind {
    /** From the minimum of the survey's class-2 points per cell. */
    CLASSIFIED,
    /** By the SMRF ground filter over all non-noise points. */
    FILTERED
  }

  /** @throws NullPointerException when kind or filter is null */
  public GroundSource {
    Objects.requireNonNull(kind, "kind");
    Objects.requireNonNull(filter, "filter");
  }

  /** A short plain-words account, e.g. for the run log. */
  public String describe() {
    String how = kind == Kind.CLASSIFIED
        ? "class-2 (ground) points of the survey, lowest per cell"
        : "SMRF ground filter (" + filter.map(SmrfOptions::describe).orElse("") + ")";
    return String.format(Locale.ROOT,
        "Ground from %s; %d points considered, %d of class 2; %d cells with points, "
            + "%d ground cells, %d interpolated cells.",
        how, points, classifiedGroundPoints, surfaceCells, groundCells, filledCells);
  }
}
