package org.clearance.rules;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Pattern;
import org.clearance.io.ValueRange;
import org.clearance.io.YamlMap;
import org.clearance.line.ConductorPosition.Role;

/** Merges the files of a profile's chain and builds the validated {@link RuleProfile}. */
final class ProfileBuilder {

  private static final Set<String> ZONE_KEYS = Set.of("name", "note", "priority",
      "violation_reference", "voltage", "conditions", "condition_names", "radial_m",
      "horizontal_m", "vertical_m", "midspan_allowance", "conductor_roles", "pole_clearing");
  /** Keys of a pole-clearing cylinder. */
  private static final Set<String> CYLINDER_KEYS = Set.of("radius_m", "pole_radius_m",
      "from_height_m", "to_height_m", "equipment");
  /** Keys a pole-clearing zone may not have: it measures from structures, not conductors. */
  private static final List<String> CONDUCTOR_ONLY_KEYS = List.of("radial_m", "horizontal_m",
      "vertical_m", "midspan_allowance", "conductor_roles", "conditions", "condition_names");
  /**
   * Plausible clearing radius around a structure, m: rules ask for a few metres (PRC 4292:
   * 10 ft, docs/references.md R7); 30 m leaves room (common practice, no source).
   */
  static final ValueRange CLEARING_RADIUS = new ValueRange(0, 30, "m",
      "pole clearing, common practice, no source");
  /**
   * Plausible radius of a structure to its outer surface, m: a wood pole 0.1-0.25 m, a lattice
   * tower's legs up to about 10 m from its centre (common practice, no source).
   */
  static final ValueRange STRUCTURE_RADIUS = new ValueRange(0, 10, "m",
      "structure size, common practice, no source");
  /** Plausible height band above ground, m: up to the top of a tall structure. */
  static final ValueRange BAND_HEIGHT = new ValueRange(0, 150, "m",
      "structure heights, common practice, no source");
  /** The selector a pole-clearing zone carries: it is checked on the surveyed state only. */
  static final ConditionSelector SURVEYED = new ConditionSelector(Set.of("survey"), Set.of());
  private static final Set<String> RATE_KEYS = Set.of("vertical", "lateral");
  private static final Set<String> FALL_IN_KEYS =
      Set.of("enabled", "conditions", "condition_names", "reach_allowance_m");
  private static final Pattern NAME = Pattern.compile("[A-Za-z0-9][A-Za-z0-9_.-]*");
  private static final Pattern CLASS_KEY = Pattern.compile("class_([0-9]{1,3})");
  /** Largest ASPRS class number (LAS 1.4 classification byte). */
  private static final int MAX_CLASS = 255;
  /**
   * Plausible trim cycle, years: utilities trim every 1 to about 10 years (common practice, no
   * source); 30 leaves room for rarely visited lines.
   */
  static final ValueRange TRIM_CYCLE = new ValueRange(0.1, 30, "years",
      "trim cycles, common practice, no source");
  /**
   * Plausible growth rate, m per year: the fastest trees grow a few metres a year (common
   * practice, no source).
   */
  static final ValueRange GROWTH = new ValueRange(0, 10, "m per year",
      "tree growth, common practice, no source");
  /** Plausible zone priority: a profile has a handful of zones. */
  static final int MAX_PRIORITY = 1000;

  private ProfileBuilder() {}

  /** The chain's values merged, root first, each later file laid over the earlier ones. */
  record Merged(Map<String, YamlMap> zones, YamlMap growth, YamlMap fallIn,
      YamlMap.Entry trimCycle, YamlMap.Entry appliesFrom, YamlMap.Entry coveredLines,
      YamlMap rootTop, YamlMap.Entry zonesEntry) {}

  static Merged merge(List<RuleProfileReader.Layer> chain) {
    Map<String, YamlMap> zones = new LinkedHashMap<>();
    YamlMap growth = null;
    YamlMap fallIn = null;
    YamlMap.Entry trimCycle = null;
    YamlMap.Entry covered = null;
    YamlMap.Entry appliesFrom = null;
    YamlMap.Entry zonesEntry = null;
    for (int i = chain.size() - 1; i >= 0; i--) {
      RuleProfileReader.Layer layer = chain.get(i);
      YamlMap top = layer.top();
      if (zonesEntry == null) {
        zonesEntry = top.optional("zones").orElse(null);
      }
      for (Map.Entry<String, YamlMap> z : RuleProfileReader.zonesOf(layer).entrySet()) {
        zones.merge(z.getKey(), z.getValue(), YamlMap::mergedWith);
      }
      growth = mergeMap(growth, top.optional("growth_m_per_year").orElse(null));
      fallIn = mergeMap(fallIn, top.optional("fall_in").orElse(null));
      trimCycle = replace(trimCycle, top.optional("trim_cycle_years").orElse(null));
      covered = replace(covered, top.optional("covered_lines").orElse(null));
      appliesFrom = replace(appliesFrom, top.optional("applies_from_kv").orElse(null));
    }
    return new Merged(zones, growth, fallIn, trimCycle, appliesFrom, covered,
        chain.get(chain.size() - 1).top(), zonesEntry);
  }

  private static YamlMap mergeMap(YamlMap base, YamlMap.Entry entry) {
    if (entry == null) {
      return base;
    }
    if (entry.isNull()) {
      return null;
    }
    YamlMap map = entry.map();
    return base == null ? map : base.mergedWith(map);
  }

  private static YamlMap.Entry replace(YamlMap.Entry base, YamlMap.Entry entry) {
    if (entry == null) {
      return base;
    }
    return entry.isNull() ? null : entry;
  }

  static RuleProfile build(List<RuleProfileReader.Layer> chain, Merged m, String hash) {
    List<ProfileOrigin> origins = new ArrayList<>();
    for (RuleProfileReader.Layer layer : chain) {
      origins.add(origin(layer));
    }
    Optional<GrowthRates> growth = Optional.ofNullable(m.growth()).map(ProfileBuilder::growth);
    double cycle = m.trimCycle() == null ? Double.NaN : m.trimCycle().within(TRIM_CYCLE);
    if (m.zones().isEmpty()) {
      throw m.rootTop().missing("zones", "a profile needs at least one zone");
    }
    List<Zone> zones = new ArrayList<>();
    Map<String, YamlMap> sources = new HashMap<>();
    Map<Integer, Zone> byPriority = new HashMap<>();
    for (YamlMap map : m.zones().values()) {
      Zone zone = zone(map);
      Zone clash = byPriority.put(zone.priority(), zone);
      if (clash != null) {
        throw map.required("priority").error("priority " + zone.priority()
            + " is already used by zone '" + clash.name() + "'");
      }
      zones.add(zone);
      sources.put(zone.name(), map);
    }
    checkReferences(zones, sources, m.zonesEntry());
    Set<String> covered = new LinkedHashSet<>();
    if (m.coveredLines() != null) {
      covered.addAll(m.coveredLines().texts());
    }
    FallInRule fallIn = m.fallIn() == null ? FallInRule.DISABLED : fallIn(m.fallIn());
    RelativeCheck check = new RelativeCheck(zones, sources, growth.isPresent(), cycle);
    check.all();
    if (fallIn.enabled()) {
      check.fallIn(fallIn.allowance(), m.fallIn().required("reach_allowance_m"));
    }
    double appliesFrom = m.appliesFrom() == null ? 0
        : m.appliesFrom().within(DistanceParser.VOLTAGE);
    return new RuleProfile(origins, zones, growth, cycle, fallIn, appliesFrom, covered, hash,
        confidence(chain));
  }

  /** The confidence level of the most derived file that gives one, %, or NaN. */
  private static double confidence(List<RuleProfileReader.Layer> chain) {
    for (RuleProfileReader.Layer layer : chain) {
      Optional<YamlMap.Entry> e = layer.top().optional("confidence_percent");
      if (e.isPresent() && !e.get().isNull()) {
        double p = e.get().positive();
        if (!(p >= RuleProfile.MIN_CONFIDENCE_PERCENT && p < 100)) {
          throw e.get().error("must be at least " + RuleProfile.MIN_CONFIDENCE_PERCENT
              + " and below 100 %, found " + p);
        }
        return p;
      }
    }
    return Double.NaN;
  }

  private static ProfileOrigin origin(RuleProfileReader.Layer layer) {
    YamlMap top = layer.top();
    YamlMap.Entry name = top.required("name");
    if (!NAME.matcher(name.text()).matches()) {
      throw name.error("a profile name uses letters, digits, '_', '-' and '.' only");
    }
    if (!layer.builtin() && RuleProfiles.names().contains(name.text())) {
      throw name.error("'" + name.text() + "' is the name of a built-in profile; give your"
          + " profile its own name (extend the built-in one with extends: " + name.text() + ")");
    }
    String cautions = top.optional("cautions").map(YamlMap.Entry::text).orElse("");
    return new ProfileOrigin(name.text(), top.required("title").text(),
        top.required("source").text(), cautions, layer.label());
  }

  private static Zone zone(YamlMap map) {
    map.checkKeys(ZONE_KEYS);
    YamlMap.Entry nameEntry = map.required("name");
    String name = nameEntry.text();
    if (!NAME.matcher(name).matches()) {
      throw nameEntry.error("a zone name uses letters, digits, '_', '-' and '.' only");
    }
    int priority = map.required("priority").integer(1);
    if (priority > MAX_PRIORITY) {
      throw map.required("priority").error("must be at most " + MAX_PRIORITY + ", found "
          + priority);
    }
    boolean reference =
        map.optional("violation_reference").map(YamlMap.Entry::bool).orElse(false);
    VoltageBand band =
        map.optional("voltage").map(DistanceParser::zoneBand).orElse(VoltageBand.ALL);
    String note = map.optional("note").map(YamlMap.Entry::text).orElse("");
    Optional<YamlMap.Entry> cylinder = map.optional("pole_clearing");
    if (cylinder.isPresent()) {
      for (String k : CONDUCTOR_ONLY_KEYS) {
        if (map.optional(k).isPresent() && !map.required(k).isNull()) {
          throw map.required(k).error("a pole_clearing zone is measured around structures, "
              + "not from conductors in line conditions: remove " + k);
        }
      }
      if (reference) {
        throw map.required("violation_reference").error("a pole_clearing zone cannot be the "
            + "violation reference (the governing minimum measured from the conductors)");
      }
      return new Zone(name, priority, false, band, SURVEYED, cylinder(cylinder.get()),
          MidspanAllowance.NONE, note, Zone.ENERGISED);
    }
    ConditionSelector conditions = selector(map, "zone '" + name + "'");
    Measurement measurement;
    Optional<YamlMap.Entry> radial = map.optional("radial_m");
    Optional<YamlMap.Entry> horizontal = map.optional("horizontal_m");
    Optional<YamlMap.Entry> vertical = map.optional("vertical_m");
    if (radial.isPresent()) {
      if (horizontal.isPresent() || vertical.isPresent()) {
        throw horizontal.orElseGet(vertical::get).error("a zone measures either radial_m or "
            + "horizontal_m with vertical_m, not both (set the unwanted key to null when "
            + "overriding an inherited zone)");
      }
      measurement = new Measurement.Radial(DistanceParser.distance(radial.get(), false));
    } else if (horizontal.isPresent() && vertical.isPresent()) {
      measurement = new Measurement.Components(DistanceParser.distance(horizontal.get(), false),
          DistanceParser.distance(vertical.get(), false));
    } else if (horizontal.isPresent() || vertical.isPresent()) {
      throw map.missing(horizontal.isPresent() ? "vertical_m" : "horizontal_m",
          "zone '" + name + "' measures components and needs both horizontal_m and vertical_m");
    } else {
      throw map.missing("radial_m", "zone '" + name + "' needs a distance: radial_m, or "
          + "horizontal_m with vertical_m");
    }
    MidspanAllowance allowance = map.optional("midspan_allowance")
        .map(DistanceParser::allowance).orElse(MidspanAllowance.NONE);
    Set<Role> roles = map.optional("conductor_roles").map(ProfileBuilder::roles)
        .orElse(Zone.ENERGISED);
    if (reference && !roles.contains(Role.PHASE)) {
      throw map.required("conductor_roles").error("a violation-reference zone must apply to "
          + "the energised conductors: list phase");
    }
    return new Zone(name, priority, reference, band, conditions, measurement, allowance, note,
        roles);
  }

  /** A pole-clearing cylinder (docs/rules.md, "Pole-clearing zones"). */
  private static Measurement.PoleCylinder cylinder(YamlMap.Entry entry) {
    YamlMap m = entry.map();
    m.checkKeys(CYLINDER_KEYS);
    YamlMap.Entry radius = m.required("radius_m");
    double r = radius.within(CLEARING_RADIUS);
    if (!(r > 0)) {
      throw radius.error("a clearing radius must be greater than 0 m");
    }
    double pole = m.optional("pole_radius_m").map(e -> e.within(STRUCTURE_RADIUS)).orElse(0.0);
    double from = m.optional("from_height_m").map(e -> e.within(BAND_HEIGHT)).orElse(0.0);
    YamlMap.Entry toEntry = m.required("to_height_m");
    double to = toEntry.within(BAND_HEIGHT);
    if (!(to > from)) {
      throw toEntry.error("to_height_m (" + to + " m) must be above from_height_m (" + from
          + " m)");
    }
    YamlMap.Entry eq = m.required("equipment");
    Set<org.clearance.line.PoleEquipment> kinds =
        java.util.EnumSet.noneOf(org.clearance.line.PoleEquipment.class);
    for (String w : eq.texts()) {
      org.clearance.line.PoleEquipment k = org.clearance.line.PoleEquipment.ofFileName(w);
      if (k == null) {
        throw eq.error("unknown equipment kind '" + w + "'; kinds: transformer, switch, fuse, "
            + "arrester, dead_end, corner (the structures file's equipment column)");
      }
      if (!kinds.add(k)) {
        throw eq.error("equipment kind '" + w + "' is listed twice");
      }
    }
    if (kinds.isEmpty()) {
      throw eq.error("list at least one equipment kind that makes a structure subject to "
          + "the zone");
    }
    return new Measurement.PoleCylinder(r, pole, from, to, kinds);
  }

  /** The roles of {@code conductor_roles}: a list of phase, neutral and shield, each once. */
  private static Set<Role> roles(YamlMap.Entry entry) {
    Set<Role> roles = java.util.EnumSet.noneOf(Role.class);
    for (String r : entry.texts()) {
      Role role = switch (r) {
        case "phase" -> Role.PHASE;
        case "neutral" -> Role.NEUTRAL;
        case "shield" -> Role.SHIELD;
        default -> throw entry.error("unknown conductor role '" + r + "'; roles: phase, "
            + "neutral, shield");
      };
      if (!roles.add(role)) {
        throw entry.error("conductor role '" + r + "' is listed twice");
      }
    }
    if (roles.isEmpty()) {
      throw entry.error("list at least one conductor role (phase, neutral, shield)");
    }
    return roles;
  }

  /** A selector from {@code conditions} (report groups) and {@code condition_names}. */
  private static ConditionSelector selector(YamlMap map, String owner) {
    Set<String> groups = new LinkedHashSet<>();
    YamlMap.Entry groupEntry = map.optional("conditions").orElse(null);
    if (groupEntry != null) {
      for (String g : groupEntry.texts()) {
        if (!g.equals(ConditionSelector.ALL) && !ConditionSelector.GROUPS.contains(g)) {
          throw groupEntry.error("unknown condition group '" + g + "'; groups: "
              + String.join(", ", ConditionSelector.GROUPS) + ", or " + ConditionSelector.ALL
              + " (name single conditions under condition_names)");
        }
        if (!groups.add(g)) {
          throw groupEntry.error("condition group '" + g + "' is listed twice");
        }
      }
    }
    if (groups.contains(ConditionSelector.ALL) && groups.size() > 1) {
      throw groupEntry.error("'" + ConditionSelector.ALL + "' already holds every group; list"
          + " it alone");
    }
    Set<String> names = new LinkedHashSet<>();
    YamlMap.Entry namesEntry = map.optional("condition_names").orElse(null);
    if (namesEntry != null) {
      for (String n : namesEntry.texts()) {
        if (!names.add(n)) {
          throw namesEntry.error("condition name '" + n + "' is listed twice");
        }
      }
    }
    if (groups.isEmpty() && names.isEmpty()) {
      throw map.missing("conditions", owner + " needs the conditions it applies in");
    }
    return new ConditionSelector(groups, names);
  }

  private static GrowthRates growth(YamlMap map) {
    Map<Integer, GrowthRates.Rate> byClass = new HashMap<>();
    GrowthRates.Rate fallback = null;
    for (YamlMap.Entry e : map.entries()) {
      GrowthRates.Rate rate = rate(e);
      if (e.key().equals("default")) {
        fallback = rate;
        continue;
      }
      var matcher = CLASS_KEY.matcher(e.key());
      if (!matcher.matches() || Integer.parseInt(matcher.group(1)) > MAX_CLASS) {
        throw e.error("unknown key; growth rates are keyed class_<ASPRS class 0-255> or default");
      }
      int cls = Integer.parseInt(matcher.group(1));
      if (!matcher.group(1).equals(Integer.toString(cls))) {
        // class_05 beside class_5 would silently replace one rate with the other
        throw e.error("write class_" + cls + " (no leading zeros)");
      }
      byClass.put(cls, rate);
    }
    if (fallback == null) {
      throw map.missing("default", "growth rates need a default for other classes");
    }
    return new GrowthRates(byClass, fallback);
  }

  private static GrowthRates.Rate rate(YamlMap.Entry entry) {
    YamlMap map = entry.map();
    map.checkKeys(RATE_KEYS);
    return new GrowthRates.Rate(map.required("vertical").within(GROWTH),
        map.required("lateral").within(GROWTH));
  }

  private static FallInRule fallIn(YamlMap map) {
    map.checkKeys(FALL_IN_KEYS);
    if (!map.required("enabled").bool()) {
      return FallInRule.DISABLED;
    }
    ConditionSelector conditions = selector(map, "the fall-in rule");
    DistanceSpec allowance = DistanceParser.distance(map.required("reach_allowance_m"), true);
    if (allowance instanceof DistanceTable) {
      throw map.required("reach_allowance_m").error("give a number of metres or "
          + "based_on_zone (a radial zone)");
    }
    return new FallInRule(true, conditions, allowance);
  }

  /** Exactly one family of violation-reference zones, whose voltage bands do not overlap. */
  private static void checkReferences(List<Zone> zones, Map<String, YamlMap> sources,
      YamlMap.Entry zonesEntry) {
    List<Zone> refs = zones.stream().filter(Zone::violationReference).toList();
    if (refs.isEmpty()) {
      throw zonesEntry.error("no zone is marked violation_reference: true (the "
          + "governing minimum that years-to-violation count towards)");
    }
    for (int i = 1; i < refs.size(); i++) {
      for (int j = 0; j < i; j++) {
        if (refs.get(i).voltage().overlaps(refs.get(j).voltage())) {
          throw sources.get(refs.get(i).name()).required("violation_reference").error(
              "zones '" + refs.get(j).name() + "' and '" + refs.get(i).name() + "' are both "
              + "violation references for some voltages; reference zones must cover "
              + "separate voltage bands");
        }
      }
    }
  }

  /** Checks zone references of relative distances: targets, kinds, cycles, growth. */
  private static final class RelativeCheck {
    private final Map<String, Zone> zones = new HashMap<>();
    private final Map<String, YamlMap> sources;
    private final boolean hasGrowth;
    private final double cycle;

    RelativeCheck(List<Zone> zones, Map<String, YamlMap> sources, boolean hasGrowth,
        double cycle) {
      for (Zone z : zones) {
        this.zones.put(z.name(), z);
      }
      this.sources = sources;
      this.hasGrowth = hasGrowth;
      this.cycle = cycle;
    }

    void all() {
      for (Zone z : zones.values()) {
        YamlMap src = sources.get(z.name());
        if (z.measurement() instanceof Measurement.Radial r) {
          follow(r.radial(), "radial_m", src.required("radial_m"), new ArrayList<>(
              List.of(z.name())));
        } else if (z.measurement() instanceof Measurement.Components c) {
          follow(c.horizontal(), "horizontal_m", src.required("horizontal_m"),
              new ArrayList<>(List.of(z.name())));
          follow(c.vertical(), "vertical_m", src.required("vertical_m"),
              new ArrayList<>(List.of(z.name())));
        }
      }
    }

    void fallIn(DistanceSpec allowance, YamlMap.Entry entry) {
      follow(allowance, "radial_m", entry, new ArrayList<>(List.of("fall_in")));
    }

    /** Walks a chain of relative distances, reporting errors at {@code entry}. */
    private void follow(DistanceSpec spec, String component, YamlMap.Entry entry,
        List<String> path) {
      if (!(spec instanceof DistanceSpec.Relative rel)) {
        return;
      }
      if (rel.plusCycleGrowth() && !(hasGrowth && Double.isFinite(cycle))) {
        throw entry.error("plus_cycle_growth needs growth_m_per_year and trim_cycle_years");
      }
      Zone target = zones.get(rel.zone());
      if (target == null) {
        throw entry.error("based_on_zone names an unknown zone '" + rel.zone() + "'");
      }
      if (path.contains(target.name())) {
        path.add(target.name());
        throw entry.error("zone distances depend on each other in a cycle: "
            + String.join(" -> ", path));
      }
      path.add(target.name());
      DistanceSpec next = component(target, component);
      if (next == null) {
        throw entry.error("zone '" + target.name() + "' has no " + component + " to build on ("
            + (target.radial() ? "it measures radial_m" : target.poleClearing()
                ? "it is a pole_clearing zone" : "it measures components") + ")");
      }
      follow(next, component, entry, path);
    }

    private static DistanceSpec component(Zone zone, String component) {
      if (zone.measurement() instanceof Measurement.Radial r) {
        return component.equals("radial_m") ? r.radial() : null;
      }
      if (zone.measurement() instanceof Measurement.PoleCylinder) {
        return null;
      }
      Measurement.Components c = (Measurement.Components) zone.measurement();
      switch (component) {
        case "horizontal_m":
          return c.horizontal();
        case "vertical_m":
          return c.vertical();
        default:
          return null;
      }
    }
  }
}
