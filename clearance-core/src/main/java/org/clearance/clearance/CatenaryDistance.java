package org.clearance.clearance;

import java.util.Objects;
import org.clearance.io.Hyperbolic;
import org.clearance.line.SpanFrame;
import org.clearance.wire.Catenary;
import org.clearance.wire.ConductorCurve;

/**
 * Exact 3D distance from points to one conductor between its attachments, hanging or swung about
 * its chord (docs/methods.md section 6.1).
 *
 * <p>In the conductor's frame (station s, offset e, elevation z) the curve is C(s) = (s, 0, z(s))
 * for s in [0, L]. The squared distance from a point q = (s_q, e_q, z_q) is
 * D^2(s) = (s - s_q)^2 + e_q^2 + (z(s) - z_q)^2, stationary where
 * g(s) = (s - s_q) + (z(s) - z_q) z'(s) = 0, g'(s) = cosh t (cosh t + (z(s) - z_q) / c). While
 * z_q &lt; z(s) + c cosh t on the whole span (a point less than c above the curve's vertex - every
 * practical case) g' &gt; 0, D^2 is convex and the minimiser on [0, L] is an endpoint or the one
 * root of g, found by Newton's method from s_q safeguarded by bisection on the bracket
 * [0, L]. Points higher than that fall back to a scan of g with the same root finder on each
 * bracket, plus the endpoints.
 *
 * <p>Swing: the conductor rotated by phi about its chord (the straight line through both
 * attachments), positive towards +offset (left looking from A to B) - methods.md section 3.6.
 * The distance to the swung conductor is the distance from the point rotated by -phi to the
 * hanging one. Over a range of swing angles the minimum has a closed form: writing the point and
 * each curve point in cylindrical coordinates about the chord, |q - R(phi) C(s)|^2 =
 * (a_q - a_s)^2 + r_q^2 + r_s^2 - 2 r_q r_s cos(psi - phi), where the curve's radial direction is
 * the same (straight down from the chord, in the vertical plane) for every s and r_s &gt;= 0 since
 * a catenary lies below its chord. So each term falls as cos(psi - phi) rises, hence so does
 * their minimum over s, and the distance over a swing range is least at the angle of the range
 * nearest the point's own angle psi about the chord. {@link #closestSwingAngle} returns it.
 *
 * <p>No allocation in the primitive methods ({@link #distance(double, double, double)} and
 * friends); an instance is immutable and safe to share between threads.
 */
public final class CatenaryDistance {

  /** Root-finder steps at most: each failed Newton step bisects, 60 halvings of 1e4 m leave
   * 1e-14 m. */
  static final int MAX_ITERATIONS = 60;
  /** Station step below which the root finder stops, m: a million times finer than 1 mm. */
  static final double STATION_TOLERANCE = 1e-6;
  /** Intervals of the scan for points more than c above the vertex (non-convex case). */
  static final int SCAN_INTERVALS = 512;

  private final ConductorCurve conductor;
  private final SpanFrame plan;
  private final double length;
  private final double s0;
  private final double z0;
  private final double c;
  private final double zA;
  /** Unit chord direction in the (s, z) plane. */
  private final double ks;
  private final double kz;
  /** z_q below this (m), D^2 is convex in s on [0, L]. */
  private final double convexCeiling;

  /** Distances to the given conductor. */
  public CatenaryDistance(ConductorCurve conductor) {
    this.conductor = Objects.requireNonNull(conductor, "conductor");
    plan = conductor.plan();
    Catenary cat = conductor.curve();
    length = conductor.length();
    s0 = cat.s0();
    z0 = cat.z0();
    c = cat.c();
    zA = conductor.zA();
    double dz = conductor.zB() - zA;
    double chord = Math.hypot(length, dz);
    ks = length / chord;
    kz = dz / chord;
    double tMin = Math.min(Math.max(0, -s0 / c), (length - s0) / c);
    convexCeiling = z0 + c * (2 * Hyperbolic.cosh(tMin) - 1);
  }

  /** Closest approach of point (x, y, z), m, to the hanging conductor (static shortcut). */
  public static ConductorDistance between(ConductorCurve conductor, double x, double y,
      double z) {
    return new CatenaryDistance(conductor).closest(x, y, z);
  }

  /** The conductor measured to. */
  public ConductorCurve conductor() {
    return conductor;
  }

  /**
   * Distance from point (x, y, z) to the hanging conductor, m.
   *
   * @param x easting, m; y northing, m; z elevation, m (finite; NaN in gives NaN out)
   */
  public double distance(double x, double y, double z) {
    double sq = plan.station(x, y);
    double eq = plan.offset(x, y);
    double s = closestStation(sq, z);
    double dz = curveZ(s) - z;
    return Math.sqrt((s - sq) * (s - sq) + eq * eq + dz * dz);
  }

  /**
   * Distance from point (x, y, z), m, to the conductor swung by phi about its chord, m.
   *
   * @param phi swing angle, radians, positive towards +offset (left looking from A to B)
   */
  public double distance(double x, double y, double z, double phi) {
    double ps = plan.station(x, y);
    double pe = plan.offset(x, y);
    double pz = z - zA;
    double cos = Math.cos(phi);
    double sin = -Math.sin(phi); // rotate the point by -phi
    double dot = ks * ps + kz * pz;
    double rs = ps * cos + (-kz * pe) * sin + ks * dot * (1 - cos);
    double re = pe * cos + (kz * ps - ks * pz) * sin;
    double rz = pz * cos + (ks * pe) * sin + kz * dot * (1 - cos);
    double s = closestStation(rs, rz + zA);
    double dz = curveZ(s) - zA - rz;
    return Math.sqrt((s - rs) * (s - rs) + re * re + dz * dz);
  }

  /**
   * Swing angle within [-phiMax, phiMax] at which the swung conductor comes closest to point
   * (x, y, z), radians: the point's own angle about the chord, measured from straight below it,
   * clamped to the range (see the class comment for why).
   *
   * @param phiMax largest swing either way, radians, in [0, pi]
   * @throws IllegalArgumentException when phiMax is outside [0, pi]
   */
  public double closestSwingAngle(double x, double y, double z, double phiMax) {
    if (!(phiMax >= 0 && phiMax <= Math.PI)) {
      throw new IllegalArgumentException("phiMax must be in [0, pi]: " + phiMax);
    }
    double ps = plan.station(x, y);
    double pe = plan.offset(x, y);
    double pz = z - zA;
    // hanging direction m = (kz, 0, -ks); k x m = (0, 1, 0) is +offset
    double psi = Math.atan2(pe, kz * ps - ks * pz);
    if (Math.abs(psi) <= phiMax) {
      return psi;
    }
    return Math.cos(psi - phiMax) >= Math.cos(psi + phiMax) ? phiMax : -phiMax;
  }

  /**
   * Swing angle within [phiLo, phiHi] at which the swung conductor comes closest to point
   * (x, y, z), radians: the angle of the range nearest the point's own angle about the chord (the
   * class comment shows the distance falls monotonically towards that angle).
   *
   * @param phiLo smallest swing, radians, in [-pi, phiHi]
   * @param phiHi largest swing, radians, in [phiLo, pi]
   * @throws IllegalArgumentException when the range is empty or outside [-pi, pi]
   */
  public double closestSwingAngle(double x, double y, double z, double phiLo, double phiHi) {
    if (!(phiLo >= -Math.PI && phiLo <= phiHi && phiHi <= Math.PI)) {
      throw new IllegalArgumentException("swing range must lie in [-pi, pi]: " + phiLo + ", "
          + phiHi);
    }
    double ps = plan.station(x, y);
    double pe = plan.offset(x, y);
    double pz = z - zA;
    double psi = Math.atan2(pe, kz * ps - ks * pz);
    if (psi >= phiLo && psi <= phiHi) {
      return psi;
    }
    return Math.cos(psi - phiLo) >= Math.cos(psi - phiHi) ? phiLo : phiHi;
  }

  /**
   * Smallest distance from point (x, y, z) to the conductor over all swings in
   * [-phiMax, phiMax], m.
   *
   * @param phiMax largest swing either way, radians, in [0, pi]
   */
  public double minDistanceOverSwing(double x, double y, double z, double phiMax) {
    return distance(x, y, z, closestSwingAngle(x, y, z, phiMax));
  }

  /** Closest approach of point (x, y, z), m, to the hanging conductor. */
  public ConductorDistance closest(double x, double y, double z) {
    return closest(x, y, z, 0);
  }

  /** Closest approach of point (x, y, z), m, to the conductor swung by phi, radians. */
  public ConductorDistance closest(double x, double y, double z, double phi) {
    return closestAt(x, y, z, phi, closestStation(x, y, z, phi));
  }

  /**
   * The approach of point (x, y, z), m, to the curve point at station s (normally the one from
   * {@link #closestStation(double, double, double, double)}) of the conductor swung by phi.
   */
  public ConductorDistance closestAt(double x, double y, double z, double phi, double s) {
    double ps = plan.station(x, y);
    double pe = plan.offset(x, y);
    double pz = z - zA;
    double cos = Math.cos(phi);
    // the closest curve point, relative to A, swung back by +phi
    double cs = s;
    double cz = curveZ(s) - zA;
    double sn = Math.sin(phi);
    double cdot = ks * cs + kz * cz;
    double ws = cs * cos + ks * cdot * (1 - cos);
    double we = (kz * cs - ks * cz) * sn;
    double wz = cz * cos + kz * cdot * (1 - cos);
    double dS = ps - ws;
    double dE = pe - we;
    double dZ = pz - wz;
    double horizontal = Math.sqrt(dS * dS + dE * dE); // Math.hypot is slow; no overflow here
    return new ConductorDistance(Math.sqrt(horizontal * horizontal + dZ * dZ), s, horizontal,
        dZ, phi, plan.x(ws, we), plan.y(ws, we), wz + zA);
  }

  /**
   * Station of the closest curve point to point (x, y, z), m, with the conductor swung by phi,
   * radians: the solve shared by {@link #distanceAt} and {@link #closestAt}, so that a caller
   * who needs the distance first and the details later solves once.
   */
  public double closestStation(double x, double y, double z, double phi) {
    if (phi == 0) {
      return closestStation(plan.station(x, y), z);
    }
    double ps = plan.station(x, y);
    double pe = plan.offset(x, y);
    double pz = z - zA;
    double cos = Math.cos(phi);
    double sin = -Math.sin(phi);
    double dot = ks * ps + kz * pz;
    double rs = ps * cos + (-kz * pe) * sin + ks * dot * (1 - cos);
    double rz = pz * cos + (ks * pe) * sin + kz * dot * (1 - cos);
    return closestStation(rs, rz + zA);
  }

  /** Distance from (x, y, z), m, to the curve point at station s of the conductor swung by phi. */
  public double distanceAt(double x, double y, double z, double phi, double s) {
    if (phi == 0) {
      double ds = s - plan.station(x, y);
      double de = plan.offset(x, y);
      double dz = curveZ(s) - z;
      return Math.sqrt(ds * ds + de * de + dz * dz);
    }
    double ps = plan.station(x, y);
    double pe = plan.offset(x, y);
    double pz = z - zA;
    double cos = Math.cos(phi);
    double sin = -Math.sin(phi);
    double dot = ks * ps + kz * pz;
    double rs = ps * cos + (-kz * pe) * sin + ks * dot * (1 - cos);
    double re = pe * cos + (kz * ps - ks * pz) * sin;
    double rz = pz * cos + (ks * pe) * sin + kz * dot * (1 - cos);
    double dz = curveZ(s) - zA - rz;
    return Math.sqrt((s - rs) * (s - rs) + re * re + dz * dz);
  }

  /** Closest approach of point (x, y, z), m, over swings in [-phiMax, phiMax], radians. */
  public ConductorDistance closestOverSwing(double x, double y, double z, double phiMax) {
    return closest(x, y, z, closestSwingAngle(x, y, z, phiMax));
  }

  private double curveZ(double s) {
    return z0 + c * (Hyperbolic.cosh((s - s0) / c) - 1);
  }

  /** g(s) = (s - sq) + (z(s) - zq) z'(s). */
  private double g(double s, double sq, double zq) {
    double t = (s - s0) / c;
    double e = Math.exp(t);
    double ie = 1 / e;
    double ch = 0.5 * (e + ie);
    double sh = 0.5 * (e - ie);
    return (s - sq) + (z0 + c * (ch - 1) - zq) * sh;
  }

  /** Station in [0, L] of the curve point closest to (sq, zq) in the (s, z) plane, m. */
  private double closestStation(double sq, double zq) {
    if (!(Double.isFinite(sq) && Double.isFinite(zq))) {
      return Double.NaN;
    }
    if (zq < convexCeiling) {
      return convexRoot(sq, zq);
    }
    return scan(sq, zq);
  }

  /** Non-convex case: every bracketed root of g, plus both ends; the best of them. */
  private double scan(double sq, double zq) {
    double best = 0;
    double bestD = squared(0, sq, zq);
    double dEnd = squared(length, sq, zq);
    if (dEnd < bestD) {
      best = length;
      bestD = dEnd;
    }
    double prevS = 0;
    double prevG = g(0, sq, zq);
    for (int i = 1; i <= SCAN_INTERVALS; i++) {
      double s = length * i / SCAN_INTERVALS;
      double gs = g(s, sq, zq);
      if (prevG < 0 && gs >= 0) {
        double r = root(prevS, s, 0.5 * (prevS + s), sq, zq);
        double d = squared(r, sq, zq);
        if (d < bestD) {
          best = r;
          bestD = d;
        }
      }
      prevS = s;
      prevG = gs;
    }
    return best;
  }

  private double squared(double s, double sq, double zq) {
    double dz = curveZ(s) - zq;
    return (s - sq) * (s - sq) + dz * dz;
  }

  /**
   * Convex case: Newton from the point's own station, clamped to [0, L], safeguarded by
   * bisection. g is increasing, so an end is the answer exactly when g there has the sign that
   * pushes beyond it; ends are evaluated only when a step tries to leave the span.
   */
  private double convexRoot(double sq, double zq) {
    double lo = 0;
    double hi = length;
    boolean loKnown = false; // g(lo) < 0 established
    boolean hiKnown = false; // g(hi) > 0 established
    double s = Math.min(length, Math.max(0, sq));
    for (int i = 0; i < MAX_ITERATIONS; i++) {
      double t = (s - s0) / c;
      double e = Math.exp(t);
      double ie = 1 / e;
      double ch = 0.5 * (e + ie);
      double sh = 0.5 * (e - ie);
      double dz = z0 + c * (ch - 1) - zq;
      double gs = (s - sq) + dz * sh;
      if (gs < 0) {
        if (s == length) {
          return length;
        }
        lo = s;
        loKnown = true;
      } else if (gs > 0) {
        if (s == 0) {
          return 0;
        }
        hi = s;
        hiKnown = true;
      } else {
        return s;
      }
      double next = s - gs / (ch * (ch + dz / c)); // g' > 0 in the convex case
      if (!(next > lo)) {
        if (!loKnown) {
          if (g(lo, sq, zq) >= 0) {
            return lo;
          }
          loKnown = true;
        }
        next = 0.5 * (lo + hi);
      } else if (!(next < hi)) {
        if (!hiKnown) {
          if (g(hi, sq, zq) <= 0) {
            return hi;
          }
          hiKnown = true;
        }
        next = 0.5 * (lo + hi);
      }
      if (Math.abs(next - s) < STATION_TOLERANCE) {
        return next;
      }
      s = next;
    }
    return s;
  }

  /** Root of g in [lo, hi] with g(lo) &lt; 0 &lt;= g(hi): Newton safeguarded by bisection. */
  private double root(double lo, double hi, double start, double sq, double zq) {
    double s = start;
    for (int i = 0; i < MAX_ITERATIONS; i++) {
      double t = (s - s0) / c;
      double e = Math.exp(t);
      double ie = 1 / e;
      double ch = 0.5 * (e + ie);
      double sh = 0.5 * (e - ie);
      double dz = z0 + c * (ch - 1) - zq;
      double gs = (s - sq) + dz * sh;
      if (gs == 0) {
        return s;
      }
      if (gs < 0) {
        lo = s;
      } else {
        hi = s;
      }
      double gp = ch * (ch + dz / c);
      double next = s - gs / gp;
      if (!(gp > 0 && next > lo && next < hi)) {
        next = 0.5 * (lo + hi);
      }
      if (Math.abs(next - s) < STATION_TOLERANCE || hi - lo < STATION_TOLERANCE) {
        return next;
      }
      s = next;
    }
    return s;
  }
}
