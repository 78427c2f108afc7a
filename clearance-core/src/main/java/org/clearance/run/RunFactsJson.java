package org.clearance.run;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.clearance.io.JsonAt;
import org.clearance.io.JsonFiles;
import org.clearance.line.LineCondition;

/** The {@code facts} member of {@code model.json} ({@link RunFacts}); NaN is written as null. */
final class RunFactsJson {

  /** Member name in the model. */
  static final String KEY = "facts";

  private RunFactsJson() {}

  static ObjectNode node(RunFacts f) {
    ObjectNode o = JsonFiles.object();
    ArrayNode lines = o.putArray("lines");
    for (LineFacts l : f.lines()) {
      ObjectNode n = lines.addObject().put("line_id", l.lineId()).put("name", l.name());
      n.set("nominal_voltage_kv", JsonFiles.number(l.nominalVoltageKv()));
      if (!l.circuitVoltagesKv().isEmpty()) {
        ObjectNode cv = n.putObject("circuit_voltages_kv");
        l.circuitVoltagesKv().forEach((c, v) -> cv.set(Integer.toString(c),
            JsonFiles.number(v)));
      }
      n.set("survey_conductor_temperature_c",
          JsonFiles.number(l.surveyConductorTemperatureC()));
      n.set("row_half_width_m", JsonFiles.number(l.rowHalfWidthM()));
      ArrayNode positions = n.putArray("positions");
      for (LineFacts.Position p : l.positions()) {
        positions.addObject().put("position", p.position()).put("role", p.role())
            .put("circuit", p.circuit()).put("conductor", p.conductor())
            .put("bundle", p.bundle());
      }
      ArrayNode conditions = n.putArray("conditions");
      for (LineCondition c : l.conditions()) {
        ObjectNode cn = conditions.addObject().put("name", c.name())
            .put("kind", c.kind().name().toLowerCase(Locale.ROOT));
        cn.set("temperature_c", JsonFiles.number(c.temperatureC()));
        cn.set("creep_allowance_c", JsonFiles.number(c.creepAllowanceC()));
        cn.set("ice_thickness_m", JsonFiles.number(c.iceThicknessM()));
        cn.set("ice_density_kg_m3", JsonFiles.number(c.iceDensityKgM3()));
        cn.set("wind_pressure_pa", JsonFiles.number(c.windPressurePa()));
        cn.set("swing_angle_rad", JsonFiles.number(c.swingAngleRad()));
        cn.set("extra_sag_m", JsonFiles.number(c.extraSagM()));
      }
    }
    ArrayNode inputs = o.putArray("inputs");
    for (RunRecord.InputFile i : f.inputs()) {
      inputs.addObject().put("role", i.role()).put("path", i.path()).put("bytes", i.bytes())
          .put("sha256", i.sha256());
    }
    o.set("first_survey_day", JsonFiles.text(f.firstSurveyDay().map(LocalDate::toString)
        .orElse(null)));
    o.set("last_survey_day", JsonFiles.text(f.lastSurveyDay().map(LocalDate::toString)
        .orElse(null)));
    o.put("acquisition_note", f.acquisitionNote());
    return o;
  }

  static RunFacts read(JsonAt o) {
    List<LineFacts> lines = new ArrayList<>();
    for (JsonAt l : o.objects("lines")) {
      List<LineFacts.Position> positions = new ArrayList<>();
      for (JsonAt p : l.objects("positions")) {
        positions.add(new LineFacts.Position(p.str("position"), p.str("role"),
            (int) p.integer("circuit", Integer.MIN_VALUE, Integer.MAX_VALUE), p.str("conductor"),
            (int) p.integer("bundle", Integer.MIN_VALUE, Integer.MAX_VALUE)));
      }
      List<LineCondition> conditions = new ArrayList<>();
      for (JsonAt c : l.objects("conditions")) {
        String kind = c.str("kind");
        LineCondition.Kind k;
        try {
          k = LineCondition.Kind.valueOf(kind.toUpperCase(Locale.ROOT));
        } catch (IllegalArgumentException e) {
          throw c.error("kind", "not a condition kind: " + kind);
        }
        conditions.add(new LineCondition(c.str("name"), k, c.num("temperature_c"),
            c.num("creep_allowance_c"), c.num("ice_thickness_m"), c.num("ice_density_kg_m3"),
            c.num("wind_pressure_pa"), c.num("swing_angle_rad"), c.num("extra_sag_m")));
      }
      java.util.Map<Integer, Double> circuitKv = new java.util.TreeMap<>();
      if (l.has("circuit_voltages_kv")) {
        for (var e : l.numberMap("circuit_voltages_kv").entrySet()) {
          try {
            circuitKv.put(Integer.parseInt(e.getKey()), e.getValue());
          } catch (NumberFormatException ex) {
            throw l.error("circuit_voltages_kv", "not a circuit number: " + e.getKey());
          }
        }
      }
      lines.add(new LineFacts(l.str("line_id"), l.str("name"), l.num("nominal_voltage_kv"),
          l.num("survey_conductor_temperature_c"), l.num("row_half_width_m"), positions,
          conditions, circuitKv));
    }
    List<RunRecord.InputFile> inputs = new ArrayList<>();
    for (JsonAt i : o.objects("inputs")) {
      inputs.add(new RunRecord.InputFile(i.str("role"), i.str("path"),
          i.integer("bytes", 0, Long.MAX_VALUE), i.str("sha256")));
    }
    return new RunFacts(lines, inputs, day(o, "first_survey_day"), day(o, "last_survey_day"),
        o.str("acquisition_note"));
  }

  private static Optional<LocalDate> day(JsonAt o, String key) {
    if (o.get(key).isNull()) {
      return Optional.empty();
    }
    String s = o.str(key);
    try {
      return Optional.of(LocalDate.parse(s));
    } catch (DateTimeParseException e) {
      throw o.error(key, "not an ISO-8601 day: " + s);
    }
  }
}
