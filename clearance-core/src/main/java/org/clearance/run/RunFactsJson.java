package org.clearance.run;

import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.clearance.InputException;
import org.clearance.io.Json;
import org.clearance.io.JsonFields;
import org.clearance.io.JsonWriter;
import org.clearance.line.LineCondition;

/** The {@code facts} member of {@code model.json} ({@link RunFacts}); NaN is written as null. */
final class RunFactsJson {

  /** Member name in the model. */
  static final String KEY = "facts";

  private RunFactsJson() {}

  static void write(JsonWriter w, RunFacts f) {
    w.name(KEY).beginObject();
    w.name("lines").beginArray();
    for (LineFacts l : f.lines()) {
      w.beginObject().member("line_id", l.lineId()).member("name", l.name())
          .member("nominal_voltage_kv", l.nominalVoltageKv())
          .member("survey_conductor_temperature_c", l.surveyConductorTemperatureC())
          .member("row_half_width_m", l.rowHalfWidthM());
      w.name("positions").beginArray();
      for (LineFacts.Position p : l.positions()) {
        w.beginObject().member("position", p.position()).member("role", p.role())
            .member("circuit", p.circuit()).member("conductor", p.conductor())
            .member("bundle", p.bundle()).endObject();
      }
      w.endArray().name("conditions").beginArray();
      for (LineCondition c : l.conditions()) {
        w.beginObject().member("name", c.name())
            .member("kind", c.kind().name().toLowerCase(Locale.ROOT))
            .member("temperature_c", c.temperatureC())
            .member("creep_allowance_c", c.creepAllowanceC())
            .member("ice_thickness_m", c.iceThicknessM())
            .member("ice_density_kg_m3", c.iceDensityKgM3())
            .member("wind_pressure_pa", c.windPressurePa())
            .member("swing_angle_rad", c.swingAngleRad())
            .member("extra_sag_m", c.extraSagM()).endObject();
      }
      w.endArray().endObject();
    }
    w.endArray().name("inputs").beginArray();
    for (RunRecord.InputFile i : f.inputs()) {
      w.beginObject().member("role", i.role()).member("path", i.path())
          .member("bytes", i.bytes()).member("sha256", i.sha256()).endObject();
    }
    w.endArray();
    day(w, "first_survey_day", f.firstSurveyDay());
    day(w, "last_survey_day", f.lastSurveyDay());
    w.member("acquisition_note", f.acquisitionNote());
    day(w, "run_day", f.runDay());
    w.endObject();
  }

  private static void day(JsonWriter w, String name, Optional<LocalDate> d) {
    w.name(name);
    w.value(d.map(LocalDate::toString).orElse(null));
  }

  static RunFacts read(JsonFields r, Json.Obj o) {
    List<LineFacts> lines = new ArrayList<>();
    for (Json.Value v : r.arr(o, "lines")) {
      Json.Obj l = r.obj(v, "a line");
      List<LineFacts.Position> positions = new ArrayList<>();
      for (Json.Value pv : r.arr(l, "positions")) {
        Json.Obj p = r.obj(pv, "a position");
        positions.add(new LineFacts.Position(r.str(p, "position"), r.str(p, "role"),
            (int) r.num(p, "circuit"), r.str(p, "conductor"), (int) r.num(p, "bundle")));
      }
      List<LineCondition> conditions = new ArrayList<>();
      for (Json.Value cv : r.arr(l, "conditions")) {
        Json.Obj c = r.obj(cv, "a condition");
        String kind = r.str(c, "kind");
        LineCondition.Kind k;
        try {
          k = LineCondition.Kind.valueOf(kind.toUpperCase(Locale.ROOT));
        } catch (IllegalArgumentException e) {
          throw new InputException(r.file(), "line " + c.line(), "kind",
              "not a condition kind: " + kind);
        }
        conditions.add(new LineCondition(r.str(c, "name"), k, r.num(c, "temperature_c"),
            r.num(c, "creep_allowance_c"), r.num(c, "ice_thickness_m"),
            r.num(c, "ice_density_kg_m3"), r.num(c, "wind_pressure_pa"),
            r.num(c, "swing_angle_rad"), r.num(c, "extra_sag_m")));
      }
      lines.add(new LineFacts(r.str(l, "line_id"), r.str(l, "name"),
          r.num(l, "nominal_voltage_kv"), r.num(l, "survey_conductor_temperature_c"),
          r.num(l, "row_half_width_m"), positions, conditions));
    }
    List<RunRecord.InputFile> inputs = new ArrayList<>();
    for (Json.Value v : r.arr(o, "inputs")) {
      Json.Obj i = r.obj(v, "an input");
      inputs.add(new RunRecord.InputFile(r.str(i, "role"), r.str(i, "path"),
          (long) r.num(i, "bytes"), r.str(i, "sha256")));
    }
    return new RunFacts(lines, inputs, day(r, o, "first_survey_day"),
        day(r, o, "last_survey_day"), r.str(o, "acquisition_note"), day(r, o, "run_day"));
  }

  private static Optional<LocalDate> day(JsonFields r, Json.Obj o, String key) {
    Json.Value v = r.get(o, key);
    if (v instanceof Json.Null) {
      return Optional.empty();
    }
    String s = r.text(v, key);
    try {
      return Optional.of(LocalDate.parse(s));
    } catch (DateTimeParseException e) {
      throw new InputException(r.file(), "line " + v.line(), key, "not an ISO-8601 day: " + s);
    }
  }
}
