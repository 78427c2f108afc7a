package org.clearance.examples;

import java.util.ArrayList;
import java.util.List;

/**
 * Geometry of the demo's waisted lattice tower: four legs tapering to a waist, a window in which
 * the centre phase hangs, a truss cross arm, two shield-wire peaks; and where each conductor is
 * attached. Members are straight segments {x1, y1, z1, x2, y2, z2} in metres.
 *
 * <p>Local frame: a = along the line (bisector), b = across (left), z up from the tower's ground.
 */
final class TowerGeometry {
  /** Leg half-spread at the ground, m (dead-ends are wider). */
  private static final double SUSPENSION_BASE_M = 3.6;
  private static final double DEAD_END_BASE_M = 4.6;
  /** Extra leg spread per metre of body extension. */
  private static final double SPREAD_PER_EXTENSION = 0.12;
  /** Half-width of the body at the waist, m. */
  private static final double WAIST_M = 1.1;
  /** Height of the waist below the arm, m. */
  private static final double WAIST_BELOW_ARM_M = 7.0;
  /** Half-width of the window at arm level, m: room for the centre phase. */
  private static final double WINDOW_M = 3.6;
  /** Half depth of the arm truss along the line, m. */
  private static final double ARM_DEPTH_M = 0.9;
  /** Height of the arm's top chord above its bottom chords, m. */
  private static final double ARM_TRUSS_M = 1.8;
  /** Arm overhang beyond the outer phase, m. */
  private static final double ARM_OVERHANG_M = 0.8;
  /** Bracing panel height, m. */
  private static final double PANEL_M = 4.0;
  /** Strain insulator length at dead-ends, m (common practice, no source). */
  static final double STRAIN_INSULATOR_M = 3.0;
  /** Body corners in order round the tower (along, across signs). */
  private static final double[] CORNER_A = {1, -1, -1, 1};
  private static final double[] CORNER_B = {1, 1, -1, -1};

  private TowerGeometry() {}

  /** Which span an attachment serves. */
  enum Side {
    BACK,
    AHEAD
  }

  /** The tower-end of the insulator (or the peak clamp) of a position: {x, y, z}. */
  static double[] hangPoint(DemoStructure t, DemoPosition p) {
    double off = p.offsetM() * t.offsetScale();
    double z = p.role() == DemoPosition.Role.SHIELD ? t.peakZ() : t.armZ();
    return new double[] {t.x() + off * t.acrossX(), t.y() + off * t.acrossY(), z};
  }

  /**
   * The conductor attachment point of a position on a structure, for the span on one side: {x,
   * y, z}. Suspension phases hang one insulator length below the arm; dead-end phases sit at arm
   * height one strain insulator beyond the arm, along their span; shield wires clamp to the peak.
   *
   * @param spanUx x of the unit plan vector of the span served (from its start to its end)
   * @param spanUy y of that vector
   */
  static double[] attachment(DemoStructure t, DemoPosition p, Side side, double spanUx,
      double spanUy) {
    double[] h = hangPoint(t, p);
    if (p.role() == DemoPosition.Role.SHIELD) {
      return h;
    }
    if (t.type() == DemoStructure.Type.SUSPENSION) {
      return new double[] {h[0], h[1], h[2] - p.insulatorLengthM()};
    }
    double sign = side == Side.AHEAD ? 1 : -1;
    return new double[] {h[0] + sign * STRAIN_INSULATOR_M * spanUx,
        h[1] + sign * STRAIN_INSULATOR_M * spanUy, h[2]};
  }

  /** The steel members of a tower. */
  static List<double[]> members(DemoStructure t, double armHalfLength) {
    List<double[]> m = new ArrayList<>();
    double base = (t.type() == DemoStructure.Type.DEAD_END ? DEAD_END_BASE_M : SUSPENSION_BASE_M)
        + SPREAD_PER_EXTENSION * t.extensionM();
    double arm = t.armHeightM();
    double waist = arm - WAIST_BELOW_ARM_M;
    double top = arm + ARM_TRUSS_M;
    // Legs and body faces, panel by panel from the ground to the waist.
    int panels = Math.max(1, (int) Math.round(waist / PANEL_M));
    for (int k = 0; k < panels; k++) {
      double z1 = waist * k / panels;
      double z2 = waist * (k + 1) / panels;
      double w1 = base + (WAIST_M - base) * k / panels;
      double w2 = base + (WAIST_M - base) * (k + 1) / panels;
      for (int c = 0; c < 4; c++) {
        double sa = CORNER_A[c];
        double sb = CORNER_B[c];
        double na = CORNER_A[(c + 1) % 4]; // next corner of the same face
        double nb = CORNER_B[(c + 1) % 4];
        add(m, t, sa * w1, sb * w1, z1, sa * w2, sb * w2, z2); // leg
        add(m, t, sa * w1, sb * w1, z1, na * w2, nb * w2, z2); // X-bracing of the face
        add(m, t, na * w1, nb * w1, z1, sa * w2, sb * w2, z2);
        add(m, t, sa * w2, sb * w2, z2, na * w2, nb * w2, z2); // horizontal strut
      }
    }
    // Window: from the waist corners out to the arm, both faces.
    for (int sa = -1; sa <= 1; sa += 2) {
      for (int sb = -1; sb <= 1; sb += 2) {
        add(m, t, sa * WAIST_M, sb * WAIST_M, waist, sa * ARM_DEPTH_M, sb * WINDOW_M, arm);
      }
      add(m, t, sa * WAIST_M, -WAIST_M, waist, sa * ARM_DEPTH_M, WINDOW_M, arm);
    }
    // Cross arm: two bottom chords, a top chord, diagonals; then the peaks.
    for (int sa = -1; sa <= 1; sa += 2) {
      add(m, t, sa * ARM_DEPTH_M, -armHalfLength, arm, sa * ARM_DEPTH_M, armHalfLength, arm);
      add(m, t, sa * ARM_DEPTH_M, -WINDOW_M, arm, 0, -WINDOW_M, top);
      add(m, t, sa * ARM_DEPTH_M, WINDOW_M, arm, 0, WINDOW_M, top);
    }
    add(m, t, 0, -WINDOW_M, top, 0, WINDOW_M, top);
    for (int sb = -1; sb <= 1; sb += 2) {
      add(m, t, 0, sb * WINDOW_M, top, 0, sb * armHalfLength, arm);
      double peakB = sb * 5.5 * t.offsetScale();
      double peakZ = arm + DemoPosition.PEAK_ABOVE_ARM_M;
      add(m, t, 0, sb * WINDOW_M, top, 0, peakB, peakZ);
      add(m, t, 0, sb * 1.0, top, 0, peakB, peakZ);
      for (double b = 1.5; b < armHalfLength - 0.5; b += 1.5) {
        double zt = top - (top - arm) * Math.max(0, b - WINDOW_M) / (armHalfLength - WINDOW_M);
        for (int sa = -1; sa <= 1; sa += 2) {
          add(m, t, sa * ARM_DEPTH_M, sb * b, arm, 0, sb * (b + 1.5), zt);
        }
      }
    }
    return m;
  }

  /** Arm half length for a tower: beyond the outer phase by an overhang, m. */
  static double armHalfLength(DemoStructure t, List<DemoPosition> positions) {
    double max = WINDOW_M;
    for (DemoPosition p : positions) {
      if (p.role() == DemoPosition.Role.PHASE) {
        max = Math.max(max, Math.abs(p.offsetM()) * t.offsetScale());
      }
    }
    return max + ARM_OVERHANG_M;
  }

  private static void add(List<double[]> m, DemoStructure t, double a1, double b1, double z1,
      double a2, double b2, double z2) {
    double ax = t.alongX();
    double ay = t.alongY();
    double bx = t.acrossX();
    double by = t.acrossY();
    m.add(new double[] {t.x() + a1 * ax + b1 * bx, t.y() + a1 * ay + b1 * by, t.groundZ() + z1,
        t.x() + a2 * ax + b2 * bx, t.y() + a2 * ay + b2 * by, t.groundZ() + z2});
  }
}
