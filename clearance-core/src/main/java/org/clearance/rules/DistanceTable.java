package org.clearance.rules;

import java.util.List;
import java.util.Locale;
import java.util.Objects;

/**
 * A clearance distance tabulated by voltage band (rows) and altitude band (columns), the form of
 * the NERC FAC-003 minimum vegetation clearance distance table.
 *
 * <p>Altitude bands are given by their upper edges: band 0 holds every altitude up to and
 * including {@code altitudeTopsM[0]} (also below sea level), band k every altitude above
 * {@code altitudeTopsM[k-1]} up to and including {@code altitudeTopsM[k]}. An altitude above the
 * last edge is outside the table. A table without edges has one column for every altitude.
 *
 * <p>When {@code risePercentPerKm} is a number, rows hold only the first column and the others
 * are an approximation: the value of band k &gt;= 1 is the first column times
 * {@code 1 + risePercentPerKm / 100 * top_k / 1000 m}, taking the band's upper edge so that the
 * approximation errs on the large side within a band. Profiles that use it must say it is an
 * approximation and that the source's own table governs.
 *
 * @param rows rows in file order; their voltage bands do not overlap
 * @param altitudeTopsM upper edges of the altitude bands, m, strictly increasing (may be empty)
 * @param risePercentPerKm approximate rise of the distance with altitude, % per 1000 m, or NaN
 *     when every row holds a value per altitude band
 */
public record DistanceTable(List<Row> rows, List<Double> altitudeTopsM, double risePercentPerKm)
    implements DistanceSpec {

  /**
   * One voltage band of the table.
   *
   * @param band the voltage band
   * @param metres distance per altitude band, m (each &gt; 0)
   */
  public record Row(VoltageBand band, List<Double> metres) {
    public Row {
      Objects.requireNonNull(band, "band");
      metres = List.copyOf(metres);
      if (metres.isEmpty()) {
        throw new IllegalArgumentException("a table row needs at least one distance");
      }
      for (double m : metres) {
        if (!(Double.isFinite(m) && m > 0)) {
          throw new IllegalArgumentException("table distances must be positive: " + m);
        }
      }
    }
  }

  public DistanceTable {
    rows = List.copyOf(rows);
    altitudeTopsM = List.copyOf(altitudeTopsM);
    int columns = Double.isNaN(risePercentPerKm) ? Math.max(1, altitudeTopsM.size()) : 1;
    for (Row row : rows) {
      if (row.metres().size() != columns) {
        throw new IllegalArgumentException("each row needs " + columns + " distances");
      }
    }
    if (!Double.isNaN(risePercentPerKm) && !(risePercentPerKm >= 0 && altitudeTopsM.size() > 1)) {
      throw new IllegalArgumentException("an altitude rise needs >= 0 and altitude bands");
    }
  }

  /** Whether the distance depends on altitude. */
  public boolean altitudeBanded() {
    return altitudeTopsM.size() > 1;
  }

  /** The row holding a voltage, or null. */
  Row rowFor(double kv) {
    for (Row row : rows) {
      if (row.band().contains(kv)) {
        return row;
      }
    }
    return null;
  }

  /**
   * The tabulated distance for a line.
   *
   * @param kv nominal voltage, kV
   * @param altitudeM line altitude above sea level, m (NaN when unknown)
   */
  Lookup lookup(double kv, double altitudeM) {
    Row row = rowFor(kv);
    if (row == null) {
      return Lookup.fail("the distance table has no row for " + VoltageBand.kv(kv));
    }
    String rowText = "table row " + row.band().describe();
    if (!altitudeBanded()) {
      return Lookup.ok(row.metres().get(0), rowText);
    }
    if (Double.isNaN(altitudeM)) {
      return Lookup.fail("the distance depends on altitude and the line altitude is unknown");
    }
    int band = 0;
    while (band < altitudeTopsM.size() && altitudeM > altitudeTopsM.get(band)) {
      band++;
    }
    if (band == altitudeTopsM.size()) {
      return Lookup.fail(String.format(Locale.ROOT,
          "altitude %.1f m is above the table's highest band (up to %.1f m)",
          altitudeM, altitudeTopsM.get(band - 1)));
    }
    String bandText = band == 0
        ? String.format(Locale.ROOT, "altitude band up to %.1f m", altitudeTopsM.get(0))
        : String.format(Locale.ROOT, "altitude band %.1f m to %.1f m",
            altitudeTopsM.get(band - 1), altitudeTopsM.get(band));
    if (Double.isNaN(risePercentPerKm) || band == 0) {
      int column = Double.isNaN(risePercentPerKm) ? band : 0;
      return Lookup.ok(row.metres().get(column), rowText + ", " + bandText);
    }
    double top = altitudeTopsM.get(band);
    double factor = 1 + risePercentPerKm / 100 * top / 1000;
    return Lookup.ok(row.metres().get(0) * factor, String.format(Locale.ROOT,
        "%s, %s: first column x %.4f (APPROXIMATE altitude rise of %s %% per 1000 m)",
        rowText, bandText, factor, VoltageBand.trim(risePercentPerKm)));
  }

  /**
   * A resolved distance or the reason it could not be resolved.
   *
   * @param metres the distance, m, or NaN on failure
   * @param basis how the distance was found (plain words), or null on failure
   * @param failure why there is no distance, or null on success
   */
  record Lookup(double metres, String basis, String failure) {
    static Lookup ok(double metres, String basis) {
      return new Lookup(metres, basis, null);
    }

    static Lookup fail(String failure) {
      return new Lookup(Double.NaN, null, failure);
    }

    boolean failed() {
      return failure != null;
    }
  }
}
