package org.clearance.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.time.LocalDate;
import org.junit.jupiter.api.Test;

/** Adjusted standard GPS time to UTC (ASPRS LAS 1.4 R15; leap seconds of IERS Bulletin C). */
class GpsTimeTest {

  @Test
  void adjustedZeroIsOneBillionGpsSecondsAfterTheEpoch() {
    // LAS 1.4 R15: adjusted standard GPS time 0 = 10^9 GPS seconds = 2011-09-14 01:46:40 GPS
    // (computed: 1980-01-06 + 10^9 s); GPS - UTC was 15 s then (IERS Bulletin C, published)
    assertEquals(Instant.parse("2011-09-14T01:46:25Z"), GpsTime.utcOfAdjusted(0).orElseThrow());
  }

  @Test
  void newYear2017IsAfterTheEighteenthLeapSecond() {
    // 2017-01-01 00:00:00 UTC = 1 167 264 018 GPS seconds (computed: 13 509 days x 86 400 s
    // + 18 leap seconds; GPS - UTC = 18 s since 2017-01-01, IERS Bulletin C, published)
    double adjusted = 1_167_264_018.0 - 1e9;
    assertEquals(Instant.parse("2017-01-01T00:00:00Z"),
        GpsTime.utcOfAdjusted(adjusted).orElseThrow());
    assertEquals(Instant.parse("2016-12-31T23:59:59Z"),
        GpsTime.utcOfAdjusted(adjusted - 2).orElseThrow(), "the second before the leap second, GPS - UTC = 17 s");
    assertEquals(LocalDate.of(2017, 1, 1), GpsTime.utcDayOfAdjusted(adjusted).orElseThrow());
  }

  @Test
  void notFiniteHasNoDate() {
    assertTrue(GpsTime.utcOfAdjusted(Double.NaN).isEmpty());
  }
}
