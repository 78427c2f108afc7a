package org.clearance.line;

import java.util.List;
import java.util.Objects;

/**
 * A tension section: consecutive spans between dead-end structures (or the line ends), in which
 * suspension strings equalise the horizontal tension so one ruling span stands for all spans.
 *
 * @param id {@code <line_id>/TS<n>} (or {@code TS<n>} when the structures file gives no line id),
 *     n = index + 1
 * @param lineId id of the line specification
 * @param index 0-based index of the section within its line, in sequence order
 * @param spans the spans, in sequence order (unmodifiable, at least one)
 * @param rulingSpanM ruling span of the section, m, see {@link #rulingSpan(double...)}
 */
public record TensionSection(
    String id, String lineId, int index, List<Span> spans, double rulingSpanM) {

  public TensionSection {
    Objects.requireNonNull(id, "id");
    Objects.requireNonNull(lineId, "lineId");
    spans = List.copyOf(spans);
    if (spans.isEmpty()) {
      throw new IllegalArgumentException("a tension section needs at least one span");
    }
  }

  /**
   * The ruling span RS = sqrt(sum S_i^3 / sum S_i) of spans with horizontal lengths S_i
   * (docs/methods.md section 3.4; CIGRE TB 324). Any length unit; the result is in the
   * same unit.
   *
   * @param spanLengths horizontal span lengths, each finite and &gt; 0, at least one
   * @throws IllegalArgumentException when empty or a length is not positive and finite
   */
  public static double rulingSpan(double... spanLengths) {
    if (spanLengths.length == 0) {
      throw new IllegalArgumentException("no spans");
    }
    double sum = 0;
    double sumCubes = 0;
    for (double s : spanLengths) {
      if (!(Double.isFinite(s) && s > 0)) {
        throw new IllegalArgumentException("span length must be positive: " + s);
      }
      sum += s;
      sumCubes += s * s * s;
    }
    return Math.sqrt(sumCubes / sum);
  }

  /** Structure at the start of the section. */
  public Structure first() {
    return spans.get(0).from();
  }

  /** Structure at the end of the section. */
  public Structure last() {
    return spans.get(spans.size() - 1).to();
  }

  /** Total plan length of the section, m. */
  public double lengthM() {
    return spans.stream().mapToDouble(Span::lengthM).sum();
  }
}
