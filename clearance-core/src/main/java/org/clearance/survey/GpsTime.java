package org.clearance.survey;

import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.Optional;

/**
 * Dates from LAS GPS time stamps. A LAS file whose global encoding bit 0 is set stores adjusted
 * standard GPS time: GPS seconds since 1980-01-06 00:00:00 UTC minus 10^9 (ASPRS LAS 1.4 R15,
 * section 2.4, global encoding). GPS time runs without leap seconds, so UTC = GPS - (leap seconds
 * inserted since 1980), taken from the IERS table (Bulletin C) below. With bit 0 clear the file
 * stores GPS week seconds (0 to 604 800 within a week that the file does not name): no date can
 * be derived from those.
 */
public final class GpsTime {

  /** The GPS epoch. */
  public static final Instant EPOCH = Instant.parse("1980-01-06T00:00:00Z");
  /** Offset of adjusted standard GPS time, s (LAS 1.4 R15). */
  public static final double ADJUSTED_OFFSET_S = 1e9;

  /**
   * UTC days from which GPS - UTC grows by one second (IERS Bulletin C; the 18 leap seconds
   * inserted between 1981-07-01 and 2017-01-01, published). None announced since.
   */
  private static final LocalDate[] LEAP_DAYS = {
    LocalDate.of(1981, 7, 1), LocalDate.of(1982, 7, 1), LocalDate.of(1983, 7, 1),
    LocalDate.of(1985, 7, 1), LocalDate.of(1988, 1, 1), LocalDate.of(1990, 1, 1),
    LocalDate.of(1991, 1, 1), LocalDate.of(1992, 7, 1), LocalDate.of(1993, 7, 1),
    LocalDate.of(1994, 7, 1), LocalDate.of(1996, 1, 1), LocalDate.of(1997, 7, 1),
    LocalDate.of(1999, 1, 1), LocalDate.of(2006, 1, 1), LocalDate.of(2009, 1, 1),
    LocalDate.of(2012, 7, 1), LocalDate.of(2015, 7, 1), LocalDate.of(2017, 1, 1)};

  private GpsTime() {}

  /**
   * The UTC instant of an adjusted standard GPS time.
   *
   * @param adjustedSeconds adjusted standard GPS time, s
   * @return the instant (to the millisecond), or empty when the value is not finite
   */
  public static Optional<Instant> utcOfAdjusted(double adjustedSeconds) {
    if (!Double.isFinite(adjustedSeconds)) {
      return Optional.empty();
    }
    long ms = Math.round((adjustedSeconds + ADJUSTED_OFFSET_S) * 1000.0);
    Instant gps = EPOCH.plusMillis(ms);
    int leap = 0;
    for (LocalDate d : LEAP_DAYS) {
      // the instant a leap second took effect, expressed on the GPS scale
      Instant effective = d.atStartOfDay(ZoneOffset.UTC).toInstant().plusSeconds(leap + 1);
      if (!gps.isBefore(effective)) {
        leap++;
      }
    }
    return Optional.of(gps.minusSeconds(leap));
  }

  /** The UTC day of an adjusted standard GPS time, or empty when not finite. */
  public static Optional<LocalDate> utcDayOfAdjusted(double adjustedSeconds) {
    return utcOfAdjusted(adjustedSeconds).map(i -> i.atZone(ZoneOffset.UTC).toLocalDate());
  }
}
