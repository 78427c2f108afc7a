package org.clearance.wire;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.clearance.line.ConductorLibrary;
import org.clearance.line.ConductorPosition;
import org.clearance.line.ConductorType;
import org.clearance.line.LineSpec;
import org.clearance.line.SpanLayout;
import org.clearance.line.Structure;
import org.clearance.line.StructureType;

/** Line specifications and layouts for the synthetic corridors of the wire tests. */
final class Fixtures {
  static final ConductorType DRAKE = ConductorLibrary.builtin().find("Drake").orElseThrow();
  static final ConductorType PARTRIDGE =
      ConductorLibrary.builtin().find("Partridge").orElseThrow();

  private Fixtures() {}

  /** The specification of a synthetic corridor's positions (invented line TX1). */
  static LineSpec spec(List<SyntheticCorridor.Position> positions) {
    List<ConductorPosition> list = new ArrayList<>();
    for (SyntheticCorridor.Position p : positions) {
      list.add(new ConductorPosition(p.name(), p.shield() ? ConductorPosition.Role.SHIELD
          : ConductorPosition.Role.PHASE, 1, p.shield() ? PARTRIDGE : DRAKE, p.offset(),
          p.height(), p.bundle(), p.bundle() > 1 ? p.spacing() : Double.NaN, Double.NaN));
    }
    return new LineSpec("TX1", "Test line", 230, 0, 25, list, List.of(), "test.yaml");
  }

  /** The layout of a synthetic corridor, structures at their true positions. */
  static SpanLayout layout(SyntheticCorridor c) {
    return layout(c, c.positions);
  }

  /** The layout with another list of specification positions. */
  static SpanLayout layout(SyntheticCorridor c, List<SyntheticCorridor.Position> positions) {
    List<Structure> s = new ArrayList<>();
    for (int i = 0; i < c.tx.length; i++) {
      s.add(structure("S" + (i + 1), i + 1, c.tx[i], c.ty[i]));
    }
    return SpanLayout.build(s, List.of(spec(positions)));
  }

  static Structure structure(String id, int seq, double x, double y) {
    return new Structure(id, "", seq, StructureType.SUSPENSION, x, y, Double.NaN, Map.of(),
        "test.csv", seq + 1);
  }

  /** Finder options on one thread with structure refinement on or off. */
  static WireFinderOptions options(boolean refine) {
    WireFinderOptions o = WireFinderOptions.defaults(1);
    WireFinderOptions.Structures s = o.structures();
    return o.withStructures(new WireFinderOptions.Structures(refine, s.searchRadiusM(),
        s.toleranceM(), s.minTowerPoints()));
  }
}
