package org.clearance.line;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.clearance.InputException;
import org.yaml.snakeyaml.nodes.MappingNode;
import org.yaml.snakeyaml.nodes.Node;
import org.yaml.snakeyaml.nodes.NodeTuple;
import org.yaml.snakeyaml.nodes.ScalarNode;
import org.yaml.snakeyaml.nodes.SequenceNode;
import org.yaml.snakeyaml.nodes.Tag;

/**
 * A YAML mapping node with strict, typed access for the line specification reader. Construction
 * rejects non-mappings, non-scalar keys, duplicate keys and keys not in the allowed list; every
 * getter rejects wrong types. Each error names the file, the 1-based line and the key.
 */
final class YamlMap {

  private final String file;
  private final Node node;
  private final Map<String, Node> values = new LinkedHashMap<>();

  /**
   * @param node the node that must be a mapping
   * @param file file name for messages
   * @param what what the mapping is, for messages, e.g. {@code "a conductor position"}
   * @param allowed the keys allowed in it
   */
  YamlMap(Node node, String file, String what, List<String> allowed) {
    this.file = file;
    this.node = node;
    if (!(node instanceof MappingNode m)) {
      throw new InputException(file, where(node), null,
          "expected " + what + " (a mapping of key: value), found " + kind(node));
    }
    for (NodeTuple t : m.getValue()) {
      Node k = t.getKeyNode();
      if (!(k instanceof ScalarNode ks) || k.getTag().equals(Tag.MERGE)) {
        throw new InputException(file, where(k), null, "expected a plain key in " + what);
      }
      String key = ks.getValue();
      if (!allowed.contains(key)) {
        throw new InputException(file, where(k), key,
            "unknown key in " + what + "; allowed keys: " + String.join(", ", allowed));
      }
      if (values.put(key, t.getValueNode()) != null) {
        throw new InputException(file, where(k), key, "key given twice in " + what);
      }
    }
  }

  /** Location text of a node: {@code "line <n>"}, 1-based. */
  static String where(Node n) {
    return "line " + (n.getStartMark().getLine() + 1);
  }

  private static String kind(Node n) {
    if (n instanceof MappingNode) {
      return "a mapping";
    } else if (n instanceof SequenceNode) {
      return "a list";
    } else if (n.getTag().equals(Tag.NULL)) {
      return "nothing";
    }
    return "'" + ((ScalarNode) n).getValue() + "'";
  }

  /** 1-based line where the mapping starts. */
  int line() {
    return node.getStartMark().getLine() + 1;
  }

  /** The mapping node itself. */
  Node node() {
    return node;
  }

  /** True when the key is present. */
  boolean has(String key) {
    return values.containsKey(key);
  }

  /** The error for a key: at the key's value when present, else at the mapping. */
  InputException error(String key, String problem) {
    Node v = values.get(key);
    return new InputException(file, where(v != null ? v : node), key, problem);
  }

  private Node required(String key) {
    Node v = values.get(key);
    if (v == null) {
      throw new InputException(file, where(node), key, "required key missing");
    }
    return v;
  }

  private ScalarNode scalar(String key, String expected) {
    Node v = required(key);
    if (v instanceof ScalarNode s && !v.getTag().equals(Tag.NULL)) {
      return s;
    }
    throw error(key, "expected " + expected + ", found " + kind(v));
  }

  /** The text of a required scalar (any scalar type: {@code 12} gives {@code "12"}). */
  String text(String key) {
    return scalar(key, "a value").getValue().strip();
  }

  /** The text of an optional scalar, or the default when absent. */
  String text(String key, String absent) {
    return has(key) ? text(key) : absent;
  }

  /**
   * A required finite number. The unit is the one the key's name ends with.
   *
   * @throws InputException when absent, not a plain decimal number, or not finite
   */
  double number(String key) {
    String unit = unitOf(key);
    ScalarNode s = scalar(key, "a number in " + unit);
    String text = s.getValue().strip();
    Tag tag = s.getTag();
    if (tag.equals(Tag.INT) || tag.equals(Tag.FLOAT)) {
      if (!Decimal.isDecimal(text)) {
        throw error(key, "'" + text + "' is not a plain decimal number (in " + unit + ")");
      }
      double v = Double.parseDouble(text);
      if (!Double.isFinite(v)) {
        throw error(key, "'" + text + "' is too large to be a finite number");
      }
      return v;
    }
    if (Decimal.looksLikeNumberWithUnit(text)) {
      throw error(key, "'" + text + "' is not a number: the unit is in the key's name ("
          + unit + "); write the number alone, converted to " + unit);
    }
    if (tag.equals(Tag.STR) && Decimal.isDecimal(text)) {
      throw error(key, "expected a number in " + unit + ", found quoted text '" + text
          + "' (remove the quotes)");
    }
    throw error(key, "expected a number in " + unit + ", found '" + text + "'");
  }

  /** An optional finite number, or the default when the key is absent. */
  double number(String key, double absent) {
    return has(key) ? number(key) : absent;
  }

  /** An optional whole number, or the default when absent. */
  int integer(String key, int absent) {
    if (!has(key)) {
      return absent;
    }
    ScalarNode s = scalar(key, "a whole number");
    String text = s.getValue().strip();
    if (!(s.getTag().equals(Tag.INT) && Decimal.isInteger(text))) {
      throw error(key, "expected a whole number, found '" + text + "'");
    }
    return Integer.parseInt(text);
  }

  /** The node of a required key (for a nested mapping). */
  Node node(String key) {
    return required(key);
  }

  /** The items of a list; an empty list when the key is absent and not required. */
  List<Node> list(String key, boolean required) {
    if (!has(key) && !required) {
      return List.of();
    }
    Node v = required(key);
    if (!(v instanceof SequenceNode seq)) {
      throw error(key, "expected a list (items starting with '- '), found " + kind(v));
    }
    return new ArrayList<>(seq.getValue());
  }

  /** The unit a key's name ends with, for messages. */
  static String unitOf(String key) {
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
    }
    return "the key's unit";
  }
}
