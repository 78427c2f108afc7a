package org.clearance.sag;

import org.clearance.io.Hyperbolic;

/**
 * One mechanical state of a conductor on a ruling span: horizontal tension, conductor temperature
 * and load per length.
 *
 * @param horizontalTension horizontal tension H, N (&gt; 0)
 * @param temperatureC conductor temperature, degC (finite)
 * @param weightPerLength load per length w (bare weight, plus ice, or the wind resultant), N/m
 *     (&gt; 0)
 */
public record TensionState(double horizontalTension, double temperatureC, double weightPerLength) {

  public TensionState {
    if (!(Double.isFinite(horizontalTension) && horizontalTension > 0)) {
      throw new IllegalArgumentException("horizontal tension must be positive and finite: "
          + horizontalTension + " N");
    }
    if (!Double.isFinite(temperatureC)) {
      throw new IllegalArgumentException("temperature must be finite: " + temperatureC);
    }
    if (!(Double.isFinite(weightPerLength) && weightPerLength > 0)) {
      throw new IllegalArgumentException("weight per length must be positive and finite: "
          + weightPerLength + " N/m");
    }
  }

  /** Catenary constant c = H / w, m. */
  public double catenaryConstant() {
    return horizontalTension / weightPerLength;
  }

  /**
   * Mid-span sag of a level span in this state, m: c (cosh(S / 2c) - 1), evaluated as
   * 2 c sinh^2(S / 4c) to avoid cancellation.
   *
   * @param span plan span length S, m (&gt; 0)
   */
  public double levelSag(double span) {
    double c = catenaryConstant();
    double q = Hyperbolic.sinh(span / (4 * c));
    return 2 * c * q * q;
  }
}
