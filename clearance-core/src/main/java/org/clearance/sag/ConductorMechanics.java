package org.clearance.sag;

import org.clearance.line.ConductorType;

/**
 * The conductor properties a change of state needs: axial stiffness and thermal expansion of the
 * whole conductor and, for bimetallic conductors (ACSR), of the steel core alone.
 *
 * @param axialStiffness E A of the whole conductor (final modulus), N (&gt; 0)
 * @param thermalExpansion linear thermal expansion of the whole conductor, 1/degC (&gt; 0)
 * @param coreAxialStiffness E A of the steel core, N (&gt; 0), or NaN when there is no core
 * @param coreThermalExpansion thermal expansion of the core, 1/degC (&gt; 0), or NaN
 */
public record ConductorMechanics(
    double axialStiffness,
    double thermalExpansion,
    double coreAxialStiffness,
    double coreThermalExpansion) {

  public ConductorMechanics {
    requirePositive("axial stiffness", axialStiffness);
    requirePositive("thermal expansion", thermalExpansion);
    boolean noCore = Double.isNaN(coreAxialStiffness) && Double.isNaN(coreThermalExpansion);
    if (!noCore) {
      requirePositive("core axial stiffness", coreAxialStiffness);
      requirePositive("core thermal expansion", coreThermalExpansion);
    }
  }

  /** A single-material conductor (no core data). */
  public static ConductorMechanics homogeneous(double axialStiffness, double thermalExpansion) {
    return new ConductorMechanics(axialStiffness, thermalExpansion, Double.NaN, Double.NaN);
  }

  /** The mechanics of a library conductor type; core values NaN unless it has core data. */
  public static ConductorMechanics of(ConductorType type) {
    if (type.hasCore()) {
      return new ConductorMechanics(type.axialStiffness(), type.thermalExpansion(),
          type.coreModulus() * type.coreArea(), type.coreThermalExpansion());
    }
    return homogeneous(type.axialStiffness(), type.thermalExpansion());
  }

  /** True when steel core values are given (the knee-point model can be used). */
  public boolean hasCore() {
    return !Double.isNaN(coreAxialStiffness);
  }

  /** The steel core alone as a single-material conductor (above the knee point). */
  ConductorMechanics coreOnly() {
    return homogeneous(coreAxialStiffness, coreThermalExpansion);
  }

  private static void requirePositive(String name, double v) {
    if (!(Double.isFinite(v) && v > 0)) {
      throw new IllegalArgumentException(name + " must be positive and finite: " + v);
    }
  }
}
