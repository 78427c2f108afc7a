package org.clearance.ground;

import java.util.Objects;
import java.util.Set;
import java.util.function.Consumer;
import org.clearance.survey.PointChunk;
import org.clearance.survey.Survey;

/**
 * Scores a {@link GroundModel}'s point test ({@link GroundModel#isGround}) against a survey's own
 * class-2 labels, point by point, as a {@link CrossMatrix}.
 *
 * <p>Reference ground is class 2; every other class is a reference object, except the classes in
 * {@code excluded} (their truth is unknown or they are noise) and withheld points, which are
 * skipped. Feed the chunks, then read {@link #result()}.
 */
public final class FilterEvaluation implements Consumer<PointChunk> {
  /**
   * Classes skipped by default: 0 never classified, 7 low noise, 12 overlap (formats 0-5: the
   * point's ground/object truth is not recorded), 18 high noise (ASPRS LAS 1.4 R15 class table).
   */
  public static final Set<Integer> DEFAULT_EXCLUDED = Set.of(0, 7, 12, 18);

  private final GroundModel model;
  private final boolean[] excluded = new boolean[256];
  private long a;
  private long b;
  private long c;
  private long d;

  /**
   * @param model the ground model under test
   * @param excludedClasses classes to skip, each 0-255
   * @throws IllegalArgumentException when a class is outside 0-255
   */
  public FilterEvaluation(GroundModel model, Set<Integer> excludedClasses) {
    this.model = Objects.requireNonNull(model, "model");
    for (int cls : excludedClasses) {
      if (cls < 0 || cls > 255) {
        throw new IllegalArgumentException("class outside 0-255: " + cls);
      }
      excluded[cls] = true;
    }
  }

  /** Evaluation with {@link #DEFAULT_EXCLUDED}. */
  public FilterEvaluation(GroundModel model) {
    this(model, DEFAULT_EXCLUDED);
  }

  /** Shortcut: scores every chunk and returns the matrix. */
  public static CrossMatrix evaluate(Iterable<PointChunk> chunks, GroundModel model) {
    FilterEvaluation e = new FilterEvaluation(model);
    chunks.forEach(e);
    return e.result();
  }

  /** Shortcut: scores every point of the survey (read on the calling thread). */
  public static CrossMatrix evaluate(Survey survey, GroundModel model) {
    FilterEvaluation e = new FilterEvaluation(model);
    survey.read(e);
    return e.result();
  }

  @Override
  public void accept(PointChunk chunk) {
    double[] x = chunk.x();
    double[] y = chunk.y();
    double[] z = chunk.z();
    short[] cls = chunk.classification();
    byte[] flags = chunk.flags();
    for (int i = 0, n = chunk.size(); i < n; i++) {
      if (excluded[cls[i] & 0xff] || (flags[i] & PointChunk.FLAG_WITHHELD) != 0) {
        continue;
      }
      boolean ground = model.isGround(x[i], y[i], z[i]);
      if (cls[i] == GroundModelBuilder.CLASS_GROUND) {
        if (ground) {
          a++;
        } else {
          b++;
        }
      } else if (ground) {
        c++;
      } else {
        d++;
      }
    }
  }

  /** The counts so far. */
  public CrossMatrix result() {
    return new CrossMatrix(a, b, c, d);
  }
}
