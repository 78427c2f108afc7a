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
 * @param curve the fitted conductor, still air (its vertical projection as surveyed)
 * @param covariance the fit's parameter covariance, or empty
 * @param surveySwingRad how far the wind swung it from the vertical while surveyed, radians,
 *     positive towards the left looking from attachment A to B; 0 when the survey showed none
 */
public record SurveyedConductor(String name, String position, String role, ConductorCurve curve,
    Optional<CatenaryCovariance> covariance, double surveySwingRad) {

  /** A conductor without a fit covariance that hung still when surveyed. */
  public SurveyedConductor(String name, String position, String role, ConductorCurve curve) {
    this(name, position, role, curve, Optional.empty(), 0);
  }

  /** A conductor that hung still when surveyed. */
  public SurveyedConductor(String name, String position, String role, ConductorCurve curve,
      Optional<CatenaryCovariance> covariance) {
    this(name, position, role, curve, covariance, 0);
  }

  public SurveyedConductor {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(position, "position");
    Objects.requireNonNull(role, "role");
    Objects.requireNonNull(curve, "curve");
    Objects.requireNonNull(covariance, "covariance");
    if (!(Math.abs(surveySwingRad) < Math.PI / 2)) {
      surveySwingRad = 0;
    }
  }
}
