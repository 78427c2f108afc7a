package org.clearance.survey;

import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * Reads the units and EPSG code of a CRS given as OGC well-known text.
 *
 * <p>WKT1 (OGC 01-009 section 7): the {@code UNIT} of a {@code PROJCS} or {@code LOCAL_CS}, and of
 * a {@code VERT_CS} inside a {@code COMPD_CS}; codes from {@code AUTHORITY["EPSG","n"]}. WKT2 (OGC
 * 18-010r7): the {@code LENGTHUNIT} of a {@code PROJCRS} or {@code ENGCRS} (given once for the CRS
 * or on its {@code AXIS} elements), of a {@code VERTCRS} inside a {@code COMPOUNDCRS}; a
 * {@code BOUNDCRS} is read through its source CRS; codes from {@code ID["EPSG",n]}. Only direct
 * children are read: the angular unit of the base geographic CRS and the units of projection
 * parameters are not the CRS's unit. A projected CRS without a unit but with an EPSG code takes
 * its unit from proj4j's EPSG database.
 */
final class WktCrs {
  private static final String[] PROJECTED = {"PROJCS", "PROJCRS", "PROJECTEDCRS"};
  private static final String[] LOCAL = {"LOCAL_CS", "ENGCRS", "ENGINEERINGCRS"};
  private static final String[] GEOGRAPHIC = {
    "GEOGCS", "GEOGCRS", "GEOGRAPHICCRS", "GEODCRS", "GEODETICCRS", "GEOCCS"
  };
  private static final String[] VERTICAL = {"VERT_CS", "VERTCRS", "VERTICALCRS"};
  private static final String[] COMPOUND = {"COMPD_CS", "COMPOUNDCRS"};
  private static final String[] UNIT = {"UNIT", "LENGTHUNIT"};
  private static final String[] CODE = {"AUTHORITY", "ID"};

  private WktCrs() {}

  /** What the WKT text states; never throws for bad text (the statement says why). */
  static CrsStatement read(String text) {
    String record = "WKT record " + Vlr.WKT_RECORD;
    if (text.indexOf('[') < 0 && text.indexOf('(') < 0) {
      return CrsStatement.nothing(record + " holds no CRS definition");
    }
    WktNode root;
    try {
      root = WktNode.parse(text);
    } catch (IllegalArgumentException e) {
      return CrsStatement.nothing(record + " could not be read (" + e.getMessage() + ")");
    }
    root = unwrapBound(root);
    WktNode horizontal = null;
    WktNode vertical = null;
    if (is(root, COMPOUND)) {
      for (WktNode c : root.children()) {
        WktNode part = unwrapBound(c);
        if (horizontal == null && (is(part, PROJECTED) || is(part, LOCAL)
            || is(part, GEOGRAPHIC))) {
          horizontal = part;
        } else if (vertical == null && is(part, VERTICAL)) {
          vertical = part;
        }
      }
    } else if (is(root, VERTICAL)) {
      vertical = root;
    } else {
      horizontal = root;
    }
    String name = root.value(0);
    String unusable = "";
    String problem = "";
    Optional<LinearUnit> h = Optional.empty();
    String hSource;
    OptionalInt epsg = OptionalInt.empty();
    if (horizontal == null) {
      hSource = record + " has no horizontal CRS";
    } else if (is(horizontal, GEOGRAPHIC)) {
      boolean cartesian = horizontal.keyword().equals("GEOCCS") || horizontal.child("CS")
          .map(cs -> cs.value(0).equalsIgnoreCase("Cartesian")).orElse(false);
      unusable = record + " gives " + (cartesian ? "geocentric" : "geographic (longitude,"
          + " latitude)") + " coordinates in '" + horizontal.value(0) + "'";
      hSource = unusable;
    } else if (is(horizontal, PROJECTED) || is(horizontal, LOCAL)) {
      epsg = is(horizontal, PROJECTED) ? epsgOf(horizontal) : OptionalInt.empty();
      Optional<WktNode> unitNode = unitOf(horizontal);
      String where = record + " (" + horizontal.keyword() + " unit)";
      if (unitNode.isPresent()) {
        h = linear(unitNode.get());
        hSource = where;
        if (h.isEmpty()) {
          problem = "horizontal " + describe(unitNode.get()) + " in " + where;
        }
      } else if (epsg.isPresent()) {
        EpsgUnits.Lookup lookup = EpsgUnits.of(epsg.getAsInt());
        h = lookup.unit();
        hSource = "EPSG:" + epsg.getAsInt() + " via proj4j (" + record + " gives no unit)";
        if (lookup.geographic()) {
          unusable = record + " names geographic CRS EPSG:" + epsg.getAsInt();
        } else if (h.isEmpty()) {
          hSource = record + " gives no unit and " + lookup.note();
        }
      } else {
        hSource = record + " gives no unit for " + horizontal.keyword();
      }
    } else {
      hSource = record + " starts with " + horizontal.keyword() + ", not a projected CRS";
    }
    Optional<LinearUnit> v = Optional.empty();
    String vSource;
    if (vertical == null) {
      vSource = record + " has no vertical CRS";
    } else {
      Optional<WktNode> unitNode = unitOf(vertical);
      String where = record + " (" + vertical.keyword() + " unit)";
      if (unitNode.isPresent()) {
        v = linear(unitNode.get());
        vSource = where;
        if (v.isEmpty()) {
          problem = CrsStatement.join(problem,
              "vertical " + describe(unitNode.get()) + " in " + where);
        }
      } else {
        vSource = record + " gives no unit for " + vertical.keyword();
      }
    }
    if (horizontal != null && !is(root, COMPOUND)) {
      name = horizontal.value(0);
    }
    return new CrsStatement(h, hSource, v, vSource, name, epsg, unusable, problem);
  }

  private static WktNode unwrapBound(WktNode node) {
    if (node.keyword().equals("BOUNDCRS")) {
      Optional<WktNode> source = node.child("SOURCECRS");
      if (source.isPresent() && !source.get().children().isEmpty()) {
        return source.get().children().get(0);
      }
    }
    return node;
  }

  /** The CRS's own length unit: a direct UNIT/LENGTHUNIT, else the one on its first axis. */
  private static Optional<WktNode> unitOf(WktNode crs) {
    Optional<WktNode> direct = crs.child(UNIT);
    if (direct.isPresent()) {
      return direct;
    }
    List<WktNode> axes = crs.all("AXIS");
    for (WktNode axis : axes) {
      Optional<WktNode> u = axis.child(UNIT);
      if (u.isPresent()) {
        return u;
      }
    }
    return Optional.empty();
  }

  /** The unit a UNIT/LENGTHUNIT element defines: by its EPSG code, else by its length. */
  static Optional<LinearUnit> linear(WktNode unit) {
    OptionalInt code = epsgOf(unit);
    if (code.isPresent()) {
      Optional<LinearUnit> byCode = LinearUnit.fromEpsgCode(code.getAsInt());
      if (byCode.isPresent()) {
        return byCode;
      }
    }
    try {
      return Units.byFactor(Double.parseDouble(unit.value(1)));
    } catch (NumberFormatException e) {
      return Optional.empty();
    }
  }

  private static String describe(WktNode unit) {
    return "unit '" + unit.value(0) + "' (" + unit.value(1)
        + " m) is not metre, international foot or US survey foot";
  }

  /** The EPSG code in a direct AUTHORITY or ID child. */
  static OptionalInt epsgOf(WktNode node) {
    for (WktNode id : node.all(CODE)) {
      if (id.value(0).equalsIgnoreCase("EPSG")) {
        try {
          return OptionalInt.of(Integer.parseInt(id.value(1).trim()));
        } catch (NumberFormatException e) {
          return OptionalInt.empty();
        }
      }
    }
    return OptionalInt.empty();
  }

  private static boolean is(WktNode node, String[] keywords) {
    for (String k : keywords) {
      if (node.keyword().equals(k)) {
        return true;
      }
    }
    return false;
  }
}
