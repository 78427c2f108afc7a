package org.clearance.wire;

import java.util.Objects;

/**
 * Bundle membership of a fitted conductor: which bundle it belongs to and how the bundle's
 * sub-conductors lie (Zhou, Jiang and Jiang 2018, methods.md 1.6).
 *
 * @param position name of the bundle (the spec position, or the auto name of an extra)
 * @param index 1-based number of this sub-conductor within the bundle, counted from the right
 *     looking along the span (most negative offset first); 0 when the whole bundle is reported
 *     as one conductor
 * @param count number of sub-conductors found
 * @param spreadM largest distance between two sub-conductor centres in the cross-section, m
 *     (&gt;= 0); when the bundle is reported as one conductor, twice the RMS spread of its points
 *     about the fitted curve
 */
public record BundleInfo(String position, int index, int count, double spreadM) {

  public BundleInfo {
    Objects.requireNonNull(position, "position");
    if (index < 0 || count < 1 || index > count) {
      throw new IllegalArgumentException("bad bundle index " + index + " of " + count);
    }
    if (!(spreadM >= 0)) {
      throw new IllegalArgumentException("spread must be >= 0: " + spreadM);
    }
  }

  /** True when this conductor stands for the whole bundle (sub-conductors not separated). */
  public boolean whole() {
    return index == 0;
  }
}
