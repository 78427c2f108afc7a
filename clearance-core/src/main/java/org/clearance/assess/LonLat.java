package org.clearance.assess;

import java.util.Objects;
import java.util.Optional;
import org.clearance.survey.SurveyUnits;
import org.locationtech.proj4j.CRSFactory;
import org.locationtech.proj4j.CoordinateReferenceSystem;
import org.locationtech.proj4j.CoordinateTransform;
import org.locationtech.proj4j.CoordinateTransformFactory;
import org.locationtech.proj4j.ProjCoordinate;
import org.locationtech.proj4j.proj.LongLatProjection;

/**
 * Longitude and latitude (WGS84, EPSG:4326, degrees) of survey positions, through proj4j from
 * the survey's projected CRS (its EPSG code). Positions are given in metres, as stored in the run
 * model, and converted back to the CRS's own unit before the projection is inverted. Not safe to
 * share between threads (proj4j transforms keep state).
 */
public final class LonLat {

  private final CoordinateTransform transform;
  private final double unitMetres;
  private final int epsg;

  private LonLat(CoordinateTransform transform, double unitMetres, int epsg) {
    this.transform = transform;
    this.unitMetres = unitMetres;
    this.epsg = epsg;
  }

  /** What {@link #forUnits} found: a transform, or why there is none. */
  public record Lookup(Optional<LonLat> transform, String note) {
    public Lookup {
      Objects.requireNonNull(transform, "transform");
      Objects.requireNonNull(note, "note");
    }
  }

  /**
   * The transform for a survey's CRS.
   *
   * @param units the survey's units and CRS
   * @return the transform, or empty with the reason when the CRS has no EPSG code, proj4j does
   *     not know it, or it is not a projected CRS
   */
  public static Lookup forUnits(SurveyUnits units) {
    if (units.epsg().isEmpty()) {
      return new Lookup(Optional.empty(), "the survey's CRS has no EPSG code");
    }
    int code = units.epsg().getAsInt();
    CRSFactory factory = new CRSFactory();
    CoordinateReferenceSystem src;
    try {
      src = factory.createFromName("EPSG:" + code);
    } catch (RuntimeException e) {
      // proj4j reports unknown codes and unparsable definitions with several runtime exceptions.
      return new Lookup(Optional.empty(), "EPSG:" + code + " is not in proj4j's EPSG database");
    }
    if (src.getProjection() instanceof LongLatProjection) {
      return new Lookup(Optional.empty(), "EPSG:" + code + " is not a projected CRS");
    }
    CoordinateReferenceSystem wgs84 = factory.createFromName("EPSG:4326");
    CoordinateTransform t = new CoordinateTransformFactory().createTransform(src, wgs84);
    return new Lookup(Optional.of(new LonLat(t, units.horizontal().metres(), code)),
        "EPSG:" + code + " to EPSG:4326 via proj4j");
  }

  /** The EPSG code of the source CRS. */
  public int epsg() {
    return epsg;
  }

  /**
   * Longitude and latitude of a position.
   *
   * @param xM easting, m (survey CRS scaled to metres)
   * @param yM northing, m
   * @return {longitude, latitude} in degrees, or {NaN, NaN} when the position is not finite or
   *     proj4j cannot invert it
   */
  public double[] of(double xM, double yM) {
    if (!(Double.isFinite(xM) && Double.isFinite(yM))) {
      return new double[] {Double.NaN, Double.NaN};
    }
    ProjCoordinate out = new ProjCoordinate();
    try {
      transform.transform(new ProjCoordinate(xM / unitMetres, yM / unitMetres), out);
    } catch (RuntimeException e) {
      // a position outside the projection's domain: not computed, never a guess
      return new double[] {Double.NaN, Double.NaN};
    }
    return new double[] {out.x, out.y};
  }
}
