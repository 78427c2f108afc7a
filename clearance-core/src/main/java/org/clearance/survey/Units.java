package org.clearance.survey;

import java.util.Optional;

/** Matching of unit definitions (a length in metres, an EPSG unit code) to {@link LinearUnit}. */
final class Units {
  /**
   * Relative tolerance when matching a unit's length in metres: files print the US survey foot
   * with 10 to 17 digits (0.3048006096 is 4e-11 off), while the international and US survey feet
   * differ by 2e-6.
   */
  static final double FACTOR_TOLERANCE = 1e-8;

  private Units() {}

  /** The unit whose length is {@code metres} per unit, within {@link #FACTOR_TOLERANCE}. */
  static Optional<LinearUnit> byFactor(double metres) {
    if (!(Double.isFinite(metres) && metres > 0)) {
      return Optional.empty();
    }
    for (LinearUnit u : LinearUnit.values()) {
      if (Math.abs(metres / u.metres() - 1) <= FACTOR_TOLERANCE) {
        return Optional.of(u);
      }
    }
    return Optional.empty();
  }
}
