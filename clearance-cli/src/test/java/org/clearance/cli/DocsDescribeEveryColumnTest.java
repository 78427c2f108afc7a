package org.clearance.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.clearance.examples.DemoCorridor;
import org.clearance.examples.DemoOptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 11: the docs describe every column of every output file. The columns are read from the
 * files a real check writes (CSV headers, the GeoPackage's tables, the GeoJSON properties) and
 * each must be named in backticks in its page ({@code docs/report.md}, {@code
 * docs/wire-finder.md}, {@code docs/run-folder.md}); the README's work-list table names every
 * work-list column. A coordinate column's unit may be written {@code <unit>} or {@code <u>}.
 */
class DocsDescribeEveryColumnTest {

  @TempDir static Path tmp;
  private static Path run;
  private static Path root;

  @BeforeAll
  static void check() {
    DemoCorridor.DemoFiles demo = DemoCorridor.write(tmp.resolve("input"),
        DemoOptions.defaults().withSpanCount(3).withPointDensity(1.0));
    run = tmp.resolve("run");
    CliRun r = CliRun.of("check", "--survey", demo.survey().toString(), "--structures",
        demo.structures().toString(), "--line", demo.lineSpec().toString(), "--out",
        run.toString(), "--threads", "2", "--rules", "example-utility-95");
    assertEquals(0, r.exit(), r.err());
    Path p = Path.of("").toAbsolutePath();
    while (p != null && !Files.isRegularFile(p.resolve("docs").resolve("report.md"))) {
      p = p.getParent();
    }
    assertTrue(p != null, "the project's docs folder");
    root = p;
  }

  /**
   * Every name in backticks in a page (code blocks left out), a list in one pair of backticks
   * split at commas.
   */
  private static Set<String> named(String... pages) throws IOException {
    Set<String> out = new HashSet<>();
    for (String page : pages) {
      String text = Files.readString(root.resolve(page), StandardCharsets.UTF_8)
          .replaceAll("(?s)```.*?```", "");
      Matcher m = Pattern.compile("`([^`]+)`").matcher(text);
      while (m.find()) {
        for (String part : m.group(1).split(",")) {
          out.add(part.strip());
        }
      }
    }
    return out;
  }

  /** The column as docs may write it: itself, or with its unit as a placeholder. */
  private static boolean described(String column, Set<String> names) {
    if (names.contains(column)) {
      return true;
    }
    String unitless = column.replaceFirst("_(m|ft|ftUS)$", "");
    for (String u : List.of("<unit>", "<u>")) {
      if (names.contains(unitless + "_" + u)) {
        return true;
      }
    }
    // numbered columns (s0_m ... s10_m) are described once as s<k>_m
    return names.contains(column.replaceFirst("^([a-z]+)\\d+_", "$1<k>_"));
  }

  private static List<String> missing(List<String> columns, Set<String> names) {
    List<String> out = new ArrayList<>();
    for (String c : columns) {
      if (!described(c, names)) {
        out.add(c);
      }
    }
    return out;
  }

  private static List<String> csvHeader(String file) throws IOException {
    for (String line : Files.readAllLines(run.resolve(file), StandardCharsets.UTF_8)) {
      if (!line.startsWith("#")) {
        return List.of(line.split(","));
      }
    }
    throw new AssertionError("no header in " + file);
  }

  @Test
  void csvFilesAreDescribed() throws IOException {
    Set<String> report = named("docs/report.md");
    for (String f : List.of("worklist.csv", "sites.csv", "spans.csv")) {
      assertEquals(List.of(), missing(csvHeader(f), report), f + " columns not in report.md");
    }
    assertEquals(List.of(), missing(csvHeader("conductors.csv"), named("docs/wire-finder.md")),
        "conductors.csv columns not in wire-finder.md");
    assertEquals(List.of(), missing(csvHeader("uncertainty.csv"), named("docs/run-folder.md")),
        "uncertainty.csv columns not in run-folder.md");
    assertEquals(List.of(), missing(csvHeader("worklist.csv"), named("README.md")),
        "work-list columns not in the README");
  }

  @Test
  void geoPackageLayersAndGeoJsonPropertiesAreDescribed() throws IOException, SQLException {
    Set<String> report = named("docs/report.md");
    Set<String> layers = new LinkedHashSet<>();
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:"
        + run.resolve("sites.gpkg").toAbsolutePath())) {
      try (ResultSet r = c.createStatement().executeQuery(
          "SELECT table_name FROM gpkg_contents ORDER BY table_name")) {
        while (r.next()) {
          layers.add(r.getString(1));
        }
      }
      assertTrue(layers.containsAll(List.of("sites", "spans", "conductors", "structures",
          "row")), layers.toString());
      for (String layer : layers) {
        assertTrue(report.contains(layer), "layer " + layer);
        List<String> columns = new ArrayList<>();
        try (ResultSet r = c.createStatement().executeQuery("PRAGMA table_info('" + layer
            + "')")) {
          while (r.next()) {
            String name = r.getString("name");
            if (!name.equals("fid") && !name.equals("geom")) {
              columns.add(name);
            }
          }
        }
        assertEquals(List.of(), missing(columns, report), "GeoPackage layer " + layer);
      }
    }
    JsonNode doc = new ObjectMapper().readTree(run.resolve("sites.geojson").toFile());
    Set<String> properties = new LinkedHashSet<>();
    for (JsonNode f : doc.get("features")) {
      Iterator<String> names = f.get("properties").fieldNames();
      names.forEachRemaining(properties::add);
    }
    assertTrue(properties.size() > 10, properties.toString());
    assertEquals(List.of(), missing(new ArrayList<>(properties), report), "GeoJSON properties");
  }
}
