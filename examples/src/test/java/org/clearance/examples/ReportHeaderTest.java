package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.yaml.snakeyaml.Yaml;

/**
 * The report header states the inputs' values (issue 11): each value is read back from
 * report.html and compared with the input files themselves, read here with SnakeYAML and hashed
 * with the platform's SHA-256 (FIPS 180-4), not with Clearance's readers.
 */
class ReportHeaderTest {

  @Test
  void headerValuesMatchTheInputs() throws Exception {
    DemoRuns.Run run = DemoRuns.of(DemoRuns.small(4242, ClassificationMode.FULL),
        "example-utility");
    String html = Files.readString(run.runDir().resolve("report.html"), StandardCharsets.UTF_8);
    Path lineFile = run.input().resolve("line.yaml");
    Map<String, Object> line;
    try (InputStream in = Files.newInputStream(lineFile)) {
      line = new Yaml().load(in);
    }

    String name = (String) line.get("name");
    String id = (String) line.get("line_id");
    assertTrue(html.contains("<h1>" + name + " (" + id + ")</h1>"), "title names the line");
    assertTrue(html.contains("<title>" + name + " (" + id + ")"), "page title names the line");

    double kv = ((Number) line.get("nominal_voltage_kv")).doubleValue();
    assertEquals("circuit 1 (A, B, C): " + plain(kv) + " kV", fact(html, "nominal voltage"));
    StringBuilder types = new StringBuilder();
    String last = null;
    for (Object o : (List<?>) line.get("conductors")) {
      Map<?, ?> p = (Map<?, ?>) o;
      String type = (String) p.get("conductor");
      String where = p.get("position") + ("shield".equals(p.get("role")) ? " (shield)" : "");
      types.append(type.equals(last) ? ", " : (last == null ? "" : "; ") + type + ": ")
          .append(where);
      last = type;
    }
    assertEquals(types.toString(), fact(html, "conductors"));
    double surveyT = ((Number) line.get("survey_conductor_temperature_c")).doubleValue();
    assertEquals(plain(surveyT) + " \u00b0C", fact(html, "survey conductor temperature"));

    for (Object o : (List<?>) line.get("conditions")) {
      Map<?, ?> c = (Map<?, ?>) o;
      String row = row(html, (String) c.get("name"));
      assertTrue(row.contains("<td>" + c.get("kind") + "</td>"), row);
      check(row, c, "temperature_c", 1, "\u00b0C");
      check(row, c, "creep_allowance_c", 1, "\u00b0C");
      check(row, c, "wind_pressure_pa", 1, "Pa");
      check(row, c, "ice_thickness_mm", 1, "mm");
    }

    for (String file : List.of("survey.las", "structures.csv", "line.yaml")) {
      Path p = run.input().resolve(file);
      assertTrue(html.contains(sha256(p)), "SHA-256 of " + file);
      assertTrue(html.contains(">" + Files.size(p) + "</td>"), "size of " + file);
    }

    assertEquals(DemoScene.CRS_NAME + " (EPSG:" + DemoScene.EPSG + ")",
        meta(html, "survey CRS"));
    // the generator's own flight plan dates the survey (its first strip's start)
    String firstDay = DemoCorridor.surveyDay(DemoScene.create(run.options())).toString();
    assertTrue(meta(html, "survey acquired").startsWith(firstDay), meta(html, "survey acquired"));
    assertTrue(html.contains("Years to violation count from the survey&#39;s first day, "
        + firstDay), "years count from the survey day");
    assertEquals("Clearance test", meta(html, "tool"));
    String started = new String(Files.readAllBytes(run.runDir().resolve("run.json")),
        StandardCharsets.UTF_8).replaceAll("(?s).*\"started\"\\s*:\\s*\"([^\"]+)\".*", "$1");
    String runDay = Instant.parse(started).atZone(ZoneOffset.UTC).toLocalDate().toString();
    assertEquals(runDay + " (UTC)", meta(html, "run day"));
    assertTrue(html.contains("run " + runDay), "footer and printed pages carry the run day");
  }

  /** A condition's parameter appears in its row when the input gives it. */
  private static void check(String row, Map<?, ?> c, String key, int decimals, String unit) {
    Object v = c.get(key);
    if (v == null) {
      return;
    }
    String text = String.format(Locale.ROOT, "%." + decimals + "f", ((Number) v).doubleValue())
        + "&nbsp;" + unit;
    assertTrue(row.contains(text), key + " " + text + " in " + row);
  }

  private static String fact(String html, String name) {
    Matcher m = Pattern.compile("<dt>" + Pattern.quote(name) + "</dt><dd>(.*?)</dd>")
        .matcher(html);
    assertTrue(m.find(), "fact " + name);
    return m.group(1);
  }

  private static String meta(String html, String name) {
    return fact(html, name);
  }

  private static String row(String html, String condition) {
    Matcher m = Pattern.compile("<tr><td>" + Pattern.quote(condition) + "</td>(.*?)</tr>")
        .matcher(html);
    assertTrue(m.find(), "condition row " + condition);
    return m.group(1);
  }

  private static String plain(double v) {
    return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
  }

  private static String sha256(Path p) throws IOException, java.security.GeneralSecurityException {
    return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
        .digest(Files.readAllBytes(p)));
  }
}
