package org.clearance.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.OptionalInt;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import org.clearance.rules.RuleProfiles;
import org.clearance.run.RunFixture;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.SurveyUnits;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * sites.gpkg read back by plain SQL and an independent blob parser, and by GDAL's ogrinfo when
 * it is installed (Debian gdal-bin; CI installs it).
 */
class GeoPackageTest {

  /** WGS 84 / UTM zone 10N: a real projected CRS in metres. */
  private static final int UTM10N = 32610;

  @TempDir Path dir;

  private Path write(SurveyUnits units, double x0, double y0) throws IOException {
    RunFixture f = new RunFixture(x0, y0, units);
    f.write(dir);
    ReportStage.run(dir, f.model(), RuleProfiles.builtin("example-utility"),
        ReportOptions.defaults(), null);
    return dir.resolve("sites.gpkg");
  }

  private static SurveyUnits utm() {
    return new SurveyUnits(LinearUnit.METRE, LinearUnit.METRE, "WGS 84 / UTM zone 10N",
        OptionalInt.of(UTM10N), "", "test");
  }

  private static Connection open(Path gpkg) throws SQLException {
    return DriverManager.getConnection("jdbc:sqlite:" + gpkg.toAbsolutePath());
  }

  private static List<Map<String, Object>> query(Connection c, String sql) throws SQLException {
    List<Map<String, Object>> out = new ArrayList<>();
    try (Statement st = c.createStatement(); ResultSet rs = st.executeQuery(sql)) {
      while (rs.next()) {
        Map<String, Object> row = new TreeMap<>();
        for (int i = 1; i <= rs.getMetaData().getColumnCount(); i++) {
          row.put(rs.getMetaData().getColumnName(i), rs.getObject(i));
        }
        out.add(row);
      }
    }
    return out;
  }

  @Test
  void requiredTablesAndPragmas() throws Exception {
    Path gpkg = write(utm(), 500000, 4100000);
    byte[] head = Files.readAllBytes(gpkg);
    // GeoPackage 1.3 req. 2: application_id "GPKG" at header offset 68, user_version 10300 at 60
    assertEquals("GPKG", new String(head, 68, 4, StandardCharsets.US_ASCII));
    assertEquals(10300, java.nio.ByteBuffer.wrap(head, 60, 4).getInt());
    try (Connection c = open(gpkg)) {
      // GeoPackage 1.3 req. 11: the srs table holds -1, 0 and 4326
      List<Map<String, Object>> srs = query(c,
          "SELECT srs_id, organization FROM gpkg_spatial_ref_sys ORDER BY srs_id");
      assertEquals(List.of(-1, 0, 4326, UTM10N),
          srs.stream().map(r -> ((Number) r.get("srs_id")).intValue()).toList());
      List<Map<String, Object>> contents = query(c,
          "SELECT table_name, data_type, srs_id FROM gpkg_contents ORDER BY table_name");
      assertEquals(List.of("conductors", "row", "sites", "spans", "structures"),
          contents.stream().map(r -> r.get("table_name")).toList());
      contents.forEach(r -> assertEquals("features", r.get("data_type")));
      contents.forEach(r -> assertEquals(UTM10N, ((Number) r.get("srs_id")).intValue()));
      List<Map<String, Object>> geom = query(c, "SELECT table_name, geometry_type_name, z, m "
          + "FROM gpkg_geometry_columns ORDER BY table_name");
      assertEquals("LINESTRING", geom.get(0).get("geometry_type_name"));
      assertEquals(1, ((Number) geom.get(0).get("z")).intValue());
      assertEquals("POLYGON", geom.get(1).get("geometry_type_name"));
      assertEquals("POINT", geom.get(2).get("geometry_type_name"));
      assertEquals(0, ((Number) geom.get(2).get("z")).intValue());
      assertEquals("LINESTRING", geom.get(3).get("geometry_type_name"));
      assertEquals("POINT", geom.get(4).get("geometry_type_name"));
      // the fixture's four structures once each, and a right-of-way rectangle per span
      assertEquals(List.of("KV-10", "KV-11", "KV-12", "KV-13"), query(c,
          "SELECT structure_id FROM structures ORDER BY fid").stream()
          .map(r -> r.get("structure_id")).toList());
      assertEquals(3, query(c, "SELECT span_id FROM row").size());
      // extent of the row layer: the line runs along grid east, 12 m either side (computed)
      Map<String, Object> rowBox = query(c, "SELECT min_y, max_y FROM gpkg_contents WHERE "
          + "table_name = 'row'").get(0);
      assertEquals(2 * RunFixture.ROW_HALF_WIDTH, ((Number) rowBox.get("max_y")).doubleValue()
          - ((Number) rowBox.get("min_y")).doubleValue(), 1e-6);
      assertEquals("ok", query(c, "PRAGMA integrity_check").get(0).values().iterator().next());
    }
  }

  @Test
  void sitesReadBackWithTheirGeometryAndAttributes() throws Exception {
    Path gpkg = write(utm(), 500000, 4100000);
    try (Connection c = open(gpkg)) {
      List<Map<String, Object>> sites = query(c, "SELECT * FROM sites ORDER BY fid");
      assertEquals(3, sites.size());
      Map<String, Object> s = sites.get(0);
      assertEquals("KV-10-11.1", s.get("site_id"));
      assertEquals("prc4293", s.get("zone"));
      assertEquals("grow-in", s.get("kind"));
      GpkgBlobReader.Blob b = GpkgBlobReader.read((byte[]) s.get("geom"));
      assertEquals(UTM10N, b.srsId());
      assertEquals(1, b.wkbType(), "2D point");
      // the fixture's clump sits at mid-span of the first span: 100 m east of the origin
      assertArrayEquals(new double[] {500100, 4100000}, b.coords(), 1e-6);
      assertArrayEquals(new double[] {500100, 500100, 4100000, 4100000}, b.envelope(), 1e-6);
      assertEquals(110.5, ((Number) s.get("z_m")).doubleValue(), 1e-9);
      assertEquals(9L, ((Number) s.get("n_points")).longValue());
      double hot = 120 - 700 * (Math.cosh(100.0 / 700) - 1); // computed, as in ReportStageTest
      assertEquals(3.048 - (hot - 110.5), ((Number) s.get("deficit_m")).doubleValue(), 1e-6);
      assertEquals(null, sites.get(2).get("n_points"), "a tree has no point count");
      assertEquals("fall-in", sites.get(2).get("zone"));
    }
  }

  @Test
  void conductorsAreThreeDimensionalAlongTheCatenary() throws Exception {
    Path gpkg = write(utm(), 500000, 4100000);
    try (Connection c = open(gpkg)) {
      List<Map<String, Object>> rows = query(c, "SELECT * FROM conductors WHERE span_id = "
          + "'KV-10-11' AND conductor = 'B2' ORDER BY fid");
      assertEquals(List.of("surveyed", "governing"), rows.stream().map(r -> r.get("state"))
          .toList());
      assertEquals("hot-75C", rows.get(1).get("condition"));
      GpkgBlobReader.Blob b = GpkgBlobReader.read((byte[]) rows.get(1).get("geom"));
      assertEquals(1002, b.wkbType(), "ISO WKB LineString Z");
      assertEquals(2, b.envelopeCode(), "envelope with z");
      double[] p = b.coords();
      int mid = p.length / 3 / 2;
      // computed: hot catenary c = 700 m at mid-span of a level 200 m span attached at 120 m
      assertEquals(120 - 700 * (Math.cosh(100.0 / 700) - 1), p[3 * mid + 2], 1e-9);
      assertEquals(500100, p[3 * mid], 1e-9);
      assertEquals(120, p[2], 1e-9);
      assertEquals(120, b.envelope()[5], 1e-9);
      List<Map<String, Object>> spans = query(c, "SELECT span_id, status, rank FROM spans "
          + "ORDER BY rank");
      assertEquals("KV-11-12", spans.get(0).get("span_id"));
      assertEquals("NOT ASSESSED", spans.get(0).get("status"));
    }
  }

  @Test
  void unknownCrsUsesTheUndefinedCartesianSrs() throws Exception {
    Path gpkg = write(SurveyUnits.metres("test"), 0, 0);
    try (Connection c = open(gpkg)) {
      assertEquals(-1, ((Number) query(c, "SELECT srs_id FROM gpkg_contents WHERE table_name "
          + "= 'sites'").get(0).get("srs_id")).intValue());
      assertEquals(-1, GpkgBlobReader.read((byte[]) query(c, "SELECT geom FROM sites").get(0)
          .get("geom")).srsId());
    }
  }

  @Test
  void surveyFeetStayInTheSurveyUnits() throws Exception {
    // NAD83 / California zone 3 (ftUS): geometry in US survey feet, the CRS's own unit
    SurveyUnits ftus = new SurveyUnits(LinearUnit.US_SURVEY_FOOT, LinearUnit.US_SURVEY_FOOT,
        "NAD83 / California zone 3 (ftUS)", OptionalInt.of(2227), "", "test");
    double ft = 1200.0 / 3937; // US survey foot in metres (NIST; check-values.md section 1)
    Path gpkg = write(ftus, 6_000_000 * ft, 2_000_000 * ft);
    try (Connection c = open(gpkg)) {
      GpkgBlobReader.Blob b = GpkgBlobReader.read((byte[]) query(c, "SELECT geom FROM sites "
          + "ORDER BY fid").get(0).get("geom"));
      assertArrayEquals(new double[] {6_000_000 + 100 / ft, 2_000_000}, b.coords(), 1e-6);
    }
  }

  @Test
  void gdalOpensIt() throws Exception {
    Path ogrinfo = Path.of("/usr/bin/ogrinfo");
    // CI installs the tool and sets CLEARANCE_REQUIRE_EXTERNAL_TOOLS: there its absence fails.
    if (System.getenv("CLEARANCE_REQUIRE_EXTERNAL_TOOLS") != null) {
      assertTrue(Files.isExecutable(ogrinfo), "ogrinfo is required in CI but not installed");
    }
    Assumptions.assumeTrue(Files.isExecutable(ogrinfo), "GDAL's ogrinfo is not installed");
    Path gpkg = write(utm(), 500000, 4100000);
    Process p = new ProcessBuilder(ogrinfo.toString(), "-ro", "-al", "-so", gpkg.toString())
        .redirectErrorStream(true).start();
    String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
    assertTrue(p.waitFor(60, TimeUnit.SECONDS));
    assertEquals(0, p.exitValue(), out);
    assertTrue(out.contains("Layer name: sites"), out);
    assertTrue(out.contains("Geometry: Point"), out);
    assertTrue(out.contains("Layer name: conductors"), out);
    assertTrue(out.contains("Geometry: 3D Line String"), out);
    assertTrue(out.contains("Feature Count: 3"), out);
    assertTrue(out.contains("UTM zone 10N"), out);
    assertTrue(!out.contains("ERROR") && !out.contains("Warning"), out);
    // GDAL reads a feature back with its geometry: the priority-1 site
    Process q = new ProcessBuilder(ogrinfo.toString(), "-ro", gpkg.toString(), "sites",
        "-where", "priority = 1").redirectErrorStream(true).start();
    String rows = new String(q.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
    assertTrue(q.waitFor(60, TimeUnit.SECONDS));
    assertTrue(rows.contains("site_id (String) = KV-10-11.1"), rows);
    assertTrue(rows.contains("POINT (500100 4100000)"), rows);
    assertTrue(out.contains("Layer name: row"), out);
    assertTrue(out.contains("Geometry: Polygon"), out);
    assertTrue(out.contains("Layer name: structures"), out);
    // the first span's right-of-way, 12 m either side of KV-10 -> KV-11 along grid east
    Process w = new ProcessBuilder(ogrinfo.toString(), "-ro", gpkg.toString(), "row",
        "-where", "span_id = 'KV-10-11'").redirectErrorStream(true).start();
    String poly = new String(w.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
    assertTrue(w.waitFor(60, TimeUnit.SECONDS));
    assertTrue(poly.contains("POLYGON ((500000 4100012,500200 4100012,500200 4099988,"
        + "500000 4099988,500000 4100012))"), poly);
  }
}
