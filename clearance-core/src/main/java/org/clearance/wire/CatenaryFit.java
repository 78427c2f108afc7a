package org.clearance.wire;

import java.util.Objects;
import java.util.Optional;

/**
 * The result of fitting a catenary to points of one conductor in its span's vertical plane.
 *
 * <p>A failed fit has no curve, no covariance and NaN residual, and says why in
 * {@link #failure()}; a fit never throws for bad data.
 *
 * @param catenary the fitted curve, or empty when the fit failed
 * @param covariance parameter covariance sigma0^2 (J^T W J)^-1, empty when the fit failed or
 *     when there are no redundant points (inliers not more than free parameters)
 * @param rmsResidual RMS orthogonal residual of the inliers, m (approximated as the vertical
 *     residual over sqrt(1 + slope^2)); NaN when the fit failed
 * @param inliers the points the fit kept (Tukey biweight &gt; 0, or RANSAC consensus refined)
 * @param iterations Levenberg-Marquardt iterations (or Brent evaluations) over all rounds
 * @param method which path produced the result
 * @param failure why the fit failed; empty when it converged
 */
public record CatenaryFit(
    Optional<Catenary> catenary,
    Optional<CatenaryCovariance> covariance,
    double rmsResidual,
    PointMask inliers,
    int iterations,
    Method method,
    Optional<String> failure) {

  /** The path that produced a fit. */
  public enum Method {
    /** Parabola start, then Levenberg-Marquardt with Tukey reweighting; all three parameters. */
    ROBUST,
    /** RANSAC consensus on 3-point samples, then the robust refinement of its inliers. */
    RANSAC,
    /** Both attachments known: only c free, 1-D Brent minimisation. */
    TWO_ATTACHMENTS,
    /** One attachment known: s0 and c free. */
    ONE_ATTACHMENT
  }

  public CatenaryFit {
    Objects.requireNonNull(catenary, "catenary");
    Objects.requireNonNull(covariance, "covariance");
    Objects.requireNonNull(inliers, "inliers");
    Objects.requireNonNull(method, "method");
    Objects.requireNonNull(failure, "failure");
    if (catenary.isEmpty() == failure.isEmpty()) {
      throw new IllegalArgumentException("exactly one of catenary and failure must be present");
    }
  }

  /** A failed fit over {@code pointCount} points. */
  static CatenaryFit failed(String reason, int pointCount, int iterations, Method method) {
    return new CatenaryFit(Optional.empty(), Optional.empty(), Double.NaN,
        PointMask.none(pointCount), iterations, method, Optional.of(reason));
  }

  /** True when the fit converged to a curve within the physical bounds. */
  public boolean converged() {
    return failure.isEmpty();
  }

  /** Number of input points (inliers and outliers). */
  public int pointCount() {
    return inliers.size();
  }

  /** Number of inliers. */
  public int inlierCount() {
    return inliers.count();
  }

  /**
   * The fitted curve.
   *
   * @throws IllegalStateException when the fit failed (the message gives the reason)
   */
  public Catenary curve() {
    return catenary.orElseThrow(() -> new IllegalStateException("fit failed: " + failure.get()));
  }
}
