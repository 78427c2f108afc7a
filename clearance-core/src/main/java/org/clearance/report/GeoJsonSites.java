package org.clearance.report;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.clearance.assess.CutSite;
import org.clearance.assess.RunAssessment;
import org.clearance.io.AtomicFiles;
import org.clearance.io.JsonWriter;

/**
 * Writes {@code sites.geojson}: one Point feature per site in WGS84 longitude and latitude, as
 * RFC 7946 requires (section 4: no other CRS; coordinates longitude first). Properties are those
 * of the work list (lengths in the output unit, each name carrying its unit; x, y, z in the survey
 * CRS's units); a value not computed is null, and so is {@code years_to_violation} when growth
 * never brings the site in (the work list writes {@code never} there). Written only when the
 * survey's CRS is known, since longitude and latitude cannot be computed otherwise.
 */
public final class GeoJsonSites {

  /** File name inside a run folder. */
  public static final String FILE_NAME = "sites.geojson";
  /** Decimals of degrees: RFC 7946 section 11.2 advises against more than is meaningful; 1e-7
   * degree is about a centimetre. */
  static final double DEGREE_SCALE = 1e7;

  private GeoJsonSites() {}

  /** The FeatureCollection's text. */
  public static String text(RunAssessment run, ReportOptions options) {
    OutputUnit u = new OutputUnit(options.outputUnit());
    var h = run.model().units().horizontal();
    var v = run.model().units().vertical();
    JsonWriter w = new JsonWriter().beginObject().member("type", "FeatureCollection");
    w.name("features").beginArray();
    for (CutSite s : run.sites()) {
      w.beginObject().member("type", "Feature").member("id", s.siteId());
      w.name("geometry");
      if (Double.isFinite(s.lon()) && Double.isFinite(s.lat())) {
        w.beginObject().member("type", "Point").name("coordinates").beginArray()
            .value(round(s.lon(), DEGREE_SCALE)).value(round(s.lat(), DEGREE_SCALE))
            .endArray().endObject();
      } else {
        w.value((String) null);
      }
      w.name("properties").beginObject().member("site_id", s.siteId())
          .member("span_id", s.spanId()).member("priority", s.priority())
          .member("zone", s.zone()).member("condition", s.condition())
          .member(u.column("min_clearance"), round(u.length(s.minClearanceM())))
          .member(u.column("required"), round(u.length(s.requiredM())))
          .member(u.column("deficit"), round(u.length(s.deficitM())))
          .member("x", round(h.fromMetres(s.x()))).member("y", round(h.fromMetres(s.y())))
          .member("z", round(v.fromMetres(s.z())))
          .member(u.column("chainage"), round(u.length(s.chainageM())))
          .member("side", s.side().word())
          .member(u.column("offset"), round(u.length(s.offsetM())))
          .member(u.column("veg_height"), round(u.length(s.vegHeightM())))
          .member(u.column("cut_to_height"), round(u.length(s.cutToHeightM())));
      w.name("n_points");
      if (s.points().isPresent()) {
        w.value(s.points().getAsInt());
      } else {
        w.value((String) null);
      }
      w.member(u.areaColumn(), round(u.area(s.areaM2()), 100))
          .member("years_to_violation", round(s.yearsToViolation(), 100))
          .endObject().endObject();
    }
    w.endArray();
    return w.endObject().toString() + "\n";
  }

  /**
   * Writes the file when longitude and latitude are known; otherwise removes any earlier copy
   * and returns false.
   */
  public static boolean write(Path runDir, RunAssessment run, ReportOptions options)
      throws IOException {
    Path target = runDir.resolve(FILE_NAME);
    if (!run.lonLatKnown()) {
      Files.deleteIfExists(target);
      return false;
    }
    AtomicFiles.writeString(target, text(run, options));
    return true;
  }

  /** Millimetres: lengths to 3 decimals. */
  private static double round(double v) {
    return round(v, 1000);
  }

  /** Rounded to 1 / scale; NaN and infinities unchanged (written as null). */
  private static double round(double v, double scale) {
    return Double.isFinite(v) ? Math.round(v * scale) / scale : v;
  }
}
