package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.StringWriter;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class JsonOutTest {

  @Test
  void writesValidJsonThatReadsBack() {
    StringWriter w = new StringWriter();
    new JsonOut(w).beginObject(false).member("text", "a \"q\" \\ \n\u0001")
        .member("n", 3L).member("x", 0.1).member("tiny", 1.5e-7).member("nan", Double.NaN)
        .member("flag", true).member("xyz", 1.0, -2.5, 1e20)
        .name("list").beginArray(false).beginObject(true).member("k", "v").endObject()
        .beginArray(true).endArray().endArray().endObject();
    @SuppressWarnings("unchecked")
    Map<String, Object> m = (Map<String, Object>) MiniJson.parse(w.toString());
    assertEquals("a \"q\" \\ \n\u0001", m.get("text"));
    assertEquals(3.0, (Double) m.get("n"), 0.0);
    assertEquals(0.1, (Double) m.get("x"), 0.0); // shortest round-trip form (Double.toString)
    assertEquals(1.5e-7, (Double) m.get("tiny"), 0.0);
    assertEquals(null, m.get("nan"));
    assertEquals(true, m.get("flag"));
    assertEquals(List.of(1.0, -2.5, 1e20), m.get("xyz"));
    assertEquals(List.of(Map.of("k", "v"), List.of()), m.get("list"));
  }
}
