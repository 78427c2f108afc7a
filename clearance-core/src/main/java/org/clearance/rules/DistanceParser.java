package org.clearance.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.clearance.io.ValueRange;
import org.clearance.io.YamlMap;
import org.yaml.snakeyaml.nodes.Node;
import org.yaml.snakeyaml.nodes.ScalarNode;
import org.yaml.snakeyaml.nodes.SequenceNode;

/** Parses the distance-related parts of a profile: distances, tables, voltage bands. */
final class DistanceParser {

  private static final Set<String> TABLE_KEYS =
      Set.of("by_voltage", "altitude_tops_m", "approx_rise_percent_per_km");
  private static final Set<String> RELATIVE_KEYS =
      Set.of("based_on_zone", "plus_m", "plus_cycle_growth");
  private static final Set<String> ROW_KEYS = Set.of("min_kv", "below_kv", "max_kv", "m");
  private static final Set<String> BAND_KEYS = Set.of("min_kv", "below_kv", "max_kv");
  private static final Set<String> ALLOWANCE_KEYS =
      Set.of("middle_fraction", "add_m_per_100m", "beyond_span_m");

  /** Where the ranges below come from. */
  private static final String PRACTICE = "vegetation clearance rules, common practice, no source";
  /**
   * Plausible distance of a rule, m: clearance distances are metres to tens of metres (the
   * largest are fall-in reaches and right-of-way widths); 0 only where a distance may be zero.
   */
  static final ValueRange DISTANCE = new ValueRange(0, 200, "m", PRACTICE);
  /** Plausible voltage band edge, kV: the highest AC lines in service run at 1 150 kV. */
  static final ValueRange VOLTAGE = new ValueRange(0, 2000, "kV", PRACTICE);
  /** Plausible altitude band top, m: the highest ground with lines is about 5 500 m. */
  static final ValueRange ALTITUDE = new ValueRange(-500, 9000, "m", PRACTICE);
  /** Plausible rise of a distance with altitude, percent per km. */
  static final ValueRange RISE = new ValueRange(0, 100, "percent per km", PRACTICE);
  /** Plausible midspan allowance rate, m per 100 m of span. */
  static final ValueRange RATE = new ValueRange(0, 10, "m per 100 m", PRACTICE);

  private DistanceParser() {}

  /**
   * A distance: a number (fixed metres), a mapping with {@code by_voltage} (a table) or a
   * mapping with {@code based_on_zone} (relative).
   *
   * @param allowZero whether a fixed distance of zero is accepted
   */
  static DistanceSpec distance(YamlMap.Entry entry, boolean allowZero) {
    if (entry.value() instanceof ScalarNode) {
      double m = allowZero ? entry.nonNegative() : entry.positive();
      return new DistanceSpec.Fixed(entry.within(DISTANCE));
    }
    YamlMap map = entry.map();
    if (map.has("by_voltage")) {
      map.checkKeys(TABLE_KEYS);
      return table(map);
    }
    if (map.has("based_on_zone")) {
      map.checkKeys(RELATIVE_KEYS);
      String zone = map.required("based_on_zone").text();
      double plus = map.optional("plus_m").map(e -> e.within(DISTANCE)).orElse(0.0);
      boolean growth = map.optional("plus_cycle_growth").map(YamlMap.Entry::bool).orElse(false);
      return new DistanceSpec.Relative(zone, plus, growth);
    }
    throw entry.error("a distance is a number of metres, or a mapping with 'by_voltage' (a "
        + "table) or 'based_on_zone' (another zone's distance plus margins)");
  }

  private static DistanceTable table(YamlMap map) {
    List<Double> tops = new ArrayList<>();
    YamlMap.Entry topsEntry = map.optional("altitude_tops_m").orElse(null);
    if (topsEntry != null) {
      for (Node item : topsEntry.items()) {
        double top = topsEntry.withinOf(item, ALTITUDE);
        if (!tops.isEmpty() && !(top > tops.get(tops.size() - 1))) {
          throw topsEntry.error(item, "altitude band tops must increase");
        }
        tops.add(top);
      }
    }
    double rise = Double.NaN;
    YamlMap.Entry riseEntry = map.optional("approx_rise_percent_per_km").orElse(null);
    if (riseEntry != null) {
      if (tops.size() < 2) {
        throw riseEntry.error("an altitude rise needs at least two altitude bands "
            + "(altitude_tops_m)");
      }
      rise = riseEntry.within(RISE);
    }
    int columns = riseEntry != null ? 1 : Math.max(1, tops.size());
    List<DistanceTable.Row> rows = new ArrayList<>();
    YamlMap.Entry rowsEntry = map.required("by_voltage");
    for (Node item : rowsEntry.items()) {
      YamlMap row = YamlMap.of(item, map.file(), "by_voltage");
      row.checkKeys(ROW_KEYS);
      VoltageBand band = band(row);
      YamlMap.Entry m = row.required("m");
      List<Double> metres = new ArrayList<>();
      List<Node> values = m.value() instanceof SequenceNode ? m.items() : List.of(m.value());
      for (Node v : values) {
        m.positiveOf(v);
        metres.add(m.withinOf(v, DISTANCE));
      }
      if (metres.size() != columns) {
        throw m.error("expected " + columns + (columns == 1 ? " distance" : " distances (one per "
            + "altitude band)") + ", found " + metres.size());
      }
      for (DistanceTable.Row earlier : rows) {
        if (earlier.band().overlaps(band)) {
          throw row.required("min_kv").error("voltage band " + band.describe()
              + " overlaps the row " + earlier.band().describe());
        }
      }
      rows.add(new DistanceTable.Row(band, metres));
    }
    if (rows.isEmpty()) {
      throw rowsEntry.error("a table needs at least one row");
    }
    return new DistanceTable(rows, tops, rise);
  }

  /** A voltage band from {@code min_kv} and one of {@code below_kv} / {@code max_kv}. */
  static VoltageBand band(YamlMap map) {
    double min = map.optional("min_kv").map(e -> e.within(VOLTAGE)).orElse(0.0);
    YamlMap.Entry below = map.optional("below_kv").orElse(null);
    YamlMap.Entry max = map.optional("max_kv").orElse(null);
    if (below != null && max != null) {
      throw max.error("give either below_kv (upper edge excluded) or max_kv (included), not both");
    }
    YamlMap.Entry upper = below != null ? below : max;
    if (upper == null) {
      return new VoltageBand(min, Double.POSITIVE_INFINITY, false);
    }
    double top = upper.within(VOLTAGE);
    if (!(top > min)) {
      throw upper.error("must be greater than min_kv (" + YamlMap.fmt(min) + ")");
    }
    return new VoltageBand(min, top, max != null);
  }

  /** A zone's {@code voltage} mapping. */
  static VoltageBand zoneBand(YamlMap.Entry entry) {
    YamlMap map = entry.map();
    map.checkKeys(BAND_KEYS);
    return band(map);
  }

  /** A zone's {@code midspan_allowance} mapping. */
  static MidspanAllowance allowance(YamlMap.Entry entry) {
    YamlMap map = entry.map();
    map.checkKeys(ALLOWANCE_KEYS);
    YamlMap.Entry fraction = map.required("middle_fraction");
    double f = fraction.positive();
    if (f > 1) {
      throw fraction.error("must be at most 1 (the whole span)");
    }
    double rate = map.required("add_m_per_100m").within(RATE);
    double beyond = map.optional("beyond_span_m").map(e -> e.within(DISTANCE)).orElse(0.0);
    return new MidspanAllowance(f, rate, beyond);
  }
}
