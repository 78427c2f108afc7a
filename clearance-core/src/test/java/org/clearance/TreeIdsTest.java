package org.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import org.clearance.clearance.TreeClearance;
import org.clearance.ground.Tree;
import org.clearance.line.ConductorLibrary;
import org.clearance.line.LineSpecReader;
import org.clearance.line.SpanLayout;
import org.clearance.line.StructureReader;
import org.clearance.survey.SurveyUnits;
import org.clearance.wire.SpanWires;
import org.clearance.wire.WireResult;
import org.clearance.wire.WireStatus;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 11: tree ids follow where the trees stand (span in line order, then station and offset),
 * never the order in which threads or tiles found them.
 */
class TreeIdsTest {

  @TempDir Path dir;

  @Test
  void theOrderTheTreesWereFoundInDoesNotMatter() throws IOException {
    // two spans of 100 m running north, then east
    Path structures = Files.writeString(dir.resolve("s.csv"), "structure_id,x,y,line_id,"
        + "sequence\nA,0,0,L,1\nB,0,100,L,2\nC,100,100,L,3\n");
    Path line = Files.writeString(dir.resolve("l.yaml"), "line_id: L\nnominal_voltage_kv: 115\n"
        + "conductors:\n  - position: A\n    role: phase\n    conductor: Drake\n"
        + "    offset_m: 0\n    attach_height_m: 15\n");
    SpanLayout layout = SpanLayout.build(StructureReader.read(structures,
        SurveyUnits.metres("test")), List.of(LineSpecReader.read(line,
            ConductorLibrary.builtin())));
    List<SpanWires> spans = new ArrayList<>();
    layout.spans().forEach(s -> spans.add(new SpanWires(s, WireStatus.NOT_ASSESSED,
        Optional.of("none"), List.of(), 0, false)));
    WireResult wires = new WireResult(layout, spans, List.of());
    String first = layout.spans().get(0).id();
    String second = layout.spans().get(1).id();
    // the expected order, by hand: span A-B first (running north: station y, offset -x, left
    // positive), then B-C (running east: station x, offset y - 100); at equal station the
    // smaller offset first
    List<TreeClearance> expected = List.of(
        tree(first, 5, 10), tree(first, -5, 10), tree(first, 3, 60),
        tree(second, 20, 90), tree(second, 20, 110), tree(second, 70, 95));
    Random random = new Random(20261204L);
    for (int k = 0; k < 20; k++) {
      List<TreeClearance> shuffled = new ArrayList<>(expected);
      Collections.shuffle(shuffled, random);
      assertEquals(expected, RunModels.treesAlongTheLine(shuffled, wires), "shuffle " + k);
    }
  }

  /** A tree measured to {@code span}, standing at x, y (m), 20 m tall. */
  private static TreeClearance tree(String span, double x, double y) {
    return new TreeClearance(new Tree(x, y, 30, 10, 20, 3), span, List.of(15.0), "A");
  }
}
