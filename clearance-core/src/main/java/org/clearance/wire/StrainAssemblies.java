package org.clearance.wire;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.clearance.line.ConductorPosition;
import org.clearance.line.LineLayout;
import org.clearance.line.Span;
import org.clearance.line.StructureType;

/**
 * Ends fitted conductors where they really end at dead-end structures: at the far end of the
 * strain insulator assembly, {@code strain_length_m} of the line specification from the
 * structure's cross-section, measured along the conductor (docs/line-inputs.md). The fitted
 * catenary is the same curve; only its attachment points move inward, so that the hot, ice and
 * wind states regenerated through the attachments hang from the real ends of the wire.
 */
final class StrainAssemblies {

  private StrainAssemblies() {}

  /** The result with every conductor at a dead-end cut back by its strain assembly length. */
  static WireResult apply(WireResult result) {
    List<SpanWires> spans = new ArrayList<>();
    for (SpanWires sw : result.spans()) {
      Optional<LineLayout> line = result.layout().line(sw.span().lineId());
      Map<String, ConductorPosition> positions = line.isEmpty() ? Map.of()
          : line.get().spec().conductors().stream()
              .collect(Collectors.toMap(ConductorPosition::position, Function.identity()));
      List<FittedConductor> conductors = new ArrayList<>();
      for (FittedConductor c : sw.conductors()) {
        ConductorPosition p = c.position().map(positions::get).orElse(null);
        conductors.add(p == null || p.strainLengthM() == 0 || c.curve().isEmpty() ? c
            : trim(c, sw.span(), p.strainLengthM()));
      }
      spans.add(new SpanWires(sw.span(), sw.status(), sw.reason(), conductors,
          sw.candidatePoints(), sw.labelled()));
    }
    return new WireResult(result.layout(), spans, result.structureChanges());
  }

  private static FittedConductor trim(FittedConductor c, Span span, double strain) {
    ConductorCurve curve = c.curve().get();
    double len = curve.length();
    double a = span.from().type() == StructureType.DEAD_END
        ? strain / Math.hypot(1, curve.curve().slope(0)) : 0;
    double b = span.to().type() == StructureType.DEAD_END
        ? strain / Math.hypot(1, curve.curve().slope(len)) : 0;
    if (a + b >= 0.5 * len) {
      return c; // an assembly half as long as the span is a data error; keep the fit as it is
    }
    return new FittedConductor(c.name(), c.role(), c.position(),
        Optional.of(curve.trimmed(a, b)), c.covariance(), c.quality(), c.surveySwingRad(),
        c.status(), c.reason(), c.bundle());
  }
}
