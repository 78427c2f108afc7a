package org.clearance.survey;

/**
 * Names of the ASPRS standard point classes.
 *
 * <p>Source: ASPRS LAS Specification 1.4 R15, table 9 (formats 0-5) and table 17 (formats 6-10);
 * see docs/check-values.md section 1. Formats 0-5 define classes 0-9 and 12 (8 model
 * key-point, 12 overlap); classes 10-11 and 13-18 are reserved there but used with the formats
 * 6-10 meaning in practice (common practice, no source), so those names are given with that
 * remark.
 */
public final class AsprsClasses {
  private static final String[] EXTENDED = {
    "never classified",
    "unclassified",
    "ground",
    "low vegetation",
    "medium vegetation",
    "high vegetation",
    "building",
    "low point (noise)",
    "reserved",
    "water",
    "rail",
    "road surface",
    "reserved",
    "wire - guard (shield)",
    "wire - conductor (phase)",
    "transmission tower",
    "wire-structure connector (insulator)",
    "bridge deck",
    "high noise",
    "overhead structure",
    "ignored ground",
    "snow",
    "temporal exclusion"
  };

  private AsprsClasses() {}

  /**
   * The name of a class code.
   *
   * @param code class code, 0-255
   * @param legacy true when points of formats 0-5 carry the code
   * @param extended true when points of formats 6-10 carry the code
   * @return the name; both meanings joined by " / " when they differ
   */
  public static String name(int code, boolean legacy, boolean extended) {
    String a = legacy ? legacyName(code) : null;
    String b = extended || !legacy ? extendedName(code) : null;
    if (a == null) {
      return b;
    }
    if (b == null || a.equals(b)) {
      return a;
    }
    return a + " / " + b;
  }

  /** Name of a code in formats 6-10. */
  public static String extendedName(int code) {
    if (code >= 0 && code < EXTENDED.length) {
      return EXTENDED[code];
    }
    if (code >= 64 && code <= 255) {
      return "user definable";
    }
    return "reserved";
  }

  /** Name of a code in formats 0-5 (codes 0-31). */
  public static String legacyName(int code) {
    switch (code) {
      case 8:
        return "model key-point (mass point)";
      case 12:
        return "overlap";
      case 10:
      case 11:
      case 13:
      case 14:
      case 15:
      case 16:
      case 17:
      case 18:
        return extendedName(code) + " (reserved in formats 0-5)";
      default:
        return code >= 0 && code <= 9 ? extendedName(code) : "reserved";
    }
  }
}
