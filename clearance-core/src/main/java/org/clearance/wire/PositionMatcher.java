package org.clearance.wire;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.clearance.line.ConductorPosition;

/**
 * Matches the wires found in a span to the positions of the line specification by where they
 * hang in the cross-sections at the two structures (package-private).
 *
 * <p>The cost of wire i at position j is the mean squared, normalised difference between the
 * wire's offset at each structure its points reach near enough (a short piece at one end says
 * little about the other end) and the position's offset_m (scale {@link #SIGMA_OFFSET_M}),
 * and between the wire's elevation there and the position's: attach_z from the structures file
 * when given (scale {@link #SIGMA_ATTACH_Z_M}), else the ground elevation plus attach_height_m
 * plus a common shift per structure (scale {@link #SIGMA_HEIGHT_M}). The shift takes up tower
 * body extensions and a ground model error; it is tried at every value one wire-position pair
 * implies and costs (shift / {@link #SIGMA_SHIFT_M})^2; likewise a common lateral shift per
 * structure (a structure centre a little off its tower) costing (shift /
 * {@link #SIGMA_LATERAL_SHIFT_M})^2. A wire whose points are labelled as a
 * shield (class 13) or phase (class 14) pays {@link #ROLE_MISMATCH} at a position of the other
 * role: labels are a hint, vendors label earth wires as conductors too. The assignment is the
 * Hungarian method ({@link Hungarian}) with every wire and position free to stay unmatched at
 * half the gate each, so no pair costing more than {@link #GATE} is ever made.
 */
final class PositionMatcher {

  /** Offset scale, m: nominal offsets are good to a metre (insulator swing, tower drawings). */
  static final double SIGMA_OFFSET_M = 1.0;
  /** Height scale, m: attachment heights above ground are good to one and a half metres. */
  static final double SIGMA_HEIGHT_M = 1.5;
  /** Scale against a surveyed attach_z, m. */
  static final double SIGMA_ATTACH_Z_M = 0.5;
  /** Shift scale, m: tower body extensions run to about 15 m. */
  static final double SIGMA_SHIFT_M = 8.0;
  /** Lateral shift scale, m: a structure centre up to the 3 m refinement tolerance off its
   * tower moves every wire's offset alike; with several wires agreeing the shift pays for
   * itself, one lone wire cannot buy it cheaply. */
  static final double SIGMA_LATERAL_SHIFT_M = 1.0;
  /** Largest cost of a pair: three scales. */
  static final double GATE = 9.0;
  /** Cost of a role the wire's labels contradict: a third of the gate. */
  static final double ROLE_MISMATCH = 3.0;
  /** Cost of a forbidden pair: far above any sum of gates. */
  static final double FORBIDDEN = 1e9;
  /** Tie-break per step of left-to-right rank, for positions without geometry. */
  static final double TIE_BREAK = 1e-6;
  /**
   * For positions without geometry (no offset, no height, no attach_z): cost of a shield
   * position on a wire that is not among the highest (as many as there are shield positions),
   * and of a phase position on one that is. Shield wires hang at the top of the structure
   * (methods.md 1.6); below the role-label cost, so labels still decide where they speak.
   */
  static final double HEIGHT_ROLE_COST = 2.0;

  /**
   * One wire as the matcher sees it.
   *
   * @param offsetA offset at the first structure, m; offsetB at the second
   * @param zA elevation at the first structure, m; zB at the second
   * @param role the role its survey labels show, or empty
   * @param nearA whether its points reach near enough the first structure for the fit's value
   *     there to count; nearB likewise at the second (at least one is true)
   */
  record Wire(double offsetA, double offsetB, double zA, double zB,
      Optional<ConductorPosition.Role> role, boolean nearA, boolean nearB) {}

  /**
   * One specification position in this span.
   *
   * @param position the position
   * @param attachZA attach_z at the first structure, m, or NaN; attachZB at the second
   */
  record Slot(ConductorPosition position, double attachZA, double attachZB) {}

  private PositionMatcher() {}

  /**
   * Matches wires to slots.
   *
   * @param groundA ground elevation at the first structure, m, or NaN; groundB at the second
   *     (without it the common shift also takes up the ground elevation)
   * @return for each wire, the index of its slot, or -1 for an extra
   */
  static int[] match(List<Wire> wires, List<Slot> slots, double groundA, double groundB) {
    int n = wires.size();
    int m = slots.size();
    int[] none = new int[n];
    Arrays.fill(none, -1);
    if (n == 0 || m == 0) {
      return none;
    }
    int[] rank = leftToRight(wires);
    boolean[] top = highest(wires, (int) slots.stream()
        .filter(t -> t.position().role() == ConductorPosition.Role.SHIELD).count());
    // Without a ground elevation the shift stands for ground plus extension: no prior on it.
    boolean priorA = Double.isFinite(groundA);
    boolean priorB = Double.isFinite(groundB);
    double gA = priorA ? groundA : 0;
    double gB = priorB ? groundB : 0;
    // Shifts {up at A, up at B, across at A, across at B}: none, and those each wire-position
    // pair implies, vertical only and vertical with lateral.
    List<double[]> shifts = new ArrayList<>();
    shifts.add(new double[4]);
    for (Wire w : wires) {
      for (Slot s : slots) {
        double h = s.position().attachHeightM();
        double off = s.position().offsetM();
        double upA = w.nearA() && Double.isFinite(h) ? w.zA() - gA - h : 0;
        double upB = w.nearB() && Double.isFinite(h) ? w.zB() - gB - h : 0;
        shifts.add(new double[] {upA, upB, 0, 0});
        if (Double.isFinite(off)) {
          shifts.add(new double[] {upA, upB, w.nearA() ? w.offsetA() - off : 0,
              w.nearB() ? w.offsetB() - off : 0});
        }
      }
    }
    double best = Double.POSITIVE_INFINITY;
    int[] answer = none;
    for (double[] shift : shifts) {
      double[][] cost = new double[n + m][n + m];
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < m; j++) {
          double c = pairCost(wires.get(i), slots.get(j), gA, gB, shift);
          c += TIE_BREAK * Math.abs(rank[i] - j);
          if (withoutGeometry(slots.get(j))
              && top[i] != (slots.get(j).position().role() == ConductorPosition.Role.SHIELD)) {
            c += HEIGHT_ROLE_COST;
          }
          cost[i][j] = c <= GATE ? c : FORBIDDEN;
        }
        for (int j = m; j < n + m; j++) {
          cost[i][j] = GATE / 2;
        }
      }
      for (int i = n; i < n + m; i++) {
        for (int j = 0; j < m; j++) {
          cost[i][j] = GATE / 2;
        }
      }
      int[] assign = Hungarian.solve(cost);
      double total = prior(priorA ? shift[0] : 0, priorB ? shift[1] : 0, SIGMA_SHIFT_M)
          + prior(shift[2], shift[3], SIGMA_LATERAL_SHIFT_M);
      int[] result = new int[n];
      for (int i = 0; i < n; i++) {
        total += cost[i][assign[i]];
        result[i] = assign[i] < m ? assign[i] : -1;
      }
      for (int i = n; i < n + m; i++) {
        total += cost[i][assign[i]];
      }
      if (total < best - 1e-12) {
        best = total;
        answer = result;
      }
    }
    return answer;
  }

  /** The role a position's labels show: neutrals are labelled conductors (class 14). */
  private static ConductorPosition.Role labelRole(ConductorPosition.Role role) {
    return role == ConductorPosition.Role.NEUTRAL ? ConductorPosition.Role.PHASE : role;
  }

  private static double prior(double a, double b, double sigma) {
    return 0.5 * (a * a + b * b) / (sigma * sigma);
  }

  /** Ranks the wires from left (most positive offset) to right. */
  private static int[] leftToRight(List<Wire> wires) {
    Integer[] order = new Integer[wires.size()];
    for (int i = 0; i < order.length; i++) {
      order[i] = i;
    }
    Arrays.sort(order, (a, b) -> Double.compare(mean(wires.get(b)), mean(wires.get(a))));
    int[] rank = new int[order.length];
    for (int r = 0; r < order.length; r++) {
      rank[order[r]] = r;
    }
    return rank;
  }

  /** The {@code k} highest wires (mean elevation at the ends they reach). */
  private static boolean[] highest(List<Wire> wires, int k) {
    Integer[] order = new Integer[wires.size()];
    for (int i = 0; i < order.length; i++) {
      order[i] = i;
    }
    Arrays.sort(order, (a, b) -> Double.compare(elevation(wires.get(b)),
        elevation(wires.get(a))));
    boolean[] top = new boolean[order.length];
    for (int r = 0; r < Math.min(k, order.length); r++) {
      top[order[r]] = true;
    }
    return top;
  }

  private static double elevation(Wire w) {
    if (w.nearA() && w.nearB()) {
      return 0.5 * (w.zA() + w.zB());
    }
    return w.nearA() ? w.zA() : w.zB();
  }

  private static boolean withoutGeometry(Slot s) {
    ConductorPosition p = s.position();
    return !Double.isFinite(p.offsetM()) && !Double.isFinite(p.attachHeightM())
        && !Double.isFinite(s.attachZA()) && !Double.isFinite(s.attachZB());
  }

  private static double mean(Wire w) {
    return 0.5 * (w.offsetA() + w.offsetB());
  }

  static double pairCost(Wire w, Slot s, double groundA, double groundB, double[] shift) {
    ConductorPosition p = s.position();
    double cost = w.role().isPresent() && w.role().get() != labelRole(p.role())
        ? ROLE_MISMATCH : 0;
    double off = p.offsetM();
    if (Double.isFinite(off)) {
      double a = w.nearA() ? (w.offsetA() - off - shift[2]) / SIGMA_OFFSET_M : 0;
      double b = w.nearB() ? (w.offsetB() - off - shift[3]) / SIGMA_OFFSET_M : 0;
      cost += (a * a + b * b) / ((w.nearA() ? 1 : 0) + (w.nearB() ? 1 : 0));
    }
    double sum = 0;
    int ends = 0;
    double[] r = {
      w.nearA() ? end(w.zA(), s.attachZA(), groundA, p.attachHeightM(), shift[0]) : Double.NaN,
      w.nearB() ? end(w.zB(), s.attachZB(), groundB, p.attachHeightM(), shift[1]) : Double.NaN
    };
    for (double v : r) {
      if (Double.isFinite(v)) {
        sum += v * v;
        ends++;
      }
    }
    return ends > 0 ? cost + sum / ends : cost;
  }

  /** Normalised elevation difference at one structure, or NaN when nothing to compare. */
  private static double end(double z, double attachZ, double ground, double height,
      double shift) {
    if (Double.isFinite(attachZ)) {
      return (z - attachZ) / SIGMA_ATTACH_Z_M;
    }
    if (Double.isFinite(ground) && Double.isFinite(height) && Double.isFinite(shift)) {
      return (z - ground - height - shift) / SIGMA_HEIGHT_M;
    }
    return Double.NaN;
  }
}
