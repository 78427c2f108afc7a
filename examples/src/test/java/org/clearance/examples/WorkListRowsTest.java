package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;

/**
 * The demo's work list has one row per tree or vegetation patch (issue 11): no tree twice, every
 * cut site in exactly one row, and no two rows at the same place.
 */
class WorkListRowsTest {

  @Test
  void oneRowPerTreeAndEverySiteOnce() throws IOException {
    DemoRuns.Run run = DemoRuns.of(DemoRuns.small(11L, ClassificationMode.FULL),
        "example-utility");
    List<Map<String, String>> rows = rows(run.runDir().resolve("worklist.csv"));
    List<Map<String, String>> sites = rows(run.runDir().resolve("sites.csv"));
    assertFalse(rows.isEmpty(), "the demo has work");
    assertTrue(rows.size() < sites.size(), "sites of one tree share a row: " + rows.size()
        + " rows for " + sites.size() + " sites");
    Set<String> trees = new HashSet<>();
    Map<String, Integer> siteRows = new HashMap<>();
    Set<String> places = new HashSet<>();
    for (Map<String, String> r : rows) {
      String tree = r.get("tree_id");
      assertTrue(tree.isEmpty() || trees.add(tree), "tree " + tree + " on two rows");
      for (String s : r.get("sites").split(" ")) {
        siteRows.merge(s, 1, Integer::sum);
      }
      // millimetre coordinates: two rows at one place would be one tree listed twice
      assertTrue(places.add(r.get("x_m") + "/" + r.get("y_m")), "two rows at one place: " + r);
      assertFalse(r.get("reasons").isEmpty());
      if (r.get("reasons").contains("fall-in")) {
        assertEquals("remove tree", r.get("work"));
        assertFalse(tree.isEmpty(), "a fall-in row names its tree");
      }
    }
    for (Map<String, String> s : sites) {
      assertEquals(1, siteRows.getOrDefault(s.get("site_id"), 0), s.get("site_id"));
    }
    assertEquals(sites.size(), siteRows.size());
  }

  /** Rows of a CSV file without quoted fields (the work list quotes none in the demo). */
  private static List<Map<String, String>> rows(Path file) throws IOException {
    List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
    String[] header = lines.get(0).split(",", -1);
    List<Map<String, String>> out = new ArrayList<>();
    for (String line : lines.subList(1, lines.size())) {
      assertFalse(line.contains("\""), "no quoted field expected: " + line);
      String[] f = line.split(",", -1);
      Map<String, String> m = new HashMap<>();
      for (int i = 0; i < header.length; i++) {
        m.put(header[i], f[i]);
      }
      out.add(m);
    }
    return out;
  }
}
