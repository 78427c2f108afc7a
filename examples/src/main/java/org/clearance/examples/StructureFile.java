package org.clearance.examples;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

/** Applies a {@link StructureEdit} to the list of structures written to structures.csv. */
final class StructureFile {
  private StructureFile() {}

  static List<DemoStructure> apply(List<DemoStructure> structures, StructureEdit edit,
      SplittableRandom rng) {
    double dir = rng.nextDouble(2 * Math.PI);
    List<DemoStructure> out = new ArrayList<>();
    for (int i = 0; i < structures.size(); i++) {
      DemoStructure t = structures.get(i);
      if (i != edit.structureIndex()) {
        out.add(t);
      } else if (edit.kind() == StructureEdit.Kind.OFFSET) {
        out.add(new DemoStructure(t.id(), t.sequence(), t.x() + edit.offsetM() * Math.sin(dir),
            t.y() + edit.offsetM() * Math.cos(dir), t.groundZ(), t.type(), t.deflectionRad(),
            t.alongX(), t.alongY(), t.armHeightM(), t.extensionM()));
      }
    }
    return out;
  }
}
