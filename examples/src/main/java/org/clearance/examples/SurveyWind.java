package org.clearance.examples;

/**
 * The wind of the survey day: each span's wires hung swung aside about their chords by a small
 * angle while the survey was flown (issue 9: real wires hung swung 1-3 degrees). Every wire of a
 * span swings by the same angle, towards the left looking along the line (the span's direction
 * from its first structure to its second); the angle of each span is drawn from the seed, between
 * a third of the largest swing and the largest. The truth's conductors stay the still-air curves;
 * the points of a swung wire are the curve rotated about its chord.
 */
final class SurveyWind {

  private SurveyWind() {}

  /**
   * The swing of span {@code span}'s wires, radians, positive towards the left looking from its
   * first structure to its second; 0 when the options have no wind.
   */
  static double swingRad(DemoOptions options, int span) {
    if (!(options.surveySwingDeg() > 0)) {
      return 0;
    }
    long h = options.seed() * 0x9E3779B97F4A7C15L + 0x632BE59BD9B4E019L * (span + 1);
    h ^= h >>> 31;
    h *= 0xBF58476D1CE4E5B9L;
    h ^= h >>> 29;
    double u = (h >>> 11) * 0x1.0p-53; // uniform in [0, 1)
    double max = Math.toRadians(options.surveySwingDeg());
    return max * (1 + 2 * u) / 3;
  }

  /**
   * Rotates point p about the axis through a and b by phi (Rodrigues' rotation formula), in
   * place; positive phi turns a point below the axis towards the left of the direction a to b.
   */
  static void rotate(double[] p, double[] a, double[] b, double phi) {
    double kx = b[0] - a[0];
    double ky = b[1] - a[1];
    double kz = b[2] - a[2];
    double n = Math.sqrt(kx * kx + ky * ky + kz * kz);
    kx /= n;
    ky /= n;
    kz /= n;
    double vx = p[0] - a[0];
    double vy = p[1] - a[1];
    double vz = p[2] - a[2];
    double c = Math.cos(phi);
    double s = Math.sin(phi);
    double dot = kx * vx + ky * vy + kz * vz;
    double cx = ky * vz - kz * vy;
    double cy = kz * vx - kx * vz;
    double cz = kx * vy - ky * vx;
    p[0] = a[0] + vx * c + cx * s + kx * dot * (1 - c);
    p[1] = a[1] + vy * c + cy * s + ky * dot * (1 - c);
    p[2] = a[2] + vz * c + cz * s + kz * dot * (1 - c);
  }
}
