package org.clearance.survey;

import java.time.DayOfWeek;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.temporal.TemporalAdjusters;
import java.util.Optional;

/**
 * The UTC instant of a LAS point's GPS time (ASPRS LAS 1.4 R15, global encoding bit 0): adjusted
 * standard GPS time is GPS seconds since 1980-01-06T00:00:00 minus 1e9; otherwise the time is
 * seconds of the GPS week, which starts on Sunday 00:00 GPS time, and the survey day must say
 * which week. GPS time runs ahead of UTC by the leap seconds since 1980 (IERS bulletins: 18 s
 * since 2017-01-01; earlier steps in {@link #LEAP_STEPS}).
 */
public final class GpsTime {

  /** The GPS epoch, 1980-01-06T00:00:00 (GPS and UTC agreed then). */
  public static final Instant EPOCH = Instant.parse("1980-01-06T00:00:00Z");
  /** Offset of adjusted standard GPS time, s (LAS 1.4 R15: standard GPS time minus 1e9). */
  public static final double ADJUSTED_OFFSET_S = 1e9;
  private static final long SECONDS_PER_WEEK = 7L * 86_400;

  /** UTC dates from which GPS - UTC grew by one more second (IERS Bulletin C, from memory). */
  private static final String[] LEAP_STEPS = {"1981-07-01", "1982-07-01", "1983-07-01",
      "1985-07-01", "1988-01-01", "1990-01-01", "1991-01-01", "1992-07-01", "1993-07-01",
      "1994-07-01", "1996-01-01", "1997-07-01", "1999-01-01", "2006-01-01", "2009-01-01",
      "2012-07-01", "2015-07-01", "2017-01-01"};

  private GpsTime() {}

  /**
   * The UTC instant of a GPS time.
   *
   * @param gpsTime the point's GPS time field, s
   * @param adjusted whether the file stores adjusted standard GPS time (global encoding bit 0)
   * @param surveyDay for GPS week time, a UTC day within the survey's GPS week
   * @return the instant, or empty when the time is not finite or the week is not known
   */
  public static Optional<Instant> toUtc(double gpsTime, boolean adjusted,
      Optional<LocalDate> surveyDay) {
    if (!Double.isFinite(gpsTime)) {
      return Optional.empty();
    }
    double gpsSeconds;
    if (adjusted) {
      gpsSeconds = gpsTime + ADJUSTED_OFFSET_S;
    } else {
      if (surveyDay.isEmpty()) {
        return Optional.empty();
      }
      LocalDate sunday = surveyDay.get().with(TemporalAdjusters.previousOrSame(DayOfWeek.SUNDAY));
      long weekStart = sunday.atStartOfDay(ZoneOffset.UTC).toEpochSecond()
          - EPOCH.getEpochSecond();
      gpsSeconds = weekStart - weekStart % SECONDS_PER_WEEK + gpsTime;
    }
    long whole = (long) Math.floor(gpsSeconds);
    Instant gps = EPOCH.plusSeconds(whole).plusNanos((long) ((gpsSeconds - whole) * 1e9));
    return Optional.of(gps.minusSeconds(leapSeconds(gps)));
  }

  /** GPS - UTC at a moment, s. */
  static int leapSeconds(Instant gps) {
    int n = 0;
    for (String step : LEAP_STEPS) {
      if (!gps.isBefore(LocalDate.parse(step).atStartOfDay(ZoneOffset.UTC).toInstant())) {
        n++;
      }
    }
    return n;
  }
}
