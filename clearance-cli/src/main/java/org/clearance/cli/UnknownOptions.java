package org.clearance.cli;

import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;

/**
 * Options on a command line that the command does not have. picocli checks required options
 * before it reports unmatched ones, so a mistyped {@code --survy} would read as "missing
 * --survey"; the command line asks here first and names the unknown option instead.
 */
final class UnknownOptions {

  /** Largest edit distance of a suggestion: one or two typed letters wrong. */
  private static final int MAX_EDITS = 2;

  private UnknownOptions() {}

  /** The arguments that look like options and are options of no command on the path. */
  static List<String> of(CommandLine cl, String[] args) {
    List<String> out = new ArrayList<>();
    boolean afterDoubleDash = false;
    for (String a : args) {
      if (a.equals("--")) {
        afterDoubleDash = true;
      }
      if (afterDoubleDash || !a.startsWith("-") || a.equals("-") || isNumber(a)) {
        continue;
      }
      String name = a.contains("=") ? a.substring(0, a.indexOf('=')) : a;
      if (!known(cl.getCommandSpec(), name)) {
        out.add(name);
      }
    }
    return out;
  }

  private static boolean known(CommandSpec spec, String name) {
    for (CommandSpec s = spec; s != null; s = s.parent()) {
      if (s.findOption(name) != null) {
        return true;
      }
    }
    return false;
  }

  private static boolean isNumber(String a) {
    try {
      Double.parseDouble(a);
      return true;
    } catch (NumberFormatException e) {
      return false;
    }
  }

  /** "; did you mean --survey?" for the nearest option name, or empty. */
  static String suggestion(CommandLine cl, String unknown) {
    String best = null;
    int bestD = MAX_EDITS + 1;
    for (OptionSpec o : cl.getCommandSpec().options()) {
      for (String n : o.names()) {
        int d = distance(unknown, n);
        if (d < bestD) {
          bestD = d;
          best = n;
        }
      }
    }
    return best == null ? "" : "; did you mean " + best + "?";
  }

  /** Levenshtein distance (Levenshtein 1966), two rows. */
  static int distance(String a, String b) {
    int[] prev = new int[b.length() + 1];
    int[] cur = new int[b.length() + 1];
    for (int j = 0; j <= b.length(); j++) {
      prev[j] = j;
    }
    for (int i = 1; i <= a.length(); i++) {
      cur[0] = i;
      for (int j = 1; j <= b.length(); j++) {
        int sub = prev[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
        cur[j] = Math.min(sub, Math.min(prev[j] + 1, cur[j - 1] + 1));
      }
      int[] t = prev;
      prev = cur;
      cur = t;
    }
    return prev[b.length()];
  }
}
