package org.clearance.ground;

/**
 * One tree found in the canopy height model.
 *
 * @param x easting of the tree top (centre of the highest canopy cell), metres
 * @param y northing of the tree top, metres
 * @param topZ canopy surface at that cell (its highest vegetation return), metres
 * @param baseZ ground elevation beneath the top (the stem is taken as vertical), metres
 * @param height topZ - baseZ, metres, &gt;= the minimum tree height
 * @param crownRadius radius of a circle with the crown's area, metres, &gt; 0; the crown is the
 *     region of the canopy that drains to this top (marker-controlled watershed)
 */
public record Tree(double x, double y, double topZ, double baseZ, double height,
    double crownRadius) {}
