package org.clearance.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.clearance.assess.CutSite;
import org.clearance.assess.RunAssessor;
import org.clearance.assess.SpanPoints;
import org.clearance.assess.SpanResult;
import org.clearance.clearance.ConditionMinimum;
import org.clearance.line.ConductorPosition.Role;
import org.clearance.line.SpanFrame;
import org.clearance.rules.Requirement;
import org.clearance.rules.ResolvedZone;
import org.clearance.rules.SpanRules;
import org.clearance.run.ConductorRecord;
import org.clearance.run.CurveRecord;
import org.clearance.run.RunModel;
import org.clearance.run.StructureRecord;

/**
 * The two drawings of a span in the HTML report, as inline SVG: a plan view in the span's own
 * frame (chainage from the first structure to the right, offset across the line upwards, left of
 * the line looking forward at the top) and a profile view (chainage to the right, elevation
 * upwards). Both show the conductors as surveyed (solid) and in the span's governing condition
 * (dashed; swung states at the end of their swing range), the band of the violation-reference
 * zone around the governing conductors it applies to (energised ones unless the zone names
 * neutrals or shield wires), the vegetation near the line (a bounded sample), the
 * points inside a zone in their zone's colour, fall-in trees and the structures. The two axes
 * have separate scales; the caption of each view says by how much the cross axis is stretched.
 */
final class SvgSpanViews {

  static final int WIDTH = 960;
  static final int HEIGHT = 260;
  private static final int LEFT = 64;
  private static final int RIGHT = 16;
  private static final int TOP = 16;
  private static final int BOTTOM = 36;
  /** Target number of axis ticks. */
  private static final int TICKS = 8;

  private final SpanResult result;
  private final SpanFrame frame;
  private final SpanPoints points;
  private final OutputUnit unit;
  private final Optional<ResolvedZone> reference;
  private final SpanRules rules;
  private final List<double[]> surveyed = new ArrayList<>();
  private final List<double[]> governing = new ArrayList<>();
  /** The conductors above whose role the violation-reference zone applies to. */
  private final List<double[]> surveyedZoned = new ArrayList<>();
  private final List<double[]> governingZoned = new ArrayList<>();

  /** A drawing and the stretch of its cross axis relative to its chainage axis. */
  record View(String svg, double stretch) {}

  /**
   * @param result the span
   * @param conditionIndex index of the governing condition in the run, or -1
   * @param rules the profile resolved for the span, or null
   * @param points drawn points, or null
   * @param unit output unit
   */
  SvgSpanViews(SpanResult result, int conditionIndex, SpanRules rules, SpanPoints points,
      OutputUnit unit) {
    this.result = result;
    this.frame = RunAssessor.frameOf(result.span());
    this.points = points;
    this.unit = unit;
    this.rules = rules;
    this.reference = rules == null ? Optional.empty() : rules.reference();
    for (ConductorRecord k : result.span().conductors()) {
      if (!k.fitted()) {
        continue;
      }
      // the zone's band goes only around the conductors it applies to: a neutral or shield
      // wire is not drawn as if live unless the zone names its role (issue 15)
      boolean zoned = reference.isPresent()
          && reference.get().zone().roles().contains(Role.ofName(k.role()));
      double[] s = ConductorSampler.sample(k.states().get(0).get(), 0);
      surveyed.add(s);
      if (zoned) {
        surveyedZoned.add(s);
      }
      if (conditionIndex > 0 && conditionIndex < k.states().size()
          && k.states().get(conditionIndex).isPresent()) {
        CurveRecord c = k.states().get(conditionIndex).get();
        double[] g = ConductorSampler.sample(c, ConductorSampler.drawnSwing(c));
        governing.add(g);
        if (zoned) {
          governingZoned.add(g);
        }
      }
    }
  }

  /** The index of a span's governing condition in the run's conditions, or -1. */
  static int governingIndex(SpanResult r, RunModel model) {
    return r.governingMinimum().map(ConditionMinimum::condition)
        .map(model.conditions()::indexOf).orElse(-1);
  }

  /** Whether the span can be drawn (its structures differ in plan). */
  boolean drawable() {
    return frame != null;
  }

  /** The plan view. */
  View plan() {
    return draw(true);
  }

  /** The profile view. */
  View profile() {
    return draw(false);
  }

  private View draw(boolean plan) {
    double len = frame.length();
    Range across = new Range();
    across.add(plan ? 0 : Double.NaN);
    List<double[]> bands = new ArrayList<>();
    List<double[]> envelopeSource = governing.isEmpty() ? surveyedZoned : governingZoned;
    for (double[] c : envelopeSource) {
      bands.add(band(c, plan));
    }
    for (double[] b : bands) {
      for (int i = 1; i < b.length; i += 2) {
        across.add(b[i]);
      }
    }
    for (List<double[]> set : List.of(surveyed, governing)) {
      for (double[] c : set) {
        for (int i = 0; i < c.length; i += 3) {
          across.add(cross(c, i, plan));
        }
      }
    }
    if (points != null) {
      for (int i = 0; i < points.insideCount(); i++) {
        across.add(crossOf(points.inside(i, 0), points.inside(i, 1), points.inside(i, 2), plan));
      }
      for (int i = 0; i < points.otherCount(); i++) {
        across.add(crossOf(points.other(i, 0), points.other(i, 1), points.other(i, 2), plan));
      }
    }
    for (CutSite s : result.sites()) {
      across.add(crossOf(s.x(), s.y(), s.z(), plan));
      if (!plan && s.kind() == CutSite.Kind.FALL_IN) {
        across.add(s.z() - s.vegHeightM());
      }
    }
    if (!plan) {
      across.add(result.span().from().groundZ());
      across.add(result.span().to().groundZ());
    }
    if (across.empty()) {
      across.add(0);
    }
    across.pad(0.08, 2.0);
    Scale sx = new Scale(-0.02 * len, 1.02 * len, LEFT, WIDTH - RIGHT);
    Scale sy = new Scale(across.min, across.max, HEIGHT - BOTTOM, TOP);
    StringBuilder b = new StringBuilder();
    b.append(Html.f("<svg xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 %d %d\" "
        + "class=\"view\" role=\"img\" aria-label=\"%s view of span %s\">", WIDTH, HEIGHT,
        plan ? "Plan" : "Profile", Html.esc(result.id())));
    axes(b, sx, sy, plan);
    String zoneColour = reference.map(z -> Palette.zone(z.zone().priority())).orElse("#999");
    for (double[] band : bands) {
      b.append("<path fill=\"").append(zoneColour).append("\" fill-opacity=\"0.16\" stroke=\"")
          .append(zoneColour).append("\" stroke-opacity=\"0.5\" stroke-width=\"0.8\" d=\"");
      for (int i = 0; i < band.length; i += 2) {
        b.append(i == 0 ? 'M' : 'L').append(Html.px(sx.at(band[i]))).append(' ')
            .append(Html.px(sy.at(band[i + 1])));
      }
      b.append("Z\"/>");
    }
    if (points != null) {
      dots(b, sx, sy, plan, Palette.VEGETATION, 2.4, false, 0);
      Map<Integer, Boolean> priorities = new TreeMap<>();
      for (int i = 0; i < points.insideCount(); i++) {
        priorities.put(points.insidePriority(i), true);
      }
      for (int p : priorities.keySet()) {
        dots(b, sx, sy, plan, Palette.zone(p), 3.2, true, p);
      }
    }
    for (double[] c : surveyed) {
      line(b, c, sx, sy, plan, Palette.CONDUCTOR, "");
    }
    for (double[] c : governing) {
      line(b, c, sx, sy, plan, Palette.GOVERNING, " stroke-dasharray=\"7 4\"");
    }
    structures(b, sx, sy, plan);
    sites(b, sx, sy, plan);
    if (plan) {
      northArrow(b, sx, sy);
    }
    b.append("</svg>");
    double stretch = (sy.pixelsPerUnit()) / sx.pixelsPerUnit();
    return new View(b.toString(), stretch);
  }

  /**
   * A grid-north arrow in the top right corner of the plan view, turned as north lies in the
   * span's frame (chainage to the right, offset to the left of the line upwards) and with the
   * view's stretch of the offsets.
   */
  private void northArrow(StringBuilder b, Scale sx, Scale sy) {
    double ax = result.span().from().x();
    double ay = result.span().from().y();
    double ds = frame.station(ax, ay + 1) - frame.station(ax, ay);
    double de = frame.offset(ax, ay + 1) - frame.offset(ax, ay);
    double dx = ds * Math.abs(sx.pixelsPerUnit());
    double dy = -de * Math.abs(sy.pixelsPerUnit());
    double n = Math.hypot(dx, dy);
    if (!(n > 0)) {
      return;
    }
    dx /= n;
    dy /= n;
    double cx = WIDTH - RIGHT - 26;
    double cy = TOP + 26;
    double r = 16;
    b.append(Html.f("<g class=\"north\"><circle cx=\"%s\" cy=\"%s\" r=\"20\" fill=\"#fff\" "
        + "fill-opacity=\"0.85\" stroke=\"#bbb\"/><path d=\"M%s %s L%s %s\" stroke=\"#111\" "
        + "stroke-width=\"2\"/><path d=\"M%s %s l%s %s l%s %s z\" fill=\"#111\"/>"
        + "<text x=\"%s\" y=\"%s\" text-anchor=\"middle\" class=\"lbl\">N</text></g>",
        Html.px(cx), Html.px(cy), Html.px(cx - dx * r * 0.6), Html.px(cy - dy * r * 0.6),
        Html.px(cx + dx * r * 0.5), Html.px(cy + dy * r * 0.5),
        Html.px(cx + dx * r), Html.px(cy + dy * r), Html.px(-dx * 7 - dy * 4),
        Html.px(-dy * 7 + dx * 4), Html.px(dy * 8), Html.px(-dx * 8),
        Html.px(cx - dx * 9 + dy * 9), Html.px(cy - dy * 9 - dx * 9 + 4)));
  }

  /** The zone band around one conductor: outline as (chainage, cross) pairs. */
  private double[] band(double[] c, boolean plan) {
    int n = c.length / 3;
    double[] out = new double[4 * n];
    for (int i = 0; i < n; i++) {
      double s = frame.station(c[3 * i], c[3 * i + 1]);
      double mid = cross(c, 3 * i, plan);
      double w = halfWidth(s, plan);
      out[2 * i] = s;
      out[2 * i + 1] = mid + w;
      int j = 2 * n - 1 - i;
      out[2 * j] = s;
      out[2 * j + 1] = mid - w;
    }
    return out;
  }

  /** Half width of the reference zone at a station across the given view, m (0 when none). */
  private double halfWidth(double station, boolean plan) {
    if (reference.isEmpty()) {
      return 0;
    }
    Requirement r = rules.requirement(reference.get().zone().name(), station).orElseThrow();
    if (!Double.isNaN(r.radialM())) {
      return r.radialM();
    }
    return plan ? r.horizontalM() : r.verticalM();
  }

  private double cross(double[] c, int i, boolean plan) {
    return plan ? frame.offset(c[i], c[i + 1]) : c[i + 2];
  }

  private double crossOf(double x, double y, double z, boolean plan) {
    return plan ? frame.offset(x, y) : z;
  }

  private void dots(StringBuilder b, Scale sx, Scale sy, boolean plan, String colour,
      double size, boolean inside, int priority) {
    StringBuilder d = new StringBuilder();
    int n = inside ? points.insideCount() : points.otherCount();
    for (int i = 0; i < n; i++) {
      if (inside && points.insidePriority(i) != priority) {
        continue;
      }
      double x = inside ? points.inside(i, 0) : points.other(i, 0);
      double y = inside ? points.inside(i, 1) : points.other(i, 1);
      double z = inside ? points.inside(i, 2) : points.other(i, 2);
      d.append('M').append(Html.px(sx.at(frame.station(x, y)))).append(' ')
          .append(Html.px(sy.at(crossOf(x, y, z, plan)))).append("h0");
    }
    if (d.length() > 0) {
      b.append("<path fill=\"none\" stroke=\"").append(colour).append("\" stroke-width=\"")
          .append(Html.px(size)).append("\" stroke-linecap=\"round\" d=\"").append(d)
          .append("\"/>");
    }
  }

  private void line(StringBuilder b, double[] c, Scale sx, Scale sy, boolean plan,
      String colour, String extra) {
    b.append("<polyline fill=\"none\" stroke=\"").append(colour).append("\" stroke-width=\"1.6\"")
        .append(extra).append(" points=\"");
    for (int i = 0; i < c.length; i += 3) {
      b.append(Html.px(sx.at(frame.station(c[i], c[i + 1])))).append(',')
          .append(Html.px(sy.at(cross(c, i, plan)))).append(' ');
    }
    b.append("\"/>");
  }

  private void structures(StringBuilder b, Scale sx, Scale sy, boolean plan) {
    StructureRecord[] ends = {result.span().from(), result.span().to()};
    double[] stations = {0, frame.length()};
    for (int k = 0; k < 2; k++) {
      double x = sx.at(stations[k]);
      if (plan) {
        b.append(Html.f("<rect x=\"%s\" y=\"%s\" width=\"9\" height=\"9\" fill=\"#fff\" "
            + "stroke=\"#111\" stroke-width=\"1.5\"/>", Html.px(x - 4.5),
            Html.px(sy.at(0) - 4.5)));
      } else {
        double top = Double.NEGATIVE_INFINITY;
        for (double[] c : surveyed) {
          top = Math.max(top, k == 0 ? c[2] : c[c.length - 1]);
        }
        double ground = ends[k].groundZ();
        if (Double.isFinite(top) && Double.isFinite(ground)) {
          b.append(Html.f("<line x1=\"%s\" x2=\"%s\" y1=\"%s\" y2=\"%s\" stroke=\"#111\" "
              + "stroke-width=\"3\"/>", Html.px(x), Html.px(x), Html.px(sy.at(ground)),
              Html.px(sy.at(top))));
        }
      }
      b.append(Html.f("<text x=\"%s\" y=\"%d\" class=\"lbl\" text-anchor=\"%s\">%s</text>",
          Html.px(x), TOP - 4, k == 0 ? "start" : "end", Html.esc(ends[k].id())));
    }
  }

  private void sites(StringBuilder b, Scale sx, Scale sy, boolean plan) {
    List<double[]> placed = new ArrayList<>();
    for (CutSite s : result.sites()) {
      double x = sx.at(frame.station(s.x(), s.y()));
      double y = sy.at(crossOf(s.x(), s.y(), s.z(), plan));
      String colour = Palette.site(s);
      String label = s.siteId().substring(s.siteId().lastIndexOf('.') + 1);
      if (s.kind() == CutSite.Kind.FALL_IN) {
        if (plan) {
          double r = Math.sqrt(Double.isNaN(s.areaM2()) ? 1 : s.areaM2() / Math.PI);
          b.append(Html.f("<ellipse cx=\"%s\" cy=\"%s\" rx=\"%s\" ry=\"%s\" fill=\"none\" "
              + "stroke=\"%s\" stroke-width=\"1.5\"/>", Html.px(x), Html.px(y),
              Html.px(r * sx.pixelsPerUnit()), Html.px(r * sy.pixelsPerUnit()), colour));
        } else {
          // beside the line, not under it: a faint dashed stem, its offset in the label and
          // the tooltip; the cross-section below the views draws it where it stands
          b.append(Html.f("<line x1=\"%s\" x2=\"%s\" y1=\"%s\" y2=\"%s\" stroke=\"%s\" "
              + "stroke-width=\"2\" stroke-dasharray=\"3 3\" opacity=\"0.6\"><title>%s: tree "
              + "%s m %s of the centre line</title></line>", Html.px(x), Html.px(x),
              Html.px(sy.at(s.z() - s.vegHeightM())), Html.px(y), colour,
              Html.esc(s.siteId()), OutputUnit.fixed(unit.length(s.offsetM()), 1),
              s.side().word()));
        }
      } else {
        b.append(Html.f("<circle cx=\"%s\" cy=\"%s\" r=\"6\" fill=\"none\" stroke=\"%s\" "
            + "stroke-width=\"1.5\"/>", Html.px(x), Html.px(y), colour));
      }
      double[] at = labelPlace(placed, x, y, label.length());
      if (at != null) {
        b.append(Html.f("<text x=\"%s\" y=\"%s\" class=\"site\" fill=\"%s\">%s</text>",
            Html.px(at[0]), Html.px(at[1]), colour, Html.esc(label)));
      }
    }
  }

  /** Width of a label character and height of a label, px (12 px bold text). */
  private static final double CHAR_PX = 7.5;
  private static final double LABEL_PX = 12;

  /**
   * Where a site label goes: the first of eight places around its mark (right above first)
   * that overlaps no label placed before, or null when all do (the site table lists it).
   */
  static double[] labelPlace(List<double[]> placed, double x, double y, int chars) {
    double w = chars * CHAR_PX;
    double[][] tries = {{7, -7}, {7, 15}, {-7 - w, -7}, {-7 - w, 15}, {7, -21}, {7, 29},
        {-7 - w, -21}, {-7 - w, 29}};
    for (double[] t : tries) {
      double x0 = x + t[0];
      double y0 = y + t[1] - LABEL_PX;
      boolean free = true;
      for (double[] p : placed) {
        if (x0 < p[2] && p[0] < x0 + w && y0 < p[3] && p[1] < y0 + LABEL_PX) {
          free = false;
          break;
        }
      }
      if (free) {
        placed.add(new double[] {x0, y0, x0 + w, y0 + LABEL_PX});
        return new double[] {x + t[0], y + t[1]};
      }
    }
    return null;
  }

  private void axes(StringBuilder b, Scale sx, Scale sy, boolean plan) {
    b.append(Html.f("<rect x=\"%d\" y=\"%d\" width=\"%d\" height=\"%d\" class=\"plot\"/>",
        LEFT, TOP, WIDTH - LEFT - RIGHT, HEIGHT - TOP - BOTTOM));
    for (double t : ticks(sx)) {
      double x = sx.at(unit.unit().toMetres(t));
      b.append(Html.f("<line x1=\"%s\" x2=\"%s\" y1=\"%d\" y2=\"%d\" class=\"grid\"/>",
          Html.px(x), Html.px(x), TOP, HEIGHT - BOTTOM));
      b.append(Html.f("<text x=\"%s\" y=\"%d\" class=\"tick\" text-anchor=\"middle\">%s</text>",
          Html.px(x), HEIGHT - BOTTOM + 14, OutputUnit.fixed(t, 0)));
    }
    for (double t : ticks(sy)) {
      double y = sy.at(unit.unit().toMetres(t));
      b.append(Html.f("<line x1=\"%d\" x2=\"%d\" y1=\"%s\" y2=\"%s\" class=\"grid\"/>",
          LEFT, WIDTH - RIGHT, Html.px(y), Html.px(y)));
      b.append(Html.f("<text x=\"%d\" y=\"%s\" class=\"tick\" text-anchor=\"end\">%s</text>",
          LEFT - 5, Html.px(y + 4), OutputUnit.fixed(t, 0)));
    }
    b.append(Html.f("<text x=\"%d\" y=\"%d\" class=\"axis\" text-anchor=\"end\">chainage "
        + "from %s (%s)</text>", WIDTH - RIGHT, HEIGHT - 4,
        Html.esc(result.span().from().id()), unit.symbol()));
    b.append(Html.f("<text x=\"12\" y=\"%d\" class=\"axis\" transform=\"rotate(-90 12 %d)\" "
        + "text-anchor=\"middle\">%s (%s)</text>", HEIGHT / 2, HEIGHT / 2,
        plan ? "offset, left +" : "elevation", unit.symbol()));
  }

  /** Tick values in the output unit: 1, 2 or 5 times a power of ten apart. */
  private List<Double> ticks(Scale s) {
    double lo = unit.length(Math.min(s.lo, s.hi));
    double hi = unit.length(Math.max(s.lo, s.hi));
    double raw = (hi - lo) / TICKS;
    double mag = Math.pow(10, Math.floor(Math.log10(raw)));
    double step = raw / mag < 1.5 ? mag : raw / mag < 3.5 ? 2 * mag : raw / mag < 7.5 ? 5 * mag
        : 10 * mag;
    List<Double> out = new ArrayList<>();
    for (double t = Math.ceil(lo / step) * step; t <= hi; t += step) {
      out.add(Math.abs(t) < step * 1e-9 ? 0.0 : t);
    }
    return out;
  }

  /** Linear map from data (m) to pixels. */
  private record Scale(double lo, double hi, double pixLo, double pixHi) {
    double at(double v) {
      return pixLo + (v - lo) / (hi - lo) * (pixHi - pixLo);
    }

    double pixelsPerUnit() {
      return Math.abs((pixHi - pixLo) / (hi - lo));
    }
  }

  /** A growing range of finite values. */
  private static final class Range {
    double min = Double.POSITIVE_INFINITY;
    double max = Double.NEGATIVE_INFINITY;

    void add(double v) {
      if (Double.isFinite(v)) {
        min = Math.min(min, v);
        max = Math.max(max, v);
      }
    }

    boolean empty() {
      return min > max;
    }

    /** Widens by a fraction of the range, and to at least {@code least} m in all. */
    void pad(double fraction, double least) {
      double span = Math.max(max - min, least);
      double mid = (min + max) / 2;
      min = mid - span * (0.5 + fraction);
      max = mid + span * (0.5 + fraction);
    }
  }
}
