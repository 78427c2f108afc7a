package org.clearance.examples;

import java.util.Objects;

/**
 * A building of the demo scene (truth): a rectangular footprint with a flat or a gable roof (ridge
 * along the length). Airborne pulses hit its roof only.
 *
 * @param id index in {@link DemoScene#buildings()}
 * @param x easting of the footprint centre, m
 * @param y northing of the footprint centre, m
 * @param lengthM footprint length, m
 * @param widthM footprint width, m
 * @param azimuthRad direction of the length axis, radians clockwise from grid north
 * @param baseZ floor elevation (lowest ground at the corners), m
 * @param eaveHeightM height of the eaves (flat roof: of the roof) above the base, m
 * @param ridgeHeightM height of the ridge above the base, m (= eaves for a flat roof)
 * @param roof roof shape
 * @param span index of the span whose corridor holds the building
 */
public record DemoBuilding(
    int id,
    double x,
    double y,
    double lengthM,
    double widthM,
    double azimuthRad,
    double baseZ,
    double eaveHeightM,
    double ridgeHeightM,
    Roof roof,
    int span) {

  /** Roof shape. */
  public enum Roof {
    FLAT,
    GABLE
  }

  public DemoBuilding {
    Objects.requireNonNull(roof, "roof");
  }

  /** Half the footprint diagonal, m. */
  public double halfDiagonalM() {
    return 0.5 * Math.hypot(lengthM, widthM);
  }

  private double along(double px, double py) {
    return (px - x) * Math.sin(azimuthRad) + (py - y) * Math.cos(azimuthRad);
  }

  private double across(double px, double py) {
    return -(px - x) * Math.cos(azimuthRad) + (py - y) * Math.sin(azimuthRad);
  }

  /** True when the plan point lies on the footprint. */
  public boolean contains(double px, double py) {
    double dx = px - x;
    double dy = py - y;
    double r = 0.5 * (lengthM + widthM); // cheap bound before the trigonometry
    if (dx * dx + dy * dy > r * r) {
      return false;
    }
    return Math.abs(along(px, py)) <= 0.5 * lengthM && Math.abs(across(px, py)) <= 0.5 * widthM;
  }

  /** Roof elevation at a plan point, m, or NaN off the footprint. */
  public double roofZ(double px, double py) {
    if (!contains(px, py)) {
      return Double.NaN;
    }
    if (roof == Roof.FLAT) {
      return baseZ + eaveHeightM;
    }
    double q = Math.abs(across(px, py)) / (0.5 * widthM);
    return baseZ + eaveHeightM + (ridgeHeightM - eaveHeightM) * (1 - q);
  }

  /** Easting of footprint corner k (0-3), m. */
  public double cornerX(int k) {
    double a = (k == 0 || k == 3 ? 0.5 : -0.5) * lengthM;
    double b = (k < 2 ? 0.5 : -0.5) * widthM;
    return x + a * Math.sin(azimuthRad) - b * Math.cos(azimuthRad);
  }

  /** Northing of footprint corner k (0-3), m. */
  public double cornerY(int k) {
    double a = (k == 0 || k == 3 ? 0.5 : -0.5) * lengthM;
    double b = (k < 2 ? 0.5 : -0.5) * widthM;
    return y + a * Math.cos(azimuthRad) + b * Math.sin(azimuthRad);
  }
}
