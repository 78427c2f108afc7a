package org.clearance.examples;

import java.io.IOException;
import java.io.Writer;
import java.util.Locale;

/**
 * Writes the demo line's structures.csv and line.yaml in the formats of docs/line-inputs.md.
 * Coordinates and elevations are metres (the demo CRS is metric); numbers use {@link Locale#ROOT}.
 */
final class LineFiles {

  /**
   * Right-of-way half width of the demo line, m: 20 m either side, a 40 m corridor, about what a
   * 230 kV single-circuit line is given (common practice, no source).
   */
  static final double ROW_HALF_WIDTH_M = 20;
  /** Hot case: maximum operating temperature, degC, and creep allowance, degC. */
  static final double HOT_TEMPERATURE_C = 100;
  static final double HOT_CREEP_ALLOWANCE_C = 10;
  /** Blowout case: conductor temperature, degC, and wind pressure, Pa. */
  static final double WIND_TEMPERATURE_C = 15;
  static final double WIND_PRESSURE_PA = 290;
  /** Ice case: temperature, degC, and radial glaze ice, mm. */
  static final double ICE_TEMPERATURE_C = 0;
  static final double ICE_THICKNESS_MM = 12.7;

  private LineFiles() {}

  /** The structures file, with the options' structure edit applied. */
  static void writeStructures(Writer w, DemoScene scene) throws IOException {
    w.write("# Structures of line " + DemoScene.LINE_ID + " (" + DemoScene.LINE_NAME + "), "
        + DemoScene.UTILITY + ". Invented demo data; x, y, ground_z in metres, EPSG:"
        + DemoScene.EPSG + ".\n");
    w.write("structure_id,x,y,line_id,sequence,type,ground_z\n");
    for (DemoStructure t : scene.writtenStructures()) {
      w.write(String.format(Locale.ROOT, "%s,%.3f,%.3f,%s,%d,%s,%.3f\n", t.id(), t.x(), t.y(),
          DemoScene.LINE_ID, t.sequence(), t.type().csvName(), t.groundZ()));
    }
  }

  /** The line specification. */
  static void writeLineSpec(Writer w, DemoScene scene) throws IOException {
    double altitude = 0;
    for (DemoStructure t : scene.structures()) {
      altitude = Math.max(altitude, t.groundZ());
    }
    w.write("# Line specification of " + DemoScene.LINE_NAME + " (" + DemoScene.UTILITY
        + "). Invented demo data.\n");
    w.write("line_id: " + DemoScene.LINE_ID + "\n");
    w.write("name: \"" + DemoScene.LINE_NAME + "\"\n");
    w.write(f("nominal_voltage_kv: %.0f\n", DemoScene.NOMINAL_VOLTAGE_KV));
    w.write(f("altitude_m: %.0f\n", Math.ceil(altitude)));
    w.write(f("survey_conductor_temperature_c: %.1f\n", scene.surveyTemperatureC()));
    w.write(f("row_half_width_m: %.1f\n", ROW_HALF_WIDTH_M));
    w.write("conductors:\n");
    for (DemoPosition p : scene.positions()) {
      w.write("  - position: " + p.name() + "\n");
      w.write("    role: " + p.role().name().toLowerCase(Locale.ROOT) + "\n");
      w.write("    circuit: 1\n");
      w.write("    conductor: " + p.type().code() + "\n");
      w.write(f("    offset_m: %.2f\n", p.offsetM()));
      w.write(f("    attach_height_m: %.2f\n", p.attachHeightM()));
      if (p.insulatorLengthM() > 0) {
        w.write(f("    insulator_length_m: %.2f\n", p.insulatorLengthM()));
        w.write(f("    strain_length_m: %.2f\n", TowerGeometry.STRAIN_INSULATOR_M));
      }
    }
    w.write("conditions:\n");
    w.write("  - name: hot\n    kind: temperature\n");
    w.write(f("    temperature_c: %.1f\n", HOT_TEMPERATURE_C));
    w.write(f("    creep_allowance_c: %.1f\n", HOT_CREEP_ALLOWANCE_C));
    writeWindAndIce(w);
  }

  /** The blowout and ice conditions of the demo line's specification. */
  static void writeWindAndIce(Writer w) throws IOException {
    w.write("  - name: blowout\n    kind: wind\n");
    w.write(f("    temperature_c: %.1f\n", WIND_TEMPERATURE_C));
    w.write(f("    wind_pressure_pa: %.1f\n", WIND_PRESSURE_PA));
    w.write("  - name: ice\n    kind: ice\n");
    w.write(f("    temperature_c: %.1f\n", ICE_TEMPERATURE_C));
    w.write(f("    ice_thickness_mm: %.1f\n", ICE_THICKNESS_MM));
  }

  private static String f(String format, double v) {
    return String.format(Locale.ROOT, format, v);
  }
}
