package org.clearance.sag;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.ZonedDateTime;

/**
 * Where the sun stands for the solar heating of a conductor, by the formulas of IEEE Std 738-2012
 * clause 4.4.3 (equations (16a)-(17b) and Table 2): declination delta = 23.46 sin((284 + N) / 365
 * x 360 deg), hour angle omega = 15 deg per hour from solar noon, altitude
 * sin Hc = cos(Lat) cos(delta) cos(omega) + sin(Lat) sin(delta), azimuth Zc = C + arctan(chi) with
 * chi = sin(omega) / (sin(Lat) cos(omega) - cos(Lat) tan(delta)) and C from Table 2.
 *
 * @param altitudeRad solar altitude Hc above the horizon, radians (negative at night)
 * @param azimuthRad solar azimuth Zc, radians clockwise from north, [0, 2 pi)
 */
public record SolarPosition(double altitudeRad, double azimuthRad) {

  private static final double SECONDS_PER_HOUR = 3600;
  /** Amplitude of the declination formula of IEEE Std 738-2012 equation (16b), degrees. */
  public static final double IEEE_738_DECLINATION_DEG = 23.46;
  /** Amplitude of the declination formula of CIGRE TB 601 (section 3.3.2), degrees. */
  public static final double CIGRE_601_DECLINATION_DEG = 23.3;

  /**
   * The sun at a day of the year and local solar time (IEEE Std 738-2012 clause 4.4.3).
   *
   * @param dayOfYear day of the year N, 1-366
   * @param solarHour local solar time, hours (12 = solar noon)
   * @param latitudeDeg latitude, degrees (north positive), -90 to 90
   */
  public static SolarPosition of(int dayOfYear, double solarHour, double latitudeDeg) {
    return of(dayOfYear, solarHour, latitudeDeg, IEEE_738_DECLINATION_DEG);
  }

  /**
   * The sun with a declination amplitude of one's choice: 23.46 deg in IEEE Std 738-2012,
   * 23.3 deg in CIGRE TB 601 (otherwise the same formula, delta = A sin((284 + N) / 365 x 360
   * deg)); the altitude and azimuth formulas are the same in both.
   *
   * @param declinationAmplitudeDeg the amplitude A, degrees
   * @see #of(int, double, double)
   */
  public static SolarPosition of(int dayOfYear, double solarHour, double latitudeDeg,
      double declinationAmplitudeDeg) {
    double delta = Math.toRadians(declinationAmplitudeDeg * Math.sin(Math.toRadians(
        (284.0 + dayOfYear) / 365.0 * 360.0)));
    double omega = Math.toRadians(15.0 * (solarHour - 12.0));
    double lat = Math.toRadians(latitudeDeg);
    double sinHc = Math.cos(lat) * Math.cos(delta) * Math.cos(omega)
        + Math.sin(lat) * Math.sin(delta);
    double hc = Math.asin(Math.max(-1, Math.min(1, sinHc)));
    double chi = Math.sin(omega) / (Math.sin(lat) * Math.cos(omega)
        - Math.cos(lat) * Math.tan(delta));
    // Table 2: the azimuth constant C by hour angle and the sign of chi.
    double c;
    if (omega < 0) {
      c = chi >= 0 ? 0 : Math.PI;
    } else {
      c = chi >= 0 ? Math.PI : 2 * Math.PI;
    }
    double zc = c + Math.atan(chi);
    zc = ((zc % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
    return new SolarPosition(hc, zc);
  }

  /**
   * The sun at an instant seen from a place: local solar time from UTC, the longitude (4 minutes
   * per degree) and the equation of time E = 9.87 sin 2B - 7.53 cos B - 1.5 sin B minutes,
   * B = 360 (N - 81) / 364 deg (a common approximation, from memory, good to about a minute).
   *
   * @param instant the moment
   * @param latitudeDeg latitude, degrees (north positive)
   * @param longitudeDeg longitude, degrees (east positive)
   */
  public static SolarPosition at(Instant instant, double latitudeDeg, double longitudeDeg) {
    return at(instant, latitudeDeg, longitudeDeg, IEEE_738_DECLINATION_DEG);
  }

  /**
   * The sun at an instant with a declination amplitude of one's choice.
   *
   * @param declinationAmplitudeDeg see {@link #of(int, double, double, double)}
   * @see #at(Instant, double, double)
   */
  public static SolarPosition at(Instant instant, double latitudeDeg, double longitudeDeg,
      double declinationAmplitudeDeg) {
    ZonedDateTime utc = instant.atZone(ZoneOffset.UTC);
    int n = utc.getDayOfYear();
    double b = Math.toRadians(360.0 * (n - 81) / 364.0);
    double eotMinutes = 9.87 * Math.sin(2 * b) - 7.53 * Math.cos(b) - 1.5 * Math.sin(b);
    double utcHour = utc.toLocalTime().toSecondOfDay() / SECONDS_PER_HOUR;
    double solarHour = utcHour + longitudeDeg / 15.0 + eotMinutes / 60.0;
    // A solar hour outside 0-24 belongs to the neighbouring day; the declination changes by less
    // than half a degree a day, so the day number of the UTC date is kept.
    solarHour = ((solarHour % 24) + 24) % 24;
    return of(n, solarHour, latitudeDeg, declinationAmplitudeDeg);
  }
}
