package org.clearance.io;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectReader;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.DoubleNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.NullNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import org.clearance.InputException;

/**
 * JSON through Jackson (jackson-databind), one strict configuration for every JSON file
 * Clearance reads or writes (RFC 8259): duplicate member names, text after the document and
 * nesting deeper than {@link #MAX_DEPTH} are errors; NaN and infinities are written as null,
 * since JSON has no such numbers.
 */
public final class JsonFiles {

  /** Deepest nesting accepted; our files nest 6 deep, a GeoJSON point file 4; guards the stack. */
  public static final int MAX_DEPTH = 64;

  /** The mapper; thread-safe. */
  public static final JsonMapper MAPPER = JsonMapper.builder(JsonFactory.builder()
          .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
          .streamReadConstraints(StreamReadConstraints.builder().maxNestingDepth(MAX_DEPTH)
              .build())
          .build())
      .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
      .build();

  /** Reads one value inside a document that goes on after it. */
  private static final ObjectReader VALUE_READER =
      MAPPER.reader().without(DeserializationFeature.FAIL_ON_TRAILING_TOKENS);

  private JsonFiles() {}

  /**
   * Parses a whole document.
   *
   * @param text the document (a leading byte-order mark is skipped)
   * @param file file name for messages
   * @throws InputException naming the file, line and column of the first syntax error
   */
  public static JsonNode parse(String text, String file) {
    String t = text.startsWith("\uFEFF") ? text.substring(1) : text;
    if (t.isBlank()) {
      throw new InputException(file, null, null, "the file is empty");
    }
    try {
      return MAPPER.readTree(t);
    } catch (JsonProcessingException e) {
      throw syntax(file, e);
    }
  }

  /** A new parser over a document, for reading it in a stream. */
  public static JsonParser parser(String text) throws IOException {
    return MAPPER.createParser(text.startsWith("\uFEFF") ? text.substring(1) : text);
  }

  /** The value at a streaming parser's current token, as a tree; the parser moves past it. */
  public static JsonNode readValue(JsonParser p) throws IOException {
    return VALUE_READER.readTree(p);
  }

  /** The input error for a Jackson syntax error: file, line and column, the first line of why. */
  public static InputException syntax(String file, JsonProcessingException e) {
    JsonLocation at = e.getLocation();
    String where = at == null || at.getLineNr() < 1 ? null
        : "line " + at.getLineNr() + ", column " + at.getColumnNr();
    String why = e.getOriginalMessage() == null ? "not valid JSON"
        : e.getOriginalMessage().lines().findFirst().orElse("not valid JSON");
    return new InputException(file, where, null, "JSON syntax: " + why);
  }

  /** A new empty object node. */
  public static ObjectNode object() {
    return MAPPER.createObjectNode();
  }

  /** A number node, or null for NaN and infinities (a value not computed). */
  public static JsonNode number(double d) {
    return Double.isFinite(d) ? DoubleNode.valueOf(d) : NullNode.getInstance();
  }

  /** A text node, or null. */
  public static JsonNode text(String s) {
    return s == null ? NullNode.getInstance() : JsonNodeFactory.instance.textNode(s);
  }

  /** The document as compact JSON text. */
  public static String write(JsonNode doc) {
    try {
      return MAPPER.writeValueAsString(doc);
    } catch (JsonProcessingException e) {
      throw new IllegalStateException("a tree of plain nodes always serialises", e);
    }
  }
}
