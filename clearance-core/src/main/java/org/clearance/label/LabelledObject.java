package org.clearance.label;

/**
 * One clustered object of unclassified points and the evidence the labelling weighed.
 *
 * @param kind what it is taken to be
 * @param points its points
 * @param x easting of its highest point, m
 * @param y northing of its highest point, m
 * @param heightM its highest point above ground, m
 * @param linearity mean linearity of its points with a neighbourhood (0-1)
 * @param planarity mean planarity of its points with a neighbourhood (0-1)
 * @param scattering mean scattering (0-1)
 * @param planarShare share of its points whose largest feature is planarity (0-1)
 * @param upperSpreadM plan area of the 0.5 m cells holding its points in the upper half of its
 *     height, divided by its height, m (m^2 per m)
 * @param baseShare share of its points in the lowest quarter of its height (from 1 m above
 *     ground, where points are looked at): a mast stands on the ground and is seen down to it, a
 *     crown is seen from above
 * @param multiReturnShare share of its points that are later returns of their pulse (return
 *     number 2 or more; 0-1), NaN when the survey's echoes tell nothing
 * @param multiPulseShare share of its points that come from pulses with several returns (number
 *     of returns 2 or more, or a later return; 0-1), NaN when the survey's echoes tell nothing:
 *     a roof stops the pulse, a crown lets it on
 * @param facetShare share of its planar points whose normals lie in its few main facets (0-1;
 *     a roof's faces, a wall), NaN when it does not have a planar object's shape
 */
public record LabelledObject(ObjectKind kind, int points, double x, double y, double heightM,
    double linearity, double planarity, double scattering, double planarShare,
    double upperSpreadM, double baseShare, double multiReturnShare, double multiPulseShare,
    double facetShare) {

  /** Mean planarity less mean scattering: high for lattices, masts and sheets, low for crowns. */
  public double contrast() {
    return planarity - scattering;
  }
}
