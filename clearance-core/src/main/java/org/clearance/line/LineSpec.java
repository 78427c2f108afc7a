package org.clearance.line;

import java.util.List;
import java.util.Map;
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
 * @param surveyTemperature how the survey-time conductor temperature is known (given with a range,
 *     or computed by the IEEE Std 738-2012 heat balance); {@code surveyConductorTemperatureC} is
 *     the given value, NaN when computed
 * @param circuitVoltagesKv nominal phase-to-phase voltage of the circuits that carry another
 *     voltage than {@code nominalVoltageKv}, kV, by circuit number (issue 15: distribution built
 *     under a transmission line); every other circuit carries {@code nominalVoltageKv}
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
    String sourceFile,
    SurveyTemperatureSpec surveyTemperature,
    Map<Integer, Double> circuitVoltagesKv) {

  public LineSpec {
    Objects.requireNonNull(lineId, "lineId");
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(sourceFile, "sourceFile");
    Objects.requireNonNull(surveyTemperature, "surveyTemperature");
    if (!(Double.isFinite(nominalVoltageKv) && nominalVoltageKv > 0)) {
      throw new IllegalArgumentException("voltage must be positive: " + nominalVoltageKv);
    }
    conductors = List.copyOf(conductors);
    conditions = List.copyOf(conditions);
    circuitVoltagesKv = java.util.Collections.unmodifiableMap(new java.util.TreeMap<>(
        circuitVoltagesKv));
    for (double v : circuitVoltagesKv.values()) {
      if (!(Double.isFinite(v) && v > 0)) {
        throw new IllegalArgumentException("circuit voltage must be positive: " + v);
      }
    }
  }

  /** A specification whose circuits all carry the nominal voltage. */
  public LineSpec(String lineId, String name, double nominalVoltageKv, double altitudeM,
      double surveyConductorTemperatureC, double rowHalfWidthM, List<ConductorPosition> conductors,
      List<LineCondition> conditions, String sourceFile,
      SurveyTemperatureSpec surveyTemperature) {
    this(lineId, name, nominalVoltageKv, altitudeM, surveyConductorTemperatureC, rowHalfWidthM,
        conductors, conditions, sourceFile, surveyTemperature, Map.of());
  }

  /** The nominal voltage of a circuit, kV: its own when given, else the line's. */
  public double circuitVoltageKv(int circuit) {
    return circuitVoltagesKv.getOrDefault(circuit, nominalVoltageKv);
  }

  /**
   * The voltage of every energised (phase) position by name, kV, when some circuit carries its
   * own voltage; empty when every circuit carries {@code nominalVoltageKv}.
   */
  public Map<String, Double> positionVoltagesKv() {
    if (circuitVoltagesKv.isEmpty()) {
      return Map.of();
    }
    Map<String, Double> out = new java.util.LinkedHashMap<>();
    for (ConductorPosition p : phases()) {
      out.put(p.position(), circuitVoltageKv(p.circuit()));
    }
    return out;
  }

  /** A specification whose survey temperature, when given, is assumed with the default range. */
  public LineSpec(String lineId, String name, double nominalVoltageKv, double altitudeM,
      double surveyConductorTemperatureC, double rowHalfWidthM, List<ConductorPosition> conductors,
      List<LineCondition> conditions, String sourceFile) {
    this(lineId, name, nominalVoltageKv, altitudeM, surveyConductorTemperatureC, rowHalfWidthM,
        conductors, conditions, sourceFile,
        SurveyTemperatureSpec.assumed(surveyConductorTemperatureC));
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
