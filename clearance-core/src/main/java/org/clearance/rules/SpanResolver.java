package org.clearance.rules;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.clearance.clearance.SpanContext;

/**
 * Resolves a profile's zones for one span: which zones apply to its voltage, and their distances
 * at its voltage and altitude. Done once per span; points are then checked against the result.
 */
final class SpanResolver {

  private final RuleProfile profile;
  private final SpanContext span;
  /** Outcome per zone name, filled on demand (zones may build on each other). */
  private final Map<String, Outcome> outcomes = new HashMap<>();

  /** A resolved zone, or why it is not assessed; {@code applies} false when out of band. */
  private record Outcome(boolean applies, ResolvedZone resolved, String failure) {}

  /** A resolved distance or the reason it failed. */
  private record Part(ResolvedDistance distance, String failure) {}

  private SpanResolver(RuleProfile profile, SpanContext span) {
    this.profile = profile;
    this.span = span;
  }

  static SpanRules resolve(RuleProfile profile, SpanContext span) {
    return new SpanResolver(profile, span).run();
  }

  private SpanRules run() {
    if (!profile.covers(span.lineId(), span.nominalVoltageKv())) {
      return SpanRules.notAssessed(profile, span, String.format(Locale.ROOT,
          "profile %s covers lines of %s and above; line %s is %s and not listed under "
              + "covered_lines", profile.name(), VoltageBand.kv(profile.appliesFromKv()),
          span.lineId(), VoltageBand.kv(span.nominalVoltageKv())));
    }
    List<ResolvedZone> resolved = new ArrayList<>();
    List<ZoneGap> gaps = new ArrayList<>();
    List<Zone> outOfBand = new ArrayList<>();
    String referenceFailure = null;
    boolean referenceFound = false;
    List<Zone> poleZones = new ArrayList<>();
    for (Zone zone : profile.zones()) {
      if (zone.poleClearing()) {
        (zone.voltage().contains(span.nominalVoltageKv()) ? poleZones : outOfBand).add(zone);
        continue;
      }
      Outcome o = outcome(zone);
      if (!o.applies()) {
        outOfBand.add(zone);
      } else if (o.failure() != null) {
        gaps.add(new ZoneGap(zone.name(), o.failure()));
        if (zone.violationReference()) {
          referenceFailure = "violation-reference zone " + zone.name() + ": " + o.failure();
        }
      } else {
        resolved.add(o.resolved());
        referenceFound |= zone.violationReference();
      }
    }
    Optional<ResolvedDistance> fallIn = Optional.empty();
    String fallInFailure = null;
    if (profile.fallIn().enabled()) {
      Part p = part(profile.fallIn().allowance(), "radial_m", MidspanAllowance.NONE);
      fallIn = Optional.ofNullable(p.distance());
      fallInFailure = p.failure();
    }
    if (referenceFailure == null && !referenceFound) {
      List<String> bands = new ArrayList<>();
      for (Zone z : profile.referenceZones()) {
        bands.add(z.name() + ": " + z.voltage().describe());
      }
      referenceFailure = "no violation-reference zone of profile " + profile.name()
          + " covers " + VoltageBand.kv(span.nominalVoltageKv()) + " (" + String.join("; ", bands)
          + ")";
    }
    return new SpanRules(profile, span, Optional.ofNullable(referenceFailure), resolved, gaps,
        outOfBand, fallIn, Optional.ofNullable(fallInFailure), poleZones);
  }

  private Outcome outcome(Zone zone) {
    Outcome known = outcomes.get(zone.name());
    if (known != null) {
      return known;
    }
    Outcome o;
    if (!zone.voltage().contains(span.nominalVoltageKv())) {
      o = new Outcome(false, null, null);
    } else if (zone.measurement() instanceof Measurement.Radial r) {
      Part p = part(r.radial(), "radial_m", zone.allowance());
      o = p.failure() != null ? new Outcome(true, null, p.failure())
          : new Outcome(true, new ResolvedZone(zone, Optional.of(p.distance()), Optional.empty(),
              Optional.empty()), null);
    } else {
      Measurement.Components c = (Measurement.Components) zone.measurement();
      Part h = part(c.horizontal(), "horizontal_m", zone.allowance());
      Part v = part(c.vertical(), "vertical_m", zone.allowance());
      String failure = h.failure() != null ? h.failure() : v.failure();
      o = failure != null ? new Outcome(true, null, failure)
          : new Outcome(true, new ResolvedZone(zone, Optional.empty(),
              Optional.of(h.distance()), Optional.of(v.distance())), null);
    }
    outcomes.put(zone.name(), o);
    return o;
  }

  /**
   * One distance of a zone. Relative distances were checked for cycles and kinds when the
   * profile was read, so the recursion ends.
   */
  private Part part(DistanceSpec spec, String component, MidspanAllowance own) {
    List<MidspanAllowance> allowances = new ArrayList<>();
    allowances.add(own);
    if (spec instanceof DistanceSpec.Fixed f) {
      return new Part(new ResolvedDistance(f.metres(), allowances, "fixed "
          + metres(f.metres())), null);
    }
    if (spec instanceof DistanceTable t) {
      DistanceTable.Lookup lookup = t.lookup(span.nominalVoltageKv(), span.altitudeM());
      if (lookup.failed()) {
        return new Part(null, lookup.failure());
      }
      return new Part(new ResolvedDistance(lookup.metres(), allowances,
          metres(lookup.metres()) + " from " + lookup.basis()), null);
    }
    DistanceSpec.Relative rel = (DistanceSpec.Relative) spec;
    Zone target = profile.zone(rel.zone()).orElseThrow();
    Outcome o = outcome(target);
    if (!o.applies()) {
      return new Part(null, "its distance builds on zone " + target.name()
          + ", which does not apply to " + VoltageBand.kv(span.nominalVoltageKv()));
    }
    if (o.failure() != null) {
      return new Part(null, "its distance builds on zone " + target.name() + ": " + o.failure());
    }
    ResolvedDistance base = (component.equals("radial_m") ? o.resolved().radial()
        : component.equals("horizontal_m") ? o.resolved().horizontal()
        : o.resolved().vertical()).orElseThrow();
    double growth = rel.plusCycleGrowth() ? cycleGrowth(component) : 0;
    StringBuilder basis = new StringBuilder("zone " + target.name() + " ("
        + metres(base.baseM()) + ")");
    if (rel.plusM() > 0) {
      basis.append(" + margin ").append(metres(rel.plusM()));
    }
    if (growth > 0 || rel.plusCycleGrowth()) {
      basis.append(String.format(Locale.ROOT, " + growth over one %s-year trim cycle %s",
          VoltageBand.trim(profile.trimCycleYears()), metres(growth)));
    }
    allowances.addAll(base.allowances());
    return new Part(new ResolvedDistance(base.baseM() + rel.plusM() + growth, allowances,
        basis.toString()), null);
  }

  /** Trim cycle times the fastest growth rate that closes this component, m. */
  private double cycleGrowth(String component) {
    GrowthRates g = profile.growth().orElseThrow();
    double rate;
    switch (component) {
      case "horizontal_m":
        rate = g.fastestLateral();
        break;
      case "vertical_m":
        rate = g.fastestVertical();
        break;
      default:
        rate = Math.max(g.fastestLateral(), g.fastestVertical());
        break;
    }
    return profile.trimCycleYears() * rate;
  }

  static String metres(double m) {
    return String.format(Locale.ROOT, "%.3f m", m);
  }
}
