package org.clearance.clearance;

import org.clearance.wire.SpanWires;

/**
 * Whether a span could be assessed. A span that is not fully assessed is never reported clear.
 *
 * <p>The one source of the status words: every command, file and report names a span's status
 * by {@link #word()}, and the wire stage's verdict on a span comes from {@link #ofWires}, which
 * the check starts from (it may only make a span's status worse).
 */
public enum SpanStatus {
  /** Every conductor position was fitted and every condition computed. */
  ASSESSED,
  /**
   * Some conductors or conditions are missing: findings on the rest stand, but the span cannot be
   * called clear.
   */
  INCOMPLETE,
  /** Nothing could be measured (no conductor fitted, no survey points, no rules for it). */
  NOT_ASSESSED;

  /**
   * The word every output uses for this status: {@code NOT ASSESSED}, {@code INCOMPLETE},
   * {@code ASSESSED} (console, {@code spans.csv}, GeoPackage, report alike).
   */
  public String word() {
    return name().replace('_', ' ');
  }

  /** The status of the word {@link #word()} gives (or of the enum name), for readers of files. */
  public static SpanStatus ofWord(String word) {
    return valueOf(word.strip().replace(' ', '_'));
  }

  /**
   * What the wire stage alone says of a span: {@link #NOT_ASSESSED} when no conductor was fitted,
   * {@link #INCOMPLETE} when a phase position was not fitted, else {@link #ASSESSED}. The check
   * starts from this status and only makes it worse (coverage, unread classes, rules).
   */
  public static SpanStatus ofWires(SpanWires wires) {
    if (wires.fitted().isEmpty()) {
      return NOT_ASSESSED;
    }
    return wires.reason().isPresent() ? INCOMPLETE : ASSESSED;
  }
}
