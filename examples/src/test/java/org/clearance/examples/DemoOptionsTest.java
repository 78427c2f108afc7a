package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.clearance.InputException;
import org.junit.jupiter.api.Test;

class DemoOptionsTest {

  @Test
  void badOptionsNameTheOption() {
    DemoOptions d = DemoOptions.defaults();
    assertEquals("spanCount", assertThrows(InputException.class,
        () -> d.withSpanCount(2)).field());
    assertEquals("pointDensity", assertThrows(InputException.class,
        () -> d.withPointDensity(Double.NaN)).field());
    assertEquals("corridorHalfWidth", assertThrows(InputException.class,
        () -> d.withCorridorHalfWidth(30)).field());
    assertEquals("structureEdit", assertThrows(InputException.class,
        () -> d.withStructureEdit(StructureEdit.omit(13))).field());
    assertThrows(IllegalArgumentException.class, () -> StructureEdit.offset(1, 0));
    assertThrows(IllegalArgumentException.class, () -> StructureEdit.offset(1, 51));
  }

  @Test
  void defaultsAreTheDocumentedOnes() {
    // docs/demo-corridor.md, options table.
    DemoOptions d = DemoOptions.defaults();
    assertEquals(230_017L, d.seed());
    assertEquals(12, d.spanCount());
    assertEquals(3.0, d.pointDensity(), 0.0);
    assertEquals(ClassificationMode.FULL, d.mode());
    assertEquals(60.0, d.corridorHalfWidth(), 0.0);
    assertEquals(StructureEdit.Kind.NONE, d.structureEdit().kind());
  }
}
