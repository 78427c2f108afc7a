package org.clearance.io;

import java.util.Locale;

/**
 * A small streaming JSON text builder: objects, arrays, strings, numbers (NaN and infinities as
 * {@code null}, since JSON has no such numbers), booleans. Numbers use {@link Locale#ROOT} and
 * round-trip exactly ({@link Double#toString}). Commas are placed automatically.
 */
public final class JsonWriter {

  private final StringBuilder out = new StringBuilder();
  private final boolean[] needComma = new boolean[128];
  private int depth;
  private boolean afterName;

  /** Starts an object (as a value, or as the value of the preceding {@link #name}). */
  public JsonWriter beginObject() {
    value();
    out.append('{');
    push();
    return this;
  }

  /** Ends the current object. */
  public JsonWriter endObject() {
    depth--;
    out.append('}');
    return this;
  }

  /** Starts an array. */
  public JsonWriter beginArray() {
    value();
    out.append('[');
    push();
    return this;
  }

  /** Ends the current array. */
  public JsonWriter endArray() {
    depth--;
    out.append(']');
    return this;
  }

  /** Writes a member name; the next call writes its value. */
  public JsonWriter name(String name) {
    if (needComma[depth]) {
      out.append(',');
    }
    needComma[depth] = true;
    quote(name);
    out.append(':');
    afterName = true;
    return this;
  }

  /** A string value, or null. */
  public JsonWriter value(String s) {
    value();
    if (s == null) {
      out.append("null");
    } else {
      quote(s);
    }
    return this;
  }

  /** A number; NaN and infinities become null. */
  public JsonWriter value(double d) {
    value();
    out.append(Double.isFinite(d) ? numberText(d) : "null");
    return this;
  }

  /** An integer. */
  public JsonWriter value(long n) {
    value();
    out.append(n);
    return this;
  }

  /** A boolean. */
  public JsonWriter value(boolean b) {
    value();
    out.append(b);
    return this;
  }

  /** Shortcut: {@code name(n).value(s)}. */
  public JsonWriter member(String n, String s) {
    return name(n).value(s);
  }

  /** Shortcut: {@code name(n).value(d)}. */
  public JsonWriter member(String n, double d) {
    return name(n).value(d);
  }

  /** Shortcut: {@code name(n).value(v)}. */
  public JsonWriter member(String n, long v) {
    return name(n).value(v);
  }

  /** Shortcut: {@code name(n).value(b)}. */
  public JsonWriter member(String n, boolean b) {
    return name(n).value(b);
  }

  /** The text written so far. */
  @Override
  public String toString() {
    return out.toString();
  }

  private void push() {
    depth++;
    if (depth >= needComma.length) {
      throw new IllegalStateException("JSON nested too deep");
    }
    needComma[depth] = false;
  }

  private void value() {
    if (afterName) {
      afterName = false;
      return;
    }
    if (needComma[depth]) {
      out.append(',');
    }
    needComma[depth] = true;
  }

  private static String numberText(double d) {
    if (d == Math.rint(d) && Math.abs(d) < 1e15) {
      return Long.toString((long) d);
    }
    return Double.toString(d).toLowerCase(Locale.ROOT);
  }

  private void quote(String s) {
    out.append('"');
    for (int i = 0; i < s.length(); i++) {
      char c = s.charAt(i);
      switch (c) {
        case '"':
          out.append("\\\"");
          break;
        case '\\':
          out.append("\\\\");
          break;
        case '\n':
          out.append("\\n");
          break;
        case '\r':
          out.append("\\r");
          break;
        case '\t':
          out.append("\\t");
          break;
        default:
          if (c < 0x20) {
            out.append(String.format(Locale.ROOT, "\\u%04x", (int) c));
          } else {
            out.append(c);
          }
      }
    }
    out.append('"');
  }
}
