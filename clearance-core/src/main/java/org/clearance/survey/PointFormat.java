package org.clearance.survey;

/**
 * The eleven ASPRS LAS point data record formats and where each field sits in a record.
 *
 * <p>Source: ASPRS LAS Specification 1.4 R15, section 2.6 (point data record formats 0-10).
 * Formats 0-5 share a 20-byte core (3-bit return numbers, 5-bit class, scan angle rank); formats
 * 6-10 share a 30-byte core (4-bit return numbers, full class byte, 16-bit scan angle in 0.006
 * degree steps, GPS time always present). Wave packet fields (formats 4, 5, 9, 10) are skipped by
 * the reader and written as zeros (no waveform) by the writer.
 */
public enum PointFormat {
  F0(0, 20, -1, -1, -1, -1),
  F1(1, 28, 20, -1, -1, -1),
  F2(2, 26, -1, 20, -1, -1),
  F3(3, 34, 20, 28, -1, -1),
  F4(4, 57, 20, -1, -1, 28),
  F5(5, 63, 20, 28, -1, 34),
  F6(6, 30, 22, -1, -1, -1),
  F7(7, 36, 22, 30, -1, -1),
  F8(8, 38, 22, 30, 36, -1),
  F9(9, 59, 22, -1, -1, 30),
  F10(10, 67, 22, 30, 36, 38);

  /** Length of a wave packet descriptor, bytes (LAS 1.4 R15, table 21). */
  static final int WAVE_PACKET_BYTES = 29;

  private final int id;
  private final int minRecordLength;
  private final int gpsOffset;
  private final int rgbOffset;
  private final int nirOffset;
  private final int waveOffset;

  PointFormat(int id, int minLength, int gps, int rgb, int nir, int wave) {
    this.id = id;
    this.minRecordLength = minLength;
    this.gpsOffset = gps;
    this.rgbOffset = rgb;
    this.nirOffset = nir;
    this.waveOffset = wave;
  }

  /** The format number, 0-10. */
  public int id() {
    return id;
  }

  /** The standard record length, bytes; a file may declare longer records (extra bytes). */
  public int minRecordLength() {
    return minRecordLength;
  }

  /** True for formats 6-10 (the LAS 1.4 extended core). */
  public boolean isExtended() {
    return id >= 6;
  }

  /** True when records carry GPS time. */
  public boolean hasGpsTime() {
    return gpsOffset >= 0;
  }

  /** True when records carry red, green and blue. */
  public boolean hasRgb() {
    return rgbOffset >= 0;
  }

  /** True when records carry near infrared. */
  public boolean hasNir() {
    return nirOffset >= 0;
  }

  /** True when records carry a wave packet descriptor (skipped). */
  public boolean hasWavePacket() {
    return waveOffset >= 0;
  }

  /** Byte offset of GPS time within a record, or -1. */
  int gpsOffset() {
    return gpsOffset;
  }

  /** Byte offset of red (green and blue follow), or -1. */
  int rgbOffset() {
    return rgbOffset;
  }

  /** Byte offset of near infrared, or -1. */
  int nirOffset() {
    return nirOffset;
  }

  /** Byte offset of the wave packet descriptor, or -1. */
  int waveOffset() {
    return waveOffset;
  }

  /** Highest return number the format can hold: 7 (3 bits) or 15 (4 bits). */
  public int maxReturnNumber() {
    return isExtended() ? 15 : 7;
  }

  /** Highest class code the format can hold: 31 (5 bits) or 255. */
  public int maxClassification() {
    return isExtended() ? 255 : 31;
  }

  /** True when a file of LAS minor version {@code minor} (0-4) may hold this format. */
  public boolean allowedIn(int minor) {
    switch (minor) {
      case 0:
      case 1:
        return id <= 1;
      case 2:
        return id <= 3;
      case 3:
        return id <= 5;
      default:
        return true;
    }
  }

  /** The format with number {@code id}, or null when there is none. */
  public static PointFormat ofId(int id) {
    PointFormat[] all = values();
    return id >= 0 && id < all.length ? all[id] : null;
  }
}
