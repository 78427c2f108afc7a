package org.clearance.line;

/** How a structure holds its conductors, which decides where tension sections end. */
public enum StructureType {
  /** Conductors hang from suspension strings: horizontal tension equalises across the structure. */
  SUSPENSION,
  /** Conductors are terminated (dead-ended) on both sides: a tension section ends here. */
  DEAD_END
}
