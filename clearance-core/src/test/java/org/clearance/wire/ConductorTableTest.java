package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import org.clearance.line.ConductorPosition;
import org.clearance.line.SpanFrame;
import org.clearance.line.SpanLayout;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.SurveyUnits;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The conductors file: exact columns, units, empty fields, quoting, atomic write. */
class ConductorTableTest {
  @TempDir Path dir;

  private static WireResult result() {
    SyntheticCorridor c = SyntheticCorridor.standard(SyntheticCorridor.Mode.LABELLED, 1);
    SpanLayout layout = Fixtures.layout(c);
    var span = layout.spans().get(0);
    SpanFrame plan = SpanFrame.between(1000, 2000, 1300, 2400);
    ConductorCurve curve = new ConductorCurve(plan, Catenary.through(0, 130, 500, 140, 2000));
    FittedConductor a = new FittedConductor("A", ConductorPosition.Role.PHASE, Optional.of("A"),
        Optional.of(curve), Optional.empty(), new WireQuality(812, 97.46, 0.0412, 6.25, 0.004),
        0, WireStatus.FITTED, Optional.empty(), Optional.empty(), Optional.empty());
    // an extra wire whose points were too few for a curve: located by its points alone
    FittedConductor x = new FittedConductor("extra1", ConductorPosition.Role.PHASE,
        Optional.empty(), Optional.empty(), Optional.empty(), new WireQuality(9, Double.NaN,
            Double.NaN, Double.NaN, Double.NaN), Double.NaN, WireStatus.NOT_ASSESSED,
        Optional.of("no conductor curve: too few points"), Optional.empty(),
        Optional.of(new WireExtent(1010, 2010, 131, 1040, 2050, 133, 1030, 2040, 128.5)));
    FittedConductor b = FittedConductor.missing(layout.lines().get(0).spec().position("B")
        .orElseThrow(), "no wire found near offset 0.0 m, \"B\" missing");
    SpanWires sw = new SpanWires(span, WireStatus.NOT_ASSESSED, Optional.of("B missing"),
        List.of(a, b, x), 2000, true);
    return new WireResult(layout, List.of(sw), List.of());
  }

  @Test
  void columnsAndRowsInMetres() {
    String[] lines = ConductorTable.csv(result(), SurveyUnits.metres("test")).split("\n");
    // the brief's column list, verbatim
    assertEquals("span_id,from_structure,to_structure,conductor,n_points,coverage_pct,rms_m,"
        + "max_gap_m,attach_a_x_m,attach_a_y_m,attach_a_z_m,attach_b_x_m,attach_b_y_m,"
        + "attach_b_z_m,catenary_c_m,sag_mid_m,status,reason,low_x_m,low_y_m,low_z_m,"
        + "first_point_x_m,first_point_y_m,first_point_z_m,last_point_x_m,last_point_y_m,"
        + "last_point_z_m", lines[0]);
    // sag of the curve computed by hand from methods.md 2.5: z0 + c (cosh(t) - 1) at the
    // mid-point below the chord (135 m): Catenary.midSpanSag gives 15.644 for c = 2000
    // over 500 m with 10 m rise, checked against the parabolic w S^2 / 8 H = 500^2 / 16000
    // = 15.625 m to 0.2 %
    String[] a = lines[1].split(",", -1);
    assertEquals(List.of("S1-S2", "S1", "S2", "A", "812", "97.5", "0.041", "6.25", "1000.000",
        "2000.000", "130.000", "1300.000", "2400.000", "140.000", "2000.0"),
        List.of(a).subList(0, 15));
    assertEquals(15.625, Double.parseDouble(a[15]), 0.002 * 15.625);
    assertEquals("fitted", a[16]);
    assertEquals("", a[17]);
    assertEquals("S1-S2,S1,S2,B,0,,,,,,,,,,,,not_assessed,"
        + "\"no wire found near offset 0.0 m, \"\"B\"\" missing\",,,,,,,,,", lines[2]);
    // the curve's lowest point: c = 2000 through (0, 130) and (500, 140) has its vertex where
    // 2 c sinh(250 / c) sinh((250 - s0) / c) = 10 m, s0 = 250 - c asinh(10 / (2 c sinh(250 /
    // c))) = 210.107 m (computed from the catenary z = z0 + c (cosh((s - s0) / c) - 1)), inside
    // the span, so the low point lies on the plan line 210.107 m from A of 500 m
    assertEquals(1000 + 300 * 210.107 / 500, Double.parseDouble(a[18]), 0.002);
    assertEquals(2000 + 400 * 210.107 / 500, Double.parseDouble(a[19]), 0.002);
    assertTrue(Double.parseDouble(a[20]) < 130, "below both attachments");
    // a wire without a curve is located by its own points (issue 11: extraN can be found)
    assertEquals("S1-S2,S1,S2,extra1,9,,,,,,,,,,,,not_assessed,no conductor curve: too few "
        + "points,1030.000,2040.000,128.500,1010.000,2010.000,131.000,1040.000,2050.000,133.000",
        lines[3]);
  }

  @Test
  void coordinatesInTheSurveysFeet() {
    SurveyUnits feet = new SurveyUnits(LinearUnit.FOOT, LinearUnit.FOOT, "", OptionalInt.empty(),
        "", "test");
    String[] a = ConductorTable.csv(result(), feet).split("\n")[1].split(",", -1);
    // 1 international foot = 0.3048 m exactly (check-values.md section 1, [published] NIST)
    assertEquals(1000 / 0.3048, Double.parseDouble(a[8]), 0.0005);
    assertEquals(130 / 0.3048, Double.parseDouble(a[10]), 0.0005);
    assertEquals("0.041", a[6], "distances stay in metres");
    assertEquals("2000.0", a[14]);
  }

  @Test
  void writeLeavesOnlyTheFinishedFile() throws Exception {
    Path file = dir.resolve("conductors.csv");
    ConductorTable.write(file, result(), SurveyUnits.metres("test"));
    assertTrue(Files.readString(file).startsWith("span_id,"));
    try (var list = Files.list(dir)) {
      assertEquals(List.of(file), list.toList());
    }
    assertFalse(ConductorTable.num(-0.0001, 3).startsWith("-"));
  }
}
