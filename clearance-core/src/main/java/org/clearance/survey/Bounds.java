package org.clearance.survey;

/**
 * An axis-aligned box; the unit is stated by whoever returns it (metres from {@link Survey},
 * file units from {@link SurveySummary}). All values are NaN when there are no points.
 *
 * @param minX smallest x
 * @param minY smallest y
 * @param minZ smallest z
 * @param maxX largest x
 * @param maxY largest y
 * @param maxZ largest z
 */
public record Bounds(
    double minX, double minY, double minZ, double maxX, double maxY, double maxZ) {

  /** The box of no points: all NaN. */
  public static Bounds empty() {
    return new Bounds(Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
  }

  /** True when the box holds no points (its values are NaN). */
  public boolean isEmpty() {
    return Double.isNaN(minX);
  }

  /** The smallest box holding this box and {@code o}. */
  public Bounds union(Bounds o) {
    if (isEmpty()) {
      return o;
    }
    if (o.isEmpty()) {
      return this;
    }
    return new Bounds(Math.min(minX, o.minX), Math.min(minY, o.minY), Math.min(minZ, o.minZ),
        Math.max(maxX, o.maxX), Math.max(maxY, o.maxY), Math.max(maxZ, o.maxZ));
  }
}
