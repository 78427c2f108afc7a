package org.clearance.examples;

import java.io.Writer;
import java.util.List;
import org.clearance.line.ConductorType;
import org.clearance.wire.ConductorCurve;

/**
 * Writes truth.json: everything the generator used, documented field by field in
 * docs/demo-corridor.md. Lengths in metres, forces in newtons, temperatures in degC.
 */
final class TruthFile {
  /** Format name and version written at the top of the file. */
  static final String FORMAT = "clearance-demo-truth";
  static final int VERSION = 1;

  private TruthFile() {}

  static void write(Writer writer, DemoScene scene, PointTally tally) {
    JsonOut j = new JsonOut(writer);
    DemoOptions o = scene.options();
    j.beginObject(false).member("format", FORMAT).member("version", VERSION);
    j.member("utility", DemoScene.UTILITY).member("line_id", DemoScene.LINE_ID)
        .member("line_name", DemoScene.LINE_NAME)
        .member("nominal_voltage_kv", DemoScene.NOMINAL_VOLTAGE_KV).member("seed", o.seed());
    j.name("options").beginObject(false).member("seed", o.seed())
        .member("span_count", o.spanCount()).member("point_density_per_m2", o.pointDensity())
        .member("classification_mode", o.mode().name())
        .member("corridor_half_width_m", o.corridorHalfWidth());
    j.name("structure_edit").beginObject(true).member("kind", o.structureEdit().kind().name())
        .member("structure_index", o.structureEdit().structureIndex())
        .member("offset_m", o.structureEdit().offsetM()).endObject().endObject();
    j.name("crs").beginObject(true).member("epsg", DemoScene.EPSG)
        .member("name", scene.units().crsName()).member("horizontal_unit", "m")
        .member("vertical_unit", "m").endObject();
    j.member("survey_conductor_temperature_c", scene.surveyTemperatureC())
        .member("right_of_way_half_width_m", Corridor.ROW_HALF_WIDTH_M)
        .member("ravine_span", scene.ravineSpan());
    positions(j, scene.positions());
    structures(j, scene);
    sections(j, scene.sections());
    spans(j, scene);
    trees(j, scene.trees());
    buildings(j, scene.buildings());
    DemoRoad r = scene.road();
    j.name("road").beginObject(true).member("x", r.x()).member("y", r.y())
        .member("direction", r.ux(), r.uy()).member("width_m", r.widthM())
        .member("span", r.span()).endObject();
    j.name("birds").beginArray(false);
    for (DemoBird b : scene.birds()) {
      j.beginObject(true).member("id", b.id()).member("span", b.span())
          .member("position", b.position().isEmpty() ? null : b.position())
          .member("perched", b.perched()).member("x", b.x()).member("y", b.y())
          .member("z", b.z()).member("point_count", b.pointCount()).endObject();
    }
    j.endArray();
    j.name("flight_strips").beginArray(false);
    for (FlightStrip s : scene.strips()) {
      j.beginObject(true).member("point_source_id", s.pointSourceId())
          .member("centre_offset_m", s.centreOffsetM()).member("half_swath_m", s.halfSwathM())
          .member("start_chainage_m", s.startChainage())
          .member("end_chainage_m", s.endChainage()).member("forward", s.forward())
          .member("start_gps_time_s", s.startTime()).member("speed_m_s", s.speed())
          .member("altitude_m", s.altitudeM()).endObject();
    }
    j.endArray();
    boolean strays = o.mode().hasStrayLabels();
    j.name("stray_labels").beginObject(true).member("class", 14)
        .member("building", strays && scene.strayBuilding() >= 0 ? scene.strayBuilding() : -1)
        .member("building_radius_m", SurfacePoints.STRAY_ROOF_RADIUS_M)
        .member("tree", strays && scene.strayTree() >= 0 ? scene.strayTree() : -1)
        .member("tree_depth_m", SurfacePoints.STRAY_CROWN_DEPTH_M).endObject();
    counts(j, tally);
    j.endObject();
  }

  private static void positions(JsonOut j, List<DemoPosition> positions) {
    j.name("positions").beginArray(false);
    for (DemoPosition p : positions) {
      ConductorType t = p.type();
      j.beginObject(true).member("position", p.name())
          .member("role", p.role().name().toLowerCase(java.util.Locale.ROOT))
          .member("conductor", t.code()).member("offset_m", p.offsetM())
          .member("attach_height_m", p.attachHeightM())
          .member("insulator_length_m", p.insulatorLengthM()).member("diameter_m", t.diameter())
          .member("area_m2", t.area()).member("mass_kg_per_m", t.massPerLength())
          .member("rated_strength_n", t.ratedStrength())
          .member("final_modulus_pa", t.finalModulus())
          .member("thermal_expansion_per_c", t.thermalExpansion()).endObject();
    }
    j.endArray();
  }

  private static void structures(JsonOut j, DemoScene scene) {
    j.name("structures").beginArray(false);
    for (DemoStructure t : scene.structures()) {
      DemoStructure w = scene.writtenStructures().stream().filter(s -> s.id().equals(t.id()))
          .findFirst().orElse(null);
      j.beginObject(true).member("id", t.id()).member("sequence", t.sequence())
          .member("x", t.x()).member("y", t.y()).member("ground_z", t.groundZ())
          .member("type", t.type().csvName())
          .member("deflection_deg", Math.toDegrees(t.deflectionRad()))
          .member("arm_height_m", t.armHeightM()).member("extension_m", t.extensionM())
          .member("in_csv", w != null).member("csv_x", w == null ? Double.NaN : w.x())
          .member("csv_y", w == null ? Double.NaN : w.y()).endObject();
    }
    j.endArray();
  }

  private static void sections(JsonOut j, List<TensionSection> sections) {
    j.name("sections").beginArray(false);
    for (TensionSection s : sections) {
      j.beginObject(true).member("index", s.index())
          .member("first_structure", s.firstStructure())
          .member("last_structure", s.lastStructure()).member("ruling_span_m", s.rulingSpanM())
          .member("reference_temperature_c", s.referenceTemperatureC())
          .member("phase_tension_reference_n", s.phaseTensionReferenceN())
          .member("shield_tension_reference_n", s.shieldTensionReferenceN())
          .member("phase_tension_n", s.phaseTensionN())
          .member("shield_tension_n", s.shieldTensionN()).endObject();
    }
    j.endArray();
  }

  private static void spans(JsonOut j, DemoScene scene) {
    j.name("spans").beginArray(false);
    for (DemoSpan sp : scene.spans()) {
      j.beginObject(false).member("index", sp.index()).member("id", sp.id())
          .member("from", sp.from()).member("to", sp.to()).member("section", sp.section())
          .member("length_m", sp.lengthM()).member("ravine", sp.index() == scene.ravineSpan());
      j.name("wires").beginArray(false);
      for (DemoWire w : sp.wires()) {
        ConductorCurve c = w.curve();
        double len = c.length();
        j.beginObject(true).member("position", w.position())
            .member("role", w.role().name().toLowerCase(java.util.Locale.ROOT))
            .member("conductor", w.conductorCode())
            .member("attach_a", c.x(0), c.y(0), c.zA())
            .member("attach_b", c.x(len), c.y(len), c.zB())
            .member("horizontal_length_m", len)
            .member("catenary_constant_m", w.catenaryConstantM())
            .member("horizontal_tension_n", w.horizontalTensionN())
            .member("weight_n_per_m", w.weightPerLengthNPerM())
            .member("vertex_station_m", c.curve().s0()).member("vertex_z", c.curve().z0())
            .member("mid_span_sag_m", w.midSpanSagM()).member("uplift", w.uplift())
            .member("points_per_m", w.pointsPerMetre())
            .member("noise_sigma_m", w.noiseSigmaM()).member("coverage", w.coverage());
        j.name("gaps").beginArray(true);
        for (WireGap g : w.gaps()) {
          j.beginArray(true).value(g.startStation()).value(g.endStation()).endArray();
        }
        j.endArray().endObject();
      }
      j.endArray().endObject();
    }
    j.endArray();
  }

  private static void trees(JsonOut j, List<DemoTree> trees) {
    j.name("trees").beginArray(false);
    for (DemoTree t : trees) {
      j.beginObject(true).member("id", t.id()).member("x", t.x()).member("y", t.y())
          .member("base_z", t.baseZ()).member("height_m", t.heightM())
          .member("top_z", t.topZ()).member("shape", t.shape().name())
          .member("crown_radius_m", t.crownRadiusM())
          .member("crown_base_height_m", t.crownBaseHeightM()).member("role", t.role().name())
          .member("span", t.span()).member("nearest_span", t.nearestSpan())
          .member("nearest_position", t.nearestPosition())
          .member("apex_distance_m", t.apexDistanceM())
          .member("base_distance_m", t.baseDistanceM())
          .member("fall_in_candidate", t.fallInCandidate()).endObject();
    }
    j.endArray();
  }

  private static void buildings(JsonOut j, List<DemoBuilding> buildings) {
    j.name("buildings").beginArray(false);
    for (DemoBuilding b : buildings) {
      j.beginObject(true).member("id", b.id()).member("x", b.x()).member("y", b.y())
          .member("length_m", b.lengthM()).member("width_m", b.widthM())
          .member("azimuth_deg", Math.toDegrees(b.azimuthRad())).member("base_z", b.baseZ())
          .member("eave_height_m", b.eaveHeightM()).member("ridge_height_m", b.ridgeHeightM())
          .member("roof", b.roof().name()).member("span", b.span()).endObject();
    }
    j.endArray();
  }

  private static void counts(JsonOut j, PointTally tally) {
    j.name("point_counts").beginObject(false).member("total", tally.total());
    j.name("by_kind").beginObject(true);
    for (TruthId.Kind k : TruthId.Kind.values()) {
      j.member(k.name(), tally.byKind(k));
    }
    j.endObject();
    j.name("by_class").beginObject(true);
    for (int c = 0; c < 256; c++) {
      if (tally.byClass(c) > 0) {
        j.member(Integer.toString(c), tally.byClass(c));
      }
    }
    j.endObject().endObject();
  }
}
