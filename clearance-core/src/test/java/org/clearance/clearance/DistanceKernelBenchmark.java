package org.clearance.clearance;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.clearance.line.SpanFrame;
import org.clearance.wire.Catenary;
import org.clearance.wire.ConductorCurve;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * JMH microbenchmark of the point-to-catenary distance kernel: vegetation points scattered
 * around a 300 m span (docs/benchmark.md; not a test, never run by the suite).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class DistanceKernelBenchmark {

  static final int POINTS = 4096;

  private CatenaryDistance kernel;
  private final double[] x = new double[POINTS];
  private final double[] y = new double[POINTS];
  private final double[] z = new double[POINTS];

  @Setup(Level.Trial)
  public void setUp() {
    SpanFrame plan = SpanFrame.between(500_000, 4_000_000, 500_300, 4_000_050);
    kernel = new CatenaryDistance(new ConductorCurve(plan,
        Catenary.through(0, 40, plan.length(), 55, 1500)));
    SplittableRandom r = new SplittableRandom(1);
    for (int i = 0; i < POINTS; i++) {
      double s = -20 + 340 * r.nextDouble();
      double e = -20 + 40 * r.nextDouble();
      x[i] = plan.x(s, e);
      y[i] = plan.y(s, e);
      z[i] = 20 + 30 * r.nextDouble();
    }
  }

  /** Hanging conductor: distances per second. */
  @Benchmark
  @OperationsPerInvocation(POINTS)
  public double hanging() {
    double sum = 0;
    for (int i = 0; i < POINTS; i++) {
      sum += kernel.distance(x[i], y[i], z[i]);
    }
    return sum;
  }

  /** Minimum over a swing range of +-35 degrees: distances per second. */
  @Benchmark
  @OperationsPerInvocation(POINTS)
  public double swingRange() {
    double sum = 0;
    for (int i = 0; i < POINTS; i++) {
      sum += kernel.minDistanceOverSwing(x[i], y[i], z[i], 0.61);
    }
    return sum;
  }
}
