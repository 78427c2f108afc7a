package org.clearance.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * Text cells of the output CSV files. Expected values follow the OWASP "CSV Injection" guidance
 * (a leading =, +, -, @, tab or carriage return makes a spreadsheet evaluate the cell; a leading
 * apostrophe makes it text) and RFC 4180 section 2 for quoting.
 */
class CsvCellsTest {

  /** Input, then the cell as written. */
  private static final String[][] CELLS = {
      {"T101", "T101"},
      {"", ""},
      {"=HYPERLINK(\"http://x\",\"y\")", "\"'=HYPERLINK(\"\"http://x\"\",\"\"y\"\")\""},
      {"+1+cmd", "'+1+cmd"},
      {"-2+3+cmd|' /C calc'!A0", "'-2+3+cmd|' /C calc'!A0"},
      {"@SUM(A1)", "'@SUM(A1)"},
      {"\t=1+1", "'\t=1+1"},
      {"\r=1+1", "\"'\r=1+1\""},
      {"-", "'-"},
      {"A-B", "A-B"},
      {"a,b", "\"a,b\""},
      // a text cell that is a plain number runs nothing: kept as it is
      {"-12", "-12"},
      {"+3.5e2", "+3.5e2"},
      {"-0.25", "-0.25"},
  };

  @Test
  void textCells() {
    for (String[] c : CELLS) {
      assertEquals(c[1], CsvCells.text(c[0]), c[0]);
    }
  }
}
