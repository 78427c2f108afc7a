package org.clearance.survey;

import java.util.Optional;
import java.util.OptionalInt;

/**
 * What one kind of CRS record (the WKT record or the GeoTIFF keys) states; {@link CrsReader}
 * combines the two by the global encoding's WKT bit.
 *
 * @param horizontal unit of x and y, when stated and supported
 * @param horizontalSource how it was found, or why not
 * @param vertical unit of z, when stated and supported
 * @param verticalSource how it was found, or why not
 * @param name CRS name, or an empty string
 * @param epsg EPSG code of the projected CRS, when stated
 * @param unusable non-empty for geographic or geocentric coordinates
 * @param unitProblem non-empty when a stated unit is not supported
 */
record CrsStatement(
    Optional<LinearUnit> horizontal,
    String horizontalSource,
    Optional<LinearUnit> vertical,
    String verticalSource,
    String name,
    OptionalInt epsg,
    String unusable,
    String unitProblem) {

  /** A record that states nothing usable, for the given reason. */
  static CrsStatement nothing(String why) {
    return new CrsStatement(Optional.empty(), why, Optional.empty(), why, "",
        OptionalInt.empty(), "", "");
  }

  /** Joins two problem texts. */
  static String join(String a, String b) {
    return a.isEmpty() ? b : b.isEmpty() ? a : a + "; " + b;
  }
}
