package org.clearance.line;

import java.util.Objects;
import java.util.Optional;

/**
 * Mechanical data of one conductor type (a library entry such as ACSR "Drake"), in SI units.
 *
 * <p>Bimetallic conductors (ACSR) also give their steel core, used above the knee-point temperature
 * where the aluminium carries no tension (docs/methods.md section 3.5); single-material
 * conductors leave the core values NaN.
 *
 * @param code trade code name, e.g. {@code Drake}; unique in a library (case-insensitive)
 * @param diameter overall diameter, m (&gt; 0)
 * @param area total cross-section area, m^2 (&gt; 0)
 * @param massPerLength mass per length, kg/m (&gt; 0)
 * @param ratedStrength rated breaking strength, N (&gt; 0)
 * @param finalModulus final (after-creep) modulus of elasticity of the whole conductor, Pa (&gt; 0)
 * @param thermalExpansion coefficient of linear thermal expansion, 1/degC (&gt; 0)
 * @param coreArea steel core area, m^2, or NaN
 * @param coreModulus steel core modulus, Pa, or NaN
 * @param coreThermalExpansion steel core expansion coefficient, 1/degC, or NaN
 * @param source where the values come from, with confidence marks
 * @param thermal resistance and surface data for the heat balance, or empty when the library
 *     does not give them (then the survey temperature of this type cannot be computed)
 */
public record ConductorType(
    String code,
    double diameter,
    double area,
    double massPerLength,
    double ratedStrength,
    double finalModulus,
    double thermalExpansion,
    double coreArea,
    double coreModulus,
    double coreThermalExpansion,
    String source,
    Optional<ConductorThermal> thermal) {

  /** Standard gravity, m/s^2 (CGPM 1901, exact). */
  public static final double STANDARD_GRAVITY = 9.80665;

  public ConductorType {
    Objects.requireNonNull(code, "code");
    Objects.requireNonNull(source, "source");
    Objects.requireNonNull(thermal, "thermal");
    requirePositive("diameter", diameter);
    requirePositive("area", area);
    requirePositive("massPerLength", massPerLength);
    requirePositive("ratedStrength", ratedStrength);
    requirePositive("finalModulus", finalModulus);
    requirePositive("thermalExpansion", thermalExpansion);
  }

  /** A type without heat-balance data. */
  public ConductorType(String code, double diameter, double area, double massPerLength,
      double ratedStrength, double finalModulus, double thermalExpansion, double coreArea,
      double coreModulus, double coreThermalExpansion, String source) {
    this(code, diameter, area, massPerLength, ratedStrength, finalModulus, thermalExpansion,
        coreArea, coreModulus, coreThermalExpansion, source, Optional.empty());
  }

  private static void requirePositive(String name, double v) {
    if (!(Double.isFinite(v) && v > 0)) {
      throw new IllegalArgumentException(name + " must be positive and finite: " + v);
    }
  }

  /** Bare weight per length, N/m: mass per length times standard gravity. */
  public double weightPerLength() {
    return massPerLength * STANDARD_GRAVITY;
  }

  /** Axial stiffness E A, N. */
  public double axialStiffness() {
    return finalModulus * area;
  }

  /** True when steel core data are given (bimetallic knee-point model possible). */
  public boolean hasCore() {
    return Double.isFinite(coreArea) && Double.isFinite(coreModulus)
        && Double.isFinite(coreThermalExpansion);
  }
}
