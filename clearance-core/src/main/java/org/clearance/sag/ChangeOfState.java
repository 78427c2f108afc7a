package org.clearance.sag;

import java.util.Objects;

/**
 * Change of state on a level ruling span: from a known state (H1, theta1, w1) to the horizontal
 * tension H2 at another temperature theta2 and load w2 (CIGRE TB 324; methods.md 3.2-3.5).
 *
 * <p>Two methods: the exact catenary-length form (default; elastic elongation integrated along
 * the catenary) and the classic parabolic cubic, kept for comparison. Creep is taken as an
 * equivalent temperature allowance added to theta2 by the caller (methods.md 3.5 item 4).
 *
 * <p>Knee point (option, off by default). A bimetallic conductor (ACSR) behaves as one material
 * with the whole conductor's EA and alpha only while its aluminium is in tension. Above the
 * knee-point temperature the aluminium carries no tension and the steel core alone sets both the
 * stiffness and the thermal elongation (methods.md 3.5 item 5). With a knee temperature theta_k
 * set, a change of state that crosses theta_k is solved in two steps: to (theta_k, w2) with the
 * properties of the side of theta1, then on to (theta2, w2) with those of the side of theta2; a
 * change on one side uses that side's properties alone. theta_k is taken as a fixed input (in
 * reality it moves somewhat with tension and with the aluminium's creep history). Because the core
 * expands less (about 11.5e-6 vs 19e-6 /degC for ACSR) and is less stiff, sag grows more slowly
 * above the knee than the single-material model predicts: the knee model gives less sag there, and
 * exactly the same result for changes entirely below the knee.
 */
public final class ChangeOfState {

  /** The equation solved. */
  public enum Method {
    /** Exact catenary length with the elastic elongation integrated along the curve. */
    CATENARY_LENGTH,
    /** The classic parabolic cubic. */
    PARABOLIC
  }

  /**
   * Options.
   *
   * @param method equation to solve
   * @param kneeTemperatureC knee-point temperature of a bimetallic conductor, degC, or NaN for
   *     none (the default): the conductor is treated as one material at all temperatures
   */
  public record Options(Method method, double kneeTemperatureC) {

    /** Exact catenary length, no knee point. */
    public static final Options DEFAULT = new Options(Method.CATENARY_LENGTH, Double.NaN);

    public Options {
      Objects.requireNonNull(method, "method");
      if (Double.isInfinite(kneeTemperatureC)) {
        throw new IllegalArgumentException("knee temperature must be finite or NaN");
      }
    }

    /** True when the knee-point model is on. */
    public boolean kneePoint() {
      return !Double.isNaN(kneeTemperatureC);
    }
  }

  private final ConductorMechanics mechanics;
  private final double rulingSpan;
  private final Options options;

  /**
   * A change-of-state solver for one conductor on one ruling span.
   *
   * @param mechanics conductor stiffness and expansion (with core data for the knee model)
   * @param rulingSpan ruling span of the tension section, m (&gt; 0)
   * @param options method and knee point
   * @throws IllegalArgumentException when the span is not positive, or the knee model is asked for
   *     a conductor without core data
   */
  public ChangeOfState(ConductorMechanics mechanics, double rulingSpan, Options options) {
    this.mechanics = Objects.requireNonNull(mechanics, "mechanics");
    this.options = Objects.requireNonNull(options, "options");
    if (!(Double.isFinite(rulingSpan) && rulingSpan > 0)) {
      throw new IllegalArgumentException("ruling span must be positive: " + rulingSpan + " m");
    }
    if (options.kneePoint() && !mechanics.hasCore()) {
      throw new IllegalArgumentException(
          "the knee-point model needs steel core data (core area, modulus, expansion)");
    }
    this.rulingSpan = rulingSpan;
  }

  /**
   * Shortcut: the state at (temperatureC, weightPerLength) by the exact method, no knee point.
   *
   * @see #to(TensionState, double, double)
   */
  public static TensionState solve(ConductorMechanics mechanics, double rulingSpan,
      TensionState from, double temperatureC, double weightPerLength) {
    return new ChangeOfState(mechanics, rulingSpan, Options.DEFAULT)
        .to(from, temperatureC, weightPerLength);
  }

  /** The ruling span, m. */
  public double rulingSpan() {
    return rulingSpan;
  }

  /** The options. */
  public Options options() {
    return options;
  }

  /**
   * The state of the conductor at another temperature and load. When both are unchanged the known
   * tension is returned exactly.
   *
   * @param from known state
   * @param temperatureC new conductor temperature (including any creep allowance), degC, finite
   * @param weightPerLength new load per length, N/m (&gt; 0)
   * @return the new state, horizontal tension in N
   * @throws IllegalArgumentException when an input is out of range or no tension within physical
   *     bounds (sag up to about 20 % of the span, mean strain up to 5 %) satisfies the equation
   */
  public TensionState to(TensionState from, double temperatureC, double weightPerLength) {
    Objects.requireNonNull(from, "from");
    if (!Double.isFinite(temperatureC)) {
      throw new IllegalArgumentException("temperature must be finite: " + temperatureC);
    }
    if (!(Double.isFinite(weightPerLength) && weightPerLength > 0)) {
      throw new IllegalArgumentException("weight per length must be positive: "
          + weightPerLength + " N/m");
    }
    if (!options.kneePoint()) {
      return step(mechanics, from, temperatureC, weightPerLength);
    }
    double knee = options.kneeTemperatureC();
    boolean fromAbove = from.temperatureC() > knee;
    boolean toAbove = temperatureC > knee;
    if (fromAbove == toAbove) {
      return step(side(toAbove), from, temperatureC, weightPerLength);
    }
    TensionState atKnee = step(side(fromAbove), from, knee, weightPerLength);
    return step(side(toAbove), atKnee, temperatureC, weightPerLength);
  }

  private ConductorMechanics side(boolean aboveKnee) {
    return aboveKnee ? mechanics.coreOnly() : mechanics;
  }

  private TensionState step(ConductorMechanics m, TensionState from, double temperature,
      double weight) {
    if (temperature == from.temperatureC() && weight == from.weightPerLength()) {
      return from;
    }
    double ea = m.axialStiffness();
    double alpha = m.thermalExpansion();
    double h = options.method() == Method.CATENARY_LENGTH
        ? StateEquation.catenaryLength(ea, alpha, rulingSpan, from, temperature, weight)
        : StateEquation.parabolic(ea, alpha, rulingSpan, from, temperature, weight);
    return new TensionState(h, temperature, weight);
  }
}
