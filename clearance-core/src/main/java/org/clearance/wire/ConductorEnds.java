package org.clearance.wire;

/**
 * Where the conductors of a span end at its two structures, in the span frame
 * (package-private).
 *
 * <p>At each structure the cross arm lies across the line along the bisector of the angle the
 * line turns there (its two spans' directions), not across this span alone: a conductor hung
 * e metres to the side of the centre line therefore meets the arm at station -e tan(a) (and
 * L - e tan(b) at the far end), with tan(a) from the bisector. At a dead-end structure the
 * conductor itself ends a strain assembly's length further into the span (docs/line-inputs.md,
 * strain_length_m).
 *
 * @param tanA station shift per metre of offset of the cross arm at the first structure
 * @param strainA strain assembly length at the first structure, m (0 at a suspension structure)
 * @param tanB station shift per metre of offset of the cross arm at the second structure
 * @param strainB strain assembly length at the second structure, m
 */
record ConductorEnds(double tanA, double strainA, double tanB, double strainB) {

  /** Cross arms square to the span, no strain assemblies. */
  static final ConductorEnds SQUARE = new ConductorEnds(0, 0, 0, 0);

  /** The same cross arms with strain assemblies. */
  ConductorEnds withStrain(double a, double b) {
    return new ConductorEnds(tanA, a, tanB, b);
  }

  /**
   * Station where the plan line e(s) = e0 + slope s meets the first structure's arm, plus the
   * strain length, m.
   */
  double stationA(double e0, double slope) {
    return -e0 * tanA / (1 + slope * tanA) + strainA;
  }

  /** Station where e(s) = e0 + slope s meets the second structure's arm, less the strain, m. */
  double stationB(double e0, double slope, double length) {
    // s = L - e(s) tanB  =>  s (1 + slope tanB) = L - e0 tanB
    return (length - e0 * tanB) / (1 + slope * tanB) - strainB;
  }

  /**
   * tan of the angle between a span's square cross-section and the arm at a structure whose
   * line direction there (the bisector) is (ax, ay), for a span of unit direction (ux, uy):
   * (n . along) / (u . along), n the span's left normal.
   */
  static double armTangent(double ux, double uy, double ax, double ay) {
    double nx = -uy;
    double ny = ux;
    return (nx * ax + ny * ay) / (ux * ax + uy * ay);
  }
}
