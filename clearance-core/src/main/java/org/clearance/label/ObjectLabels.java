package org.clearance.label;

import java.util.List;

/**
 * What the labelling found: the clustered objects with their evidence, and how many points it
 * set aside as man-made (their keys went into the wire finder's {@code SetAside} with the reason
 * OBJECT).
 *
 * @param objects every object of at least {@link ObjectLabeller#MIN_OBJECT_POINTS} points
 * @param pointsLooked points the labelling looked at
 * @param pointsSetAside points of objects taken to be man-made
 * @param echoesInformative whether the survey's return numbers were used
 * @param doubted the survey's labels looked at and not trusted
 */
public record ObjectLabels(List<LabelledObject> objects, long pointsLooked, long pointsSetAside,
    boolean echoesInformative, Doubted doubted) {

  /** Nothing looked at (a labelled survey). */
  public static final ObjectLabels NONE = new ObjectLabels(List.of(), 0, 0, false,
      new Doubted(0, 0, 0));

  /**
   * Labels the step weighed and did not trust (issue 9: existing labels are used only as far as
   * they are consistent).
   *
   * @param vegetationLabels points labelled vegetation (3-5) looked at (partly labelled survey)
   * @param vegetationLabelsSetAside of them, points of an object the evidence shows man-made or
   *     linear: the label is not trusted and the point is set aside
   * @param groundLabelsDoubted class-2 points more than
   *     {@link ObjectLabeller#GROUND_LABEL_MAX_HEIGHT_M} above the ground model, looked at as
   *     unclassified (measured as vegetation unless the evidence says otherwise)
   */
  public record Doubted(long vegetationLabels, long vegetationLabelsSetAside,
      long groundLabelsDoubted) {}

  public ObjectLabels {
    objects = List.copyOf(objects);
  }

  /** One line for the console and the run record. */
  public String describe() {
    long mast = objects.stream().filter(o -> o.kind() == ObjectKind.MAST).count();
    long planar = objects.stream().filter(o -> o.kind() == ObjectKind.PLANAR).count();
    long linear = objects.stream().filter(o -> o.kind() == ObjectKind.LINEAR).count();
    String text = String.format(java.util.Locale.ROOT, "%,d points in %d objects"
        + " looked at; %d mast-like, %d planar and %d linear objects (%,d points) set aside as"
        + " man-made; echoes %s", pointsLooked, objects.size(), mast, planar, linear,
        pointsSetAside, echoesInformative ? "used" : "not recorded, geometry only");
    if (doubted.vegetationLabels() > 0) {
      text += String.format(java.util.Locale.ROOT, "; vegetation labels looked at %,d, not"
          + " trusted %,d", doubted.vegetationLabels(), doubted.vegetationLabelsSetAside());
    }
    if (doubted.groundLabelsDoubted() > 0) {
      text += String.format(java.util.Locale.ROOT, "; ground labels more than %.1f m above the"
          + " ground not trusted %,d (read as unclassified)",
          ObjectLabeller.GROUND_LABEL_MAX_HEIGHT_M, doubted.groundLabelsDoubted());
    }
    return text;
  }
}
