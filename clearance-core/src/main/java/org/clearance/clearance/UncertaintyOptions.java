package org.clearance.clearance;

/**
 * Input uncertainties for the clearance uncertainty that the survey and the conductor library do
 * not state themselves (docs/clearance.md). All are one standard uncertainty.
 *
 * @param horizontalRmseM horizontal accuracy of a survey point, RMSE per axis, m (&gt;= 0)
 * @param verticalRmseM vertical accuracy of a survey point, RMSE, m (&gt;= 0)
 * @param modulusRelative relative uncertainty of the conductor's final modulus (&gt;= 0)
 * @param expansionRelative relative uncertainty of its thermal expansion coefficient (&gt;= 0)
 * @param massRelative relative uncertainty of its mass per length (&gt;= 0)
 */
public record UncertaintyOptions(double horizontalRmseM, double verticalRmseM,
    double modulusRelative, double expansionRelative, double massRelative) {

  /**
   * Defaults: a survey of the ASPRS 10-cm vertical accuracy class (RMSE_z 0.10 m; ASPRS
   * Positional Accuracy Standards for Digital Geospatial Data, 2014, Table 7.5, from memory) with
   * 0.15 m horizontal RMSE per axis; modulus and expansion known to 5 %, mass to 1 % (common
   * practice, no source: the spread between makers' data sheets for one code).
   */
  public static final UncertaintyOptions DEFAULT = new UncertaintyOptions(0.15, 0.10, 0.05, 0.05,
      0.01);

  public UncertaintyOptions {
    for (double v : new double[] {horizontalRmseM, verticalRmseM, modulusRelative,
        expansionRelative, massRelative}) {
      if (!(Double.isFinite(v) && v >= 0)) {
        throw new IllegalArgumentException("uncertainties must be finite and >= 0: " + v);
      }
    }
  }

  /**
   * Standard uncertainty of a point's distance from the survey's own accuracy, m: its horizontal
   * and vertical errors projected on the direction to the conductor.
   *
   * @param distance the distance, m
   * @param horizontal its plan component, m
   * @param vertical its vertical component, m
   */
  public double pointSigma(double distance, double horizontal, double vertical) {
    if (!(distance > 0)) {
      return Math.max(horizontalRmseM, verticalRmseM);
    }
    double h = horizontal / distance;
    double v = vertical / distance;
    return Math.sqrt(h * h * horizontalRmseM * horizontalRmseM
        + v * v * verticalRmseM * verticalRmseM);
  }
}
