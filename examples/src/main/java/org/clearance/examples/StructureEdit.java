package org.clearance.examples;

import java.util.Objects;

/**
 * A deliberate error in the written structures file, for tests of structure refinement: one
 * structure moved by a few metres, or left out. The scene's truth keeps the true positions.
 *
 * @param kind what is changed
 * @param structureIndex zero-based index of the structure along the line (-1 for {@link Kind#NONE})
 * @param offsetM distance the written position is moved, m (0 unless {@link Kind#OFFSET}); the
 *     direction is drawn from the seed
 */
public record StructureEdit(Kind kind, int structureIndex, double offsetM) {

  /** Largest allowed offset, m: the edit simulates a poor survey of the centre, not a new site. */
  public static final double MAX_OFFSET_M = 50.0;

  /** What is changed in the written structures file. */
  public enum Kind {
    NONE,
    OFFSET,
    OMIT
  }

  public StructureEdit {
    Objects.requireNonNull(kind, "kind");
    if (kind == Kind.NONE) {
      if (structureIndex != -1 || offsetM != 0) {
        throw new IllegalArgumentException("NONE takes index -1 and offset 0");
      }
    } else if (structureIndex < 0) {
      throw new IllegalArgumentException("structure index must be >= 0: " + structureIndex);
    }
    if (kind == Kind.OFFSET && !(Double.isFinite(offsetM) && offsetM > 0
        && offsetM <= MAX_OFFSET_M)) {
      throw new IllegalArgumentException("offset must be in (0, " + MAX_OFFSET_M + "] m: "
          + offsetM);
    }
    if (kind == Kind.OMIT && offsetM != 0) {
      throw new IllegalArgumentException("OMIT takes offset 0");
    }
  }

  /** No edit: the file holds the true positions. */
  public static StructureEdit none() {
    return new StructureEdit(Kind.NONE, -1, 0);
  }

  /** Structure {@code index} (zero-based) written {@code metres} away from its true position. */
  public static StructureEdit offset(int index, double metres) {
    return new StructureEdit(Kind.OFFSET, index, metres);
  }

  /** Structure {@code index} (zero-based) left out of the file. */
  public static StructureEdit omit(int index) {
    return new StructureEdit(Kind.OMIT, index, 0);
  }
}
