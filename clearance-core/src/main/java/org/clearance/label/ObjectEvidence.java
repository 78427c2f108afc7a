package org.clearance.label;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.clearance.survey.LongHashSet;

/**
 * The evidence of each clustered object of a block ({@link ObjectLabeller}'s step 4: size,
 * height, shape shares, height profile, echo structure, facets) and the kind it is given
 * ({@link ObjectLabeller#decide}).
 */
final class ObjectEvidence {

  private ObjectEvidence() {}

  /** The objects' evidence and kinds; {@code kindOf} receives the kind at each object's root. */
  static List<LabelledObject> objects(LabelPoints p, int[] root, LocalShape[] shape,
      boolean echoes, ObjectKind[] kindOf, List<Integer> roots) {
    int n = p.size;
    int[] count = new int[n];
    int[] withShape = new int[n];
    int[] planarDominant = new int[n];
    int[] linearDominant = new int[n];
    double[] xMin = new double[n];
    double[] xMax = new double[n];
    double[] yMin = new double[n];
    double[] yMax = new double[n];
    Arrays.fill(xMin, Double.POSITIVE_INFINITY);
    Arrays.fill(yMin, Double.POSITIVE_INFINITY);
    Arrays.fill(xMax, Double.NEGATIVE_INFINITY);
    Arrays.fill(yMax, Double.NEGATIVE_INFINITY);
    int[] multi = new int[n];
    int[] multiPulse = new int[n];
    double[] sumLinearity = new double[n];
    double[] sumPlanarity = new double[n];
    double[] sumScattering = new double[n];
    int[] top = new int[n];
    Arrays.fill(top, -1);
    for (int i = 0; i < n; i++) {
      int r = root[i];
      count[r]++;
      multi[r] += p.returnNumber[i] >= 2 ? 1 : 0;
      multiPulse[r] += p.returnNumber[i] >= 2 || p.returns[i] >= 2 ? 1 : 0;
      if (top[r] < 0 || p.hag[i] > p.hag[top[r]]) {
        top[r] = i;
      }
      xMin[r] = Math.min(xMin[r], p.x[i]);
      xMax[r] = Math.max(xMax[r], p.x[i]);
      yMin[r] = Math.min(yMin[r], p.y[i]);
      yMax[r] = Math.max(yMax[r], p.y[i]);
      LocalShape f = shape[i];
      if (f != null) {
        withShape[r]++;
        sumLinearity[r] += f.linearity();
        sumPlanarity[r] += f.planarity();
        sumScattering[r] += f.scattering();
        planarDominant[r] += f.dominant() == 1 ? 1 : 0;
        linearDominant[r] += f.dominant() == 0 ? 1 : 0;
      }
    }
    int[] upperCells = new int[n];
    int[] base = new int[n];
    LongHashSet cells = new LongHashSet();
    for (int i = 0; i < n; i++) {
      int r = root[i];
      if (count[r] < ObjectLabeller.MIN_OBJECT_POINTS) {
        continue;
      }
      double h = p.hag[top[r]];
      if (p.hag[i] < LabelPoints.MIN_HAG_M + ObjectLabeller.BASE_QUARTER * (h - LabelPoints.MIN_HAG_M)) {
        base[r]++;
      }
      if (p.hag[i] < 0.5 * h) {
        continue;
      }
      long cx = (long) Math.floor(p.x[i] / ObjectLabeller.SPREAD_CELL_M);
      long cy = (long) Math.floor(p.y[i] / ObjectLabeller.SPREAD_CELL_M);
      long key = ((long) r * 0x9E3779B97F4A7C15L) ^ (cx * 0xC2B2AE3D27D4EB4FL) ^ (cy * 31L);
      if (cells.add(key)) {
        upperCells[r]++;
      }
    }
    double[] facetShare = Facets.shares(p.size, root, shape, count, withShape, planarDominant,
        sumScattering);
    List<LabelledObject> out = new ArrayList<>();
    for (int r = 0; r < n; r++) {
      if (root[r] != r || count[r] < ObjectLabeller.LINEAR_MIN_POINTS || withShape[r] == 0) {
        continue;
      }
      if (count[r] < ObjectLabeller.MIN_OBJECT_POINTS) {
        // a piece too small to judge otherwise: linear or unjudged; not listed (a fragment of
        // a man-made object beside it may still take that object's kind, step 6)
        if (ObjectLabeller.isLinear(sumLinearity[r] / withShape[r], (double) linearDominant[r] / withShape[r],
            Math.hypot(xMax[r] - xMin[r], yMax[r] - yMin[r]))) {
          kindOf[r] = ObjectKind.LINEAR;
        }
        continue;
      }
      double height = p.hag[top[r]];
      double linearity = sumLinearity[r] / withShape[r];
      double planarity = sumPlanarity[r] / withShape[r];
      double scattering = sumScattering[r] / withShape[r];
      double planarShare = (double) planarDominant[r] / withShape[r];
      double spread = upperCells[r] * ObjectLabeller.SPREAD_CELL_M * ObjectLabeller.SPREAD_CELL_M / height;
      double baseShare = (double) base[r] / count[r];
      double multiShare = echoes ? (double) multi[r] / count[r] : Double.NaN;
      double pulseShare = echoes ? (double) multiPulse[r] / count[r] : Double.NaN;
      double lengthM = Math.hypot(xMax[r] - xMin[r], yMax[r] - yMin[r]);
      double linearShare = (double) linearDominant[r] / withShape[r];
      ObjectKind kind = ObjectLabeller.decide(height, linearity, scattering, planarShare, spread, baseShare,
          multiShare, pulseShare, facetShare[r]);
      if (kind == ObjectKind.VEGETATION && ObjectLabeller.isLinear(linearity, linearShare, lengthM)) {
        kind = ObjectKind.LINEAR;
      }
      kindOf[r] = kind;
      roots.add(r);
      out.add(new LabelledObject(kind, count[r], p.x[top[r]], p.y[top[r]], height, linearity,
          planarity, scattering, planarShare, spread, baseShare, multiShare, pulseShare,
          facetShare[r]));
    }
    return out;
  }
}
