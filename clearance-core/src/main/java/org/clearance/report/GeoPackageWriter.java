package org.clearance.report;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.sql.Statement;
import java.sql.Types;
import java.util.ArrayList;
import java.util.List;
import org.clearance.assess.RunAssessment;
import org.clearance.io.AtomicFiles;
import org.clearance.survey.SurveyUnits;

/**
 * Writes {@code sites.gpkg}, an OGC GeoPackage 1.3 (OGC 12-128r18) through sqlite-jdbc, with
 * three feature layers in the survey CRS: {@code sites} (points), {@code spans} (lines from
 * structure to structure) and {@code conductors} (3D lines along each conductor, surveyed and in
 * the span's governing condition). The tables the standard requires are written here:
 * {@code gpkg_spatial_ref_sys} (with its three required rows), {@code gpkg_contents},
 * {@code gpkg_geometry_columns}, the {@code application_id} ("GPKG") and {@code user_version}
 * (10300) pragmas; geometries are {@link GpkgGeometry StandardGeoPackageBinary} blobs with an
 * envelope. The CRS is the survey's EPSG code (definition: its WKT when the files carry it) or,
 * when the survey names none, the undefined Cartesian SRS (-1).
 */
public final class GeoPackageWriter {

  /** File name inside a run folder. */
  public static final String FILE_NAME = "sites.gpkg";
  /** {@code PRAGMA application_id}: the ASCII bytes "GPKG" (GeoPackage 1.3 requirement 2). */
  public static final int APPLICATION_ID = 0x47504B47;
  /** {@code PRAGMA user_version} of GeoPackage 1.3.0 (requirement 2). */
  public static final int USER_VERSION = 10300;
  /**
   * {@code gpkg_contents.last_change} of every layer: a fixed time, so that the same inputs give
   * the same bytes (issue 10, item 11); when the run happened is in run.json.
   */
  static final String LAST_CHANGE = "1970-01-01T00:00:00.000Z";
  /** srs_id used for a survey CRS known only by its WKT (any id above the EPSG range). */
  static final int CUSTOM_SRS_ID = 100000;

  /** WKT of WGS 84, the required EPSG:4326 row (GeoPackage 1.3 table 6 requires the row). */
  private static final String WGS84_WKT = "GEOGCS[\"WGS 84\",DATUM[\"WGS_1984\","
      + "SPHEROID[\"WGS 84\",6378137,298.257223563,AUTHORITY[\"EPSG\",\"7030\"]],"
      + "AUTHORITY[\"EPSG\",\"6326\"]],PRIMEM[\"Greenwich\",0,AUTHORITY[\"EPSG\",\"8901\"]],"
      + "UNIT[\"degree\",0.0174532925199433,AUTHORITY[\"EPSG\",\"9122\"]],"
      + "AUTHORITY[\"EPSG\",\"4326\"]]";

  private GeoPackageWriter() {}

  /** One column of a feature table. */
  record Column(String name, String sqlType) {}

  /** One feature: its geometry blob and attribute values (String, Long, Double or null). */
  record Feature(byte[] geometry, List<Object> values) {}

  /** A feature layer. */
  record Layer(String table, String description, String geometryType, boolean z,
      List<Column> columns, List<Feature> features, double[] extent) {}

  /** The srs_id a survey's geometries carry. */
  static int srsId(SurveyUnits u) {
    if (u.epsg().isPresent()) {
      return u.epsg().getAsInt();
    }
    return u.wkt().isEmpty() ? -1 : CUSTOM_SRS_ID;
  }

  /**
   * Writes the GeoPackage into a run folder: built in a temporary file, then moved into place
   * through {@link AtomicFiles}.
   */
  public static void write(Path runDir, RunAssessment run, ReportOptions options)
      throws IOException {
    List<Layer> layers = GpkgLayers.of(run, options, srsId(run.model().units()));
    Path target = runDir.resolve(FILE_NAME);
    Path temp = Files.createTempFile(runDir, ".sites", ".gpkg.part");
    try {
      Files.delete(temp); // SQLite creates the file itself
      writeDatabase(temp, run.model().units(), layers);
      AtomicFiles.write(target, out -> Files.copy(temp, out));
    } catch (SQLException e) {
      throw new IOException("cannot write " + target + ": " + e.getMessage(), e);
    } finally {
      Files.deleteIfExists(temp);
      Files.deleteIfExists(Path.of(temp + "-journal"));
    }
  }

  private static void writeDatabase(Path file, SurveyUnits units, List<Layer> layers)
      throws SQLException {
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath())) {
      try (Statement st = c.createStatement()) {
        st.execute("PRAGMA application_id = " + APPLICATION_ID);
        st.execute("PRAGMA user_version = " + USER_VERSION);
      }
      c.setAutoCommit(false);
      try (Statement st = c.createStatement()) {
        st.execute("CREATE TABLE gpkg_spatial_ref_sys (srs_name TEXT NOT NULL, "
            + "srs_id INTEGER PRIMARY KEY, organization TEXT NOT NULL, "
            + "organization_coordsys_id INTEGER NOT NULL, definition TEXT NOT NULL, "
            + "description TEXT)");
        st.execute("CREATE TABLE gpkg_contents (table_name TEXT NOT NULL PRIMARY KEY, "
            + "data_type TEXT NOT NULL, identifier TEXT UNIQUE, description TEXT DEFAULT '', "
            + "last_change DATETIME NOT NULL DEFAULT (strftime('%Y-%m-%dT%H:%M:%fZ','now')), "
            + "min_x DOUBLE, min_y DOUBLE, max_x DOUBLE, max_y DOUBLE, srs_id INTEGER, "
            + "CONSTRAINT fk_gc_r_srs_id FOREIGN KEY (srs_id) "
            + "REFERENCES gpkg_spatial_ref_sys(srs_id))");
        st.execute("CREATE TABLE gpkg_geometry_columns (table_name TEXT NOT NULL, "
            + "column_name TEXT NOT NULL, geometry_type_name TEXT NOT NULL, "
            + "srs_id INTEGER NOT NULL, z TINYINT NOT NULL, m TINYINT NOT NULL, "
            + "CONSTRAINT pk_geom_cols PRIMARY KEY (table_name, column_name), "
            + "CONSTRAINT uk_gc_table_name UNIQUE (table_name), "
            + "CONSTRAINT fk_gc_tn FOREIGN KEY (table_name) REFERENCES gpkg_contents(table_name), "
            + "CONSTRAINT fk_gc_srs FOREIGN KEY (srs_id) "
            + "REFERENCES gpkg_spatial_ref_sys (srs_id))");
      }
      insertSrs(c, "Undefined cartesian SRS", -1, "NONE", -1, "undefined",
          "undefined cartesian coordinate reference system");
      insertSrs(c, "Undefined geographic SRS", 0, "NONE", 0, "undefined",
          "undefined geographic coordinate reference system");
      insertSrs(c, "WGS 84 geodetic", 4326, "EPSG", 4326, WGS84_WKT,
          "longitude/latitude coordinates in decimal degrees on the WGS 84 spheroid");
      int srs = srsId(units);
      if (srs != -1 && srs != 4326) {
        String name = units.crsName().isEmpty() ? "survey CRS" : units.crsName();
        insertSrs(c, name, srs, srs == CUSTOM_SRS_ID ? "NONE" : "EPSG", srs,
            units.wkt().isEmpty() ? "undefined" : units.wkt(), "the survey's CRS ("
                + units.source() + ")");
      }
      for (Layer layer : layers) {
        writeLayer(c, layer, srs);
      }
      c.commit();
    }
  }

  private static void insertSrs(Connection c, String name, int id, String org, int orgId,
      String definition, String description) throws SQLException {
    try (PreparedStatement ps = c.prepareStatement("INSERT INTO gpkg_spatial_ref_sys "
        + "(srs_name, srs_id, organization, organization_coordsys_id, definition, description) "
        + "VALUES (?, ?, ?, ?, ?, ?)")) {
      ps.setString(1, name);
      ps.setInt(2, id);
      ps.setString(3, org);
      ps.setInt(4, orgId);
      ps.setString(5, definition);
      ps.setString(6, description);
      ps.executeUpdate();
    }
  }

  private static void writeLayer(Connection c, Layer layer, int srs) throws SQLException {
    StringBuilder ddl = new StringBuilder("CREATE TABLE \"" + layer.table()
        + "\" (fid INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL, geom " + layer.geometryType());
    List<String> names = new ArrayList<>();
    for (Column col : layer.columns()) {
      ddl.append(", \"").append(col.name()).append("\" ").append(col.sqlType());
      names.add('"' + col.name() + '"');
    }
    try (Statement st = c.createStatement()) {
      st.execute(ddl.append(')').toString());
    }
    try (PreparedStatement ps = c.prepareStatement("INSERT INTO gpkg_contents (table_name, "
        + "data_type, identifier, description, min_x, min_y, max_x, max_y, srs_id, last_change) "
        + "VALUES (?, 'features', ?, ?, ?, ?, ?, ?, ?, '" + LAST_CHANGE + "')")) {
      ps.setString(1, layer.table());
      ps.setString(2, layer.table());
      ps.setString(3, layer.description());
      for (int k = 0; k < 4; k++) {
        setDouble(ps, 4 + k, layer.extent()[k]);
      }
      ps.setInt(8, srs);
      ps.executeUpdate();
    }
    try (PreparedStatement ps = c.prepareStatement("INSERT INTO gpkg_geometry_columns "
        + "(table_name, column_name, geometry_type_name, srs_id, z, m) "
        + "VALUES (?, 'geom', ?, ?, ?, 0)")) {
      ps.setString(1, layer.table());
      ps.setString(2, layer.geometryType());
      ps.setInt(3, srs);
      ps.setInt(4, layer.z() ? 1 : 0);
      ps.executeUpdate();
    }
    String marks = "?" + ", ?".repeat(names.size());
    try (PreparedStatement ps = c.prepareStatement("INSERT INTO \"" + layer.table()
        + "\" (geom, " + String.join(", ", names) + ") VALUES (" + marks + ")")) {
      for (Feature f : layer.features()) {
        ps.setBytes(1, f.geometry());
        for (int i = 0; i < f.values().size(); i++) {
          Object v = f.values().get(i);
          if (v == null) {
            ps.setNull(i + 2, Types.NULL);
          } else if (v instanceof Double d) {
            setDouble(ps, i + 2, d);
          } else if (v instanceof Long n) {
            ps.setLong(i + 2, n);
          } else {
            ps.setString(i + 2, v.toString());
          }
        }
        ps.addBatch();
      }
      ps.executeBatch();
    }
  }

  /** A double (an infinite one as SQLite's infinity), or NULL when not computed (NaN). */
  private static void setDouble(PreparedStatement ps, int index, double v) throws SQLException {
    if (!Double.isNaN(v)) {
      ps.setDouble(index, v);
    } else {
      ps.setNull(index, Types.DOUBLE);
    }
  }
}
