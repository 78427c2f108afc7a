package org.clearance.line;

import java.io.BufferedReader;
import java.io.IOException;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.clearance.InputException;

/**
 * A small comma-separated table: one header row and data rows, read whole (structure and conductor
 * files are small). Lines whose first non-blank character is {@code #} are comments; blank lines
 * are skipped. Fields may be quoted with {@code "}; a doubled quote inside a quoted field stands
 * for one quote; a quoted field must close on its own line. Unquoted fields are trimmed.
 *
 * @param file file name used in error messages
 * @param headerLine 1-based line number of the header row
 * @param header column names as written (trimmed), unique
 * @param rows data rows, each with exactly as many fields as the header
 */
record CsvTable(String file, int headerLine, List<String> header, List<Row> rows) {

  /** Byte-order mark some spreadsheet programs write at the start of UTF-8 files. */
  private static final char BOM = '\uFEFF';

  /**
   * One data row.
   *
   * @param line 1-based line number in the file, as an editor shows it
   * @param fields field texts, one per header column
   */
  record Row(int line, List<String> fields) {

    /** Location text for error messages, e.g. {@code "line 12"}. */
    String where() {
      return "line " + line;
    }
  }

  CsvTable {
    header = List.copyOf(header);
    rows = List.copyOf(rows);
  }

  /**
   * Reads a table.
   *
   * @param in the text, UTF-8 decoded
   * @param file file name for error messages
   * @throws InputException on an empty file, a bad or duplicate header name, an unclosed quote,
   *     or a row whose field count differs from the header's
   * @throws IOException when reading fails
   */
  static CsvTable read(BufferedReader in, String file) throws IOException {
    List<String> header = null;
    int headerLine = 0;
    List<Row> rows = new ArrayList<>();
    int lineNo = 0;
    for (String text = in.readLine(); text != null; text = in.readLine()) {
      lineNo++;
      if (lineNo == 1 && !text.isEmpty() && text.charAt(0) == BOM) {
        text = text.substring(1);
      }
      String trimmed = text.strip();
      if (trimmed.isEmpty() || trimmed.charAt(0) == '#') {
        continue;
      }
      List<String> fields = split(text, file, lineNo);
      if (header == null) {
        header = checkHeader(fields, file, lineNo);
        headerLine = lineNo;
      } else {
        checkCount(fields, header, file, lineNo);
        rows.add(new Row(lineNo, fields));
      }
    }
    if (header == null) {
      throw new InputException(file, null, null,
          "no header row (the file is empty or all comments)");
    }
    return new CsvTable(file, headerLine, header, rows);
  }

  /** Splits one line into fields; see the class comment for the quoting rules. */
  static List<String> split(String line, String file, int lineNo) {
    List<String> out = new ArrayList<>();
    int i = 0;
    int n = line.length();
    while (true) {
      while (i < n && isBlank(line.charAt(i))) {
        i++;
      }
      if (i < n && line.charAt(i) == '"') {
        int col = out.size() + 1;
        StringBuilder sb = new StringBuilder();
        i++;
        while (true) {
          if (i >= n) {
            throw new InputException(file, "line " + lineNo, "column " + col,
                "quoted field is not closed on this line");
          }
          char c = line.charAt(i++);
          if (c == '"') {
            if (i < n && line.charAt(i) == '"') {
              sb.append('"');
              i++;
            } else {
              break;
            }
          } else {
            sb.append(c);
          }
        }
        while (i < n && isBlank(line.charAt(i))) {
          i++;
        }
        if (i < n && line.charAt(i) != ',') {
          throw new InputException(file, "line " + lineNo, "column " + col,
              "text after the closing quote of a quoted field");
        }
        out.add(sb.toString());
      } else {
        int start = i;
        while (i < n && line.charAt(i) != ',') {
          if (line.charAt(i) == '"') {
            throw new InputException(file, "line " + lineNo, "column " + (out.size() + 1),
                "a quote inside an unquoted field; quote the whole field and double inner quotes");
          }
          i++;
        }
        out.add(line.substring(start, i).strip());
      }
      if (i >= n) {
        return out;
      }
      i++; // skip the comma
    }
  }

  private static boolean isBlank(char c) {
    return c == ' ' || c == '\t';
  }

  private static List<String> checkHeader(List<String> names, String file, int lineNo) {
    Set<String> seen = new HashSet<>();
    for (int c = 0; c < names.size(); c++) {
      String name = names.get(c);
      if (name.isEmpty()) {
        throw new InputException(file, "line " + lineNo, "column " + (c + 1),
            "empty column name in the header row");
      }
      if (!seen.add(name)) {
        throw new InputException(file, "line " + lineNo, name, "column named twice in the header");
      }
    }
    return names;
  }

  private static void checkCount(
      List<String> fields, List<String> header, String file, int lineNo) {
    if (fields.size() < header.size()) {
      throw new InputException(file, "line " + lineNo, header.get(fields.size()),
          "row has " + fields.size() + " fields but the header has " + header.size());
    }
    if (fields.size() > header.size()) {
      throw new InputException(file, "line " + lineNo, "column " + (header.size() + 1),
          "row has " + fields.size() + " fields but the header has " + header.size());
    }
  }

  /** Index of a header column, or -1. */
  int column(String name) {
    return header.indexOf(name);
  }
}
