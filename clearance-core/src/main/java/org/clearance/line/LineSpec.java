package org.clearance.line;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * A line specification: what hangs on a line's structures and which line conditions to check
 * (docs/line-inputs.md).
 *
 * @param lineId line id; matches {@code line_id} in the structures file when that column is used
 * @param name human-readable line name, or an empty string
 * @param nominalVoltageKv nominal phase-to-phase voltage, kV (&gt; 0)
 * @param altitudeM line altitude above sea level, m (0 when not given)
 * @param surveyConductorTemperatureC conductor temperature during the survey, degC, or NaN when
 *     not given (then no condition needs a change of state)
 * @param rowHalfWidthM half width of the right-of-way either side of the centre line
 *     (structure to structure), m, or NaN when not given
 * @param conductors conductor positions, at least one phase, unique names (unmodifiable)
 * @param conditions line conditions to check, unique names, possibly empty (unmodifiable)
 * @param sourceFile the specification file, for messages
 */
public record LineSpec(
    String lineId,
    String name,
    double nominalVoltageKv,
    double altitudeM,
    double surveyConductorTemperatureC,
    double rowHalfWidthM,
    List<ConductorPosition> conductors,
    List<LineCondition> conditions,
    String sourceFile) {

  public LineSpec {
    Objects.requireNonNull(lineId, "lineId");
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(sourceFile, "sourceFile");
    if (!(Double.isFinite(nominalVoltageKv) && nominalVoltageKv > 0)) {
      throw new IllegalArgumentException("voltage must be positive: " + nominalVoltageKv);
    }
    conductors = List.copyOf(conductors);
    conditions = List.copyOf(conditions);
  }

  /** A specification without a right-of-way width. */
  public LineSpec(String lineId, String name, double nominalVoltageKv, double altitudeM,
      double surveyConductorTemperatureC, List<ConductorPosition> conductors,
      List<LineCondition> conditions, String sourceFile) {
    this(lineId, name, nominalVoltageKv, altitudeM, surveyConductorTemperatureC, Double.NaN,
        conductors, conditions, sourceFile);
  }

  /** The conductor position with this name (exact match), if any. */
  public Optional<ConductorPosition> position(String position) {
    return conductors.stream().filter(c -> c.position().equals(position)).findFirst();
  }

  /** The line condition with this name (exact match), if any. */
  public Optional<LineCondition> condition(String conditionName) {
    return conditions.stream().filter(c -> c.name().equals(conditionName)).findFirst();
  }

  /** The phase conductor positions, in file order. */
  public List<ConductorPosition> phases() {
    return conductors.stream().filter(ConductorPosition::isPhase).toList();
  }

  /** The name for reports: the name when given, else the line id. */
  public String displayName() {
    return name.isEmpty() ? lineId : name;
  }
}
