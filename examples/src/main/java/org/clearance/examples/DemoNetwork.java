package org.clearance.examples;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.clearance.InputException;
import org.clearance.io.AtomicFiles;
import org.clearance.survey.LasWriter;

/**
 * The demo of the {@code clearance demo} command: the demo corridor's 230 kV line and the
 * invented distribution feeder of the same utility built into it (docs/demo-corridor.md, "The
 * demo's two lines"), surveyed in one LAS file, with one structures file for both lines, a line
 * specification and a truth file per line.
 *
 * <p>The transmission line, its terrain, vegetation and flight strips are exactly those of
 * {@link DemoScene} for the same options; the feeder ({@link FeederScene#underbuilt}) adds its
 * conductors, poles, underbuild frames and a crossing service line.
 */
public final class DemoNetwork {
  /** File names besides those of {@link DemoCorridor}: the feeder's specification and truth. */
  public static final String FEEDER_SPEC = "feeder.yaml";
  public static final String FEEDER_TRUTH = "feeder-truth.json";

  private final DemoScene line;
  private final Optional<FeederScene> feeder;

  private DemoNetwork(DemoOptions options) {
    line = DemoScene.create(options);
    feeder = FeederScene.underbuilt(line);
  }

  /** Builds both lines' truth for the options. */
  public static DemoNetwork create(DemoOptions options) {
    return new DemoNetwork(options);
  }

  /** The transmission line and its corridor. */
  public DemoScene line() {
    return line;
  }

  /** The feeder, or empty when the corridor has no room for it (docs/demo-corridor.md). */
  public Optional<FeederScene> feeder() {
    return feeder;
  }

  /**
   * The files written and the number of survey points.
   *
   * @param survey the LAS survey of both lines
   * @param structures the structures file of both lines
   * @param lineSpecs the line specifications: the transmission line's, then the feeder's
   * @param truths the truth files, in the same order
   * @param pointCount points in the survey
   */
  public record Files(Path survey, Path structures, List<Path> lineSpecs, List<Path> truths,
      long pointCount) {
    public Files {
      lineSpecs = List.copyOf(lineSpecs);
      truths = List.copyOf(truths);
    }
  }

  /**
   * Generates both lines for the options and writes the files into {@code dir} (created when
   * missing): survey.las, structures.csv, line.yaml, truth.json, and for the feeder feeder.yaml
   * and feeder-truth.json. Each file is written to a temporary file and moved into place.
   *
   * @throws InputException when {@code dir} exists and is not a folder
   * @throws UncheckedIOException when a file cannot be written (no partial file is left)
   */
  public static Files write(Path dir, DemoOptions options) {
    if (java.nio.file.Files.exists(dir) && !java.nio.file.Files.isDirectory(dir)) {
      throw new InputException(dir, null, null, "is not a folder");
    }
    DemoNetwork net = create(options);
    DemoScene scene = net.line;
    try {
      java.nio.file.Files.createDirectories(dir);
      Path survey = dir.resolve(DemoCorridor.SURVEY);
      PointTally tally;
      long[] feederPoints = new long[1];
      LasWriter las = LasWriter.create(survey, DemoCorridor.lasOptions(scene));
      try {
        tally = new PointTally((chunk, ids) -> las.write(chunk));
        scene.points(tally);
        net.feeder.ifPresent(f -> f.points((chunk, ids) -> {
          las.write(chunk);
          feederPoints[0] += chunk.size();
        }));
      } catch (RuntimeException e) {
        las.abort();
        throw e;
      }
      las.close();
      Path structures = dir.resolve(DemoCorridor.STRUCTURES);
      AtomicFiles.write(structures, out -> text(out, w -> net.writeStructures(w)));
      List<Path> specs = new ArrayList<>();
      List<Path> truths = new ArrayList<>();
      Path lineSpec = dir.resolve(DemoCorridor.LINE_SPEC);
      AtomicFiles.write(lineSpec, out -> text(out, w -> LineFiles.writeLineSpec(w, scene)));
      specs.add(lineSpec);
      Path truth = dir.resolve(DemoCorridor.TRUTH);
      AtomicFiles.write(truth, out -> text(out, w -> TruthFile.write(w, scene, tally)));
      truths.add(truth);
      if (net.feeder.isPresent()) {
        FeederScene f = net.feeder.get();
        Path spec = dir.resolve(FEEDER_SPEC);
        AtomicFiles.write(spec, out -> text(out, w -> FeederFiles.writeLineSpec(w, f)));
        specs.add(spec);
        Path ft = dir.resolve(FEEDER_TRUTH);
        AtomicFiles.write(ft, out -> text(out, w -> FeederFiles.writeTruth(w, f)));
        truths.add(ft);
      } else {
        java.nio.file.Files.deleteIfExists(dir.resolve(FEEDER_SPEC));
        java.nio.file.Files.deleteIfExists(dir.resolve(FEEDER_TRUTH));
      }
      return new Files(survey, structures, specs, truths, tally.total() + feederPoints[0]);
    } catch (IOException e) {
      throw new UncheckedIOException("cannot write the demo to " + dir, e);
    }
  }

  /**
   * structures.csv of both lines (docs/line-inputs.md): the towers, then the feeder's poles and
   * its joint-use towers (the feeder's own rows, with the tower's id and centre). The feeder's
   * framing changes along it, so its rows give {@code attach_z_<position>} wherever the
   * conductors do not sit as its line specification's nominal (horizontal) framing on a 12 m
   * pole: on the vertical and triangular poles and on the joint-use towers.
   */
  void writeStructures(Writer w) throws IOException {
    List<FeederScene.Position> positions = feeder.map(FeederScene::positions).orElse(List.of());
    w.write("# Structures of line " + DemoScene.LINE_ID + " (" + DemoScene.LINE_NAME + ")"
        + (feeder.isPresent() ? " and feeder " + FeederScene.LINE_ID + " ("
        + FeederScene.LINE_NAME + ")" : "") + ", " + DemoScene.UTILITY
        + ". Invented demo data; x, y, ground_z, attach_z_* in metres, EPSG:" + DemoScene.EPSG
        + ".\n");
    StringBuilder header = new StringBuilder("structure_id,x,y,line_id,sequence,type,ground_z");
    if (feeder.isPresent()) {
      header.append(",equipment");
      for (FeederScene.Position p : positions) {
        header.append(",attach_z_").append(p.name());
      }
    }
    w.write(header + "\n");
    String blanks = feeder.isPresent() ? ",".repeat(1 + positions.size()) : "";
    for (DemoStructure t : line.writtenStructures()) {
      w.write(String.format(Locale.ROOT, "%s,%.3f,%.3f,%s,%d,%s,%.3f%s\n", t.id(), t.x(),
          t.y(), DemoScene.LINE_ID, t.sequence(), t.type().csvName(), t.groundZ(), blanks));
    }
    if (feeder.isEmpty()) {
      return;
    }
    FeederScene f = feeder.get();
    for (FeederPole p : f.poles()) {
      int i = p.sequence() - 1;
      String equipment = f.jointUse(i) ? (p.deadEnd() ? "dead_end" : "")
          : FeederFiles.equipment(p);
      StringBuilder row = new StringBuilder(String.format(Locale.ROOT,
          "%s,%.3f,%.3f,%s,%d,%s,%.3f,%s", p.id(), p.x(), p.y(), FeederScene.LINE_ID,
          p.sequence(), p.deadEnd() ? "dead_end" : "suspension", p.groundZ(), equipment));
      boolean nominal = !f.jointUse(i) && f.framingAt(i) == Framing.HORIZONTAL;
      for (FeederScene.Position pos : f.positionsAt(i)) {
        row.append(',');
        if (!nominal) {
          row.append(String.format(Locale.ROOT, "%.3f", p.topZ() - pos.belowTopM()));
        }
      }
      w.write(row + "\n");
    }
  }

  /** Text content written through a UTF-8 writer. */
  private interface TextContent {
    void writeTo(Writer w) throws IOException;
  }

  private static void text(OutputStream out, TextContent content) throws IOException {
    Writer w = new BufferedWriter(new OutputStreamWriter(out, StandardCharsets.UTF_8));
    content.writeTo(w);
    w.flush();
  }
}
