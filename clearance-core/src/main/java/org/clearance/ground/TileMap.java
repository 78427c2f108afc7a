package org.clearance.ground;

import java.nio.FloatBuffer;
import java.util.Arrays;
import org.clearance.io.ScratchMemory;

/**
 * Open-addressing hash map from a packed tile key to a tile of float cells, so that looking a
 * tile up per point neither boxes a key nor allocates.
 *
 * <p>A tile is known by its number ({@link #id}, in order of creation); its cells are read and
 * written through {@link #cell} and {@link #setCell}. The first {@link #HEAP_TILES} tiles live on
 * the heap; a map that grows beyond that (a raster of the whole corridor, not of a block) moves
 * its tiles into scratch memory outside the heap ({@link ScratchMemory}), in segments of about
 * {@link #SEGMENT_BYTES} bytes, so the heap a corridor's rasters take does not grow with the
 * survey (docs/benchmark.md, "Heap flat in survey size"). The cells are the same either way.
 *
 * <p>Linear probing with a power-of-two table. Tiles are never removed. Not thread-safe while it
 * grows; safe to read from many threads once no longer written.
 */
final class TileMap {
  /** Initial table size: room for a few hundred tiles before the first resize. */
  private static final int INITIAL_SLOTS = 512;
  /** The table is doubled when it becomes more than half full, keeping probe chains short. */
  private static final double MAX_LOAD = 0.5;
  /** Tiles kept on the heap before the map moves them out: 256 tiles of 64 x 64 floats are
   * 4 MiB, more than a block's raster (a ground block of 256 + 2 x 32 cells takes 25 tiles),
   * less than a corridor's (3 584 tiles at 100 million points). */
  static final int HEAP_TILES = 256;
  /** Size of one segment of scratch memory, bytes (one mapping per segment). */
  static final int SEGMENT_BYTES = 4 << 20;

  private final int cellsPerTile;
  private long[] keys = new long[INITIAL_SLOTS];
  /** Per slot, the tile's number plus one; 0 for an empty slot. */
  private int[] slots = new int[INITIAL_SLOTS];
  private int size;
  /** Tiles by number while on the heap; null once moved out. */
  private float[][] heap = new float[16][];
  /** Segments of scratch memory once moved out; null before. */
  private FloatBuffer[] segments;
  private final int tilesPerSegmentShift;
  /** The tile {@link #getOrCreate} returned last and its key (-1 before the first). */
  private long lastKey;
  private int lastId = -1;

  /** @param cellsPerTile cells of one tile, a power of two */
  TileMap(int cellsPerTile) {
    this.cellsPerTile = cellsPerTile;
    int perSegment = Math.max(1, SEGMENT_BYTES / (4 * cellsPerTile));
    this.tilesPerSegmentShift = Integer.numberOfTrailingZeros(Integer.highestOneBit(perSegment));
  }

  /** The number of the tile for {@code key}, or -1 when there is none. */
  int id(long key) {
    int mask = keys.length - 1;
    int slot = mix(key) & mask;
    while (true) {
      int s = slots[slot];
      if (s == 0) {
        return -1;
      }
      if (keys[slot] == key) {
        return s - 1;
      }
      slot = (slot + 1) & mask;
    }
  }

  /** The number of the tile for {@code key}; a new tile of NaN cells is made when absent. */
  int getOrCreate(long key) {
    // Survey points arrive in scan lines, so most fall in the tile of the point before: one
    // comparison instead of a hash probe. Only the writing thread (there is one) touches these.
    if (lastId >= 0 && key == lastKey) {
      return lastId;
    }
    int id = id(key);
    if (id < 0) {
      if (size + 1 > keys.length * MAX_LOAD) {
        grow();
      }
      id = size++;
      newTile(id);
      insert(key, id + 1);
    }
    lastKey = key;
    lastId = id;
    return id;
  }

  /** Cell {@code i} of tile {@code id}. */
  float cell(int id, int i) {
    if (heap != null) {
      return heap[id][i];
    }
    return segments[id >>> tilesPerSegmentShift].get(offset(id) + i);
  }

  /** Sets cell {@code i} of tile {@code id}. */
  void setCell(int id, int i, float v) {
    if (heap != null) {
      heap[id][i] = v;
    } else {
      segments[id >>> tilesPerSegmentShift].put(offset(id) + i, v);
    }
  }

  /** Copies {@code n} cells of tile {@code id} from cell {@code i} into {@code out[at...]}. */
  void copy(int id, int i, float[] out, int at, int n) {
    if (heap != null) {
      System.arraycopy(heap[id], i, out, at, n);
    } else {
      segments[id >>> tilesPerSegmentShift].get(offset(id) + i, out, at, n);
    }
  }

  int size() {
    return size;
  }

  /** Cells of one tile. */
  int cellsPerTile() {
    return cellsPerTile;
  }

  /** Whether the tiles are in scratch memory outside the heap. */
  boolean offHeap() {
    return heap == null;
  }

  /** A new array of all keys, in no particular order. */
  long[] keys() {
    long[] out = new long[size];
    int n = 0;
    for (int i = 0; i < slots.length; i++) {
      if (slots[i] != 0) {
        out[n++] = keys[i];
      }
    }
    return out;
  }

  private int offset(int id) {
    return (id & ((1 << tilesPerSegmentShift) - 1)) * cellsPerTile;
  }

  private void newTile(int id) {
    if (heap != null && id >= HEAP_TILES) {
      moveOut();
    }
    if (heap != null) {
      if (id == heap.length) {
        heap = Arrays.copyOf(heap, heap.length * 2);
      }
      float[] tile = new float[cellsPerTile];
      Arrays.fill(tile, Float.NaN);
      heap[id] = tile;
      return;
    }
    int seg = id >>> tilesPerSegmentShift;
    if (seg == segments.length) {
      segments = Arrays.copyOf(segments, segments.length * 2);
    }
    if (segments[seg] == null) {
      segments[seg] = ScratchMemory.map((4L * cellsPerTile) << tilesPerSegmentShift)
          .asFloatBuffer();
    }
    FloatBuffer s = segments[seg];
    int at = offset(id);
    for (int i = 0; i < cellsPerTile; i++) {
      s.put(at + i, Float.NaN);
    }
  }

  /** Moves every tile from the heap into scratch memory. */
  private void moveOut() {
    float[][] tiles = heap;
    segments = new FloatBuffer[4];
    heap = null;
    for (int id = 0; id < size - 1; id++) {
      newTile(id);
      FloatBuffer s = segments[id >>> tilesPerSegmentShift];
      s.put(offset(id), tiles[id], 0, cellsPerTile);
    }
  }

  private void insert(long key, int slotValue) {
    int mask = keys.length - 1;
    int slot = mix(key) & mask;
    while (slots[slot] != 0) {
      slot = (slot + 1) & mask;
    }
    keys[slot] = key;
    slots[slot] = slotValue;
  }

  private void grow() {
    long[] oldKeys = keys;
    int[] oldSlots = slots;
    keys = new long[oldKeys.length * 2];
    slots = new int[oldKeys.length * 2];
    for (int i = 0; i < oldSlots.length; i++) {
      if (oldSlots[i] != 0) {
        insert(oldKeys[i], oldSlots[i]);
      }
    }
  }

  /** 64-bit finaliser of MurmurHash3 (Appleby), folded to an int: spreads neighbouring keys. */
  private static int mix(long key) {
    long h = key;
    h ^= h >>> 33;
    h *= 0xff51afd7ed558ccdL;
    h ^= h >>> 33;
    h *= 0xc4ceb9fe1a85ec53L;
    h ^= h >>> 33;
    return (int) h;
  }
}
