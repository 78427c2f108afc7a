package org.clearance.clearance;

import java.util.BitSet;
import java.util.Objects;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * Decides which survey points count as vegetation.
 *
 * <p>A classified survey (one that has any point in a vegetation class) uses its vegetation
 * classes: 3, 4 and 5 by default (ASPRS LAS 1.4 R15, Table 17), or the user's choice. A survey
 * without vegetation classes is treated as unclassified: every point of class 0 or 1 (never
 * classified, unclassified) that is not ground, not part of a conductor and not part of a
 * structure counts as vegetation; the engine applies the conductor and structure tests, this
 * class the class and height tests.
 */
public final class VegetationSelector {

  /** ASPRS vegetation classes: low, medium and high vegetation. */
  public static final Set<Integer> DEFAULT_CLASSES = Set.of(3, 4, 5);

  /**
   * Height above ground below which a point of an unclassified survey is taken to be ground or
   * ground clutter, m (covers the 0.5 m elevation threshold of SMRF's final step with margin
   * against noise; common practice, no source).
   */
  public static final double UNCLASSIFIED_MIN_HEIGHT = 0.3;

  /**
   * ASPRS classes whose meaning rules out vegetation wherever they lie (LAS 1.4 R15 Table 17):
   * ground, building, low point, wires, tower, wire-structure connector, bridge deck, high
   * noise, overhead structure, temporal exclusion.
   */
  static final Set<Integer> NOT_VEGETATION = Set.of(2, 6, 7, 13, 14, 15, 16, 17, 18, 19, 22);
  /** ASPRS classes that lie on the ground (water, rail, road surface, ignored ground, snow): a
   * point of these classes standing high above it is labelled wrongly. */
  static final Set<Integer> GROUND_LIKE = Set.of(9, 10, 11, 20, 21);
  /** Height above ground beyond which a ground-like class is not believed, m (snow banks, rail
   * and road furniture stay below; common practice, no source). */
  static final double GROUND_LIKE_MAX_HEIGHT = 2.0;

  private final BitSet classes;
  private final boolean inferred;

  private VegetationSelector(BitSet classes, boolean inferred) {
    this.classes = classes;
    this.inferred = inferred;
  }

  /**
   * The selector for a survey.
   *
   * @param classCounts points per ASPRS class (index 0-255) in the survey
   * @param userClasses classes the user named, or null for the default
   */
  public static VegetationSelector forSurvey(long[] classCounts, Set<Integer> userClasses) {
    Objects.requireNonNull(classCounts, "classCounts");
    Set<Integer> wanted = userClasses == null ? DEFAULT_CLASSES : userClasses;
    boolean any = false;
    BitSet bits = new BitSet(256);
    for (int c : wanted) {
      if (c < 0 || c > 255) {
        throw new IllegalArgumentException("class outside 0-255: " + c);
      }
      bits.set(c);
      any |= c < classCounts.length && classCounts[c] > 0;
    }
    if (any || userClasses != null) {
      return new VegetationSelector(bits, false);
    }
    BitSet unclassified = new BitSet(256);
    unclassified.set(0);
    unclassified.set(1);
    return new VegetationSelector(unclassified, true);
  }

  /**
   * Whether a point that is not read as vegetation may be vegetation all the same: a class of
   * unknown meaning (reserved 8, 12, 23-63, user-defined 64-255) at least
   * {@link #UNCLASSIFIED_MIN_HEIGHT} above ground, or a ground-like class more than
   * {@link #GROUND_LIKE_MAX_HEIGHT} above it. Such points near a conductor keep a span from being
   * called clear (issue 10 item 3: vegetation delivered in class 20). Classes 0 and 1 of a survey
   * that labels its vegetation are taken as the vendor left them: not vegetation.
   *
   * @param classification the point's ASPRS class
   * @param hag its height above ground, m (NaN: unknown, not counted)
   */
  public boolean unread(int classification, double hag) {
    if (classes.get(classification) || classification <= 1
        || NOT_VEGETATION.contains(classification)) {
      return false;
    }
    if (GROUND_LIKE.contains(classification)) {
      return hag > GROUND_LIKE_MAX_HEIGHT;
    }
    return hag >= UNCLASSIFIED_MIN_HEIGHT;
  }

  /** Whether points of this class may be {@link #unread} at some height (a quick first test). */
  public boolean mayBeUnread(int classification) {
    return !classes.get(classification) && classification > 1
        && !NOT_VEGETATION.contains(classification);
  }

  /** Whether the class may hold vegetation. */
  public boolean candidateClass(int classification) {
    return classes.get(classification);
  }

  /**
   * True when vegetation is inferred from an unclassified survey: the engine must then exclude
   * conductor and structure points itself and require a small height above ground.
   */
  public boolean inferred() {
    return inferred;
  }

  /** Human-readable description for the run record. */
  public String describe() {
    return inferred
        ? "inferred: classes 0/1 above " + UNCLASSIFIED_MIN_HEIGHT
            + " m over ground, not conductor, not structure"
        : "classes " + classes.stream().mapToObj(Integer::toString)
            .collect(Collectors.joining(", "));
  }
}
