package org.clearance.label;

/** What a clustered object of unclassified points is taken to be. */
public enum ObjectKind {
  /** Not shown to be man-made: its points stay vegetation. */
  VEGETATION,
  /** A thin tall structure with little spread at the top: a crane, mast, pole or lattice. */
  MAST,
  /** An object of planes: a roof, a wall, a fence, a vehicle. */
  PLANAR,
  /** A long thin object: a wire or cable the wire finder did not name, or points labelled
   * vegetation that run along a wire. */
  LINEAR
}
