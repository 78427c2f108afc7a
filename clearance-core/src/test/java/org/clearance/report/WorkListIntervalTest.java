package org.clearance.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.clearance.clearance.UncertaintyFile;
import org.clearance.rules.RuleProfiles;
import org.clearance.run.RunFixture;
import org.clearance.run.RunModel;
import org.clearance.run.RunModelJson;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The work list carries the interval and verdict of each item's governing finding (issue 14): the
 * same values as that finding's row in sites.csv, under a profile that asks for 95 % confidence.
 */
class WorkListIntervalTest {

  @TempDir Path dir;

  @Test
  void eachItemShowsItsGoverningSitesIntervalAndVerdict() throws IOException {
    RunFixture.metric().write(dir);
    // Every conductor state uncertain by 0.2 m at every station [input of this test].
    StringBuilder u = new StringBuilder("# horizontal_rmse_m,0.15\n# vertical_rmse_m,0.10\n"
        + "span_id,conductor,condition,input,length_m,swings");
    for (int j = 0; j < 11; j++) {
      u.append(",s").append(j).append("_m");
    }
    u.append('\n');
    for (String span : List.of("KV-10-11", "KV-12-13")) {
      for (String c : RunFixture.PHASES) {
        for (String condition : List.of("survey", "hot-75C", "gale")) {
          u.append(span).append(',').append(c).append(',').append(condition)
              .append(",survey temperature,200,false");
          for (int j = 0; j < 11; j++) {
            u.append(",0.2");
          }
          u.append('\n');
        }
      }
    }
    Files.writeString(dir.resolve(UncertaintyFile.FILE_NAME), u.toString());
    ReportStage.run(dir, RunModelJson.read(dir.resolve(RunModel.FILE_NAME)),
        RuleProfiles.builtin("example-utility-95"), ReportOptions.defaults(),
        new PrintWriter(new StringWriter()));
    List<Map<String, String>> sites = CsvText.rows(Files.readString(dir.resolve("sites.csv")));
    List<Map<String, String>> work = CsvText.rows(Files.readString(dir.resolve("worklist.csv")));
    int withInterval = 0;
    for (Map<String, String> w : work) {
      String first = governing(w, sites);
      if (first == null) {
        assertEquals("", w.get("verdict"), "a fall-in-only item has no interval");
        continue;
      }
      Map<String, String> site = sites.stream().filter(s -> s.get("site_id").equals(first))
          .findFirst().orElseThrow();
      assertEquals(site.get("verdict"), w.get("verdict"));
      assertEquals(site.get("clearance_low_m"), w.get("clearance_low_m"));
      assertEquals(site.get("clearance_high_m"), w.get("clearance_high_m"));
      assertFalse(w.get("verdict").isEmpty());
      double low = Double.parseDouble(w.get("clearance_low_m"));
      double high = Double.parseDouble(w.get("clearance_high_m"));
      double d = Double.parseDouble(w.get("clearance_m"));
      assertTrue(low < d && d < high, low + " < " + d + " < " + high);
      withInterval++;
    }
    assertTrue(withInterval >= 1, "the fixture's clump under the middle phase has one");
  }

  /** The item's first grow-in site id (sites are listed in site order), or null. */
  private static String governing(Map<String, String> item, List<Map<String, String>> sites) {
    for (String id : item.get("sites").split(" ")) {
      for (Map<String, String> s : sites) {
        if (s.get("site_id").equals(id) && !s.get("zone").equals("fall-in")) {
          return id;
        }
      }
    }
    return null;
  }
}
