package org.clearance.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.clearance.InputException;
import org.junit.jupiter.api.Test;

/** The one YAML helper shared by the line specification and rule profile readers. */
class YamlMapTest {

  private static YamlMap top(String text) {
    return YamlMap.of(YamlMap.compose(text, "t.yaml"), "t.yaml", null);
  }

  @Test
  void numbersArePlainDecimalsInTheKeysUnit() {
    YamlMap m = top("a_m: 2.5\nb_m: '2.5'\nc_m: 3 m\nd_m: 1_000\ne_m: .inf\n");
    assertEquals(2.5, m.number("a_m"), 0);
    assertTrue(assertThrows(InputException.class, () -> m.number("b_m")).getMessage()
        .contains("remove the quotes"));
    assertTrue(assertThrows(InputException.class, () -> m.number("c_m")).getMessage()
        .contains("the unit is in the key's name (m)"));
    assertTrue(assertThrows(InputException.class, () -> m.number("d_m")).getMessage()
        .contains("not a plain decimal number"));
    assertTrue(assertThrows(InputException.class, () -> m.number("e_m")).getMessage()
        .contains("not a plain decimal number"));
  }

  @Test
  void errorsNameFileLineAndKey() {
    YamlMap m = top("a: 1\nb:\n  - x\n");
    InputException e = m.error("b", "problem");
    assertEquals("t.yaml", e.file());
    assertEquals("line 3", e.location()); // at the value, where the list starts
    assertEquals("b", e.field());
    InputException missing = assertThrows(InputException.class, () -> m.required("c"));
    assertEquals("line 1", missing.location());
  }

  @Test
  void strictMappingRefusesUnknownAndRepeatedKeys() {
    InputException unknown = assertThrows(InputException.class, () -> YamlMap.strict(
        YamlMap.compose("a: 1\nz: 2\n", "t.yaml"), "t.yaml", "a test", List.of("a")));
    assertEquals("z", unknown.field());
    assertTrue(unknown.getMessage().contains("allowed keys: a"), unknown.getMessage());
    assertThrows(InputException.class, () -> top("a: 1\na: 2\n"));
  }

  /** A "billion laughs" document: aliases of aliases are refused, not expanded. */
  @Test
  void aliasBombIsRefused() {
    StringBuilder sb = new StringBuilder("a: &a [x, x, x, x, x, x, x, x, x]\n");
    for (int i = 0; i < 12; i++) {
      char p = (char) ('a' + i);
      char n = (char) (p + 1);
      sb.append(n).append(": &").append(n).append(" [");
      for (int k = 0; k < 9; k++) {
        sb.append(k == 0 ? "" : ", ").append('*').append(p);
      }
      sb.append("]\n");
    }
    InputException e = assertThrows(InputException.class, () -> top(sb.toString()));
    assertTrue(e.getMessage().startsWith("t.yaml"), e.getMessage());
  }
}
