package org.clearance.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.clearance.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every validation error names the file, line and key (docs/rules.md; STYLE.md point 9: an
 * unknown key, a negative distance: an error that names the file, line and key).
 */
class ProfileValidationTest {

  /** A valid profile; each case changes one thing. Lines are numbered in the comments. */
  private static final String HEAD = """
      name: t
      title: T
      source: S
      zones:
      """; // lines 1-4

  private static Arguments error(String name, String text, int line, String key,
      String problem) {
    return Arguments.of(name, text, line, key, problem);
  }

  static Stream<Arguments> cases() {
    return Stream.of(
        error("unknown top-level key", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all], radial_m: 2}
            colour: red
            """, 6, "colour", "unknown key"),
        error("missing title", """
            name: t
            source: S
            zones:
              - {name: a, priority: 1, violation_reference: true, conditions: [all], radial_m: 2}
            """, 1, "title", "required key missing"),
        error("priority is not a number", HEAD + """
              - {name: a, priority: high, violation_reference: true, conditions: [all],
                 radial_m: 2}
            """, 5, "priority", "expected a whole number"),
        error("negative distance", HEAD + """
              - name: a
                priority: 1
                violation_reference: true
                conditions: [all]
                radial_m: -1.5
            """, 9, "radial_m", "must be greater than zero"),
        error("negative table distance", HEAD + """
              - name: a
                priority: 1
                violation_reference: true
                conditions: [all]
                radial_m:
                  by_voltage:
                    - {min_kv: 0, m: -2}
            """, 11, "m", "must be greater than zero"),
        error("priority clash", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all], radial_m: 2}
              - name: b
                priority: 1
                conditions: [all]
                radial_m: 3
            """, 7, "priority", "already used by zone 'a'"),
        error("unknown condition group", HEAD + """
              - name: a
                priority: 1
                violation_reference: true
                conditions: [survey, warm]
                radial_m: 2
            """, 8, "conditions", "unknown condition group 'warm'"),
        error("unknown extends target", """
            name: t
            title: T
            source: S
            extends: no-such-profile-anywhere
            """, 4, "extends", "unknown profile 'no-such-profile-anywhere'"),
        error("no violation reference", HEAD + """
              - {name: a, priority: 1, conditions: [all], radial_m: 2}
            """, 4, "zones", "no zone is marked violation_reference"),
        error("reference zones overlap", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all], radial_m: 2,
                 voltage: {min_kv: 0, below_kv: 72}}
              - name: b
                priority: 2
                violation_reference: true
                voltage: {min_kv: 69}
                conditions: [all]
                radial_m: 3
            """, 9, "violation_reference", "reference zones must cover separate voltage bands"),
        error("based on an unknown zone", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all], radial_m: 2}
              - name: b
                priority: 2
                conditions: [all]
                radial_m: {based_on_zone: c, plus_m: 1}
            """, 9, "radial_m", "unknown zone 'c'"),
        error("zones based on each other", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all],
                 radial_m: {based_on_zone: b}}
              - {name: b, priority: 2, conditions: [all], radial_m: {based_on_zone: a}}
            """, 6, "radial_m", "cycle: a -> b -> a"),
        error("cycle growth without growth rates", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all], radial_m: 2}
              - {name: b, priority: 2, conditions: [all],
                 radial_m: {based_on_zone: a, plus_cycle_growth: true}}
            """, 7, "radial_m", "needs growth_m_per_year and trim_cycle_years"),
        error("components built on a radial zone", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all], radial_m: 2}
              - name: b
                priority: 2
                conditions: [all]
                horizontal_m: {based_on_zone: a}
                vertical_m: 2
            """, 9, "horizontal_m", "has no horizontal_m"),
        error("unknown zone key", HEAD + """
              - name: a
                priority: 1
                violation_reference: true
                conditions: [all]
                distance_m: 2
            """, 9, "distance_m", "unknown key"),
        error("zone without a distance", HEAD + """
              - name: a
                priority: 1
                violation_reference: true
                conditions: [all]
            """, 5, "radial_m", "needs a distance"),
        error("zone with radial and components", HEAD + """
              - name: a
                priority: 1
                violation_reference: true
                conditions: [all]
                radial_m: 2
                horizontal_m: 2
                vertical_m: 1
            """, 10, "horizontal_m", "either radial_m or"),
        error("growth without a default", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all], radial_m: 2}
            growth_m_per_year:
              class_5: {vertical: 1, lateral: 0.5}
            """, 6, "default", "need a default"),
        error("growth class out of range", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all], radial_m: 2}
            growth_m_per_year:
              class_300: {vertical: 1, lateral: 0.5}
              default: {vertical: 1, lateral: 0.5}
            """, 7, "class_300", "keyed class_"),
        error("altitude columns missing", HEAD + """
              - name: a
                priority: 1
                violation_reference: true
                conditions: [all]
                radial_m:
                  altitude_tops_m: [500, 1000]
                  by_voltage:
                    - {min_kv: 0, m: 2}
            """, 12, "m", "expected 2 distances"),
        error("both upper band edges", HEAD + """
              - name: a
                priority: 1
                violation_reference: true
                voltage: {min_kv: 10, below_kv: 20, max_kv: 20}
                conditions: [all]
                radial_m: 2
            """, 8, "max_kv", "not both"),
        error("yes is not a boolean here", HEAD + """
              - name: a
                priority: 1
                violation_reference: yes
                conditions: [all]
                radial_m: 2
            """, 7, "violation_reference", "expected true or false"),
        error("middle fraction above one", HEAD + """
              - name: a
                priority: 1
                violation_reference: true
                conditions: [all]
                radial_m: 2
                midspan_allowance: {middle_fraction: 1.5, add_m_per_100m: 0.1}
            """, 10, "middle_fraction", "at most 1"),
        error("duplicate key", HEAD + """
              - name: a
                priority: 1
                priority: 2
                violation_reference: true
                conditions: [all]
                radial_m: 2
            """, 7, "priority", "twice"),
        error("trim cycle of zero years", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all], radial_m: 2}
            trim_cycle_years: 0
            """, 6, "trim_cycle_years", "0 years is outside the plausible range 0.1 to 30"),
        // issue 10 item 13: class_05 beside class_5 silently replaced one rate with the other
        error("growth class with a leading zero", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all], radial_m: 2}
            growth_m_per_year:
              class_5: {vertical: 1, lateral: 0.5}
              class_05: {vertical: 3, lateral: 0.5}
              default: {vertical: 1, lateral: 0.5}
            """, 8, "class_05", "write class_5"),
        // issue 10 item 13: conditions: [all, all] was accepted
        error("condition group twice", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all, all],
                 radial_m: 2}
            """, 5, "conditions", "listed twice"),
        error("all beside a group", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all, hot],
                 radial_m: 2}
            """, 5, "conditions", "list it alone"),
        error("growth in cm per year", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all], radial_m: 2}
            growth_m_per_year:
              default: {vertical: 30, lateral: 0.5}
            """, 7, "vertical", "30 m per year is outside"),
        error("distance in mm", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all],
                 radial_m: 1500}
            """, 6, "radial_m", "1500 m is outside the plausible range 0 to 200 m"),
        error("voltage in volts", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all],
                 radial_m: 2, voltage: {min_kv: 0, below_kv: 230000}}
            """, 6, "below_kv", "230000 kV is outside"),
        // issue 10 item 13: a user profile could take a built-in profile's name
        error("user profile with a built-in name", HEAD.replace("name: t",
            "name: us-fac003-mvcd") + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all], radial_m: 2}
            """, 1, "name", "is the name of a built-in profile"),
        error("fall-in without conditions", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all], radial_m: 2}
            fall_in: {enabled: true, reach_allowance_m: 0.5}
            """, 6, "conditions", "fall-in rule needs the conditions"),
        error("unknown conductor role", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all], radial_m: 2,
                 conductor_roles: [phase, earth]}
            """, 6, "conductor_roles", "unknown conductor role 'earth'"),
        error("conductor role twice", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all], radial_m: 2,
                 conductor_roles: [phase, neutral, phase]}
            """, 6, "conductor_roles", "listed twice"),
        error("no conductor role", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all], radial_m: 2,
                 conductor_roles: []}
            """, 6, "conductor_roles", "at least one conductor role"),
        error("reference zone without the energised conductors", HEAD + """
              - {name: a, priority: 1, violation_reference: true, conditions: [all], radial_m: 2,
                 conductor_roles: [neutral]}
            """, 6, "conductor_roles", "must apply to the energised conductors"),
        error("not YAML", HEAD + """
              - {name: a, priority: 1
            """, 6, null, "not valid YAML"));
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("cases")
  void namesFileLineAndKey(String name, String text, int line, String key, String problem) {
    InputException e =
        assertThrows(InputException.class, () -> RuleProfileReader.parse(text, "p.yaml"));
    assertEquals("p.yaml", e.file(), e.getMessage());
    assertEquals("line " + line, e.location(), e.getMessage());
    assertEquals(key, e.field(), e.getMessage());
    assertTrue(e.problem().contains(problem), e.getMessage());
  }

  @Test
  void extendsCycleAcrossFiles(@TempDir Path dir) throws IOException {
    Files.writeString(dir.resolve("a.yaml"), "name: a\ntitle: A\nsource: S\nextends: b.yaml\n");
    Files.writeString(dir.resolve("b.yaml"), "name: b\ntitle: B\nsource: S\nextends: a.yaml\n");
    InputException e = assertThrows(InputException.class,
        () -> RuleProfileReader.read(dir.resolve("a.yaml")));
    assertTrue(e.file().endsWith("b.yaml"), e.getMessage());
    assertEquals("line 4", e.location());
    assertEquals("extends", e.field());
    assertTrue(e.problem().contains("cycle"), e.getMessage());
  }

  @Test
  void errorInAnOverrideNamesTheOverridingFile(@TempDir Path dir) throws IOException {
    Path child = dir.resolve("child.yaml");
    Files.writeString(child, String.join("\n", "name: child", "title: C", "source: S",
        "extends: ca-prc4293", "zones:", "  - name: prc4293", "    priority: 0", ""));
    InputException e = assertThrows(InputException.class, () -> RuleProfileReader.read(child));
    assertEquals(child.toString(), e.file());
    assertEquals("line 7", e.location());
    assertEquals("priority", e.field());
  }

  @Test
  void nullRemovesAnInheritedKey(@TempDir Path dir) throws IOException {
    // Switching an inherited radial zone to components needs radial_m removed explicitly.
    Path child = dir.resolve("child.yaml");
    Files.writeString(child, String.join("\n", "name: child", "title: C", "source: S",
        "extends: ca-prc4293", "zones:", "  - name: prc4293", "    radial_m: null",
        "    horizontal_m: 3", "    vertical_m: 2", ""));
    RuleProfile p = RuleProfileReader.read(child);
    assertTrue(p.zone("prc4293").orElseThrow().measurement() instanceof Measurement.Components);
  }

  @Test
  void extendsByRelativePathAndHashFollowsTheParent(@TempDir Path dir) throws IOException {
    Path sub = Files.createDirectories(dir.resolve("sub"));
    Path parent = dir.resolve("parent.yaml");
    String parentText = String.join("\n", "name: parent", "title: P", "source: S", "zones:",
        "  - {name: a, priority: 1, violation_reference: true, conditions: [all], radial_m: 2}",
        "");
    Files.writeString(parent, parentText);
    Path child = sub.resolve("child.yaml");
    Files.writeString(child, "name: child\ntitle: C\nsource: S\nextends: ../parent.yaml\n");
    RuleProfile first = RuleProfiles.byNameOrPath(child.toString());
    assertEquals(2, first.zone("a").map(z -> ((DistanceSpec.Fixed)
        ((Measurement.Radial) z.measurement()).radial()).metres()).orElseThrow(), 0);
    Files.writeString(parent, parentText.replace("radial_m: 2", "radial_m: 2.5"));
    RuleProfile second = RuleProfileReader.read(child);
    assertTrue(!first.contentHash().equals(second.contentHash()));
  }

  @Test
  void profileOptionNamesTheOption() {
    InputException e = assertThrows(InputException.class,
        () -> RuleProfiles.byNameOrPath("no-such-file.yaml"));
    assertEquals("--rules", e.file());
  }
}
