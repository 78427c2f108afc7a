package org.clearance.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import org.clearance.InputException;
import org.clearance.io.TextMutations;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * Seeded fuzz test of rule profile reading (issue 10, "Done when"): mutations of the example
 * utility profile, read as a user file extending a built-in one. Every case ends either in one
 * {@link InputException} line naming the file, or in a valid profile with at least one zone.
 */
class ProfileFuzzTest {
  private static final long SEED = 13_2026L;
  private static final int CASES = 700;

  @TempDir Path dir;

  @Test
  @Timeout(value = 5, unit = TimeUnit.MINUTES) // a hang guard, not a speed target
  void mutatedProfilesAreRejectedCleanlyOrValid() throws IOException {
    String seed = Files.readString(Path.of("../span-specs/rules/example-utility.yaml"))
        .replace("name: example-utility", "name: corvane-ridge");
    Path p = dir.resolve("profile.yaml");
    Files.writeString(p, seed);
    RuleProfile reference = RuleProfileReader.read(p);
    Random rnd = new Random(SEED);
    Map<String, Integer> rejected = new TreeMap<>();
    Map<String, Integer> accepted = new TreeMap<>();
    for (int c = 0; c < CASES; c++) {
      TextMutations.Mutation m = TextMutations.mutate(seed, rnd);
      Files.write(p, m.bytes());
      try {
        RuleProfile r = RuleProfileReader.read(p);
        assertFalse(r.zones().isEmpty());
        String why = r.zones().equals(reference.zones()) && r.growth().equals(reference.growth())
            && r.fallIn().equals(reference.fallIn())
            ? "same zones, growth and fall-in as the seed (text or names changed)"
            : "other zones or values, each checked";
        accepted.merge(why, 1, Integer::sum);
      } catch (InputException e) {
        String msg = e.getMessage();
        assertTrue(msg.startsWith(p.toString()) || msg.startsWith("builtin:"),
            "names the file: " + msg);
        assertFalse(msg.contains("\n") || msg.contains("\r"), "one line: " + msg);
        rejected.merge(kind(e), 1, Integer::sum);
      } catch (Throwable e) {
        throw new AssertionError("case " + c + " (seed " + SEED + ", " + m.what() + "): " + e,
            e);
      }
    }
    System.out.printf("profile fuzz: %d cases, rejected by field %s, accepted %s%n", CASES,
        rejected, accepted);
    int total = rejected.values().stream().mapToInt(Integer::intValue).sum()
        + accepted.values().stream().mapToInt(Integer::intValue).sum();
    assertEquals(CASES, total);
  }

  /** What a rejection names besides the file: line (or record) and field, line only, or none. */
  static String kind(InputException e) {
    if (e.location() != null && e.field() != null) {
      return "file, line and field";
    }
    return e.location() != null ? "file and line" : e.field() != null ? "file and field"
        : "file only";
  }
}
