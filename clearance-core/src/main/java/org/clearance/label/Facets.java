package org.clearance.label;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * How much of a planar-looking object lies in a few flat faces: the evidence that tells a roof,
 * a wall or a vehicle's side from the smooth, curving shell of a crown's first returns
 * (docs/labelling.md, "A crown is not a roof").
 */
final class Facets {

  /** Half-angle of a facet: the normals of a flat or pitched roof face, a wall or a side of a
   * vehicle lie within it of the facet's direction (3 cm of noise over a 1 m neighbourhood tilts
   * a normal by about 2 degrees, computed), deg. */
  static final double FACET_ANGLE_DEG = 10.0;
  /** Most facets of a planar object: a hipped roof has four faces (common practice, no source). */
  static final int MAX_FACETS = 4;
  /** Seed normals tried per facet (every k-th planar point), to bound the work on a large
   * object; a facet holding a tenth of the points is hit many times over. */
  static final int FACET_SEEDS = 200;

  /** Least share of a planar object's planar points whose normals lie in its main facets: a
   * roof or a wall is made of a few flat faces, while the smooth shell of a crown curves, its
   * normals turning across it (docs/labelling.md, "A crown is not a roof": roofs of the open
   * files 0.95-1.00, crown shells of the demo feeder 0.23-0.36, measured). */
  static final double ROOF_MIN_FACET_SHARE = 0.7;
  /** Most share of a planar object's points that come from pulses with several returns, where
   * echoes are recorded: a roof stops the pulse (one return; a pulse split at an eave returns
   * twice), while the first return of a crown comes from a pulse that goes on into it and to the
   * ground (docs/labelling.md, "A crown is not a roof": roof of the open autzen file 0.02, crown
   * shells of the demo feeder 1.0, measured). */
  static final double ROOF_MAX_MULTI_PULSE_SHARE = 0.3;

  private Facets() {}

  /**
   * Whether an object with a planar object's shape is made of flat faces and, where the survey
   * records echoes, stops its pulses as a roof does.
   *
   * @param facetShare share of its planar points in its main facets (0-1; NaN: not computed)
   * @param multiPulseShare share of its points from pulses with several returns (0-1; NaN when
   *     the survey's echoes tell nothing, and then the faces alone decide)
   */
  static boolean roofLike(double facetShare, double multiPulseShare) {
    return facetShare >= ROOF_MIN_FACET_SHARE
        && !(multiPulseShare > ROOF_MAX_MULTI_PULSE_SHARE);
  }

  /**
   * The facet share of each object that has a planar object's shape (at least
   * {@link ObjectLabeller#PLANAR_MIN_SHARE} planar points, mean scattering at most
   * {@link ObjectLabeller#PLANAR_MAX_SCATTERING}; NaN for the others): the share of its planar
   * points whose
   * normals lie within {@link #FACET_ANGLE_DEG} of one of at most {@link #MAX_FACETS} facet
   * directions, found greedily: each facet is the seed normal that gathers most of the points
   * not yet in a facet (voting on the normals, as roof faces are found by the clustering of
   * their normals in building reconstruction: common practice, no source).
   */
  static double[] shares(int n, int[] root, LocalShape[] shape,
      int[] count, int[] withShape, int[] planarDominant, double[] sumScattering) {
    double[] share = new double[n];
    Arrays.fill(share, Double.NaN);
    Map<Integer, List<Integer>> members = new HashMap<>();
    for (int r = 0; r < n; r++) {
      if (root[r] == r && count[r] >= ObjectLabeller.MIN_OBJECT_POINTS && withShape[r] > 0
          && (double) planarDominant[r] / withShape[r] >= ObjectLabeller.PLANAR_MIN_SHARE
          && sumScattering[r] / withShape[r] <= ObjectLabeller.PLANAR_MAX_SCATTERING) {
        members.put(r, new ArrayList<>());
      }
    }
    if (members.isEmpty()) {
      return share;
    }
    for (int i = 0; i < n; i++) {
      List<Integer> m = members.get(root[i]);
      if (m != null && shape[i] != null && shape[i].dominant() == 1) {
        m.add(i);
      }
    }
    double cosMax = Math.cos(Math.toRadians(FACET_ANGLE_DEG));
    for (Map.Entry<Integer, List<Integer>> e : members.entrySet()) {
      List<Integer> pts = e.getValue();
      boolean[] taken = new boolean[pts.size()];
      int covered = 0;
      for (int f = 0; f < MAX_FACETS; f++) {
        int step = Math.max(1, pts.size() / FACET_SEEDS);
        int bestSeed = -1;
        int bestCount = 0;
        for (int a = 0; a < pts.size(); a += step) {
          if (taken[a]) {
            continue;
          }
          int c = 0;
          for (int b = 0; b < pts.size(); b++) {
            c += !taken[b] && facing(shape[pts.get(a)], shape[pts.get(b)], cosMax) ? 1 : 0;
          }
          if (c > bestCount) {
            bestCount = c;
            bestSeed = a;
          }
        }
        if (bestSeed < 0) {
          break;
        }
        LocalShape seed = shape[pts.get(bestSeed)];
        for (int b = 0; b < pts.size(); b++) {
          if (!taken[b] && facing(seed, shape[pts.get(b)], cosMax)) {
            taken[b] = true;
            covered++;
          }
        }
      }
      share[e.getKey()] = pts.isEmpty() ? 0 : (double) covered / pts.size();
    }
    return share;
  }

  /** Whether two normals (both turned upwards) lie within the angle whose cosine is given. A
   * wall's normal is level and may point either way: its opposite counts too. */
  private static boolean facing(LocalShape a, LocalShape b, double cosMax) {
    double dot = a.nx() * b.nx() + a.ny() * b.ny() + a.nz() * b.nz();
    return Math.abs(dot) >= cosMax;
  }
}
