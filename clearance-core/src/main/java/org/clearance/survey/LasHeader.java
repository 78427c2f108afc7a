package org.clearance.survey;

import java.util.List;
import java.util.Locale;
import java.util.Objects;

/**
 * The public header block of a LAS file, as written (coordinates in the file's own units).
 *
 * <p>Source: ASPRS LAS Specification 1.4 R15, section 2.4 (public header block); the 1.0-1.3
 * headers are prefixes of it (227 bytes up to 1.2, 235 in 1.3, 375 in 1.4).
 *
 * @param versionMajor LAS major version, 1
 * @param versionMinor LAS minor version, 0-4
 * @param fileSourceId file source (flight line) id, 0-65535
 * @param globalEncoding global encoding bit field, 0-65535
 * @param projectId project GUID as 8-4-4-4-12 hexadecimal digits
 * @param systemId system identifier text
 * @param software generating software text
 * @param creationDay day of year the file was created, 1-366 (0 when not set)
 * @param creationYear year the file was created (0 when not set)
 * @param headerSize header size in bytes as written (at least the version's standard size)
 * @param pointDataOffset byte offset of the first point record
 * @param vlrCount number of variable length records
 * @param pointFormat point data record format
 * @param recordLength point record length in bytes (at least the format's minimum)
 * @param pointCount number of point records (the 64-bit count in LAS 1.4 when set)
 * @param legacyPointCount the 32-bit point count field as written
 * @param pointsByReturn point counts by return number 1..n (5 entries before LAS 1.4, 15 after)
 * @param scaleX scale factor of x, file units per integer step (finite, non-zero)
 * @param scaleY scale factor of y
 * @param scaleZ scale factor of z
 * @param offsetX offset of x, file units (finite)
 * @param offsetY offset of y
 * @param offsetZ offset of z
 * @param minX smallest x as written in the header, file units
 * @param minY smallest y
 * @param minZ smallest z
 * @param maxX largest x
 * @param maxY largest y
 * @param maxZ largest z
 * @param waveformStart LAS 1.3-1.4: byte offset of the waveform data packet record, 0 if none
 * @param evlrStart LAS 1.4: byte offset of the first extended VLR, 0 if none
 * @param evlrCount LAS 1.4: number of extended VLRs
 */
public record LasHeader(
    int versionMajor,
    int versionMinor,
    int fileSourceId,
    int globalEncoding,
    String projectId,
    String systemId,
    String software,
    int creationDay,
    int creationYear,
    int headerSize,
    long pointDataOffset,
    long vlrCount,
    PointFormat pointFormat,
    int recordLength,
    long pointCount,
    long legacyPointCount,
    List<Long> pointsByReturn,
    double scaleX,
    double scaleY,
    double scaleZ,
    double offsetX,
    double offsetY,
    double offsetZ,
    double minX,
    double minY,
    double minZ,
    double maxX,
    double maxY,
    double maxZ,
    long waveformStart,
    long evlrStart,
    long evlrCount) {

  /** Global encoding bit 0: GPS time is adjusted standard GPS time (LAS 1.4 R15, table 4). */
  public static final int GPS_ADJUSTED_BIT = 1;
  /** Global encoding bit 4: the CRS is given as WKT (LAS 1.4 R15, table 4). */
  public static final int WKT_BIT = 1 << 4;

  public LasHeader {
    Objects.requireNonNull(projectId, "projectId");
    Objects.requireNonNull(systemId, "systemId");
    Objects.requireNonNull(software, "software");
    Objects.requireNonNull(pointFormat, "pointFormat");
    pointsByReturn = List.copyOf(pointsByReturn);
  }

  /** The standard header size of a LAS minor version: 227 (1.0-1.2), 235 (1.3), 375 (1.4). */
  public static int standardHeaderSize(int minor) {
    return minor >= 4 ? 375 : minor == 3 ? 235 : 227;
  }

  /** The version as text, e.g. {@code "1.4"}. */
  public String version() {
    return versionMajor + "." + versionMinor;
  }

  /** Bytes per record beyond the format's standard fields (skipped by the reader), 0 or more. */
  public int extraBytes() {
    return recordLength - pointFormat.minRecordLength();
  }

  /** Byte offset just past the last point record. */
  public long pointDataEnd() {
    return pointDataOffset + pointCount * recordLength;
  }

  /** True when global encoding bit 4 says the CRS is given as WKT. */
  public boolean wktGoverns() {
    return (globalEncoding & WKT_BIT) != 0;
  }

  /** True when global encoding bit 0 says GPS time is adjusted standard GPS time. */
  public boolean adjustedGpsTime() {
    return (globalEncoding & GPS_ADJUSTED_BIT) != 0;
  }

  @Override
  public String toString() {
    return String.format(
        Locale.ROOT,
        "LasHeader[LAS %s, format %d, record %d bytes, %d points, offset %d]",
        version(),
        pointFormat.id(),
        recordLength,
        pointCount,
        pointDataOffset);
  }
}
