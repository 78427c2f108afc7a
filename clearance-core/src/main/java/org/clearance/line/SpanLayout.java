package org.clearance.line;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.clearance.InputException;

/**
 * The spans and tension sections of every line: structures grouped by line, ordered by sequence,
 * joined pairwise into spans and broken into tension sections at dead-end structures and line ends
 * (docs/line-inputs.md).
 *
 * @param lines one layout per line specification, in the order the specifications were given
 */
public record SpanLayout(List<LineLayout> lines) {

  /**
   * Plan distance below which two consecutive structures count as the same place, m: survey
   * coordinates are good to centimetres, and no span is this short.
   */
  static final double SAME_PLACE_M = 0.01;
  /**
   * Longest span accepted, m: the longest overhead spans in service (fjord and strait crossings)
   * are about 5.4 km (from memory). A longer one is a coordinate typo (x = 1487195 for 487195
   * gave a 1 000 km span that ran 35 s and died of OutOfMemoryError).
   */
  static final double MAX_SPAN_M = 6000;

  public SpanLayout {
    lines = List.copyOf(lines);
  }

  /**
   * Lays out the lines.
   *
   * <p>Structures whose line id is empty belong to the only line specification; with more than
   * one specification every structure needs a line id.
   *
   * @param structures all structures, any order (from {@link StructureReader})
   * @param specs one specification per line, distinct line ids
   * @throws InputException naming file, line and field when a structure's line has no
   *     specification or a specification has no structures, a line has fewer than two structures,
   *     two consecutive structures stand at the same plan position, a structure id or sequence
   *     repeats within a line, or a structure gives an attachment for a position its line's
   *     specification does not have
   */
  public static SpanLayout build(List<Structure> structures, List<LineSpec> specs) {
    if (specs.isEmpty()) {
      throw new InputException((String) null, null, null, "no line specification given");
    }
    Map<String, LineSpec> byId = new LinkedHashMap<>();
    for (LineSpec spec : specs) {
      LineSpec twin = byId.putIfAbsent(spec.lineId(), spec);
      if (twin != null) {
        throw new InputException(spec.sourceFile(), null, "line_id", "line id '" + spec.lineId()
            + "' is also used by " + twin.sourceFile());
      }
    }
    Map<String, List<Structure>> groups = new LinkedHashMap<>();
    byId.keySet().forEach(id -> groups.put(id, new ArrayList<>()));
    for (Structure s : structures) {
      groups.get(lineOf(s, byId)).add(s);
    }
    List<LineLayout> out = new ArrayList<>();
    for (LineSpec spec : byId.values()) {
      out.add(line(spec, groups.get(spec.lineId())));
    }
    checkSpanIds(out);
    return new SpanLayout(out);
  }

  /**
   * Span ids join structure ids with '-', so ids that contain '-' can collide (A, B-C and A-B, C
   * both give "A-B-C"): one span would overwrite the other's results. Refused with both places.
   */
  private static void checkSpanIds(List<LineLayout> lines) {
    Map<String, Span> seen = new HashMap<>();
    for (LineLayout l : lines) {
      for (Span s : l.spans()) {
        Span twin = seen.putIfAbsent(s.id(), s);
        if (twin != null) {
          Structure a = s.from();
          throw new InputException(a.sourceFile(), "line " + a.sourceLine(), "structure_id",
              "the span from '" + a.id() + "' to '" + s.to().id() + "' gets the id '" + s.id()
                  + "', which the span from '" + twin.from().id() + "' to '" + twin.to().id()
                  + "' (" + twin.from().where() + ") already has; rename a structure so that"
                  + " no id joined with '-' repeats another");
        }
      }
    }
  }

  private static String lineOf(Structure s, Map<String, LineSpec> specs) {
    if (s.lineId().isEmpty()) {
      if (specs.size() == 1) {
        return specs.keySet().iterator().next();
      }
      throw new InputException(s.sourceFile(), "line " + s.sourceLine(), "line_id",
          "no line id, but " + specs.size() + " line specifications are given ("
              + String.join(", ", specs.keySet()) + "); give every structure its line_id");
    }
    if (!specs.containsKey(s.lineId())) {
      throw new InputException(s.sourceFile(), "line " + s.sourceLine(), "line_id",
          "no line specification has line_id '" + s.lineId() + "'; given: "
              + String.join(", ", specs.keySet()));
    }
    return s.lineId();
  }

  private static LineLayout line(LineSpec spec, List<Structure> group) {
    String id = spec.lineId();
    if (group.isEmpty()) {
      throw new InputException(spec.sourceFile(), null, "line_id",
          "no structure belongs to line '" + id + "'");
    }
    if (group.size() < 2) {
      Structure s = group.get(0);
      throw new InputException(s.sourceFile(), "line " + s.sourceLine(), "structure_id",
          "line '" + id + "' has only one structure; a span needs two");
    }
    checkUnique(group, spec);
    List<Structure> ordered = new ArrayList<>(group);
    ordered.sort(Comparator.comparingInt(Structure::sequence));
    boolean named = ordered.stream().anyMatch(s -> !s.lineId().isEmpty());
    String prefix = named ? id + "/" : "";
    List<Span> spans = new ArrayList<>();
    List<TensionSection> sections = new ArrayList<>();
    List<Span> current = new ArrayList<>();
    for (int i = 0; i + 1 < ordered.size(); i++) {
      Structure a = ordered.get(i);
      Structure b = ordered.get(i + 1);
      double length = Math.hypot(b.x() - a.x(), b.y() - a.y());
      if (!(length >= SAME_PLACE_M)) {
        throw new InputException(b.sourceFile(), "line " + b.sourceLine(), "x",
            "structure '" + b.id() + "' stands at the same plan position as the structure before"
                + " it in sequence, '" + a.id() + "' (" + a.where() + ")");
      }
      if (length > MAX_SPAN_M) {
        throw new InputException(b.sourceFile(), "line " + b.sourceLine(), "x", String.format(
            java.util.Locale.ROOT, "structure '%s' stands %.0f m from '%s' (%s), the structure"
                + " before it in sequence; no span is longer than %.0f m (the longest in service"
                + " are about 5.4 km): check x and y of both%s", b.id(), length, a.id(),
            a.where(), MAX_SPAN_M, b.sequence() - a.sequence() > 1 ? String.format(
                java.util.Locale.ROOT, ", or give the structures between sequence %d and %d",
                a.sequence(), b.sequence()) : ""));
      }
      Span span = new Span(prefix + a.id() + "-" + b.id(), id, a, b,
          SpanFrame.between(a.x(), a.y(), b.x(), b.y()), length, sections.size());
      spans.add(span);
      current.add(span);
      if (b.isDeadEnd() || i + 2 == ordered.size()) {
        sections.add(section(prefix, id, sections.size(), current));
        current = new ArrayList<>();
      }
    }
    return new LineLayout(spec, ordered, spans, sections);
  }

  private static TensionSection section(String prefix, String lineId, int index, List<Span> spans) {
    double[] lengths = spans.stream().mapToDouble(Span::lengthM).toArray();
    return new TensionSection(prefix + "TS" + (index + 1), lineId, index, spans,
        TensionSection.rulingSpan(lengths));
  }

  private static void checkUnique(List<Structure> group, LineSpec spec) {
    Map<String, Structure> ids = new HashMap<>();
    Map<Integer, Structure> sequences = new HashMap<>();
    for (Structure s : group) {
      Structure twin = ids.putIfAbsent(s.id(), s);
      if (twin != null) {
        throw new InputException(s.sourceFile(), "line " + s.sourceLine(), "structure_id",
            "structure id '" + s.id() + "' appears twice in line '" + spec.lineId() + "' (also "
                + twin.where() + ")");
      }
      twin = sequences.putIfAbsent(s.sequence(), s);
      if (twin != null) {
        throw new InputException(s.sourceFile(), "line " + s.sourceLine(), "sequence",
            "sequence " + s.sequence() + " appears twice in line '" + spec.lineId() + "' (also "
                + twin.where() + ")");
      }
      for (String position : s.attachZ().keySet()) {
        if (spec.position(position).isEmpty()) {
          throw new InputException(s.sourceFile(), "line " + s.sourceLine(),
              StructureReader.ATTACH_PREFIX + position, "position '" + position
                  + "' is not in the line specification " + spec.sourceFile() + "; its positions"
                  + " are " + String.join(", ",
                      spec.conductors().stream().map(ConductorPosition::position).toList()));
        }
      }
    }
  }

  /** All spans of all lines, line by line in sequence order. */
  public List<Span> spans() {
    return lines.stream().flatMap(l -> l.spans().stream()).toList();
  }

  /** The span with this id, if any. */
  public Optional<Span> span(String spanId) {
    return spans().stream().filter(s -> s.id().equals(spanId)).findFirst();
  }

  /** The layout of the line with this id, if any. */
  public Optional<LineLayout> line(String lineId) {
    return lines.stream().filter(l -> l.spec().lineId().equals(lineId)).findFirst();
  }
}
