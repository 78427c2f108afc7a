package org.clearance.ground;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;

/**
 * Cuts the occupied part of a {@link SparseGrid} into square blocks that are processed one at a
 * time as small dense rasters, each read with an overlap on all sides so that window operations
 * near the block's edge see their neighbours. Only blocks holding at least one tile are listed, so
 * the work and the memory follow the corridor.
 */
final class BlockTiling {
  private BlockTiling() {}

  /**
   * One block: its core is {@code size x size} cells from {@code (col0, row0)}; it is read with
   * {@code overlap} extra cells on every side.
   *
   * @param col0 first column of the core
   * @param row0 first row of the core
   * @param size core side, cells
   * @param overlap extra cells read on each side
   */
  record Block(int col0, int row0, int size, int overlap) {
    /** First column read. */
    int readCol0() {
      return col0 - overlap;
    }

    /** First row read. */
    int readRow0() {
      return row0 - overlap;
    }

    /** Side of the read raster, cells. */
    int readSize() {
      return size + 2 * overlap;
    }

    /** True when read-raster cell {@code (c, r)} lies in the core. */
    boolean inCore(int c, int r) {
      return c >= overlap && c < overlap + size && r >= overlap && r < overlap + size;
    }
  }

  /**
   * Blocks covering every tile of {@code grid}, in row-major order.
   *
   * @param blockCells wanted core side in cells (&gt;= 1); rounded up to whole tiles
   * @param overlapCells cells read beyond the core on each side, &gt;= 0
   */
  static List<Block> cover(SparseGrid grid, int blockCells, int overlapCells) {
    int tile = grid.tileCells();
    int tilesPerBlock = Math.max(1, (blockCells + tile - 1) / tile);
    int size = tilesPerBlock * tile;
    TreeSet<Long> keys = new TreeSet<>();
    for (long k : grid.tileKeys()) {
      long bc = Math.floorDiv(SparseGrid.keyColumn(k), tilesPerBlock);
      long br = Math.floorDiv(SparseGrid.keyRow(k), tilesPerBlock);
      keys.add((br << 32) | (bc & 0xffffffffL));
    }
    List<Block> out = new ArrayList<>(keys.size());
    for (long key : keys) {
      int br = (int) (key >> 32);
      int bc = (int) key;
      out.add(new Block(bc * size, br * size, size, overlapCells));
    }
    return out;
  }

  /**
   * The read windows of the blocks that {@link #cover} lays over cells {@code [col0, col1] x
   * [row0, row1]}: {@code {firstCol, firstRow, endCol, endRow}} (end exclusive), cells.
   */
  static List<int[]> windows(int tileCells, int blockCells, int overlapCells, int col0, int row0,
      int col1, int row1) {
    int tilesPerBlock = Math.max(1, (blockCells + tileCells - 1) / tileCells);
    int size = tilesPerBlock * tileCells;
    List<int[]> out = new ArrayList<>();
    for (int br = Math.floorDiv(row0, size); br <= Math.floorDiv(row1, size); br++) {
      for (int bc = Math.floorDiv(col0, size); bc <= Math.floorDiv(col1, size); bc++) {
        out.add(new int[] {bc * size - overlapCells, br * size - overlapCells,
            (bc + 1) * size + overlapCells, (br + 1) * size + overlapCells});
      }
    }
    return out;
  }
}
