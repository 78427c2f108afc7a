package org.clearance.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.clearance.assess.CutSite;
import org.clearance.assess.RunAssessment;
import org.clearance.assess.RunAssessor;
import org.clearance.assess.SpanResult;
import org.clearance.line.SpanFrame;
import org.clearance.run.LineFacts;
import org.clearance.run.StructureRecord;

/**
 * The overview map: the whole line drawn in the survey's own map coordinates (grid north up,
 * equal scale on both axes), with the structures labelled, the spans coloured by status, the cut
 * sites by priority, the right-of-way edges where the line specification gives a width, a scale
 * bar and a north arrow. Drawn, never fetched: it needs no network and no map tiles.
 */
final class SvgOverview {

  /** Drawing size, px. */
  static final int WIDTH = 1000;
  static final int MAX_HEIGHT = 700;
  /** Margin inside the frame, px. */
  private static final int PAD = 36;
  /** Labels closer than this to an earlier label are left out, px (they would overlap). */
  private static final double LABEL_GAP_PX = 34;

  private SvgOverview() {}

  /** The map's SVG element, or empty text when no structure has a position. */
  static String svg(RunAssessment run, OutputUnit u) {
    Map<String, StructureRecord> structures = new LinkedHashMap<>();
    for (SpanResult r : run.spans()) {
      structures.putIfAbsent(r.span().from().id(), r.span().from());
      structures.putIfAbsent(r.span().to().id(), r.span().to());
    }
    double minX = Double.POSITIVE_INFINITY;
    double minY = Double.POSITIVE_INFINITY;
    double maxX = Double.NEGATIVE_INFINITY;
    double maxY = Double.NEGATIVE_INFINITY;
    for (StructureRecord s : structures.values()) {
      if (Double.isFinite(s.x()) && Double.isFinite(s.y())) {
        minX = Math.min(minX, s.x());
        maxX = Math.max(maxX, s.x());
        minY = Math.min(minY, s.y());
        maxY = Math.max(maxY, s.y());
      }
    }
    if (!Double.isFinite(minX)) {
      return "";
    }
    double margin = 0;
    for (LineFacts l : run.model().facts().lines()) {
      if (Double.isFinite(l.rowHalfWidthM())) {
        margin = Math.max(margin, l.rowHalfWidthM());
      }
    }
    minX -= margin;
    maxX += margin;
    minY -= margin;
    maxY += margin;
    double spanX = Math.max(maxX - minX, 1);
    double spanY = Math.max(maxY - minY, 1);
    double scale = Math.min((WIDTH - 2.0 * PAD) / spanX, (MAX_HEIGHT - 2.0 * PAD) / spanY);
    int height = (int) Math.ceil(spanY * scale + 2 * PAD);
    double x0 = minX;
    double y1 = maxY;
    Map2 m = new Map2(x0, y1, scale);
    StringBuilder b = new StringBuilder();
    b.append(Html.f("<svg class=\"view map\" xmlns=\"http://www.w3.org/2000/svg\" "
        + "viewBox=\"0 0 %d %d\" role=\"img\" aria-label=\"overview map\">", WIDTH, height));
    b.append(Html.f("<rect class=\"plot\" x=\"0.5\" y=\"0.5\" width=\"%d\" height=\"%d\"/>",
        WIDTH - 1, height - 1));
    for (SpanResult r : run.spans()) {
      rowEdges(b, run, r, m);
    }
    for (SpanResult r : run.spans()) {
      StructureRecord a = r.span().from();
      StructureRecord c = r.span().to();
      String colour = switch (r.status()) {
        case NOT_ASSESSED -> Palette.NOT_ASSESSED;
        case INCOMPLETE -> "#8a6d1f";
        default -> Palette.CONDUCTOR;
      };
      String dash = r.status() == org.clearance.clearance.SpanStatus.ASSESSED ? ""
          : " stroke-dasharray=\"6 4\"";
      b.append(Html.f("<line x1=\"%s\" y1=\"%s\" x2=\"%s\" y2=\"%s\" stroke=\"%s\" "
          + "stroke-width=\"2\"%s/>", Html.px(m.x(a.x())), Html.px(m.y(a.y())),
          Html.px(m.x(c.x())), Html.px(m.y(c.y())), colour, dash));
    }
    List<CutSite> sites = new ArrayList<>(run.sites());
    sites.sort((p, q) -> Integer.compare(q.priority(), p.priority())); // most urgent on top
    for (CutSite s : sites) {
      b.append(Html.f("<circle cx=\"%s\" cy=\"%s\" r=\"%s\" fill=\"%s\" stroke=\"#fff\" "
          + "stroke-width=\"0.8\"><title>%s</title></circle>", Html.px(m.x(s.x())),
          Html.px(m.y(s.y())), s.kind() == CutSite.Kind.FALL_IN ? "3.5" : "4.5",
          Palette.site(s), Html.esc(s.siteId() + " " + s.zone())));
    }
    List<double[]> labelled = new ArrayList<>();
    for (StructureRecord s : structures.values()) {
      if (!Double.isFinite(s.x())) {
        continue;
      }
      double px = m.x(s.x());
      double py = m.y(s.y());
      b.append(Html.f("<rect x=\"%s\" y=\"%s\" width=\"6\" height=\"6\" fill=\"#111\"/>",
          Html.px(px - 3), Html.px(py - 3)));
      boolean free = labelled.stream().noneMatch(q -> Math.hypot(q[0] - px, q[1] - py)
          < LABEL_GAP_PX);
      if (free) {
        labelled.add(new double[] {px, py});
        b.append(Html.f("<text class=\"lbl\" x=\"%s\" y=\"%s\">%s</text>", Html.px(px + 6),
            Html.px(py - 6), Html.esc(s.id())));
      }
    }
    scaleBar(b, scale, height, u);
    northArrow(b);
    b.append("</svg>");
    return b.toString();
  }

  /** The right-of-way edges of a span, when its line's width is known. */
  private static void rowEdges(StringBuilder b, RunAssessment run, SpanResult r, Map2 m) {
    double half = run.model().facts().line(r.span().context().lineId())
        .map(LineFacts::rowHalfWidthM).orElse(Double.NaN);
    SpanFrame f = RunAssessor.frameOf(r.span());
    if (Double.isNaN(half) || f == null) {
      return;
    }
    double length = r.span().context().lengthM();
    for (double e : new double[] {half, -half}) {
      b.append(Html.f("<line x1=\"%s\" y1=\"%s\" x2=\"%s\" y2=\"%s\" stroke=\"#3d6b4f\" "
          + "stroke-width=\"1\" stroke-dasharray=\"2 3\"/>", Html.px(m.x(f.x(0, e))),
          Html.px(m.y(f.y(0, e))), Html.px(m.x(f.x(length, e))),
          Html.px(m.y(f.y(length, e)))));
    }
  }

  /** A scale bar of a round length, bottom left. */
  private static void scaleBar(StringBuilder b, double pxPerM, int height, OutputUnit u) {
    double unitM = u.length(1) == 1 ? 1 : 0.3048;
    double target = 150 / pxPerM / unitM; // about 150 px, in the output unit
    double step = Math.pow(10, Math.floor(Math.log10(target)));
    double len = target >= 5 * step ? 5 * step : target >= 2 * step ? 2 * step : step;
    double px = len * unitM * pxPerM;
    double y = height - 16;
    b.append(Html.f("<path d=\"M%d %s h%s\" stroke=\"#111\" stroke-width=\"3\"/>", 16,
        Html.px(y), Html.px(px)));
    b.append(Html.f("<text x=\"16\" y=\"%s\">0</text><text x=\"%s\" y=\"%s\" "
        + "text-anchor=\"end\">%s %s</text>", Html.px(y - 6), Html.px(16 + px), Html.px(y - 6),
        OutputUnit.plain(len), u.symbol()));
  }

  /** Grid north, top right. */
  private static void northArrow(StringBuilder b) {
    int x = WIDTH - 30;
    b.append(Html.f("<path d=\"M%d 14 l8 22 l-8 -6 l-8 6 z\" fill=\"#111\"/>"
        + "<text x=\"%d\" y=\"50\" text-anchor=\"middle\" class=\"lbl\">N</text>", x, x));
  }

  /** Map to pixel coordinates: x right, y down, one scale. */
  private record Map2(double x0, double y1, double scale) {
    double x(double mx) {
      return PAD + (mx - x0) * scale;
    }

    double y(double my) {
      return PAD + (y1 - my) * scale;
    }
  }
}
