package org.clearance.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.time.LocalDate;
import java.util.Optional;
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


  @Test
  void adjustedStandardGpsTime() {
    // [computed] 2026-07-14T10:00:00Z is 1 468 058 400 s after the GPS epoch in UTC terms
    // (16 991 days x 86 400 + 36 000); GPS runs 18 s ahead (leap seconds since 2017), so its GPS
    // seconds are 1 468 058 418 and the adjusted time is 468 058 418.
    Instant t = GpsTime.toUtc(468_058_418.0, true, Optional.empty()).orElseThrow();
    assertEquals(Instant.parse("2026-07-14T10:00:00Z"), t);
  }

  @Test
  void gpsWeekTimeNeedsTheSurveyDay() {
    assertTrue(GpsTime.toUtc(100.0, false, Optional.empty()).isEmpty());
    // [computed] 2026-07-14 is a Tuesday; its GPS week starts on Sunday 2026-07-12 00:00 GPS;
    // 2 days 10 h = 208 800 s into the week, plus the 18 leap seconds.
    Instant t = GpsTime.toUtc(208_818.0, false, Optional.of(LocalDate.of(2026, 7, 14)))
        .orElseThrow();
    assertEquals(Instant.parse("2026-07-14T10:00:00Z"), t);
  }

  @Test
  void leapSecondsFollowTheBulletins() {
    assertEquals(0, GpsTime.leapSeconds(Instant.parse("1980-06-01T00:00:00Z")));
    assertEquals(13, GpsTime.leapSeconds(Instant.parse("2000-01-01T00:00:00Z")));
    assertEquals(18, GpsTime.leapSeconds(Instant.parse("2026-01-01T00:00:00Z")));
  }
}
