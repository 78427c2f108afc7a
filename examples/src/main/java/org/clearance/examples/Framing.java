package org.clearance.examples;

/**
 * How the primaries of the demo distribution feeder sit on its poles (docs/demo-corridor.md,
 * "Distribution feeder"). Offsets are positive to the left looking along the line; heights are
 * below the pole top. The neutral, when present, hangs 1.0-1.8 m below the lowest primary.
 */
public enum Framing {
  /**
   * One wooden cross arm 0.6 m below the pole top, three pin insulators (conductor 0.15 m above
   * the arm): A far left, B just right of the pole (0.35-0.4 m), C 0.5-0.9 m beyond B, so that
   * one pair of phases is closer than the other, as on a common offset-pin arm.
   */
  HORIZONTAL,
  /**
   * Armless: three post insulators stacked on the left of the pole, conductors 0.3 m out,
   * 0.6-1.0 m apart vertically, the top one 0.2 m below the pole top.
   */
  VERTICAL,
  /**
   * A cross arm 0.6 m below the top with A and C 0.5-0.9 m either side of the pole, and B on a
   * pole-top pin 0.5-0.7 m above them.
   */
  TRIANGULAR
}
