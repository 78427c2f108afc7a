package org.clearance.spark;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.List;
import org.clearance.ground.GroundModelBuilder;
import org.clearance.ground.GroundOptions;
import org.clearance.line.ConductorPosition;
import org.clearance.line.LineSpec;
import org.clearance.line.Span;
import org.clearance.survey.LasFile;
import org.clearance.survey.LasHeader;

/**
 * The plan of a run, made on the driver from the tiles' headers and the spans alone (no point is
 * read): each span's work area, the tile pieces to read and the spans each piece feeds, and an
 * estimate of each span's points from the tiles' point densities.
 *
 * <p>A span's work area is a box along the span that holds every point the check of that span
 * looks at: the wire corridor, the measuring box (conductor envelope in every condition plus the
 * keep radius) and the tree region (the envelope plus the tree reach), with a margin so that the
 * ground model and the canopy at the edge of the tree region see the same neighbourhood as in a
 * whole-survey run. The span's task reads the points of the ground blocks that the work area
 * touches, with their overlap, so its terrain is the whole survey's where it is used. A tile
 * whose header extent meets no work area is never opened; a tile is read in pieces of at most
 * {@link #PIECE_POINTS} records, each piece by its byte range.
 */
final class WorkPlan {
  /** Records per piece: about 30-40 MB of LAS point data, a comfortable task input. */
  static final long PIECE_POINTS = 1L << 20;
  /** Margin beyond the tree region, m: wider than the ground filter's largest window (18 m)
   * and a large crown's radius, so terrain and tree tops at the region's edge are found from
   * the same points as in a whole-survey run (common practice, no source). */
  static final double EDGE_MARGIN_M = 30.0;
  /** Half-width assumed when the specification gives no offsets, m. */
  static final double DEFAULT_OFFSET_M = 10.0;
  /** Smallest catenary constant assumed for the blowout allowance, m: slacker than almost any
   * strung conductor (common practice, no source). */
  static final double MIN_CATENARY_M = 800.0;
  /** Least sideways allowance for a swung conductor, m. */
  static final double MIN_SWING_M = 5.0;

  /**
   * A span's work area in its plan frame: station {@code [sMin, sMax]} along the span from its
   * first structure, offset within {@code halfWidth} either side, m.
   */
  record WorkBox(int span, double ox, double oy, double ux, double uy, double sMin, double sMax,
      double halfWidth, List<double[]> windows) implements Serializable {

    WorkBox {
      windows = List.copyOf(windows);
    }

    /**
     * Whether the span's task needs the point: it lies in a window of the ground blocks that
     * the work area touches ({@link GroundModelBuilder#inputWindows}), so that the span's
     * terrain is exactly the whole survey's.
     */
    boolean contains(double x, double y) {
      for (double[] w : windows) {
        if (x >= w[0] && x < w[2] && y >= w[1] && y < w[3]) {
          return true;
        }
      }
      return false;
    }

    /** Plan bounding box of the windows: minX, minY, maxX, maxY. */
    double[] bounds() {
      double[] b = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY,
          Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
      for (double[] w : windows) {
        b[0] = Math.min(b[0], w[0]);
        b[1] = Math.min(b[1], w[1]);
        b[2] = Math.max(b[2], w[2]);
        b[3] = Math.max(b[3], w[3]);
      }
      return b;
    }

    /** Plan bounding box of the work area itself: minX, minY, maxX, maxY. */
    double[] areaBounds() {
      return bounds(0);
    }

    /** Plan bounding box of the span's tree region (the work area less its edge margin). */
    double[] regionBounds() {
      return bounds(EDGE_MARGIN_M);
    }

    private double[] bounds(double less) {
      double[] b = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY,
          Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
      for (double s : new double[] {sMin + less, sMax - less}) {
        for (double o : new double[] {less - halfWidth, halfWidth - less}) {
          double x = ox + s * ux - o * uy;
          double y = oy + s * uy + o * ux;
          b[0] = Math.min(b[0], x);
          b[1] = Math.min(b[1], y);
          b[2] = Math.max(b[2], x);
          b[3] = Math.max(b[3], y);
        }
      }
      return b;
    }
  }

  /**
   * Records {@code [first, first + count)} of tile {@code tile}, and the work areas they feed.
   */
  record Piece(int tile, long first, long count, List<WorkBox> boxes) implements Serializable {
    Piece {
      boxes = List.copyOf(boxes);
    }
  }

  final List<WorkBox> boxes;
  final List<Piece> pieces;
  /** Per span, the points its work area is expected to hold (tile density times area). */
  final long[] estimatedPoints;
  /** Tiles never opened: their extent meets no work area. */
  final int skippedTiles;

  private WorkPlan(List<WorkBox> boxes, List<Piece> pieces, long[] estimated, int skipped) {
    this.boxes = boxes;
    this.pieces = pieces;
    this.estimatedPoints = estimated;
    this.skippedTiles = skipped;
  }

  /** The plan of a run. */
  static WorkPlan of(JobContext ctx) {
    List<WorkBox> boxes = ctx.boxes;
    long[] estimated = new long[boxes.size()];
    List<Piece> pieces = new ArrayList<>();
    int skipped = 0;
    double fh = ctx.survey.units().horizontal().metres();
    List<LasFile> files = ctx.survey.files();
    for (int t = 0; t < files.size(); t++) {
      LasHeader h = files.get(t).header();
      if (h.pointCount() == 0) {
        continue;
      }
      double[] tile = {h.minX() * fh, h.minY() * fh, h.maxX() * fh, h.maxY() * fh};
      double area = (tile[2] - tile[0]) * (tile[3] - tile[1]);
      List<WorkBox> meeting = new ArrayList<>();
      for (WorkBox b : boxes) {
        double[] bb = b.bounds();
        double w = Math.min(bb[2], tile[2]) - Math.max(bb[0], tile[0]);
        double d = Math.min(bb[3], tile[3]) - Math.max(bb[1], tile[1]);
        if (w >= 0 && d >= 0) {
          meeting.add(b);
          double share = area > 0 ? Math.min(1.0, w * d / area) : 1.0;
          estimated[b.span()] += Math.round(share * h.pointCount());
        }
      }
      if (meeting.isEmpty()) {
        skipped++;
        continue;
      }
      for (long first = 0; first < h.pointCount(); first += PIECE_POINTS) {
        pieces.add(new Piece(t, first, Math.min(PIECE_POINTS, h.pointCount() - first), meeting));
      }
    }
    return new WorkPlan(List.copyOf(boxes), List.copyOf(pieces), estimated, skipped);
  }

  /** The work area of a span (class Javadoc). */
  static WorkBox box(int index, Span span, LineSpec spec, double treeReach,
      GroundOptions ground) {
    double widest = Double.NaN;
    for (ConductorPosition p : spec.conductors()) {
      if (Double.isFinite(p.offsetM())) {
        widest = Double.isNaN(widest) ? Math.abs(p.offsetM())
            : Math.max(widest, Math.abs(p.offsetM()));
      }
    }
    if (Double.isNaN(widest)) {
      widest = DEFAULT_OFFSET_M;
    }
    // Sideways reach of a swung conductor: at most its sag, L^2 / (8 c) (parabola).
    double swing = Math.max(MIN_SWING_M,
        span.lengthM() * span.lengthM() / (8 * MIN_CATENARY_M));
    double half = widest + swing + treeReach + EDGE_MARGIN_M;
    WorkBox area = new WorkBox(index, span.frame().originX(), span.frame().originY(),
        span.frame().ux(), span.frame().uy(), -half, span.lengthM() + half, half, List.of());
    double[] b = area.areaBounds();
    return new WorkBox(index, area.ox(), area.oy(), area.ux(), area.uy(), area.sMin(),
        area.sMax(), half, GroundModelBuilder.inputWindows(ground, b[0], b[1], b[2], b[3]));
  }
}
