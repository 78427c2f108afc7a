package org.clearance.clearance;

import java.util.List;
import java.util.Objects;
import org.clearance.ground.Tree;

/**
 * A tree near a span with the distance from its base to the span's nearest conductor in every
 * condition, for the fall-in check (methods.md 5.2: a rigid tree rotating about its base strikes
 * the conductor when that distance is at most its height plus the required clearance).
 *
 * @param tree the tree
 * @param spanId the span it was measured to (of the spans near it, the one nearest its base in
 *     the surveyed state)
 * @param baseDistances distance from the tree base (x, y, ground) to the nearest conductor per
 *     condition of the run, surveyed first, m; NaN where the condition is not available
 * @param nearestConductor conductor nearest to the base in the surveyed state
 */
public record TreeClearance(
    Tree tree, String spanId, List<Double> baseDistances, String nearestConductor) {

  public TreeClearance {
    Objects.requireNonNull(tree, "tree");
    Objects.requireNonNull(spanId, "spanId");
    baseDistances = List.copyOf(baseDistances);
  }
}
