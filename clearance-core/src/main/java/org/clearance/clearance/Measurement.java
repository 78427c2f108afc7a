package org.clearance.clearance;

import java.util.List;

/**
 * What one pass of the engine over the survey measured.
 *
 * @param spans per span, in the order of the engine's models
 * @param trees trees found near the line, with their base distances to the conductors
 */
public record Measurement(List<SpanClearance> spans, List<TreeClearance> trees) {

  public Measurement {
    spans = List.copyOf(spans);
    trees = List.copyOf(trees);
  }
}
