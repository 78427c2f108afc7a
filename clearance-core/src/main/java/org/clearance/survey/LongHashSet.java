package org.clearance.survey;

/**
 * A set of {@code long} keys with open addressing and linear probing, for counting occupied grid
 * cells and keeping point keys without boxing (memory: 16 bytes per key at most). Not
 * thread-safe while it is filled; reading from many threads once filled is safe.
 */
public final class LongHashSet {
  /** Marks an empty slot; the key itself is tracked apart. */
  private static final long EMPTY = Long.MIN_VALUE;
  /** Grow when more than half the slots are used: keeps probe sequences short. */
  private static final double MAX_LOAD = 0.5;
  private static final int INITIAL_CAPACITY = 1024;

  private long[] slots = newSlots(INITIAL_CAPACITY);
  private int used;
  private boolean hasEmptyKey;

  /** Adds a key; returns true when it was not there. */
  public boolean add(long key) {
    if (key == EMPTY) {
      boolean added = !hasEmptyKey;
      hasEmptyKey = true;
      return added;
    }
    int mask = slots.length - 1;
    int i = mix(key) & mask;
    while (slots[i] != EMPTY) {
      if (slots[i] == key) {
        return false;
      }
      i = (i + 1) & mask;
    }
    slots[i] = key;
    if (++used > slots.length * MAX_LOAD) {
      grow();
    }
    return true;
  }

  /** Adds all keys of {@code other}. */
  public void addAll(LongHashSet other) {
    for (long k : other.slots) {
      if (k != EMPTY) {
        add(k);
      }
    }
    if (other.hasEmptyKey) {
      add(EMPTY);
    }
  }

  /** Whether the key is in the set. */
  public boolean contains(long key) {
    if (key == EMPTY) {
      return hasEmptyKey;
    }
    int mask = slots.length - 1;
    int i = mix(key) & mask;
    while (slots[i] != EMPTY) {
      if (slots[i] == key) {
        return true;
      }
      i = (i + 1) & mask;
    }
    return false;
  }

  /** The keys, in no particular order. */
  public long[] toArray() {
    long[] out = new long[(int) size()];
    int n = 0;
    for (long k : slots) {
      if (k != EMPTY) {
        out[n++] = k;
      }
    }
    if (hasEmptyKey) {
      out[n] = EMPTY;
    }
    return out;
  }

  /** Number of keys. */
  public long size() {
    return used + (hasEmptyKey ? 1 : 0);
  }

  private void grow() {
    long[] old = slots;
    if (old.length > (1 << 29)) {
      throw new IllegalStateException("too many keys for one set: " + used);
    }
    slots = newSlots(old.length * 2);
    used = 0;
    for (long k : old) {
      if (k != EMPTY) {
        add(k);
      }
    }
  }

  private static long[] newSlots(int n) {
    long[] s = new long[n];
    java.util.Arrays.fill(s, EMPTY);
    return s;
  }

  /** The 64-bit finaliser of MurmurHash3 (Appleby), folded to 32 bits. */
  private static int mix(long k) {
    long h = k;
    h ^= h >>> 33;
    h *= 0xff51afd7ed558ccdL;
    h ^= h >>> 33;
    h *= 0xc4ceb9fe1a85ec53L;
    h ^= h >>> 33;
    return (int) h;
  }
}
