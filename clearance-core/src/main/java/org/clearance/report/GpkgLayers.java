package org.clearance.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.clearance.assess.CutSite;
import org.clearance.assess.FindingInterval;
import org.clearance.assess.RunAssessment;
import org.clearance.assess.RunAssessor;
import org.clearance.assess.SpanResult;
import org.clearance.clearance.ConditionMinimum;
import org.clearance.line.SpanFrame;
import org.clearance.report.GeoPackageWriter.Column;
import org.clearance.report.GeoPackageWriter.Feature;
import org.clearance.report.GeoPackageWriter.Layer;
import org.clearance.run.ConductorRecord;
import org.clearance.run.CurveRecord;
import org.clearance.run.LineFacts;
import org.clearance.run.SpanRecord;
import org.clearance.run.StructureRecord;
import org.clearance.survey.LinearUnit;

/**
 * The feature layers of {@code sites.gpkg}: geometry in the survey CRS's own units, attributes
 * named and converted as in the CSV files (lengths in the output unit, the unit in each column
 * name; NULL for a value not computed).
 */
final class GpkgLayers {

  private GpkgLayers() {}

  static List<Layer> of(RunAssessment run, ReportOptions options, int srs) {
    List<Layer> out = new ArrayList<>(List.of(sites(run, options, srs), spans(run, options, srs),
        conductors(run, srs), structures(run, srs)));
    Layer row = rightOfWay(run, options, srs);
    if (!row.features().isEmpty()) {
      out.add(row);
    }
    return out;
  }

  /** The structures at the ends of the spans, once each: id, type, line and equipment. */
  private static Layer structures(RunAssessment run, int srs) {
    LinearUnit h = run.model().units().horizontal();
    LinearUnit v = run.model().units().vertical();
    List<Column> cols = List.of(col("structure_id", "TEXT"), col("type", "TEXT"),
        col("line_id", "TEXT"), col("ground_z", "REAL"), col("equipment", "TEXT"));
    Map<String, Feature> byId = new LinkedHashMap<>();
    Extent e = new Extent();
    for (SpanRecord span : run.model().spans()) { // line order, not ranking order
      for (StructureRecord s : List.of(span.from(), span.to())) {
        double x = h.fromMetres(s.x());
        double y = h.fromMetres(s.y());
        // ids are unique within a line: a tower carrying two lines is a structure of each
        String key = span.context().lineId() + "/" + s.id();
        if (byId.containsKey(key) || !(Double.isFinite(x) && Double.isFinite(y))) {
          continue;
        }
        e.add(x, y);
        byId.put(key, new Feature(GpkgGeometry.point(srs, x, y), values(s.id(), s.type(),
            span.context().lineId(), v.fromMetres(s.groundZ()), s.equipment())));
      }
    }
    return new Layer("structures", "Structures at the ends of the spans", "POINT", false, cols,
        new ArrayList<>(byId.values()), e.box());
  }

  /**
   * The right-of-way of each span whose line specification gives {@code row_half_width_m}: the
   * rectangle from structure to structure, that far either side of the centre line.
   */
  private static Layer rightOfWay(RunAssessment run, ReportOptions options, int srs) {
    OutputUnit u = new OutputUnit(options.outputUnit());
    LinearUnit h = run.model().units().horizontal();
    List<Column> cols = List.of(col("span_id", "TEXT"), col("line_id", "TEXT"),
        col(u.column("half_width"), "REAL"));
    List<Feature> features = new ArrayList<>();
    Extent e = new Extent();
    for (SpanResult r : run.spans()) {
      double half = run.model().facts().line(r.span().context().lineId())
          .map(LineFacts::rowHalfWidthM).orElse(Double.NaN);
      SpanFrame f = RunAssessor.frameOf(r.span());
      if (Double.isNaN(half) || f == null) {
        continue;
      }
      double len = f.length();
      double[][] corners = {{0, half}, {len, half}, {len, -half}, {0, -half}};
      double[] xy = new double[8];
      for (int i = 0; i < 4; i++) {
        xy[2 * i] = h.fromMetres(f.x(corners[i][0], corners[i][1]));
        xy[2 * i + 1] = h.fromMetres(f.y(corners[i][0], corners[i][1]));
        e.add(xy[2 * i], xy[2 * i + 1]);
      }
      features.add(new Feature(GpkgGeometry.polygon(srs, xy), values(r.id(),
          r.span().context().lineId(), u.length(half))));
    }
    return new Layer("row", "Right-of-way of each span, from the line specification's width",
        "POLYGON", false, cols, features, e.box());
  }

  private static Layer sites(RunAssessment run, ReportOptions options, int srs) {
    OutputUnit u = new OutputUnit(options.outputUnit());
    LinearUnit h = run.model().units().horizontal();
    LinearUnit v = run.model().units().vertical();
    List<Column> cols = List.of(col("site_id", "TEXT"), col("span_id", "TEXT"),
        col("kind", "TEXT"), col("priority", "INTEGER"), col("zone", "TEXT"),
        col("condition", "TEXT"), col(u.column("min_clearance"), "REAL"),
        col(u.column("required"), "REAL"), col(u.column("deficit"), "REAL"),
        col("z_" + v.symbol(), "REAL"), col("lon_deg", "REAL"), col("lat_deg", "REAL"),
        col(u.column("chainage"), "REAL"), col("side", "TEXT"), col(u.column("offset"), "REAL"),
        col(u.column("veg_height"), "REAL"), col(u.column("cut_to_height"), "REAL"),
        col("n_points", "INTEGER"), col(u.areaColumn(), "REAL"),
        col("years_to_violation", "REAL"), col("conductor", "TEXT"),
        col(u.column("cut_to_height_now"), "REAL"), col("verdict", "TEXT"),
        col(u.column("clearance_sigma"), "REAL"), col(u.column("clearance_low"), "REAL"),
        col(u.column("clearance_high"), "REAL"), col("uncertainty_dominant", "TEXT"));
    List<Feature> features = new ArrayList<>();
    Extent e = new Extent();
    for (CutSite s : run.sites()) {
      double x = h.fromMetres(s.x());
      double y = h.fromMetres(s.y());
      boolean located = Double.isFinite(x) && Double.isFinite(y);
      if (located) {
        e.add(x, y);
      }
      byte[] geometry = located ? GpkgGeometry.point(srs, x, y) : null;
      features.add(new Feature(geometry, values(s.siteId(), s.spanId(),
          CsvOutputs.kind(s),
          (long) s.priority(), s.zone(), s.condition(), u.length(s.minClearanceM()),
          u.length(s.requiredM()), u.length(s.deficitM()), v.fromMetres(s.z()), s.lon(),
          s.lat(), u.length(s.chainageM()), s.side().word(), u.length(s.offsetM()),
          u.length(s.vegHeightM()), u.length(s.cutToHeightM()),
          s.points().isPresent() ? (Object) (long) s.points().getAsInt() : null,
          u.area(s.areaM2()), s.yearsToViolation(), s.conductor(),
          u.length(s.cutToNowM()),
          s.interval().map(i -> i.verdict().words()).orElse(null),
          u.length(s.interval().map(FindingInterval::sigmaM).orElse(Double.NaN)),
          u.length(s.interval().map(FindingInterval::lowM).orElse(Double.NaN)),
          u.length(s.interval().map(FindingInterval::highM).orElse(Double.NaN)),
          s.interval().map(FindingInterval::dominant).orElse(null))));
    }
    return new Layer("sites", "Vegetation sites inside a clearance zone, and fall-in trees",
        "POINT", false, cols, features, e.box());
  }

  /** A span minimum in the output unit, or null where it lies beyond the keep radius and is
   * only a bound (the column {@code min_clearance_beyond} then gives the bound). */
  private static Object within(OutputUnit u, double metres, double keepRadiusM) {
    return metres > keepRadiusM ? null : u.length(metres);
  }

  /** Whether any of the span's minima lies beyond the keep radius. */
  private static boolean beyond(SpanResult r, double keepRadiusM) {
    for (String g : List.of("survey", "hot", "blowout", "ice")) {
      if (r.minimumOfGroup(g) > keepRadiusM) {
        return true;
      }
    }
    return false;
  }

  private static Layer spans(RunAssessment run, ReportOptions options, int srs) {
    OutputUnit u = new OutputUnit(options.outputUnit());
    LinearUnit h = run.model().units().horizontal();
    boolean ruled = run.profile().isPresent();
    List<Column> cols = List.of(col("span_id", "TEXT"), col("line_id", "TEXT"),
        col("from_structure", "TEXT"), col("to_structure", "TEXT"),
        col(u.column("length"), "REAL"), col("status", "TEXT"), col("reason", "TEXT"),
        col("n_conductors_fitted", "INTEGER"), col(u.column("min_clearance_survey"), "REAL"),
        col(u.column("min_clearance_hot"), "REAL"), col(u.column("min_clearance_blowout"), "REAL"),
        col(u.column("min_clearance_ice"), "REAL"), col("governing_condition", "TEXT"),
        col("worst_zone", "TEXT"), col("n_sites", "INTEGER"), col("rank", "INTEGER"),
        col(u.column("min_clearance_beyond"), "REAL"));
    double keep = run.model().keepRadiusM();
    List<Feature> features = new ArrayList<>();
    Extent e = new Extent();
    for (SpanResult r : run.spans()) {
      SpanRecord s = r.span();
      double[] xy = {h.fromMetres(s.from().x()), h.fromMetres(s.from().y()),
          h.fromMetres(s.to().x()), h.fromMetres(s.to().y())};
      if (!(Double.isFinite(xy[0]) && Double.isFinite(xy[1]) && Double.isFinite(xy[2])
          && Double.isFinite(xy[3]))) {
        continue;
      }
      e.add(xy[0], xy[1]);
      e.add(xy[2], xy[3]);
      features.add(new Feature(GpkgGeometry.lineString(srs, xy, false), values(s.id(),
          s.context().lineId(), s.from().id(), s.to().id(), u.length(s.context().lengthM()),
          r.status().word(), r.reason(), (long) r.conductorsFitted(),
          within(u, r.minimumOfGroup("survey"), keep), within(u, r.minimumOfGroup("hot"), keep),
          within(u, r.minimumOfGroup("blowout"), keep), within(u, r.minimumOfGroup("ice"), keep),
          r.governingMinimum().map(ConditionMinimum::condition).orElse(null),
          ruled ? r.worst().map(CutSite::zone).orElse(null) : null,
          r.sitesCounted() ? (Object) (long) r.sites().size() : null,
          r.rank().isPresent() ? (Object) (long) r.rank().getAsInt() : null,
          beyond(r, keep) ? (Object) u.length(keep) : null)));
    }
    return new Layer("spans", "Spans from structure to structure, with their status and rank",
        "LINESTRING", false, cols, features, e.box());
  }

  private static Layer conductors(RunAssessment run, int srs) {
    LinearUnit h = run.model().units().horizontal();
    LinearUnit v = run.model().units().vertical();
    List<Column> cols = List.of(col("span_id", "TEXT"), col("conductor", "TEXT"),
        col("role", "TEXT"), col("state", "TEXT"), col("condition", "TEXT"),
        col("condition_group", "TEXT"), col("swing_deg", "REAL"));
    List<Feature> features = new ArrayList<>();
    Extent e = new Extent();
    for (SpanResult r : run.spans()) {
      Optional<ConditionMinimum> gov = r.governingMinimum();
      int govIndex = gov.map(m -> run.model().conditions().indexOf(m.condition())).orElse(-1);
      for (ConductorRecord k : r.span().conductors()) {
        for (int i : govIndex > 0 ? new int[] {0, govIndex} : new int[] {0}) {
          if (i >= k.states().size() || k.states().get(i).isEmpty()) {
            continue;
          }
          CurveRecord c = k.states().get(i).get();
          double swing = i == 0 ? 0 : ConductorSampler.drawnSwing(c);
          double[] m = ConductorSampler.sample(c, swing);
          for (int j = 0; j < m.length; j += 3) {
            m[j] = h.fromMetres(m[j]);
            m[j + 1] = h.fromMetres(m[j + 1]);
            m[j + 2] = v.fromMetres(m[j + 2]);
            e.add(m[j], m[j + 1]);
          }
          features.add(new Feature(GpkgGeometry.lineString(srs, m, true), values(r.id(),
              k.name(), k.role(), i == 0 ? "surveyed" : "governing",
              run.model().conditions().names().get(i), run.model().conditions().groups().get(i),
              Math.toDegrees(swing))));
        }
      }
    }
    return new Layer("conductors", "Conductors as surveyed and in each span's governing "
        + "condition (swung states at the end of their swing range)", "LINESTRING", true, cols,
        features, e.box());
  }

  private static Column col(String name, String type) {
    return new Column(name, type);
  }

  private static List<Object> values(Object... v) {
    List<Object> out = new ArrayList<>(v.length);
    for (Object o : v) {
      out.add(o instanceof Double d && Double.isNaN(d) ? null : o);
    }
    return out;
  }

  /** Plan extent of a layer; NaN when empty. */
  private static final class Extent {
    private double minX = Double.POSITIVE_INFINITY;
    private double minY = Double.POSITIVE_INFINITY;
    private double maxX = Double.NEGATIVE_INFINITY;
    private double maxY = Double.NEGATIVE_INFINITY;

    void add(double x, double y) {
      minX = Math.min(minX, x);
      minY = Math.min(minY, y);
      maxX = Math.max(maxX, x);
      maxY = Math.max(maxY, y);
    }

    double[] box() {
      if (minX > maxX) {
        return new double[] {Double.NaN, Double.NaN, Double.NaN, Double.NaN};
      }
      return new double[] {minX, minY, maxX, maxY};
    }
  }
}
