package org.clearance.ground;

/**
 * Cross matrix of a ground filter against reference labels and the error measures of Sithole &amp;
 * Vosselman (2004, "Experimental comparison of filter algorithms for bare-Earth extraction from
 * airborne laser scanning point clouds", ISPRS J. 59(1-2):85-101; methods.md 4.1), with Cohen's
 * kappa (Cohen 1960, Educ. Psychol. Meas. 20(1):37-46) from the same matrix.
 *
 * <pre>
 *                     filter: ground   filter: object
 *   reference ground        a                b
 *   reference object        c                d
 * </pre>
 *
 * @param groundAsGround a: reference ground points the filter kept as ground, &gt;= 0
 * @param groundAsObject b: reference ground points the filter rejected (Type I errors), &gt;= 0
 * @param objectAsGround c: reference object points the filter accepted (Type II errors), &gt;= 0
 * @param objectAsObject d: reference object points the filter rejected, &gt;= 0
 */
public record CrossMatrix(
    long groundAsGround, long groundAsObject, long objectAsGround, long objectAsObject) {

  /** @throws IllegalArgumentException when a count is negative */
  public CrossMatrix {
    if (groundAsGround < 0 || groundAsObject < 0 || objectAsGround < 0 || objectAsObject < 0) {
      throw new IllegalArgumentException("counts must be >= 0");
    }
  }

  /** e = a + b + c + d, the number of points compared. */
  public long total() {
    return groundAsGround + groundAsObject + objectAsGround + objectAsObject;
  }

  /** Type I error b / (a + b): share of bare earth rejected, in [0, 1]; NaN without ground. */
  public double typeI() {
    return ratio(groundAsObject, groundAsGround + groundAsObject);
  }

  /** Type II error c / (c + d): share of objects accepted as ground, in [0, 1]; NaN without objects. */
  public double typeII() {
    return ratio(objectAsGround, objectAsGround + objectAsObject);
  }

  /** Total error (b + c) / e, in [0, 1]; NaN when empty. */
  public double totalError() {
    return ratio(groundAsObject + objectAsGround, total());
  }

  /**
   * Cohen's kappa (p_o - p_e) / (1 - p_e), with observed agreement p_o = (a + d) / e and chance
   * agreement p_e = ((a + b)(a + c) + (c + d)(b + d)) / e^2; in [-1, 1]; NaN when empty or when
   * p_e = 1 (a single class on both sides).
   */
  public double kappa() {
    double e = total();
    if (e == 0) {
      return Double.NaN;
    }
    double a = groundAsGround;
    double b = groundAsObject;
    double c = objectAsGround;
    double d = objectAsObject;
    double po = (a + d) / e;
    double pe = ((a + b) * (a + c) + (c + d) * (b + d)) / (e * e);
    return pe == 1 ? Double.NaN : (po - pe) / (1 - pe);
  }

  /** Element-wise sum, for pooling several files. */
  public CrossMatrix plus(CrossMatrix o) {
    return new CrossMatrix(groundAsGround + o.groundAsGround, groundAsObject + o.groundAsObject,
        objectAsGround + o.objectAsGround, objectAsObject + o.objectAsObject);
  }

  private static double ratio(long num, long den) {
    return den == 0 ? Double.NaN : (double) num / den;
  }
}
