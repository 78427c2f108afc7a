package org.clearance.examples;

/**
 * One flight strip of the simulated airborne survey (truth). Strips follow the line at a constant
 * offset from its centre line; the sensor fires vertical pulses over a swath either side.
 *
 * @param pointSourceId LAS point source id of its points
 * @param centreOffsetM offset of the flight path from the line centre line, m, positive left
 * @param halfSwathM half width of the swath on the ground, m
 * @param startChainage chainage where the strip starts, m from the line start
 * @param endChainage chainage where the strip ends, m
 * @param forward true when flown towards increasing chainage
 * @param startTime GPS time at the strip start (adjusted standard GPS time), s
 * @param speed ground speed, m/s
 * @param altitudeM flying height above ground, m (sets the scan angle)
 */
public record FlightStrip(
    int pointSourceId,
    double centreOffsetM,
    double halfSwathM,
    double startChainage,
    double endChainage,
    boolean forward,
    double startTime,
    double speed,
    double altitudeM) {

  /** True when the strip covers a point at offset e and chainage ch. */
  public boolean covers(double e, double ch) {
    return Math.abs(e - centreOffsetM) <= halfSwathM && ch >= startChainage && ch <= endChainage;
  }

  /** GPS time at which the strip passes chainage ch, s. */
  public double time(double ch) {
    return startTime + (forward ? ch - startChainage : endChainage - ch) / speed;
  }

  /** Scan angle of a pulse at offset e, degrees from nadir (positive to the left of the path). */
  public double scanAngleDeg(double e) {
    return Math.toDegrees(Math.atan2(e - centreOffsetM, altitudeM));
  }
}
