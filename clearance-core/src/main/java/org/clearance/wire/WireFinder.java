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
    CorridorIndex index = new CorridorIndex(corridors.stream().map(SpanCorridor::corners)
        .toList());
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
    Processed done = processSpans(spans, specs, arms, corridors, all, heights);
    return new WireResult(used, done.spans(), changes, done.setAside());
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
      List<Future<SpanWireFinder.Found>> futures = new ArrayList<>();
      for (int k = 0; k < spans.size(); k++) {
        int idx = k;
        futures.add(pool.submit(() -> {
          Span span = spans.get(idx);
          return finder.findWithEvidence(all.sorted(idx), all.seen(idx), span, specs.get(idx),
              groundAt(span.from(), heights), groundAt(span.to(), heights), arms.get(idx));
        }));
      }
      List<SpanWireFinder.Found> found = new ArrayList<>();
      SetAside onWire = new SetAside();
      for (Future<SpanWireFinder.Found> f : futures) {
        SpanWireFinder.Found r = f.get();
        found.add(r);
      }
      for (int k = 0; k < spans.size(); k++) {
        SpanPoints p = all.sorted(k);
        boolean[] on = found.get(k).onWire();
        for (int i = 0; i < on.length; i++) {
          if (on[i]) {
            onWire.addWire(p.key(i));
          }
        }
      }
      SetAside out = new SetAside();
      List<Future<?>> second = new ArrayList<>();
      for (int k = 0; k < spans.size(); k++) {
        int idx = k;
        second.add(pool.submit(() -> {
          SpanWireFinder.Found r = found.get(idx);
          SpanPoints p = all.sorted(idx);
          if (r.onWire().length == p.size()) {
            PointEvidence.setAside(p, r.onWire(), r.linear(), onWire,
                corridors.get(idx).minHeightM(), out);
          }
          all.release(idx);
        }));
      }
      for (Future<?> f : second) {
        f.get();
      }
      return new Processed(found.stream().map(SpanWireFinder.Found::wires).toList(), out);
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
    return new SpanCorridor(span, half, c.stationMarginM(), minHeight,
        Double.isFinite(g) ? g : 0);
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
