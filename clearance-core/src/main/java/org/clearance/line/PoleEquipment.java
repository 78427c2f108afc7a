package org.clearance.line;

import java.util.Locale;

/**
 * Equipment a structure carries, as the structures file's {@code equipment} column lists it
 * (issue 15): the kinds that pole-clearing rules such as California PRC 4292 name (from
 * memory, not verified: poles supporting a switch, fuse, transformer, lightning arrester, line
 * junction, dead-end or corner).
 */
public enum PoleEquipment {
  TRANSFORMER,
  SWITCH,
  FUSE,
  ARRESTER,
  DEAD_END,
  CORNER;

  /** The name as files write it: lower case, {@code dead_end}. */
  public String fileName() {
    return name().toLowerCase(Locale.ROOT);
  }

  /**
   * The kind a file's word names ({@code dead-end} is accepted for {@code dead_end}), or null.
   */
  public static PoleEquipment ofFileName(String word) {
    String w = word.strip().toLowerCase(Locale.ROOT).replace('-', '_');
    for (PoleEquipment e : values()) {
      if (e.fileName().equals(w)) {
        return e;
      }
    }
    return null;
  }
}
