package org.clearance.wire;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.clearance.ground.HeightModel;
import org.clearance.line.ConductorPosition;
import org.clearance.line.LineLayout;
import org.clearance.line.LineSpec;
import org.clearance.line.Span;
import org.clearance.line.SpanLayout;
import org.clearance.line.Structure;
import org.clearance.survey.Survey;

/**
 * The wire finder: one fitted catenary per conductor per span from survey points and structure
 * locations, whether or not the survey labelled its wires (docs/wire-finder.md).
 *
 * <p>Steps: (1) optionally, the structures are checked against tower points and moved or added
 * ({@link StructureRefiner}); (2) one streaming pass keeps, per span, only the wire candidates
 * inside the span's corridor ({@link CandidateCollector}): memory follows the candidates, never
 * the survey; (3) each span, on its own worker thread: seeds from ASPRS class 13/14 labels and
 * from covariance linearity (methods.md 1.2), DBSCAN clusters under a metric stretched along the
 * span (1.5), growth along the model to whole wires (1.7), a plan line and a catenary per wire
 * (2.1-2.5), bundle split (1.6), matching to the specification's positions, attachment
 * constraints from the structures file, quality thresholds.
 */
public final class WireFinder {

  /** A wire point with vegetation this near is measured, not set aside, m
   * ({@link PointEvidence#TOUCH_M}; docs/wire-finder.md, "Points set aside"). */
  public static final double TOUCH_M = PointEvidence.TOUCH_M;

  private final WireFinderOptions options;

  /** A finder with the given options. */
  public WireFinder(WireFinderOptions options) {
    this.options = Objects.requireNonNull(options, "options");
  }

  /**
   * Finds the wires of every span in a survey, reading it on {@code options.threads()} threads.
   *
   * @param survey the survey (coordinates in metres)
   * @param layout the spans, with the line specifications
   * @param heights heights above ground of survey points (a ground model)
   * @throws org.clearance.InputException when the survey cannot be read
   */
  public static WireResult find(Survey survey, SpanLayout layout, HeightModel heights,
      WireFinderOptions options) {
    return new WireFinder(options).find(PointSource.of(survey, options.threads()), layout,
        heights);
  }

  /**
   * Finds the wires of every span from any point source.
   *
   * @param source the points (read once, or twice when structures are refined)
   * @param layout the spans, with the line specifications
   * @param heights heights above ground of survey points (a ground model)
   */
  public WireResult find(PointSource source, SpanLayout layout, HeightModel heights) {
    Objects.requireNonNull(source, "source");
    Objects.requireNonNull(layout, "layout");
    Objects.requireNonNull(heights, "heights");
    SpanLayout used = layout;
    List<StructureChange> changes = List.of();
    if (options.structures().refine()) {
      StructureRefiner.Refined r = new StructureRefiner(options.structures()).refine(source,
          layout, heights);
      used = r.layout();
      changes = r.changes();
    }
    List<Span> spans = used.spans();
    List<LineSpec> specs = new ArrayList<>();
    List<SpanCorridor> corridors = new ArrayList<>();
    List<ConductorEnds> arms = new ArrayList<>();
    for (LineLayout line : used.lines()) {
      List<Span> ls = line.spans();
      for (int k = 0; k < ls.size(); k++) {
        specs.add(line.spec());
        corridors.add(corridor(ls.get(k), line.spec(), heights));
        arms.add(arms(ls.get(k), k > 0 ? ls.get(k - 1) : null,
            k + 1 < ls.size() ? ls.get(k + 1) : null));
      }
    }
    CandidateCollector all = collect(source, corridors, heights);
    Processed done = processSpans(spans, specs, arms, corridors, all, heights);
    // two lines in one run: another line's conductors are not this line's extras
    return new WireResult(used, OtherLineWires.withoutOtherLinesWires(done.spans()), changes,
        done.setAside());
  }

  /**
   * Finds the wires of one span from points of its neighbourhood: the span-level entry point
   * that a distributed run calls once per span (docs/spark.md), with the same steps and the same
   * code per span as {@link #find}. The layout is used as given: structure refinement pairs
   * towers over a whole line and is done by {@link #find} only. The span's neighbours in the
   * layout give the directions of its cross arms. The points set aside follow in a second step,
   * once the wire points of the neighbouring spans are known ({@link SpanFind#setAside}).
   *
   * @param source points of at least the span's corridor (others are ignored)
   * @param layout the spans, with the line specifications
   * @param spanId the span to fit
   * @param heights heights above ground of survey points (a ground model)
   * @throws IllegalArgumentException when the layout has no span {@code spanId}
   */
  public SpanFind findSpan(PointSource source, SpanLayout layout, String spanId,
      HeightModel heights) {
    Objects.requireNonNull(source, "source");
    Objects.requireNonNull(heights, "heights");
    for (LineLayout line : layout.lines()) {
      List<Span> ls = line.spans();
      for (int k = 0; k < ls.size(); k++) {
        Span span = ls.get(k);
        if (!span.id().equals(spanId)) {
          continue;
        }
        ConductorEnds arm = arms(span, k > 0 ? ls.get(k - 1) : null,
            k + 1 < ls.size() ? ls.get(k + 1) : null);
        SpanCorridor corridor = corridor(span, line.spec(), heights);
        CandidateCollector all = collect(source, List.of(corridor), heights);
        return fitSpan(new SpanWireFinder(options), all, 0, span, line.spec(), arm, corridor,
            heights);
      }
    }
    throw new IllegalArgumentException("no span " + spanId + " in the layout");
  }

  /**
   * One span's conductors with the evidence of which of its candidates are wire points, as
   * {@link #findSpan} returns it: holds the span's candidates until {@link #setAside} is done.
   */
  public static final class SpanFind {
    private final SpanWires wires;
    private final SpanPoints points;
    private final SpanPoints outer;
    private final boolean[] onWire;
    private final boolean[] linear;
    private final boolean[] crossing;
    private final double floorM;
    private final double poleRadiusM;

    SpanFind(SpanWireFinder.Found found, SpanPoints points, SpanPoints outer, double floorM,
        double poleRadiusM) {
      this.wires = found.wires();
      this.points = points;
      this.outer = outer;
      this.onWire = found.onWire();
      this.linear = found.linear();
      this.crossing = found.crossing();
      this.floorM = floorM;
      this.poleRadiusM = poleRadiusM;
    }

    /** The span's conductors. */
    public SpanWires wires() {
      return wires;
    }

    /** The curves of the span's fitted conductors. */
    private List<ConductorCurve> fittedCurves() {
      return wires.conductors().stream().filter(c -> c.status() == WireStatus.FITTED)
          .map(c -> c.curve().orElseThrow()).toList();
    }

    /** Number of the span's wire candidates. */
    public int candidates() {
      return points.size();
    }

    /** The keys ({@link SetAside#key}) of the span's candidates that lie on its wires. */
    public long[] wireKeys() {
      long[] out = new long[onWire.length];
      int n = 0;
      for (int i = 0; i < onWire.length; i++) {
        if (onWire[i]) {
          out[n++] = points.key(i);
        }
      }
      return java.util.Arrays.copyOf(out, n);
    }

    /**
     * Adds the span's points that are not vegetation to {@code out} ({@link PointEvidence}).
     *
     * @param wires the wire points of every span whose corridor meets this one's, this span's
     *     own included ({@link #wireKeys})
     */
    public void setAside(SetAside wires, SetAside out) {
      if (onWire.length == points.size()) {
        PointEvidence.setAside(points, onWire, linear, crossing, wires, floorM,
            wires().span().lengthM(), poleRadiusM, wires().span().frame(), fittedCurves(),
            outer, out);
      }
    }
  }

  /** One streaming pass: the wire candidates of every corridor. */
  private static CandidateCollector collect(PointSource source, List<SpanCorridor> corridors,
      HeightModel heights) {
    CorridorIndex index = new CorridorIndex(corridors.stream()
        .map(c -> c.corners(Math.max(StandingGrid.BAND_M, CrossingBand.BAND_M))).toList());
    List<CandidateCollector> collectors = Collections.synchronizedList(new ArrayList<>());
    source.stream(() -> {
      CandidateCollector c = new CandidateCollector(corridors, index, heights);
      collectors.add(c);
      return c;
    });
    CandidateCollector all = collectors.isEmpty()
        ? new CandidateCollector(corridors, index, heights) : collectors.get(0);
    for (int k = 1; k < collectors.size(); k++) {
      all.absorb(collectors.get(k));
    }
    collectors.clear();
    return all;
  }

  /** Fits the span whose candidates are corridor {@code idx} of {@code all}. */
  private static SpanFind fitSpan(SpanWireFinder finder, CandidateCollector all, int idx,
      Span span, LineSpec spec, ConductorEnds arms, SpanCorridor corridor, HeightModel heights) {
    SpanPoints p = all.sorted(idx);
    return new SpanFind(finder.findWithEvidence(p, all.seen(idx), span, spec,
        groundAt(span.from(), heights), groundAt(span.to(), heights), arms), p, all.outer(idx),
        corridor.minHeightM(), isPoleLine(spec) ? PointEvidence.POLE_RADIUS_M : Double.NaN);
  }

  /**
   * The cross arms of a span: at a structure between two spans the arm lies along the bisector
   * of the line's turn, at a line's end square to the span.
   */
  static ConductorEnds arms(Span span, Span before, Span after) {
    double ux = span.frame().ux();
    double uy = span.frame().uy();
    double tanA = before == null ? 0 : ConductorEnds.armTangent(ux, uy,
        before.frame().ux() + ux, before.frame().uy() + uy);
    double tanB = after == null ? 0 : ConductorEnds.armTangent(ux, uy,
        after.frame().ux() + ux, after.frame().uy() + uy);
    return new ConductorEnds(tanA, 0, tanB, 0);
  }

  /** The spans' conductors and the points set aside. */
  private record Processed(List<SpanWires> spans, SetAside setAside) {}

  /**
   * Fits every span, then, once every span's wire points are known, sets aside the points that
   * are not vegetation ({@link PointEvidence}); a span's candidates are dropped after that.
   */
  private Processed processSpans(List<Span> spans, List<LineSpec> specs,
      List<ConductorEnds> arms, List<SpanCorridor> corridors, CandidateCollector all,
      HeightModel heights) {
    SpanWireFinder finder = new SpanWireFinder(options);
    ExecutorService pool = Executors.newFixedThreadPool(options.threads());
    try {
      List<Future<SpanFind>> futures = new ArrayList<>();
      for (int k = 0; k < spans.size(); k++) {
        int idx = k;
        futures.add(pool.submit(() -> fitSpan(finder, all, idx, spans.get(idx),
            specs.get(idx), arms.get(idx), corridors.get(idx), heights)));
      }
      List<SpanFind> found = new ArrayList<>();
      SetAside onWire = new SetAside();
      for (Future<SpanFind> f : futures) {
        SpanFind r = f.get();
        found.add(r);
        for (long key : r.wireKeys()) {
          onWire.addWire(key);
        }
      }
      SetAside out = new SetAside();
      List<Future<?>> second = new ArrayList<>();
      for (int k = 0; k < spans.size(); k++) {
        int idx = k;
        second.add(pool.submit(() -> {
          found.get(idx).setAside(onWire, out);
          all.release(idx);
        }));
      }
      for (Future<?> f : second) {
        f.get();
      }
      return new Processed(found.stream().map(SpanFind::wires).toList(), out);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new IllegalStateException("interrupted while fitting spans", e);
    } catch (ExecutionException e) {
      Throwable cause = e.getCause();
      if (cause instanceof RuntimeException re) {
        throw re;
      }
      throw new IllegalStateException(cause);
    } finally {
      pool.shutdownNow();
    }
  }

  /** The corridor of a span: half-width from the specification's offsets, minimum height. */
  SpanCorridor corridor(Span span, LineSpec spec, HeightModel heights) {
    WireFinderOptions.Collection c = options.collection();
    double widest = Double.NaN;
    double lowest = Double.NaN;
    for (ConductorPosition p : spec.conductors()) {
      if (Double.isFinite(p.offsetM())) {
        widest = Double.isNaN(widest) ? Math.abs(p.offsetM())
            : Math.max(widest, Math.abs(p.offsetM()));
      }
      if (Double.isFinite(p.attachHeightM())) {
        lowest = Double.isNaN(lowest) ? p.attachHeightM() : Math.min(lowest, p.attachHeightM());
      }
    }
    double half = Double.isNaN(widest) ? c.defaultHalfWidthM() : widest + c.lateralMarginM();
    double minHeight = c.minHeightM();
    if (Double.isFinite(lowest)) {
      minHeight = Math.max(minHeight, Math.min(WireFinderOptions.Collection.MAX_DERIVED_HEIGHT_M,
          WireFinderOptions.Collection.ATTACH_SHARE * lowest));
    }
    double g = groundAt(span.from(), heights);
    double low = Double.isNaN(widest) ? half
        : Math.min(half, widest + LowWirePoints.LATERAL_MARGIN_M);
    return new SpanCorridor(span, half, c.stationMarginM(), minHeight,
        Double.isFinite(g) ? g : 0, low);
  }

  /** Ground elevation at a structure: the file's ground_z, else the height model's, else NaN. */
  static double groundAt(Structure s, HeightModel heights) {
    if (Double.isFinite(s.groundZ())) {
      return s.groundZ();
    }
    double h = heights.heightAboveGround(s.x(), s.y(), 0);
    return Double.isFinite(h) ? -h : Double.NaN;
  }

  /**
   * Whether a line hangs its conductors closer than 2.5 m apart (a distribution framing on
   * poles, {@link CloseSpacing}): its structures are thin poles, not lattice towers.
   */
  public static boolean isPoleLine(org.clearance.line.LineSpec spec) {
    return StructureRefiner.isPoleLine(spec);
  }
}
