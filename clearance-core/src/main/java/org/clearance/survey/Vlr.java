package org.clearance.survey;

import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.Objects;

/**
 * A variable length record (VLR, 54-byte header) or extended VLR (EVLR, 60-byte header) of a LAS
 * file.
 *
 * <p>Source: ASPRS LAS Specification 1.4 R15, sections 2.5 (VLR) and 2.7 (EVLR).
 *
 * @param userId user id text, e.g. {@code LASF_Projection}
 * @param recordId record id, 0-65535
 * @param description description text
 * @param extended true for an EVLR
 * @param headerOffset byte offset of the record's header in the file
 * @param dataLength length of the payload after the header, bytes
 * @param data the payload, or an empty array when it was too large to load (only EVLRs, see
 *     {@link #isLoaded()})
 */
public record Vlr(
    String userId,
    int recordId,
    String description,
    boolean extended,
    long headerOffset,
    long dataLength,
    byte[] data) {

  /** User id of the coordinate system records (LAS 1.4 R15, section 2.5.1). */
  public static final String PROJECTION_USER_ID = "LASF_Projection";
  /** User id of the records the specification defines itself (extra bytes, waveforms). */
  public static final String SPEC_USER_ID = "LASF_Spec";
  /** Record id of the OGC coordinate system WKT record. */
  public static final int WKT_RECORD = 2112;
  /** Record id of the GeoTIFF GeoKeyDirectoryTag record. */
  public static final int GEO_KEY_DIRECTORY = 34735;
  /** Record id of the GeoTIFF GeoDoubleParamsTag record. */
  public static final int GEO_DOUBLE_PARAMS = 34736;
  /** Record id of the GeoTIFF GeoAsciiParamsTag record. */
  public static final int GEO_ASCII_PARAMS = 34737;
  /** Record id of the extra bytes description record (user id LASF_Spec). */
  public static final int EXTRA_BYTES_RECORD = 4;

  public Vlr {
    Objects.requireNonNull(userId, "userId");
    Objects.requireNonNull(description, "description");
    data = data.clone();
  }

  /** A copy of the payload. */
  @Override
  public byte[] data() {
    return data.clone();
  }

  /** True when the payload was loaded ({@link #data()} holds all {@link #dataLength()} bytes). */
  public boolean isLoaded() {
    return data.length == dataLength;
  }

  /** True when this is the given record of the given user id. */
  public boolean is(String user, int record) {
    return userId.equals(user) && recordId == record;
  }

  /** The payload as text up to the first NUL (WKT and GeoTIFF ASCII records); US-ASCII/UTF-8. */
  public String dataAsText() {
    int end = 0;
    while (end < data.length && data[end] != 0) {
      end++;
    }
    return new String(data, 0, end, StandardCharsets.UTF_8);
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof Vlr v
        && userId.equals(v.userId)
        && recordId == v.recordId
        && description.equals(v.description)
        && extended == v.extended
        && headerOffset == v.headerOffset
        && dataLength == v.dataLength
        && Arrays.equals(data, v.data);
  }

  @Override
  public int hashCode() {
    return Objects.hash(userId, recordId, extended, headerOffset, dataLength);
  }

  @Override
  public String toString() {
    return "Vlr[" + userId + " " + recordId + (extended ? " (extended)" : "") + ", "
        + dataLength + " bytes]";
  }
}
