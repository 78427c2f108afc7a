package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.StringWriter;
import java.util.List;
import org.clearance.io.JsonFiles;
import org.junit.jupiter.api.Test;

/** JsonOut's text read back with the project's strict JSON reader (Jackson, RFC 8259). */
class JsonOutTest {

  @Test
  void writesValidJsonThatReadsBack() {
    StringWriter w = new StringWriter();
    new JsonOut(w).beginObject(false).member("text", "a \"q\" \\ \n\u0001")
        .member("n", 3L).member("x", 0.1).member("tiny", 1.5e-7).member("nan", Double.NaN)
        .member("flag", true).member("xyz", 1.0, -2.5, 1e20)
        .name("list").beginArray(false).beginObject(true).member("k", "v").endObject()
        .beginArray(true).endArray().endArray().endObject();
    JsonNode m = JsonFiles.parse(w.toString(), "test");
    assertEquals("a \"q\" \\ \n\u0001", m.get("text").textValue());
    assertEquals(3.0, m.get("n").doubleValue(), 0.0);
    assertEquals(0.1, m.get("x").doubleValue(), 0.0); // shortest round-trip form
    assertEquals(1.5e-7, m.get("tiny").doubleValue(), 0.0);
    assertTrue(m.get("nan").isNull());
    assertTrue(m.get("flag").booleanValue());
    JsonNode xyz = m.get("xyz");
    assertEquals(List.of(1.0, -2.5, 1e20), List.of(xyz.get(0).doubleValue(),
        xyz.get(1).doubleValue(), xyz.get(2).doubleValue()));
    JsonNode list = m.get("list");
    assertEquals("v", list.get(0).get("k").textValue());
    assertTrue(list.get(1).isEmpty());
  }
}
