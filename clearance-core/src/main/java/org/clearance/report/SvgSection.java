package org.clearance.report;

import java.util.ArrayList;
import java.util.List;
import org.clearance.assess.CutSite;
import org.clearance.assess.RunAssessor;
import org.clearance.assess.SpanPoints;
import org.clearance.assess.SpanResult;
import org.clearance.line.SpanFrame;
import org.clearance.rules.Requirement;
import org.clearance.rules.ResolvedZone;
import org.clearance.rules.SpanRules;
import org.clearance.run.ConductorRecord;
import org.clearance.run.CurveRecord;

/**
 * A cross-section of a span at its most urgent site, looking from the span's first structure to
 * its second, at one scale on both axes (true shape): every fitted conductor where it is in each
 * condition of the run (a swinging condition from one end of its swing range to the other), the
 * violation-reference zone around the site's governing conductor, the vegetation points within a
 * few metres of the section, the site and, for a tree, its stem and crown where it stands.
 */
final class SvgSection {

  static final int WIDTH = 960;
  static final int MAX_HEIGHT = 420;
  private static final int PAD = 34;
  /** Vegetation points this close to the section along the span are drawn, m. */
  static final double SLICE_M = 3.0;
  /** Condition colours after the surveyed state (black); later conditions reuse the last. */
  private static final String[] CONDITION_COLOURS = {"#2c64b8", "#c2410c", "#0f766e",
      "#7c3aed", "#a16207", "#475569"};

  private SvgSection() {}

  /** The colour of condition index {@code k} (0 = surveyed). */
  static String colour(int k) {
    return k == 0 ? Palette.CONDUCTOR
        : CONDITION_COLOURS[Math.min(k - 1, CONDITION_COLOURS.length - 1)];
  }

  /**
   * The section's SVG, or empty text when the span cannot be drawn or has no site.
   *
   * @param r the span
   * @param rules the profile resolved for the span, or null
   * @param points drawn points of the span, or null
   * @param u output unit (tick labels)
   * @param conditions the run's condition names, surveyed first
   */
  static String svg(SpanResult r, SpanRules rules, SpanPoints points, OutputUnit u,
      List<String> conditions) {
    SpanFrame frame = RunAssessor.frameOf(r.span());
    if (frame == null || r.sites().isEmpty()) {
      return "";
    }
    CutSite site = r.sites().get(0);
    double s0 = frame.station(site.x(), site.y());
    int govCondition = Math.max(0, conditions.indexOf(site.condition()));
    double siteAcross = -frame.offset(site.x(), site.y());
    List<double[]> marks = new ArrayList<>(); // {across, z, condition index, conductor index}
    List<double[]> swings = new ArrayList<>(); // {across1, z1, across2, z2, condition}
    double[] gov = null;
    int ki = 0;
    for (ConductorRecord k : r.span().conductors()) {
      ki++;
      if (!k.fitted()) {
        continue;
      }
      for (int c = 0; c < k.states().size(); c++) {
        if (k.states().get(c).isEmpty()) {
          continue;
        }
        CurveRecord st = k.states().get(c).get();
        double[] a = at(frame, ConductorSampler.sample(st, st.swingMin()), s0);
        double[] b = at(frame, ConductorSampler.sample(st, st.swingMax()), s0);
        if (a == null || b == null) {
          continue;
        }
        marks.add(new double[] {-a[0], a[1], c, ki});
        if (st.swingMin() != st.swingMax()) {
          marks.add(new double[] {-b[0], b[1], c, ki});
          swings.add(new double[] {-a[0], a[1], -b[0], b[1], c});
        }
        if (c == govCondition && (k.name().equals(site.conductor())
            || k.name().startsWith(site.conductor() + "."))) {
          // the end of the swing range nearer the site, where the zone bites
          double da = Math.hypot(-a[0] - siteAcross, a[1] - site.z());
          double db = Math.hypot(-b[0] - siteAcross, b[1] - site.z());
          double[] near = da <= db ? a : b;
          double dn = Math.min(da, db);
          if (gov == null || dn < gov[2]) {
            gov = new double[] {-near[0], near[1], dn};
          }
        }
      }
    }
    if (marks.isEmpty()) {
      return "";
    }
    double radius = Double.NaN;
    if (rules != null && rules.reference().isPresent()) {
      ResolvedZone ref = rules.reference().get();
      Requirement req = ref.at(r.span().context().lengthM(), s0);
      radius = ref.radial().isPresent() ? req.radialM() : Double.NaN;
    }
    double ground = Double.isFinite(site.vegHeightM()) ? site.z() - site.vegHeightM()
        : Double.NaN;
    double minX = siteAcross;
    double maxX = siteAcross;
    double minZ = Double.isFinite(ground) ? ground : site.z();
    double maxZ = site.z();
    for (double[] m : marks) {
      minX = Math.min(minX, m[0]);
      maxX = Math.max(maxX, m[0]);
      minZ = Math.min(minZ, m[1]);
      maxZ = Math.max(maxZ, m[1]);
    }
    double pad = Double.isFinite(radius) ? radius + 1 : 2;
    minX -= pad;
    maxX += pad;
    minZ -= 1;
    maxZ += pad;
    double scale = Math.min((WIDTH - 2.0 * PAD) / (maxX - minX), (MAX_HEIGHT - 2.0 * PAD)
        / (maxZ - minZ));
    int height = (int) Math.ceil((maxZ - minZ) * scale + 2 * PAD);
    double left = (WIDTH - (maxX - minX) * scale) / 2;
    double fx = minX;
    double fz = maxZ;
    java.util.function.DoubleUnaryOperator px = v -> left + (v - fx) * scale;
    java.util.function.DoubleUnaryOperator pz = v -> PAD + (fz - v) * scale;
    StringBuilder b = new StringBuilder();
    b.append(Html.f("<svg xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 %d %d\" "
        + "class=\"view\" role=\"img\" aria-label=\"cross-section of span %s at site %s\">",
        WIDTH, height, Html.esc(r.id()), Html.esc(site.siteId())));
    b.append(Html.f("<rect class=\"plot\" x=\"0.5\" y=\"0.5\" width=\"%d\" height=\"%d\"/>",
        WIDTH - 1, height - 1));
    if (Double.isFinite(ground)) {
      b.append(Html.f("<line x1=\"0\" x2=\"%d\" y1=\"%s\" y2=\"%s\" stroke=\"#8b7355\" "
          + "stroke-width=\"2\"/>", WIDTH, Html.px(pz.applyAsDouble(ground)),
          Html.px(pz.applyAsDouble(ground))));
    }
    b.append(Html.f("<line x1=\"%s\" x2=\"%s\" y1=\"0\" y2=\"%d\" class=\"grid\" "
        + "stroke-dasharray=\"4 4\"/>", Html.px(px.applyAsDouble(0)),
        Html.px(px.applyAsDouble(0)), height));
    if (gov != null && Double.isFinite(radius)) {
      String zc = Palette.zone(rules.reference().get().zone().priority());
      b.append(Html.f("<circle cx=\"%s\" cy=\"%s\" r=\"%s\" fill=\"%s\" fill-opacity=\"0.14\" "
          + "stroke=\"%s\" stroke-dasharray=\"5 3\"/>", Html.px(px.applyAsDouble(gov[0])),
          Html.px(pz.applyAsDouble(gov[1])), Html.px(radius * scale), zc, zc));
    }
    if (points != null) {
      for (int i = 0; i < points.otherCount(); i++) {
        dot(b, frame, points.other(i, 0), points.other(i, 1), points.other(i, 2), s0, px, pz,
            Palette.VEGETATION, 2.2);
      }
      for (int i = 0; i < points.insideCount(); i++) {
        dot(b, frame, points.inside(i, 0), points.inside(i, 1), points.inside(i, 2), s0, px, pz,
            Palette.zone(points.insidePriority(i)), 2.8);
      }
    }
    String sc = Palette.site(site);
    if (site.kind() == CutSite.Kind.FALL_IN && Double.isFinite(ground)) {
      double crown = Double.isFinite(site.areaM2()) ? Math.sqrt(site.areaM2() / Math.PI) : 1;
      b.append(Html.f("<line x1=\"%s\" x2=\"%s\" y1=\"%s\" y2=\"%s\" stroke=\"%s\" "
          + "stroke-width=\"3\"/><ellipse cx=\"%s\" cy=\"%s\" rx=\"%s\" ry=\"%s\" fill=\"%s\" "
          + "fill-opacity=\"0.25\" stroke=\"%s\"/>", Html.px(px.applyAsDouble(siteAcross)),
          Html.px(px.applyAsDouble(siteAcross)), Html.px(pz.applyAsDouble(ground)),
          Html.px(pz.applyAsDouble(site.z())), sc, Html.px(px.applyAsDouble(siteAcross)),
          Html.px(pz.applyAsDouble(site.z() - crown)), Html.px(crown * scale),
          Html.px(crown * scale), sc, sc));
    } else {
      b.append(Html.f("<circle cx=\"%s\" cy=\"%s\" r=\"7\" fill=\"none\" stroke=\"%s\" "
          + "stroke-width=\"2\"/>", Html.px(px.applyAsDouble(siteAcross)),
          Html.px(pz.applyAsDouble(site.z())), sc));
    }
    for (double[] w : swings) {
      b.append(Html.f("<line x1=\"%s\" y1=\"%s\" x2=\"%s\" y2=\"%s\" stroke=\"%s\" "
          + "stroke-width=\"1.2\" stroke-opacity=\"0.7\"/>", Html.px(px.applyAsDouble(w[0])),
          Html.px(pz.applyAsDouble(w[1])), Html.px(px.applyAsDouble(w[2])),
          Html.px(pz.applyAsDouble(w[3])), colour((int) w[4])));
    }
    for (double[] m : marks) {
      b.append(Html.f("<circle cx=\"%s\" cy=\"%s\" r=\"3.6\" fill=\"%s\"/>",
          Html.px(px.applyAsDouble(m[0])), Html.px(pz.applyAsDouble(m[1])), colour((int) m[2])));
    }
    b.append(Html.f("<text x=\"8\" y=\"16\">&#8592; left</text><text x=\"%d\" y=\"16\" "
        + "text-anchor=\"end\">right &#8594;</text>", WIDTH - 8));
    scaleBar(b, scale, height, u);
    b.append(Html.f("<text x=\"%s\" y=\"%s\" class=\"site\" fill=\"%s\">%s</text>",
        Html.px(px.applyAsDouble(siteAcross) + 9), Html.px(pz.applyAsDouble(site.z()) - 9), sc,
        Html.esc(site.siteId().substring(site.siteId().lastIndexOf('.') + 1))));
    b.append("</svg>");
    return b.toString();
  }

  private static void dot(StringBuilder b, SpanFrame f, double x, double y, double z, double s0,
      java.util.function.DoubleUnaryOperator px, java.util.function.DoubleUnaryOperator pz,
      String colour, double r) {
    if (Math.abs(f.station(x, y) - s0) > SLICE_M) {
      return;
    }
    b.append(Html.f("<circle cx=\"%s\" cy=\"%s\" r=\"%s\" fill=\"%s\"/>",
        Html.px(px.applyAsDouble(-f.offset(x, y))), Html.px(pz.applyAsDouble(z)), Html.px(r),
        colour));
  }

  /** Plan offset (left positive) and elevation of a sampled conductor at station s0, or null. */
  static double[] at(SpanFrame f, double[] c, double s0) {
    for (int i = 3; i < c.length; i += 3) {
      double sa = f.station(c[i - 3], c[i - 2]);
      double sb = f.station(c[i], c[i + 1]);
      if ((sa - s0) * (sb - s0) <= 0 && sa != sb) {
        double t = (s0 - sa) / (sb - sa);
        double ea = f.offset(c[i - 3], c[i - 2]);
        double eb = f.offset(c[i], c[i + 1]);
        return new double[] {ea + t * (eb - ea), c[i - 1] + t * (c[i + 2] - c[i - 1])};
      }
    }
    return null;
  }

  private static void scaleBar(StringBuilder b, double pxPerM, int height, OutputUnit u) {
    double unitM = u.length(1) == 1 ? 1 : 0.3048;
    double target = 120 / pxPerM / unitM;
    double step = Math.pow(10, Math.floor(Math.log10(target)));
    double len = target >= 5 * step ? 5 * step : target >= 2 * step ? 2 * step : step;
    double w = len * unitM * pxPerM;
    b.append(Html.f("<path d=\"M12 %s h%s\" stroke=\"#111\" stroke-width=\"3\"/>"
        + "<text x=\"%s\" y=\"%s\">%s %s (both axes)</text>", Html.px(height - 12.0),
        Html.px(w), Html.px(16 + w), Html.px(height - 8.0), OutputUnit.plain(len), u.symbol()));
  }
}
