package org.clearance.examples;

import org.clearance.survey.PointChunk;

/**
 * Receives generated points chunk by chunk with the truth of each point.
 *
 * <p>The chunk and the array are reused for the next chunk: copy what must be kept.
 */
@FunctionalInterface
public interface PointSink {
  /**
   * @param chunk the points, coordinates in metres
   * @param truthIds for each point {@code i < chunk.size()}, its {@link TruthId}
   */
  void accept(PointChunk chunk, int[] truthIds);
}
