package org.clearance.survey;

import java.nio.charset.StandardCharsets;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.Objects;
import java.util.Optional;

/**
 * How {@link LasWriter} writes a LAS file.
 *
 * <p>Coordinates arrive in metres ({@link PointChunk}) and are written in the CRS's own units:
 * {@code integer = round((metres / unit - offset) / scale)}. Without a CRS the metre values are
 * written as they are and the file states no unit.
 *
 * @param versionMinor LAS minor version: 2 (LAS 1.2, formats 0-3) or 4 (LAS 1.4, formats 0-10)
 * @param pointFormat point data record format
 * @param scaleX x scale, file units per integer step, finite and &gt; 0
 * @param scaleY y scale
 * @param scaleZ z scale
 * @param offsetX x offset, file units, finite
 * @param offsetY y offset
 * @param offsetZ z offset
 * @param crs units and CRS to state: GeoTIFF keys for formats 0-5, a WKT record (and the global
 *     encoding WKT bit) for formats 6-10; the WKT is {@link SurveyUnits#wkt()} when given, else a
 *     local engineering CRS stating only the units; empty writes no CRS record
 * @param systemId system identifier, at most 32 ASCII characters
 * @param software generating software, at most 32 ASCII characters
 * @param extraBytes bytes added to each record after the standard fields (written as zeros; LAS
 *     1.4 files describe them in an Extra Bytes record), 0 or more
 * @param adjustedGpsTime sets global encoding bit 0: GPS times are adjusted standard GPS time
 * @param fileSourceId file source id, 0-65535
 * @param creationDate file creation date written in the header
 */
public record LasWriterOptions(
    int versionMinor,
    PointFormat pointFormat,
    double scaleX,
    double scaleY,
    double scaleZ,
    double offsetX,
    double offsetY,
    double offsetZ,
    Optional<SurveyUnits> crs,
    String systemId,
    String software,
    int extraBytes,
    boolean adjustedGpsTime,
    int fileSourceId,
    LocalDate creationDate) {

  /** Default coordinate resolution: one millimetre (in file units). */
  public static final double DEFAULT_SCALE = 0.001;
  /** Length of the system identifier and software text fields, bytes. */
  static final int TEXT_FIELD_BYTES = 32;
  /** Largest record length the 16-bit header field can state. */
  static final int MAX_RECORD_LENGTH = 0xFFFF;

  public LasWriterOptions {
    Objects.requireNonNull(pointFormat, "pointFormat");
    Objects.requireNonNull(crs, "crs");
    Objects.requireNonNull(systemId, "systemId");
    Objects.requireNonNull(software, "software");
    Objects.requireNonNull(creationDate, "creationDate");
    if (versionMinor != 2 && versionMinor != 4) {
      throw new IllegalArgumentException("LAS 1." + versionMinor + " is not written (1.2, 1.4)");
    }
    if (!pointFormat.allowedIn(versionMinor)) {
      throw new IllegalArgumentException(
          "LAS 1." + versionMinor + " cannot hold point format " + pointFormat.id());
    }
    for (double s : new double[] {scaleX, scaleY, scaleZ}) {
      if (!(Double.isFinite(s) && s > 0)) {
        throw new IllegalArgumentException("scale must be finite and > 0: " + s);
      }
    }
    for (double o : new double[] {offsetX, offsetY, offsetZ}) {
      if (!Double.isFinite(o)) {
        throw new IllegalArgumentException("offset must be finite: " + o);
      }
    }
    checkText("systemId", systemId);
    checkText("software", software);
    if (extraBytes < 0 || pointFormat.minRecordLength() + extraBytes > MAX_RECORD_LENGTH) {
      throw new IllegalArgumentException("extraBytes out of range: " + extraBytes);
    }
    if (fileSourceId < 0 || fileSourceId > 0xFFFF) {
      throw new IllegalArgumentException("fileSourceId must be 0-65535: " + fileSourceId);
    }
  }

  private static void checkText(String what, String text) {
    if (text.getBytes(StandardCharsets.US_ASCII).length > TEXT_FIELD_BYTES
        || !StandardCharsets.US_ASCII.newEncoder().canEncode(text)) {
      throw new IllegalArgumentException(what + " must be at most 32 ASCII characters: " + text);
    }
  }

  /**
   * Options with defaults: scale {@link #DEFAULT_SCALE}, offset 0, no CRS, no system id,
   * software "Clearance", no extra bytes, adjusted GPS time, file source 0, today's UTC date.
   */
  public static LasWriterOptions of(int versionMinor, PointFormat pointFormat) {
    return new LasWriterOptions(versionMinor, pointFormat, DEFAULT_SCALE, DEFAULT_SCALE,
        DEFAULT_SCALE, 0, 0, 0, Optional.empty(), "", "Clearance", 0, true, 0,
        LocalDate.now(ZoneOffset.UTC));
  }

  /** The record length written: the format's standard length plus the extra bytes. */
  public int recordLength() {
    return pointFormat.minRecordLength() + extraBytes;
  }

  public LasWriterOptions withScale(double x, double y, double z) {
    return new LasWriterOptions(versionMinor, pointFormat, x, y, z, offsetX, offsetY, offsetZ,
        crs, systemId, software, extraBytes, adjustedGpsTime, fileSourceId, creationDate);
  }

  public LasWriterOptions withOffset(double x, double y, double z) {
    return new LasWriterOptions(versionMinor, pointFormat, scaleX, scaleY, scaleZ, x, y, z,
        crs, systemId, software, extraBytes, adjustedGpsTime, fileSourceId, creationDate);
  }

  public LasWriterOptions withCrs(SurveyUnits units) {
    return new LasWriterOptions(versionMinor, pointFormat, scaleX, scaleY, scaleZ, offsetX,
        offsetY, offsetZ, Optional.of(units), systemId, software, extraBytes, adjustedGpsTime,
        fileSourceId, creationDate);
  }

  public LasWriterOptions withSystemId(String text) {
    return new LasWriterOptions(versionMinor, pointFormat, scaleX, scaleY, scaleZ, offsetX,
        offsetY, offsetZ, crs, text, software, extraBytes, adjustedGpsTime, fileSourceId,
        creationDate);
  }

  public LasWriterOptions withSoftware(String text) {
    return new LasWriterOptions(versionMinor, pointFormat, scaleX, scaleY, scaleZ, offsetX,
        offsetY, offsetZ, crs, systemId, text, extraBytes, adjustedGpsTime, fileSourceId,
        creationDate);
  }

  public LasWriterOptions withExtraBytes(int count) {
    return new LasWriterOptions(versionMinor, pointFormat, scaleX, scaleY, scaleZ, offsetX,
        offsetY, offsetZ, crs, systemId, software, count, adjustedGpsTime, fileSourceId,
        creationDate);
  }

  public LasWriterOptions withAdjustedGpsTime(boolean adjusted) {
    return new LasWriterOptions(versionMinor, pointFormat, scaleX, scaleY, scaleZ, offsetX,
        offsetY, offsetZ, crs, systemId, software, extraBytes, adjusted, fileSourceId,
        creationDate);
  }

  public LasWriterOptions withFileSourceId(int id) {
    return new LasWriterOptions(versionMinor, pointFormat, scaleX, scaleY, scaleZ, offsetX,
        offsetY, offsetZ, crs, systemId, software, extraBytes, adjustedGpsTime, id,
        creationDate);
  }

  public LasWriterOptions withCreationDate(LocalDate date) {
    return new LasWriterOptions(versionMinor, pointFormat, scaleX, scaleY, scaleZ, offsetX,
        offsetY, offsetZ, crs, systemId, software, extraBytes, adjustedGpsTime, fileSourceId,
        date);
  }
}
