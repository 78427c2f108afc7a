package org.clearance.examples;

/**
 * The truth object of each generated point, packed in an int: the kind in the top byte, an index
 * in the low 24 bits. Indices: {@link Kind#TREE} the tree id, {@link Kind#BUILDING} the building
 * id, {@link Kind#TOWER} and {@link Kind#INSULATOR} the structure index, {@link Kind#WIRE} span *
 * 16 + wire index within the span, {@link Kind#JUMPER} structure * 16 + wire index, {@link
 * Kind#BIRD} the bird id; other kinds 0.
 */
public final class TruthId {
  private static final int INDEX_BITS = 24;
  private static final int INDEX_MASK = (1 << INDEX_BITS) - 1;
  private static final Kind[] KINDS = Kind.values();
  /** Wires (and positions) per span or structure in the packed index. */
  public static final int WIRES_PER_SPAN = 16;

  private TruthId() {}

  /** What a point was generated from. */
  public enum Kind {
    GROUND,
    ROAD,
    /** Grass and herbs in the right-of-way and in open land. */
    LOW_VEGETATION,
    /** Undergrowth below the forest canopy. */
    UNDERSTOREY,
    TREE,
    BUILDING,
    TOWER,
    INSULATOR,
    WIRE,
    JUMPER,
    BIRD,
    NOISE_LOW,
    NOISE_HIGH,
    /** The labelling tests' crane and fence ({@link ManMadeFixtures}). */
    MAN_MADE
  }

  /** Packs a kind and an index (0 to 2^24 - 1). */
  public static int of(Kind kind, int index) {
    if (index < 0 || index > INDEX_MASK) {
      throw new IllegalArgumentException("index out of range: " + index);
    }
    return kind.ordinal() << INDEX_BITS | index;
  }

  /** The id of wire {@code wire} (index within the span) of span {@code span}. */
  public static int wire(int span, int wire) {
    return of(Kind.WIRE, span * WIRES_PER_SPAN + wire);
  }

  /** The kind of a packed id. */
  public static Kind kind(int id) {
    return KINDS[id >>> INDEX_BITS];
  }

  /** The index of a packed id. */
  public static int index(int id) {
    return id & INDEX_MASK;
  }

  /** For WIRE ids: the span index; for JUMPER ids: the structure index. */
  public static int wireSpan(int id) {
    return index(id) / WIRES_PER_SPAN;
  }

  /** For WIRE and JUMPER ids: the wire index within the span (order of the line's positions). */
  public static int wireIndex(int id) {
    return index(id) % WIRES_PER_SPAN;
  }
}
