package org.clearance.ground;

import java.util.Arrays;

/**
 * A max-priority queue of raster cells (int index, float priority) as a binary heap on parallel
 * arrays, so flooding a canopy raster does not box a value per cell.
 */
final class CellQueue {
  private int[] cells = new int[64];
  private float[] keys = new float[64];
  private int size;

  boolean isEmpty() {
    return size == 0;
  }

  void push(int cell, float key) {
    if (size == cells.length) {
      cells = Arrays.copyOf(cells, size * 2);
      keys = Arrays.copyOf(keys, size * 2);
    }
    int i = size++;
    while (i > 0) {
      int parent = (i - 1) >>> 1;
      if (keys[parent] >= key) {
        break;
      }
      cells[i] = cells[parent];
      keys[i] = keys[parent];
      i = parent;
    }
    cells[i] = cell;
    keys[i] = key;
  }

  /** Removes and returns the cell with the highest key. */
  int pop() {
    int top = cells[0];
    int cell = cells[--size];
    float key = keys[size];
    int i = 0;
    while (true) {
      int child = 2 * i + 1;
      if (child >= size) {
        break;
      }
      if (child + 1 < size && keys[child + 1] > keys[child]) {
        child++;
      }
      if (keys[child] <= key) {
        break;
      }
      cells[i] = cells[child];
      keys[i] = keys[child];
      i = child;
    }
    cells[i] = cell;
    keys[i] = key;
    return top;
  }
}
