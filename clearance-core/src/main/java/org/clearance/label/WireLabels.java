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
 * Wire labels (ASPRS 13 wire guard, 14 wire conductor) that the evidence shows to be crowns
 * (issue 9: existing labels are trusted only as far as they are consistent). A vendor's
 * classifier that took a crown beside a conductor for wire leaves vegetation in class 14, which
 * the engine does not read: such a crown near a conductor was never measured.
 *
 * <p>The points labelled 13 or 14 that the wire finder did not put on a conductor (neither set
 * aside as wire nor marked touched: {@link SetAside#touchedWire}), at least
 * {@link LabelPoints#MIN_HAG_M} above ground and within the region of a span, are judged on
 * their own, by the labelling's steps 2-5 ({@link ObjectLabeller#judge}): local shape, objects
 * linked at 1 m, the evidence of each object. A point of an object of at least
 * {@link ObjectLabeller#MIN_OBJECT_POINTS} points judged vegetation whose mean scattering is
 * above {@link #MIN_SCATTERING} (a volume of returns, as a crown is: more than any plane or
 * line scatters) is a label not trusted: it is added to {@link SetAside#addDistrustedLabel} and
 * the engine measures it as an unclassified point. Everything else keeps its wire label: a wire
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
  /** Least mean scattering of a crown taken for wire: above the planar test's most
   * ({@link ObjectLabeller#PLANAR_MAX_SCATTERING}: a plane scatters only by its noise); a wire
   * over 1 m scatters less still, crowns 0.04 (demo) to 0.18 (open tile) and more
   * (docs/labelling.md, "Thresholds and their sources"). */
  static final double MIN_SCATTERING = ObjectLabeller.PLANAR_MAX_SCATTERING;

  private WireLabels() {}

  /** Whether a survey holds wire labels to judge.
   * @param classCounts points per ASPRS class (index 0-255) */
  public static boolean anyIn(long[] classCounts) {
    return classCounts.length > WIRE_CONDUCTOR
        && classCounts[WIRE_GUARD] + classCounts[WIRE_CONDUCTOR] > 0;
  }

  /** Whether an ASPRS class is a wire class this step may not believe (13 or 14). */
  public static boolean wireClass(int classification) {
    return classification == WIRE_GUARD || classification == WIRE_CONDUCTOR;
  }

  /**
   * What the step found.
   *
   * @param looked points labelled 13 or 14 looked at (not on a fitted conductor)
   * @param distrusted of them, points of an object judged a crown: measured as unclassified
   */
  public record Result(long looked, long distrusted) {
    /** Nothing looked at. */
    public static final Result NONE = new Result(0, 0);

    /** One phrase for the console and the run record. */
    public String describe() {
      return String.format(java.util.Locale.ROOT, "wire labels (13, 14) off the fitted "
          + "conductors looked at %,d, not trusted (crown-shaped, measured) %,d", looked,
          distrusted);
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
    List<LabelPoints> parts = Collections.synchronizedList(new ArrayList<>());
    source.stream(() -> {
      LabelPoints p = new LabelPoints(frames, regionM, ground, setAside, false);
      parts.add(p);
      return chunk -> collect(chunk, p, frames, regionM, ground, setAside);
    });
    LabelPoints all = new LabelPoints(frames, regionM, ground, setAside, false);
    parts.forEach(all::absorb);
    if (all.size == 0) {
      return Result.NONE;
    }
    ObjectLabeller.sort(all);
    ObjectLabeller.Judged j = ObjectLabeller.judge(all, echoes);
    boolean[] crown = new boolean[all.size];
    for (int o = 0; o < j.objects().size(); o++) {
      LabelledObject object = j.objects().get(o);
      crown[j.objectRoots().get(o)] = object.kind() == ObjectKind.VEGETATION
          && object.scattering() > MIN_SCATTERING;
    }
    long distrusted = 0;
    for (int i = 0; i < all.size; i++) {
      if (crown[j.root()[i]]) {
        setAside.addDistrustedLabel(SetAside.key(all.x[i], all.y[i], all.z[i]));
        distrusted++;
      }
    }
    return new Result(all.size, distrusted);
  }

  /** Adds the chunk's wire-labelled points not on a fitted conductor to {@code p}. */
  private static void collect(PointChunk chunk, LabelPoints p, List<SpanFrame> frames,
      double regionM, GroundModel ground, SetAside setAside) {
    short[] cls = chunk.classification();
    byte[] flags = chunk.flags();
    for (int i = 0; i < chunk.size(); i++) {
      int c = cls[i];
      if (!wireClass(c) || (flags[i] & PointChunk.FLAG_WITHHELD) != 0) {
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
      if (!(h >= LabelPoints.MIN_HAG_M) || setAside.reason(key) != SetAside.Reason.NONE
          || setAside.touchedWire(key)) {
        continue;
      }
      p.add(px, py, pz, h, chunk.returnNumber()[i], LabelPoints.OPEN);
    }
  }
}
