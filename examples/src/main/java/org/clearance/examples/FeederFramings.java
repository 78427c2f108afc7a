package org.clearance.examples;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.clearance.examples.FeederScene.Position;
import org.clearance.line.ConductorType;

/** The conductor positions of the generated feeder's framings ({@link Framing}). */
final class FeederFramings {

  private FeederFramings() {}

  /** The positions of one framing, drawn from {@code rng} (Framing, FeederScene class note). */
  static List<Position> of(Framing framing, SplittableRandom rng, ConductorType primary,
      ConductorType neutral, boolean withNeutral) {
    List<Position> positions = new ArrayList<>();
    double lowest;
    switch (framing) {
      case HORIZONTAL: {
        double d1 = rng.nextDouble(0.35, 0.4);
        double s = rng.nextDouble(0.5, 0.9);
        double far = rng.nextDouble(0.9, 1.2);
        positions.add(new Position("A", false, primary, far, FeederScene.ARM_BELOW_TOP_M));
        positions.add(new Position("B", false, primary, -d1, FeederScene.ARM_BELOW_TOP_M));
        positions.add(new Position("C", false, primary, -d1 - s, FeederScene.ARM_BELOW_TOP_M));
        lowest = FeederScene.ARM_BELOW_TOP_M;
        break;
      }
      case VERTICAL: {
        double v = rng.nextDouble(0.6, 1.0);
        positions.add(new Position("A", false, primary, 0.3, 0.2));
        positions.add(new Position("B", false, primary, 0.3, 0.2 + v));
        positions.add(new Position("C", false, primary, 0.3, 0.2 + 2 * v));
        lowest = 0.2 + 2 * v;
        break;
      }
      case TRIANGULAR: {
        double d = rng.nextDouble(0.5, 0.9);
        double up = rng.nextDouble(0.5, 0.7);
        positions.add(new Position("A", false, primary, d, FeederScene.ARM_BELOW_TOP_M));
        positions.add(new Position("B", false, primary, 0.0, FeederScene.ARM_BELOW_TOP_M - up));
        positions.add(new Position("C", false, primary, -d, FeederScene.ARM_BELOW_TOP_M));
        lowest = FeederScene.ARM_BELOW_TOP_M;
        break;
      }
      default:
        throw new AssertionError(framing);
    }
    if (withNeutral) {
      double off = framing == Framing.VERTICAL ? 0.3 : -0.2;
      positions.add(new Position("N", true, neutral, off, lowest + rng.nextDouble(1.0, 1.8)));
    }
    return List.copyOf(positions);
  }
}
