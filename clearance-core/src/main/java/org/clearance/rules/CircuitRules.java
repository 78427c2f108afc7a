package org.clearance.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.clearance.clearance.SpanContext;

/**
 * A rule profile resolved for every voltage a span's energised conductors carry (issue 15: a
 * distribution circuit under a transmission line on the same structures is held to its own
 * voltage's zones, the transmission circuit to its own). A span of one voltage has one part,
 * the profile resolved at the line's nominal voltage, as {@link ZoneEvaluator#forSpan} gives it.
 *
 * <p>Each point is then checked by each part against its distances to the nearest conductor of
 * that part's voltage ({@code PointClearance.atVoltage}); the worst finding counts
 * ({@link #worse}). A voltage the profile does not cover (for example a 12.47 kV underbuild
 * under a profile for 200 kV and above) leaves its conductors not checked: the span is NOT
 * ASSESSED when no voltage is covered, and incomplete otherwise, with the reason.
 */
public final class CircuitRules {

  /**
   * The profile at one voltage.
   *
   * @param kv the voltage, kV
   * @param positions the energised positions that carry it (empty on a span of one voltage)
   * @param rules the profile resolved for the span at that voltage
   */
  public record Part(double kv, List<String> positions, SpanRules rules) {
    public Part {
      positions = List.copyOf(positions);
      Objects.requireNonNull(rules, "rules");
    }

    /** Words for messages: {@code 12.47 kV (positions D, E, F)}. */
    public String describe() {
      return VoltageBand.kv(kv) + (positions.isEmpty() ? ""
          : " (position" + (positions.size() > 1 ? "s " : " ") + String.join(", ", positions)
              + ")");
    }
  }

  private final SpanContext span;
  private final List<Part> parts;

  private CircuitRules(SpanContext span, List<Part> parts) {
    this.span = span;
    this.parts = List.copyOf(parts);
  }

  /** The profile resolved for each voltage of the span, highest voltage first. */
  public static CircuitRules forSpan(ZoneEvaluator evaluator, SpanContext span) {
    List<Part> parts = new ArrayList<>();
    if (!span.multiVoltage()) {
      parts.add(new Part(span.nominalVoltageKv(), List.of(), evaluator.forSpan(span)));
    } else {
      for (double kv : span.voltagesKv()) {
        List<String> positions = span.positionVoltagesKv().entrySet().stream()
            .filter(e -> e.getValue() == kv).map(java.util.Map.Entry::getKey).toList();
        parts.add(new Part(kv, positions, evaluator.forSpan(span.atVoltage(kv))));
      }
    }
    return new CircuitRules(span, parts);
  }

  public SpanContext span() {
    return span;
  }

  /** Every part, highest voltage first. */
  public List<Part> parts() {
    return parts;
  }

  /** The parts the profile can assess, highest voltage first. */
  public List<Part> assessed() {
    return parts.stream().filter(p -> p.rules().assessed()).toList();
  }

  /** Whether the span carries more than one voltage. */
  public boolean multiVoltage() {
    return parts.size() > 1;
  }

  /**
   * The rules that speak for the whole span where one set must (fall-in, the report's drawing):
   * the highest voltage the profile assesses (its zones are the widest of a profile whose
   * distances grow with voltage), or the highest voltage when none is assessed.
   */
  public SpanRules main() {
    return assessed().stream().findFirst().orElse(parts.get(0)).rules();
  }

  /** Why the span is NOT ASSESSED: when no voltage of it can be assessed. */
  public Optional<String> notAssessedReason() {
    if (!assessed().isEmpty()) {
      return Optional.empty();
    }
    if (!multiVoltage()) {
      return parts.get(0).rules().notAssessedReason();
    }
    List<String> reasons = new ArrayList<>();
    for (Part p : parts) {
      reasons.add("conductors at " + p.describe() + ": " + p.rules().notAssessedReason()
          .orElse(""));
    }
    return Optional.of(String.join("; ", reasons));
  }

  /**
   * Why some conductors are not checked though others are: one text per voltage the profile
   * cannot assess on a span whose other voltages it can (the span is then incomplete).
   */
  public List<String> uncovered() {
    List<String> out = new ArrayList<>();
    if (assessed().isEmpty()) {
      return out;
    }
    for (Part p : parts) {
      if (!p.rules().assessed()) {
        out.add("conductors at " + p.describe() + " not checked: "
            + p.rules().notAssessedReason().orElse(""));
      }
    }
    return out;
  }

  /**
   * Whether finding {@code a} is worse than {@code b}: inside a zone beats everything else; of
   * two inside, the more urgent zone (lower priority number), then the larger deficit; a point
   * not assessed beats a clear one (it is never shown clear).
   */
  public static boolean worse(PointFinding a, PointFinding b) {
    if (b == null) {
      return true;
    }
    int ra = rank(a);
    int rb = rank(b);
    if (ra != rb) {
      return ra > rb;
    }
    if (a.violation().isPresent() && b.violation().isPresent()) {
      ZoneViolation va = a.violation().get();
      ZoneViolation vb = b.violation().get();
      if (va.zone().priority() != vb.zone().priority()) {
        return va.zone().priority() < vb.zone().priority();
      }
      return va.deficitM() > vb.deficitM();
    }
    return false;
  }

  private static int rank(PointFinding f) {
    return switch (f.verdict()) {
      case INSIDE_ZONE -> 2;
      case NOT_ASSESSED -> 1;
      default -> 0;
    };
  }
}
