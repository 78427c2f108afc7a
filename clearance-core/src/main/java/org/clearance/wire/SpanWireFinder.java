package org.clearance.wire;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.DoubleUnaryOperator;
import org.clearance.line.ConductorPosition;
import org.clearance.line.LineSpec;
import org.clearance.line.Span;

/**
 * Finds, fits and names the conductors of one span from its candidate points (package-private):
 * seeds (labelled points and points with linear evidence), DBSCAN pieces, growth along the
 * model, one fit per wire, matching to the specification, bundle split, attachment constraints,
 * quality thresholds.
 */
final class SpanWireFinder {

  /** Fewest class 13/14 points for a span to count as labelled. */
  static final int MIN_LABELLED = 10;
  /** Share of a wire's points that must carry a wire label for the label to set its role. */
  static final double LABEL_SHARE = 0.5;
  /** A wire's fit counts at a structure when its points come within this share of the span
   * length of it: extrapolated farther, a curve says little about where it hangs there. */
  static final double NEAR_END_SHARE = 0.35;
  /** Least share of the span a conductor must span between its strain assemblies; a shorter
   * one means the strain length does not fit this span, and the structures are used. */
  static final double MIN_CONDUCTOR_SHARE = 0.5;

  /**
   * Closely spaced wires: a piece running along less than this share of the span is placed in
   * the stack by its level under the span's common sag shape, not by its own curve's ends (issue
   * 15: a 24 m piece of C in a 118 m vertical-stack span, extrapolated, took B's position).
   */
  static final double SHORT_PIECE_SHARE = 0.5;

  private final WireFinderOptions options;

  SpanWireFinder(WireFinderOptions options) {
    this.options = options;
  }

  /**
   * The span's conductors.
   *
   * @param p the span's candidate points, sorted by station
   * @param seen survey points of any class that fell in the corridor
   * @param groundA ground elevation at the first structure, m, or NaN; groundB at the second
   * @param arms the cross arms at the two structures (no strain assemblies)
   */
  SpanWires find(SpanPoints p, long seen, Span span, LineSpec spec, double groundA,
      double groundB, ConductorEnds arms) {
    return findWithEvidence(p, seen, span, spec, groundA, groundB, arms).wires();
  }

  /**
   * The span's conductors and the evidence of which candidates are wire points.
   *
   * @param wires the span's conductors
   * @param onWire per candidate, true when it lies on a wire ({@link PointEvidence#onCurve})
   * @param linear per candidate, linear evidence
   * @param crossing per candidate, true when it is a point of a wire crossing the span
   */
  record Found(SpanWires wires, boolean[] onWire, boolean[] linear, boolean[] crossing) {

    /** Without crossing wires. */
    Found(SpanWires wires, boolean[] onWire, boolean[] linear) {
      this(wires, onWire, linear, new boolean[onWire.length]);
    }
  }

  /** As {@link #find}, with the evidence of which candidates are wire points. */
  Found findWithEvidence(SpanPoints p, long seen, Span span, LineSpec spec, double groundA,
      double groundB, ConductorEnds arms) {
    List<ConductorPosition> positions = spec.conductors();
    if (p.size() == 0) {
      String why = seen == 0
          ? "no survey points in the span's corridor (the span lies outside the survey)"
          : String.format(Locale.ROOT, "no wire candidates among the %d survey points in the"
              + " span's corridor", seen);
      List<FittedConductor> all = positions.stream()
          .map(pos -> FittedConductor.missing(pos, why)).toList();
      return new Found(new SpanWires(span, WireStatus.NOT_ASSESSED, Optional.of(why), all, 0,
          false), new boolean[0], new boolean[0]);
    }
    double length = span.lengthM();
    CrownLabels.demote(p);
    int labelledCount = 0;
    for (int i = 0; i < p.size(); i++) {
      labelledCount += p.labelled(i) ? 1 : 0;
    }
    boolean labelled = labelledCount >= MIN_LABELLED;
    CloseSpacing close = CloseSpacing.of(spec, options.growth());
    boolean[] linear = close == null ? new WireEvidence(options.evidence()).evaluate(p)
        : SleeveEvidence.evaluate(p, close.tubeM());
    IntList seeds = new IntList();
    for (int i = 0; i < p.size(); i++) {
      if ((p.labelled(i) || linear[i]) && p.s(i) >= 0 && p.s(i) <= length) {
        seeds.add(i);
      }
    }
    WireFinderOptions.Growth g = options.growth();
    // closely spaced wires are clustered and grown with the span's common sag shape taken out
    DoubleUnaryOperator shape = close == null ? null : SagReference.of(p, seeds.toArray(),
        length);
    SpanPoints q = close == null ? p : p.relativeTo(shape);
    List<int[]> clusters = close == null
        ? WireClusters.of(p, seeds.toArray(), g.stationStretch(), g.clusterRadiusM(),
            g.clusterMinPoints())
        : WireClusters.of(q, seeds.toArray(), close.stationStretch(), close.clusterRadiusM(),
            g.clusterMinPoints());
    double[] tube = close == null ? tube(spec) : new double[] {close.tubeM(), close.tubeM()};
    List<int[]> wires = WireGrowth.grow(q, clusters, 0, length, g, tube[0], tube[1],
        close != null);
    List<ConductorFit.Result> fits = new ArrayList<>();
    List<ConductorFit.Result> failed = new ArrayList<>();
    for (int[] w : wires) {
      ConductorFit.Result r = ConductorFit.fit(p, w, span, false, Double.NaN, Double.NaN,
          arms);
      (r.curve().isPresent() ? fits : failed).add(r);
    }
    List<PositionMatcher.Slot> slots = positions.stream().map(pos -> new PositionMatcher.Slot(
        pos, span.from().attachmentZ(pos.position()), span.to().attachmentZ(pos.position())))
        .toList();
    List<PositionMatcher.Wire> summaries = new ArrayList<>();
    for (ConductorFit.Result r : fits) {
      summaries.add(summary(p, r, span, shape));
    }
    int[] slotOf = PositionMatcher.match(summaries, slots, groundA, groundB);
    List<ConductorFit.Result> finals = new ArrayList<>(failed);
    ConductorNaming naming = new ConductorNaming(options.quality(), span, p);
    for (int j = 0; j < positions.size(); j++) {
      ConductorPosition pos = positions.get(j);
      for (int i = 0; i < fits.size(); i++) {
        if (slotOf[i] == j) {
          List<BundleSplit.Part> parts = BundleSplit.split(p, fits.get(i), span,
              pos.position(), pos.bundle(), pos.bundleSpacingM(), slots.get(j).attachZA(),
              slots.get(j).attachZB(), ends(span, pos, arms));
          parts.forEach(part -> finals.add(part.fit()));
          naming.addPosition(pos, parts);
        }
      }
      naming.closePosition(pos, where(pos));
    }
    List<Integer> extras = new ArrayList<>();
    for (int i = 0; i < fits.size(); i++) {
      if (slotOf[i] < 0) {
        extras.add(i);
      }
    }
    extras.sort(Comparator.comparingDouble(i -> -(summaries.get(i).offsetA()
        + summaries.get(i).offsetB())));
    for (int i : extras) {
      String name = naming.nextExtraName();
      List<BundleSplit.Part> parts = BundleSplit.split(p, fits.get(i), span, name, 1,
          Double.NaN, Double.NaN, Double.NaN, arms);
      parts.forEach(part -> finals.add(part.fit()));
      naming.addExtra(summaries.get(i).role().orElse(ConductorPosition.Role.PHASE), parts);
    }
    for (ConductorFit.Result r : failed) {
      naming.addFailedExtra(roleHint(p, r.members()).orElse(ConductorPosition.Role.PHASE), r);
    }
    boolean[] onWire = PointEvidence.onCurve(p, finals, linear);
    boolean[] taken = onWire.clone();
    for (int[] w : wires) {
      for (int i : w) {
        taken[i] = true;
      }
    }
    SpanWires found = naming.spanWires(p.size(), labelled);
    CrossingFinder.Found crossing = CrossingFinder.find(p, taken, span, found.conductors());
    return new Found(found.withCrossings(crossing.crossings()), onWire, linear,
        crossing.member());
  }

  /**
   * Where a position's conductor ends: at the cross arms, and at a dead-end a strain assembly
   * further into the span (docs/line-inputs.md, strain_length_m), as long as that leaves at
   * least {@link #MIN_CONDUCTOR_SHARE} of the span.
   */
  static ConductorEnds ends(Span span, ConductorPosition pos, ConductorEnds arms) {
    double length = span.lengthM();
    double a = span.from().isDeadEnd() ? pos.strainLengthM() : 0;
    double b = span.to().isDeadEnd() ? pos.strainLengthM() : 0;
    if (length - a - b < MIN_CONDUCTOR_SHARE * length) {
      return arms;
    }
    return arms.withStrain(a, b);
  }

  /** Tube half-width and half-height, m, widened for the specification's bundles. */
  private double[] tube(LineSpec spec) {
    double lat = options.growth().tubeLateralM();
    double vert = options.growth().tubeVerticalM();
    double extraLat = 0;
    double extraVert = 0;
    for (ConductorPosition pos : spec.conductors()) {
      if (pos.bundle() > 1 && Double.isFinite(pos.bundleSpacingM())) {
        extraLat = Math.max(extraLat, pos.bundleSpacingM() / 2);
        if (pos.bundle() > 2) {
          extraVert = Math.max(extraVert, pos.bundleSpacingM() / 2);
        }
      }
    }
    return new double[] {lat + extraLat, vert + extraVert};
  }

  private static String where(ConductorPosition pos) {
    StringBuilder b = new StringBuilder("no wire found");
    if (Double.isFinite(pos.offsetM())) {
      b.append(String.format(Locale.ROOT, " near offset %.1f m", pos.offsetM()));
    }
    if (Double.isFinite(pos.attachHeightM())) {
      b.append(String.format(Locale.ROOT, "%s %.1f m above the structures' ground",
          Double.isFinite(pos.offsetM()) ? "," : " at", pos.attachHeightM()));
    }
    return b.toString();
  }

  /**
   * The wire as the matcher sees it.
   *
   * @param shape the span's common sag shape ({@link SagReference}), or null (wide spacing)
   */
  private static PositionMatcher.Wire summary(SpanPoints p, ConductorFit.Result r, Span span,
      DoubleUnaryOperator shape) {
    ConductorCurve c = r.curve().orElseThrow();
    double eA = span.frame().offset(c.x(0), c.y(0));
    double eB = span.frame().offset(c.x(c.length()), c.y(c.length()));
    int[] m = r.members();
    double length = span.lengthM();
    double reach = NEAR_END_SHARE * length;
    boolean nearA = p.s(m[0]) <= reach;
    boolean nearB = p.s(m[m.length - 1]) >= length - reach;
    double zA = c.zA();
    double zB = c.zB();
    if (shape != null && p.s(m[m.length - 1]) - p.s(m[0]) < SHORT_PIECE_SHARE * length) {
      // a short piece's own curve extrapolates its sag poorly: carry its level in the stack
      // to the structures along the span's common sag shape instead
      double[] level = new double[m.length];
      for (int k = 0; k < m.length; k++) {
        level[k] = p.z(m[k]) - shape.applyAsDouble(p.s(m[k]));
      }
      java.util.Arrays.sort(level);
      double median = level[m.length / 2];
      zA = shape.applyAsDouble(0) + median;
      zB = shape.applyAsDouble(length) + median;
    }
    return new PositionMatcher.Wire(eA, eB, zA, zB, roleHint(p, m), nearA || !nearB,
        nearB || !nearA);
  }

  /** The role the members' labels show, when at least half of them carry one. */
  static Optional<ConductorPosition.Role> roleHint(SpanPoints p, int[] members) {
    int shield = 0;
    int phase = 0;
    for (int i : members) {
      shield += p.cls(i) == SpanPoints.SHIELD_CLASS ? 1 : 0;
      phase += p.cls(i) == SpanPoints.CONDUCTOR_CLASS ? 1 : 0;
    }
    if (shield + phase < LABEL_SHARE * members.length) {
      return Optional.empty();
    }
    return Optional.of(shield > phase ? ConductorPosition.Role.SHIELD
        : ConductorPosition.Role.PHASE);
  }
}
