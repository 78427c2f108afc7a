package org.clearance.survey;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * One element of an OGC well-known text CRS: a keyword, its values (quoted text, numbers, bare
 * words, in order) and its child elements (in order).
 *
 * <p>Reads both WKT1 (OGC 01-009, "Coordinate Transformation Services", section 7) and WKT2
 * (OGC 18-010r7 / ISO 19162): keywords followed by {@code [...]} or {@code (...)}, values
 * separated by commas, text in double quotes with {@code ""} standing for one quote.
 *
 * @param keyword the keyword in upper case, e.g. {@code PROJCS}
 * @param values the element's own values in order (text unquoted)
 * @param children the nested elements in order
 */
record WktNode(String keyword, List<String> values, List<WktNode> children) {
  /** Deepest nesting accepted; real CRS definitions stay below 10. */
  private static final int MAX_DEPTH = 64;

  WktNode {
    values = List.copyOf(values);
    children = List.copyOf(children);
  }

  /** The first direct child with one of the keywords. */
  Optional<WktNode> child(String... keywords) {
    for (WktNode c : children) {
      for (String k : keywords) {
        if (c.keyword.equals(k)) {
          return Optional.of(c);
        }
      }
    }
    return Optional.empty();
  }

  /** All direct children with one of the keywords. */
  List<WktNode> all(String... keywords) {
    List<WktNode> out = new ArrayList<>();
    for (WktNode c : children) {
      for (String k : keywords) {
        if (c.keyword.equals(k)) {
          out.add(c);
        }
      }
    }
    return out;
  }

  /** The value at {@code index}, or an empty string. */
  String value(int index) {
    return index < values.size() ? values.get(index) : "";
  }

  /**
   * Parses WKT text.
   *
   * @throws IllegalArgumentException with the character position when the text is not WKT
   */
  static WktNode parse(String text) {
    Parser p = new Parser(text);
    WktNode node = p.element(0);
    p.skipSpace();
    if (p.pos < text.length()) {
      throw p.error("unexpected text after the end of the CRS");
    }
    return node;
  }

  /** A recursive-descent parser over the text. */
  private static final class Parser {
    private final String s;
    private int pos;

    Parser(String s) {
      this.s = s;
    }

    WktNode element(int depth) {
      if (depth > MAX_DEPTH) {
        throw error("nested deeper than " + MAX_DEPTH + " levels");
      }
      skipSpace();
      String keyword = word();
      if (keyword.isEmpty()) {
        throw error("expected a keyword");
      }
      skipSpace();
      if (pos >= s.length() || (s.charAt(pos) != '[' && s.charAt(pos) != '(')) {
        throw error("expected '[' after " + keyword);
      }
      char close = s.charAt(pos) == '[' ? ']' : ')';
      pos++;
      List<String> values = new ArrayList<>();
      List<WktNode> children = new ArrayList<>();
      while (true) {
        skipSpace();
        if (pos >= s.length()) {
          throw error("text ends inside " + keyword);
        }
        char c = s.charAt(pos);
        if (c == '"') {
          values.add(quoted());
        } else if (isWordStart(c)) {
          int save = pos;
          String w = word();
          skipSpace();
          if (pos < s.length() && (s.charAt(pos) == '[' || s.charAt(pos) == '(')) {
            pos = save;
            children.add(element(depth + 1));
          } else {
            values.add(w);
          }
        } else if (isNumberStart(c)) {
          values.add(number());
        } else if (c != close) {
          throw error("unexpected character '" + c + "' in " + keyword);
        }
        skipSpace();
        if (pos < s.length() && s.charAt(pos) == ',') {
          pos++;
          continue;
        }
        if (pos < s.length() && s.charAt(pos) == close) {
          pos++;
          return new WktNode(keyword.toUpperCase(Locale.ROOT), values, children);
        }
        throw error("expected ',' or '" + close + "' in " + keyword);
      }
    }

    private String quoted() {
      StringBuilder sb = new StringBuilder();
      pos++;
      while (pos < s.length()) {
        char c = s.charAt(pos++);
        if (c == '"') {
          if (pos < s.length() && s.charAt(pos) == '"') {
            sb.append('"');
            pos++;
          } else {
            return sb.toString();
          }
        } else {
          sb.append(c);
        }
      }
      throw error("unterminated quoted text");
    }

    private String word() {
      int start = pos;
      while (pos < s.length()
          && (Character.isLetterOrDigit(s.charAt(pos)) || s.charAt(pos) == '_')) {
        pos++;
      }
      return s.substring(start, pos);
    }

    private String number() {
      int start = pos;
      while (pos < s.length() && "+-.0123456789eE".indexOf(s.charAt(pos)) >= 0) {
        pos++;
      }
      return s.substring(start, pos);
    }

    private static boolean isWordStart(char c) {
      return Character.isLetter(c) || c == '_';
    }

    private static boolean isNumberStart(char c) {
      return c == '-' || c == '+' || c == '.' || (c >= '0' && c <= '9');
    }

    void skipSpace() {
      while (pos < s.length() && Character.isWhitespace(s.charAt(pos))) {
        pos++;
      }
    }

    IllegalArgumentException error(String what) {
      return new IllegalArgumentException(what + " at character " + (pos + 1));
    }
  }
}
