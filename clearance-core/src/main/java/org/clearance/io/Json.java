package org.clearance.io;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.clearance.InputException;

/**
 * A minimal strict JSON parser (RFC 8259: objects, arrays, strings with escapes, numbers,
 * {@code true}, {@code false}, {@code null}) that remembers the line of every value, so errors in
 * a file (a GeoJSON structures file, a run model) can name the line. Duplicate object keys, trailing commas, comments
 * and text after the top-level value are errors.
 */
public final class Json {

  /** Deepest nesting accepted; a GeoJSON point file nests 4 deep, this guards the stack. */
  private static final int MAX_DEPTH = 64;

  /** A parsed value and the 1-based line where it starts. */
  public sealed interface Value permits Obj, Arr, Str, Num, Bool, Null {
    /** 1-based line where the value starts. */
    int line();

    /** Kind of value for messages, e.g. {@code "an object"}. */
    String kind();
  }

  /** An object; members in file order, unmodifiable. */
  public record Obj(Map<String, Value> members, int line) implements Value {
    public String kind() {
      return "an object";
    }
  }

  /** An array, unmodifiable. */
  public record Arr(List<Value> items, int line) implements Value {
    public String kind() {
      return "an array";
    }
  }

  /** A string, escapes resolved. */
  public record Str(String value, int line) implements Value {
    public String kind() {
      return "a string";
    }
  }

  /** A number as written in the file. */
  public record Num(String text, int line) implements Value {
    public String kind() {
      return "a number";
    }

    /** The value as a double (may be infinite for an out-of-range exponent). */
    public double value() {
      return Double.parseDouble(text);
    }
  }

  /** {@code true} or {@code false}. */
  public record Bool(boolean value, int line) implements Value {
    public String kind() {
      return "a boolean";
    }
  }

  /** {@code null}. */
  public record Null(int line) implements Value {
    public String kind() {
      return "null";
    }
  }

  private final String text;
  private final String file;
  private int pos;
  private int line = 1;

  private Json(String text, String file) {
    this.text = text;
    this.file = file;
  }

  /**
   * Parses a whole document.
   *
   * @param text the document
   * @param file file name for error messages
   * @throws InputException naming the file and line of the first syntax error
   */
  public static Value parse(String text, String file) {
    Json p = new Json(text, file);
    if (!text.isEmpty() && text.charAt(0) == '\uFEFF') {
      p.pos = 1;
    }
    p.skipSpace();
    if (p.pos >= text.length()) {
      throw p.error("the file is empty");
    }
    Value v = p.value(0);
    p.skipSpace();
    if (p.pos < text.length()) {
      throw p.error("unexpected text after the end of the JSON document");
    }
    return v;
  }

  private InputException error(String problem) {
    return new InputException(file, "line " + line, null, "JSON syntax: " + problem);
  }

  private void skipSpace() {
    while (pos < text.length()) {
      char c = text.charAt(pos);
      if (c == '\n') {
        line++;
      } else if (c != ' ' && c != '\t' && c != '\r') {
        return;
      }
      pos++;
    }
  }

  private Value value(int depth) {
    if (depth > MAX_DEPTH) {
      throw error("nested deeper than " + MAX_DEPTH + " levels");
    }
    if (pos >= text.length()) {
      throw error("unexpected end of file");
    }
    char c = text.charAt(pos);
    int at = line;
    switch (c) {
      case '{':
        return object(depth);
      case '[':
        return array(depth);
      case '"':
        return new Str(string(), at);
      case 't':
        literal("true");
        return new Bool(true, at);
      case 'f':
        literal("false");
        return new Bool(false, at);
      case 'n':
        literal("null");
        return new Null(at);
      default:
        if (c == '-' || (c >= '0' && c <= '9')) {
          return number();
        }
        throw error("unexpected character '" + c + "'");
    }
  }

  private Obj object(int depth) {
    int at = line;
    pos++; // '{'
    Map<String, Value> members = new LinkedHashMap<>();
    skipSpace();
    if (peek() == '}') {
      pos++;
      return new Obj(Collections.unmodifiableMap(members), at);
    }
    while (true) {
      skipSpace();
      if (peek() != '"') {
        throw error("expected a quoted member name");
      }
      String key = string();
      skipSpace();
      expect(':');
      skipSpace();
      Value v = value(depth + 1);
      if (members.put(key, v) != null) {
        throw error("member \"" + key + "\" appears twice in one object");
      }
      skipSpace();
      char c = peek();
      pos++;
      if (c == '}') {
        return new Obj(Collections.unmodifiableMap(members), at);
      }
      if (c != ',') {
        pos--;
        throw error("expected ',' or '}' in an object");
      }
    }
  }

  private Arr array(int depth) {
    int at = line;
    pos++; // '['
    List<Value> items = new ArrayList<>();
    skipSpace();
    if (peek() == ']') {
      pos++;
      return new Arr(Collections.unmodifiableList(items), at);
    }
    while (true) {
      skipSpace();
      items.add(value(depth + 1));
      skipSpace();
      char c = peek();
      pos++;
      if (c == ']') {
        return new Arr(Collections.unmodifiableList(items), at);
      }
      if (c != ',') {
        pos--;
        throw error("expected ',' or ']' in an array");
      }
    }
  }

  private char peek() {
    if (pos >= text.length()) {
      throw error("unexpected end of file");
    }
    return text.charAt(pos);
  }

  private void expect(char c) {
    if (peek() != c) {
      throw error("expected '" + c + "'");
    }
    pos++;
  }

  private void literal(String word) {
    if (!text.startsWith(word, pos)) {
      throw error("unexpected word (expected " + word + ", or a quoted string)");
    }
    pos += word.length();
  }

  private String string() {
    pos++; // opening quote
    StringBuilder sb = new StringBuilder();
    while (true) {
      char c = peek();
      pos++;
      if (c == '"') {
        return sb.toString();
      }
      if (c < 0x20) {
        throw error("control character (such as a line break) inside a string");
      }
      if (c != '\\') {
        sb.append(c);
        continue;
      }
      char e = peek();
      pos++;
      sb.append(switch (e) {
        case '"' -> '"';
        case '\\' -> '\\';
        case '/' -> '/';
        case 'b' -> '\b';
        case 'f' -> '\f';
        case 'n' -> '\n';
        case 'r' -> '\r';
        case 't' -> '\t';
        case 'u' -> unicodeEscape();
        default -> throw error("unknown escape '\\" + e + "' in a string");
      });
    }
  }

  private char unicodeEscape() {
    if (pos + 4 > text.length()) {
      throw error("unexpected end of file in a \\u escape");
    }
    int v = 0;
    for (int k = 0; k < 4; k++) {
      int d = Character.digit(text.charAt(pos + k), 16);
      if (d < 0) {
        throw error("a \\u escape needs four hexadecimal digits");
      }
      v = v * 16 + d;
    }
    pos += 4;
    return (char) v;
  }

  private Num number() {
    int at = line;
    int start = pos;
    if (peek() == '-') {
      pos++;
    }
    if (pos < text.length() && text.charAt(pos) == '0') {
      pos++;
    } else {
      digits("a digit");
    }
    if (pos < text.length() && text.charAt(pos) == '.') {
      pos++;
      digits("a digit after the decimal point");
    }
    if (pos < text.length() && (text.charAt(pos) == 'e' || text.charAt(pos) == 'E')) {
      pos++;
      if (pos < text.length() && (text.charAt(pos) == '+' || text.charAt(pos) == '-')) {
        pos++;
      }
      digits("a digit in the exponent");
    }
    return new Num(text.substring(start, pos), at);
  }

  private void digits(String what) {
    int start = pos;
    while (pos < text.length() && text.charAt(pos) >= '0' && text.charAt(pos) <= '9') {
      pos++;
    }
    if (pos == start) {
      throw error("expected " + what + " in a number");
    }
  }
}
