package org.clearance.io;

import com.fasterxml.jackson.databind.JsonNode;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.clearance.InputException;

/**
 * Typed access to a node of a parsed JSON file (a run folder's model.json or run.json) whose
 * every error names the file, the path of the node (such as {@code spans[3].conductors[0]}) and
 * the key.
 *
 * @param file the file's name for messages
 * @param path where the node is in the document ({@code ""} for the root)
 * @param node the node
 */
public record JsonAt(String file, String path, JsonNode node) {

  /** The root of a document; it must be an object. */
  public static JsonAt root(String file, JsonNode doc) {
    JsonAt at = new JsonAt(file, "", doc);
    if (!doc.isObject()) {
      throw at.error(null, "the document must be a JSON object");
    }
    return at;
  }

  /** An error at this node about {@code key} (may be null). */
  public InputException error(String key, String problem) {
    return new InputException(file, path.isEmpty() ? null : path, key, problem);
  }

  /** Whether the object has member {@code key}. */
  public boolean has(String key) {
    return node.has(key);
  }

  /** The member {@code key}; missing is an error. */
  public JsonNode get(String key) {
    JsonNode v = node.get(key);
    if (v == null) {
      throw error(key, "missing");
    }
    return v;
  }

  /** The object member {@code key}. */
  public JsonAt obj(String key) {
    JsonNode v = get(key);
    if (!v.isObject()) {
      throw error(key, "must be an object");
    }
    return new JsonAt(file, child(key), v);
  }

  /** The items of array member {@code key}, each an object. */
  public List<JsonAt> objects(String key) {
    List<JsonAt> out = new ArrayList<>();
    JsonNode a = array(key);
    for (int i = 0; i < a.size(); i++) {
      JsonAt item = new JsonAt(file, child(key) + "[" + i + "]", a.get(i));
      if (!item.node.isObject()) {
        throw item.error(null, "must be an object");
      }
      out.add(item);
    }
    return out;
  }

  /** The items of array member {@code key}, each a string. */
  public List<String> strings(String key) {
    List<String> out = new ArrayList<>();
    JsonNode a = array(key);
    for (int i = 0; i < a.size(); i++) {
      if (!a.get(i).isTextual()) {
        throw error(key + "[" + i + "]", "must be a string");
      }
      out.add(a.get(i).textValue());
    }
    return out;
  }

  /** The items of array member {@code key}, each a number or null (NaN). */
  public List<Double> numbers(String key) {
    List<Double> out = new ArrayList<>();
    JsonNode a = array(key);
    for (int i = 0; i < a.size(); i++) {
      out.add(number(a.get(i), key + "[" + i + "]"));
    }
    return out;
  }

  /** The string member {@code key}. */
  public String str(String key) {
    JsonNode v = get(key);
    if (!v.isTextual()) {
      throw error(key, "must be a string");
    }
    return v.textValue();
  }

  /** The number member {@code key}; null reads as NaN (a value not computed). */
  public double num(String key) {
    return number(get(key), key);
  }

  /** The whole-number member {@code key} within [min, max]. */
  public long integer(String key, long min, long max) {
    JsonNode v = get(key);
    if (!v.canConvertToLong() || !v.isIntegralNumber() && v.doubleValue() != v.longValue()) {
      throw error(key, "must be a whole number");
    }
    long n = v.longValue();
    if (n < min || n > max) {
      throw error(key, n + " is outside " + min + " to " + max);
    }
    return n;
  }

  /** The member {@code key} as one of an enum's constant names. */
  public <E extends Enum<E>> E constant(String key, Class<E> type) {
    String s = str(key);
    try {
      return Enum.valueOf(type, s);
    } catch (IllegalArgumentException e) {
      throw error(key, "unknown value '" + s + "'");
    }
  }

  /** The ISO-8601 instant member {@code key}. */
  public Instant time(String key) {
    String s = str(key);
    try {
      return Instant.parse(s);
    } catch (DateTimeParseException e) {
      throw error(key, "not an ISO-8601 time: " + s);
    }
  }

  /** The members of object member {@code key}, in file order, each a string. */
  public Map<String, String> stringMap(String key) {
    Map<String, String> out = new LinkedHashMap<>();
    JsonAt o = obj(key);
    for (Map.Entry<String, JsonNode> e : o.node.properties()) {
      if (!e.getValue().isTextual()) {
        throw o.error(e.getKey(), "must be a string");
      }
      out.put(e.getKey(), e.getValue().textValue());
    }
    return out;
  }

  /** The members of object member {@code key}, in file order, each a number or null. */
  public Map<String, Double> numberMap(String key) {
    Map<String, Double> out = new LinkedHashMap<>();
    JsonAt o = obj(key);
    for (Map.Entry<String, JsonNode> e : o.node.properties()) {
      out.put(e.getKey(), o.number(e.getValue(), e.getKey()));
    }
    return out;
  }

  private JsonNode array(String key) {
    JsonNode v = get(key);
    if (!v.isArray()) {
      throw error(key, "must be an array");
    }
    return v;
  }

  private double number(JsonNode v, String key) {
    if (v.isNumber()) {
      return v.doubleValue();
    }
    if (v.isNull()) {
      return Double.NaN;
    }
    throw error(key, "must be a number or null");
  }

  private String child(String key) {
    return path.isEmpty() ? key : path + "." + key;
  }
}
