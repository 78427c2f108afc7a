package org.clearance.run;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.clearance.InputException;
import org.clearance.io.AtomicFiles;
import org.clearance.io.Json;
import org.clearance.io.JsonFields;
import org.clearance.io.JsonWriter;

/**
 * Writes and reads {@link RunRecord} as {@code run.json}: this project's own format, versioned
 * by {@link #FORMAT}. Times are ISO-8601 UTC; timings are seconds.
 */
public final class RunRecordJson {

  /** Format name and version written into the file. */
  public static final String FORMAT = "clearance-run-record/1";

  private RunRecordJson() {}

  /** The record as JSON text. */
  public static String toJson(RunRecord r) {
    JsonWriter w = new JsonWriter();
    write(w, r);
    return w.toString() + "\n";
  }

  private static void write(JsonWriter w, RunRecord r) {
    w.beginObject().member("format", FORMAT).member("command", r.command())
        .member("tool_version", r.toolVersion()).member("started", r.started().toString())
        .member("finished", r.finished().toString());
    w.name("inputs").beginArray();
    for (RunRecord.InputFile f : r.inputs()) {
      w.beginObject().member("role", f.role()).member("path", f.path())
          .member("bytes", f.bytes()).member("sha256", f.sha256()).endObject();
    }
    w.endArray();
    w.name("profile");
    if (r.profile().isPresent()) {
      RunRecord.ProfileRef p = r.profile().get();
      w.beginObject().member("name", p.name()).member("title", p.title())
          .member("location", p.location()).member("content_sha256", p.contentHash())
          .endObject();
    } else {
      w.value((String) null);
    }
    w.name("parameters").beginObject();
    r.parameters().forEach(w::member);
    w.endObject();
    w.name("timings_s").beginObject();
    r.timingsS().forEach((k, v) -> w.member(k, v.doubleValue()));
    w.endObject();
    w.name("outputs").beginArray();
    r.outputs().forEach(w::value);
    w.endArray();
    if (r.source().isPresent()) {
      w.name("source");
      write(w, r.source().get());
    }
    w.endObject();
  }

  /** Writes {@code run.json} into a run folder (temporary file, then moved into place). */
  public static void write(Path runDir, RunRecord r) throws IOException {
    AtomicFiles.writeString(runDir.resolve(RunRecord.FILE_NAME), toJson(r));
  }

  /**
   * Reads a run record.
   *
   * @throws InputException naming the file and key when it is not a run record of this format
   */
  public static RunRecord read(Path file) throws IOException {
    String name = file.toString();
    Json.Value root = Json.parse(Files.readString(file, StandardCharsets.UTF_8), name);
    return read(new JsonFields(name), root);
  }

  private static RunRecord read(JsonFields f, Json.Value v) {
    Json.Obj o = f.obj(v, "a run record");
    String format = f.str(o, "format");
    if (!FORMAT.equals(format)) {
      throw new InputException(f.file(), "line " + o.line(), "format",
          "not a run record of this version (" + format + "); expected " + FORMAT);
    }
    List<RunRecord.InputFile> inputs = new ArrayList<>();
    for (Json.Value i : f.arr(o, "inputs")) {
      Json.Obj io = f.obj(i, "an input");
      inputs.add(new RunRecord.InputFile(f.str(io, "role"), f.str(io, "path"),
          (long) f.num(io, "bytes"), f.str(io, "sha256")));
    }
    Optional<RunRecord.ProfileRef> profile = Optional.empty();
    if (!(f.get(o, "profile") instanceof Json.Null)) {
      Json.Obj p = f.obj(f.get(o, "profile"), "profile");
      profile = Optional.of(new RunRecord.ProfileRef(f.str(p, "name"), f.str(p, "title"),
          f.str(p, "location"), f.str(p, "content_sha256")));
    }
    Map<String, String> params = new LinkedHashMap<>();
    for (var e : f.obj(f.get(o, "parameters"), "parameters").members().entrySet()) {
      params.put(e.getKey(), f.text(e.getValue(), e.getKey()));
    }
    Map<String, Double> timings = new LinkedHashMap<>();
    for (var e : f.obj(f.get(o, "timings_s"), "timings_s").members().entrySet()) {
      timings.put(e.getKey(), f.number(e.getValue(), e.getKey()));
    }
    List<String> outputs = new ArrayList<>();
    for (Json.Value out : f.arr(o, "outputs")) {
      outputs.add(f.text(out, "outputs"));
    }
    Optional<RunRecord> source = o.members().containsKey("source")
        ? Optional.of(read(f, o.members().get("source"))) : Optional.empty();
    return new RunRecord(f.str(o, "command"), f.str(o, "tool_version"),
        f.time(o, "started"), f.time(o, "finished"), inputs, profile, params, timings, outputs,
        source);
  }
}
