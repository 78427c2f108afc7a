package org.clearance.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.clearance.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class JsonTest {

  @Test
  void parsesAllValueKindsWithLines() {
    String text = "{\n \"a\": [1, -2.5e3, 0.25E-1],\n"
        + " \"b\": \"q\\\"\\\\\\/\\b\\f\\n\\r\\t\\u00e9\","
        + "\n \"c\": true, \"d\": false, \"e\": null, \"f\": {}\n}";
    Json.Obj o = assertInstanceOf(Json.Obj.class, Json.parse(text, "t.json"));
    assertEquals(List.of("a", "b", "c", "d", "e", "f"), List.copyOf(o.members().keySet()));
    Json.Arr a = assertInstanceOf(Json.Arr.class, o.members().get("a"));
    assertEquals(2, a.line());
    // RFC 8259 section 6 number grammar; values by hand.
    assertEquals(1.0, ((Json.Num) a.items().get(0)).value(), 0.0);
    assertEquals(-2500.0, ((Json.Num) a.items().get(1)).value(), 0.0);
    assertEquals(0.025, ((Json.Num) a.items().get(2)).value(), 0.0);
    // RFC 8259 section 7 escapes.
    assertEquals("q\"\\/\b\f\n\r\t\u00e9", ((Json.Str) o.members().get("b")).value());
    assertEquals(3, o.members().get("b").line());
    assertEquals(true, ((Json.Bool) o.members().get("c")).value());
    assertInstanceOf(Json.Null.class, o.members().get("e"));
    assertEquals(4, o.members().get("f").line());
  }

  @ParameterizedTest(name = "{0}")
  @CsvSource(delimiter = '|', value = {
      // what | text (\n as ~) | line of the error | problem
      "trailing comma   | {\"a\": 1,~}      | 2 | quoted member name",
      "duplicate key    | {\"a\": 1,~\"a\": 2} | 2 | twice",
      "leading zero     | [01]             | 1 | expected ','",
      "bare word        | [~yes]           | 2 | unexpected character 'y'",
      "misspelt literal | [tru]            | 1 | unexpected word",
      "comment          | {~// c~}         | 2 | quoted member name",
      "text after       | {} x             | 1 | after the end",
      "unclosed string  | [\"abc           | 1 | end of file",
      "line break in string | [\"a~b\"]    | 1 | control character",
      "bad escape       | [\"\\x\"]         | 1 | unknown escape",
      "short unicode    | [\"\\u12\"]       | 1 | four hexadecimal",
      "empty            | '   '            | 1 | empty",
      "missing exponent | [1e]             | 1 | exponent",
      "unclosed array   | [1,~2            | 2 | end of file"})
  void syntaxErrorsNameTheLine(String what, String text, int line, String problem) {
    InputException e = assertThrows(InputException.class,
        () -> Json.parse(text.replace('~', '\n'), "bad.json"));
    assertEquals("bad.json", e.file());
    assertEquals("line " + line, e.location(), e.getMessage());
    assertTrue(e.problem().contains(problem), e.getMessage());
  }

  @Test
  void deepNestingIsAnErrorNotAStackOverflow() {
    String deep = "[".repeat(10_000) + "]".repeat(10_000);
    InputException e = assertThrows(InputException.class, () -> Json.parse(deep, "d.json"));
    assertTrue(e.problem().contains("nested deeper"), e.getMessage());
  }
}
