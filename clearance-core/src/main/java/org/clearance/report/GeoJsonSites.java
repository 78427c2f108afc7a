package org.clearance.report;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.clearance.assess.CutSite;
import org.clearance.assess.RunAssessment;
import org.clearance.io.AtomicFiles;
import org.clearance.io.JsonFiles;

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
    ObjectNode doc = JsonFiles.object().put("type", "FeatureCollection");
    ArrayNode features = doc.putArray("features");
    for (CutSite s : run.sites()) {
      ObjectNode f = features.addObject().put("type", "Feature").put("id", s.siteId());
      if (Double.isFinite(s.lon()) && Double.isFinite(s.lat())) {
        f.putObject("geometry").put("type", "Point").putArray("coordinates")
            .add(round(s.lon(), DEGREE_SCALE)).add(round(s.lat(), DEGREE_SCALE));
      } else {
        f.putNull("geometry");
      }
      ObjectNode p = f.putObject("properties").put("site_id", s.siteId())
          .put("span_id", s.spanId()).put("priority", s.priority())
          .put("zone", s.zone()).put("condition", s.condition());
      p.set(u.column("min_clearance"), length(u.length(s.minClearanceM())));
      p.set(u.column("required"), length(u.length(s.requiredM())));
      p.set(u.column("deficit"), length(u.length(s.deficitM())));
      p.set("x", length(h.fromMetres(s.x())));
      p.set("y", length(h.fromMetres(s.y())));
      p.set("z", length(v.fromMetres(s.z())));
      p.set(u.column("chainage"), length(u.length(s.chainageM())));
      p.put("side", s.side().word());
      p.set(u.column("offset"), length(u.length(s.offsetM())));
      p.set(u.column("veg_height"), length(u.length(s.vegHeightM())));
      p.set(u.column("cut_to_height"), length(u.length(s.cutToHeightM())));
      if (s.points().isPresent()) {
        p.put("n_points", s.points().getAsInt());
      } else {
        p.putNull("n_points");
      }
      p.set(u.areaColumn(), JsonFiles.number(round(u.area(s.areaM2()), 100)));
      p.set("years_to_violation", JsonFiles.number(round(s.yearsToViolation(), 100)));
    }
    return JsonFiles.write(doc) + "\n";
  }

  /** A length to millimetres, or null when not computed. */
  private static JsonNode length(double v) {
    return JsonFiles.number(round(v, 1000));
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

  /** Rounded to 1 / scale; NaN and infinities unchanged (written as null). */
  private static double round(double v, double scale) {
    return Double.isFinite(v) ? Math.round(v * scale) / scale : v;
  }
}
