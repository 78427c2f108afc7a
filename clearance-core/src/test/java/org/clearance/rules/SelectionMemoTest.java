package org.clearance.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.clearance.clearance.ConditionDistance;
import org.junit.jupiter.api.Test;

/**
 * The remembered answers are the selector's own (exact, booleans): for the shared condition
 * strings of a run, for fresh string instances of equal text, for more pairs than it keeps, and
 * from several threads at once.
 */
class SelectionMemoTest {

  private static final List<String> GROUPS = List.of("survey", "hot", "blowout", "ice");

  private static ConditionDistance at(String condition, String group) {
    return new ConditionDistance(condition, group, 1.0, 1.0, 0.0, "A", 10.0);
  }

  @Test
  void sameAnswersAsTheSelector() throws Exception {
    List<ConditionSelector> selectors = List.of(
        new ConditionSelector(Set.of("hot", "blowout"), Set.of()),
        new ConditionSelector(Set.of(ConditionSelector.ALL), Set.of()),
        new ConditionSelector(Set.of(), Set.of("storm-90", "c3")),
        new ConditionSelector(Set.of("ice"), Set.of("c7")));
    List<ConditionDistance> shared = new ArrayList<>();
    for (int c = 0; c < 12; c++) {
      shared.add(at("c" + c, GROUPS.get(c % GROUPS.size())));
    }
    shared.add(at("storm-90", "blowout"));
    for (ConditionSelector selector : selectors) {
      SelectionMemo memo = new SelectionMemo(selector);
      ExecutorService pool = Executors.newFixedThreadPool(3);
      try {
        List<Future<?>> done = new ArrayList<>();
        for (int t = 0; t < 3; t++) {
          long seed = t;
          done.add(pool.submit(() -> {
            Random r = new Random(seed);
            for (int i = 0; i < 20_000; i++) {
              ConditionDistance d = shared.get(r.nextInt(shared.size()));
              if (i % 3 == 0) { // equal text, other instances: never remembered wrongly
                d = at(new String(d.condition()), new String(d.group()));
              }
              assertEquals(selector.selects(d), memo.selects(d), d.toString());
            }
          }));
        }
        for (Future<?> f : done) {
          f.get();
        }
      } finally {
        pool.shutdown();
      }
      for (int i = 0; i < 3 * SelectionMemo.MAX_PAIRS; i++) { // beyond what it keeps
        ConditionDistance d = at("x" + i, GROUPS.get(i % GROUPS.size()));
        assertEquals(selector.selects(d), memo.selects(d), d.toString());
      }
    }
  }
}
