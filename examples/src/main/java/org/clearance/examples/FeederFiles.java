package org.clearance.examples;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.clearance.InputException;
import org.clearance.io.AtomicFiles;
import org.clearance.survey.LasWriter;
import org.clearance.survey.LasWriterOptions;
import org.clearance.survey.PointFormat;
import org.clearance.wire.ConductorCurve;

/**
 * Writes the demo feeder's files (docs/demo-corridor.md, "Distribution feeder"): survey.las,
 * structures.csv, line.yaml and truth.json, each to a temporary file moved into place when
 * complete. Coordinates of the survey and structures file are in the options' unit (metres or
 * US survey feet); line.yaml lengths are metres as its keys say; truth.json is in metres.
 */
public final class FeederFiles {
  /** LAS coordinate offsets are rounded to this, m. */
  private static final double OFFSET_ROUNDING_M = 1000;

  private FeederFiles() {}

  /**
   * Generates the feeder for the options and writes its four files into {@code dir}.
   *
   * @throws InputException when {@code dir} exists and is not a folder
   */
  public static DemoCorridor.DemoFiles write(Path dir, FeederOptions options) {
    if (Files.exists(dir) && !Files.isDirectory(dir)) {
      throw new InputException(dir, null, null, "is not a folder");
    }
    FeederScene scene = FeederScene.create(options);
    try {
      Files.createDirectories(dir);
      Path survey = dir.resolve(DemoCorridor.SURVEY);
      FeederPole p0 = scene.poles().get(0);
      double u = options.unit().metres();
      double ox = Math.round(p0.x() / OFFSET_ROUNDING_M) * OFFSET_ROUNDING_M / u;
      double oy = Math.round(p0.y() / OFFSET_ROUNDING_M) * OFFSET_ROUNDING_M / u;
      LasWriter las = LasWriter.create(survey, LasWriterOptions.of(4, PointFormat.F6)
          .withCrs(scene.units()).withOffset(Math.rint(ox), Math.rint(oy), 0)
          .withSystemId(DemoCorridor.SYSTEM_ID).withSoftware(DemoCorridor.SOFTWARE)
          .withAdjustedGpsTime(true));
      long[] count = new long[1];
      try {
        scene.points((chunk, ids) -> {
          las.write(chunk);
          count[0] += chunk.size();
        });
      } catch (RuntimeException e) {
        las.abort();
        throw e;
      }
      las.close();
      Path structures = dir.resolve(DemoCorridor.STRUCTURES);
      AtomicFiles.write(structures, out -> text(out, w -> writeStructures(w, scene)));
      Path line = dir.resolve(DemoCorridor.LINE_SPEC);
      AtomicFiles.write(line, out -> text(out, w -> writeLineSpec(w, scene)));
      Path truth = dir.resolve(DemoCorridor.TRUTH);
      AtomicFiles.write(truth, out -> text(out, w -> writeTruth(w, scene)));
      return new DemoCorridor.DemoFiles(survey, structures, line, truth, count[0]);
    } catch (IOException e) {
      throw new UncheckedIOException("cannot write the demo feeder to " + dir, e);
    }
  }

  /** structures.csv in the options' unit, displaced as the options ask. */
  static void writeStructures(Writer w, FeederScene scene) throws IOException {
    double u = scene.options().unit().metres();
    w.write("# Poles of feeder " + FeederScene.LINE_ID + " (" + FeederScene.LINE_NAME + "), "
        + DemoScene.UTILITY + ". Invented demo data; x, y, ground_z in "
        + scene.options().unit().symbol() + ".\n");
    w.write("structure_id,x,y,line_id,sequence,type,ground_z,equipment\n");
    double most = scene.options().displaceM();
    // a stream of its own, so that the points and the default file stay as they were
    java.util.SplittableRandom rng = new java.util.SplittableRandom(scene.options().seed() + 15);
    for (FeederPole p : scene.poles()) {
      double dx = 0;
      double dy = 0;
      if (most > 0) {
        double least = Math.min(FeederOptions.LEAST_DISPLACE_M, most);
        double d = least == most ? most : rng.nextDouble(least, most);
        double a = rng.nextDouble(0, 2 * Math.PI);
        dx = d * Math.cos(a);
        dy = d * Math.sin(a);
      }
      w.write(String.format(Locale.ROOT, "%s,%.3f,%.3f,%s,%d,%s,%.3f,%s\n", p.id(),
          (p.x() + dx) / u, (p.y() + dy) / u, FeederScene.LINE_ID, p.sequence(),
          p.deadEnd() ? "dead_end" : "suspension",
          p.groundZ() / u, equipment(p)));
    }
  }

  /**
   * The equipment column (issue 15): dead-ends at the ends, a transformer with its fuse and
   * arrester on every fourth pole, a switch on every seventh (invented, fixed by sequence).
   */
  static String equipment(FeederPole p) {
    List<String> e = new java.util.ArrayList<>();
    if (p.sequence() % 4 == 2) {
      e.addAll(List.of("transformer", "fuse", "arrester"));
    }
    if (p.sequence() % 7 == 3) {
      e.add("switch");
    }
    if (p.deadEnd()) {
      e.add("dead_end");
    }
    return String.join(";", e);
  }

  /**
   * line.yaml: nominal attachment heights for a 12 m pole (the matcher's common shift per
   * structure takes up the 10-14 m range), the survey temperature, and a hot condition.
   */
  static void writeLineSpec(Writer w, FeederScene scene) throws IOException {
    w.write("# Line specification of " + FeederScene.LINE_NAME + " (" + DemoScene.UTILITY
        + "). Invented demo data.\n");
    w.write("line_id: " + FeederScene.LINE_ID + "\n");
    w.write("name: \"" + FeederScene.LINE_NAME + "\"\n");
    w.write(f("nominal_voltage_kv: %.2f\n", FeederScene.NOMINAL_VOLTAGE_KV));
    w.write(f("survey_conductor_temperature_c: %.1f\n", scene.surveyTemperatureC()));
    w.write("conductors:\n");
    for (FeederScene.Position p : scene.positions()) {
      w.write("  - position: " + p.name() + "\n");
      w.write("    role: " + (p.neutral() ? "neutral" : "phase") + "\n");
      w.write("    conductor: " + p.type().code() + "\n");
      w.write(f("    offset_m: %.2f\n", p.offsetM()));
      w.write(f("    attach_height_m: %.2f\n", 12.0 - p.belowTopM()));
      w.write(f("    strain_length_m: %.2f\n", FeederScene.STRAIN_LENGTH_M));
    }
    w.write("conditions:\n");
    w.write("  - name: hot\n    kind: temperature\n");
    w.write(f("    temperature_c: %.1f\n", LineFiles.HOT_TEMPERATURE_C));
    if (scene.builtIn()) {
      // the demo's feeder: the transmission line's conditions, so one profile's zones apply
      LineFiles.writeWindAndIce(w);
    }
  }

  /** truth.json: poles, positions and every conductor curve, in metres. */
  static void writeTruth(Writer writer, FeederScene scene) {
    JsonOut j = new JsonOut(writer);
    FeederOptions o = scene.options();
    j.beginObject(false).member("format", "clearance-demo-feeder-truth").member("version", 1);
    j.member("utility", DemoScene.UTILITY).member("line_id", FeederScene.LINE_ID)
        .member("line_name", FeederScene.LINE_NAME)
        .member("nominal_voltage_kv", FeederScene.NOMINAL_VOLTAGE_KV);
    j.name("options").beginObject(true).member("seed", o.seed())
        .member("span_count", o.spanCount()).member("point_density_per_m2", o.pointDensity())
        .member("classification_mode", o.mode().name()).member("framing", o.framing().name())
        .member("neutral", o.neutral()).member("crossing", o.crossing())
        .member("unit", o.unit().symbol()).endObject();
    j.member("survey_conductor_temperature_c", scene.surveyTemperatureC());
    j.name("positions").beginArray(false);
    for (FeederScene.Position p : scene.positions()) {
      j.beginObject(true).member("position", p.name())
          .member("role", p.neutral() ? "neutral" : "phase")
          .member("conductor", p.type().code()).member("offset_m", p.offsetM())
          .member("below_top_m", p.belowTopM()).endObject();
    }
    j.endArray();
    j.name("poles").beginArray(false);
    for (FeederPole p : scene.poles()) {
      int i = p.sequence() - 1;
      j.beginObject(true).member("id", p.id()).member("sequence", p.sequence())
          .member("x", p.x()).member("y", p.y()).member("ground_z", p.groundZ())
          .member("height_m", p.heightM()).member("radius_m", p.radiusM())
          .member("dead_end", p.deadEnd()).member("framing", scene.framingAt(i).name())
          .member("joint_use", scene.jointUse(i)).endObject();
    }
    j.endArray();
    j.name("spans").beginArray(false);
    for (FeederScene.Span s : scene.spans()) {
      j.beginObject(false).member("index", s.index()).member("id", s.id())
          .member("length_m", s.lengthM()).member("joint_use", scene.isJointSpan(s.index()));
      j.name("wires").beginArray(false);
      for (FeederWire w : s.wires()) {
        j.beginObject(true).member("position", w.position())
            .member("role", w.neutral() ? "neutral" : "phase")
            .member("conductor", w.conductorCode());
        curve(j, w.curve());
        j.member("points_per_m", w.pointsPerMetre()).member("noise_sigma_m", w.noiseSigmaM())
            .member("coverage", w.coverage()).endObject();
      }
      j.endArray();
      if (s.service().isPresent()) {
        j.name("crossing_service").beginObject(true);
        curve(j, s.service().get());
        j.endObject();
      }
      j.endObject();
    }
    j.endArray().endObject();
  }

  private static void curve(JsonOut j, ConductorCurve c) {
    j.member("attach_a", c.x(0), c.y(0), c.zA())
        .member("attach_b", c.x(c.length()), c.y(c.length()), c.zB())
        .member("horizontal_length_m", c.length())
        .member("catenary_constant_m", c.curve().c())
        .member("vertex_station_m", c.curve().s0()).member("vertex_z", c.curve().z0())
        .member("mid_span_sag_m", c.midSpanSag());
  }

  private static String f(String format, double v) {
    return String.format(Locale.ROOT, format, v);
  }

  private interface TextContent {
    void writeTo(Writer w) throws IOException;
  }

  private static void text(java.io.OutputStream out, TextContent content) throws IOException {
    Writer w = new BufferedWriter(new OutputStreamWriter(out, StandardCharsets.UTF_8));
    content.writeTo(w);
    w.flush();
  }
}
