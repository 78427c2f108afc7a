package org.clearance.ground;

import java.util.Arrays;

/**
 * Open-addressing hash map from a packed tile key to a tile array, so that looking a tile up per
 * point neither boxes a key nor allocates.
 *
 * <p>Linear probing with a power-of-two table; an empty slot is a null tile. Tiles are never
 * removed. Not thread-safe while it grows; safe to read from many threads once no longer written.
 */
final class TileMap {
  /** Initial table size: room for a few hundred tiles before the first resize. */
  private static final int INITIAL_SLOTS = 512;
  /** The table is doubled when it becomes more than half full, keeping probe chains short. */
  private static final double MAX_LOAD = 0.5;

  private long[] keys = new long[INITIAL_SLOTS];
  private float[][] tiles = new float[INITIAL_SLOTS][];
  private int size;
  /** The tile {@link #getOrCreate} returned last and its key (null before the first). */
  private long lastKey;
  private float[] lastTile;

  /** The tile for {@code key}, or null when there is none. */
  float[] get(long key) {
    int mask = keys.length - 1;
    int slot = mix(key) & mask;
    while (true) {
      float[] tile = tiles[slot];
      if (tile == null) {
        return null;
      }
      if (keys[slot] == key) {
        return tile;
      }
      slot = (slot + 1) & mask;
    }
  }

  /** The tile for {@code key}; a new tile of {@code length} NaN cells is stored when absent. */
  float[] getOrCreate(long key, int length) {
    // Survey points arrive in scan lines, so most fall in the tile of the point before: one
    // comparison instead of a hash probe. Only the writing thread (there is one) touches these.
    if (lastTile != null && key == lastKey) {
      return lastTile;
    }
    float[] tile = get(key);
    if (tile != null) {
      lastKey = key;
      lastTile = tile;
      return tile;
    }
    if (size + 1 > keys.length * MAX_LOAD) {
      grow();
    }
    tile = new float[length];
    Arrays.fill(tile, Float.NaN);
    insert(key, tile);
    size++;
    lastKey = key;
    lastTile = tile;
    return tile;
  }

  int size() {
    return size;
  }

  /** A new array of all keys, in no particular order. */
  long[] keys() {
    long[] out = new long[size];
    int n = 0;
    for (int i = 0; i < tiles.length; i++) {
      if (tiles[i] != null) {
        out[n++] = keys[i];
      }
    }
    return out;
  }

  private void insert(long key, float[] tile) {
    int mask = keys.length - 1;
    int slot = mix(key) & mask;
    while (tiles[slot] != null) {
      slot = (slot + 1) & mask;
    }
    keys[slot] = key;
    tiles[slot] = tile;
  }

  private void grow() {
    long[] oldKeys = keys;
    float[][] oldTiles = tiles;
    keys = new long[oldKeys.length * 2];
    tiles = new float[oldKeys.length * 2][];
    for (int i = 0; i < oldTiles.length; i++) {
      if (oldTiles[i] != null) {
        insert(oldKeys[i], oldTiles[i]);
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
