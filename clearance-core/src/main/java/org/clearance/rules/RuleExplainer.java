package org.clearance.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.clearance.clearance.SpanContext;
import org.clearance.line.ConductorPosition.Role;

/**
 * Plain-text explanation of which zones and distances a rule profile applies to a span, and
 * why: voltage band, altitude band, mid-span allowance, conditions and sources.
 */
public final class RuleExplainer {

  private static final String INDENT = "      ";

  private RuleExplainer() {}

  /**
   * Explains a profile for one span.
   *
   * @param profile the profile
   * @param span the span
   * @return several lines of text, each ending in a newline
   */
  public static String explain(RuleProfile profile, SpanContext span) {
    if (span.multiVoltage()) {
      // issue 15: each circuit is held to the zones of its own voltage
      StringBuilder out = new StringBuilder();
      line(out, "Span %s carries %d voltages; each conductor is checked against the zones of "
          + "its circuit's voltage.", span.spanId(), span.voltagesKv().size());
      for (CircuitRules.Part part : CircuitRules.forSpan(new ZoneEvaluator(profile), span)
          .parts()) {
        out.append('\n');
        line(out, "== Conductors at %s ==", part.describe());
        out.append(explain(profile, span.atVoltage(part.kv())));
      }
      return out.toString();
    }
    SpanRules rules = new ZoneEvaluator(profile).forSpan(span);
    StringBuilder out = new StringBuilder();
    line(out, "Span %s of line %s: %s, altitude %s, plan length %.1f m", span.spanId(),
        span.lineId(), VoltageBand.kv(span.nominalVoltageKv()),
        Double.isNaN(span.altitudeM()) ? "unknown"
            : String.format(Locale.ROOT, "%.1f m", span.altitudeM()), span.lengthM());
    line(out, "Rule profile %s: %s", profile.name(), profile.title());
    if (profile.origins().size() > 1) {
      List<String> chain = new ArrayList<>();
      for (ProfileOrigin o : profile.origins()) {
        chain.add(o.name());
      }
      line(out, "  builds on: %s", String.join(" -> ", chain));
    }
    line(out, "  content SHA-256: %s", profile.contentHash());
    if (profile.appliesFromKv() > 0) {
      line(out, "  covers lines of %s and above%s", VoltageBand.kv(profile.appliesFromKv()),
          profile.coveredLines().isEmpty() ? ""
              : ", and lines " + String.join(", ", profile.coveredLines().stream().sorted()
                  .toList()));
      if (span.nominalVoltageKv() < profile.appliesFromKv()
          && profile.coveredLines().contains(span.lineId())) {
        line(out, "  line %s is covered below that voltage: it is listed under covered_lines",
            span.lineId());
      }
    }
    line(out, "Result: %s", rules.notAssessedReason().map(r -> "NOT ASSESSED - " + r)
        .orElse("assessed"));
    out.append('\n');
    if (!rules.zones().isEmpty()) {
      line(out, "Zones in force, most urgent first:");
      for (ResolvedZone z : rules.zones()) {
        zone(out, z, span);
      }
    }
    if (!rules.poleZones().isEmpty()) {
      line(out, "Pole-clearing zones at this span's structures, most urgent first:");
      for (Zone z : rules.poleZones()) {
        line(out, "  [%d] %s: %s", z.priority(), z.name(),
            ((Measurement.PoleCylinder) z.measurement()).describe());
      }
    }
    if (!rules.gaps().isEmpty()) {
      line(out, "Zones that apply but cannot be assessed:");
      for (ZoneGap g : rules.gaps()) {
        line(out, "  %s: %s", g.zone(), g.reason());
      }
    }
    if (!rules.outOfBand().isEmpty()) {
      line(out, "Zones that do not apply here:");
      for (Zone z : rules.outOfBand()) {
        line(out, "  [%d] %s: for %s", z.priority(), z.name(), z.voltage().describe());
      }
    }
    out.append('\n');
    fallIn(out, profile, rules);
    growth(out, profile);
    line(out, "Sources:");
    for (ProfileOrigin o : profile.origins()) {
      line(out, "  %s (%s): %s", o.name(), o.location(), oneLine(o.source()));
    }
    List<ProfileOrigin> cautions =
        profile.origins().stream().filter(o -> !o.cautions().isEmpty()).toList();
    if (!cautions.isEmpty()) {
      line(out, "Cautions:");
      for (ProfileOrigin o : cautions) {
        line(out, "  %s: %s", o.name(), oneLine(o.cautions()));
      }
    }
    return out.toString();
  }

  private static void zone(StringBuilder out, ResolvedZone rz, SpanContext span) {
    Zone z = rz.zone();
    line(out, "  [%d] %s%s", z.priority(), z.name(),
        z.violationReference() ? " - violation reference (the governing minimum)" : "");
    if (!z.note().isEmpty()) {
      line(out, "%s%s", INDENT, oneLine(z.note()));
    }
    if (z.voltage().equals(VoltageBand.ALL)) {
      line(out, "%svoltage: every voltage the profile covers", INDENT);
    } else {
      line(out, "%svoltage band: %s, which holds %s", INDENT, z.voltage().describe(),
          VoltageBand.kv(span.nominalVoltageKv()));
    }
    line(out, "%sapplies in: %s", INDENT, z.conditions().describe());
    line(out, "%smeasured from: %s", INDENT, roles(z));
    if (rz.radial().isPresent()) {
      line(out, "%sinside when the 3D distance to a conductor is less than %s", INDENT,
          distance(rz.radial().get(), span));
      line(out, "%s  (%s)", INDENT, rz.radial().get().basis());
    } else {
      line(out, "%sinside when the horizontal distance is less than %s", INDENT,
          distance(rz.horizontal().orElseThrow(), span));
      line(out, "%s  (%s)", INDENT, rz.horizontal().get().basis());
      line(out, "%s  AND the height difference is less than %s", INDENT,
          distance(rz.vertical().orElseThrow(), span));
      line(out, "%s  (%s)", INDENT, rz.vertical().get().basis());
    }
    if (!z.allowance().isNone()) {
      MidspanAllowance a = z.allowance();
      double margin = span.lengthM() * (1 - a.middleFraction()) / 2;
      line(out, "%smid-span allowance: %s; here + %.3f m from station %.1f m to %.1f m",
          INDENT, a.describe(), a.fullAllowance(span.lengthM()), margin,
          span.lengthM() - margin);
    }
  }

  /** The conductor roles a zone is measured from, in words. */
  public static String roles(Zone z) {
    List<String> out = new ArrayList<>();
    if (z.roles().contains(Role.PHASE)) {
      out.add("energised (phase) conductors");
    }
    if (z.roles().contains(Role.NEUTRAL)) {
      out.add("neutral and secondary conductors");
    }
    if (z.roles().contains(Role.SHIELD)) {
      out.add("shield wires");
    }
    String s = String.join(", ", out);
    return z.roles().contains(Role.SHIELD) && z.roles().contains(Role.NEUTRAL) ? s
        : s + " (not " + (z.roles().contains(Role.NEUTRAL) ? "shield wires"
        : z.roles().contains(Role.SHIELD) ? "neutrals" : "neutrals or shield wires") + ")";
  }

  /** The distance at the ends of the span, and in the middle when an allowance changes it. */
  private static String distance(ResolvedDistance d, SpanContext span) {
    double end = d.at(span.lengthM(), 0);
    double mid = d.at(span.lengthM(), span.lengthM() / 2);
    if (mid == end) {
      return String.format(Locale.ROOT, "%.3f m", end);
    }
    return String.format(Locale.ROOT, "%.3f m near the structures, %.3f m at mid-span", end, mid);
  }

  private static void fallIn(StringBuilder out, RuleProfile profile, SpanRules rules) {
    FallInRule rule = profile.fallIn();
    if (!rule.enabled()) {
      line(out, "Fall-in: not part of this profile");
      return;
    }
    Optional<ResolvedDistance> allowance = rules.fallInAllowance();
    line(out, "Fall-in: a tree can strike when its height plus %s reaches the nearest "
        + "conductor in %s", allowance.map(a -> a.basis()).orElse("an allowance that cannot "
        + "be resolved here"), rule.conditions().describe());
  }

  private static void growth(StringBuilder out, RuleProfile profile) {
    if (profile.growth().isEmpty()) {
      line(out, "Growth: the profile gives no growth rates; years to violation are not "
          + "computed");
    } else {
      GrowthRates g = profile.growth().get();
      Map<Integer, GrowthRates.Rate> sorted = new TreeMap<>(g.byClass());
      List<String> parts = new ArrayList<>();
      for (Map.Entry<Integer, GrowthRates.Rate> e : sorted.entrySet()) {
        parts.add("class " + e.getKey() + " " + rate(e.getValue()));
      }
      parts.add("other classes " + rate(g.fallback()));
      line(out, "Growth (m/year, up / sideways): %s", String.join("; ", parts));
    }
    if (Double.isFinite(profile.trimCycleYears())) {
      line(out, "Trim cycle: %s years", VoltageBand.trim(profile.trimCycleYears()));
    }
  }

  private static String rate(GrowthRates.Rate r) {
    return String.format(Locale.ROOT, "%.2f / %.2f", r.verticalMPerYear(), r.lateralMPerYear());
  }

  private static String oneLine(String text) {
    return text.strip().replaceAll("\\s+", " ");
  }

  private static void line(StringBuilder out, String format, Object... args) {
    out.append(String.format(Locale.ROOT, format, args)).append('\n');
  }
}
