package org.clearance.rules;

import java.util.Objects;

/**
 * How a zone measures a point: by its radial (true 3D) distance to the conductor, or by the
 * horizontal and vertical components of that distance separately.
 */
public sealed interface Measurement permits Measurement.Radial, Measurement.Components {

  /**
   * A point is inside the zone when its 3D distance to the nearest conductor is less than the
   * required distance.
   *
   * @param radial the required distance
   */
  record Radial(DistanceSpec radial) implements Measurement {
    public Radial {
      Objects.requireNonNull(radial, "radial");
    }
  }

  /**
   * A point is inside the zone when its plan distance to the nearest conductor point is less than
   * the horizontal distance AND the absolute height difference is less than the vertical
   * distance: the zone is a box around the conductor in the plane across it. A point leaves the
   * zone when either component is cleared.
   *
   * @param horizontal the required horizontal distance
   * @param vertical the required vertical distance (above and below the conductor)
   */
  record Components(DistanceSpec horizontal, DistanceSpec vertical) implements Measurement {
    public Components {
      Objects.requireNonNull(horizontal, "horizontal");
      Objects.requireNonNull(vertical, "vertical");
    }
  }
}
