package org.clearance.line;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class CsvTableTest {

  @ParameterizedTest(name = "{0}")
  @CsvSource(delimiter = '|', value = {
      // line | fields joined with ~ (RFC 4180 quoting, plus trimming of unquoted fields)
      "a,b,c              | a~b~c",
      "' a , b ,c '       | a~b~c",
      "a,,c,              | a~~c~",
      "'\"x,y\",z'        | x,y~z",
      "'\"say \"\"hi\"\"\",2' | say \"hi\"~2",
      "' \"  padded \" ,1' | '  padded ~1'",
      "'\"\"'             | ''"})
  void splitsFields(String line, String expected) {
    List<String> fields = CsvTable.split(line, "t.csv", 1);
    assertEquals(List.of(expected.split("~", -1)), fields);
  }
}
