package org.clearance.survey;

import java.nio.LongBuffer;
import org.clearance.io.ScratchMemory;

/**
 * A set of {@code long} keys with open addressing and linear probing, for counting occupied grid
 * cells and keeping point keys without boxing (memory: 16 bytes per key at most). A set of
 * more than {@value #HEAP_SLOTS} slots (the keys of the points set aside on a long line) keeps
 * them in scratch memory outside the heap ({@link ScratchMemory}), so the heap does not grow with
 * the survey (docs/benchmark.md, "Heap flat in survey size"); the keys and their order are the
 * same either way. Not thread-safe while it is filled; reading from many threads once filled is
 * safe.
 */
public final class LongHashSet {
  /** Marks an empty slot; the key itself is tracked apart. */
  private static final long EMPTY = Long.MIN_VALUE;
  /** Grow when more than half the slots are used: keeps probe sequences short. */
  private static final double MAX_LOAD = 0.5;
  private static final int INITIAL_CAPACITY = 1024;
  /** Most slots kept on the heap: 2^17 slots are 1 MiB, about 65 000 keys (a few spans' wire
   * points); a larger table goes to scratch memory. */
  static final int HEAP_SLOTS = 1 << 17;

  /** The slots while on the heap; null once in scratch memory. */
  private long[] slots = newSlots(INITIAL_CAPACITY);
  /** The slots in scratch memory; null before. */
  private LongBuffer outside;
  private int capacity = INITIAL_CAPACITY;
  private int used;
  private boolean hasEmptyKey;

  /** Adds a key; returns true when it was not there. */
  public boolean add(long key) {
    if (key == EMPTY) {
      boolean added = !hasEmptyKey;
      hasEmptyKey = true;
      return added;
    }
    int mask = capacity - 1;
    int i = mix(key) & mask;
    long s;
    while ((s = slot(i)) != EMPTY) {
      if (s == key) {
        return false;
      }
      i = (i + 1) & mask;
    }
    setSlot(i, key);
    if (++used > capacity * MAX_LOAD) {
      grow();
    }
    return true;
  }

  /** Adds all keys of {@code other}. */
  public void addAll(LongHashSet other) {
    for (int i = 0; i < other.capacity; i++) {
      long k = other.slot(i);
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
    int mask = capacity - 1;
    int i = mix(key) & mask;
    long s;
    while ((s = slot(i)) != EMPTY) {
      if (s == key) {
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
    for (int i = 0; i < capacity; i++) {
      long k = slot(i);
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

  /** Whether the slots are in scratch memory outside the heap. */
  boolean offHeap() {
    return outside != null;
  }

  private long slot(int i) {
    return slots != null ? slots[i] : outside.get(i);
  }

  private void setSlot(int i, long key) {
    if (slots != null) {
      slots[i] = key;
    } else {
      outside.put(i, key);
    }
  }

  private void grow() {
    if (capacity > (1 << 29)) {
      throw new IllegalStateException("too many keys for one set: " + used);
    }
    long[] oldHeap = slots;
    LongBuffer oldOutside = outside;
    int oldCapacity = capacity;
    capacity = oldCapacity * 2;
    if (capacity <= HEAP_SLOTS) {
      slots = newSlots(capacity);
    } else {
      slots = null;
      outside = ScratchMemory.map(8L * capacity).asLongBuffer();
      for (int i = 0; i < capacity; i++) {
        outside.put(i, EMPTY);
      }
    }
    used = 0;
    for (int i = 0; i < oldCapacity; i++) {
      long k = oldHeap != null ? oldHeap[i] : oldOutside.get(i);
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
