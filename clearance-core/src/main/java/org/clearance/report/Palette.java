package org.clearance.report;

import org.clearance.assess.CutSite;

/**
 * Colours of the HTML report, chosen for this project: zones by priority on a violet-to-teal
 * ramp (darkest = most urgent), fall-in trees in bark brown, NOT ASSESSED in slate.
 */
final class Palette {

  /** Zone colours by priority 1, 2, 3, ...; later priorities reuse the last. */
  private static final String[] ZONES = {"#4b1466", "#9b3d8c", "#d77a61", "#3b8e88", "#6f7f8f"};
  /** Fall-in trees. */
  static final String FALL_IN = "#7a4e1d";
  /** NOT ASSESSED. */
  static final String NOT_ASSESSED = "#3e4a5c";
  /** Other vegetation near the line. */
  static final String VEGETATION = "#a9bfa3";
  /** Conductors as surveyed. */
  static final String CONDUCTOR = "#1d1d1f";
  /** Conductors in the governing condition. */
  static final String GOVERNING = "#2c64b8";

  private Palette() {}

  /** The colour of a zone priority. */
  static String zone(int priority) {
    return ZONES[Math.max(0, Math.min(ZONES.length, priority) - 1)];
  }

  /** The colour of a site. */
  static String site(CutSite s) {
    return s.kind() == CutSite.Kind.FALL_IN ? FALL_IN : zone(s.priority());
  }
}
