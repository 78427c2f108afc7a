package org.clearance.survey;

import java.util.Objects;
import java.util.OptionalInt;

/**
 * The linear units and coordinate reference system of a survey, and how they were determined.
 *
 * @param horizontal unit of x and y in the files
 * @param vertical unit of z in the files
 * @param crsName human-readable CRS name, or an empty string when the files do not say
 * @param epsg EPSG code of the horizontal (projected) CRS when known
 * @param wkt OGC WKT of the CRS when the files carry it, else an empty string
 * @param source how the units were determined, e.g. {@code "WKT record 2112"},
 *     {@code "GeoTIFF ProjLinearUnitsGeoKey"}, {@code "EPSG:2949 via proj4j"},
 *     {@code "option --survey-units"}
 */
public record SurveyUnits(
    LinearUnit horizontal,
    LinearUnit vertical,
    String crsName,
    OptionalInt epsg,
    String wkt,
    String source) {

  public SurveyUnits {
    Objects.requireNonNull(horizontal, "horizontal");
    Objects.requireNonNull(vertical, "vertical");
    Objects.requireNonNull(crsName, "crsName");
    Objects.requireNonNull(epsg, "epsg");
    Objects.requireNonNull(wkt, "wkt");
    Objects.requireNonNull(source, "source");
  }

  /** Metric units with no CRS; for generated data and tests. */
  public static SurveyUnits metres(String source) {
    return new SurveyUnits(LinearUnit.METRE, LinearUnit.METRE, "", OptionalInt.empty(), "", source);
  }
}
