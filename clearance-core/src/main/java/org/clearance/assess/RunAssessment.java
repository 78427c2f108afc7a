package org.clearance.assess;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import org.clearance.rules.RuleProfile;
import org.clearance.run.RunModel;

/**
 * A run evaluated under a rule profile: every span's outcome in ranking order, and the point
 * samples the report draws.
 *
 * @param model the run model
 * @param profile the profile applied, or empty when none was given (then every span is NOT
 *     ASSESSED and none is ranked)
 * @param spans span outcomes, in ranking order (model order without a profile)
 * @param drawings point samples for drawing, by span id (spans with points only)
 * @param lonLatNote how longitude and latitude were computed, or why they were not
 * @param lonLatKnown whether sites carry longitude and latitude
 */
public record RunAssessment(
    RunModel model, Optional<RuleProfile> profile, List<SpanResult> spans,
    Map<String, SpanPoints> drawings, String lonLatNote, boolean lonLatKnown) {

  public RunAssessment {
    Objects.requireNonNull(model, "model");
    Objects.requireNonNull(profile, "profile");
    spans = List.copyOf(spans);
    drawings = Map.copyOf(drawings);
    Objects.requireNonNull(lonLatNote, "lonLatNote");
  }

  /** Every site of the run, spans in ranking order and sites in span order. */
  public List<CutSite> sites() {
    return spans.stream().flatMap(s -> s.sites().stream()).toList();
  }

  /** Priority given to fall-in sites: after every zone of the profile. */
  public static int fallInPriority(RuleProfile profile) {
    return profile.zones().stream().mapToInt(z -> z.priority()).max().orElse(0) + 1;
  }
}
