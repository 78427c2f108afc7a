package org.clearance.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * A resolved rule profile: its own values merged over those of the profiles it extends.
 *
 * @param origins the inheritance chain, this profile first and the root last
 * @param zones zones in priority order (most urgent first)
 * @param growth growth rates, or empty when the profile gives none (years-to-violation are
 *     then not computed)
 * @param trimCycleYears trim cycle length, years (&gt; 0), or NaN when not given
 * @param fallIn the fall-in rule
 * @param appliesFromKv the profile covers lines of this nominal voltage and above, kV (&gt;= 0)
 * @param coveredLines ids of lines the profile covers even below {@code appliesFromKv} (e.g.
 *     lower-voltage lines a regional entity names); a distance table still needs a row for them
 * @param contentHash SHA-256 (hex) of the texts of every file of the chain, for the run record
 * @param confidencePercent two-sided confidence level of the distance intervals, %, or NaN when
 *     the profile asks for none (then findings use the distances as measured)
 */
public record RuleProfile(
    List<ProfileOrigin> origins,
    List<Zone> zones,
    Optional<GrowthRates> growth,
    double trimCycleYears,
    FallInRule fallIn,
    double appliesFromKv,
    Set<String> coveredLines,
    String contentHash,
    double confidencePercent) {

  /** Lowest confidence level accepted, %: below it an interval says little. */
  public static final double MIN_CONFIDENCE_PERCENT = 50;

  public RuleProfile {
    origins = List.copyOf(origins);
    List<Zone> sorted = new ArrayList<>(zones);
    sorted.sort((a, b) -> Integer.compare(a.priority(), b.priority()));
    zones = List.copyOf(sorted);
    coveredLines = Set.copyOf(coveredLines);
    if (!(Double.isFinite(appliesFromKv) && appliesFromKv >= 0)) {
      throw new IllegalArgumentException("applies-from voltage must be >= 0: " + appliesFromKv);
    }
    if (origins.isEmpty() || zones.isEmpty()) {
      throw new IllegalArgumentException("a profile needs an origin and a zone");
    }
  }

  /** A profile without a confidence level. */
  public RuleProfile(List<ProfileOrigin> origins, List<Zone> zones, Optional<GrowthRates> growth,
      double trimCycleYears, FallInRule fallIn, double appliesFromKv, Set<String> coveredLines,
      String contentHash) {
    this(origins, zones, growth, trimCycleYears, fallIn, appliesFromKv, coveredLines, contentHash,
        Double.NaN);
  }

  /**
   * The coverage factor k of the two-sided interval d +- k sigma at the profile's confidence
   * level (normal distribution: 1.960 at 95 %), or NaN when the profile asks for none.
   */
  public double coverageFactor() {
    if (Double.isNaN(confidencePercent)) {
      return Double.NaN;
    }
    return new NormalDistribution().inverseCumulativeProbability(
        0.5 + confidencePercent / 200);
  }

  /** The profile's name. */
  public String name() {
    return origins.get(0).name();
  }

  /** The profile's title. */
  public String title() {
    return origins.get(0).title();
  }

  /** Whether the profile covers a line at all (before any zone's own voltage band). */
  public boolean covers(String lineId, double nominalVoltageKv) {
    return nominalVoltageKv >= appliesFromKv || coveredLines.contains(lineId);
  }

  /** The zone of a name, if any. */
  public Optional<Zone> zone(String name) {
    return zones.stream().filter(z -> z.name().equals(name)).findFirst();
  }

  /** The zones marked as the governing minimum. */
  public List<Zone> referenceZones() {
    return zones.stream().filter(Zone::violationReference).toList();
  }
}
