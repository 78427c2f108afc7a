package org.clearance.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.time.LocalDate;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/** LAS GPS time to UTC (ASPRS LAS 1.4 R15 global encoding bit 0; GPS - UTC leap seconds). */
class GpsTimeTest {

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
