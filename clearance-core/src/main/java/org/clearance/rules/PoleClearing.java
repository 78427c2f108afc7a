package org.clearance.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.clearance.clearance.PolePoint;
import org.clearance.line.PoleEquipment;

/**
 * Pole-clearing zones (issue 15): a vertical cylinder around each structure that carries listed
 * equipment, for rules such as California PRC 4292 with 14 CCR 1254 (docs/references.md R7).
 * Evaluated on the points the clearance engine stored around every structure
 * ({@code pole-points.bin}), never on the survey, so a changed radius or band is evaluated again
 * without it, as far as the stored keep radius and height reach.
 */
public final class PoleClearing {

  /**
   * Plan distance from a structure centre within which a check stores points when its profile
   * asks for no more, m: PRC 4292's 10 ft (3.048 m) from the pole's surface plus a pole radius,
   * with room for a utility's wider clearing (common practice, no source).
   */
  public static final double DEFAULT_KEEP_RADIUS_M = 5.0;
  /**
   * Height above ground up to which a check stores points around structures when its profile
   * asks for no more, m: above the 8 ft (2.438 m) band of 14 CCR 1254(b) with room for a
   * higher band (common practice, no source).
   */
  public static final double DEFAULT_KEEP_HEIGHT_M = 4.0;

  private PoleClearing() {}

  /** The keep radius a check under {@code profile} needs (null profile: the default), m. */
  public static double keepRadiusM(RuleProfile profile) {
    double r = DEFAULT_KEEP_RADIUS_M;
    for (Measurement.PoleCylinder c : cylinders(profile)) {
      r = Math.max(r, c.reachM());
    }
    return r;
  }

  /** The keep height a check under {@code profile} needs (null profile: the default), m. */
  public static double keepHeightM(RuleProfile profile) {
    double h = DEFAULT_KEEP_HEIGHT_M;
    for (Measurement.PoleCylinder c : cylinders(profile)) {
      h = Math.max(h, c.toHeightM());
    }
    return h;
  }

  private static List<Measurement.PoleCylinder> cylinders(RuleProfile profile) {
    List<Measurement.PoleCylinder> out = new ArrayList<>();
    if (profile != null) {
      for (Zone z : profile.zones()) {
        if (z.measurement() instanceof Measurement.PoleCylinder c) {
          out.add(c);
        }
      }
    }
    return out;
  }

  /**
   * The pole-clearing zones of a span's rules that a structure is subject to, most urgent first.
   *
   * @param rules the rules of a span the structure ends
   * @param carried the equipment the structure carries
   */
  public static List<Zone> applicable(SpanRules rules, Set<PoleEquipment> carried) {
    List<Zone> out = new ArrayList<>();
    for (Zone z : rules.poleZones()) {
      if (((Measurement.PoleCylinder) z.measurement()).appliesTo(carried)) {
        out.add(z);
      }
    }
    return out;
  }

  /**
   * A point inside a pole-clearing zone.
   *
   * @param zone the most urgent zone the point is inside
   * @param planDistanceM its plan distance from the structure centre, m
   * @param requiredM the zone's plan reach there (clearing radius plus pole radius), m
   * @param deficitM required minus plan distance, m (&gt; 0)
   */
  public record Finding(Zone zone, double planDistanceM, double requiredM, double deficitM) {}

  /**
   * The most urgent of {@code zones} the point is inside, or empty (also when its height above
   * ground is not known).
   */
  public static Optional<Finding> check(List<Zone> zones, PolePoint point) {
    for (Zone z : zones) {
      Measurement.PoleCylinder c = (Measurement.PoleCylinder) z.measurement();
      if (c.inside(point.planDistanceM(), point.heightAboveGround())) {
        return Optional.of(new Finding(z, point.planDistanceM(), c.reachM(),
            c.reachM() - point.planDistanceM()));
      }
    }
    return Optional.empty();
  }
}
