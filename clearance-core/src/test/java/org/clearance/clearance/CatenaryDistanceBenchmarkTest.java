package org.clearance.clearance;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import java.util.Random;
import org.clearance.line.SpanFrame;
import org.clearance.wire.Catenary;
import org.clearance.wire.CatenaryFit;
import org.clearance.wire.CatenaryFitter;
import org.clearance.wire.ConductorCurve;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Throughput of the distance kernel and the fitter, printed for the record (slow; not part of
 * the default run, and no timing is asserted).
 */
@Tag("slow")
class CatenaryDistanceBenchmarkTest {

  @Test
  void distanceThroughput() {
    SpanFrame plan = SpanFrame.between(500_000, 4_000_000, 500_300, 4_000_050);
    ConductorCurve w = new ConductorCurve(plan,
        Catenary.through(0, 40, plan.length(), 55, 1500));
    CatenaryDistance kernel = new CatenaryDistance(w);
    int n = 2_000_000;
    double[] x = new double[n];
    double[] y = new double[n];
    double[] z = new double[n];
    Random r = new Random(1);
    for (int i = 0; i < n; i++) {
      double s = -20 + 340 * r.nextDouble();
      x[i] = plan.x(s, 20 * r.nextGaussian());
      y[i] = plan.y(s, 20 * r.nextGaussian());
      z[i] = 20 + 30 * r.nextDouble();
    }
    double sink = 0;
    for (int rep = 0; rep < 3; rep++) {
      long t0 = System.nanoTime();
      for (int i = 0; i < n; i++) {
        sink += kernel.distance(x[i], y[i], z[i]);
      }
      long t1 = System.nanoTime();
      for (int i = 0; i < n; i++) {
        sink += kernel.minDistanceOverSwing(x[i], y[i], z[i], 0.6);
      }
      long t2 = System.nanoTime();
      System.out.printf(Locale.ROOT, "distance %.0f ns/point, swing-range minimum %.0f ns/point%n",
          (t1 - t0) / (double) n, (t2 - t1) / (double) n);
    }
    assertTrue(sink > 0);
  }

  @Test
  void fitterThroughput() {
    Random r = new Random(2);
    Catenary truth = Catenary.through(0, 30, 350, 45, 1400);
    int n = 700;
    double[] s = new double[n];
    double[] z = new double[n];
    for (int i = 0; i < n; i++) {
      s[i] = 350 * r.nextDouble();
      z[i] = truth.z(s[i]) + 0.04 * r.nextGaussian() + (i % 5 == 0 ? 1 + 3 * r.nextDouble() : 0);
    }
    int reps = 200;
    for (int rep = 0; rep < 3; rep++) {
      long t0 = System.nanoTime();
      int ok = 0;
      for (int k = 0; k < reps; k++) {
        CatenaryFit fit = CatenaryFitter.fit(s, z);
        ok += fit.converged() ? 1 : 0;
      }
      long t1 = System.nanoTime();
      System.out.printf(Locale.ROOT, "fit of %d points with 20 %% outliers: %.2f ms%n", n,
          (t1 - t0) / 1e6 / reps);
      assertTrue(ok == reps);
    }
  }
}
