package org.clearance.clearance;

import java.util.BitSet;
import java.util.Objects;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * Decides which survey points count as vegetation.
 *
 * <p>Three modes ({@link Mode}). A survey with vegetation classes (any point in 3, 4 or 5, ASPRS
 * LAS 1.4 R15, Table 17) is read as <em>partly labelled</em> ({@link Mode#MIXED}): its
 * vegetation labels are used, and every point it left in class 0 or 1 (never classified,
 * unclassified) is inferred as in an unlabelled survey, so vegetation a vendor did not label is
 * never dropped without a reason (issue 9). A survey without vegetation classes is inferred
 * ({@link Mode#INFERRED}): every point of class 0 or 1 that is not ground, not part of a
 * conductor, a structure or a man-made object counts as vegetation. When the user names the
 * vegetation classes ({@link Mode#LABELLED}) only those are read. Wherever class 0/1 is inferred, a
 * class-2 point more than {@link #GROUND_LABEL_MAX_HEIGHT} above the ground model is not
 * believed to be ground and is inferred too. The engine applies the conductor, structure and
 * object tests, this class the class and height tests.
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

  /** Height above the ground model beyond which a class-2 label is not believed where class 0/1
   * is inferred, m: SMRF's ground band is 0.5 m plus 1.25 m per unit of slope (docs/ground.md),
   * and snow banks and kerbs stay below; as {@link #GROUND_LIKE_MAX_HEIGHT} (common practice, no
   * source). */
  public static final double GROUND_LABEL_MAX_HEIGHT =
      org.clearance.label.ObjectLabeller.GROUND_LABEL_MAX_HEIGHT_M;
  /** ASPRS class 2, ground. */
  static final int GROUND = 2;

  /** How the survey's classes are read. */
  public enum Mode {
    /** Only the classes the user named are vegetation (class 0/1 as the vendor left it). */
    LABELLED,
    /** Vegetation classes read as labelled, class 0/1 inferred (a partly labelled survey, or a
     * fully labelled one whose class 1 may still hold vegetation). */
    MIXED,
    /** No vegetation classes: class 0/1 inferred. */
    INFERRED
  }

  private final BitSet classes;
  private final Mode mode;

  private VegetationSelector(BitSet classes, Mode mode) {
    this.classes = classes;
    this.mode = mode;
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
    if (userClasses != null) {
      return new VegetationSelector(bits, Mode.LABELLED);
    }
    if (any) {
      bits.set(0);
      bits.set(1);
      return new VegetationSelector(bits, Mode.MIXED);
    }
    BitSet unclassified = new BitSet(256);
    unclassified.set(0);
    unclassified.set(1);
    return new VegetationSelector(unclassified, Mode.INFERRED);
  }

  /** How the survey's classes are read. */
  public Mode mode() {
    return mode;
  }

  /**
   * Whether a point of this class is inferred (vegetation unless the evidence of the wire
   * finder, the structure test or the labelling step says otherwise) rather than read as
   * labelled: class 0/1 wherever vegetation is inferred, and class 2 (its height is then tested
   * against {@link #GROUND_LABEL_MAX_HEIGHT}).
   */
  public boolean inferredClass(int classification) {
    return mode != Mode.LABELLED && (classification <= 1 || classification == GROUND);
  }

  /**
   * Whether a class-2 point at this height above ground is not believed to be ground and is
   * inferred (only where class 0/1 is inferred).
   *
   * @param hag height above ground, m (NaN: believed)
   */
  public boolean groundLabelDoubted(double hag) {
    return mode != Mode.LABELLED && hag > GROUND_LABEL_MAX_HEIGHT;
  }

  /**
   * Whether a point that is not read as vegetation may be vegetation all the same: a class of
   * unknown meaning (reserved 8, 12, 23-63, user-defined 64-255) at least
   * {@link #UNCLASSIFIED_MIN_HEIGHT} above ground, or a ground-like class more than
   * {@link #GROUND_LIKE_MAX_HEIGHT} above it. Such points near a conductor keep a span from being
   * called clear (issue 10 item 3: vegetation delivered in class 20). Classes 0 and 1 are
   * inferred (never unread) unless the user named the vegetation classes; then they are taken
   * as the vendor left them: not vegetation.
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

  /** Whether the class may hold vegetation (class 2 only by {@link #groundLabelDoubted}). */
  public boolean candidateClass(int classification) {
    return classes.get(classification) || (classification == GROUND && mode != Mode.LABELLED);
  }

  /**
   * True when some vegetation is inferred (class 0/1 of a survey without vegetation classes, or
   * of a partly labelled one): the engine must then exclude conductor, structure and object
   * points itself among the {@link #inferredClass inferred classes} and require a small height
   * above ground, and the labelling step runs.
   */
  public boolean inferred() {
    return mode != Mode.LABELLED;
  }

  /** True when the survey's vegetation labels are read and class 0/1 is inferred besides. */
  public boolean mixed() {
    return mode == Mode.MIXED;
  }

  /** Human-readable description for the run record. */
  public String describe() {
    String inferredText = "classes 0/1 inferred (above " + UNCLASSIFIED_MIN_HEIGHT
        + " m over ground, not conductor, not structure, not man-made; class 2 more than "
        + GROUND_LABEL_MAX_HEIGHT + " m over ground too)";
    return switch (mode) {
      case INFERRED -> "inferred: " + inferredText;
      case MIXED -> "classes " + classes.stream().filter(c -> c > 1)
          .mapToObj(Integer::toString).collect(Collectors.joining(", "))
          + " as labelled where consistent; " + inferredText;
      case LABELLED -> "classes " + classes.stream().mapToObj(Integer::toString)
          .collect(Collectors.joining(", "));
    };
  }
}
