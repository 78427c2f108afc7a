package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ClassificationModeTest {

  @ParameterizedTest
  @CsvSource({
    // full class, WIRES_UNLABELLED, GROUND_ONLY, UNCLASSIFIED. ASPRS LAS 1.4 R15 classes
    // (check-values.md section 1): 2 ground, 5 high vegetation, 6 building, 7 low noise,
    // 9 water, 13 shield, 14 conductor, 15 tower, 16 insulator, 18 high noise.
    "2, 2, 2, 1", "5, 5, 1, 1", "6, 6, 1, 1", "7, 7, 7, 1", "9, 9, 9, 1", "13, 1, 1, 1",
    "14, 1, 1, 1", "15, 15, 1, 1", "16, 16, 1, 1", "18, 18, 18, 1", "1, 1, 1, 1"
  })
  void mapsFullClasses(int full, int wiresUnlabelled, int groundOnly, int unclassified) {
    assertEquals(full, ClassificationMode.FULL.label(full));
    assertEquals(wiresUnlabelled, ClassificationMode.WIRES_UNLABELLED.label(full));
    assertEquals(groundOnly, ClassificationMode.GROUND_ONLY.label(full));
    assertEquals(unclassified, ClassificationMode.UNCLASSIFIED.label(full));
    // PARTLY_LABELLED: tile (0, 0) and (1, 1) of 100 m labelled in full, (1, 0) ground-only
    assertEquals(full, ClassificationMode.PARTLY_LABELLED.label(full, 50, 50));
    assertEquals(full, ClassificationMode.PARTLY_LABELLED.label(full, 150, 150));
    assertEquals(groundOnly, ClassificationMode.PARTLY_LABELLED.label(full, 150, 50));
    assertEquals(groundOnly, ClassificationMode.PARTLY_LABELLED.label(full, -50, 50));
  }

  /** Points of a small scene in one mode: x, y, z, class, truth id. */
  private static List<double[]> points(ClassificationMode mode) {
    DemoScene scene = Scenes.of(Scenes.small(11).withMode(mode));
    List<double[]> out = new ArrayList<>();
    scene.points((c, ids) -> {
      for (int i = 0; i < c.size(); i++) {
        out.add(new double[] {c.x()[i], c.y()[i], c.z()[i], c.classification()[i], ids[i]});
      }
    });
    return out;
  }

  /** The class the brief specifies for a point in FULL mode, strays aside. */
  private static int expectedFull(DemoScene scene, double[] p) {
    int id = (int) p[4];
    switch (TruthId.kind(id)) {
      case GROUND:
      case ROAD:
        return 2;
      case LOW_VEGETATION:
      case UNDERSTOREY:
      case TREE: {
        // Vegetation by height above the ground: 3 below 0.5 m, 4 below 2 m, else 5 (common
        // practice, no source: vendors' limits vary).
        double h = p[2] - scene.groundZ(p[0], p[1]);
        return h < 0.5 ? 3 : h < 2.0 ? 4 : 5;
      }
      case BUILDING:
        return 6;
      case NOISE_LOW:
        return 7;
      case NOISE_HIGH:
        return 18;
      case TOWER:
        return 15;
      case INSULATOR:
        return 16;
      case WIRE: {
        DemoWire w = scene.spans().get(TruthId.wireSpan(id)).wires().get(TruthId.wireIndex(id));
        return w.role() == DemoPosition.Role.PHASE ? 14 : 13;
      }
      case JUMPER:
        return 14;
      case BIRD:
        return 1;
      default:
        throw new AssertionError(TruthId.kind(id));
    }
  }

  @Test
  void modesLabelAsSpecifiedAndOnlyTheLabelsDiffer() {
    DemoScene scene = Scenes.of(Scenes.small(11));
    List<double[]> full = points(ClassificationMode.FULL);
    List<double[]> wires = points(ClassificationMode.WIRES_UNLABELLED);
    List<double[]> none = points(ClassificationMode.UNCLASSIFIED);
    assertEquals(full.size(), wires.size());
    assertEquals(full.size(), none.size());
    int strayRoof = 0;
    int strayTree = 0;
    for (int i = 0; i < full.size(); i++) {
      double[] f = full.get(i);
      for (int k = 0; k < 3; k++) {
        assertEquals(f[k], wires.get(i)[k], 0.0);
        assertEquals(f[k], none.get(i)[k], 0.0);
      }
      int expected = expectedFull(scene, f);
      TruthId.Kind kind = TruthId.kind((int) f[4]);
      boolean stray = f[3] == 14 && (kind == TruthId.Kind.BUILDING || kind == TruthId.Kind.TREE);
      if (stray && kind == TruthId.Kind.BUILDING) {
        assertEquals(scene.strayBuilding(), TruthId.index((int) f[4]));
        strayRoof++;
      } else if (stray) {
        DemoTree t = scene.trees().get(TruthId.index((int) f[4]));
        assertEquals(scene.strayTree(), t.id());
        assertTrue(f[2] > t.topZ() - 2.0);
        strayTree++;
      } else {
        assertEquals(expected, (int) f[3], kind + " at " + f[2]);
      }
      int unlabelled = expected == 13 || expected == 14 ? 1 : expected;
      assertEquals(unlabelled, (int) wires.get(i)[3], kind + " without wire labels");
      assertEquals(1, (int) none.get(i)[3]);
    }
    assertTrue(strayRoof > 0, "stray labels on the roof");
    assertTrue(strayTree > 0, "stray labels in the crown");
  }
}
