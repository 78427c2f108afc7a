package org.clearance.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The small helpers: class names, unit matching, the cell set, point format table. */
class SmallPartsTest {
  // Source: check-values.md section 1 (ASPRS LAS 1.4 R15 class tables) [published]; formats 0-5:
  // LAS 1.4 R15 table 9 (8 model key-point, 12 overlap, 10-11 and 13-31 reserved).
  @ParameterizedTest
  @CsvSource(delimiter = ';', value = {
    "2; false; true; ground",
    "7; false; true; low point (noise)",
    "14; false; true; wire - conductor (phase)",
    "16; false; true; wire-structure connector (insulator)",
    "22; false; true; temporal exclusion",
    "40; false; true; reserved",
    "64; false; true; user definable",
    "12; false; true; reserved",
    "12; true; false; overlap",
    "8; true; false; model key-point (mass point)",
    "14; true; false; wire - conductor (phase) (reserved in formats 0-5)",
    "12; true; true; overlap / reserved",
    "5; true; true; high vegetation"
  })
  void classNames(int code, boolean legacy, boolean extended, String name) {
    assertEquals(name, AsprsClasses.name(code, legacy, extended));
  }

  // Unit lengths: NIST (check-values.md section 1) [published]; as printed by real files:
  // mvk-thin GeoTIFF doubles 0.30480060960121924, nebraska WKT 0.30480060960121924,
  // autzen WKT 0.3048.
  @ParameterizedTest
  @CsvSource({
    "1.0, METRE",
    "0.3048, FOOT",
    "0.30480060960121924, US_SURVEY_FOOT",
    "0.3048006096, US_SURVEY_FOOT",
    "0.304800609601219, US_SURVEY_FOOT"
  })
  void unitsByLength(double metres, LinearUnit unit) {
    assertEquals(Optional.of(unit), Units.byFactor(metres));
  }

  @Test
  void unknownLengthsAreNotUnits() {
    assertEquals(Optional.empty(), Units.byFactor(1000));
    assertEquals(Optional.empty(), Units.byFactor(0.3047));
    assertEquals(Optional.empty(), Units.byFactor(Double.NaN));
    assertEquals(Optional.empty(), Units.byFactor(-1));
  }

  @Test
  void cellSetCountsDistinctKeysThroughGrowth() {
    LongHashSet s = new LongHashSet();
    for (long k = 0; k < 100_000; k++) {
      assertTrue(s.add(k * 7919));
    }
    assertFalse(s.add(7919));
    assertTrue(s.add(Long.MIN_VALUE));
    assertFalse(s.add(Long.MIN_VALUE));
    assertEquals(100_001, s.size());
    LongHashSet t = new LongHashSet();
    t.add(-1);
    t.add(0);
    t.addAll(s);
    assertEquals(100_002, t.size());
  }

  // Source: ASPRS LAS 1.4 R15 / check-values.md section 1: minimum record lengths of formats
  // 0..10 are 20, 28, 26, 34, 57, 63, 30, 36, 38, 59, 67 bytes [published].
  @Test
  void recordLengthsOfTheFormats() {
    int[] expected = {20, 28, 26, 34, 57, 63, 30, 36, 38, 59, 67};
    for (int id = 0; id <= 10; id++) {
      assertEquals(expected[id], PointFormat.ofId(id).minRecordLength(), "format " + id);
    }
    assertEquals(null, PointFormat.ofId(11));
  }
}
