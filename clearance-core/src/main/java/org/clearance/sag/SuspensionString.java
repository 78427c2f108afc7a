package org.clearance.sag;

/**
 * A suspension insulator string at one attachment, free to swing across the line under wind.
 *
 * @param length string length from the cross-arm pivot to the conductor attachment, m (&gt; 0)
 * @param windSpan length of conductor whose wind load the string carries, m (&gt; 0)
 * @param weightSpan length of conductor whose weight the string carries, m (&gt; 0)
 */
public record SuspensionString(double length, double windSpan, double weightSpan) {

  public SuspensionString {
    requirePositive("insulator length", length);
    requirePositive("wind span", windSpan);
    requirePositive("weight span", weightSpan);
  }

  /**
   * A string between two spans with no better data: wind span = weight span = half the sum of the
   * adjacent plan span lengths (methods.md 3.6; the weight span really runs between the adjacent
   * low points and differs on inclined spans).
   *
   * @param length string length, m (&gt; 0)
   * @param spanBefore plan length of the span on one side, m (&gt; 0)
   * @param spanAfter plan length of the span on the other side, m (&gt; 0)
   */
  public static SuspensionString between(double length, double spanBefore, double spanAfter) {
    requirePositive("span before", spanBefore);
    requirePositive("span after", spanAfter);
    double half = 0.5 * (spanBefore + spanAfter);
    return new SuspensionString(length, half, half);
  }

  private static void requirePositive(String name, double v) {
    if (!(Double.isFinite(v) && v > 0)) {
      throw new IllegalArgumentException(name + " must be positive: " + v + " m");
    }
  }
}
