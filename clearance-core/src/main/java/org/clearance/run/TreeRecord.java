package org.clearance.run;

import java.util.List;

/**
 * A tree near a span, for the fall-in check, as stored in the run model.
 *
 * @param id tree id, unique in the run
 * @param spanId the span it was measured to
 * @param x easting of the tree top, m
 * @param y northing of the tree top, m
 * @param topZ elevation of the tree top, m
 * @param baseZ ground elevation at the tree, m
 * @param heightM tree height, m
 * @param crownRadiusM crown radius estimate, m
 * @param baseDistances distance from the tree base to the nearest conductor per condition of the
 *     run (surveyed first), m; NaN where not computed
 * @param nearestConductor conductor nearest to the base in the surveyed state
 */
public record TreeRecord(
    String id, String spanId, double x, double y, double topZ, double baseZ, double heightM,
    double crownRadiusM, List<Double> baseDistances, String nearestConductor) {

  public TreeRecord {
    baseDistances = List.copyOf(baseDistances);
  }
}
