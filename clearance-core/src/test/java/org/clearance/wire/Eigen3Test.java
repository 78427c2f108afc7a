package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;

/** Symmetric 3 x 3 eigen-decomposition against commons-math3's EigenDecomposition. */
class Eigen3Test {

  /** Diagonal matrix: eigenvalues are the diagonal, sorted; v1 is the axis of the largest. */
  @Test
  void diagonal() {
    Eigen3.Result r = Eigen3.symmetric(2, 0, 0, 7, 0, 1);
    assertEquals(7, r.l1(), 1e-15);
    assertEquals(2, r.l2(), 1e-15);
    assertEquals(1, r.l3(), 1e-15);
    assertEquals(1, Math.abs(r.v1y()), 1e-15);
  }

  /** Random symmetric matrices: the reference is commons-math3 (a general-purpose library). */
  @Test
  void randomMatricesMatchCommonsMath() {
    Random rnd = new Random(11);
    for (int trial = 0; trial < 200; trial++) {
      double[][] m = new double[3][3];
      for (int i = 0; i < 3; i++) {
        for (int j = i; j < 3; j++) {
          m[i][j] = m[j][i] = 10 * rnd.nextGaussian();
        }
      }
      Eigen3.Result r = Eigen3.symmetric(m[0][0], m[0][1], m[0][2], m[1][1], m[1][2], m[2][2]);
      EigenDecomposition ref = new EigenDecomposition(new Array2DRowRealMatrix(m));
      double[] values = ref.getRealEigenvalues().clone();
      java.util.Arrays.sort(values);
      assertEquals(values[2], r.l1(), 1e-9);
      assertEquals(values[1], r.l2(), 1e-9);
      assertEquals(values[0], r.l3(), 1e-9);
      int k = 0;
      for (int i = 1; i < 3; i++) {
        if (ref.getRealEigenvalue(i) > ref.getRealEigenvalue(k)) {
          k = i;
        }
      }
      RealVector v = ref.getEigenvector(k);
      double dot = v.getEntry(0) * r.v1x() + v.getEntry(1) * r.v1y() + v.getEntry(2) * r.v1z();
      assertEquals(1, Math.abs(dot), 1e-8, "principal direction, trial " + trial);
    }
  }
}
