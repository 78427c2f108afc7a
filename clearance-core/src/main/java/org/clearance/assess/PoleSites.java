package org.clearance.assess;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalInt;
import java.util.Set;
import org.clearance.InputException;
import org.clearance.clearance.PolePoint;
import org.clearance.clearance.PolePointFile;
import org.clearance.clearance.PolePointReader;
import org.clearance.line.PoleEquipment;
import org.clearance.line.SpanFrame;
import org.clearance.rules.Measurement;
import org.clearance.rules.PoleClearing;
import org.clearance.rules.SpanRules;
import org.clearance.rules.Zone;
import org.clearance.run.RunModel;
import org.clearance.run.SpanRecord;
import org.clearance.run.StructureRecord;

/**
 * Pole-clearing sites (issue 15): for every structure subject to a pole-clearing zone of the
 * profile (it carries listed equipment, and its span's voltage is in the zone's band), the
 * stored points around it ({@code pole-points.bin}) inside the zone's cylinder make one site:
 * clear the ground around the pole. Each structure is checked once, with the first span of the
 * run model that ends at it. Reads the stored points only, never the survey.
 */
final class PoleSites {

  /** Sites and span notes (zones not checked and why), by span id. */
  record Result(Map<String, List<CutSite>> sites, Map<String, List<String>> notChecked) {}

  /** What gathers at one structure while the points stream past. */
  private static final class Gather {
    final SpanRecord span;
    final StructureRecord structure;
    final List<Zone> zones;
    int points;
    Zone zone;
    PolePoint governing;
    double governingPlan = Double.POSITIVE_INFINITY;
    double tallest = Double.NaN;
    long unknownHeight;

    Gather(SpanRecord span, StructureRecord structure, List<Zone> zones) {
      this.span = span;
      this.structure = structure;
      this.zones = zones;
    }

    void add(PolePoint p) {
      if (Double.isNaN(p.heightAboveGround())) {
        boolean reachable = zones.stream().anyMatch(z -> p.planDistanceM()
            < ((Measurement.PoleCylinder) z.measurement()).reachM());
        if (reachable) {
          unknownHeight++;
        }
        return;
      }
      PoleClearing.check(zones, p).ifPresent(f -> {
        if (zone != null && f.zone().priority() > zone.priority()) {
          return;
        }
        if (zone == null || f.zone().priority() < zone.priority()) {
          zone = f.zone();
          points = 0;
          governing = null;
          governingPlan = Double.POSITIVE_INFINITY;
          tallest = Double.NaN;
        }
        points++;
        if (p.planDistanceM() < governingPlan) {
          governing = p;
          governingPlan = p.planDistanceM();
        }
        tallest = Double.isNaN(tallest) ? p.heightAboveGround()
            : Math.max(tallest, p.heightAboveGround());
      });
    }
  }

  private PoleSites() {}

  /**
   * @param model the run model
   * @param rules the profile resolved per span id
   * @param file the run's {@code pole-points.bin} (may be missing: every zone that applies is
   *     then not checked)
   */
  static Result check(RunModel model, Map<String, List<SpanRules>> rules, Path file)
      throws IOException {
    Map<String, Gather> byStructure = new LinkedHashMap<>();
    Map<String, List<String>> notes = new HashMap<>();
    for (SpanRecord s : model.spans()) {
      List<SpanRules> parts = rules.getOrDefault(s.id(), List.of()).stream()
          .filter(SpanRules::assessed).toList();
      if (parts.isEmpty()) {
        continue;
      }
      for (StructureRecord st : List.of(s.from(), s.to())) {
        String key = s.context().lineId() + "\u0000" + st.id();
        if (byStructure.containsKey(key)) {
          continue;
        }
        // a structure carrying several voltages is held to the pole zones of each (issue 15)
        java.util.TreeMap<Integer, Zone> byPriority = new java.util.TreeMap<>();
        for (SpanRules r : parts) {
          for (Zone z : PoleClearing.applicable(r, equipment(st))) {
            byPriority.put(z.priority(), z);
          }
        }
        List<Zone> zones = List.copyOf(byPriority.values());
        byStructure.put(key, zones.isEmpty() ? null : new Gather(s, st, zones));
      }
    }
    byStructure.values().removeIf(g -> g == null);
    Map<String, List<CutSite>> sites = new HashMap<>();
    if (byStructure.isEmpty()) {
      return new Result(sites, notes);
    }
    if (!Files.isRegularFile(file)) {
      for (Gather g : byStructure.values()) {
        note(notes, g, "pole-clearing zone " + g.zones.get(0).name() + " not checked at "
            + "structure " + g.structure.id() + ": the run folder has no "
            + PolePointFile.FILE_NAME + " (made by an older version): run the check again");
      }
      return new Result(sites, notes);
    }
    PolePointFile layout = PolePointReader.forEach(file, p -> {
      Gather g = byStructure.get(p.lineId() + "\u0000" + p.structureId());
      if (g != null) {
        g.add(p);
      }
    });
    Map<String, PolePointFile.Pole> stored = new HashMap<>();
    for (PolePointFile.Pole p : layout.structures()) {
      stored.put(p.key(), p);
    }
    for (Map.Entry<String, Gather> e : byStructure.entrySet()) {
      Gather g = e.getValue();
      if (!stored.containsKey(e.getKey())) {
        throw new InputException(file, "header", "structures", "structure "
            + g.structure.id() + " of the run model is not in the file: the files belong to "
            + "different runs");
      }
      for (Zone z : g.zones) {
        Measurement.PoleCylinder c = (Measurement.PoleCylinder) z.measurement();
        if (c.reachM() > layout.keepRadiusM() || c.toHeightM() > layout.keepHeightM()) {
          note(notes, g, String.format(Locale.ROOT, "pole-clearing zone %s not checked in "
              + "full at structure %s: it reaches %.2f m from the centre and %.2f m above "
              + "ground, the check stored points within %.2f m and up to %.2f m: run the check "
              + "again with this profile", z.name(), g.structure.id(), c.reachM(),
              c.toHeightM(), layout.keepRadiusM(), layout.keepHeightM()));
        }
      }
      if (g.unknownHeight > 0) {
        note(notes, g, g.unknownHeight + " point" + (g.unknownHeight == 1 ? "" : "s")
            + " near structure " + g.structure.id() + " not checked for pole clearing: no "
            + "ground model there (height above ground unknown)");
      }
      if (g.zone != null) {
        sites.computeIfAbsent(g.span.id(), k -> new ArrayList<>()).add(site(g));
      }
    }
    return new Result(sites, notes);
  }

  private static void note(Map<String, List<String>> notes, Gather g, String text) {
    notes.computeIfAbsent(g.span.id(), k -> new ArrayList<>()).add(text);
  }

  /** The equipment a structure record lists. */
  static Set<PoleEquipment> equipment(StructureRecord s) {
    Set<PoleEquipment> out = EnumSet.noneOf(PoleEquipment.class);
    for (String w : s.equipment().split("[;\\s]+")) {
      PoleEquipment e = w.isBlank() ? null : PoleEquipment.ofFileName(w);
      if (e != null) {
        out.add(e);
      }
    }
    return out;
  }

  /**
   * The site: the governing point is the one nearest the structure centre; minimum clearance
   * its plan distance from the centre, required the zone's reach; cut to the band's lower edge
   * (0 = clear to the ground); area the cleared ring around the pole.
   */
  private static CutSite site(Gather g) {
    Measurement.PoleCylinder c = (Measurement.PoleCylinder) g.zone.measurement();
    PolePoint p = g.governing;
    SpanFrame frame = RunAssessor.frameOf(g.span);
    double chainage = Double.NaN;
    double offset = Double.NaN;
    CutSite.Side side = CutSite.Side.CENTRE;
    if (frame != null) {
      chainage = frame.station(p.x(), p.y());
      double e = frame.offset(p.x(), p.y());
      offset = Math.abs(e);
      side = SiteBuilder.sideOf(e);
    }
    double area = Math.PI * (c.reachM() * c.reachM() - c.poleRadiusM() * c.poleRadiusM());
    return new CutSite("", g.span.id(), CutSite.Kind.POLE_CLEARING, g.zone.priority(),
        g.zone.name(), false, "survey", g.governingPlan, c.reachM(),
        c.reachM() - g.governingPlan, p.x(), p.y(), p.z(), Double.NaN, Double.NaN, chainage,
        side, offset, g.tallest, c.fromHeightM(), OptionalInt.of(g.points), area, 0,
        "", c.fromHeightM());
  }
}
