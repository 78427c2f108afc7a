package org.clearance.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** A small RFC 4180 reader for tests: rows of a CSV text with a header, as maps. */
final class Csv {

  private Csv() {}

  static List<Map<String, String>> rows(String text) {
    List<List<String>> all = new ArrayList<>();
    List<String> row = new ArrayList<>();
    StringBuilder f = new StringBuilder();
    boolean quoted = false;
    for (int i = 0; i < text.length(); i++) {
      char c = text.charAt(i);
      if (quoted) {
        if (c == '"' && i + 1 < text.length() && text.charAt(i + 1) == '"') {
          f.append('"');
          i++;
        } else if (c == '"') {
          quoted = false;
        } else {
          f.append(c);
        }
      } else if (c == '"') {
        quoted = true;
      } else if (c == ',' || c == '\n') {
        row.add(f.toString());
        f.setLength(0);
        if (c == '\n') {
          all.add(row);
          row = new ArrayList<>();
        }
      } else {
        f.append(c);
      }
    }
    List<Map<String, String>> out = new ArrayList<>();
    for (List<String> r : all.subList(1, all.size())) {
      Map<String, String> m = new LinkedHashMap<>();
      for (int i = 0; i < r.size(); i++) {
        m.put(all.get(0).get(i), r.get(i));
      }
      out.add(m);
    }
    return out;
  }
}
