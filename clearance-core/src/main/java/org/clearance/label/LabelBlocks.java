package org.clearance.label;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import org.clearance.ground.GroundModel;
import org.clearance.io.OrderedParallel;
import org.clearance.line.SpanFrame;
import org.clearance.wire.PointSource;
import org.clearance.wire.SetAside;

/**
 * The labelling block by block along the line, so that the points held at once are those of
 * one block's window, never of the whole survey (docs/labelling.md, "Memory").
 *
 * <p>The spans are cut, in their order, into blocks of at least {@link #BLOCK_M} of line. The
 * survey is read once: each point looked at goes to the store of every block whose window holds
 * it ({@link LabelBins}, {@link LabelStore}): the points looked at within the region of a block
 * span widened by {@link #OVERLAP_M} ({@link LabelWindow}). Each point looked at belongs to
 * exactly one block (the block of the first span whose region holds it) and takes the kind of
 * its object as judged in that block's window. An object with a point within {@link
 * LabelWindow#EDGE_M} of the window's outer edge may reach beyond the window: it is not judged
 * on a piece and stays vegetation (measured), and is not listed. Every object that stays clear
 * of that band is seen whole, with the same points, neighbours and fragment neighbours, and
 * judged as on the whole line.
 *
 * <p>The same pass counts the points looked at and their later returns, so that the echoes are
 * read or not for the whole survey as before. The blocks are then labelled from their stores on
 * every thread, folded in block order; blocks run at once only as far as their estimated heap
 * fits in a share of the heap ({@link HeapBudget}), so a dense block runs alone. The man-made
 * points are added to the {@link SetAside} after the last block, so that every block sees the
 * same points.
 */
final class LabelBlocks {

  /** Least length of line in a block, m. */
  static final double BLOCK_M = 1000.0;
  /** How far a window reaches beyond its block's region, m: an object holding a point of the
   * block and less than {@code OVERLAP_M - EDGE_M} (95 m) across in plan is seen whole. The
   * largest man-made object the step must recognise is a crane: a tower crane's jib or a mobile
   * crane's boom reaches 60-80 m (from memory). */
  static final double OVERLAP_M = 100.0;
  /** Heap the labelling of one block takes per point of its window at most, bytes (computed from
   * the arrays held at once while its objects are judged: coordinates and attributes 32, the
   * neighbour index 44, the local shape 76, the objects' evidence 120, the roots and kinds 8). */
  static final long BYTES_PER_POINT = 280;
  /** Share of the heap the blocks labelled at once may take together: the rest holds the
   * spans' models, the reading threads' chunks and the collector's room to work. */
  static final double HEAP_SHARE = 0.6;

  private LabelBlocks() {}

  /**
   * Labels the line block by block from one pass over {@code source}.
   *
   * @param spillFolder where the blocks' points wait on disk (a temporary file, deleted after)
   * @throws IOException when the temporary file cannot be written or read
   */
  static ObjectLabels label(PointSource source, List<SpanFrame> frames, double regionM,
      GroundModel ground, SetAside setAside, boolean judgeVegetationLabels, int threads,
      Path spillFolder) throws IOException {
    List<int[]> blocks = blocks(frames);
    List<LabelWindow> windows = new ArrayList<>();
    for (int[] block : blocks) {
      windows.add(new LabelWindow(frames, block[0], block[1], regionM, OVERLAP_M));
    }
    PlanGrid grid = new PlanGrid(frames, regionM, windows);
    try (LabelStore store = new LabelStore(spillFolder, blocks.size())) {
      List<LabelBins> bins = Collections.synchronizedList(new ArrayList<>());
      try {
        source.stream(() -> {
          LabelBins b = new LabelBins(frames, regionM, ground, setAside, judgeVegetationLabels,
              grid, windows, store);
          bins.add(b);
          return b;
        });
        bins.forEach(LabelBins::flush);
      } catch (UncheckedIOException e) {
        throw e.getCause();
      }
      long n = bins.stream().mapToLong(b -> b.looked).sum();
      long later = bins.stream().mapToLong(b -> b.later).sum();
      long multiPulse = bins.stream().mapToLong(b -> b.multiPulse).sum();
      if (n == 0) {
        return ObjectLabels.NONE;
      }
      boolean echoes = ObjectLabeller.echoesInformative(later, multiPulse, n);
      List<LabelledObject> objects = new ArrayList<>();
      List<long[]> manMade = new ArrayList<>();
      long[] counts = new long[4];
      List<Integer> order = new ArrayList<>();
      for (int b = 0; b < blocks.size(); b++) {
        order.add(b);
      }
      try {
        HeapBudget budget = new HeapBudget(
            (long) (HEAP_SHARE * Runtime.getRuntime().maxMemory()));
        OrderedParallel.forEach(order, threads, b -> {
          long taken = budget.acquire(store.points(b) * BYTES_PER_POINT);
          try {
            return labelBlock(read(store, b), echoes);
          } finally {
            budget.release(taken);
          }
        }, r -> {
          objects.addAll(r.objects());
          manMade.add(r.manMade());
          for (int k = 0; k < counts.length; k++) {
            counts[k] += r.counts()[k];
          }
        });
      } catch (UncheckedIOException e) {
        throw e.getCause();
      }
      long manMadeCount = 0;
      for (long[] keys : manMade) {
        for (long key : keys) {
          setAside.addObject(key);
        }
        manMadeCount += keys.length;
      }
      return new ObjectLabels(ObjectLabeller.sortedObjects(objects), counts[0], manMadeCount,
          echoes, new ObjectLabels.Doubted(counts[1], counts[2], counts[3]));
    }
  }

  /** Block {@code b}'s points from the store, sorted by coordinates. */
  private static LabelPoints read(LabelStore store, int b) {
    try {
      LabelPoints p = store.read(b);
      ObjectLabeller.sort(p);
      return p;
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /**
   * What one block found for its own points.
   *
   * @param objects the objects it lists
   * @param manMade keys of its points of man-made objects
   * @param counts its points looked at, labelled vegetation, labelled vegetation and set aside,
   *     labelled ground and doubted
   */
  private record BlockResult(List<LabelledObject> objects, long[] manMade, long[] counts) {}

  private static BlockResult labelBlock(LabelPoints p, boolean echoes) {
    List<LabelledObject> objects = new ArrayList<>();
    long[] manMade = new long[1024];
    int manMadeCount = 0;
    long looked = 0;
    long vegetationLabels = 0;
    long vegetationLabelsDoubted = 0;
    long groundDoubted = 0;
    if (p.size == 0) {
      return new BlockResult(List.of(), new long[0], new long[4]);
    }
    ObjectLabeller.Judged j = ObjectLabeller.judge(p, echoes);
    int[] root = j.root();
    boolean[] cut = new boolean[p.size];
    // An object is listed by the block that holds its first point (in coordinate order,
    // the same in every window that sees it whole) as a core point.
    byte[] firstZone = new byte[p.size];
    boolean[] seen = new boolean[p.size];
    for (int i = 0; i < p.size; i++) {
      cut[root[i]] |= p.zone[i] == LabelWindow.EDGE;
      if (!seen[root[i]]) {
        seen[root[i]] = true;
        firstZone[root[i]] = p.zone[i];
      }
    }
    for (int i = 0; i < p.size; i++) {
      if (p.zone[i] != LabelWindow.CORE) {
        continue;
      }
      looked++;
      ObjectKind k = cut[root[i]] ? null : j.kindOf()[root[i]];
      vegetationLabels += p.label[i] == LabelPoints.VEGETATION_LABEL ? 1 : 0;
      groundDoubted += p.label[i] == LabelPoints.GROUND_DOUBTED ? 1 : 0;
      if (k != null && k != ObjectKind.VEGETATION) {
        if (manMadeCount == manMade.length) {
          manMade = Arrays.copyOf(manMade, manMadeCount * 2);
        }
        manMade[manMadeCount++] = SetAside.key(p.x[i], p.y[i], p.z[i]);
        vegetationLabelsDoubted += p.label[i] == LabelPoints.VEGETATION_LABEL ? 1 : 0;
      }
    }
    for (int o = 0; o < j.objects().size(); o++) {
      int r = j.objectRoots().get(o);
      if (!cut[r] && firstZone[r] == LabelWindow.CORE) {
        objects.add(j.objects().get(o));
      }
    }
    return new BlockResult(objects, Arrays.copyOf(manMade, manMadeCount),
        new long[] {looked, vegetationLabels, vegetationLabelsDoubted, groundDoubted});
  }

  /** The blocks as {from, to} span indices: consecutive spans, at least {@link #BLOCK_M} of
   * line each (the last may be shorter). */
  static List<int[]> blocks(List<SpanFrame> frames) {
    List<int[]> out = new ArrayList<>();
    int from = 0;
    double length = 0;
    for (int k = 0; k < frames.size(); k++) {
      length += frames.get(k).length();
      if (length >= BLOCK_M || k == frames.size() - 1) {
        out.add(new int[] {from, k + 1});
        from = k + 1;
        length = 0;
      }
    }
    return out;
  }
}
