package org.clearance.run;

import java.util.List;
import java.util.Objects;
import org.clearance.line.ConductorPosition;
import org.clearance.line.LineCondition;
import org.clearance.line.LineSpec;

/**
 * What the line specification says about one line, as the report's header states it.
 *
 * @param lineId line id
 * @param name human-readable name, or empty
 * @param nominalVoltageKv nominal phase-to-phase voltage, kV
 * @param surveyConductorTemperatureC conductor temperature during the survey, degC, or NaN
 * @param rowHalfWidthM right-of-way half width, m, or NaN when not given
 * @param positions the conductor positions in file order
 * @param conditions the line conditions with their parameters
 * @param circuitVoltagesKv the circuits that carry another voltage than the line's, kV, by
 *     circuit number (issue 15); empty when every circuit carries {@code nominalVoltageKv}
 */
public record LineFacts(
    String lineId, String name, double nominalVoltageKv, double surveyConductorTemperatureC,
    double rowHalfWidthM, List<Position> positions, List<LineCondition> conditions,
    java.util.Map<Integer, Double> circuitVoltagesKv) {

  /** The facts of a line whose circuits all carry its nominal voltage. */
  public LineFacts(String lineId, String name, double nominalVoltageKv,
      double surveyConductorTemperatureC, double rowHalfWidthM, List<Position> positions,
      List<LineCondition> conditions) {
    this(lineId, name, nominalVoltageKv, surveyConductorTemperatureC, rowHalfWidthM, positions,
        conditions, java.util.Map.of());
  }

  /** The nominal voltage of a circuit, kV: its own when given, else the line's. */
  public double circuitVoltageKv(int circuit) {
    return circuitVoltagesKv.getOrDefault(circuit, nominalVoltageKv);
  }

  /**
   * One conductor position.
   *
   * @param position position name, e.g. {@code A}
   * @param role {@code phase}, {@code shield} or {@code neutral}
   * @param circuit circuit number (1 when the specification gives none)
   * @param conductor conductor type code, e.g. {@code Drake}
   * @param bundle sub-conductors per phase
   */
  public record Position(String position, String role, int circuit, String conductor,
      int bundle) {
    public Position {
      Objects.requireNonNull(position, "position");
      Objects.requireNonNull(role, "role");
      Objects.requireNonNull(conductor, "conductor");
    }
  }

  public LineFacts {
    Objects.requireNonNull(lineId, "lineId");
    Objects.requireNonNull(name, "name");
    positions = List.copyOf(positions);
    conditions = List.copyOf(conditions);
    circuitVoltagesKv = java.util.Collections.unmodifiableMap(new java.util.TreeMap<>(
        circuitVoltagesKv));
  }

  /** The facts of a read specification. */
  public static LineFacts of(LineSpec spec) {
    return new LineFacts(spec.lineId(), spec.name(), spec.nominalVoltageKv(),
        spec.surveyConductorTemperatureC(), spec.rowHalfWidthM(),
        spec.conductors().stream().map(LineFacts::position).toList(), spec.conditions(),
        spec.circuitVoltagesKv());
  }

  private static Position position(ConductorPosition p) {
    return new Position(p.position(), p.role().name().toLowerCase(java.util.Locale.ROOT),
        p.circuit(),
        p.conductor().code(), p.bundle());
  }

  /** The circuit of a position name ({@code B} or a sub-conductor {@code B.1}), or 0. */
  public int circuitOf(String positionName) {
    String base = positionName.contains(".") && positions.stream()
        .noneMatch(p -> p.position().equals(positionName))
        ? positionName.substring(0, positionName.lastIndexOf('.')) : positionName;
    return positions.stream().filter(p -> p.position().equals(base)).mapToInt(Position::circuit)
        .findFirst().orElse(0);
  }
}
