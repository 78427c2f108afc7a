package org.clearance.examples;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A small strict JSON parser (RFC 8259) for reading truth.json back in tests: objects become
 * LinkedHashMap, arrays ArrayList, numbers Double, plus String, Boolean and null.
 */
final class MiniJson {
  private final String text;
  private int pos;

  private MiniJson(String text) {
    this.text = text;
  }

  static Object parse(String text) {
    MiniJson p = new MiniJson(text);
    Object v = p.value();
    p.space();
    if (p.pos != text.length()) {
      throw p.error("trailing text");
    }
    return v;
  }

  private Object value() {
    space();
    if (pos >= text.length()) {
      throw error("unexpected end");
    }
    char c = text.charAt(pos);
    switch (c) {
      case '{':
        return object();
      case '[':
        return array();
      case '"':
        return string();
      case 't':
        return word("true", Boolean.TRUE);
      case 'f':
        return word("false", Boolean.FALSE);
      case 'n':
        return word("null", null);
      default:
        return number();
    }
  }

  private Map<String, Object> object() {
    Map<String, Object> m = new LinkedHashMap<>();
    pos++;
    space();
    if (text.charAt(pos) == '}') {
      pos++;
      return m;
    }
    while (true) {
      space();
      String key = string();
      space();
      expect(':');
      if (m.put(key, value()) != null) {
        throw error("duplicate key " + key);
      }
      space();
      if (text.charAt(pos) == ',') {
        pos++;
      } else {
        expect('}');
        return m;
      }
    }
  }

  private List<Object> array() {
    List<Object> a = new ArrayList<>();
    pos++;
    space();
    if (text.charAt(pos) == ']') {
      pos++;
      return a;
    }
    while (true) {
      a.add(value());
      space();
      if (text.charAt(pos) == ',') {
        pos++;
      } else {
        expect(']');
        return a;
      }
    }
  }

  private String string() {
    expect('"');
    StringBuilder sb = new StringBuilder();
    while (true) {
      char c = text.charAt(pos++);
      if (c == '"') {
        return sb.toString();
      }
      if (c < 0x20) {
        throw error("control character in string");
      }
      if (c == '\\') {
        char e = text.charAt(pos++);
        switch (e) {
          case 'n': sb.append('\n'); break;
          case 't': sb.append('\t'); break;
          case 'r': sb.append('\r'); break;
          case 'b': sb.append('\b'); break;
          case 'f': sb.append('\f'); break;
          case 'u':
            sb.append((char) Integer.parseInt(text.substring(pos, pos + 4), 16));
            pos += 4;
            break;
          case '"': case '\\': case '/': sb.append(e); break;
          default: throw error("bad escape " + e);
        }
      } else {
        sb.append(c);
      }
    }
  }

  private Double number() {
    int start = pos;
    if (text.charAt(pos) == '-') {
      pos++;
    }
    while (pos < text.length() && "0123456789.eE+-".indexOf(text.charAt(pos)) >= 0) {
      pos++;
    }
    String s = text.substring(start, pos);
    if (!s.matches("-?(0|[1-9][0-9]*)(\\.[0-9]+)?([eE][+-]?[0-9]+)?")) {
      throw error("bad number " + s);
    }
    return Double.valueOf(s);
  }

  private Object word(String w, Object v) {
    if (!text.startsWith(w, pos)) {
      throw error("expected " + w);
    }
    pos += w.length();
    return v;
  }

  private void expect(char c) {
    if (pos >= text.length() || text.charAt(pos) != c) {
      throw error("expected " + c);
    }
    pos++;
  }

  private void space() {
    while (pos < text.length() && " \t\r\n".indexOf(text.charAt(pos)) >= 0) {
      pos++;
    }
  }

  private IllegalArgumentException error(String what) {
    return new IllegalArgumentException(what + " at " + pos);
  }
}
