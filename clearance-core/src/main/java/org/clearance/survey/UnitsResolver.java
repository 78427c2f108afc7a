package org.clearance.survey;

import java.util.List;
import java.util.Optional;
import org.clearance.InputException;

/**
 * Decides the units of a survey from what its files state and what the user chose (see
 * {@link UnitsChoice}); all tiles must agree.
 */
final class UnitsResolver {
  /** The units of a survey; empty where neither the files nor the user say. */
  record Resolved(
      Optional<LinearUnit> horizontal,
      Optional<LinearUnit> vertical,
      String horizontalSource,
      String verticalSource,
      CrsInfo crs) {

    /** A one-line account of where both units came from. */
    String source() {
      return "horizontal: " + horizontalSource + "; vertical: " + verticalSource;
    }

    SurveyUnits toSurveyUnits() {
      return new SurveyUnits(horizontal.orElseThrow(), vertical.orElseThrow(), crs.name(),
          crs.epsg(), crs.wkt(), source());
    }
  }

  private UnitsResolver() {}

  /**
   * Resolves the units of all files.
   *
   * @param requireKnown when true, a unit that stays unknown is an error
   * @throws InputException for geographic coordinates, unsupported or conflicting units, tiles
   *     that disagree, or (with {@code requireKnown}) units nobody states
   */
  static Resolved resolve(List<LasFile> files, UnitsChoice choice, boolean requireKnown) {
    Resolved first = null;
    LasFile firstFile = null;
    for (LasFile f : files) {
      Resolved r = resolveOne(f, choice, requireKnown);
      if (first == null) {
        first = r;
        firstFile = f;
        continue;
      }
      checkSame(f, firstFile, "horizontal unit", r.horizontal(), first.horizontal(),
          r.horizontalSource(), first.horizontalSource());
      checkSame(f, firstFile, "vertical unit", r.vertical(), first.vertical(),
          r.verticalSource(), first.verticalSource());
      if (r.crs().epsg().isPresent() && first.crs().epsg().isPresent()
          && r.crs().epsg().getAsInt() != first.crs().epsg().getAsInt()) {
        throw new InputException(f.path(), "CRS", "EPSG code", "EPSG:"
            + r.crs().epsg().getAsInt() + " differs from EPSG:" + first.crs().epsg().getAsInt()
            + " of " + firstFile.path() + "; all tiles of a survey must share one CRS");
      }
    }
    if (first == null) {
      throw new IllegalArgumentException("no files");
    }
    return first;
  }

  private static void checkSame(LasFile f, LasFile firstFile, String field,
      Optional<LinearUnit> unit, Optional<LinearUnit> firstUnit, String source,
      String firstSource) {
    if (!unit.equals(firstUnit)) {
      throw new InputException(f.path(), null, field, "this tile uses " + name(unit) + " ("
          + source + ") but " + firstFile.path() + " uses " + name(firstUnit) + " ("
          + firstSource + "); all tiles of a survey must use the same units");
    }
  }

  private static Resolved resolveOne(LasFile f, UnitsChoice choice, boolean requireKnown) {
    CrsInfo crs = f.crs();
    if (!crs.unusable().isEmpty()) {
      throw new InputException(f.path(), "CRS", "coordinate system", crs.unusable()
          + "; a projected CRS in metres or feet is needed: reproject the survey first");
    }
    if (!crs.unitProblem().isEmpty() && !choice.overrideFile()) {
      throw new InputException(f.path(), "CRS", "linear unit", crs.unitProblem() + "; to use"
          + " another unit give " + UnitsChoice.UNITS_OPTION + " " + UnitsChoice.UNIT_VALUES
          + " with " + UnitsChoice.OVERRIDE_OPTION);
    }
    Axis h = axis(f, "horizontal unit", crs.horizontal(), crs.horizontalSource(),
        choice.horizontal(), choice.overrideFile());
    Axis v = axis(f, "vertical unit", crs.vertical(), crs.verticalSource(), choice.vertical(),
        choice.overrideFile());
    if (v.unit.isEmpty() && choice.verticalFollowsHorizontal() && h.unit.isPresent()) {
      v = new Axis(h.unit, "same as horizontal (" + UnitsChoice.FOLLOW_OPTION + ")");
    }
    if (requireKnown && h.unit.isEmpty()) {
      throw new InputException(f.path(), null, "horizontal unit", "the file does not state"
          + " its horizontal unit (" + h.source + "); give " + UnitsChoice.UNITS_OPTION + " "
          + UnitsChoice.UNIT_VALUES + " or " + UnitsChoice.HORIZONTAL_OPTION + " "
          + UnitsChoice.UNIT_VALUES);
    }
    if (requireKnown && v.unit.isEmpty()) {
      throw new InputException(f.path(), null, "vertical unit", "the file does not state its"
          + " vertical unit (" + v.source + "); give " + UnitsChoice.VERTICAL_OPTION + " "
          + UnitsChoice.UNIT_VALUES + ", " + UnitsChoice.FOLLOW_OPTION + " or "
          + UnitsChoice.UNITS_OPTION + " " + UnitsChoice.UNIT_VALUES);
    }
    return new Resolved(h.unit, v.unit, h.source, v.source, crs);
  }

  private record Axis(Optional<LinearUnit> unit, String source) {}

  private static Axis axis(LasFile f, String field, Optional<LinearUnit> stated,
      String statedSource, Optional<LinearUnit> given, boolean override) {
    if (given.isEmpty()) {
      return new Axis(stated, statedSource);
    }
    if (stated.isEmpty()) {
      return new Axis(given, "given by option");
    }
    if (stated.equals(given)) {
      return new Axis(stated, statedSource);
    }
    if (!override) {
      throw new InputException(f.path(), "CRS", field, "the file states " + name(stated) + " ("
          + statedSource + ") but the option gives " + name(given) + "; drop the option or add "
          + UnitsChoice.OVERRIDE_OPTION);
    }
    return new Axis(given, "given by option, replacing " + name(stated) + " stated by "
        + statedSource + " (" + UnitsChoice.OVERRIDE_OPTION + ")");
  }

  private static String name(Optional<LinearUnit> unit) {
    return unit.map(UnitsResolver::name).orElse("no stated unit");
  }

  /** Plain name of a unit for messages. */
  static String name(LinearUnit unit) {
    switch (unit) {
      case METRE:
        return "metre";
      case FOOT:
        return "international foot";
      default:
        return "US survey foot";
    }
  }
}
