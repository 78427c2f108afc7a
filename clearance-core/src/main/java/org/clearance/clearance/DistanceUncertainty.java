package org.clearance.clearance;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The standard uncertainty of one stored distance (methods.md section 7.2, linearised):
 * sigma_d^2 = sum over the conductor's inputs of (p sigma_k(s))^2 + sigma_point^2, where
 * sigma_k(s) is input k's contribution to the conductor position at the station s of the nearest
 * approach ({@link StateUncertainty}), p = |vertical| / distance for a state hanging in its vertical
 * plane (its inputs move it vertically) and 1 for a swinging state (an upper bound), and
 * sigma_point the survey point's own accuracy projected on the distance direction
 * ({@link UncertaintyOptions#pointSigma}).
 *
 * @param sigma standard uncertainty of the distance, m
 * @param dominant the input contributing most, such as {@code survey temperature}
 * @param inputs input names, the point accuracy last
 * @param contributions each input's contribution, m, in the order of {@code inputs}
 */
public record DistanceUncertainty(double sigma, String dominant, List<String> inputs,
    List<Double> contributions) {

  /** Name of the survey point's own accuracy among the inputs. */
  public static final String POINT = "survey point accuracy";

  public DistanceUncertainty {
    Objects.requireNonNull(dominant, "dominant");
    inputs = List.copyOf(inputs);
    contributions = List.copyOf(contributions);
  }

  /**
   * The uncertainty of a distance.
   *
   * @param state the conductor state's uncertainty, or null when unknown (then only the point's
   *     accuracy counts, and the caller must say so)
   * @param options the survey point accuracy
   * @param distance the distance, m
   * @param horizontal its plan component, m
   * @param vertical its vertical component, m (point above the conductor positive)
   * @param station station of the nearest conductor point, m
   */
  public static DistanceUncertainty of(StateUncertainty state, UncertaintyOptions options,
      double distance, double horizontal, double vertical, double station) {
    List<String> names = new ArrayList<>();
    List<Double> parts = new ArrayList<>();
    if (state != null) {
      double p = state.swings() || !(distance > 0) ? 1 : Math.abs(vertical) / distance;
      for (int k = 0; k < state.inputs().size(); k++) {
        names.add(state.inputs().get(k));
        parts.add(p * state.sigma(k, station));
      }
    }
    names.add(POINT);
    parts.add(options.pointSigma(distance, horizontal, vertical));
    double v = 0;
    int top = 0;
    for (int k = 0; k < parts.size(); k++) {
      v += parts.get(k) * parts.get(k);
      if (parts.get(k) > parts.get(top)) {
        top = k;
      }
    }
    return new DistanceUncertainty(Math.sqrt(v), names.get(top), names, parts);
  }
}
