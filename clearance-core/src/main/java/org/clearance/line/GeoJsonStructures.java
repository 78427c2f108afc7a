package org.clearance.line;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.clearance.InputException;
import org.clearance.io.JsonFiles;
import org.clearance.line.StructureReader.Field;
import org.clearance.line.StructureReader.RawRecord;

/**
 * Turns a GeoJSON FeatureCollection of Point features (RFC 7946) into structure records: x and y
 * from the point's first two coordinates (a third is not used), the other columns from the
 * feature's properties. Foreign members (RFC 7946 section 6.1, e.g. a legacy {@code crs}) are
 * allowed and not used; properties are checked as strictly as CSV columns. The document is
 * streamed through Jackson so that each feature's messages name the line where it starts.
 */
final class GeoJsonStructures {

  private GeoJsonStructures() {}

  /**
   * The records of all features, in file order.
   *
   * @throws InputException naming file, line and member for anything that is not a point feature
   *     with our properties
   */
  static List<RawRecord> records(String text, String file) {
    try (JsonParser p = JsonFiles.parser(text)) {
      if (p.nextToken() != JsonToken.START_OBJECT) {
        throw new InputException(file, "line " + line(p), null,
            "expected a GeoJSON FeatureCollection (a JSON object)");
      }
      int rootLine = line(p);
      String type = null;
      List<RawRecord> out = null;
      while (p.nextToken() == JsonToken.FIELD_NAME) {
        String name = p.currentName();
        JsonToken t = p.nextToken();
        int at = line(p);
        if (name.equals("type")) {
          if (t != JsonToken.VALUE_STRING) {
            throw new InputException(file, "line " + at, "type", "expected a string");
          }
          type = p.getText();
        } else if (name.equals("features")) {
          if (t != JsonToken.START_ARRAY) {
            throw new InputException(file, "line " + at, "features",
                "expected an array of features");
          }
          out = new ArrayList<>();
          while (p.nextToken() != JsonToken.END_ARRAY) {
            int featureLine = line(p);
            out.add(feature(JsonFiles.readValue(p), featureLine, file));
          }
        } else {
          p.skipChildren();
        }
      }
      if (p.nextToken() != null) {
        throw new InputException(file, "line " + line(p), null,
            "unexpected text after the end of the JSON document");
      }
      if (type == null) {
        throw new InputException(file, "line " + rootLine, "type", "required member missing");
      }
      if (!type.equals("FeatureCollection")) {
        throw new InputException(file, "line " + rootLine, "type",
            "expected a GeoJSON FeatureCollection, found type '" + type + "'");
      }
      if (out == null) {
        throw new InputException(file, "line " + rootLine, "features",
            "required member missing");
      }
      return out;
    } catch (JsonProcessingException e) {
      throw JsonFiles.syntax(file, e);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  private static int line(JsonParser p) {
    return p.currentTokenLocation().getLineNr();
  }

  private static RawRecord feature(JsonNode feature, int line, String file) {
    object(feature, file, line, "a feature");
    String type = string(member(feature, "type", file, line), file, line, "type");
    if (!type.equals("Feature")) {
      throw new InputException(file, "line " + line, "type",
          "expected a Feature, found type '" + type + "'");
    }
    Map<String, Field> fields = new LinkedHashMap<>();
    point(member(feature, "geometry", file, line), file, line, fields);
    JsonNode props = member(feature, "properties", file, line);
    if (!props.isObject()) {
      throw new InputException(file, "line " + line, "properties",
          "expected an object of structure properties, found " + kind(props));
    }
    for (Map.Entry<String, JsonNode> e : props.properties()) {
      String name = StructureReader.canonical(e.getKey());
      JsonNode v = e.getValue();
      if (name == null) {
        throw StructureReader.unknownColumn(file, line, e.getKey());
      }
      if (name.equals(StructureReader.X) || name.equals(StructureReader.Y)) {
        throw new InputException(file, "line " + line, e.getKey(),
            "x and y come from the Point geometry in GeoJSON; remove this property");
      }
      if (fields.containsKey(name)) {
        throw new InputException(file, "line " + line, e.getKey(),
            "property given twice (names differ only in letter case)");
      }
      fields.put(name, new Field(scalarText(v, e.getKey(), file, line), line));
    }
    return new RawRecord(line, fields);
  }

  private static void point(JsonNode g, String file, int line, Map<String, Field> fields) {
    object(g, file, line, "a Point geometry");
    String type = string(member(g, "type", file, line), file, line, "type");
    if (!type.equals("Point")) {
      throw new InputException(file, "line " + line, "geometry",
          "expected a Point geometry, found " + type);
    }
    JsonNode c = member(g, "coordinates", file, line);
    if (!c.isArray() || c.size() < 2 || c.size() > 3) {
      throw new InputException(file, "line " + line, "coordinates",
          "expected [x, y] or [x, y, z] for a Point");
    }
    for (int k = 0; k < 2; k++) {
      JsonNode v = c.get(k);
      if (!v.isNumber()) {
        throw new InputException(file, "line " + line, "coordinates",
            "expected a number, found " + kind(v));
      }
      fields.put(k == 0 ? StructureReader.X : StructureReader.Y,
          new Field(v.asText(), line));
    }
  }

  private static String scalarText(JsonNode v, String name, String file, int line) {
    if (v.isTextual()) {
      return v.textValue().strip();
    }
    if (v.isNumber()) {
      return v.asText();
    }
    if (v.isNull()) {
      return "";
    }
    throw new InputException(file, "line " + line, name,
        "expected a string or a number, found " + kind(v));
  }

  private static void object(JsonNode v, String file, int line, String what) {
    if (!v.isObject()) {
      throw new InputException(file, "line " + line, null,
          "expected " + what + " (a JSON object), found " + kind(v));
    }
  }

  private static JsonNode member(JsonNode o, String name, String file, int line) {
    JsonNode v = o.get(name);
    if (v == null) {
      throw new InputException(file, "line " + line, name, "required member missing");
    }
    return v;
  }

  private static String string(JsonNode v, String file, int line, String name) {
    if (v.isTextual()) {
      return v.textValue();
    }
    throw new InputException(file, "line " + line, name, "expected a string, found " + kind(v));
  }

  /** Kind of value for messages, e.g. {@code "an object"}. */
  private static String kind(JsonNode v) {
    if (v.isObject()) {
      return "an object";
    }
    if (v.isArray()) {
      return "an array";
    }
    if (v.isTextual()) {
      return "a string";
    }
    if (v.isNumber()) {
      return "a number";
    }
    if (v.isBoolean()) {
      return "a boolean";
    }
    return "null";
  }
}
