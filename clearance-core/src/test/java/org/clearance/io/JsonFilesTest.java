package org.clearance.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.clearance.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The one strict JSON configuration: what RFC 8259 forbids is an error naming file and line. */
class JsonFilesTest {

  @Test
  void readsWhatRfc8259Allows() {
    String text = "\uFEFF{\n \"a\": [1, -2.5e3, 0.25E-1],\n"
        + " \"b\": \"q\\\"\\\\\\/\\b\\f\\n\\r\\t\\u00e9\", \"e\": null\n}";
    JsonNode o = JsonFiles.parse(text, "t.json");
    // RFC 8259 section 6 number grammar, section 7 escapes; values by hand
    assertEquals(-2500.0, o.get("a").get(1).doubleValue(), 0.0);
    assertEquals(0.025, o.get("a").get(2).doubleValue(), 0.0);
    assertEquals("q\"\\/\b\f\n\r\t\u00e9", o.get("b").textValue());
    assertTrue(o.get("e").isNull());
  }

  @ParameterizedTest(name = "{0}")
  @CsvSource(delimiter = '|', value = {
      // what | text (\n as ~) | line of the error
      "trailing comma   | {\"a\": 1,~}         | 2",
      "duplicate key    | {\"a\": 1,~\"a\": 2} | 2",
      "leading zero     | [01]                 | 1",
      "bare word        | [~yes]               | 2",
      "comment          | {~// c~}             | 2",
      "text after       | {}~x                 | 2",
      "unclosed string  | [\"abc               | 1",
      "line break in string | [\"a~b\"]        | 1",
      "bad escape       | [\"\\x\"]            | 1",
      "NaN              | [NaN]                | 1",
      "unclosed array   | [1,~2                | 2"})
  void syntaxErrorsNameFileAndLine(String what, String text, int line) {
    InputException e = assertThrows(InputException.class,
        () -> JsonFiles.parse(text.replace('~', '\n'), "bad.json"));
    assertEquals("bad.json", e.file());
    assertTrue(e.location().startsWith("line " + line + ","), e.getMessage());
    assertTrue(e.problem().startsWith("JSON syntax"), e.getMessage());
    assertEquals(1, e.getMessage().lines().count(), e.getMessage());
  }

  @Test
  void emptyAndDeeplyNestedDocumentsAreErrorsNotCrashes() {
    assertTrue(assertThrows(InputException.class, () -> JsonFiles.parse("  ", "e.json"))
        .problem().contains("empty"));
    String deep = "[".repeat(10_000) + "]".repeat(10_000);
    InputException e = assertThrows(InputException.class, () -> JsonFiles.parse(deep, "d.json"));
    assertEquals("d.json", e.file());
  }

  @Test
  void notComputedNumbersAreWrittenAsNull() {
    ObjectNode o = JsonFiles.object();
    o.set("nan", JsonFiles.number(Double.NaN));
    o.set("inf", JsonFiles.number(Double.POSITIVE_INFINITY));
    o.set("x", JsonFiles.number(0.1));
    assertEquals("{\"nan\":null,\"inf\":null,\"x\":0.1}", JsonFiles.write(o));
  }

  @Test
  void typedAccessNamesThePathAndKey() {
    JsonAt root = JsonAt.root("m.json",
        JsonFiles.parse("{\"spans\":[{\"id\":\"A\"},{\"id\":7}]}", "m.json"));
    InputException e = assertThrows(InputException.class,
        () -> root.objects("spans").get(1).str("id"));
    assertEquals("m.json, spans[1], field 'id': must be a string", e.getMessage());
    e = assertThrows(InputException.class, () -> root.num("keep_radius_m"));
    assertEquals("m.json, field 'keep_radius_m': missing", e.getMessage());
  }
}
