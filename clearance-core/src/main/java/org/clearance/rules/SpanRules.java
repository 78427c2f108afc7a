package org.clearance.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.clearance.clearance.ConditionDistance;
import org.clearance.clearance.PointClearance;
import org.clearance.clearance.SpanContext;
import org.clearance.line.ConductorPosition.Role;

/**
 * A rule profile resolved for one span: the zones that apply with their distances, the zones
 * that apply but cannot be assessed, and whether the span can be assessed at all. Immutable and
 * safe to share between threads; check any number of points of the span with
 * {@link #evaluate(PointClearance)}.
 *
 * <p>A span is NOT ASSESSED when the profile does not cover the line, or when no
 * violation-reference zone can be resolved for it (no zone for its voltage, no table row, an
 * altitude outside the table). Its points are then NOT ASSESSED too, never clear.
 */
public final class SpanRules {

  private final RuleProfile profile;
  private final SpanContext span;
  private final Optional<String> notAssessedReason;
  private final List<ResolvedZone> zones;
  private final List<ZoneGap> gaps;
  private final List<Zone> outOfBand;
  private final ResolvedZone reference;
  private final Optional<ResolvedDistance> fallInAllowance;
  private final Optional<String> fallInFailure;
  private final List<Zone> poleZones;
  /** Per zone of {@link #zones} (same index), its condition selector's answers remembered. */
  private final SelectionMemo[] selections;
  /** The reference zone's, or null when the span has none. */
  private final SelectionMemo referenceSelection;

  SpanRules(RuleProfile profile, SpanContext span, Optional<String> notAssessedReason,
      List<ResolvedZone> zones, List<ZoneGap> gaps, List<Zone> outOfBand,
      Optional<ResolvedDistance> fallInAllowance, Optional<String> fallInFailure,
      List<Zone> poleZones) {
    this.poleZones = List.copyOf(poleZones);
    this.profile = Objects.requireNonNull(profile, "profile");
    this.span = Objects.requireNonNull(span, "span");
    this.notAssessedReason = notAssessedReason;
    this.zones = List.copyOf(zones);
    this.gaps = List.copyOf(gaps);
    this.outOfBand = List.copyOf(outOfBand);
    this.reference = this.zones.stream().filter(z -> z.zone().violationReference())
        .findFirst().orElse(null);
    this.fallInAllowance = fallInAllowance;
    this.fallInFailure = fallInFailure;
    this.selections = new SelectionMemo[this.zones.size()];
    SelectionMemo ref = null;
    for (int i = 0; i < selections.length; i++) {
      selections[i] = new SelectionMemo(this.zones.get(i).zone().conditions());
      if (this.zones.get(i) == reference) {
        ref = selections[i];
      }
    }
    this.referenceSelection = ref;
  }

  static SpanRules notAssessed(RuleProfile profile, SpanContext span, String reason) {
    return new SpanRules(profile, span, Optional.of(reason), List.of(), List.of(), List.of(),
        Optional.empty(), Optional.of(reason), List.of());
  }

  public RuleProfile profile() {
    return profile;
  }

  public SpanContext span() {
    return span;
  }

  /** Whether the span can be assessed by this profile. */
  public boolean assessed() {
    return notAssessedReason.isEmpty();
  }

  /** Why the span is NOT ASSESSED, or empty when it is assessed. */
  public Optional<String> notAssessedReason() {
    return notAssessedReason;
  }

  /** Resolved zones, most urgent first. */
  public List<ResolvedZone> zones() {
    return zones;
  }

  /**
   * Pole-clearing zones whose voltage band holds the span's voltage, most urgent first (empty
   * when the span is NOT ASSESSED); {@link PoleClearing} checks the points around its
   * structures against them.
   */
  public List<Zone> poleZones() {
    return poleZones;
  }

  /** Zones that apply to the span's voltage but could not be resolved. */
  public List<ZoneGap> gaps() {
    return gaps;
  }

  /** Zones whose voltage band excludes the span (empty when the profile does not cover it). */
  public List<Zone> outOfBand() {
    return outOfBand;
  }

  /** The resolved violation-reference zone, when the span is assessed. */
  public Optional<ResolvedZone> reference() {
    return Optional.ofNullable(reference);
  }

  /** The resolved fall-in allowance, when fall-in is enabled and resolvable. */
  public Optional<ResolvedDistance> fallInAllowance() {
    return fallInAllowance;
  }

  /** The required distances of a zone at a station, when the zone is resolved for the span. */
  public Optional<Requirement> requirement(String zoneName, double stationM) {
    for (ResolvedZone z : zones) {
      if (z.zone().name().equals(zoneName)) {
        return Optional.of(z.at(span.lengthM(), stationM));
      }
    }
    return Optional.empty();
  }

  /**
   * Checks one vegetation point of this span.
   *
   * @param point the point with its distances per condition
   * @return the most urgent zone it is inside, and its years to the violation-reference zone
   * @throws IllegalArgumentException when the point belongs to another span
   */
  public PointFinding evaluate(PointClearance point) {
    if (!point.spanId().equals(span.spanId())) {
      throw new IllegalArgumentException("point of span " + point.spanId()
          + " evaluated with the rules of span " + span.spanId());
    }
    if (notAssessedReason.isPresent()) {
      return PointFinding.notAssessed(notAssessedReason.get(), gaps);
    }
    ZoneViolation worst = null;
    List<ZoneGap> pointGaps = gaps;
    boolean referenceChecked = false;
    boolean referenceViolated = false;
    for (int zi = 0; zi < zones.size(); zi++) {
      ResolvedZone z = zones.get(zi);
      SelectionMemo selection = selections[zi];
      List<ConditionDistance> measured = point.distancesFor(z.zone().roles());
      if (measured.isEmpty() && !z.zone().roles().contains(Role.PHASE)) {
        continue; // a zone for neutrals or shield wires on a span without them
      }
      boolean matched = false;
      ZoneViolation zoneWorst = null;
      for (ConditionDistance d : measured) {
        if (!usable(z, d) || !selection.selects(d)) {
          continue; // a distance not computed checks nothing
        }
        matched = true;
        ZoneViolation v = check(z, d);
        if (v != null && (zoneWorst == null || v.deficitM() > zoneWorst.deficitM())) {
          zoneWorst = v;
        }
      }
      if (!matched) {
        if (pointGaps == gaps) {
          pointGaps = new ArrayList<>(gaps);
        }
        pointGaps.add(new ZoneGap(z.zone().name(), "the point has no distance in "
            + z.zone().conditions().describe()));
      }
      if (z == reference) {
        referenceChecked = matched;
        referenceViolated = zoneWorst != null;
      }
      if (worst == null && zoneWorst != null) {
        worst = zoneWorst;
      }
    }
    double years = referenceViolated ? 0 : referenceChecked ? years(point) : Double.NaN;
    if (worst != null) {
      return new PointFinding(PointFinding.Verdict.INSIDE_ZONE, Optional.of(worst), years,
          Optional.empty(), pointGaps);
    }
    if (!referenceChecked) {
      return PointFinding.notAssessed("the point has no distance in the conditions of the "
          + "violation-reference zone " + reference.zone().name() + " ("
          + reference.zone().conditions().describe() + ")", pointGaps);
    }
    return new PointFinding(PointFinding.Verdict.CLEAR, Optional.empty(), years,
        Optional.empty(), pointGaps);
  }

  /** Whether a distance has the values a zone measures (NaN = not computed). */
  private static boolean usable(ResolvedZone z, ConditionDistance d) {
    if (z.radial().isPresent()) {
      return !Double.isNaN(d.distance());
    }
    return !Double.isNaN(d.horizontal()) && !Double.isNaN(d.vertical());
  }

  /** The violation of one zone in one condition, or null when outside. */
  private ZoneViolation check(ResolvedZone z, ConditionDistance d) {
    if (z.radial().isPresent()) {
      double required = z.radial().get().at(span.lengthM(), d.station());
      if (!(d.distance() < required)) {
        return null;
      }
      return violation(z, d, ZoneViolation.Component.RADIAL, d.distance(), required);
    }
    Requirement req = z.at(span.lengthM(), d.station());
    double h = Math.abs(d.horizontal());
    double v = Math.abs(d.vertical());
    if (!(h < req.horizontalM() && v < req.verticalM())) {
      return null;
    }
    double dh = req.horizontalM() - h;
    double dv = req.verticalM() - v;
    return dv <= dh
        ? violation(z, d, ZoneViolation.Component.VERTICAL, v, req.verticalM())
        : violation(z, d, ZoneViolation.Component.HORIZONTAL, h, req.horizontalM());
  }

  private static ZoneViolation violation(ResolvedZone z, ConditionDistance d,
      ZoneViolation.Component component, double actual, double required) {
    return new ZoneViolation(z.zone(), d.condition(), d.group(), d.conductor(), d.station(),
        component, actual, required, required - actual);
  }

  /** Years until the point grows into the reference zone in any of its conditions. */
  private double years(PointClearance point) {
    if (profile.growth().isEmpty()) {
      return Double.NaN;
    }
    GrowthRates.Rate rate = profile.growth().get().forClass(point.classification());
    double best = Double.POSITIVE_INFINITY;
    for (ConditionDistance d : point.distancesFor(reference.zone().roles())) {
      if (!usable(reference, d) || !referenceSelection.selects(d)) {
        continue;
      }
      Requirement req = reference.at(span.lengthM(), d.station());
      double h = Math.abs(d.horizontal());
      double v = d.vertical();
      double t;
      if (reference.radial().isPresent()) {
        // Scale the components to the stored 3D distance so both views of the point agree.
        double r0 = Math.hypot(h, v);
        double scale = r0 > 0 ? d.distance() / r0 : 1;
        if (r0 == 0) {
          v = -d.distance();
        }
        t = GrowIn.yearsRadial(h * scale, v * scale, req.radialM(), rate.verticalMPerYear(),
            rate.lateralMPerYear());
      } else {
        t = GrowIn.yearsComponents(h, v, req.horizontalM(), req.verticalM(),
            rate.verticalMPerYear(), rate.lateralMPerYear());
      }
      best = Math.min(best, t);
    }
    return best;
  }

  /**
   * The fall-in test for a tree near this span.
   *
   * @param treeHeightM height of the tree above its base, m (&gt; 0)
   * @param fromBase distances from the tree base to the nearest conductor, per condition
   */
  public FallInFinding fallIn(double treeHeightM, List<ConditionDistance> fromBase) {
    if (!(Double.isFinite(treeHeightM) && treeHeightM > 0)) {
      throw new IllegalArgumentException("tree height must be positive: " + treeHeightM);
    }
    if (!profile.fallIn().enabled()) {
      return FallInFinding.notAssessed("profile " + profile.name() + " has no fall-in rule");
    }
    if (fallInFailure.isPresent()) {
      return FallInFinding.notAssessed("fall-in allowance: " + fallInFailure.get());
    }
    FallInFinding best = null;
    for (ConditionDistance d : fromBase) {
      if (Double.isNaN(d.distance()) || !profile.fallIn().conditions().selects(d)) {
        continue;
      }
      double reach = treeHeightM + fallInAllowance.orElseThrow().at(span.lengthM(), d.station());
      double margin = reach - d.distance();
      if (best == null || margin > best.marginM()) {
        best = new FallInFinding(Optional.empty(), margin >= 0, d.condition(), d.distance(),
            reach, margin);
      }
    }
    if (best == null) {
      return FallInFinding.notAssessed("no distance from the tree base in "
          + profile.fallIn().conditions().describe());
    }
    return best;
  }
}
