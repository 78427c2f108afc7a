package org.clearance.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A strict little JSON reader (RFC 8259) for checking the commands' JSON output in tests: objects
 * become maps, arrays lists, numbers doubles, {@code null} the {@link #NULL} marker.
 */
final class MiniJson {
  /** Stands for a JSON null (maps cannot tell a missing key from a null value otherwise). */
  static final Object NULL = new Object();

  private final String s;
  private int pos;

  private MiniJson(String s) {
    this.s = s;
  }

  /** Parses one JSON value filling the whole text (whitespace aside). */
  static Object parse(String text) {
    MiniJson p = new MiniJson(text);
    Object v = p.value();
    p.space();
    if (p.pos != text.length()) {
      throw p.error("text after the value");
    }
    return v;
  }

  @SuppressWarnings("unchecked")
  static Map<String, Object> object(Object v) {
    return (Map<String, Object>) v;
  }

  private Object value() {
    space();
    if (pos >= s.length()) {
      throw error("unexpected end");
    }
    char c = s.charAt(pos);
    if (c == '{') {
      Map<String, Object> m = new LinkedHashMap<>();
      pos++;
      space();
      if (peek('}')) {
        return m;
      }
      do {
        space();
        String k = string();
        space();
        expect(':');
        if (m.put(k, value()) != null) {
          throw error("duplicate key " + k);
        }
        space();
      } while (accept(','));
      expect('}');
      return m;
    }
    if (c == '[') {
      List<Object> l = new ArrayList<>();
      pos++;
      space();
      if (peek(']')) {
        return l;
      }
      do {
        l.add(value());
        space();
      } while (accept(','));
      expect(']');
      return l;
    }
    if (c == '"') {
      return string();
    }
    if (s.startsWith("null", pos)) {
      pos += 4;
      return NULL;
    }
    if (s.startsWith("true", pos)) {
      pos += 4;
      return Boolean.TRUE;
    }
    if (s.startsWith("false", pos)) {
      pos += 5;
      return Boolean.FALSE;
    }
    int start = pos;
    while (pos < s.length() && "+-.0123456789eE".indexOf(s.charAt(pos)) >= 0) {
      pos++;
    }
    String num = s.substring(start, pos);
    if (!num.matches("-?(0|[1-9][0-9]*)(\\.[0-9]+)?([eE][+-]?[0-9]+)?")) {
      throw error("bad number '" + num + "'");
    }
    return Double.parseDouble(num);
  }

  private String string() {
    expect('"');
    StringBuilder b = new StringBuilder();
    while (pos < s.length()) {
      char c = s.charAt(pos++);
      if (c == '"') {
        return b.toString();
      }
      if (c < 0x20) {
        throw error("control character in string");
      }
      if (c == '\\') {
        char e = s.charAt(pos++);
        switch (e) {
          case 'n':
            b.append('\n');
            break;
          case 't':
            b.append('\t');
            break;
          case 'r':
            b.append('\r');
            break;
          case 'u':
            b.append((char) Integer.parseInt(s.substring(pos, pos + 4), 16));
            pos += 4;
            break;
          default:
            b.append(e);
        }
      } else {
        b.append(c);
      }
    }
    throw error("unterminated string");
  }

  private void space() {
    while (pos < s.length() && " \t\r\n".indexOf(s.charAt(pos)) >= 0) {
      pos++;
    }
  }

  private boolean peek(char c) {
    if (pos < s.length() && s.charAt(pos) == c) {
      pos++;
      return true;
    }
    return false;
  }

  private boolean accept(char c) {
    return peek(c);
  }

  private void expect(char c) {
    if (!peek(c)) {
      throw error("expected '" + c + "'");
    }
  }

  private IllegalArgumentException error(String what) {
    return new IllegalArgumentException(what + " at " + pos);
  }
}
