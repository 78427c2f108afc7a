package org.clearance.report;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;

/**
 * An independent reader of GeoPackage geometry blobs for tests, written from the standard's
 * text (OGC GeoPackage 1.3 clause 2.1.3; ISO WKB of OGC Simple Features 1.2.1 clause 8.2.8), not
 * from the writer: it honours either byte order in the header and in the WKB and every envelope
 * code 0-4.
 */
final class GpkgBlobReader {

  /** A decoded blob. */
  record Blob(int srsId, int envelopeCode, double[] envelope, int wkbType, double[] coords,
      int dimension) {}

  private GpkgBlobReader() {}

  static Blob read(byte[] blob) {
    if (blob[0] != 'G' || blob[1] != 'P') {
      throw new IllegalArgumentException("not a GeoPackage blob");
    }
    if (blob[2] != 0) {
      throw new IllegalArgumentException("version " + blob[2]);
    }
    int flags = blob[3] & 0xFF;
    if ((flags & 0x20) != 0) {
      throw new IllegalArgumentException("extended geometry type");
    }
    ByteOrder headerOrder = (flags & 1) == 1 ? ByteOrder.LITTLE_ENDIAN : ByteOrder.BIG_ENDIAN;
    int envelopeCode = (flags >> 1) & 0x7;
    int envelopeDoubles = switch (envelopeCode) {
      case 0 -> 0;
      case 1 -> 4;
      case 2, 3 -> 6;
      case 4 -> 8;
      default -> throw new IllegalArgumentException("envelope code " + envelopeCode);
    };
    ByteBuffer b = ByteBuffer.wrap(blob).order(headerOrder);
    b.position(4);
    int srs = b.getInt();
    double[] env = new double[envelopeDoubles];
    for (int i = 0; i < envelopeDoubles; i++) {
      env[i] = b.getDouble();
    }
    byte wkbOrder = b.get();
    b.order(wkbOrder == 1 ? ByteOrder.LITTLE_ENDIAN : ByteOrder.BIG_ENDIAN);
    int type = b.getInt();
    int base = type % 1000;
    int dim = switch (type / 1000) {
      case 0 -> 2;
      case 1, 2 -> 3;
      case 3 -> 4;
      default -> throw new IllegalArgumentException("WKB type " + type);
    };
    int n = switch (base) {
      case 1 -> 1;
      case 2 -> b.getInt();
      default -> throw new IllegalArgumentException("WKB type " + type + " not read here");
    };
    double[] coords = new double[n * dim];
    for (int i = 0; i < coords.length; i++) {
      coords[i] = b.getDouble();
    }
    if (b.hasRemaining()) {
      throw new IllegalArgumentException(b.remaining() + " bytes after the geometry");
    }
    return new Blob(srs, envelopeCode, env, type, coords, dim);
  }
}
