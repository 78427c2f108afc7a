package org.clearance.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.clearance.rules.DistanceSpec;
import org.clearance.rules.DistanceTable;
import org.clearance.rules.GrowthRates;
import org.clearance.rules.Measurement;
import org.clearance.rules.ProfileOrigin;
import org.clearance.rules.RuleExplainer;
import org.clearance.rules.RuleProfile;
import org.clearance.rules.Zone;

/**
 * Plain text of a resolved rule profile (its own values merged over those it extends), for
 * {@code clearance rules show}: names, sources, cautions, zones with their distances as the
 * profile gives them, growth, trim cycle and fall-in. Distances in metres.
 */
public final class ProfileText {

  private ProfileText() {}

  /** The profile as several lines of text, each ending in a newline. */
  public static String describe(RuleProfile p) {
    StringBuilder b = new StringBuilder();
    line(b, "Rule profile %s: %s", p.name(), p.title());
    line(b, "  from: %s", p.origins().get(0).location());
    if (p.origins().size() > 1) {
      List<String> chain = new ArrayList<>();
      p.origins().forEach(o -> chain.add(o.name()));
      line(b, "  builds on: %s", String.join(" -> ", chain));
    }
    line(b, "  content SHA-256: %s", p.contentHash());
    line(b, "  covers: lines of %s kV and above%s", OutputUnit.plain(p.appliesFromKv()),
        p.coveredLines().isEmpty() ? "" : "; also lines "
            + String.join(", ", p.coveredLines().stream().sorted().toList()));
    b.append('\n');
    line(b, "Zones, most urgent first (distances in metres):");
    for (Zone z : p.zones()) {
      line(b, "  [%d] %s%s", z.priority(), z.name(),
          z.violationReference() ? " - violation reference (the governing minimum)" : "");
      if (!z.note().isEmpty()) {
        line(b, "      %s", oneLine(z.note()));
      }
      if (z.measurement() instanceof Measurement.PoleCylinder c) {
        line(b, "      voltages: %s; pole clearing: %s", z.voltage().describe(), c.describe());
        continue;
      }
      line(b, "      voltages: %s; applies in: %s", z.voltage().describe(),
          z.conditions().describe());
      line(b, "      measured from: %s", RuleExplainer.roles(z));
      if (z.measurement() instanceof Measurement.Radial r) {
        line(b, "      radial: %s", spec(r.radial()));
      } else if (z.measurement() instanceof Measurement.Components c) {
        line(b, "      horizontal: %s", spec(c.horizontal()));
        line(b, "      vertical: %s", spec(c.vertical()));
      }
      if (!z.allowance().isNone()) {
        line(b, "      mid-span allowance: %s", z.allowance().describe());
      }
    }
    b.append('\n');
    if (p.growth().isEmpty()) {
      line(b, "Growth: none given (years to violation are not computed)");
    } else {
      GrowthRates g = p.growth().get();
      line(b, "Growth, m/year (up / sideways):");
      for (Map.Entry<Integer, GrowthRates.Rate> e : new TreeMap<>(g.byClass()).entrySet()) {
        line(b, "  class %d: %s / %s", e.getKey(), OutputUnit.plain(e.getValue()
            .verticalMPerYear()), OutputUnit.plain(e.getValue().lateralMPerYear()));
      }
      line(b, "  other classes: %s / %s", OutputUnit.plain(g.fallback().verticalMPerYear()),
          OutputUnit.plain(g.fallback().lateralMPerYear()));
    }
    line(b, "Trim cycle: %s", Double.isFinite(p.trimCycleYears())
        ? OutputUnit.plain(p.trimCycleYears()) + " years" : "not given");
    if (p.fallIn().enabled()) {
      line(b, "Fall-in: checked in %s; reach = tree height + %s",
          p.fallIn().conditions().describe(), spec(p.fallIn().allowance()));
    } else {
      line(b, "Fall-in: not part of the profile");
    }
    b.append('\n');
    line(b, "Sources:");
    for (ProfileOrigin o : p.origins()) {
      line(b, "  %s (%s): %s", o.name(), o.location(), oneLine(o.source()));
    }
    for (ProfileOrigin o : p.origins()) {
      if (!o.cautions().isEmpty()) {
        line(b, "Cautions of %s: %s", o.name(), oneLine(o.cautions()));
      }
    }
    return b.toString();
  }

  /** A distance as the profile gives it. */
  static String spec(DistanceSpec d) {
    if (d instanceof DistanceSpec.Fixed f) {
      return OutputUnit.plain(f.metres()) + " m";
    }
    if (d instanceof DistanceSpec.Relative r) {
      String s = "the distance of zone " + r.zone();
      if (r.plusM() > 0) {
        s += " + " + OutputUnit.plain(r.plusM()) + " m";
      }
      if (r.plusCycleGrowth()) {
        s += " + one trim cycle of the fastest growth";
      }
      return s;
    }
    DistanceTable t = (DistanceTable) d;
    List<String> rows = new ArrayList<>();
    for (DistanceTable.Row row : t.rows()) {
      List<String> ms = row.metres().stream().map(OutputUnit::plain).toList();
      rows.add(row.band().describe() + ": " + String.join(" / ", ms) + " m");
    }
    String s = "by voltage - " + String.join("; ", rows);
    if (t.altitudeBanded()) {
      s += " (altitude bands up to " + String.join(", ", t.altitudeTopsM().stream()
          .map(OutputUnit::plain).toList()) + " m"
          + (Double.isNaN(t.risePercentPerKm()) ? "" : "; higher bands approximated at +"
              + OutputUnit.plain(t.risePercentPerKm()) + " % per 1000 m") + ")";
    }
    return s;
  }

  private static String oneLine(String text) {
    return text.strip().replaceAll("\\s+", " ");
  }

  private static void line(StringBuilder b, String format, Object... args) {
    b.append(Html.f(format, args)).append('\n');
  }
}
