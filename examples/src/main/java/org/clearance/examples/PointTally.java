package org.clearance.examples;

import org.clearance.survey.PointChunk;

/** Counts generated points by truth kind and by class, passing them on to another sink. */
final class PointTally implements PointSink {
  private final PointSink next;
  private final long[] byKind = new long[TruthId.Kind.values().length];
  private final long[] byClass = new long[256];
  private long total;

  PointTally(PointSink next) {
    this.next = next;
  }

  @Override
  public void accept(PointChunk chunk, int[] truthIds) {
    short[] cls = chunk.classification();
    for (int i = 0; i < chunk.size(); i++) {
      byKind[TruthId.kind(truthIds[i]).ordinal()]++;
      byClass[cls[i] & 0xff]++;
    }
    total += chunk.size();
    next.accept(chunk, truthIds);
  }

  long total() {
    return total;
  }

  long byKind(TruthId.Kind kind) {
    return byKind[kind.ordinal()];
  }

  long byClass(int cls) {
    return byClass[cls];
  }
}
