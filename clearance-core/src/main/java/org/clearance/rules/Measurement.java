package org.clearance.rules;

import java.util.EnumSet;
import java.util.Objects;
import java.util.Set;
import org.clearance.line.PoleEquipment;

/**
 * How a zone measures a point: by its radial (true 3D) distance to the conductor, by the
 * horizontal and vertical components of that distance separately, or (a pole-clearing zone) by
 * its plan distance from a structure centre and its height above ground.
 */
public sealed interface Measurement
    permits Measurement.Radial, Measurement.Components, Measurement.PoleCylinder {

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

  /**
   * A pole-clearing zone (issue 15; California PRC 4292 and 14 CCR 1254, docs/references.md R7):
   * a vertical cylinder around each structure that carries one of the listed kinds of
   * equipment. A point is inside when its plan distance from the structure centre is less than
   * {@link #reachM()} and its height above ground is at least {@code fromHeightM} and less than
   * {@code toHeightM}. The zone does not measure from conductors and ignores line conditions.
   *
   * @param radiusM clearing radius from the pole's outer surface, m (&gt; 0)
   * @param poleRadiusM radius of the pole taken from the structure centre to its outer surface,
   *     m (&gt;= 0): the structures file gives centres, not diameters
   * @param fromHeightM lower edge of the height band above ground, m (&gt;= 0)
   * @param toHeightM upper edge of the band, m (&gt; fromHeightM)
   * @param equipment the equipment kinds that make a structure subject to the zone (at least one)
   */
  record PoleCylinder(double radiusM, double poleRadiusM, double fromHeightM, double toHeightM,
      Set<PoleEquipment> equipment) implements Measurement {
    public PoleCylinder {
      if (!(Double.isFinite(radiusM) && radiusM > 0 && Double.isFinite(poleRadiusM)
          && poleRadiusM >= 0 && Double.isFinite(fromHeightM) && fromHeightM >= 0
          && Double.isFinite(toHeightM) && toHeightM > fromHeightM)) {
        throw new IllegalArgumentException("pole cylinder needs radius > 0, pole radius >= 0 "
            + "and 0 <= from height < to height: " + radiusM + ", " + poleRadiusM + ", "
            + fromHeightM + ", " + toHeightM);
      }
      if (equipment.isEmpty()) {
        throw new IllegalArgumentException("a pole cylinder names at least one equipment kind");
      }
      equipment = Set.copyOf(EnumSet.copyOf(equipment));
    }

    /** Plain words, e.g. {@code within 3.048 m of the pole's surface (pole radius 0.2 m) ...}. */
    public String describe() {
      java.util.List<String> kinds = equipment.stream().map(PoleEquipment::fileName).toList();
      return String.format(java.util.Locale.ROOT, "vegetation from %s m to below %s m above "
          + "ground within %s m of the structure's surface (%s m from its centre, pole radius "
          + "%s m), at structures carrying %s", VoltageBand.trim(fromHeightM),
          VoltageBand.trim(toHeightM), VoltageBand.trim(radiusM), VoltageBand.trim(reachM()),
          VoltageBand.trim(poleRadiusM), String.join(", ", kinds));
    }

    /** Plan distance from the structure centre within which a point is inside, m. */
    public double reachM() {
      return radiusM + poleRadiusM;
    }

    /** Whether a structure carrying {@code carried} is subject to the zone. */
    public boolean appliesTo(Set<PoleEquipment> carried) {
      for (PoleEquipment e : carried) {
        if (equipment.contains(e)) {
          return true;
        }
      }
      return false;
    }

    /**
     * Whether a point is inside the cylinder.
     *
     * @param planDistanceM plan distance from the structure centre, m
     * @param heightAboveGroundM height above ground, m (NaN: not known, never inside)
     */
    public boolean inside(double planDistanceM, double heightAboveGroundM) {
      return planDistanceM < reachM() && heightAboveGroundM >= fromHeightM
          && heightAboveGroundM < toHeightM;
    }
  }
}
