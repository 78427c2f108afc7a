package org.clearance.sag;

import org.clearance.line.ConductorType;
import org.clearance.line.LineCondition;
import org.clearance.line.SpanFrame;
import org.clearance.wire.Catenary;
import org.clearance.wire.ConductorCurve;

/** Small fixtures shared by the sag tests. */
final class SagFixtures {

  private SagFixtures() {}

  /**
   * A Drake-like ACSR 26/7: diameter 28.14 mm, area 468.6 mm^2, 1.628 kg/m, 138.8 kN
   * (check-values.md section 3, [from memory]); E = 70 GPa and alpha = 18.9e-6 /degC as in the
   * check-values.md section 2 change-of-state case ("E = 70 GPa (assumed)"); steel core 7 x 3.45 mm
   * = 65.4 mm^2 [from memory], 200 GPa and 11.5e-6 /degC (the steel values check-values.md
   * section 3 uses in its rule-of-mixtures check).
   */
  static ConductorType drake() {
    return new ConductorType("Drake", 0.02814, 468.6e-6, 1.628, 138.8e3, 70e9, 18.9e-6,
        65.4e-6, 200e9, 11.5e-6, "test fixture");
  }

  /** The same conductor without core data. */
  static ConductorType drakeNoCore() {
    return new ConductorType("Drake", 0.02814, 468.6e-6, 1.628, 138.8e3, 70e9, 18.9e-6,
        Double.NaN, Double.NaN, Double.NaN, "test fixture");
  }

  /** A span along a diagonal plan line with catenary constant c, attachments zA and zB. */
  static ConductorCurve span(double length, double zA, double zB, double c) {
    double ux = 0.6;
    double uy = 0.8;
    SpanFrame plan = new SpanFrame(500_000.0, 4_200_000.0, ux, uy, length);
    return new ConductorCurve(plan, Catenary.through(0, zA, length, zB, c));
  }

  static LineCondition temperature(String name, double tempC, double creepC) {
    return new LineCondition(name, LineCondition.Kind.TEMPERATURE, tempC, creepC, Double.NaN,
        Double.NaN, Double.NaN, Double.NaN, Double.NaN);
  }

  static LineCondition ice(String name, double tempC, double thicknessM) {
    return new LineCondition(name, LineCondition.Kind.ICE, tempC, 0.0, thicknessM,
        LineCondition.GLAZE_ICE_DENSITY, Double.NaN, Double.NaN, Double.NaN);
  }

  static LineCondition wind(String name, double tempC, double pressurePa, double iceM) {
    return new LineCondition(name, LineCondition.Kind.WIND, tempC, 0.0, iceM,
        LineCondition.GLAZE_ICE_DENSITY, pressurePa, Double.NaN, Double.NaN);
  }

  static LineCondition swing(String name, double angleRad) {
    return new LineCondition(name, LineCondition.Kind.SWING, Double.NaN, 0.0, Double.NaN,
        Double.NaN, Double.NaN, angleRad, Double.NaN);
  }

  static LineCondition extraSag(String name, double extraM) {
    return new LineCondition(name, LineCondition.Kind.EXTRA_SAG, Double.NaN, 0.0, Double.NaN,
        Double.NaN, Double.NaN, Double.NaN, extraM);
  }
}
