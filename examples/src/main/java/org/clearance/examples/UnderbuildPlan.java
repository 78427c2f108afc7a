package org.clearance.examples;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.clearance.line.SpanFrame;

/**
 * Where the demo feeder runs in the demo corridor (package-private; docs/demo-corridor.md, "The
 * demo's two lines"): a few poles in the transmission line's right-of-way beside one of its spans,
 * then built under the transmission line on its towers for one or two spans (joint use), then
 * a few poles beside the next span. Framings change along the feeder: vertical on the first
 * poles, horizontal on the poles before the towers and on the towers' underbuild frames,
 * triangular after them.
 *
 * <p>The poles stand {@value #SIDE_OFFSET_M} m to the right of the transmission centre line and at
 * least {@value #TOWER_CLEAR_M} m along the line from every tower, so that no pole is within the
 * wire finder's 60 m tower search radius of a tower it does not hang on.
 */
final class UnderbuildPlan {
  /** Offset of the feeder's pole line from the transmission centre line, m (to the right):
   * inside the 25 m cleared strip, outside the transmission wire finder's 16 m corridor. */
  static final double SIDE_OFFSET_M = -21.0;
  /** Least distance along the line from a tower to a pole beside it, m: with the side offset
   * the pole stands more than 60 m (the structure search radius) from the tower. */
  static final double TOWER_CLEAR_M = 62.0;
  /** Typical pole span of the sections beside the line, m (common practice, no source). */
  static final double POLE_SPAN_M = 90.0;
  /** Most pole spans beside one transmission span. */
  static final int MAX_POLE_SPANS = 3;
  /** Height of the feeder's conductors on a joint-use tower above its ground, m, kept within
   * {@value #MIN_BELOW_M}-{@value #MAX_BELOW_M} m below the lowest phase (common practice, no
   * source). */
  static final double JOINT_ATTACH_HEIGHT_M = 12.0;
  static final double MIN_BELOW_M = 8.0;
  static final double MAX_BELOW_M = 15.0;
  /** Primary mid-span sag aimed at on the longest joint-use span, m: the underbuild is its own
   * tension section, strung tighter than the pole spans so that it keeps 6 m or more above
   * ground (common practice, no source). */
  static final double JOINT_SAG_M = 4.5;
  /** Highest primary tension of the joint-use section, share of rated strength. */
  static final double MAX_JOINT_TENSION_SHARE = 0.3;

  /** One structure of the feeder: a pole, or a transmission tower carrying the underbuild. */
  record Structure(String id, double x, double y, double groundZ, boolean joint,
      boolean deadEnd, Framing framing, double jointTopZ, double chainage) {}

  final List<Structure> structures = new ArrayList<>();
  /** Index of the first joint-use span (feeder span index) and their count. */
  final int firstJointSpan;
  final int jointSpans;
  /** Index of the transmission span under which the joint section starts. */
  final int hostSpan;

  private UnderbuildPlan(int hostSpan, int jointSpans, List<Structure> structures,
      int firstJointSpan) {
    this.hostSpan = hostSpan;
    this.jointSpans = jointSpans;
    this.structures.addAll(structures);
    this.firstJointSpan = firstJointSpan;
  }

  /**
   * The plan in a demo corridor, or null when the corridor has no place for it (fewer than three
   * spans clear of the ravine).
   */
  static UnderbuildPlan in(DemoScene host) {
    List<DemoSpan> spans = host.spans();
    int n = spans.size();
    int joint = n >= 4 ? 2 : 1;
    int best = -1;
    double bestScore = Double.POSITIVE_INFINITY;
    for (int j = 1; j + joint <= n - 1; j++) {
      if (host.ravineSpan() >= j - 1 && host.ravineSpan() <= j + joint) {
        continue;
      }
      double score = 0;
      for (int k = j; k <= j + joint; k++) {
        score += 20 * host.structures().get(k).extensionM();
      }
      for (int k = j; k < j + joint; k++) {
        score += spans.get(k).lengthM() + 1000 * growInsUnder(host, k);
      }
      if (score < bestScore) {
        bestScore = score;
        best = j;
      }
    }
    if (best < 0) {
      return null;
    }
    List<Structure> out = new ArrayList<>();
    double[] chainage = chainages(host);
    beside(host, best - 1, chainage, true, out);
    int first = out.size();
    for (int k = best; k <= best + joint; k++) {
      DemoStructure t = host.structures().get(k);
      double lowestPhase = t.armZ() - (t.type() == DemoStructure.Type.SUSPENSION
          ? DemoPosition.PHASE_INSULATOR_M : 0);
      double below = Math.max(MIN_BELOW_M, Math.min(MAX_BELOW_M,
          lowestPhase - t.groundZ() - JOINT_ATTACH_HEIGHT_M));
      out.add(new Structure(t.id(), t.x(), t.y(), t.groundZ(), true,
          k == best || k == best + joint, Framing.HORIZONTAL, lowestPhase - below,
          chainage[k]));
    }
    beside(host, best + joint, chainage, false, out);
    return new UnderbuildPlan(best, joint, out, first);
  }

  /** Grow-in trees whose crown comes within 4 m of the centre line of a transmission span. */
  private static int growInsUnder(DemoScene host, int span) {
    DemoStructure a = host.structures().get(host.spans().get(span).from());
    DemoStructure b = host.structures().get(host.spans().get(span).to());
    SpanFrame f = SpanFrame.between(a.x(), a.y(), b.x(), b.y());
    int count = 0;
    for (DemoTree t : host.trees()) {
      if (t.role() == DemoTree.Role.GROW_IN && t.span() == span
          && Math.abs(f.offset(t.x(), t.y())) < 4 + t.crownRadiusM()) {
        count++;
      }
    }
    return count;
  }

  private static double[] chainages(DemoScene host) {
    double[] c = new double[host.structures().size()];
    for (DemoSpan s : host.spans()) {
      c[s.to()] = c[s.from()] + s.lengthM();
    }
    return c;
  }

  /**
   * The poles beside a transmission span, in the feeder's order: before the joint section
   * (ending at the tower it goes up to) or after it (starting at the tower it comes down from).
   * Framings: before, vertical then horizontal on the last pole; after, triangular.
   */
  private static void beside(DemoScene host, int span, double[] chainage, boolean before,
      List<Structure> out) {
    DemoSpan s = host.spans().get(span);
    DemoStructure a = host.structures().get(s.from());
    DemoStructure b = host.structures().get(s.to());
    SpanFrame f = SpanFrame.between(a.x(), a.y(), b.x(), b.y());
    double window = f.length() - 2 * TOWER_CLEAR_M;
    int k = Math.max(1, Math.min(MAX_POLE_SPANS, (int) Math.round(window / POLE_SPAN_M)));
    long poles = out.stream().filter(t -> !t.joint()).count();
    for (int i = 0; i <= k; i++) {
      double st = TOWER_CLEAR_M + window * i / k;
      double x = f.x(st, SIDE_OFFSET_M);
      double y = f.y(st, SIDE_OFFSET_M);
      Framing framing = before ? (i == k ? Framing.HORIZONTAL : Framing.VERTICAL)
          : Framing.TRIANGULAR;
      boolean end = before ? i == 0 : i == k;
      out.add(new Structure(String.format(Locale.ROOT, "P%03d", 201 + poles + i), x, y,
          host.groundZ(x, y), false, end, framing, Double.NaN, chainage[s.from()] + st));
    }
  }
}
