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
 */
public record ObjectLabels(List<LabelledObject> objects, long pointsLooked, long pointsSetAside,
    boolean echoesInformative) {

  /** Nothing looked at (a labelled survey). */
  public static final ObjectLabels NONE = new ObjectLabels(List.of(), 0, 0, false);

  public ObjectLabels {
    objects = List.copyOf(objects);
  }

  /** One line for the console and the run record. */
  public String describe() {
    long mast = objects.stream().filter(o -> o.kind() == ObjectKind.MAST).count();
    long planar = objects.stream().filter(o -> o.kind() == ObjectKind.PLANAR).count();
    return String.format(java.util.Locale.ROOT, "%,d unclassified points in %d objects looked at;"
        + " %d mast-like and %d planar objects (%,d points) set aside as man-made; echoes %s",
        pointsLooked, objects.size(), mast, planar, pointsSetAside,
        echoesInformative ? "used" : "not recorded, geometry only");
  }
}
