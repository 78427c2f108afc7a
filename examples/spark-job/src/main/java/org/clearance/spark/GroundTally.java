package org.clearance.spark;

import java.io.Serializable;
import org.clearance.ground.GroundSource;

/**
 * The counts of a span's ground model, summed over the spans for the run's description.
 *
 * @param classified true when made from class-2 points, false when by the ground filter
 * @param points points considered
 * @param groundPoints of them class 2
 * @param surfaceCells cells with points
 * @param groundCells ground cells
 * @param filledCells interpolated cells
 */
record GroundTally(boolean classified, long points, long groundPoints, long surfaceCells,
    long groundCells, long filledCells) implements Serializable {

  static GroundTally of(GroundSource s) {
    return new GroundTally(s.kind() == GroundSource.Kind.CLASSIFIED, s.points(),
        s.classifiedGroundPoints(), s.surfaceCells(), s.groundCells(), s.filledCells());
  }
}
