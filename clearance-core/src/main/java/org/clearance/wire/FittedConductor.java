package org.clearance.wire;

import java.util.Objects;
import java.util.Optional;
import org.clearance.line.ConductorPosition;

/**
 * One conductor of one span as the wire finder leaves it.
 *
 * <p>Only a conductor with status {@link WireStatus#FITTED} may be used to measure clearances; a
 * conductor {@link WireStatus#NOT_ASSESSED} may still carry its curve and quality (for the
 * record) but its span must never be reported clear on its account.
 *
 * @param name position name from the line specification ({@code B}), with the sub-conductor
 *     number for a bundle ({@code B.1}), or an automatic name ({@code extra1}) for a conductor
 *     the specification lacks
 * @param role phase conductor or shield wire
 * @param position the specification position it was matched to; empty for an extra
 * @param curve the fitted conductor in the survey state (plan line from attachment A at the
 *     span's first structure to attachment B at its second, catenary in that plane); empty when
 *     no curve could be fitted, or (not assessed) when its elevation uncertainty exceeds the
 *     quality threshold (a short piece at one end of the span extrapolates wildly)
 * @param covariance covariance of the catenary parameters in the curve's plane; empty when the
 *     fit has no redundancy or failed
 * @param quality point count, coverage, residual, gap
 * @param surveySwingRad how far the conductor was swung from the vertical by wind while
 *     surveyed, radians (positive towards positive offsets, to the left looking from A to B):
 *     {@code curve} is its vertical-plane equivalent, and the wire itself lay up to
 *     sag x tan(swing) to the side of it; 0 when the points show no swing, NaN when not fitted
 * @param status fitted or not assessed
 * @param reason why not assessed; empty when fitted
 * @param bundle bundle membership; empty for a single conductor
 * @param points where its own survey points lie (first, last and lowest point); empty for a
 *     position no wire was found for
 */
public record FittedConductor(
    String name,
    ConductorPosition.Role role,
    Optional<String> position,
    Optional<ConductorCurve> curve,
    Optional<CatenaryCovariance> covariance,
    WireQuality quality,
    double surveySwingRad,
    WireStatus status,
    Optional<String> reason,
    Optional<BundleInfo> bundle,
    Optional<WireExtent> points) {

  public FittedConductor {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(role, "role");
    Objects.requireNonNull(position, "position");
    Objects.requireNonNull(curve, "curve");
    Objects.requireNonNull(covariance, "covariance");
    Objects.requireNonNull(quality, "quality");
    Objects.requireNonNull(status, "status");
    Objects.requireNonNull(reason, "reason");
    Objects.requireNonNull(bundle, "bundle");
    Objects.requireNonNull(points, "points");
    if ((status == WireStatus.FITTED) != reason.isEmpty()) {
      throw new IllegalArgumentException("a reason is given exactly when not assessed: " + name);
    }
    if (status == WireStatus.FITTED && curve.isEmpty()) {
      throw new IllegalArgumentException("a fitted conductor needs its curve: " + name);
    }
  }

  /** A specification position with no conductor found. */
  static FittedConductor missing(ConductorPosition p, String reason) {
    return new FittedConductor(p.position(), p.role(), Optional.of(p.position()),
        Optional.empty(), Optional.empty(), WireQuality.none(), Double.NaN,
        WireStatus.NOT_ASSESSED,
        Optional.of(reason), Optional.empty(), Optional.empty());
  }

  /** True when fitted within every quality threshold. */
  public boolean isFitted() {
    return status == WireStatus.FITTED;
  }
}
