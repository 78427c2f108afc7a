package org.clearance.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalInt;
import org.clearance.assess.SpanResult;
import org.clearance.rules.RuleProfileReader;
import org.clearance.rules.ZoneEvaluator;
import org.clearance.run.ConductorRecord;
import org.clearance.run.RunFixture;
import org.clearance.run.SpanRecord;
import org.junit.jupiter.api.Test;

/**
 * Issue 15: the report draws a zone's band only around the conductors the zone applies to; a
 * neutral (or shield wire) is not drawn as if live unless the zone names its role.
 */
class ZoneBandTest {

  /** What the plan view draws a band with (SvgSpanViews). */
  private static final String BAND = "fill-opacity=\"0.16\"";

  private static String profile(String roles) {
    return "name: bands\ntitle: Bands\nsource: Hand-made test profile.\nzones:\n"
        + "  - {name: live, priority: 1, violation_reference: true, conditions: [all],\n"
        + "     radial_m: 2" + roles + "}\n";
  }

  private static int bands(SpanRecord span, String profileText) {
    var rules = new ZoneEvaluator(RuleProfileReader.parse(profileText, "bands.yaml"))
        .forSpan(span.context());
    SpanResult result = new SpanResult(span, span.status(), "", List.of(), OptionalInt.empty(),
        0, 0);
    String svg = new SvgSpanViews(result, -1, rules, null,
        new OutputUnit(org.clearance.survey.LinearUnit.METRE)).plan().svg();
    return svg.split(java.util.regex.Pattern.quote(BAND), -1).length - 1;
  }

  @Test
  void aNeutralGetsABandOnlyWhenTheZoneNamesItsRole() {
    SpanRecord s = RunFixture.metric().model().spans().get(0);
    List<ConductorRecord> cs = new ArrayList<>(s.conductors());
    ConductorRecord c = cs.get(2);
    cs.set(2, new ConductorRecord(c.name(), "neutral", c.status(), c.reason(), c.points(),
        c.coveragePct(), c.rmsM(), c.maxGapM(), c.states(), c.failures()));
    SpanRecord withNeutral = new SpanRecord(s.context(), s.lineName(), s.from(), s.to(),
        s.status(), s.reason(), cs, s.minima(), s.pointsMeasured(), s.pointsKept(), s.notes(),
        s.setAside());
    assertTrue(cs.stream().allMatch(ConductorRecord::fitted), "the fixture's span is fitted");
    assertEquals(3, bands(s, profile("")), "three phases");
    assertEquals(2, bands(withNeutral, profile("")), "two phases, no band on the neutral");
    assertEquals(3, bands(withNeutral, profile(", conductor_roles: [phase, neutral]")),
        "the zone names the neutral");
  }
}
