package org.clearance.clearance;

import java.util.Objects;
import java.util.Optional;
import org.clearance.wire.CatenaryCovariance;
import org.clearance.wire.ConductorCurve;

/**
 * A conductor as fitted to the survey, handed from the wire finder to the line conditions.
 *
 * @param name conductor name (e.g. {@code B}, {@code B.1} for a sub-conductor, or an automatic
 *     name for a conductor the specification lacks)
 * @param position the line specification's position it belongs to, or empty for an extra
 * @param role {@code phase}, {@code shield} or {@code unknown}
 * @param curve the fitted conductor as surveyed
 * @param covariance the fit's parameter covariance, or empty
 */
public record SurveyedConductor(String name, String position, String role, ConductorCurve curve,
    Optional<CatenaryCovariance> covariance) {

  /** A conductor without a fit covariance. */
  public SurveyedConductor(String name, String position, String role, ConductorCurve curve) {
    this(name, position, role, curve, Optional.empty());
  }

  public SurveyedConductor {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(position, "position");
    Objects.requireNonNull(role, "role");
    Objects.requireNonNull(curve, "curve");
    Objects.requireNonNull(covariance, "covariance");
  }
}
