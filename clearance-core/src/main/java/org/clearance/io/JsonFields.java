package org.clearance.io;

import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.List;
import org.clearance.InputException;

/**
 * Typed access to a parsed {@link Json} document whose every error names the file, the line and
 * the key: for the run folder's own files (model.json, run.json).
 *
 * @param file the file's name for messages
 */
public record JsonFields(String file) {

  /** The member {@code key} of object {@code o}; missing is an error. */
  public Json.Value get(Json.Obj o, String key) {
    Json.Value v = o.members().get(key);
    if (v == null) {
      throw new InputException(file, "line " + o.line(), key, "missing");
    }
    return v;
  }

  /** {@code v} as an object; {@code what} names it in the message. */
  public Json.Obj obj(Json.Value v, String what) {
    if (v instanceof Json.Obj o) {
      return o;
    }
    throw new InputException(file, "line " + v.line(), null, what + " must be an object");
  }

  /** The array member {@code key}. */
  public List<Json.Value> arr(Json.Obj o, String key) {
    Json.Value v = get(o, key);
    if (v instanceof Json.Arr a) {
      return a.items();
    }
    throw new InputException(file, "line " + v.line(), key, "must be an array");
  }

  /** The string member {@code key}. */
  public String str(Json.Obj o, String key) {
    return text(get(o, key), key);
  }

  /** {@code v} as a string; {@code key} names it in the message. */
  public String text(Json.Value v, String key) {
    if (v instanceof Json.Str s) {
      return s.value();
    }
    throw new InputException(file, "line " + v.line(), key, "must be a string");
  }

  /** The number member {@code key}; null reads as NaN (a value not computed). */
  public double num(Json.Obj o, String key) {
    return number(get(o, key), key);
  }

  /** {@code v} as a number; null reads as NaN. */
  public double number(Json.Value v, String key) {
    if (v instanceof Json.Num n) {
      return n.value();
    }
    if (v instanceof Json.Null) {
      return Double.NaN;
    }
    throw new InputException(file, "line " + v.line(), key, "must be a number or null");
  }

  /** The ISO-8601 instant member {@code key}. */
  public Instant time(Json.Obj o, String key) {
    String s = str(o, key);
    try {
      return Instant.parse(s);
    } catch (DateTimeParseException e) {
      throw new InputException(file, "line " + o.line(), key, "not an ISO-8601 time: " + s);
    }
  }
}
