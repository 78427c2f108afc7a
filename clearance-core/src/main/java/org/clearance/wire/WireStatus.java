package org.clearance.wire;

import java.util.Locale;

/** Whether a conductor (or a span) has a fitted model good enough to measure clearances to. */
public enum WireStatus {
  /** Found and fitted within every quality threshold. */
  FITTED,
  /** Missing, or fitted below a quality threshold: never to be reported as clear. */
  NOT_ASSESSED;

  /** The name used in output files: {@code fitted} or {@code not_assessed}. */
  public String label() {
    return name().toLowerCase(Locale.ROOT);
  }
}
