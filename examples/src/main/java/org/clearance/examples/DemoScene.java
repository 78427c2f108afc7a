package org.clearance.examples;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.OptionalInt;
import java.util.SplittableRandom;
import java.util.function.Consumer;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.PointChunk;
import org.clearance.survey.SurveyUnits;
import org.clearance.wire.ConductorCurve;

/**
 * The demo corridor in memory: an invented 230 kV line of an invented utility crossing invented
 * country, with everything the generator used (the truth) as records, and its airborne lidar
 * survey as a stream of point chunks with the truth object of every point.
 *
 * <p>Everything follows from the options: the same options give the same scene and the same
 * points in the same order. Creating a scene builds only the truth (memory grows with the number
 * of spans, not of points); {@link #points(PointSink)} generates the points span by span.
 */
public final class DemoScene {
  /** The invented utility. */
  public static final String UTILITY = "Fenwarden Power Cooperative";
  /** The line's id (structures.csv line_id, line.yaml line_id). */
  public static final String LINE_ID = "FW231";
  /** The line's name. */
  public static final String LINE_NAME = "Orrindale - Kestrowe 230 kV";
  /** Nominal phase-to-phase voltage, kV. */
  public static final double NOMINAL_VOLTAGE_KV = 230;
  /** EPSG code of the CRS the coordinates are given in: WGS 84 / UTM zone 11N. */
  public static final int EPSG = 32611;
  /** Name of the compound CRS: the projected CRS plus gravity-related heights in metres. */
  public static final String CRS_NAME = "WGS 84 / UTM zone 11N + EGM96 height";
  /**
   * OGC WKT (OGC 01-009 COMPD_CS) of EPSG:32611, WGS 84 / UTM zone 11N, with EGM96 heights
   * (EPSG:5773), both in metres, so the file states its vertical unit too. The invented line
   * lies on land in the boreal forest near 60.2 N, 117.2 W (about where the Alberta - Northwest
   * Territories border meets the Hay River lowlands), with invented names and data; the
   * terrain's elevations are invented too. EPSG codes and parameters from memory.
   */
  public static final String CRS_WKT = "COMPD_CS[\"" + CRS_NAME + "\","
      + "PROJCS[\"WGS 84 / UTM zone 11N\","
      + "GEOGCS[\"WGS 84\",DATUM[\"WGS_1984\",SPHEROID[\"WGS 84\",6378137,298.257223563,"
      + "AUTHORITY[\"EPSG\",\"7030\"]],AUTHORITY[\"EPSG\",\"6326\"]],"
      + "PRIMEM[\"Greenwich\",0,AUTHORITY[\"EPSG\",\"8901\"]],"
      + "UNIT[\"degree\",0.0174532925199433,AUTHORITY[\"EPSG\",\"9122\"]],"
      + "AUTHORITY[\"EPSG\",\"4326\"]],PROJECTION[\"Transverse_Mercator\"],"
      + "PARAMETER[\"latitude_of_origin\",0],PARAMETER[\"central_meridian\",-117],"
      + "PARAMETER[\"scale_factor\",0.9996],PARAMETER[\"false_easting\",500000],"
      + "PARAMETER[\"false_northing\",0],UNIT[\"metre\",1,AUTHORITY[\"EPSG\",\"9001\"]],"
      + "AXIS[\"Easting\",EAST],AXIS[\"Northing\",NORTH],AUTHORITY[\"EPSG\",\"32611\"]],"
      + "VERT_CS[\"EGM96 height\",VERT_DATUM[\"EGM96 geoid\",2005,AUTHORITY[\"EPSG\",\"5171\"]],"
      + "UNIT[\"metre\",1,AUTHORITY[\"EPSG\",\"9001\"]],AXIS[\"Gravity-related height\",UP],"
      + "AUTHORITY[\"EPSG\",\"5773\"]]]";

  private final DemoOptions options;
  private final RoutePlan route;
  private final Corridor corridor;
  private final Terrain terrain;
  private final Stands stands;
  private final List<DemoPosition> positions;
  private final LineBuilder.Layout layout;
  private final List<DemoBuilding> buildings;
  /** The labelling tests' man-made fixtures, or null. */
  private final ManMadeFixtures fixtures;
  private final List<DemoTree> trees;
  private final List<DemoBird> birds;
  private final List<FlightStrip> strips;
  private final List<DemoStructure> written;
  private final int strayBuilding;
  private final int strayTree;
  private final long[] spanSeeds;
  private final int[][] treesNear;

  private DemoScene(DemoOptions options) {
    this.options = Objects.requireNonNull(options, "options");
    SplittableRandom root = new SplittableRandom(options.seed());
    route = RoutePlan.plan(root.split(), options.spanCount());
    corridor = new Corridor(route, options.corridorHalfWidth());
    int r = route.ravineSpan;
    double mx = 0.5 * (route.x[r] + route.x[r + 1]);
    double my = 0.5 * (route.y[r] + route.y[r + 1]);
    terrain = new Terrain(root.split(), mx, my, route.ux(r), route.uy(r), route.road);
    stands = new Stands(root.split());
    positions = DemoPosition.demoLine();
    layout = new LineBuilder(root.split(), route, terrain, positions,
        options.pointDensity() / DemoOptions.DEFAULT_DENSITY).build(LINE_ID);
    SceneryPlanner scenery = new SceneryPlanner(root.split(), corridor, terrain, layout,
        route.road, r);
    if (options.manMade()) {
      List<DemoBuilding> all = new ArrayList<>(scenery.buildings());
      fixtures = new ManMadeFixtures(layout.spans(), terrain, all.size());
      all.add(fixtures.shed());
      buildings = List.copyOf(all);
    } else {
      fixtures = null;
      buildings = List.copyOf(scenery.buildings());
    }
    birds = List.copyOf(scenery.birds());
    strips = scenery.strips();
    trees = List.copyOf(new TreePlanner(root.split(), corridor, terrain, stands, layout,
        buildings, route.road, r).plan());
    written = List.copyOf(StructureFile.apply(layout.structures(), options.structureEdit(),
        root.split()));
    strayBuilding = buildings.isEmpty() ? -1 : 0;
    strayTree = tallest(trees, Math.min(1, options.spanCount() - 1));
    SplittableRandom seeds = root.split();
    spanSeeds = new long[options.spanCount()];
    for (int i = 0; i < spanSeeds.length; i++) {
      spanSeeds[i] = seeds.nextLong();
    }
    treesNear = index(trees, options.spanCount());
  }

  /** Builds the scene (the truth) for the options. */
  public static DemoScene create(DemoOptions options) {
    return new DemoScene(options);
  }

  private static int tallest(List<DemoTree> trees, int span) {
    int best = -1;
    for (DemoTree t : trees) {
      if (t.role() == DemoTree.Role.FOREST && t.span() == span
          && (best < 0 || t.heightM() > trees.get(best).heightM())) {
        best = t.id();
      }
    }
    return best;
  }

  private static int[][] index(List<DemoTree> trees, int spans) {
    int[] count = new int[spans];
    for (DemoTree t : trees) {
      for (int i = Math.max(0, t.span() - 1); i <= Math.min(spans - 1, t.span() + 1); i++) {
        count[i]++;
      }
    }
    int[][] near = new int[spans][];
    for (int i = 0; i < spans; i++) {
      near[i] = new int[count[i]];
      count[i] = 0;
    }
    for (DemoTree t : trees) {
      for (int i = Math.max(0, t.span() - 1); i <= Math.min(spans - 1, t.span() + 1); i++) {
        near[i][count[i]++] = t.id();
      }
    }
    return near;
  }

  /**
   * Generates the survey points span by span, in chunks of up to {@value ChunkEmitter#CAPACITY}
   * points, with the truth id of each point. The chunk and id array are reused between calls.
   */
  public void points(PointSink sink) {
    ChunkEmitter out = new ChunkEmitter(sink, options.mode());
    SurfacePoints surfaces = new SurfacePoints(this);
    ObjectPoints objects = new ObjectPoints(this);
    for (int i = 0; i < spanSeeds.length; i++) {
      SplittableRandom rng = new SplittableRandom(spanSeeds[i]);
      surfaces.generate(i, rng, out);
      objects.generate(i, rng, out);
      if (fixtures != null) {
        fixtures.generate(i, rng, out, strips.get(0), corridor, terrain);
      }
    }
    out.flush();
  }

  /** Generates the survey points without their truth; see {@link #points(PointSink)}. */
  public void points(Consumer<PointChunk> consumer) {
    points((chunk, ids) -> consumer.accept(chunk));
  }

  public DemoOptions options() {
    return options;
  }

  /** Units and CRS of the survey: metres, EPSG:32611 plus EGM96 heights, with the WKT. */
  public SurveyUnits units() {
    return new SurveyUnits(LinearUnit.METRE, LinearUnit.METRE, CRS_NAME,
        OptionalInt.of(EPSG), CRS_WKT, "demo generator");
  }

  /** The line's conductor positions. */
  public List<DemoPosition> positions() {
    return positions;
  }

  /** The structures at their true positions, in sequence order. */
  public List<DemoStructure> structures() {
    return layout.structures();
  }

  /** The structures as written to structures.csv (with the options' edit applied). */
  public List<DemoStructure> writtenStructures() {
    return written;
  }

  public List<TensionSection> sections() {
    return layout.sections();
  }

  public List<DemoSpan> spans() {
    return layout.spans();
  }

  /** The curve of one conductor at the survey state. */
  public ConductorCurve curve(int span, String position) {
    return layout.spans().get(span).wire(position).curve();
  }

  /** Conductor temperature during the survey, degC. */
  public double surveyTemperatureC() {
    return layout.surveyTemperatureC();
  }

  public List<DemoTree> trees() {
    return trees;
  }

  public List<DemoBuilding> buildings() {
    return buildings;
  }

  public List<DemoBird> birds() {
    return birds;
  }

  public DemoRoad road() {
    return route.road;
  }

  public List<FlightStrip> strips() {
    return strips;
  }

  /** Index of the span that crosses the ravine (climbing from the low to the high rim). */
  public int ravineSpan() {
    return route.ravineSpan;
  }

  /** True ground elevation at (x, y), m. */
  public double groundZ(double x, double y) {
    return terrain.z(x, y);
  }

  /** Id of the building carrying stray class-14 labels in FULL mode, or -1. */
  public int strayBuilding() {
    return strayBuilding;
  }

  /** Id of the tree whose crown top carries stray class-14 labels in FULL mode, or -1. */
  public int strayTree() {
    return strayTree;
  }

  Corridor corridor() {
    return corridor;
  }

  Terrain terrain() {
    return terrain;
  }

  Stands stands() {
    return stands;
  }

  int[] treesNear(int span) {
    return treesNear[span];
  }

  List<DemoBuilding> buildingsNear(int span) {
    List<DemoBuilding> out = new ArrayList<>();
    for (DemoBuilding b : buildings) {
      if (Math.abs(b.span() - span) <= 1) {
        out.add(b);
      }
    }
    return out;
  }
}
