package org.clearance.assess;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import org.clearance.line.SpanFrame;
import org.clearance.run.LineFacts;
import org.clearance.run.SpanRecord;
import org.clearance.run.TreeRecord;
import org.clearance.survey.LonLat;

/**
 * The work list of an assessed run: one item per tree or vegetation patch, gathering every cut
 * site of it. A grow-in site belongs to a tree found near the line when its governing point lies
 * within the tree's crown radius plus the site link distance of the tree top (plan distance); a
 * fall-in site belongs to the tree it was checked for; grow-in sites that belong to no tree stay
 * patches of their own. So a tree that is both inside a zone and able to fall into the line,
 * or inside the zone of two conductors, is one item with every reason.
 *
 * <p>Work: a fall-in tree is removed; vegetation that a cut in height clears is cleared to a
 * height; vegetation beside the zone (no height clears it, e.g. beside a conductor blown out by
 * the wind) is side-trimmed by the deficit. Station along the line is the sum of the plan lengths
 * of the line's earlier spans (in the run model's order) plus the chainage in the span.
 */
public final class WorkList {

  private WorkList() {}

  /**
   * The work list, spans in ranking order and items most urgent first within a span.
   *
   * @param run the assessed run
   * @param linkDistanceM the link distance of a site, m (the crown-radius slack)
   */
  public static List<WorkItem> of(RunAssessment run, double linkDistanceM) {
    Map<String, Double> lineStart = lineStations(run.model().spans());
    Map<String, List<TreeRecord>> trees = new HashMap<>();
    for (TreeRecord t : run.model().trees()) {
      trees.computeIfAbsent(t.spanId(), k -> new ArrayList<>()).add(t);
    }
    Optional<LonLat> geo = LonLat.forUnits(run.model().units()).transform();
    List<WorkItem> out = new ArrayList<>();
    for (SpanResult r : run.spans()) {
      if (r.sites().isEmpty()) {
        continue;
      }
      SpanRecord span = r.span();
      Optional<LineFacts> line = run.model().facts().line(span.context().lineId());
      List<List<CutSite>> groups = new ArrayList<>();
      List<TreeRecord> owners = new ArrayList<>();
      Map<TreeRecord, Integer> byTree = new LinkedHashMap<>();
      List<TreeRecord> spanTrees = trees.getOrDefault(span.id(), List.of());
      for (CutSite s : r.sites()) {
        TreeRecord t = owner(s, spanTrees, linkDistanceM);
        if (t == null) {
          groups.add(new ArrayList<>(List.of(s)));
          owners.add(null);
          continue;
        }
        Integer k = byTree.get(t);
        if (k == null) {
          byTree.put(t, groups.size());
          groups.add(new ArrayList<>(List.of(s)));
          owners.add(t);
        } else {
          groups.get(k).add(s);
        }
      }
      List<WorkItem> items = new ArrayList<>();
      for (int i = 0; i < groups.size(); i++) {
        items.add(item(span, groups.get(i), owners.get(i), line,
            lineStart.getOrDefault(span.id(), Double.NaN), geo));
      }
      items.sort(ORDER);
      for (int i = 0; i < items.size(); i++) {
        out.add(withId(items.get(i), span.id() + ".W" + (i + 1)));
      }
    }
    return out;
  }

  /** Items within a span: priority, then the largest deficit or fall-in margin, then chainage. */
  private static final Comparator<WorkItem> ORDER = Comparator.comparingInt(WorkItem::priority)
      .thenComparingDouble(w -> -margin(w))
      .thenComparingDouble(WorkItem::chainageM);

  private static double margin(WorkItem w) {
    double a = Double.isNaN(w.deficitM()) ? Double.NEGATIVE_INFINITY : w.deficitM();
    double b = Double.isNaN(w.fallInReachM()) ? Double.NEGATIVE_INFINITY
        : w.fallInReachM() - w.fallInDistanceM();
    return Math.max(a, b);
  }

  /** The tree a site belongs to, or null. */
  private static TreeRecord owner(CutSite s, List<TreeRecord> trees, double linkDistanceM) {
    TreeRecord best = null;
    double bestD = Double.POSITIVE_INFINITY;
    for (TreeRecord t : trees) {
      double d = Math.hypot(s.x() - t.x(), s.y() - t.y());
      if (s.kind() == CutSite.Kind.POLE_CLEARING) {
        return null; // clearing around a pole is work of its own, never a tree's
      }
      boolean same = s.kind() == CutSite.Kind.FALL_IN ? d == 0 && s.z() == t.topZ()
          : d <= crown(t) + linkDistanceM;
      if (same && d < bestD) {
        best = t;
        bestD = d;
      }
    }
    return best;
  }

  private static double crown(TreeRecord t) {
    return Double.isFinite(t.crownRadiusM()) ? t.crownRadiusM() : 0;
  }

  private static WorkItem item(SpanRecord span, List<CutSite> sites, TreeRecord tree,
      Optional<LineFacts> line, double spanStation, Optional<LonLat> geo) {
    sites.sort(RunAssessor.SITE_ORDER);
    CutSite first = sites.get(0);
    CutSite grow = sites.stream().filter(s -> s.kind() == CutSite.Kind.GROW_IN).findFirst()
        .orElse(null);
    CutSite fall = sites.stream().filter(s -> s.kind() == CutSite.Kind.FALL_IN).findFirst()
        .orElse(null);
    if (grow == null && fall == null && first.kind() == CutSite.Kind.POLE_CLEARING) {
      grow = first; // its distances fill the clearance columns
    }
    List<String> reasons = new ArrayList<>();
    List<String> ids = new ArrayList<>();
    double cutNow = Double.NaN;
    double cutCycle = Double.NaN;
    double years = Double.NaN;
    double vegHeight = Double.NaN;
    int points = 0;
    double besideDeficit = Double.NaN;
    for (CutSite s : sites) {
      ids.add(s.siteId());
      String reason = s.kind() == CutSite.Kind.FALL_IN ? "fall-in (" + s.condition() + ")"
          : s.kind() == CutSite.Kind.POLE_CLEARING ? "zone " + s.zone() + " (around the pole)"
          : "zone " + s.zone() + " (" + s.condition() + voltage(line, s.conductor()) + ")";
      if (!reasons.contains(reason)) {
        reasons.add(reason);
      }
      cutNow = minKnown(cutNow, s.cutToNowM());
      cutCycle = minKnown(cutCycle, s.cutToHeightM());
      vegHeight = maxKnown(vegHeight, s.vegHeightM());
      if (s.kind() != CutSite.Kind.FALL_IN) {
        years = minKnown(years, s.yearsToViolation());
        points += s.points().orElse(0);
        if (Double.isNaN(s.cutToHeightM())) {
          besideDeficit = maxKnown(besideDeficit, s.deficitM());
        }
      }
    }
    if (grow != null && !Double.isNaN(grow.yearsToViolation())
        && grow.yearsToViolation() > 0 && Double.isFinite(grow.yearsToViolation())) {
      reasons.add(String.format(java.util.Locale.ROOT, "grow-in in %.1f years",
          grow.yearsToViolation()));
    }
    WorkItem.Work work;
    if (first.kind() == CutSite.Kind.POLE_CLEARING) {
      work = WorkItem.Work.CLEAR_AROUND_POLE;
    } else if (fall != null) {
      work = WorkItem.Work.REMOVE_TREE;
    } else if (Double.isNaN(cutCycle) && !Double.isNaN(besideDeficit)) {
      work = WorkItem.Work.SIDE_TRIM;
    } else if (!Double.isNaN(cutCycle) && !Double.isNaN(vegHeight) && cutCycle >= vegHeight) {
      work = WorkItem.Work.NO_CUT_NOW;
    } else {
      work = WorkItem.Work.CLEAR_TO_HEIGHT;
    }
    double x = tree != null ? tree.x() : first.x();
    double y = tree != null ? tree.y() : first.y();
    double z = tree != null ? tree.topZ() : first.z();
    if (tree != null) {
      vegHeight = maxKnown(vegHeight, tree.heightM());
    }
    SpanFrame frame = RunAssessor.frameOf(span);
    double chainage = frame == null ? Double.NaN : frame.station(x, y);
    double signed = frame == null ? Double.NaN : frame.offset(x, y);
    double offset = Math.abs(signed);
    double half = line.map(LineFacts::rowHalfWidthM).orElse(Double.NaN);
    WorkItem.RightOfWay row = Double.isNaN(half) || Double.isNaN(offset)
        ? WorkItem.RightOfWay.NOT_KNOWN
        : offset <= half ? WorkItem.RightOfWay.ON : WorkItem.RightOfWay.OFF;
    String nearest = Double.isNaN(chainage) ? ""
        : chainage <= span.context().lengthM() / 2 ? span.from().id() : span.to().id();
    String conductor = grow != null ? grow.conductor() : first.conductor();
    int circuit = line.map(l -> l.circuitOf(conductor)).orElse(0);
    double lon = Double.NaN;
    double lat = Double.NaN;
    if (geo.isPresent()) {
      double[] ll = geo.get().of(x, y);
      lon = ll[0];
      lat = ll[1];
    }
    double area = tree != null && tree.crownRadiusM() > 0
        ? Math.PI * tree.crownRadiusM() * tree.crownRadiusM()
        : grow != null ? grow.areaM2() : first.areaM2();
    return new WorkItem("", span.id(), tree == null ? "" : tree.id(), first.priority(),
        first.zone(), String.join("; ", reasons), work, first.condition(), conductor, circuit,
        grow == null ? Double.NaN : grow.minClearanceM(),
        grow == null ? Double.NaN : grow.requiredM(), grow == null ? Double.NaN : grow.deficitM(),
        besideDeficit,
        cutNow, cutCycle,
        fall == null ? Double.NaN : fall.minClearanceM(),
        fall == null ? Double.NaN : fall.requiredM(), vegHeight, x, y, z, lon, lat,
        spanStation + chainage, chainage, nearest, SiteBuilder.sideOf(signed), offset, row,
        grow == null ? OptionalInt.empty() : OptionalInt.of(points), area, years, ids);
  }

  /**
   * On a line whose circuits carry different voltages (issue 15), {@code "; 12.47 kV"}: the
   * voltage of the conductor's circuit, whose zones the site was checked against; else empty.
   */
  private static String voltage(Optional<LineFacts> line, String conductor) {
    if (line.isEmpty() || line.get().circuitVoltagesKv().isEmpty() || conductor.isEmpty()) {
      return "";
    }
    int circuit = line.get().circuitOf(conductor);
    return circuit == 0 ? "" : "; " + org.clearance.rules.VoltageBand.kv(
        line.get().circuitVoltageKv(circuit));
  }

  private static double minKnown(double a, double b) {
    return Double.isNaN(a) ? b : Double.isNaN(b) ? a : Math.min(a, b);
  }

  private static double maxKnown(double a, double b) {
    return Double.isNaN(a) ? b : Double.isNaN(b) ? a : Math.max(a, b);
  }

  /** Plan distance from each line's first structure to each span's first structure, m. */
  static Map<String, Double> lineStations(List<SpanRecord> spans) {
    Map<String, Double> lineLength = new HashMap<>();
    Map<String, Double> out = new HashMap<>();
    for (SpanRecord s : spans) {
      double at = lineLength.getOrDefault(s.context().lineId(), 0.0);
      out.put(s.id(), at);
      lineLength.put(s.context().lineId(), at + s.context().lengthM());
    }
    return out;
  }

  private static WorkItem withId(WorkItem w, String id) {
    return new WorkItem(id, w.spanId(), w.treeId(), w.priority(), w.zone(), w.reasons(),
        w.work(), w.condition(), w.conductor(), w.circuit(), w.clearanceM(), w.requiredM(),
        w.deficitM(), w.sideTrimM(), w.cutToNowM(), w.cutToCycleM(), w.fallInDistanceM(),
        w.fallInReachM(), w.vegHeightM(), w.x(), w.y(), w.z(), w.lon(), w.lat(), w.stationM(),
        w.chainageM(), w.nearestStructure(), w.side(), w.offsetM(), w.rightOfWay(), w.points(),
        w.areaM2(), w.yearsToViolation(), w.siteIds());
  }
}
