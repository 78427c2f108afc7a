package org.clearance.clearance;

import java.util.Objects;

/**
 * One vegetation point near a structure, as the clearance engine stores it for pole-clearing
 * zones (cylinders around a pole, e.g. California PRC 4292; docs/rules.md). Rule evaluation
 * reads these records, never the survey.
 *
 * @param lineId line of the structure
 * @param structureId the structure
 * @param x easting, m (survey CRS scaled to metres)
 * @param y northing, m
 * @param z elevation, m
 * @param classification ASPRS class of the point (as read; 1 in a survey without vegetation
 *     labels)
 * @param heightAboveGround height above the ground model, m, or NaN where there is no ground
 * @param planDistanceM horizontal distance from the structure centre, m (&gt;= 0)
 */
public record PolePoint(String lineId, String structureId, double x, double y, double z,
    int classification, double heightAboveGround, double planDistanceM) {

  public PolePoint {
    Objects.requireNonNull(lineId, "lineId");
    Objects.requireNonNull(structureId, "structureId");
  }
}
