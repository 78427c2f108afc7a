package org.clearance.examples;

import java.util.Objects;
import org.clearance.InputException;
import org.clearance.survey.LinearUnit;

/**
 * Options of the demo distribution feeder (docs/demo-corridor.md, "Distribution feeder"). Invalid
 * values throw {@link InputException} naming the option.
 *
 * @param seed seed of every random choice: the same options give the same scene
 * @param spanCount number of spans, {@value #MIN_SPANS} to {@value #MAX_SPANS}
 * @param pointDensity laser pulses per square metre, {@value #MIN_DENSITY} to
 *     {@value #MAX_DENSITY}; wire and pole sampling scale with it
 * @param mode how the points are classified
 * @param framing how the primaries sit on the poles
 * @param neutral whether a neutral hangs below the primaries
 * @param crossing whether a service line crosses one span below the feeder
 * @param unit linear unit of the written survey and structures file: metre or US survey foot
 * @param displaceM largest displacement, m, of the pole positions written to the structures
 *     file from the truth (0 to {@value #MAX_DISPLACE_M}): each pole is written moved by a
 *     distance drawn between {@value #LEAST_DISPLACE_M} m (or this, if smaller) and this, in a
 *     random direction, from its own random stream (the points do not change); 0 (the default)
 *     writes the true positions
 */
public record FeederOptions(
    long seed,
    int spanCount,
    double pointDensity,
    ClassificationMode mode,
    Framing framing,
    boolean neutral,
    boolean crossing,
    LinearUnit unit,
    double displaceM) {

  public static final int MIN_SPANS = 2;
  public static final int MAX_SPANS = 500;
  public static final int DEFAULT_SPANS = 10;
  public static final double MIN_DENSITY = 1;
  public static final double MAX_DENSITY = 100;
  /** Pulses per m^2 of a common feeder survey (common practice, no source). */
  public static final double DEFAULT_DENSITY = 8;
  /** Largest structures-file displacement, m. */
  public static final double MAX_DISPLACE_M = 10;
  /** Least displacement of a displaced pole, m. */
  public static final double LEAST_DISPLACE_M = 0.5;

  public FeederOptions {
    Objects.requireNonNull(mode, "mode");
    Objects.requireNonNull(framing, "framing");
    Objects.requireNonNull(unit, "unit");
    if (spanCount < MIN_SPANS || spanCount > MAX_SPANS) {
      throw bad("spanCount", "must be " + MIN_SPANS + " to " + MAX_SPANS + ": " + spanCount);
    }
    if (!(pointDensity >= MIN_DENSITY && pointDensity <= MAX_DENSITY)) {
      throw bad("pointDensity", "must be " + MIN_DENSITY + " to " + MAX_DENSITY
          + " pulses per m^2: " + pointDensity);
    }
    if (!(displaceM >= 0 && displaceM <= MAX_DISPLACE_M)) {
      throw bad("displaceM", "must be 0 to " + MAX_DISPLACE_M + " m: " + displaceM);
    }
    if (unit != LinearUnit.METRE && unit != LinearUnit.US_SURVEY_FOOT) {
      throw bad("unit", "must be metre or US survey foot: " + unit);
    }
  }

  private static InputException bad(String field, String problem) {
    return new InputException((String) null, null, field, problem);
  }

  /** Seed 715, 10 spans, 8 pulses/m^2, FULL, horizontal framing, a neutral, a crossing, m. */
  public static FeederOptions defaults() {
    return new FeederOptions(715, DEFAULT_SPANS, DEFAULT_DENSITY, ClassificationMode.FULL,
        Framing.HORIZONTAL, true, true, LinearUnit.METRE, 0);
  }

  public FeederOptions withSeed(long s) {
    return new FeederOptions(s, spanCount, pointDensity, mode, framing, neutral, crossing,
        unit, displaceM);
  }

  public FeederOptions withSpanCount(int n) {
    return new FeederOptions(seed, n, pointDensity, mode, framing, neutral, crossing,
        unit, displaceM);
  }

  public FeederOptions withPointDensity(double d) {
    return new FeederOptions(seed, spanCount, d, mode, framing, neutral, crossing, unit,
        displaceM);
  }

  public FeederOptions withMode(ClassificationMode m) {
    return new FeederOptions(seed, spanCount, pointDensity, m, framing, neutral, crossing,
        unit, displaceM);
  }

  public FeederOptions withFraming(Framing f) {
    return new FeederOptions(seed, spanCount, pointDensity, mode, f, neutral, crossing,
        unit, displaceM);
  }

  public FeederOptions withNeutral(boolean n) {
    return new FeederOptions(seed, spanCount, pointDensity, mode, framing, n, crossing,
        unit, displaceM);
  }

  public FeederOptions withCrossing(boolean c) {
    return new FeederOptions(seed, spanCount, pointDensity, mode, framing, neutral, c,
        unit, displaceM);
  }

  public FeederOptions withUnit(LinearUnit u) {
    return new FeederOptions(seed, spanCount, pointDensity, mode, framing, neutral, crossing,
        u, displaceM);
  }

  public FeederOptions withDisplaceM(double d) {
    return new FeederOptions(seed, spanCount, pointDensity, mode, framing, neutral, crossing, unit,
        d);
  }
}
