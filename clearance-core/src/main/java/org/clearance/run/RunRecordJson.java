package org.clearance.run;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.clearance.InputException;
import org.clearance.io.AtomicFiles;
import org.clearance.io.JsonAt;
import org.clearance.io.JsonFiles;

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
    return JsonFiles.write(node(r)) + "\n";
  }

  private static ObjectNode node(RunRecord r) {
    ObjectNode o = JsonFiles.object().put("format", FORMAT).put("command", r.command())
        .put("tool_version", r.toolVersion()).put("started", r.started().toString())
        .put("finished", r.finished().toString());
    ArrayNode inputs = o.putArray("inputs");
    for (RunRecord.InputFile f : r.inputs()) {
      inputs.addObject().put("role", f.role()).put("path", f.path()).put("bytes", f.bytes())
          .put("sha256", f.sha256());
    }
    if (r.profile().isPresent()) {
      RunRecord.ProfileRef p = r.profile().get();
      o.putObject("profile").put("name", p.name()).put("title", p.title())
          .put("location", p.location()).put("content_sha256", p.contentHash());
    } else {
      o.putNull("profile");
    }
    ObjectNode params = o.putObject("parameters");
    r.parameters().forEach(params::put);
    ObjectNode timings = o.putObject("timings_s");
    r.timingsS().forEach((k, v) -> timings.set(k, JsonFiles.number(v)));
    ArrayNode outputs = o.putArray("outputs");
    r.outputs().forEach(outputs::add);
    r.source().ifPresent(src -> o.set("source", node(src)));
    return o;
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
    String text;
    try {
      text = StandardCharsets.UTF_8.newDecoder()
          .decode(java.nio.ByteBuffer.wrap(Files.readAllBytes(file))).toString();
    } catch (CharacterCodingException e) {
      throw new InputException(name, null, null, "not UTF-8 text");
    }
    return read(JsonAt.root(name, JsonFiles.parse(text, name)));
  }

  private static RunRecord read(JsonAt o) {
    String format = o.str("format");
    if (!FORMAT.equals(format)) {
      throw o.error("format", "not a run record of this version (" + format + "); expected "
          + FORMAT);
    }
    List<RunRecord.InputFile> inputs = new ArrayList<>();
    for (JsonAt i : o.objects("inputs")) {
      inputs.add(new RunRecord.InputFile(i.str("role"), i.str("path"),
          i.integer("bytes", 0, Long.MAX_VALUE), i.str("sha256")));
    }
    Optional<RunRecord.ProfileRef> profile = Optional.empty();
    if (!o.get("profile").isNull()) {
      JsonAt p = o.obj("profile");
      profile = Optional.of(new RunRecord.ProfileRef(p.str("name"), p.str("title"),
          p.str("location"), p.str("content_sha256")));
    }
    Map<String, String> params = o.stringMap("parameters");
    Map<String, Double> timings = o.numberMap("timings_s");
    List<String> outputs = o.strings("outputs");
    Optional<RunRecord> source = o.has("source") ? Optional.of(read(o.obj("source")))
        : Optional.empty();
    return new RunRecord(o.str("command"), o.str("tool_version"), o.time("started"),
        o.time("finished"), inputs, profile, params, timings, outputs, source);
  }
}
