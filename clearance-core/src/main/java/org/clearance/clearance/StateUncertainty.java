package org.clearance.clearance;

import java.util.List;
import java.util.Objects;

/**
 * How uncertain one conductor's curve is in one line condition, as a function of the station along
 * the span: the standard uncertainty of the conductor's position that each input contributes, at
 * evenly spaced stations from attachment A to B (linearised propagation, methods.md section 7.2).
 *
 * <p>For a state that hangs in its vertical plane every input moves the conductor vertically, so
 * a point whose nearest approach has vertical share |v| / d sees |v| / d of it; a state that may
 * swing moves with its sag in the swing plane, and the full value is taken (an upper bound).
 *
 * @param length horizontal span length, m (&gt; 0); stations run from 0 to it
 * @param inputs names of the inputs, such as {@code survey temperature}
 * @param sigmas per input, its standard uncertainty of the conductor position at each station, m
 *     (each array of the same length, at least 2, stations evenly spaced)
 * @param swings whether the state may swing (then the whole value counts in every direction)
 */
public record StateUncertainty(double length, List<String> inputs, List<double[]> sigmas,
    boolean swings) {

  public StateUncertainty {
    inputs = List.copyOf(inputs);
    sigmas = sigmas.stream().map(double[]::clone).toList();
    if (inputs.size() != sigmas.size()) {
      throw new IllegalArgumentException("one sigma profile per input");
    }
    int n = sigmas.isEmpty() ? 2 : sigmas.get(0).length;
    for (double[] s : sigmas) {
      Objects.requireNonNull(s, "sigma profile");
      if (s.length != n || n < 2) {
        throw new IllegalArgumentException("every profile has the same stations, at least 2");
      }
    }
    if (!(Double.isFinite(length) && length > 0)) {
      throw new IllegalArgumentException("length must be positive: " + length);
    }
  }

  /** Number of stations of the profiles. */
  public int stations() {
    return sigmas.isEmpty() ? 0 : sigmas.get(0).length;
  }

  /**
   * One input's standard uncertainty of the conductor position at station s, m: linear between
   * the stations, the end values beyond them.
   *
   * @param input index into {@link #inputs()}
   * @param s station from attachment A, m
   */
  public double sigma(int input, double s) {
    double[] p = sigmas.get(input);
    int n = p.length;
    double u = Math.max(0, Math.min(n - 1, s / length * (n - 1)));
    int i = Math.min(n - 2, (int) Math.floor(u));
    double f = u - i;
    return p[i] * (1 - f) + p[i + 1] * f;
  }

  /** The combined standard uncertainty of the conductor position at station s, m. */
  public double total(double s) {
    double v = 0;
    for (int k = 0; k < inputs.size(); k++) {
      double x = sigma(k, s);
      v += x * x;
    }
    return Math.sqrt(v);
  }

  /** Largest combined value over the stations, m. */
  public double largest() {
    double best = 0;
    for (int j = 0; j < stations(); j++) {
      best = Math.max(best, total(j * length / (stations() - 1)));
    }
    return best;
  }
}
