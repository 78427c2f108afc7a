package org.clearance.wire;

import java.util.List;
import org.clearance.line.ConductorPosition;
import org.clearance.line.LineSpec;

/**
 * Scales of the wire search for a line whose conductors hang closer than the default tube and
 * cluster radius allow (distribution framings, 0.3-2.5 m apart; package-private).
 *
 * <p>The closest spacing is the least distance, in the structure's cross-section, between two
 * positions of the specification that give both {@code offset_m} and {@code attach_height_m}
 * (sub-conductors of one bundle do not count: the bundle split handles them). From it follow a
 * tube of {@link #TUBE_SHARE} of the spacing (never wider than the default), a clustering radius
 * of the same size with the along-span reach kept at {@link #ALONG_REACH_M}, and the sleeve
 * radius of {@link SleeveEvidence}. A line whose positions are at least {@link #ACTIVE_BELOW_M}
 * apart, or that gives no geometry, keeps the defaults (transmission lines).
 */
record CloseSpacing(double spacingM, double tubeM, double clusterRadiusM, double stationStretch) {

  /** Below this spacing the scales shrink, m: the default tube (0.6 m across, 0.45 m up and
   * down) and cluster radius (1 m) reach about 1.2 m, and twice that keeps a margin. */
  static final double ACTIVE_BELOW_M = 2.5;
  /** Tube half-size and cluster radius as a share of the spacing: 0.4 leaves 0.2 of the spacing
   * between the tubes of neighbouring conductors. */
  static final double TUBE_SHARE = 0.4;
  /** Smallest tube half-size, m: four standard deviations of a 4 cm wire noise. */
  static final double MIN_TUBE_M = 0.16;
  /** Along-span reach of the clustering metric, m: a few points of a wire sampled at one to
   * three points per metre. */
  static final double ALONG_REACH_M = 3.0;

  /** The scales for the specification, or null when the defaults apply. */
  static CloseSpacing of(LineSpec spec, WireFinderOptions.Growth defaults) {
    List<ConductorPosition> ps = spec.conductors();
    double closest = Double.POSITIVE_INFINITY;
    for (int i = 0; i < ps.size(); i++) {
      for (int j = i + 1; j < ps.size(); j++) {
        ConductorPosition a = ps.get(i);
        ConductorPosition b = ps.get(j);
        double d = Math.hypot(a.offsetM() - b.offsetM(), a.attachHeightM() - b.attachHeightM());
        if (Double.isFinite(d)) {
          closest = Math.min(closest, d);
        }
      }
    }
    if (!(closest < ACTIVE_BELOW_M)) {
      return null;
    }
    double tube = Math.max(MIN_TUBE_M, TUBE_SHARE * closest);
    double radius = Math.min(defaults.clusterRadiusM(), tube);
    return new CloseSpacing(closest, Math.min(defaults.tubeLateralM(), tube), radius,
        Math.max(defaults.stationStretch(), ALONG_REACH_M / radius));
  }
}
