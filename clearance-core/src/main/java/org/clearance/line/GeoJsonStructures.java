package org.clearance.line;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.clearance.InputException;
import org.clearance.io.Json;
import org.clearance.line.StructureReader.Field;
import org.clearance.line.StructureReader.RawRecord;

/**
 * Turns a GeoJSON FeatureCollection of Point features (RFC 7946) into structure records: x and y
 * from the point's first two coordinates (a third is not used), the other columns from the
 * feature's properties. Foreign members (RFC 7946 section 6.1, e.g. a legacy {@code crs}) are
 * allowed and not used; properties are checked as strictly as CSV columns.
 */
final class GeoJsonStructures {

  private GeoJsonStructures() {}

  /**
   * The records of all features, in file order.
   *
   * @throws InputException naming file, line and member for anything that is not a point feature
   *     with our properties
   */
  static List<RawRecord> records(Json.Value doc, String file) {
    Json.Obj root = object(doc, file, "the document");
    String type = string(member(root, "type", file), file, "type");
    if (!type.equals("FeatureCollection")) {
      throw new InputException(file, "line " + root.line(), "type",
          "expected a GeoJSON FeatureCollection, found type '" + type + "'");
    }
    Json.Value features = member(root, "features", file);
    if (!(features instanceof Json.Arr arr)) {
      throw new InputException(file, "line " + features.line(), "features",
          "expected an array of features, found " + features.kind());
    }
    List<RawRecord> out = new ArrayList<>();
    for (Json.Value f : arr.items()) {
      out.add(feature(f, file));
    }
    return out;
  }

  private static RawRecord feature(Json.Value value, String file) {
    Json.Obj feature = object(value, file, "a feature");
    String type = string(member(feature, "type", file), file, "type");
    if (!type.equals("Feature")) {
      throw new InputException(file, "line " + feature.line(), "type",
          "expected a Feature, found type '" + type + "'");
    }
    Map<String, Field> fields = new LinkedHashMap<>();
    point(member(feature, "geometry", file), file, fields);
    Json.Value propsValue = member(feature, "properties", file);
    if (!(propsValue instanceof Json.Obj props)) {
      throw new InputException(file, "line " + propsValue.line(), "properties",
          "expected an object of structure properties, found " + propsValue.kind());
    }
    for (Map.Entry<String, Json.Value> e : props.members().entrySet()) {
      String name = StructureReader.canonical(e.getKey());
      Json.Value v = e.getValue();
      if (name == null) {
        throw StructureReader.unknownColumn(file, v.line(), e.getKey());
      }
      if (name.equals(StructureReader.X) || name.equals(StructureReader.Y)) {
        throw new InputException(file, "line " + v.line(), e.getKey(),
            "x and y come from the Point geometry in GeoJSON; remove this property");
      }
      if (fields.containsKey(name)) {
        throw new InputException(file, "line " + v.line(), e.getKey(),
            "property given twice (names differ only in letter case)");
      }
      fields.put(name, new Field(scalarText(v, e.getKey(), file), v.line()));
    }
    return new RawRecord(feature.line(), fields);
  }

  private static void point(Json.Value geometry, String file, Map<String, Field> fields) {
    Json.Obj g = object(geometry, file, "a Point geometry");
    String type = string(member(g, "type", file), file, "type");
    if (!type.equals("Point")) {
      throw new InputException(file, "line " + g.line(), "geometry",
          "expected a Point geometry, found " + type);
    }
    Json.Value c = member(g, "coordinates", file);
    if (!(c instanceof Json.Arr arr) || arr.items().size() < 2 || arr.items().size() > 3) {
      throw new InputException(file, "line " + c.line(), "coordinates",
          "expected [x, y] or [x, y, z] for a Point");
    }
    for (int k = 0; k < 2; k++) {
      Json.Value v = arr.items().get(k);
      if (!(v instanceof Json.Num n)) {
        throw new InputException(file, "line " + v.line(), "coordinates",
            "expected a number, found " + v.kind());
      }
      fields.put(k == 0 ? StructureReader.X : StructureReader.Y, new Field(n.text(), n.line()));
    }
  }

  private static String scalarText(Json.Value v, String name, String file) {
    if (v instanceof Json.Str s) {
      return s.value().strip();
    }
    if (v instanceof Json.Num n) {
      return n.text();
    }
    if (v instanceof Json.Null) {
      return "";
    }
    throw new InputException(file, "line " + v.line(), name,
        "expected a string or a number, found " + v.kind());
  }

  private static Json.Obj object(Json.Value v, String file, String what) {
    if (v instanceof Json.Obj o) {
      return o;
    }
    throw new InputException(file, "line " + v.line(), null,
        "expected " + what + " (a JSON object), found " + v.kind());
  }

  private static Json.Value member(Json.Obj o, String name, String file) {
    Json.Value v = o.members().get(name);
    if (v == null) {
      throw new InputException(file, "line " + o.line(), name, "required member missing");
    }
    return v;
  }

  private static String string(Json.Value v, String file, String name) {
    if (v instanceof Json.Str s) {
      return s.value();
    }
    throw new InputException(file, "line " + v.line(), name,
        "expected a string, found " + v.kind());
  }
}
