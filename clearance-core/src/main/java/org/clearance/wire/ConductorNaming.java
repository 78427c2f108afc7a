package org.clearance.wire;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.clearance.line.ConductorPosition;
import org.clearance.line.Span;

/**
 * Turns the fits of one span into named, judged conductors and the span's verdict
 * (package-private). Names: the specification position ({@code B}), a bundle sub-conductor
 * ({@code B.1}, numbered from the right looking along the span), or {@code extra1},
 * {@code extra2} ... from left to right for wires the specification lacks.
 */
final class ConductorNaming {

  /** Prefix of the automatic names of extras. */
  static final String EXTRA = "extra";

  private final WireFinderOptions.Quality quality;
  private final Span span;
  private final List<FittedConductor> positions = new ArrayList<>();
  private final List<FittedConductor> extras = new ArrayList<>();
  private final List<String> phaseProblems = new ArrayList<>();
  private int addedForPosition;
  private int extraCount;

  private final SpanPoints points;

  ConductorNaming(WireFinderOptions.Quality quality, Span span, SpanPoints points) {
    this.quality = quality;
    this.span = span;
    this.points = points;
  }

  private Optional<WireExtent> extent(int[] members) {
    return Optional.ofNullable(WireExtent.of(points, members, span.frame()));
  }

  /** Adds the parts of a wire matched to a specification position. */
  void addPosition(ConductorPosition pos, List<BundleSplit.Part> parts) {
    for (BundleSplit.Part part : parts) {
      FittedConductor c = conductor(name(pos.position(), part), pos.role(),
          Optional.of(pos.position()), part);
      positions.add(c);
      addedForPosition++;
      if (pos.isPhase() && !c.isFitted()) {
        phaseProblems.add(c.name() + ": " + c.reason().orElseThrow());
      }
    }
  }

  /** Ends a position: a position no wire was matched to gets a not-assessed entry. */
  void closePosition(ConductorPosition pos, String missingReason) {
    if (addedForPosition == 0) {
      positions.add(FittedConductor.missing(pos, missingReason));
      if (pos.isPhase()) {
        phaseProblems.add(pos.position() + ": " + missingReason);
      }
    }
    addedForPosition = 0;
  }

  /** The next automatic name for an extra. */
  String nextExtraName() {
    return EXTRA + (++extraCount);
  }

  /** Adds the parts of an extra named by {@link #nextExtraName()}. */
  void addExtra(ConductorPosition.Role role, List<BundleSplit.Part> parts) {
    String base = EXTRA + extraCount;
    for (BundleSplit.Part part : parts) {
      extras.add(conductor(name(base, part), role, Optional.empty(), part));
    }
  }

  /** Adds a wire whose catenary fit failed, as a not-assessed extra. */
  void addFailedExtra(ConductorPosition.Role role, ConductorFit.Result r) {
    String why = r.failure().orElse("no catenary fitted");
    extras.add(new FittedConductor(nextExtraName(), role, Optional.empty(), Optional.empty(),
        Optional.empty(), new WireQuality(r.members().length, Double.NaN, Double.NaN, Double.NaN,
            Double.NaN), Double.NaN, WireStatus.NOT_ASSESSED,
        Optional.of("no conductor curve: " + why),
        Optional.empty(), extent(r.members())));
  }

  /** The span's result. */
  SpanWires spanWires(int candidates, boolean labelled) {
    List<FittedConductor> all = new ArrayList<>(positions);
    all.addAll(extras);
    if (phaseProblems.isEmpty()) {
      return new SpanWires(span, WireStatus.FITTED, Optional.empty(), all, candidates, labelled);
    }
    String why = "phase conductors not assessed: " + String.join("; ", phaseProblems);
    return new SpanWires(span, WireStatus.NOT_ASSESSED, Optional.of(why), all, candidates,
        labelled);
  }

  private static String name(String base, BundleSplit.Part part) {
    return part.bundle().filter(b -> !b.whole()).map(b -> base + "." + b.index()).orElse(base);
  }

  private FittedConductor conductor(String name, ConductorPosition.Role role,
      Optional<String> position, BundleSplit.Part part) {
    ConductorFit.Result r = part.fit();
    Optional<String> why = judge(r, part.bundle());
    Optional<CatenaryCovariance> cov = r.fit() == null ? Optional.empty()
        : r.fit().covariance();
    Optional<ConductorCurve> curve = r.curve();
    if (why.isPresent() && !(r.quality().curveSigmaM() <= quality.maxCurveSigmaM())) {
      // An extrapolation this uncertain (a short piece at one end) is no curve to show.
      curve = Optional.empty();
      cov = Optional.empty();
    }
    return new FittedConductor(name, role, position, curve, cov, r.quality(), r.swingRad(),
        why.isEmpty() ? WireStatus.FITTED : WireStatus.NOT_ASSESSED, why, part.bundle(),
        extent(r.members()));
  }

  /** Why a fit is below the quality thresholds, or empty when it passes. */
  Optional<String> judge(ConductorFit.Result r, Optional<BundleInfo> bundle) {
    if (r.curve().isEmpty()) {
      return Optional.of("no conductor curve: " + r.failure().orElse("fit failed"));
    }
    WireQuality q = r.quality();
    if (q.points() < quality.minPoints()) {
      return Optional.of(String.format(Locale.ROOT,
          "only %d points on the curve (at least %d needed)", q.points(), quality.minPoints()));
    }
    if (!(q.coveragePct() >= quality.minCoveragePct())) {
      return Optional.of(String.format(Locale.ROOT,
          "points cover %.0f %% of the span (at least %.0f %% needed)", q.coveragePct(),
          quality.minCoveragePct()));
    }
    double rms = q.rmsM();
    if (bundle.isPresent() && bundle.get().whole()) {
      double half = bundle.get().spreadM() / 2;
      rms = Math.sqrt(Math.max(0, rms * rms - half * half));
    }
    if (!(rms <= quality.maxRmsM())) {
      return Optional.of(String.format(Locale.ROOT,
          "RMS residual %.3f m (at most %.3f m)", rms, quality.maxRmsM()));
    }
    if (Double.isNaN(q.curveSigmaM())) {
      return Optional.of("the fit leaves no redundancy to estimate the curve's uncertainty");
    }
    if (!(q.curveSigmaM() <= quality.maxCurveSigmaM())) {
      return Optional.of(String.format(Locale.ROOT,
          "curve elevation uncertain by up to %.2f m (at most %.2f m)", q.curveSigmaM(),
          quality.maxCurveSigmaM()));
    }
    return Optional.empty();
  }
}
