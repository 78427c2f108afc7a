package org.clearance.examples;

import java.util.List;
import java.util.NoSuchElementException;
import java.util.Objects;

/**
 * One span of the demo line (truth).
 *
 * @param index zero-based span index along the line
 * @param id span id as docs/line-inputs.md forms it: {@code <line_id>/<from>-<to>}
 * @param from index of the structure at the start
 * @param to index of the structure at the end ({@code from + 1})
 * @param section index of the tension section
 * @param lengthM plan distance between the structure centres, m
 * @param wires the conductors, in the order of {@link DemoPosition#demoLine()}
 */
public record DemoSpan(int index, String id, int from, int to, int section, double lengthM,
    List<DemoWire> wires) {

  public DemoSpan {
    Objects.requireNonNull(id, "id");
    wires = List.copyOf(wires);
  }

  /** The wire at a position name. */
  public DemoWire wire(String position) {
    for (DemoWire w : wires) {
      if (w.position().equals(position)) {
        return w;
      }
    }
    throw new NoSuchElementException("no position " + position + " in span " + id);
  }
}
