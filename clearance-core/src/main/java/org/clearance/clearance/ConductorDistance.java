package org.clearance.clearance;

/**
 * The closest approach of a point to one conductor (as hanging, or swung about its chord).
 *
 * @param distance true 3D distance from the point to the conductor, m, &gt;= 0
 * @param station horizontal station of the closest conductor point along the unswung span, m,
 *     in [0, span length] (0 at attachment A)
 * @param horizontal plan distance between the point and the closest conductor point, m, &gt;= 0
 * @param vertical height of the point above the closest conductor point, m (negative below)
 * @param swingAngle swing of the conductor about its chord, radians (0 = hanging; positive
 *     towards the left looking from A to B)
 * @param closestX easting of the closest conductor point, m
 * @param closestY northing of the closest conductor point, m
 * @param closestZ elevation of the closest conductor point, m
 */
public record ConductorDistance(double distance, double station, double horizontal,
    double vertical, double swingAngle, double closestX, double closestY, double closestZ) {}
