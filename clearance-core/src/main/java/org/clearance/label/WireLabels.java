package org.clearance.label;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.function.Consumer;
import org.clearance.ground.GroundModel;
import org.clearance.line.SpanFrame;
import org.clearance.survey.PointChunk;
import org.clearance.wire.PointSource;
import org.clearance.wire.SetAside;

/**
 * Labels of man-made classes that rule out vegetation (ASPRS 13 wire guard, 14 wire conductor,
 * 6 building, 15 transmission tower, 17 bridge deck) that the evidence shows to be crowns
 * (issue 9: existing labels are trusted only as far as they are consistent). A vendor's
 * classifier that took a crown beside a conductor for wire, a roof, a tower or a deck leaves
 * vegetation in one of these classes, which the engine does not read: such a crown near a
 * conductor was never measured.
 *
 * <p>Each label is judged with the points of its own kind: wire labels (13 and 14 together),
 * building, tower and bridge-deck labels each apart. The labelled points that the wire finder did
 * not set aside as wire (a wire point marked touched, {@link SetAside#touchedWire}, is looked at:
 * vegetation within 0.3 m of it, and measured with its crown, as in an unlabelled survey), at
 * least
 * {@link LabelPoints#MIN_HAG_M} above ground and within the region of a span, are judged on
 * their own, by the labelling's steps 2-5 ({@link ObjectLabeller#judge}): local shape, objects
 * linked at 1 m, the evidence of each object. A point of an object of at least
 * {@link ObjectLabeller#MIN_OBJECT_POINTS} points judged vegetation whose mean scattering is
 * above {@link #MIN_SCATTERING} (a volume of returns, as a crown is: more than any plane or
 * line scatters) is a label not trusted: it is added to {@link SetAside#addDistrustedLabel} and
 * the engine measures it as an unclassified point. A building, tower or bridge-deck label needs
 * one more piece of evidence where the survey records echoes: more than {@link
 * #MIN_MULTI_PULSE_SHARE} of the object's points from pulses with several returns (a crown lets
 * the pulse on; a roof or a deck stops it, {@link Facets#ROOF_MAX_MULTI_PULSE_SHARE}). Everything else keeps its wire label: a wire
 * the finder did not fit is long and thin (a linear object) or too sparse to judge, and is not
 * measured, as before. Judged apart from the unclassified points so that the wire-labelled
 * points never change how those are judged.
 *
 * <p>Memory: the wire-labelled points of the line's region are held at once (about 40 bytes
 * each); they are a small share of a survey (the wires and what a classifier took for them).
 */
public final class WireLabels {

  /** ASPRS wire guard (shield wire) and wire conductor classes (LAS 1.4 R15, Table 17). */
  static final int WIRE_GUARD = 13;
  static final int WIRE_CONDUCTOR = 14;
  /** ASPRS building, transmission tower and bridge deck classes (LAS 1.4 R15, Table 17). */
  static final int BUILDING = 6;
  static final int TOWER = 15;
  static final int BRIDGE_DECK = 17;
  /** The labels judged, each group with its own points: wires, buildings, towers, decks. */
  private static final int[][] GROUPS = {{WIRE_GUARD, WIRE_CONDUCTOR}, {BUILDING}, {TOWER},
      {BRIDGE_DECK}};
  /** Least share of points from pulses with several returns of a building, tower or deck
   * label's object taken for a crown, where echoes are recorded: the roof test's most
   * ({@link Facets#ROOF_MAX_MULTI_PULSE_SHARE}; autzen's roof 0.02, demo crown shells 1.0). */
  static final double MIN_MULTI_PULSE_SHARE = Facets.ROOF_MAX_MULTI_PULSE_SHARE;
  /** A tower label's object whose highest point lies within this plan distance of one of the
   * line's structures is the structure itself and keeps its label, m: a lattice tower's top
   * stands over its base, and the engine's structure exclusion is 8 m (common practice, no
   * source). Measured on the open corridor tile: its real tower (1 179 points, mean scattering
   * above 0.03 without echoes) has its top at the structure. */
  static final double TOWER_AT_STRUCTURE_M = 10.0;
  /** Least mean scattering of a crown taken for wire: above the planar test's most
   * ({@link ObjectLabeller#PLANAR_MAX_SCATTERING}: a plane scatters only by its noise); a wire
   * over 1 m scatters less still, crowns 0.04 (demo) to 0.18 (open tile) and more
   * (docs/labelling.md, "Thresholds and their sources"). */
  static final double MIN_SCATTERING = ObjectLabeller.PLANAR_MAX_SCATTERING;

  private WireLabels() {}

  /** Whether a survey holds labels to judge (6, 13, 14, 15 or 17).
   * @param classCounts points per ASPRS class (index 0-255) */
  public static boolean anyIn(long[] classCounts) {
    for (int[] group : GROUPS) {
      for (int c : group) {
        if (c < classCounts.length && classCounts[c] > 0) {
          return true;
        }
      }
    }
    return false;
  }

  /** Whether an ASPRS class is one this step may not believe (6, 13, 14, 15 or 17). */
  public static boolean judgedClass(int classification) {
    return group(classification) >= 0;
  }

  /** The group of a class in {@link #GROUPS}, -1 when it is not judged. */
  private static int group(int classification) {
    for (int g = 0; g < GROUPS.length; g++) {
      for (int c : GROUPS[g]) {
        if (c == classification) {
          return g;
        }
      }
    }
    return -1;
  }

  /**
   * What the step found.
   *
   * @param looked points labelled 13 or 14 looked at (not on a fitted conductor)
   * @param distrusted of them, points of an object judged a crown: measured as unclassified
   * @param structuresLooked points labelled 6, 15 or 17 looked at
   * @param structuresDistrusted of them, points of an object judged a crown: measured
   */
  public record Result(long looked, long distrusted, long structuresLooked,
      long structuresDistrusted) {
    /** Nothing looked at. */
    public static final Result NONE = new Result(0, 0, 0, 0);

    /** One phrase for the console and the run record. */
    public String describe() {
      return String.format(java.util.Locale.ROOT, "wire labels (13, 14) off the fitted "
          + "conductors looked at %,d, not trusted (crown-shaped, measured) %,d; building, "
          + "tower and bridge-deck labels (6, 15, 17) looked at %,d, not trusted (crown-shaped,"
          + " measured) %,d", looked, distrusted, structuresLooked, structuresDistrusted);
    }
  }

  /**
   * Judges the survey's wire labels and adds the points not trusted to {@code setAside}.
   *
   * @param source the survey, read once
   * @param frames the spans' plan frames
   * @param regionM points within this plan distance of a span's chord are looked at, m
   * @param ground the ground model
   * @param setAside the wire finder's points set aside; receives the labels not trusted
   * @param echoes whether the survey's return numbers are read (as the labelling decided)
   */
  public static Result judge(PointSource source, List<SpanFrame> frames, double regionM,
      GroundModel ground, SetAside setAside, boolean echoes) {
    List<LabelPoints[]> parts = Collections.synchronizedList(new ArrayList<>());
    source.stream(() -> {
      LabelPoints[] p = new LabelPoints[GROUPS.length];
      for (int g = 0; g < p.length; g++) {
        p[g] = new LabelPoints(frames, regionM, ground, setAside, false);
      }
      parts.add(p);
      return chunk -> collect(chunk, p, frames, regionM, ground, setAside);
    });
    long[] looked = new long[GROUPS.length];
    long[] distrusted = new long[GROUPS.length];
    for (int g = 0; g < GROUPS.length; g++) {
      LabelPoints all = new LabelPoints(frames, regionM, ground, setAside, false);
      for (LabelPoints[] p : parts) {
        all.absorb(p[g]);
      }
      looked[g] = all.size;
      distrusted[g] = all.size == 0 ? 0 : judgeGroup(all, GROUPS[g][0], echoes, setAside,
          frames);
    }
    long structuresLooked = 0;
    long structuresDistrusted = 0;
    for (int g = 1; g < GROUPS.length; g++) {
      structuresLooked += looked[g];
      structuresDistrusted += distrusted[g];
    }
    return new Result(looked[0], distrusted[0], structuresLooked, structuresDistrusted);
  }

  /**
   * Judges one group's points and adds those of crowns to {@code setAside}.
   *
   * @param label the group's first class (wire labels: shape only, echoes not asked; tower
   *     labels: trusted at a structure)
   * @return the number of points not trusted
   */
  private static long judgeGroup(LabelPoints all, int label, boolean echoes,
      SetAside setAside, List<SpanFrame> frames) {
    boolean wires = label == WIRE_GUARD;
    ObjectLabeller.sort(all);
    ObjectLabeller.Judged j = ObjectLabeller.judge(all, echoes);
    boolean[] crown = new boolean[all.size];
    for (int o = 0; o < j.objects().size(); o++) {
      LabelledObject object = j.objects().get(o);
      crown[j.objectRoots().get(o)] = object.kind() == ObjectKind.VEGETATION
          && object.scattering() > MIN_SCATTERING
          && (wires || !(object.multiPulseShare() <= MIN_MULTI_PULSE_SHARE))
          && !(label == TOWER && atStructure(frames, object.x(), object.y()));
    }
    long distrusted = 0;
    for (int i = 0; i < all.size; i++) {
      if (crown[j.root()[i]]) {
        setAside.addDistrustedLabel(SetAside.key(all.x[i], all.y[i], all.z[i]));
        distrusted++;
      }
    }
    return distrusted;
  }

  /** Whether the plan point lies within {@link #TOWER_AT_STRUCTURE_M} of a structure (a
   * span's end). */
  private static boolean atStructure(List<SpanFrame> frames, double x, double y) {
    for (SpanFrame f : frames) {
      double s = f.station(x, y);
      double e = f.offset(x, y);
      if (Math.hypot(s, e) <= TOWER_AT_STRUCTURE_M
          || Math.hypot(s - f.length(), e) <= TOWER_AT_STRUCTURE_M) {
        return true;
      }
    }
    return false;
  }

  /** Adds the chunk's labelled points (not set aside by the wire finder) to their group's
   * {@code p}. */
  private static void collect(PointChunk chunk, LabelPoints[] p, List<SpanFrame> frames,
      double regionM, GroundModel ground, SetAside setAside) {
    short[] cls = chunk.classification();
    byte[] flags = chunk.flags();
    for (int i = 0; i < chunk.size(); i++) {
      int g = group(cls[i]);
      if (g < 0 || (flags[i] & PointChunk.FLAG_WITHHELD) != 0) {
        continue;
      }
      double px = chunk.x()[i];
      double py = chunk.y()[i];
      double pz = chunk.z()[i];
      if (!LabelPoints.inRegion(frames, regionM, px, py)) {
        continue;
      }
      double h = ground.heightAboveGround(px, py, pz);
      long key = SetAside.key(px, py, pz);
      if (!(h >= LabelPoints.MIN_HAG_M) || setAside.reason(key) != SetAside.Reason.NONE) {
        continue;
      }
      p[g].add(px, py, pz, h, chunk.returnNumber()[i], chunk.numberOfReturns()[i],
          LabelPoints.OPEN, LabelWindow.CORE);
    }
  }
}
