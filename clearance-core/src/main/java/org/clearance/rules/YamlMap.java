package org.clearance.rules;

import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import org.clearance.InputException;
import org.clearance.io.ValueRange;
import org.yaml.snakeyaml.nodes.MappingNode;
import org.yaml.snakeyaml.nodes.Node;
import org.yaml.snakeyaml.nodes.NodeTuple;
import org.yaml.snakeyaml.nodes.ScalarNode;
import org.yaml.snakeyaml.nodes.SequenceNode;
import org.yaml.snakeyaml.nodes.Tag;

/**
 * A YAML mapping whose every entry remembers the file and line it was written on, so that any
 * error names the file, line and key. Mappings of a profile and of the profile it extends are
 * merged entry by entry ({@link #mergedWith}); each entry keeps its own file.
 */
final class YamlMap {

  /**
   * One key of a mapping and its value.
   *
   * @param key the key text
   * @param line 1-based line of the key
   * @param value the value node
   * @param file the file the entry was written in
   */
  record Entry(String key, int line, Node value, String file) {

    /** An error about this entry. */
    InputException error(String problem) {
      return new InputException(file, "line " + line, key, problem);
    }

    /** An error about an item or part of this entry written on another line. */
    InputException error(Node at, String problem) {
      return new InputException(file, "line " + lineOf(at), key, problem);
    }

    boolean isNull() {
      return value instanceof ScalarNode && value.getTag().equals(Tag.NULL);
    }

    /** A non-empty text value (any scalar except null). */
    String text() {
      return textOf(value);
    }

    String textOf(Node node) {
      if (!(node instanceof ScalarNode) || node.getTag().equals(Tag.NULL)) {
        throw error(node, "expected a text value");
      }
      String text = ((ScalarNode) node).getValue().trim();
      if (text.isEmpty()) {
        throw error(node, "must not be empty");
      }
      return text;
    }

    /** A finite number. */
    double number() {
      return numberOf(value);
    }

    double numberOf(Node node) {
      if (node instanceof ScalarNode
          && (node.getTag().equals(Tag.INT) || node.getTag().equals(Tag.FLOAT))) {
        String text = ((ScalarNode) node).getValue().replace("_", "");
        try {
          double x = Double.parseDouble(text);
          if (Double.isFinite(x)) {
            return x;
          }
        } catch (NumberFormatException e) {
          // falls through to the error below
        }
      }
      throw error(node, "expected a finite number, found '" + describe(node) + "'");
    }

    /** A number greater than zero. */
    double positive() {
      return positiveOf(value);
    }

    double positiveOf(Node node) {
      double x = numberOf(node);
      if (!(x > 0)) {
        throw error(node, "must be greater than zero, found " + fmt(x));
      }
      return x;
    }

    /** A number inside a plausible range, else an error naming the range and its source. */
    double within(ValueRange range) {
      return withinOf(value, range);
    }

    double withinOf(Node node, ValueRange range) {
      double x = numberOf(node);
      String problem = range.problem(x);
      if (problem != null) {
        throw error(node, problem);
      }
      return x;
    }

    /** A number zero or greater. */
    double nonNegative() {
      double x = number();
      if (!(x >= 0)) {
        throw error("must not be negative, found " + fmt(x));
      }
      return x;
    }

    /** A whole number of at least {@code min}. */
    int integer(int min) {
      if (value instanceof ScalarNode && value.getTag().equals(Tag.INT)) {
        try {
          int x = Integer.parseInt(((ScalarNode) value).getValue().replace("_", ""));
          if (x >= min) {
            return x;
          }
          throw error("must be a whole number of at least " + min + ", found " + x);
        } catch (NumberFormatException e) {
          // falls through to the error below
        }
      }
      throw error("expected a whole number, found '" + describe(value) + "'");
    }

    /** {@code true} or {@code false}. */
    boolean bool() {
      if (value instanceof ScalarNode) {
        String text = ((ScalarNode) value).getValue();
        if (text.equals("true")) {
          return true;
        }
        if (text.equals("false")) {
          return false;
        }
      }
      throw error("expected true or false, found '" + describe(value) + "'");
    }

    /** The value as a mapping; a key missing from it is reported at this entry's line. */
    YamlMap map() {
      YamlMap map = YamlMap.of(value, file, key);
      return new YamlMap(file, line, key, map.entries);
    }

    /** The items of a list value (a single scalar counts as a list of one). */
    List<Node> items() {
      if (value instanceof SequenceNode) {
        return ((SequenceNode) value).getValue();
      }
      if (value instanceof ScalarNode && !isNull()) {
        return List.of(value);
      }
      throw error("expected a list");
    }

    /** The items of a list of text values. */
    List<String> texts() {
      List<String> out = new ArrayList<>();
      for (Node item : items()) {
        out.add(textOf(item));
      }
      return out;
    }
  }

  private final String file;
  private final int line;
  private final String ownerKey;
  private final Map<String, Entry> entries;

  private YamlMap(String file, int line, String ownerKey, Map<String, Entry> entries) {
    this.file = file;
    this.line = line;
    this.ownerKey = ownerKey;
    this.entries = entries;
  }

  /**
   * Wraps a mapping node.
   *
   * @param node the node, which must be a mapping
   * @param file file name for errors
   * @param ownerKey the key holding this mapping (for errors), or null at the top level
   * @throws InputException when the node is not a mapping or repeats a key
   */
  static YamlMap of(Node node, String file, String ownerKey) {
    if (!(node instanceof MappingNode)) {
      throw new InputException(file, "line " + lineOf(node), ownerKey, "expected a mapping");
    }
    Map<String, Entry> entries = new LinkedHashMap<>();
    for (NodeTuple tuple : ((MappingNode) node).getValue()) {
      Node keyNode = tuple.getKeyNode();
      if (!(keyNode instanceof ScalarNode)) {
        throw new InputException(file, "line " + lineOf(keyNode), ownerKey, "keys must be text");
      }
      String key = ((ScalarNode) keyNode).getValue();
      Entry entry = new Entry(key, lineOf(keyNode), tuple.getValueNode(), file);
      if (entries.put(key, entry) != null) {
        throw entry.error("key appears twice in the same mapping");
      }
    }
    return new YamlMap(file, lineOf(node), ownerKey, entries);
  }

  /** 1-based line of a node. */
  static int lineOf(Node node) {
    return node.getStartMark().getLine() + 1;
  }

  String file() {
    return file;
  }

  int line() {
    return line;
  }

  Collection<Entry> entries() {
    return entries.values();
  }

  /** Throws on the first key not in {@code allowed}, listing the allowed keys. */
  void checkKeys(Set<String> allowed) {
    for (Entry e : entries.values()) {
      if (!allowed.contains(e.key())) {
        throw e.error("unknown key; allowed here: " + String.join(", ", new TreeSet<>(allowed)));
      }
    }
  }

  boolean has(String key) {
    return entries.containsKey(key);
  }

  Optional<Entry> optional(String key) {
    return Optional.ofNullable(entries.get(key));
  }

  /** The entry for a required key; the error names this mapping's line and the missing key. */
  Entry required(String key) {
    Entry e = entries.get(key);
    if (e == null) {
      throw missing(key, "required key is missing");
    }
    return e;
  }

  /** An error about a key that is missing from this mapping. */
  InputException missing(String key, String problem) {
    String where = ownerKey == null ? "" : " (in '" + ownerKey + "')";
    return new InputException(file, "line " + line, key, problem + where);
  }

  /**
   * This mapping with the entries of {@code child} laid over it: a child entry replaces the entry
   * of the same key, a child entry whose value is null removes it. The merged mapping keeps this
   * mapping's file and line (where the structure was first declared).
   */
  YamlMap mergedWith(YamlMap child) {
    Map<String, Entry> merged = new LinkedHashMap<>(entries);
    for (Entry e : child.entries.values()) {
      if (e.isNull()) {
        merged.remove(e.key());
      } else {
        merged.put(e.key(), e);
      }
    }
    return new YamlMap(file, line, ownerKey, merged);
  }

  static String describe(Node node) {
    if (node instanceof ScalarNode) {
      return ((ScalarNode) node).getValue();
    }
    return node instanceof SequenceNode ? "a list" : "a mapping";
  }

  static String fmt(double x) {
    return String.format(Locale.ROOT, "%.4g", x);
  }
}
