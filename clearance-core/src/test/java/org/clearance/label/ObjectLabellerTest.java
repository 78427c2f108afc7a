package org.clearance.label;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.clearance.wire.SetAside;
import org.junit.jupiter.api.Test;

/**
 * The labelling decision on synthetic objects of known shape (computed, seeded): a lattice mast
 * with a jib, a flat roof, a cone-and-sphere crown seen from above with its later returns, and a
 * tree reaching the ground. Ground is flat at z = 0, so the height above ground is z.
 */
class ObjectLabellerTest {

  /** Steel points per metre of member and point noise, m (as the demo's fixtures). */
  private static final double PER_METRE = 4.0;
  private static final double SIGMA_M = 0.03;
  /** Wire points per metre of conductor at 20 points per m^2 (common practice, no source). */
  private static final int WIRE_PER_METRE = 10;

  @Test
  void latticeMastIsMastLike() {
    LabelPoints p = points();
    SplittableRandom rng = new SplittableRandom(3);
    double w = 1.6;
    double top = 24;
    for (double[] c : new double[][] {{0, 0}, {w, 0}, {w, w}, {0, w}}) {
      member(p, rng, c[0], c[1], 1, c[0], c[1], top);
    }
    for (double z = 1; z + w <= top; z += w) {
      member(p, rng, 0, 0, z, w, 0, z + w);
      member(p, rng, w, 0, z, w, w, z + w);
      member(p, rng, w, w, z, 0, w, z + w);
      member(p, rng, 0, w, z, 0, 0, z + w);
    }
    member(p, rng, -6, 0, top, 18, 0, top);
    member(p, rng, -6, w, top, 18, w, top);
    SetAside set = SetAside.none();
    ObjectLabels labels = ObjectLabeller.label(p, set);
    assertEquals(1, labels.objects().size(), labels.objects().toString());
    LabelledObject o = labels.objects().get(0);
    assertEquals(ObjectKind.MAST, o.kind(), o.toString());
    // the object and the fragments floating near it; a few points near the ground alone stay
    assertTrue(labels.pointsSetAside() >= o.points() && labels.pointsSetAside() >= 0.95 * p.size,
        labels.describe());
    assertEquals(labels.pointsSetAside(), set.objectCount());
  }

  @Test
  void flatRoofIsPlanar() {
    LabelPoints p = points();
    SplittableRandom rng = new SplittableRandom(5);
    for (int k = 0; k < 10 * 6 * 10; k++) {
      add(p, rng.nextDouble(0, 10), rng.nextDouble(0, 6), 5 + SIGMA_M * rng.nextGaussian(), 1);
    }
    ObjectLabels labels = ObjectLabeller.label(p, SetAside.none());
    assertEquals(ObjectKind.PLANAR, labels.objects().get(0).kind(),
        labels.objects().toString());
  }

  /**
   * Regression (issue 9, "a crown is not a roof"): the smooth upper shell of a broad crown,
   * first returns only, looked planar enough (planar share 0.59, mean scattering 0.030) to be
   * taken for a roof and set aside (seed 46 demo feeder, vertical framing, ground-only: tree 27's
   * 118 points, span P204-P205 minimum 9.403 m against a true 5.013 m). A roof is a few flat
   * faces and stops its pulses; the crown's shell curves and its pulses go on to the ground.
   * The shell here (computed, seeded): a half-ellipsoid cap 7 m across, 9.5-13 m up, 10 points
   * per m^2 within 5 cm of its surface, each the first of two returns; then the same points with
   * the echoes not recorded (all 1 of 1, as some vendors and thinned files give them).
   */
  @Test
  void aCrownShellIsNotARoof() {
    for (int of : new int[] {2, 1}) {
      LabelPoints p = points();
      SplittableRandom rng = new SplittableRandom(13);
      double radius = 3.5;
      for (int k = 0; k < 10 * Math.PI * radius * radius; k++) {
        double a = rng.nextDouble(0, 2 * Math.PI);
        double q = Math.sqrt(rng.nextDouble());
        double z = 9.5 + 3.5 * Math.sqrt(1 - q * q) - rng.nextDouble(0, 0.05);
        p.add(radius * q * Math.cos(a), radius * q * Math.sin(a), z, z, (byte) 1, (byte) of,
            LabelPoints.OPEN, LabelWindow.CORE);
      }
      // a tenth of the points looked at later returns elsewhere, so the echoes are read
      for (int k = 0; k < p.size / 10 && of == 2; k++) {
        p.add(40 + k, 0, 1.5, 1.5, (byte) 2, (byte) 2, LabelPoints.OPEN, LabelWindow.CORE);
      }
      ObjectLabels labels = ObjectLabeller.label(p, SetAside.none());
      assertEquals(of == 2, labels.echoesInformative(), labels.describe());
      assertEquals(1, labels.objects().size(), labels.objects().toString());
      LabelledObject o = labels.objects().get(0);
      // it has a planar object's shape: only the new evidence tells it from a roof
      assertTrue(o.planarShare() >= ObjectLabeller.PLANAR_MIN_SHARE
          && o.scattering() <= ObjectLabeller.PLANAR_MAX_SCATTERING, o.toString());
      assertTrue(o.facetShare() < Facets.ROOF_MIN_FACET_SHARE, o.toString());
      assertEquals(of == 2 ? 1.0 : Double.NaN, o.multiPulseShare(), 1e-9);
      assertEquals(ObjectKind.VEGETATION, o.kind(), o.toString());
      assertEquals(0, labels.pointsSetAside(), labels.describe());
    }
  }

  /** A gable roof (two faces at 30 degrees, 10 m x 8 m, eaves 4 m, noise 3 cm, 10 points per
   * m^2, every pulse one return) is two facets and is planar; so is a wall 12 m x 5 m (its
   * normal level). Computed, seeded. */
  @Test
  void gableRoofAndWallArePlanar() {
    LabelPoints p = points();
    SplittableRandom rng = new SplittableRandom(17);
    double rise = 4 * Math.tan(Math.toRadians(30));
    for (int k = 0; k < 10 * 10 * 8; k++) {
      double x = rng.nextDouble(0, 10);
      double y = rng.nextDouble(-4, 4);
      double z = 4 + rise * (1 - Math.abs(y) / 4) + SIGMA_M * rng.nextGaussian();
      p.add(x, y, z, z, (byte) 1, (byte) 1, LabelPoints.OPEN, LabelWindow.CORE);
    }
    for (int k = 0; k < 10 * 12 * 5; k++) {
      double z = rng.nextDouble(1, 6);
      p.add(40 + rng.nextDouble(0, 12), 30 + SIGMA_M * rng.nextGaussian(), z, z, (byte) 1,
          (byte) 1, LabelPoints.OPEN, LabelWindow.CORE);
    }
    ObjectLabels labels = ObjectLabeller.label(p, SetAside.none());
    assertEquals(2, labels.objects().size(), labels.objects().toString());
    for (LabelledObject o : labels.objects()) {
      assertEquals(ObjectKind.PLANAR, o.kind(), o.toString());
      assertTrue(o.facetShare() >= 0.9, o.toString());
    }
  }

  @Test
  void normalOfAPlane() {
    // The covariance of points spread evenly on a plane through the origin with unit normal
    // n = (0, -sin 30, cos 30) is the identity less n n^T (computed): its null vector is n.
    double ny = -0.5;
    double nz = Math.sqrt(3) / 2;
    double[] v = LocalShape.nullVector(1, 0, 0, 1 - ny * ny, -ny * nz, 1 - nz * nz);
    assertEquals(0, v[0], 1e-12);
    assertEquals(ny, v[1], 1e-12);
    assertEquals(nz, v[2], 1e-12);
  }

  @Test
  void crownsStayVegetation() {
    // A broad crown (ellipsoid shell 6 m across, 8-20 m up) sampled from above at 10 points per
    // m^2, one in four a later return; and a conifer reaching the ground (cone 1-18 m, radius
    // 2.5 m at the base) with every return a first one.
    LabelPoints p = points();
    SplittableRandom rng = new SplittableRandom(7);
    for (int k = 0; k < 1200; k++) {
      double a = rng.nextDouble(0, 2 * Math.PI);
      double r = 3 * Math.sqrt(rng.nextDouble());
      double zc = 14 + 6 * Math.sqrt(Math.max(0, 1 - r * r / 9)) - rng.nextDouble(0, 0.8);
      add(p, r * Math.cos(a), r * Math.sin(a), zc, rng.nextDouble() < 0.25 ? 2 : 1);
    }
    for (int k = 0; k < 1500; k++) {
      double z = rng.nextDouble(1, 18);
      double r = 2.5 * (18 - z) / 17 * Math.sqrt(rng.nextDouble());
      double a = rng.nextDouble(0, 2 * Math.PI);
      add(p, 30 + r * Math.cos(a), r * Math.sin(a), z, 1);
    }
    ObjectLabels labels = ObjectLabeller.label(p, SetAside.none());
    assertEquals(2, labels.objects().size(), labels.objects().toString());
    for (LabelledObject o : labels.objects()) {
      assertEquals(ObjectKind.VEGETATION, o.kind(), o.toString());
    }
    assertEquals(0, labels.pointsSetAside());
    assertTrue(labels.echoesInformative());
  }

  @Test
  void laterReturnsKeepAnObjectVegetation() {
    // decide(): the echo veto overrides a mast's and a roof's shape.
    assertEquals(ObjectKind.MAST,
        ObjectLabeller.decide(20, 0.7, 0.05, 0.1, 1.0, 0.5, 0.0, 0.6, Double.NaN));
    assertEquals(ObjectKind.VEGETATION, ObjectLabeller.decide(20, 0.7, 0.05, 0.1, 1.0, 0.5,
        ObjectLabeller.ECHO_VEGETATION_SHARE, 0.6, Double.NaN));
    assertEquals(ObjectKind.PLANAR,
        ObjectLabeller.decide(5, 0.4, 0.01, 0.8, 10, 0, Double.NaN, Double.NaN, 0.9));
    assertEquals(ObjectKind.VEGETATION,
        ObjectLabeller.decide(5, 0.4, 0.01, 0.8, 10, 0, 0.3, 0.5, 0.9));
    // a crown is not a roof (issue 9): a roof's shape, no later return, but its points come
    // from pulses with several returns; or its planar points do not lie in a few facets
    assertEquals(ObjectKind.PLANAR,
        ObjectLabeller.decide(5, 0.4, 0.01, 0.8, 10, 0, 0.0, 0.1, 0.9));
    assertEquals(ObjectKind.VEGETATION,
        ObjectLabeller.decide(5, 0.4, 0.01, 0.8, 10, 0, 0.0, 0.5, 0.9));
    assertEquals(ObjectKind.VEGETATION,
        ObjectLabeller.decide(5, 0.4, 0.01, 0.8, 10, 0, Double.NaN, Double.NaN, 0.4));
  }

  @Test
  void aVegetationLabelAlongAWireIsNotTrusted() {
    // Issue 9, partly labelled surveys: a vendor's class-5 label on 40 m of a conductor
    // (15 m up, sagging 1 m, 10 points per metre with 3 cm noise: a line survey of 20 points
    // per m^2) is a linear object and is set aside, counted as a label not trusted; a crown
    // labelled 5 beside it keeps its label.
    LabelPoints p = points();
    SplittableRandom rng = new SplittableRandom(11);
    for (int k = 0; k < WIRE_PER_METRE * 40; k++) {
      double t = rng.nextDouble();
      double x = 40 * t;
      p.add(x + SIGMA_M * rng.nextGaussian(), SIGMA_M * rng.nextGaussian(),
          15 - 4 * t * (1 - t) + SIGMA_M * rng.nextGaussian(), 15, (byte) 1,
          LabelPoints.VEGETATION_LABEL);
    }
    for (int k = 0; k < 1200; k++) {
      double a = rng.nextDouble(0, 2 * Math.PI);
      double r = 3 * Math.sqrt(rng.nextDouble());
      double zc = 10 + 4 * Math.sqrt(Math.max(0, 1 - r * r / 9)) - rng.nextDouble(0, 0.8);
      p.add(20 + r * Math.cos(a), 8 + r * Math.sin(a), zc, zc, (byte) 1,
          LabelPoints.VEGETATION_LABEL);
    }
    SetAside set = SetAside.none();
    ObjectLabels labels = ObjectLabeller.label(p, set);
    assertEquals(2, labels.objects().size(), labels.objects().toString());
    assertEquals(1, labels.objects().stream().filter(o -> o.kind() == ObjectKind.LINEAR)
        .count(), labels.objects().toString());
    assertEquals(WIRE_PER_METRE * 40, labels.doubted().vegetationLabelsSetAside(),
        labels.describe());
    assertEquals(p.size, labels.doubted().vegetationLabels());
  }

  @Test
  void aSparseWireLabelledVegetationIsNotTrustedButACrownTouchingItIs() {
    // Issue 9: a vendor's class 5 along a conductor sampled sparsely, 4 points per metre at
    // random stations over 80 m (a scan of a few points per m^2): its gaps break it into pieces
    // of fewer than 100 points, which were never judged and stayed vegetation. Pieces of at least
    // 20 points, 10 m long and linear are judged now. A crown labelled 5 whose top reaches
    // 0.3 m under the wire at 60 m joins the wire's piece there: that object is not linear and
    // keeps every point, the crown's included; a crown 6 m beside the wire keeps its points.
    LabelPoints p = points();
    SplittableRandom rng = new SplittableRandom(23);
    int wire = 4 * 80;
    for (int k = 0; k < wire; k++) {
      double x = 80 * rng.nextDouble();
      double t = x / 80;
      p.add(x + SIGMA_M * rng.nextGaussian(), SIGMA_M * rng.nextGaussian(),
          15 - 4 * t * (1 - t) + SIGMA_M * rng.nextGaussian(), 15, (byte) 1,
          LabelPoints.VEGETATION_LABEL);
    }
    double wireZ60 = 15 - 4 * 0.75 * 0.25;
    int crowns = 0;
    for (double[] c : new double[][] {{60, 0, wireZ60 - 0.3}, {30, 6, 12}}) {
      for (int k = 0; k < 600; k++) {
        double a = rng.nextDouble(0, 2 * Math.PI);
        double r = 2.5 * Math.sqrt(rng.nextDouble());
        double zc = c[2] - 4 + 4 * Math.sqrt(Math.max(0, 1 - r * r / 6.25))
            - rng.nextDouble(0, 0.5);
        p.add(c[0] + r * Math.cos(a), c[1] + r * Math.sin(a), zc, zc, (byte) 1,
            LabelPoints.VEGETATION_LABEL);
        crowns++;
      }
    }
    SetAside set = SetAside.none();
    ObjectLabels labels = ObjectLabeller.label(p, set);
    int wireSetAside = 0;
    for (int i = 0; i < p.size; i++) {
      boolean aside = set.reason(SetAside.key(p.x[i], p.y[i], p.z[i])) != SetAside.Reason.NONE;
      if (i >= wire) {
        assertTrue(!aside, "crown point set aside: " + p.x[i] + " " + p.y[i] + " " + p.z[i]);
      } else {
        wireSetAside += aside ? 1 : 0;
      }
    }
    // the wire away from the touching crown (x < 55 m or so: 55 m of 80) is recognised, at least
    // half of it; the exact share depends on where the random gaps fall
    assertTrue(wireSetAside >= wire / 2, "wire points set aside: " + wireSetAside + " of "
        + wire + "; " + labels.objects());
    assertEquals(crowns + wire, p.size);
  }

  @Test
  void linearNeedsLengthAndLinearity() {
    // isLinear(): the thresholds of docs/labelling.md (0.85 mean linearity, 80 % linear
    // points, 10 m), each on its own.
    assertTrue(ObjectLabeller.isLinear(0.95, 0.9, 40));
    assertTrue(!ObjectLabeller.isLinear(0.68, 0.9, 40));
    assertTrue(!ObjectLabeller.isLinear(0.95, 0.5, 40));
    assertTrue(!ObjectLabeller.isLinear(0.95, 0.9, 8));
  }

  private static LabelPoints points() {
    return new LabelPoints(java.util.List.of(), 0, null, SetAside.none(), true);
  }

  private static void member(LabelPoints p, SplittableRandom rng, double x1, double y1,
      double z1, double x2, double y2, double z2) {
    double len = Math.sqrt((x2 - x1) * (x2 - x1) + (y2 - y1) * (y2 - y1) + (z2 - z1) * (z2 - z1));
    for (int k = 0; k < PER_METRE * len; k++) {
      double t = rng.nextDouble();
      add(p, x1 + t * (x2 - x1) + SIGMA_M * rng.nextGaussian(),
          y1 + t * (y2 - y1) + SIGMA_M * rng.nextGaussian(),
          z1 + t * (z2 - z1) + SIGMA_M * rng.nextGaussian(), 1);
    }
  }

  private static void add(LabelPoints p, double x, double y, double z, int returnNumber) {
    p.add(x, y, z, z, (byte) returnNumber, LabelPoints.OPEN);
  }
}
