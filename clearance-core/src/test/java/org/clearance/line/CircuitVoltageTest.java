package org.clearance.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Issue 15: {@code circuit_voltages_kv}, a voltage per circuit (a 12.47 kV distribution circuit
 * built under a 230 kV line on the same structures), read, defaulted and validated with file,
 * line and key.
 */
class CircuitVoltageTest {

  private static final ConductorLibrary LIB = ConductorLibrary.builtin();

  @TempDir Path dir;

  /** A 230 kV circuit (A, B, C) over a 12.47 kV circuit 2 (D, E, F) and its neutral N. */
  private static final String UNDERBUILD = String.join("\n",
      "line_id: L1",                                    // 1
      "nominal_voltage_kv: 230",                        // 2
      "circuit_voltages_kv: {2: 12.47}",                // 3
      "conductors:",                                    // 4
      "  - {position: A, role: phase, conductor: Drake}",                 // 5
      "  - {position: B, role: phase, conductor: Drake}",                 // 6
      "  - {position: C, role: phase, conductor: Drake}",                 // 7
      "  - {position: D, role: phase, circuit: 2, conductor: Raven}",     // 8
      "  - {position: E, role: phase, circuit: 2, conductor: Raven}",     // 9
      "  - {position: F, role: phase, circuit: 2, conductor: Raven}",     // 10
      "  - {position: N, role: neutral, circuit: 2, conductor: Raven}",   // 11
      "");

  private LineSpec read(String yaml) {
    return LineSpecReader.read(InputErrors.write(dir, "line.yaml", yaml), LIB);
  }

  @Test
  void eachCircuitHasItsVoltage() {
    LineSpec s = read(UNDERBUILD);
    assertEquals(Map.of(2, 12.47), s.circuitVoltagesKv());
    assertEquals(230, s.circuitVoltageKv(1), 0);
    assertEquals(12.47, s.circuitVoltageKv(2), 0);
    // the energised positions with their voltages; the neutral is not energised
    assertEquals(Map.of("A", 230.0, "B", 230.0, "C", 230.0, "D", 12.47, "E", 12.47,
        "F", 12.47), s.positionVoltagesKv());
  }

  @Test
  void withoutTheKeyEveryCircuitCarriesTheLineVoltage() {
    LineSpec s = read(UNDERBUILD.replace("circuit_voltages_kv: {2: 12.47}\n", ""));
    assertTrue(s.circuitVoltagesKv().isEmpty());
    assertEquals(230, s.circuitVoltageKv(2), 0);
    assertTrue(s.positionVoltagesKv().isEmpty());
  }

  static Stream<Arguments> errors() {
    String key = "circuit_voltages_kv: {2: 12.47}";
    return Stream.of(
        Arguments.of("not a number", key.replace("12.47", "low"), 3, "2", "number"),
        Arguments.of("volts for kilovolts", key.replace("12.47", "12470"), 3, "2",
            "plausible range"),
        Arguments.of("circuit without positions", key.replace("2:", "3:"), 3, "3",
            "has no phase position"),
        Arguments.of("circuit number out of range", key.replace("2:", "13:"), 3, "13",
            "outside 1 to 12"),
        Arguments.of("not a circuit number", key.replace("2:", "B:"), 3, "B",
            "circuit number"),
        Arguments.of("empty map", "circuit_voltages_kv: {}", 3, "circuit_voltages_kv",
            "at least one circuit"),
        Arguments.of("a list", "circuit_voltages_kv: [12.47]", 3, "circuit_voltages_kv", ""));
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("errors")
  void errorsNameFileLineAndKey(String what, String line, int at, String key, String problem) {
    Path f = InputErrors.write(dir, "bad.yaml",
        UNDERBUILD.replace("circuit_voltages_kv: {2: 12.47}", line));
    InputErrors.check(f, at, key, problem, () -> LineSpecReader.read(f, LIB));
  }
}
