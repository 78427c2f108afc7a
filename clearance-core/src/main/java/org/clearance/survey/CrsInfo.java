package org.clearance.survey;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * What one LAS file's coordinate system records say: the CRS, its horizontal and vertical linear
 * units and how each was found. A unit the file does not state is empty, never guessed.
 *
 * @param horizontal unit of x and y, when the file states it
 * @param vertical unit of z, when the file states it
 * @param horizontalSource how the horizontal unit was found, or why it is not known
 * @param verticalSource how the vertical unit was found, or why it is not known
 * @param name CRS name as the records give it, or an empty string
 * @param epsg EPSG code of the horizontal (projected) CRS, when stated
 * @param wkt the governing WKT text, or an empty string
 * @param records which CRS records the file carries and which of them governs
 * @param unusable non-empty when the coordinates cannot be used at all (geographic or geocentric
 *     coordinates: a projected CRS is required)
 * @param unitProblem non-empty when the file states a unit this tool cannot use (neither metre,
 *     international foot nor US survey foot)
 */
public record CrsInfo(
    Optional<LinearUnit> horizontal,
    Optional<LinearUnit> vertical,
    String horizontalSource,
    String verticalSource,
    String name,
    OptionalInt epsg,
    String wkt,
    String records,
    String unusable,
    String unitProblem) {

  public CrsInfo {
    Objects.requireNonNull(horizontal, "horizontal");
    Objects.requireNonNull(vertical, "vertical");
    Objects.requireNonNull(horizontalSource, "horizontalSource");
    Objects.requireNonNull(verticalSource, "verticalSource");
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(epsg, "epsg");
    Objects.requireNonNull(wkt, "wkt");
    Objects.requireNonNull(records, "records");
    Objects.requireNonNull(unusable, "unusable");
    Objects.requireNonNull(unitProblem, "unitProblem");
  }

  /** A file with no coordinate system records. */
  static CrsInfo none() {
    String why = "the file has no coordinate system record";
    return new CrsInfo(Optional.empty(), Optional.empty(), why, why, "", OptionalInt.empty(), "",
        "none", "", "");
  }
}
