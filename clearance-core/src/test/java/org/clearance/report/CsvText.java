package org.clearance.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** A small RFC 4180 reader for tests: header line, then rows as maps by column name. */
public final class CsvText {

  private CsvText() {}

  public static List<String> header(String text) {
    return fields(text).get(0);
  }

  public static List<Map<String, String>> rows(String text) {
    List<List<String>> all = fields(text);
    List<Map<String, String>> out = new ArrayList<>();
    for (List<String> r : all.subList(1, all.size())) {
      if (r.size() != all.get(0).size()) {
        throw new IllegalArgumentException("row of " + r.size() + " fields: " + r);
      }
      Map<String, String> m = new LinkedHashMap<>();
      for (int i = 0; i < r.size(); i++) {
        m.put(all.get(0).get(i), r.get(i));
      }
      out.add(m);
    }
    return out;
  }

  private static List<List<String>> fields(String text) {
    List<List<String>> rows = new ArrayList<>();
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
      } else if (c == ',') {
        row.add(f.toString());
        f.setLength(0);
      } else if (c == '\n') {
        row.add(f.toString());
        f.setLength(0);
        rows.add(row);
        row = new ArrayList<>();
      } else {
        f.append(c);
      }
    }
    return rows;
  }
}
