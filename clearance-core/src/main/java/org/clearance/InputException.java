package org.clearance;

import java.nio.file.Path;
import java.util.Objects;

/**
 * A problem with the user's input (a file, a record in it, an option) that the user can fix.
 *
 * <p>The message always names where the problem is: the file, the record or line, and the field
 * or key. The command line maps this exception to exit code 2 and prints only {@link #getMessage()},
 * never a stack trace.
 */
public final class InputException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  private final String file;
  private final String location;
  private final String field;
  private final String problem;

  /**
   * @param file the file at fault (or an option name such as {@code --survey-units}); may be null
   * @param location record or line within the file, e.g. {@code "line 12"} or {@code "point 1045"};
   *     may be null
   * @param field the field, column or key at fault; may be null
   * @param problem what is wrong, in plain words
   */
  public InputException(String file, String location, String field, String problem) {
    super(format(file, location, field, problem));
    this.file = file;
    this.location = location;
    this.field = field;
    this.problem = Objects.requireNonNull(problem, "problem");
  }

  /** Same as {@link #InputException(String, String, String, String)} with a path. */
  public InputException(Path file, String location, String field, String problem) {
    this(file == null ? null : file.toString(), location, field, problem);
  }

  private static String format(String file, String location, String field, String problem) {
    return printable(layout(file, location, field, problem));
  }

  /**
   * The text with every control character (C0, DEL, C1, line and paragraph separators, and the
   * bidirectional overrides that can reorder a terminal line) written as {@code \\uXXXX}, and
   * tabs, newlines and returns as {@code \\t}, {@code \\n}, {@code \\r}, so that text copied
   * from an input file cannot break the one-line message or drive the terminal.
   */
  public static String printable(String text) {
    StringBuilder sb = null;
    for (int i = 0; i < text.length(); i++) {
      char c = text.charAt(i);
      String escaped = escape(c);
      if (escaped != null && sb == null) {
        sb = new StringBuilder(text.length() + 16).append(text, 0, i);
      }
      if (sb != null) {
        if (escaped != null) {
          sb.append(escaped);
        } else {
          sb.append(c);
        }
      }
    }
    return sb == null ? text : sb.toString();
  }

  private static String escape(char c) {
    switch (c) {
      case '\t':
        return "\\t";
      case '\n':
        return "\\n";
      case '\r':
        return "\\r";
      default:
        break;
    }
    boolean control = c < 0x20 || (c >= 0x7F && c <= 0x9F) || c == '\u2028' || c == '\u2029'
        || (c >= '\u202A' && c <= '\u202E') || (c >= '\u2066' && c <= '\u2069');
    return control ? String.format(java.util.Locale.ROOT, "\\u%04X", (int) c) : null;
  }

  private static String layout(String file, String location, String field, String problem) {
    StringBuilder sb = new StringBuilder();
    if (file != null) {
      sb.append(file);
    }
    if (location != null) {
      sb.append(sb.length() > 0 ? ", " : "").append(location);
    }
    if (field != null) {
      sb.append(sb.length() > 0 ? ", " : "").append("field '").append(field).append('\'');
    }
    if (sb.length() > 0) {
      sb.append(": ");
    }
    return sb.append(problem).toString();
  }

  /** The file (or option) at fault, or null. */
  public String file() {
    return file;
  }

  /** The record or line at fault, or null. */
  public String location() {
    return location;
  }

  /** The field or key at fault, or null. */
  public String field() {
    return field;
  }

  /** The problem without the location prefix. */
  public String problem() {
    return problem;
  }
}
