package org.clearance.run;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import org.clearance.InputException;
import org.clearance.clearance.ConditionMinimum;
import org.clearance.clearance.ConditionSet;
import org.clearance.clearance.SpanContext;
import org.clearance.clearance.SpanStatus;
import org.clearance.io.Json;
import org.clearance.io.JsonFields;
import org.clearance.io.AtomicFiles;
import org.clearance.io.JsonWriter;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.SurveyUnits;

/**
 * Writes and reads {@link RunModel} as JSON ({@code model.json}). Lengths in metres; NaN is
 * written as null. The format is this project's own and is versioned by {@link #FORMAT}.
 */
public final class RunModelJson {

  /** Format name and version written into the file. */
  public static final String FORMAT = "clearance-run-model/1";

  private RunModelJson() {}

  /** The model as JSON text. */
  public static String toJson(RunModel m) {
    JsonWriter w = new JsonWriter().beginObject();
    w.member("format", FORMAT).member("tool_version", m.toolVersion());
    w.name("units").beginObject()
        .member("horizontal", m.units().horizontal().name())
        .member("vertical", m.units().vertical().name())
        .member("crs_name", m.units().crsName())
        .name("epsg");
    if (m.units().epsg().isPresent()) {
      w.value(m.units().epsg().getAsInt());
    } else {
      w.value((String) null);
    }
    w.member("wkt", m.units().wkt()).member("source", m.units().source()).endObject();
    w.name("conditions").beginArray();
    for (int k = 0; k < m.conditions().size(); k++) {
      w.beginObject().member("name", m.conditions().names().get(k))
          .member("group", m.conditions().groups().get(k)).endObject();
    }
    w.endArray();
    w.member("keep_radius_m", m.keepRadiusM()).member("vegetation", m.vegetation())
        .member("ground_source", m.groundSource());
    w.name("spans").beginArray();
    for (SpanRecord s : m.spans()) {
      writeSpan(w, s);
    }
    w.endArray();
    w.name("trees").beginArray();
    for (TreeRecord t : m.trees()) {
      w.beginObject().member("id", t.id()).member("span_id", t.spanId()).member("x", t.x())
          .member("y", t.y()).member("top_z", t.topZ()).member("base_z", t.baseZ())
          .member("height_m", t.heightM()).member("crown_radius_m", t.crownRadiusM())
          .name("base_distances_m").beginArray();
      for (double d : t.baseDistances()) {
        w.value(d);
      }
      w.endArray().member("nearest_conductor", t.nearestConductor()).endObject();
    }
    w.endArray();
    RunFactsJson.write(w, m.facts());
    return w.endObject().toString();
  }

  private static void writeSpan(JsonWriter w, SpanRecord s) {
    SpanContext c = s.context();
    w.beginObject().member("id", c.spanId()).member("line_id", c.lineId())
        .member("line_name", s.lineName()).member("nominal_voltage_kv", c.nominalVoltageKv())
        .member("altitude_m", c.altitudeM()).member("length_m", c.lengthM());
    writeStructure(w, "from", s.from());
    writeStructure(w, "to", s.to());
    w.member("status", s.status().name()).member("reason", s.reason());
    w.name("conductors").beginArray();
    for (ConductorRecord k : s.conductors()) {
      w.beginObject().member("name", k.name()).member("role", k.role())
          .member("status", k.status()).member("reason", k.reason())
          .member("points", k.points()).member("coverage_pct", k.coveragePct())
          .member("rms_m", k.rmsM()).member("max_gap_m", k.maxGapM());
      w.name("states").beginArray();
      for (int i = 0; i < k.states().size(); i++) {
        Optional<CurveRecord> st = k.states().get(i);
        if (st.isEmpty()) {
          w.beginObject().member("failure", k.failures().get(i).orElse("")).endObject();
          continue;
        }
        CurveRecord r = st.get();
        w.beginObject().member("ax", r.ax()).member("ay", r.ay()).member("az", r.az())
            .member("bx", r.bx()).member("by", r.by()).member("bz", r.bz())
            .member("c", r.c()).member("swing_min_rad", r.swingMin())
            .member("swing_max_rad", r.swingMax()).endObject();
      }
      w.endArray().endObject();
    }
    w.endArray();
    w.name("minima").beginArray();
    for (ConditionMinimum mm : s.minima()) {
      w.beginObject().member("condition", mm.condition()).member("group", mm.group())
          .member("distance_m", mm.distance()).member("horizontal_m", mm.horizontal())
          .member("vertical_m", mm.vertical()).member("conductor", mm.conductor())
          .member("x", mm.x()).member("y", mm.y()).member("z", mm.z()).endObject();
    }
    w.endArray();
    w.member("points_measured", s.pointsMeasured()).member("points_kept", s.pointsKept());
    w.name("notes").beginArray();
    for (String n : s.notes()) {
      w.value(n);
    }
    w.endArray().endObject();
  }

  private static void writeStructure(JsonWriter w, String name, StructureRecord r) {
    w.name(name).beginObject().member("id", r.id()).member("x", r.x()).member("y", r.y())
        .member("ground_z", r.groundZ()).member("type", r.type()).endObject();
  }

  /** Writes the model to a file (temporary file, then moved into place). */
  public static void write(RunModel model, Path file) throws IOException {
    AtomicFiles.writeString(file, toJson(model));
  }

  /**
   * Reads a model back.
   *
   * @throws InputException naming the file and key when it is not a run model of this format
   */
  public static RunModel read(Path file) throws IOException {
    String name = file.toString();
    Json.Value root = Json.parse(Files.readString(file, StandardCharsets.UTF_8), name);
    JsonFields r = new JsonFields(name);
    Json.Obj o = r.obj(root, "the document");
    String format = r.str(o, "format");
    if (!FORMAT.equals(format)) {
      throw new InputException(name, "line " + root.line(), "format",
          "not a run model of this version (" + format + "); expected " + FORMAT);
    }
    Json.Obj u = r.obj(r.get(o, "units"), "units");
    Json.Value epsg = r.get(u, "epsg");
    SurveyUnits units = new SurveyUnits(
        LinearUnit.valueOf(r.str(u, "horizontal")), LinearUnit.valueOf(r.str(u, "vertical")),
        r.str(u, "crs_name"),
        epsg instanceof Json.Num n ? OptionalInt.of((int) n.value()) : OptionalInt.empty(),
        r.str(u, "wkt"), r.str(u, "source"));
    List<String> names = new ArrayList<>();
    List<String> groups = new ArrayList<>();
    for (Json.Value v : r.arr(o, "conditions")) {
      Json.Obj c = r.obj(v, "a condition");
      names.add(r.str(c, "name"));
      groups.add(r.str(c, "group"));
    }
    List<SpanRecord> spans = new ArrayList<>();
    for (Json.Value v : r.arr(o, "spans")) {
      spans.add(readSpan(r, r.obj(v, "a span")));
    }
    List<TreeRecord> trees = new ArrayList<>();
    for (Json.Value v : r.arr(o, "trees")) {
      Json.Obj t = r.obj(v, "a tree");
      List<Double> ds = new ArrayList<>();
      for (Json.Value d : r.arr(t, "base_distances_m")) {
        ds.add(r.number(d, null));
      }
      trees.add(new TreeRecord(r.str(t, "id"), r.str(t, "span_id"), r.num(t, "x"),
          r.num(t, "y"), r.num(t, "top_z"), r.num(t, "base_z"), r.num(t, "height_m"),
          r.num(t, "crown_radius_m"), ds, r.str(t, "nearest_conductor")));
    }
    return new RunModel(r.str(o, "tool_version"), units, new ConditionSet(names, groups),
        r.num(o, "keep_radius_m"), r.str(o, "vegetation"), r.str(o, "ground_source"), spans,
        trees, o.members().containsKey(RunFactsJson.KEY)
            ? RunFactsJson.read(r, r.obj(o.members().get(RunFactsJson.KEY), RunFactsJson.KEY))
            : RunFacts.none());
  }

  private static SpanRecord readSpan(JsonFields r, Json.Obj s) {
    SpanContext context = new SpanContext(r.str(s, "id"), r.str(s, "line_id"),
        r.num(s, "nominal_voltage_kv"), r.num(s, "altitude_m"), r.num(s, "length_m"));
    List<ConductorRecord> conductors = new ArrayList<>();
    for (Json.Value v : r.arr(s, "conductors")) {
      Json.Obj k = r.obj(v, "a conductor");
      List<Optional<CurveRecord>> states = new ArrayList<>();
      List<Optional<String>> failures = new ArrayList<>();
      for (Json.Value sv : r.arr(k, "states")) {
        Json.Obj st = r.obj(sv, "a conductor state");
        if (st.members().containsKey("failure")) {
          states.add(Optional.empty());
          failures.add(Optional.of(r.str(st, "failure")));
        } else {
          states.add(Optional.of(new CurveRecord(r.num(st, "ax"), r.num(st, "ay"),
              r.num(st, "az"), r.num(st, "bx"), r.num(st, "by"), r.num(st, "bz"),
              r.num(st, "c"), r.num(st, "swing_min_rad"), r.num(st, "swing_max_rad"))));
          failures.add(Optional.empty());
        }
      }
      conductors.add(new ConductorRecord(r.str(k, "name"), r.str(k, "role"),
          r.str(k, "status"), r.str(k, "reason"), (int) r.num(k, "points"),
          r.num(k, "coverage_pct"), r.num(k, "rms_m"), r.num(k, "max_gap_m"), states,
          failures));
    }
    List<ConditionMinimum> minima = new ArrayList<>();
    for (Json.Value v : r.arr(s, "minima")) {
      Json.Obj m = r.obj(v, "a minimum");
      minima.add(new ConditionMinimum(r.str(m, "condition"), r.str(m, "group"),
          r.num(m, "distance_m"), r.num(m, "horizontal_m"), r.num(m, "vertical_m"),
          r.str(m, "conductor"), r.num(m, "x"), r.num(m, "y"), r.num(m, "z")));
    }
    List<String> notes = new ArrayList<>();
    for (Json.Value v : r.arr(s, "notes")) {
      notes.add(r.text(v, "a note"));
    }
    return new SpanRecord(context, r.str(s, "line_name"), readStructure(r, s, "from"),
        readStructure(r, s, "to"), SpanStatus.valueOf(r.str(s, "status")), r.str(s, "reason"),
        conductors, minima, (long) r.num(s, "points_measured"), (long) r.num(s, "points_kept"),
        notes);
  }

  private static StructureRecord readStructure(JsonFields r, Json.Obj s, String key) {
    Json.Obj o = r.obj(r.get(s, key), key);
    return new StructureRecord(r.str(o, "id"), r.num(o, "x"), r.num(o, "y"),
        r.num(o, "ground_z"), r.str(o, "type"));
  }
}
