package org.clearance.run;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import org.clearance.InputException;
import org.clearance.clearance.ConditionMinimum;
import org.clearance.clearance.ConditionSet;
import org.clearance.clearance.SpanContext;
import org.clearance.clearance.SpanStatus;
import org.clearance.wire.Crossing;
import org.clearance.io.AtomicFiles;
import org.clearance.io.JsonAt;
import org.clearance.io.JsonFiles;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.SurveyUnits;

/**
 * Writes and reads {@link RunModel} as JSON ({@code model.json}). Lengths in metres; NaN is
 * written as null. The format is this project's own and is versioned by {@link #FORMAT}.
 *
 * <p>The file is one object: {@code {"format":"clearance-run-model/2","content_sha256":"HEX",
 * "model":{...}}} followed by a line break, where HEX is the SHA-256 (FIPS 180-4) of the exact
 * bytes of the {@code model} value. Reading checks the format and the checksum before anything
 * else, so a damaged or edited file is refused with a message naming it, never half-used.
 */
public final class RunModelJson {

  /** Format name and version written into the file. */
  public static final String FORMAT = "clearance-run-model/2";
  /** Hex digits of a SHA-256. */
  private static final int SHA256_HEX = 64;
  /** What a damaged file's message ends with. */
  private static final String RERUN = "; the run folder is damaged: run the check again";

  private RunModelJson() {}

  /** The model as JSON text, with its format and checksum. */
  public static String toJson(RunModel m) {
    String body = JsonFiles.write(model(m));
    return prefix(sha256(body.getBytes(StandardCharsets.UTF_8))) + body + "}\n";
  }

  private static String prefix(String sha256) {
    return "{\"format\":\"" + FORMAT + "\",\"content_sha256\":\"" + sha256 + "\",\"model\":";
  }

  private static ObjectNode model(RunModel m) {
    ObjectNode o = JsonFiles.object();
    o.put("tool_version", m.toolVersion());
    ObjectNode u = o.putObject("units");
    u.put("horizontal", m.units().horizontal().name())
        .put("vertical", m.units().vertical().name())
        .put("crs_name", m.units().crsName());
    if (m.units().epsg().isPresent()) {
      u.put("epsg", m.units().epsg().getAsInt());
    } else {
      u.putNull("epsg");
    }
    u.put("wkt", m.units().wkt()).put("source", m.units().source());
    ArrayNode conditions = o.putArray("conditions");
    for (int k = 0; k < m.conditions().size(); k++) {
      conditions.addObject().put("name", m.conditions().names().get(k))
          .put("group", m.conditions().groups().get(k));
    }
    o.set("keep_radius_m", JsonFiles.number(m.keepRadiusM()));
    o.put("vegetation", m.vegetation()).put("ground_source", m.groundSource());
    ArrayNode spans = o.putArray("spans");
    for (SpanRecord s : m.spans()) {
      spans.add(span(s));
    }
    ArrayNode trees = o.putArray("trees");
    for (TreeRecord t : m.trees()) {
      ObjectNode n = trees.addObject().put("id", t.id()).put("span_id", t.spanId());
      n.set("x", JsonFiles.number(t.x()));
      n.set("y", JsonFiles.number(t.y()));
      n.set("top_z", JsonFiles.number(t.topZ()));
      n.set("base_z", JsonFiles.number(t.baseZ()));
      n.set("height_m", JsonFiles.number(t.heightM()));
      n.set("crown_radius_m", JsonFiles.number(t.crownRadiusM()));
      ArrayNode ds = n.putArray("base_distances_m");
      t.baseDistances().forEach(d -> ds.add(JsonFiles.number(d)));
      n.put("nearest_conductor", t.nearestConductor());
    }
    o.set(RunFactsJson.KEY, RunFactsJson.node(m.facts()));
    return o;
  }

  private static ObjectNode span(SpanRecord s) {
    SpanContext c = s.context();
    ObjectNode o = JsonFiles.object();
    o.put("id", c.spanId()).put("line_id", c.lineId()).put("line_name", s.lineName());
    o.set("nominal_voltage_kv", JsonFiles.number(c.nominalVoltageKv()));
    o.set("altitude_m", JsonFiles.number(c.altitudeM()));
    o.set("length_m", JsonFiles.number(c.lengthM()));
    if (!c.positionVoltagesKv().isEmpty()) {
      ObjectNode pv = o.putObject("position_voltages_kv");
      c.positionVoltagesKv().forEach((k, v) -> pv.set(k, JsonFiles.number(v)));
    }
    o.set("from", structure(s.from()));
    o.set("to", structure(s.to()));
    o.put("status", s.status().name()).put("reason", s.reason());
    ArrayNode conductors = o.putArray("conductors");
    for (ConductorRecord k : s.conductors()) {
      ObjectNode n = conductors.addObject().put("name", k.name()).put("role", k.role())
          .put("status", k.status()).put("reason", k.reason()).put("points", k.points());
      n.set("coverage_pct", JsonFiles.number(k.coveragePct()));
      n.set("rms_m", JsonFiles.number(k.rmsM()));
      n.set("max_gap_m", JsonFiles.number(k.maxGapM()));
      ArrayNode states = n.putArray("states");
      for (int i = 0; i < k.states().size(); i++) {
        Optional<CurveRecord> st = k.states().get(i);
        if (st.isEmpty()) {
          states.addObject().put("failure", k.failures().get(i).orElse(""));
          continue;
        }
        CurveRecord r = st.get();
        ObjectNode cn = states.addObject();
        double[] v = {r.ax(), r.ay(), r.az(), r.bx(), r.by(), r.bz(), r.c(), r.swingMin(),
            r.swingMax()};
        String[] names = {"ax", "ay", "az", "bx", "by", "bz", "c", "swing_min_rad",
            "swing_max_rad"};
        for (int j = 0; j < v.length; j++) {
          cn.set(names[j], JsonFiles.number(v[j]));
        }
      }
    }
    ArrayNode minima = o.putArray("minima");
    for (ConditionMinimum mm : s.minima()) {
      ObjectNode n = minima.addObject().put("condition", mm.condition()).put("group", mm.group());
      n.set("distance_m", JsonFiles.number(mm.distance()));
      n.set("horizontal_m", JsonFiles.number(mm.horizontal()));
      n.set("vertical_m", JsonFiles.number(mm.vertical()));
      n.put("conductor", mm.conductor());
      n.set("x", JsonFiles.number(mm.x()));
      n.set("y", JsonFiles.number(mm.y()));
      n.set("z", JsonFiles.number(mm.z()));
    }
    o.put("points_measured", s.pointsMeasured()).put("points_kept", s.pointsKept());
    o.put("points_set_aside_wire", s.setAside().wire())
        .put("points_set_aside_structure", s.setAside().structure())
        .put("points_set_aside_airborne", s.setAside().airborne())
        .put("points_set_aside_object", s.setAside().object())
        .put("points_set_aside_crossing", s.setAside().crossing())
        .put("points_wire_touched_measured", s.setAside().wireTouched())
        .put("points_label_distrusted", s.setAside().labelsDistrusted());
    ArrayNode crossings = o.putArray("crossings");
    for (Crossing k : s.crossings()) {
      ObjectNode n = crossings.addObject();
      n.set("x", JsonFiles.number(k.x()));
      n.set("y", JsonFiles.number(k.y()));
      n.set("z", JsonFiles.number(k.z()));
      n.set("station_m", JsonFiles.number(k.stationM()));
      n.set("angle_deg", JsonFiles.number(k.angleDeg()));
      n.put("points", k.points()).put("conductor", k.conductor());
      n.set("separation_m", JsonFiles.number(k.separationM()));
    }
    ArrayNode notes = o.putArray("notes");
    s.notes().forEach(notes::add);
    ObjectNode t = o.putObject("survey_temperature").put("source", s.temperature().source());
    t.set("span_c", JsonFiles.number(s.temperature().spanC()));
    t.set("span_sigma_c", JsonFiles.number(s.temperature().spanSigmaC()));
    t.set("section_c", JsonFiles.number(s.temperature().sectionC()));
    t.set("section_sigma_c", JsonFiles.number(s.temperature().sectionSigmaC()));
    return o;
  }

  private static ObjectNode structure(StructureRecord r) {
    ObjectNode o = JsonFiles.object().put("id", r.id());
    o.set("x", JsonFiles.number(r.x()));
    o.set("y", JsonFiles.number(r.y()));
    o.set("ground_z", JsonFiles.number(r.groundZ()));
    o.put("type", r.type());
    return r.equipment().isEmpty() ? o : o.put("equipment", r.equipment());
  }

  /** Writes the model to a file (temporary file, then moved into place). */
  public static void write(RunModel model, Path file) throws IOException {
    AtomicFiles.writeString(file, toJson(model));
  }

  /**
   * Reads a model back.
   *
   * @throws InputException naming the file (and the key) when it is not a run model of this
   *     format, does not match its checksum, or lacks a value
   */
  public static RunModel read(Path file) throws IOException {
    String name = file.toString();
    byte[] bytes = Files.readAllBytes(file);
    String text;
    try {
      text = StandardCharsets.UTF_8.newDecoder().decode(java.nio.ByteBuffer.wrap(bytes))
          .toString();
    } catch (CharacterCodingException e) {
      throw new InputException(name, null, null, "not UTF-8 text" + RERUN);
    }
    JsonAt root = JsonAt.root(name, JsonFiles.parse(text, name));
    String format = root.str("format");
    if (!FORMAT.equals(format)) {
      throw root.error("format", format.startsWith("clearance-run-model/")
          ? "run model " + format + ", this version reads " + FORMAT
              + ": run the check again with this version"
          : "not a Clearance run model (" + format + ")" + RERUN);
    }
    String stated = root.str("content_sha256");
    byte[] prefix = prefix(stated).getBytes(StandardCharsets.UTF_8);
    int end = bytes.length - (text.endsWith("}\n") ? 2 : 1);
    if (stated.length() != SHA256_HEX || bytes.length < prefix.length + 1
        || !Arrays.equals(prefix, Arrays.copyOf(bytes, prefix.length))
        || !stated.equals(sha256(Arrays.copyOfRange(bytes, prefix.length, end)))) {
      throw root.error("content_sha256", "the content does not match its SHA-256: the file "
          + "was changed or damaged" + RERUN);
    }
    return model(root.obj("model"));
  }

  private static RunModel model(JsonAt o) {
    JsonAt u = o.obj("units");
    JsonNode epsg = u.get("epsg");
    OptionalInt code = OptionalInt.empty();
    if (!epsg.isNull()) {
      code = OptionalInt.of((int) u.integer("epsg", 0, Integer.MAX_VALUE));
    }
    SurveyUnits units = new SurveyUnits(u.constant("horizontal", LinearUnit.class),
        u.constant("vertical", LinearUnit.class), u.str("crs_name"), code, u.str("wkt"),
        u.str("source"));
    List<String> names = new ArrayList<>();
    List<String> groups = new ArrayList<>();
    for (JsonAt c : o.objects("conditions")) {
      names.add(c.str("name"));
      groups.add(c.str("group"));
    }
    if (names.isEmpty()) {
      throw o.error("conditions", "empty: at least the surveyed state" + RERUN);
    }
    List<SpanRecord> spans = new ArrayList<>();
    for (JsonAt s : o.objects("spans")) {
      spans.add(span(s, names.size()));
    }
    List<TreeRecord> trees = new ArrayList<>();
    for (JsonAt t : o.objects("trees")) {
      trees.add(new TreeRecord(t.str("id"), t.str("span_id"), t.num("x"), t.num("y"),
          t.num("top_z"), t.num("base_z"), t.num("height_m"), t.num("crown_radius_m"),
          t.numbers("base_distances_m"), t.str("nearest_conductor")));
    }
    try {
      return new RunModel(o.str("tool_version"), units, new ConditionSet(names, groups),
          o.num("keep_radius_m"), o.str("vegetation"), o.str("ground_source"), spans, trees,
          RunFactsJson.read(o.obj(RunFactsJson.KEY)));
    } catch (IllegalArgumentException e) {
      throw o.error(null, e.getMessage() + RERUN);
    }
  }

  private static SpanRecord span(JsonAt s, int conditions) {
    SpanContext context = new SpanContext(s.str("id"), s.str("line_id"),
        s.num("nominal_voltage_kv"), s.num("altitude_m"), s.num("length_m"),
        s.has("position_voltages_kv") ? s.numberMap("position_voltages_kv") : Map.of());
    List<ConductorRecord> conductors = new ArrayList<>();
    for (JsonAt k : s.objects("conductors")) {
      List<Optional<CurveRecord>> states = new ArrayList<>();
      List<Optional<String>> failures = new ArrayList<>();
      for (JsonAt st : k.objects("states")) {
        if (st.has("failure")) {
          states.add(Optional.empty());
          failures.add(Optional.of(st.str("failure")));
        } else {
          states.add(Optional.of(new CurveRecord(st.num("ax"), st.num("ay"), st.num("az"),
              st.num("bx"), st.num("by"), st.num("bz"), st.num("c"), st.num("swing_min_rad"),
              st.num("swing_max_rad"))));
          failures.add(Optional.empty());
        }
      }
      if (states.size() != conditions) {
        throw k.error("states", states.size() + " states for " + conditions + " conditions"
            + RERUN);
      }
      conductors.add(new ConductorRecord(k.str("name"), k.str("role"), k.str("status"),
          k.str("reason"), (int) k.integer("points", 0, Integer.MAX_VALUE),
          k.num("coverage_pct"), k.num("rms_m"), k.num("max_gap_m"), states, failures));
    }
    List<ConditionMinimum> minima = new ArrayList<>();
    for (JsonAt m : s.objects("minima")) {
      minima.add(new ConditionMinimum(m.str("condition"), m.str("group"), m.num("distance_m"),
          m.num("horizontal_m"), m.num("vertical_m"), m.str("conductor"), m.num("x"),
          m.num("y"), m.num("z")));
    }
    try {
      return new SpanRecord(context, s.str("line_name"), structure(s.obj("from")),
          structure(s.obj("to")), s.constant("status", SpanStatus.class), s.str("reason"),
          conductors, minima, s.integer("points_measured", 0, Long.MAX_VALUE),
          s.integer("points_kept", 0, Long.MAX_VALUE), s.strings("notes"),
          new SpanRecord.SetAsideCounts(count(s, "points_set_aside_wire"),
              count(s, "points_set_aside_structure"), count(s, "points_set_aside_airborne"),
              count(s, "points_set_aside_object"), count(s, "points_set_aside_crossing"),
              count(s, "points_wire_touched_measured"), count(s, "points_label_distrusted")),
          temperature(s), crossings(s));
    } catch (IllegalArgumentException e) {
      throw s.error(null, e.getMessage() + RERUN);
    }
  }

  /** The crossing wires; runs written before they were found lack them: none then. */
  private static List<Crossing> crossings(JsonAt s) {
    List<Crossing> out = new ArrayList<>();
    if (!s.has("crossings")) {
      return out;
    }
    for (JsonAt c : s.objects("crossings")) {
      out.add(new Crossing(c.num("x"), c.num("y"), c.num("z"), c.num("station_m"),
          c.num("angle_deg"), (int) c.integer("points", 0, Integer.MAX_VALUE),
          c.str("conductor"), c.num("separation_m")));
    }
    return out;
  }

  /** The survey temperature; runs written before it existed lack it: none then. */
  private static SpanRecord.SurveyTemperature temperature(JsonAt s) {
    if (!s.has("survey_temperature")) {
      return SpanRecord.SurveyTemperature.NONE;
    }
    JsonAt t = s.obj("survey_temperature");
    return new SpanRecord.SurveyTemperature(t.num("span_c"), t.num("span_sigma_c"),
        t.str("source"), t.num("section_c"), t.num("section_sigma_c"));
  }

  /** A count that runs written before it existed lack: 0 then. */
  private static long count(JsonAt s, String key) {
    return s.has(key) ? s.integer(key, 0, Long.MAX_VALUE) : 0;
  }

    private static StructureRecord structure(JsonAt o) {
    return new StructureRecord(o.str("id"), o.num("x"), o.num("y"), o.num("ground_z"),
        o.str("type"), o.has("equipment") ? o.str("equipment") : "");
  }

  private static String sha256(byte[] bytes) {
    try {
      return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("every Java platform has SHA-256", e);
    }
  }
}
