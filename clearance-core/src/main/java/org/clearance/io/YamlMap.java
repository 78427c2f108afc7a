package org.clearance.io;

import java.io.StringReader;
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
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.Yaml;
import org.yaml.snakeyaml.constructor.SafeConstructor;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.error.MarkedYAMLException;
import org.yaml.snakeyaml.error.YAMLException;
import org.yaml.snakeyaml.nodes.MappingNode;
import org.yaml.snakeyaml.nodes.Node;
import org.yaml.snakeyaml.nodes.NodeTuple;
import org.yaml.snakeyaml.nodes.ScalarNode;
import org.yaml.snakeyaml.nodes.SequenceNode;
import org.yaml.snakeyaml.nodes.Tag;

/**
 * The one YAML helper of the input readers (line specification, rule profiles): parsing through
 * snakeyaml's node tree, and a mapping whose every entry remembers the file and line it was
 * written on, so that any error names the file, line and key. Numbers are plain decimals
 * ({@link Decimal}); a quoted number, a number with a unit or {@code .inf} is an error naming the
 * unit the key's name carries. Mappings of a profile and of the profile it extends are merged
 * entry by entry ({@link #mergedWith}); each entry keeps its own file.
 */
public final class YamlMap {

  /** Most aliases a document may use: our files need a handful; more is a YAML bomb. */
  private static final int MAX_ALIASES = 50;
  /** Deepest nesting accepted: our files nest four levels. */
  private static final int MAX_NESTING = 20;

  /**
   * One key of a mapping and its value.
   *
   * @param key the key text
   * @param line 1-based line of the key
   * @param value the value node
   * @param file the file the entry was written in
   */
  public record Entry(String key, int line, Node value, String file) {

    /** An error about this entry. */
    public InputException error(String problem) {
      return new InputException(file, "line " + line, key, problem);
    }

    /** An error about an item or part of this entry written on another line. */
    public InputException error(Node at, String problem) {
      return new InputException(file, "line " + lineOf(at), key, problem);
    }

    /** True when the value is YAML null ({@code ~}, {@code null} or nothing). */
    public boolean isNull() {
      return value instanceof ScalarNode && value.getTag().equals(Tag.NULL);
    }

    /** A non-empty text value (any scalar except null). */
    public String text() {
      return textOf(value);
    }

    /** A non-empty text value of an item of this entry. */
    public String textOf(Node node) {
      if (!(node instanceof ScalarNode) || node.getTag().equals(Tag.NULL)) {
        throw error(node, "expected a text value, found " + kind(node));
      }
      String text = ((ScalarNode) node).getValue().strip();
      if (text.isEmpty()) {
        throw error(node, "must not be empty");
      }
      return text;
    }

    /** A finite plain decimal number in the unit of the key's name. */
    public double number() {
      return numberOf(value);
    }

    /** A finite plain decimal number of an item of this entry. */
    public double numberOf(Node node) {
      String unit = unitOf(key);
      if (!(node instanceof ScalarNode s) || node.getTag().equals(Tag.NULL)) {
        throw error(node, "expected a number in " + unit + ", found " + kind(node));
      }
      String text = s.getValue().strip();
      Tag tag = s.getTag();
      if (tag.equals(Tag.INT) || tag.equals(Tag.FLOAT)) {
        if (!Decimal.isDecimal(text)) {
          throw error(node, "'" + text + "' is not a plain decimal number (in " + unit + ")");
        }
        double v = Double.parseDouble(text);
        if (!Double.isFinite(v)) {
          throw error(node, "'" + text + "' is too large to be a finite number");
        }
        return v;
      }
      if (Decimal.looksLikeNumberWithUnit(text)) {
        throw error(node, "'" + text + "' is not a number: the unit is in the key's name ("
            + unit + "); write the number alone, converted to " + unit);
      }
      if (tag.equals(Tag.STR) && Decimal.isDecimal(text)) {
        throw error(node, "expected a number in " + unit + ", found quoted text '" + text
            + "' (remove the quotes)");
      }
      throw error(node, "expected a number in " + unit + ", found '" + text + "'");
    }

    /** A number greater than zero. */
    public double positive() {
      return positiveOf(value);
    }

    /** A number greater than zero, of an item of this entry. */
    public double positiveOf(Node node) {
      double x = numberOf(node);
      if (!(x > 0)) {
        throw error(node, "must be greater than zero, found " + fmt(x));
      }
      return x;
    }

    /** A number zero or greater. */
    public double nonNegative() {
      double x = number();
      if (!(x >= 0)) {
        throw error("must not be negative, found " + fmt(x));
      }
      return x;
    }

    /** A number inside a plausible range, else an error naming the range and its source. */
    public double within(ValueRange range) {
      return withinOf(value, range);
    }

    /** A number of an item of this entry inside a plausible range. */
    public double withinOf(Node node, ValueRange range) {
      double x = numberOf(node);
      String problem = range.problem(x);
      if (problem != null) {
        throw error(node, problem);
      }
      return x;
    }

    /** A whole number of at least {@code min} (at most nine digits). */
    public int integer(int min) {
      if (value instanceof ScalarNode s && s.getTag().equals(Tag.INT)
          && Decimal.isInteger(s.getValue().strip())) {
        int x = Integer.parseInt(s.getValue().strip());
        if (x >= min) {
          return x;
        }
        throw error("must be a whole number of at least " + min + ", found " + x);
      }
      throw error("expected a whole number, found " + kind(value));
    }

    /** {@code true} or {@code false}. */
    public boolean bool() {
      if (value instanceof ScalarNode s) {
        if (s.getValue().equals("true")) {
          return true;
        }
        if (s.getValue().equals("false")) {
          return false;
        }
      }
      throw error("expected true or false, found " + kind(value));
    }

    /** The value as a mapping; a key missing from it is reported at this entry's line. */
    public YamlMap map() {
      YamlMap map = YamlMap.of(value, file, key);
      return new YamlMap(file, line, key, value, map.entries);
    }

    /** The items of a list value (a single scalar counts as a list of one). */
    public List<Node> items() {
      if (value instanceof SequenceNode seq) {
        return seq.getValue();
      }
      if (value instanceof ScalarNode && !isNull()) {
        return List.of(value);
      }
      throw error("expected a list (items starting with '- '), found " + kind(value));
    }

    /** The items of a list of text values. */
    public List<String> texts() {
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
  private final Node node;
  private final Map<String, Entry> entries;

  private YamlMap(String file, int line, String ownerKey, Node node, Map<String, Entry> entries) {
    this.file = file;
    this.line = line;
    this.ownerKey = ownerKey;
    this.node = node;
    this.entries = entries;
  }

  /**
   * Parses YAML text into its node tree with the safe constructor, duplicate keys refused and
   * aliases and nesting bounded.
   *
   * @param text the YAML text
   * @param file file name for errors
   * @return the root node, never null
   * @throws InputException naming the file and line of a syntax error, or an empty file
   */
  public static Node compose(String text, String file) {
    LoaderOptions options = new LoaderOptions();
    options.setAllowDuplicateKeys(false);
    options.setMaxAliasesForCollections(MAX_ALIASES);
    options.setNestingDepthLimit(MAX_NESTING);
    Node root;
    try {
      root = new Yaml(new SafeConstructor(options)).compose(new StringReader(text));
    } catch (MarkedYAMLException e) {
      Mark mark = e.getProblemMark() != null ? e.getProblemMark() : e.getContextMark();
      String where = mark == null ? null : "line " + (mark.getLine() + 1);
      throw new InputException(file, where, null, "not valid YAML: " + e.getProblem());
    } catch (YAMLException e) {
      throw new InputException(file, null, null, "not valid YAML: " + e.getMessage());
    }
    if (root == null) {
      throw new InputException(file, null, null, "the file is empty");
    }
    return root;
  }

  /**
   * Wraps a mapping node.
   *
   * @param node the node, which must be a mapping
   * @param file file name for errors
   * @param ownerKey the key holding this mapping (for errors), or null at the top level
   * @throws InputException when the node is not a mapping, a key is not plain text or repeats
   */
  public static YamlMap of(Node node, String file, String ownerKey) {
    String what = ownerKey == null ? "the mapping" : "'" + ownerKey + "'";
    if (!(node instanceof MappingNode m)) {
      throw new InputException(file, "line " + lineOf(node), ownerKey,
          "expected a mapping of key: value, found " + kind(node));
    }
    Map<String, Entry> entries = new LinkedHashMap<>();
    for (NodeTuple tuple : m.getValue()) {
      Node keyNode = tuple.getKeyNode();
      if (!(keyNode instanceof ScalarNode ks) || keyNode.getTag().equals(Tag.MERGE)) {
        throw new InputException(file, "line " + lineOf(keyNode), ownerKey,
            "expected a plain text key in " + what);
      }
      Entry entry = new Entry(ks.getValue(), lineOf(keyNode), tuple.getValueNode(), file);
      if (entries.put(entry.key(), entry) != null) {
        throw entry.error("key given twice in " + what);
      }
    }
    return new YamlMap(file, lineOf(node), ownerKey, node, entries);
  }

  /**
   * Wraps a mapping node whose keys must all be in {@code allowed}.
   *
   * @param what what the mapping is, for messages, e.g. {@code "a conductor position"}
   * @throws InputException as {@link #of}, or for the first key not allowed, listing the keys
   */
  public static YamlMap strict(Node node, String file, String what, List<String> allowed) {
    if (!(node instanceof MappingNode)) {
      throw new InputException(file, "line " + lineOf(node), null,
          "expected " + what + " (a mapping of key: value), found " + kind(node));
    }
    YamlMap map = of(node, file, null);
    for (Entry e : map.entries()) {
      if (!allowed.contains(e.key())) {
        throw e.error("unknown key in " + what + "; allowed keys: "
            + String.join(", ", allowed));
      }
    }
    return map;
  }

  /** 1-based line of a node. */
  public static int lineOf(Node node) {
    return node.getStartMark().getLine() + 1;
  }

  /** The file the mapping was read from. */
  public String file() {
    return file;
  }

  /** 1-based line where the mapping starts (or, for a nested mapping, its key). */
  public int line() {
    return line;
  }

  /** The mapping node itself. */
  public Node node() {
    return node;
  }

  /** The entries in file order. */
  public Collection<Entry> entries() {
    return entries.values();
  }

  /** Throws on the first key not in {@code allowed}, listing the allowed keys. */
  public void checkKeys(Set<String> allowed) {
    for (Entry e : entries.values()) {
      if (!allowed.contains(e.key())) {
        throw e.error("unknown key; allowed here: " + String.join(", ", new TreeSet<>(allowed)));
      }
    }
  }

  /** True when the key is present. */
  public boolean has(String key) {
    return entries.containsKey(key);
  }

  /** The entry of a key, if present. */
  public Optional<Entry> optional(String key) {
    return Optional.ofNullable(entries.get(key));
  }

  /** The entry for a required key; the error names this mapping's line and the missing key. */
  public Entry required(String key) {
    Entry e = entries.get(key);
    if (e == null) {
      throw missing(key, "required key missing");
    }
    return e;
  }

  /** An error about a key that is missing from this mapping. */
  public InputException missing(String key, String problem) {
    String where = ownerKey == null ? "" : " (in '" + ownerKey + "')";
    return new InputException(file, "line " + line, key, problem + where);
  }

  /** The error for a key: at the key's value when present, else at the mapping. */
  public InputException error(String key, String problem) {
    Entry e = entries.get(key);
    return e != null ? e.error(e.value(), problem)
        : new InputException(file, "line " + line, key, problem);
  }

  /** The text of a required scalar, stripped (any scalar type: {@code 12} gives "12"). */
  public String text(String key) {
    Node v = required(key).value();
    if (v instanceof ScalarNode s && !v.getTag().equals(Tag.NULL)) {
      return s.getValue().strip();
    }
    throw error(key, "expected a value, found " + kind(v));
  }

  /** The text of an optional scalar, or the default when absent. */
  public String text(String key, String absent) {
    return has(key) ? text(key) : absent;
  }

  /** A required finite number in the unit of the key's name. */
  public double number(String key) {
    return required(key).number();
  }

  /** An optional finite number, or the default when the key is absent. */
  public double number(String key, double absent) {
    return has(key) ? number(key) : absent;
  }

  /** An optional whole number (any value; the caller checks its range), or the default. */
  public int integer(String key, int absent) {
    return has(key) ? required(key).integer(Integer.MIN_VALUE) : absent;
  }

  /** The items of a list; an empty list when the key is absent and not required. */
  public List<Node> list(String key, boolean required) {
    if (!has(key) && !required) {
      return List.of();
    }
    Entry e = required(key);
    if (!(e.value() instanceof SequenceNode seq)) {
      throw e.error("expected a list (items starting with '- '), found " + kind(e.value()));
    }
    return new ArrayList<>(seq.getValue());
  }

  /**
   * This mapping with the entries of {@code child} laid over it: a child entry replaces the entry
   * of the same key, a child entry whose value is null removes it. The merged mapping keeps this
   * mapping's file and line (where the structure was first declared).
   */
  public YamlMap mergedWith(YamlMap child) {
    Map<String, Entry> merged = new LinkedHashMap<>(entries);
    for (Entry e : child.entries.values()) {
      if (e.isNull()) {
        merged.remove(e.key());
      } else {
        merged.put(e.key(), e);
      }
    }
    return new YamlMap(file, line, ownerKey, node, merged);
  }

  /** What a node is, for messages: a mapping, a list, nothing or the quoted scalar. */
  public static String kind(Node n) {
    if (n instanceof MappingNode) {
      return "a mapping";
    } else if (n instanceof SequenceNode) {
      return "a list";
    } else if (n.getTag().equals(Tag.NULL)) {
      return "nothing";
    }
    String v = ((ScalarNode) n).getValue();
    return v.length() <= SHOWN_TEXT ? "'" + v + "'"
        : "the text '" + v.substring(0, SHOWN_TEXT) + "...' (" + v.length() + " characters)";
  }

  /** Longest text of an input quoted whole in a message (a whole wrong file is not echoed). */
  private static final int SHOWN_TEXT = 60;

  /** A number for messages, four significant digits. */
  public static String fmt(double x) {
    return String.format(Locale.ROOT, "%.4g", x);
  }

  /** The unit a key's name ends with, for messages. */
  public static String unitOf(String key) {
    if (key.endsWith("_kv")) {
      return "kV";
    } else if (key.endsWith("_mm")) {
      return "mm";
    } else if (key.endsWith("_kg_m3")) {
      return "kg/m^3";
    } else if (key.endsWith("_m_s")) {
      return "m/s";
    } else if (key.endsWith("_a")) {
      return "A";
    } else if (key.endsWith("_range") || key.equals("absorptivity")) {
      return "(a fraction, 0-1)";
    } else if (key.endsWith("_percent")) {
      return "%";
    } else if (key.endsWith("_m")) {
      return "m";
    } else if (key.endsWith("_c")) {
      return "degC";
    } else if (key.endsWith("_pa")) {
      return "Pa";
    } else if (key.endsWith("_deg")) {
      return "degrees";
    } else if (key.endsWith("_years")) {
      return "years";
    }
    return "the key's unit";
  }
}
