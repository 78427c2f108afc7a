package org.clearance.spark;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.clearance.survey.LasHeader;
import org.clearance.survey.LasWriter;
import org.clearance.survey.LasWriterOptions;
import org.clearance.survey.PointChunk;
import org.clearance.survey.Survey;
import org.clearance.survey.UnitsChoice;

/**
 * Cuts a metre survey into square tiles of a plan grid, as surveys are delivered: tile
 * {@code (i, j)} holds the points with {@code floor(x / size) = i} and {@code floor(y / size) =
 * j}. Each tile keeps the source's point format, scale, offset and CRS, so every coordinate is
 * written as the same integer and reads back as the same number. Streams: one chunk per open tile.
 */
public final class TileSplitter {
  private static final int CHUNK = 65_536;

  private TileSplitter() {}

  /**
   * Splits {@code source} into tiles of {@code sizeM} metres in {@code dir}.
   *
   * @return the tiles written, in name order
   */
  public static List<Path> split(Path source, Path dir, double sizeM) {
    if (!(Double.isFinite(sizeM) && sizeM > 0)) {
      throw new IllegalArgumentException("tile size must be positive: " + sizeM);
    }
    Survey survey = Survey.open(List.of(source), UnitsChoice.fromFile());
    LasHeader h = survey.files().get(0).header();
    LasWriterOptions options = LasWriterOptions.of(h.versionMinor(), h.pointFormat())
        .withScale(h.scaleX(), h.scaleY(), h.scaleZ())
        .withOffset(h.offsetX(), h.offsetY(), h.offsetZ())
        .withCrs(survey.units());
    Map<String, Tile> tiles = new TreeMap<>();
    try {
      Files.createDirectories(dir);
      survey.read(chunk -> {
        for (int i = 0; i < chunk.size(); i++) {
          long ti = (long) Math.floor(chunk.x()[i] / sizeM);
          long tj = (long) Math.floor(chunk.y()[i] / sizeM);
          String name = String.format(Locale.ROOT, "tile_%d_%d.las", ti, tj);
          Tile t = tiles.computeIfAbsent(name, n -> new Tile(
              LasWriter.create(dir.resolve(n), options)));
          t.buffer.addCopy(chunk, i);
          if (t.buffer.isFull()) {
            t.flush();
          }
        }
      });
      List<Path> out = new ArrayList<>();
      for (Map.Entry<String, Tile> e : tiles.entrySet()) {
        e.getValue().flush();
        e.getValue().writer.close();
        out.add(dir.resolve(e.getKey()));
      }
      return out;
    } catch (IOException e) {
      tiles.values().forEach(t -> t.writer.abort());
      throw new UncheckedIOException("cannot write tiles to " + dir, e);
    } catch (RuntimeException e) {
      tiles.values().forEach(t -> t.writer.abort());
      throw e;
    }
  }

  private static final class Tile {
    final LasWriter writer;
    final PointChunk buffer = new PointChunk(CHUNK);

    Tile(LasWriter writer) {
      this.writer = writer;
      buffer.reset(0, 0);
    }

    void flush() {
      if (buffer.size() > 0) {
        writer.write(buffer);
        buffer.reset(0, 0);
      }
    }
  }
}
