package org.clearance.survey;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * JMH microbenchmark of the point decoding loop: one chunk of point records, already in memory,
 * decoded into a {@link PointChunk} (docs/benchmark.md; not a test, never run by the suite).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class DecodeBenchmark {

  /** Records per chunk: the survey's default chunk. */
  static final int RECORDS = Survey.DEFAULT_CHUNK_POINTS;

  @Param({"1", "6"})
  public int format;

  private PointDecoder decoder;
  private ByteBuffer records;
  private PointChunk chunk;
  private Path file;

  @Setup(Level.Trial)
  public void setUp() throws IOException {
    file = Files.createTempFile("decode-bench", ".las");
    Files.delete(file);
    PointChunk in = new PointChunk(RECORDS);
    in.reset(0, 0);
    SplittableRandom r = new SplittableRandom(1);
    for (int i = 0; i < RECORDS; i++) {
      int j = in.add(500_000 + 1000 * r.nextDouble(), 4_000_000 + 1000 * r.nextDouble(),
          100 + 50 * r.nextDouble(), r.nextInt(1, 7));
      in.gpsTime()[j] = 1000 + i * 1e-5;
      in.intensity()[j] = r.nextInt(65536);
    }
    try (LasWriter w = LasWriter.create(file, LasWriterOptions.of(4, PointFormat.ofId(format))
        .withScale(0.001, 0.001, 0.001).withOffset(500_000, 4_000_000, 0)
        .withCrs(SurveyUnits.metres("bench")))) {
      w.write(in);
    }
    LasHeader h = LasFile.open(file).header();
    records = ByteBuffer.allocate(RECORDS * h.recordLength()).order(ByteOrder.LITTLE_ENDIAN);
    try (FileChannel ch = FileChannel.open(file)) {
      ch.read(records, h.pointDataOffset());
    }
    records.flip();
    decoder = new PointDecoder(h, 1.0, 1.0);
    chunk = new PointChunk(RECORDS);
  }

  @TearDown(Level.Trial)
  public void tearDown() throws IOException {
    Files.deleteIfExists(file);
  }

  /** Throughput in points per second. */
  @Benchmark
  @OperationsPerInvocation(RECORDS)
  public int decode() {
    chunk.reset(0, 0);
    decoder.decode(records.duplicate().order(ByteOrder.LITTLE_ENDIAN), RECORDS, chunk);
    return chunk.size();
  }
}
