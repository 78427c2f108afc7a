package org.clearance.examples;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.util.ArrayDeque;
import java.util.Deque;

/**
 * A minimal streaming JSON writer (RFC 8259): objects and arrays, strings escaped, numbers in the
 * shortest round-trip form of {@link Double#toString(double)} (locale independent), NaN and
 * infinities as null. Containers opened "inline" stay on one line; others put each member on its
 * own indented line.
 */
final class JsonOut {
  private static final String INDENT = "  ";

  private final Writer out;
  private final Deque<boolean[]> stack = new ArrayDeque<>(); // {first, inline}
  private boolean afterName;

  JsonOut(Writer out) {
    this.out = out;
  }

  JsonOut beginObject(boolean inline) {
    return open('{', inline);
  }

  JsonOut endObject() {
    return close('}');
  }

  JsonOut beginArray(boolean inline) {
    return open('[', inline);
  }

  JsonOut endArray() {
    return close(']');
  }

  /** Writes a member name; the next value or container is its value. */
  JsonOut name(String name) {
    separator();
    string(name);
    write(": ");
    afterName = true;
    return this;
  }

  JsonOut value(String text) {
    separator();
    if (text == null) {
      write("null");
    } else {
      string(text);
    }
    return this;
  }

  JsonOut value(double v) {
    separator();
    write(Double.isFinite(v) ? number(v) : "null");
    return this;
  }

  JsonOut value(long v) {
    separator();
    write(Long.toString(v));
    return this;
  }

  JsonOut value(boolean v) {
    separator();
    write(Boolean.toString(v));
    return this;
  }

  /** Shortcut: a named string member. */
  JsonOut member(String name, String text) {
    return name(name).value(text);
  }

  /** Shortcut: a named number member. */
  JsonOut member(String name, double v) {
    return name(name).value(v);
  }

  /** Shortcut: a named integer member. */
  JsonOut member(String name, long v) {
    return name(name).value(v);
  }

  /** Shortcut: a named boolean member. */
  JsonOut member(String name, boolean v) {
    return name(name).value(v);
  }

  /** Shortcut: a named inline array of numbers. */
  JsonOut member(String name, double... values) {
    name(name).beginArray(true);
    for (double v : values) {
      value(v);
    }
    return endArray();
  }

  private static String number(double v) {
    if (v == Math.rint(v) && Math.abs(v) < 1e15) {
      return Long.toString((long) v);
    }
    return Double.toString(v);
  }

  private JsonOut open(char c, boolean inline) {
    separator();
    boolean parentInline = !stack.isEmpty() && stack.peek()[1];
    write(String.valueOf(c));
    stack.push(new boolean[] {true, inline || parentInline});
    return this;
  }

  private JsonOut close(char c) {
    boolean[] top = stack.pop();
    if (!top[1] && !top[0]) {
      newline(stack.size());
    }
    write(String.valueOf(c));
    if (stack.isEmpty()) {
      write("\n");
    }
    return this;
  }

  private void separator() {
    if (afterName) {
      afterName = false;
      return;
    }
    if (stack.isEmpty()) {
      return;
    }
    boolean[] top = stack.peek();
    if (!top[0]) {
      write(top[1] ? ", " : ",");
    }
    top[0] = false;
    if (!top[1]) {
      newline(stack.size());
    }
  }

  private void newline(int depth) {
    write("\n");
    for (int i = 0; i < depth; i++) {
      write(INDENT);
    }
  }

  private void string(String s) {
    StringBuilder sb = new StringBuilder(s.length() + 2).append('"');
    for (int i = 0; i < s.length(); i++) {
      char ch = s.charAt(i);
      switch (ch) {
        case '"':
          sb.append("\\\"");
          break;
        case '\\':
          sb.append("\\\\");
          break;
        case '\n':
          sb.append("\\n");
          break;
        case '\r':
          sb.append("\\r");
          break;
        case '\t':
          sb.append("\\t");
          break;
        default:
          if (ch < 0x20) {
            sb.append(String.format(java.util.Locale.ROOT, "\\u%04x", (int) ch));
          } else {
            sb.append(ch);
          }
      }
    }
    write(sb.append('"').toString());
  }

  private void write(String s) {
    try {
      out.write(s);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }
}
