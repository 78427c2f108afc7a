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
 * of {@code sites.csv} (lengths in the output unit, each name carrying its unit; x, y, z in the
 * survey CRS's units, named in the key); null means only "not computed":
 * {@code years_to_violation} is the string {@code never} when growth never brings the site in.
 * Written only when the survey's CRS is known, since longitude and latitude cannot be computed
 * otherwise.
 */
public final class GeoJsonSites {

  /** File name inside a run folder. */
  public static final String FILE_NAME = "sites.geojson";
  /** Decimals of degrees: RFC 7946 section 11.2 advises against more than is meaningful; 1e-7
   * degree is about a centimetre. */
  static final double DEGREE_SCALE = 1e7;

  /**
   * {@code years_to_violation} of a site the profile's growth never brings into the zone; null
   * is kept for "not computed".
   */
  static final String NEVER = "never";

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
          .put("zone", s.zone()).put("condition", s.condition())
          .put("kind", CsvOutputs.kind(s));
      p.set(u.column("min_clearance"), length(u.length(s.minClearanceM())));
      p.set(u.column("required"), length(u.length(s.requiredM())));
      p.set(u.column("deficit"), length(u.length(s.deficitM())));
      p.set("x_" + h.symbol(), length(h.fromMetres(s.x())));
      p.set("y_" + h.symbol(), length(h.fromMetres(s.y())));
      p.set("z_" + v.symbol(), length(v.fromMetres(s.z())));
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
      if (s.yearsToViolation() == Double.POSITIVE_INFINITY) {
        p.put("years_to_violation", NEVER);
      } else {
        p.set("years_to_violation", JsonFiles.number(round(s.yearsToViolation(), 100)));
      }
      p.put("conductor", s.conductor());
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
