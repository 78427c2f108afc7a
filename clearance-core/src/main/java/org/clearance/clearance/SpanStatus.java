package org.clearance.clearance;

/** Whether a span could be assessed. A span that is not fully assessed is never reported clear. */
public enum SpanStatus {
  /** Every conductor position was fitted and every condition computed. */
  ASSESSED,
  /**
   * Some conductors or conditions are missing: findings on the rest stand, but the span cannot be
   * called clear.
   */
  INCOMPLETE,
  /** Nothing could be measured (no conductor fitted, no survey points, no rules for it). */
  NOT_ASSESSED
}
