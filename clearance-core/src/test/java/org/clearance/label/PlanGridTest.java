package org.clearance.label;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.clearance.line.SpanFrame;
import org.junit.jupiter.api.Test;

/**
 * The plan grid gives the answers of the exact tests it stands in for: the owner span of
 * {@link LabelPoints#owner} (first span of the line whose region holds a point), and every
 * block window whose zone of the point is not outside (computed: every window tested), on a line
 * that zig-zags and turns back near itself, so that regions and windows overlap.
 */
class PlanGridTest {

  @Test
  void sameOwnerAndWindowsAsTestingEverySpanAndWindow() {
    List<SpanFrame> frames = new ArrayList<>();
    double[][] towers = {{500_000, 4_000_000}, {500_400, 4_000_150}, {500_700, 4_000_500},
        {501_300, 4_000_520}, {501_650, 4_000_300}, {501_200, 4_000_200}, {500_800, 4_000_050},
        {500_600, 3_999_700}, {501_900, 3_999_600}, {502_400, 4_000_100}};
    for (int k = 0; k + 1 < towers.length; k++) {
      frames.add(SpanFrame.between(towers[k][0], towers[k][1], towers[k + 1][0],
          towers[k + 1][1]));
    }
    double regionM = 70;
    List<LabelWindow> windows = new ArrayList<>();
    for (int[] b : LabelBlocks.blocks(frames)) {
      windows.add(new LabelWindow(frames, b[0], b[1], regionM, LabelBlocks.OVERLAP_M));
    }
    assertTrue(windows.size() >= 3, "blocks: " + windows.size());
    PlanGrid grid = new PlanGrid(frames, regionM, windows);
    SplittableRandom rng = new SplittableRandom(7);
    int owned = 0;
    int shared = 0;
    for (int n = 0; n < 200_000; n++) {
      double px = rng.nextDouble(499_700, 502_700);
      double py = rng.nextDouble(3_999_300, 4_000_900);
      int cell = grid.cellOf(px, py);
      int owner = LabelPoints.owner(frames, regionM, px, py);
      assertEquals(owner, grid.owner(cell, px, py), px + " " + py);
      if (owner < 0) {
        continue;
      }
      owned++;
      byte[] expected = new byte[windows.size()];
      byte[] got = new byte[windows.size()];
      java.util.Arrays.fill(got, LabelWindow.OUTSIDE);
      for (int b = 0; b < windows.size(); b++) {
        expected[b] = windows.get(b).zone(px, py, owner);
      }
      for (int t = grid.windowsFrom(cell); t < grid.windowsTo(cell); t++) {
        int b = grid.window(t);
        got[b] = windows.get(b).zone(px, py, owner);
      }
      assertEquals(java.util.Arrays.toString(expected), java.util.Arrays.toString(got),
          px + " " + py);
      int in = 0;
      for (byte z : got) {
        in += z != LabelWindow.OUTSIDE ? 1 : 0;
      }
      shared += in > 1 ? 1 : 0;
    }
    // the test can fail: many points lie in a region, and some in two windows at once
    assertTrue(owned > 20_000, "points in a region: " + owned);
    assertTrue(shared > 1_000, "points in two windows or more: " + shared);
  }
}
