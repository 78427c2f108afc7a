package org.clearance.clearance;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.function.UnaryOperator;
import org.clearance.line.ConductorPosition.Role;

/**
 * One vegetation point near a span, with its distances to the span's conductors in every line
 * condition. The clearance engine stores these so that rule profiles can be re-evaluated without
 * reading the survey again.
 *
 * <p>Distances are kept per conductor role (issue 15): {@code distances} to the nearest
 * energised conductor (a phase, or a fitted wire of no known role, taken as live), and, when the
 * span has them, {@code neutral} to the nearest neutral or secondary conductor and
 * {@code shield} to the nearest shield wire. A zone applies to the roles its profile names
 * ({@link #distancesFor(Set)}); by default to the energised conductors only.
 *
 * @param spanId id of the span the distances refer to
 * @param x easting, m (survey CRS scaled to metres)
 * @param y northing, m
 * @param z elevation, m
 * @param classification ASPRS class of the point (as read, or as inferred for unclassified data)
 * @param heightAboveGround height above the ground model, m, or NaN where there is no ground
 * @param distances to the nearest energised conductor, one entry per condition, the surveyed
 *     state first
 * @param neutral to the nearest neutral conductor, one entry per condition in the same order,
 *     or empty when the span has none
 * @param shield to the nearest shield wire, one entry per condition, or empty when the span
 *     has none
 * @param circuits when the span's energised conductors carry more than one voltage (issue 15:
 *     underbuild), per voltage the distances to the nearest energised conductor of that voltage
 *     (a wire of no known position counts at every voltage); empty otherwise
 * @param wireTouched true when the point lies on a wire but vegetation lies within the wire
 *     finder's touch distance of it ({@code SetAside.touchedWire}): probably the wire itself,
 *     measured because a branch on the wire and the wire cannot be told apart. It may set the
 *     span's minimum; a site stands on the vegetation beside it (docs/clearance.md)
 */
public record PointClearance(
    String spanId,
    double x,
    double y,
    double z,
    int classification,
    double heightAboveGround,
    List<ConditionDistance> distances,
    List<ConditionDistance> neutral,
    List<ConditionDistance> shield,
    List<VoltageDistances> circuits,
    boolean wireTouched) {

  /**
   * The distances to the nearest energised conductor of one voltage.
   *
   * @param kv the voltage, kV
   * @param distances one entry per condition, the surveyed state first
   */
  public record VoltageDistances(double kv, List<ConditionDistance> distances) {
    public VoltageDistances {
      distances = List.copyOf(distances);
    }
  }

  public PointClearance {
    Objects.requireNonNull(spanId, "spanId");
    distances = List.copyOf(distances);
    neutral = List.copyOf(neutral);
    shield = List.copyOf(shield);
    circuits = List.copyOf(circuits);
    for (VoltageDistances v : circuits) {
      if (v.distances().size() != distances.size()) {
        throw new IllegalArgumentException("one distance per condition at every voltage of span "
            + spanId);
      }
    }
    if (!neutral.isEmpty() && neutral.size() != distances.size()
        || !shield.isEmpty() && shield.size() != distances.size()) {
      throw new IllegalArgumentException("one distance per condition for every role of span "
          + spanId);
    }
  }

  /** A point that is not a wire point touched by vegetation. */
  public PointClearance(String spanId, double x, double y, double z, int classification,
      double heightAboveGround, List<ConditionDistance> distances,
      List<ConditionDistance> neutral, List<ConditionDistance> shield,
      List<VoltageDistances> circuits) {
    this(spanId, x, y, z, classification, heightAboveGround, distances, neutral, shield,
        circuits, false);
  }

  /** A point whose energised conductors carry one voltage. */
  public PointClearance(String spanId, double x, double y, double z, int classification,
      double heightAboveGround, List<ConditionDistance> distances,
      List<ConditionDistance> neutral, List<ConditionDistance> shield) {
    this(spanId, x, y, z, classification, heightAboveGround, distances, neutral, shield,
        List.of());
  }

  /**
   * The point as the conductors of one voltage see it: its energised distances are those to
   * the nearest conductor of that voltage (neutral and shield distances stay). The point itself
   * when it holds no distances by voltage (a span of one voltage, or no conductor of that
   * voltage fitted: then the nearest energised conductor of any voltage, the safe reading).
   */
  public PointClearance atVoltage(double kv) {
    for (VoltageDistances v : circuits) {
      if (v.kv() == kv) {
        return new PointClearance(spanId, x, y, z, classification, heightAboveGround,
            v.distances(), neutral, shield, List.of(), wireTouched);
      }
    }
    return this;
  }

  /** A point with distances to energised conductors only. */
  public PointClearance(String spanId, double x, double y, double z, int classification,
      double heightAboveGround, List<ConditionDistance> distances) {
    this(spanId, x, y, z, classification, heightAboveGround, distances, List.of(), List.of());
  }

  /** The distances of one role (empty when the span has no conductor of it). */
  public List<ConditionDistance> distances(Role role) {
    return switch (role) {
      case PHASE -> distances;
      case NEUTRAL -> neutral;
      case SHIELD -> shield;
    };
  }

  /**
   * Every distance to a conductor of the given roles: for each role, one entry per condition.
   * A zone is checked against each of them; the worst counts.
   */
  public List<ConditionDistance> distancesFor(Set<Role> roles) {
    if (roles.size() == 1 && roles.contains(Role.PHASE)) {
      return distances;
    }
    List<ConditionDistance> out = new ArrayList<>();
    for (Role r : Role.values()) {
      if (roles.contains(r)) {
        out.addAll(distances(r));
      }
    }
    return out;
  }

  /** The same point with every distance of every role passed through {@code f}. */
  public PointClearance mapDistances(UnaryOperator<ConditionDistance> f) {
    return new PointClearance(spanId, x, y, z, classification, heightAboveGround,
        distances.stream().map(f).toList(), neutral.stream().map(f).toList(),
        shield.stream().map(f).toList(), circuits.stream().map(v -> new VoltageDistances(v.kv(),
            v.distances().stream().map(f).toList())).toList(), wireTouched);
  }

  /** The smallest distance to an energised conductor over all conditions. */
  public ConditionDistance governing() {
    ConditionDistance best = null;
    for (ConditionDistance d : distances) {
      if (best == null || d.distance() < best.distance()) {
        best = d;
      }
    }
    if (best == null) {
      throw new IllegalStateException("no distances for a point of span " + spanId);
    }
    return best;
  }
}
