package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringWriter;
import java.util.List;
import java.util.Map;
import org.clearance.io.Json;
import org.junit.jupiter.api.Test;

/** JsonOut's text read back with the project's strict JSON parser (RFC 8259). */
class JsonOutTest {

  @Test
  void writesValidJsonThatReadsBack() {
    StringWriter w = new StringWriter();
    new JsonOut(w).beginObject(false).member("text", "a \"q\" \\ \n\u0001")
        .member("n", 3L).member("x", 0.1).member("tiny", 1.5e-7).member("nan", Double.NaN)
        .member("flag", true).member("xyz", 1.0, -2.5, 1e20)
        .name("list").beginArray(false).beginObject(true).member("k", "v").endObject()
        .beginArray(true).endArray().endArray().endObject();
    Map<String, Json.Value> m = ((Json.Obj) Json.parse(w.toString(), "test")).members();
    assertEquals("a \"q\" \\ \n\u0001", ((Json.Str) m.get("text")).value());
    assertEquals(3.0, num(m.get("n")), 0.0);
    assertEquals(0.1, num(m.get("x")), 0.0); // shortest round-trip form (Double.toString)
    assertEquals(1.5e-7, num(m.get("tiny")), 0.0);
    assertTrue(m.get("nan") instanceof Json.Null);
    assertEquals(true, ((Json.Bool) m.get("flag")).value());
    List<Json.Value> xyz = ((Json.Arr) m.get("xyz")).items();
    assertEquals(List.of(1.0, -2.5, 1e20), xyz.stream().map(JsonOutTest::num).toList());
    List<Json.Value> list = ((Json.Arr) m.get("list")).items();
    assertEquals("v", ((Json.Str) ((Json.Obj) list.get(0)).members().get("k")).value());
    assertTrue(((Json.Arr) list.get(1)).items().isEmpty());
  }

  private static double num(Json.Value v) {
    return ((Json.Num) v).value();
  }
}
