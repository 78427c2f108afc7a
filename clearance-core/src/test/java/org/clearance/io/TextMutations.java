package org.clearance.io;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Seeded mutations of small valid text inputs for the fuzz tests of the readers: numbers replaced
 * by extreme or mistyped values, characters inserted (controls, quotes, YAML and CSV specials),
 * spans deleted, lines duplicated, deleted, swapped or re-indented, words swapped, truncation,
 * bytes that are not UTF-8.
 */
public final class TextMutations {

  /**
   * One mutated input.
   *
   * @param bytes the file content
   * @param what the mutation, for the failure message and the tally
   */
  public record Mutation(byte[] bytes, String what) {}

  private static final Pattern NUMBER = Pattern.compile("-?\\d+(\\.\\d+)?([eE][-+]?\\d+)?");
  private static final Pattern WORD = Pattern.compile("[A-Za-z_][A-Za-z0-9_]*");
  private static final String[] NUMBERS = {"0", "-0", "-1", "1e308", "-1e308", "4.9e-324",
      "1e300", "99999999999", "2147483648", "NaN", ".nan", "-.inf", "1487195", "100000",
      "0.000001", "18.9e-9", "\"12\"", "12 m", "", "1_000", "0x1F", "05", "1.5"};
  private static final String[] INSERTS = {"\u0000", "\u001b[31m", "\t", "\r", "\n", "\u00e9",
      "\ufeff", "\u202e", "\"", "'", ",", ":", ": ", "-", "- ", "#", "{", "}", "[", "]", "&a ",
      "*a", "!!binary ", "!!python/object:x ", "<<: *a\n", "~", "null", "%YAML 1.1\n", "---\n",
      "...\n", " ", "  ", "|\n", ">\n", "?", "@", "=cmd|x", "\\", "/", "-"};

  private TextMutations() {}

  /** One random mutation of {@code text}. */
  public static Mutation mutate(String text, Random rnd) {
    int op = rnd.nextInt(12);
    switch (op) {
      case 0:
      case 1: {
        List<int[]> spans = spans(NUMBER, text);
        if (spans.isEmpty()) {
          return utf8(text, "unchanged (no number)");
        }
        int[] s = spans.get(rnd.nextInt(spans.size()));
        String v = NUMBERS[rnd.nextInt(NUMBERS.length)];
        return utf8(text.substring(0, s[0]) + v + text.substring(s[1]), "number '"
            + text.substring(s[0], s[1]) + "' at char " + s[0] + " -> '" + v + "'");
      }
      case 2: {
        int at = rnd.nextInt(text.length() + 1);
        String v = INSERTS[rnd.nextInt(INSERTS.length)];
        return utf8(text.substring(0, at) + v + text.substring(at), "inserted "
            + printable(v) + " at char " + at);
      }
      case 3: {
        int at = rnd.nextInt(text.length());
        int end = Math.min(text.length(), at + 1 + rnd.nextInt(20));
        return utf8(text.substring(0, at) + text.substring(end), "deleted chars " + at + "-"
            + end);
      }
      case 4: {
        List<String> lines = lines(text);
        int i = rnd.nextInt(lines.size());
        lines.add(i, lines.get(i));
        return utf8(String.join("\n", lines), "line " + (i + 1) + " duplicated");
      }
      case 5: {
        List<String> lines = lines(text);
        int i = rnd.nextInt(lines.size());
        lines.remove(i);
        return utf8(String.join("\n", lines), "line " + (i + 1) + " deleted");
      }
      case 6: {
        List<String> lines = lines(text);
        int i = rnd.nextInt(lines.size());
        int j = rnd.nextInt(lines.size());
        String t = lines.get(i);
        lines.set(i, lines.get(j));
        lines.set(j, t);
        return utf8(String.join("\n", lines), "lines " + (i + 1) + " and " + (j + 1)
            + " swapped");
      }
      case 7: {
        List<String> lines = lines(text);
        int i = rnd.nextInt(lines.size());
        String l = lines.get(i);
        lines.set(i, rnd.nextBoolean() ? "  " + l : l.replaceFirst("^ {1,2}", ""));
        return utf8(String.join("\n", lines), "line " + (i + 1) + " re-indented");
      }
      case 8: {
        List<int[]> words = spans(WORD, text);
        int[] a = words.get(rnd.nextInt(words.size()));
        int[] b = words.get(rnd.nextInt(words.size()));
        String w = text.substring(b[0], b[1]);
        w = rnd.nextInt(4) == 0 ? w.toUpperCase(java.util.Locale.ROOT) : w;
        return utf8(text.substring(0, a[0]) + w + text.substring(a[1]), "word '"
            + text.substring(a[0], a[1]) + "' -> '" + w + "'");
      }
      case 9: {
        int len = rnd.nextInt(text.length());
        return utf8(text.substring(0, len), "truncated to " + len + " chars");
      }
      case 10: {
        byte[] b = text.getBytes(StandardCharsets.UTF_8);
        int at = rnd.nextInt(b.length);
        byte[] out = new byte[b.length + 1];
        System.arraycopy(b, 0, out, 0, at);
        out[at] = (byte) (0x80 + rnd.nextInt(0x80));
        System.arraycopy(b, at, out, at + 1, b.length - at);
        return new Mutation(out, "byte " + (out[at] & 0xFF) + " (not UTF-8) at " + at);
      }
      default: {
        List<String> lines = lines(text);
        int i = rnd.nextInt(lines.size());
        int n = 1 + rnd.nextInt(3);
        String repeated = String.join("\n", java.util.Collections.nCopies(n, lines.get(i)));
        lines.set(i, repeated + "\n" + lines.get(i));
        return utf8(String.join("\n", lines), "line " + (i + 1) + " repeated " + n + " times");
      }
    }
  }

  private static Mutation utf8(String text, String what) {
    return new Mutation(text.getBytes(StandardCharsets.UTF_8), what);
  }

  private static List<int[]> spans(Pattern p, String text) {
    List<int[]> out = new ArrayList<>();
    Matcher m = p.matcher(text);
    while (m.find()) {
      out.add(new int[] {m.start(), m.end()});
    }
    return out;
  }

  private static List<String> lines(String text) {
    return new ArrayList<>(Arrays.asList(text.split("\n", -1)));
  }

  private static String printable(String s) {
    StringBuilder sb = new StringBuilder("'");
    for (char c : s.toCharArray()) {
      sb.append(c < 0x20 || c > 0x7E ? String.format(java.util.Locale.ROOT, "\\u%04x", (int) c)
          : String.valueOf(c));
    }
    return sb.append('\'').toString();
  }
}
