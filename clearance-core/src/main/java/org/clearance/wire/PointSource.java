package org.clearance.wire;

import java.util.Objects;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.clearance.survey.PointChunk;
import org.clearance.survey.Survey;

/**
 * A stream of survey points in reusable chunks (coordinates in metres), read once per call.
 *
 * <p>{@link #stream} asks the supplier for one consumer per reading thread, on the calling thread
 * before reading starts, and gives each consumer chunks from its own thread only; chunks arrive in
 * no particular order.
 */
@FunctionalInterface
public interface PointSource {

  /** Streams every point once to consumers obtained from {@code consumers}. */
  void stream(Supplier<Consumer<PointChunk>> consumers);

  /** A survey read on {@code threads} threads (1 reads on the calling thread), 1 to 256. */
  static PointSource of(Survey survey, int threads) {
    Objects.requireNonNull(survey, "survey");
    if (threads < 1 || threads > WireFinderOptions.MAX_THREADS) {
      throw new IllegalArgumentException("threads must be 1 to 256: " + threads);
    }
    return consumers -> {
      if (threads == 1) {
        survey.read(consumers.get());
      } else {
        survey.readParallel(threads, consumers);
      }
    };
  }

  /** A source that feeds all its chunks to one consumer on the calling thread. */
  static PointSource sequential(Consumer<Consumer<PointChunk>> reader) {
    Objects.requireNonNull(reader, "reader");
    return consumers -> reader.accept(consumers.get());
  }
}
