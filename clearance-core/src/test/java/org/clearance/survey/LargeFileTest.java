package org.clearance.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Files larger than 2 GB (and 4 GB): sparse files whose point data start beyond 2^31 bytes and
 * whose extended VLR sits beyond 2^32 bytes, so every offset must be a 64-bit long. The holes
 * take no disk space.
 */
class LargeFileTest {
  private static final long POINTS_AT = (1L << 31) + 100;
  private static final long EVLR_AT = (1L << 32) + 64;

  @TempDir Path dir;

  @Test
  void pointsBeyond2GbAreRead() throws IOException {
    Path p = dir.resolve("sparse.las");
    TinyLas t = new TinyLas().format(0).pointOffset(POINTS_AT).scale(0.01, 0.01, 0.01);
    byte[][] records = {
      TinyLas.format0(100, 200, 300, 2, 0x09),
      TinyLas.format0(-100, 50, 7, 5, 0x09),
      TinyLas.format0(123456, 654321, 999, 14, 0x12)
    };
    for (byte[] r : records) {
      t.point(r);
    }
    try (RandomAccessFile f = new RandomAccessFile(p.toFile(), "rw")) {
      f.write(t.head());
      f.setLength(POINTS_AT + 3 * 20);
      f.seek(POINTS_AT);
      for (byte[] r : records) {
        f.write(r);
      }
    }
    Survey s = Survey.open(List.of(p), UnitsChoice.of(LinearUnit.METRE));
    assertEquals(POINTS_AT, s.files().get(0).header().pointDataOffset());
    List<double[]> got = new ArrayList<>();
    s.read(c -> {
      for (int i = 0; i < c.size(); i++) {
        got.add(new double[] {c.x()[i], c.y()[i], c.z()[i], c.classification()[i],
            c.returnNumber()[i], c.numberOfReturns()[i]});
      }
    });
    // integer * 0.01 (scale) + 0 (offset); return byte 0x09 = return 1 of 1, 0x12 = 2 of 2.
    assertEquals(3, got.size());
    assertEquals(1.00, got.get(0)[0], 1e-12);
    assertEquals(-1.00, got.get(1)[0], 1e-12);
    assertEquals(6543.21, got.get(2)[1], 1e-9);
    assertEquals(9.99, got.get(2)[2], 1e-12);
    assertEquals(14, got.get(2)[3], 0);
    assertEquals(2, got.get(2)[4], 0);
    assertEquals(2, got.get(2)[5], 0);
    assertEquals(60, s.rawScan());
  }

  @Test
  void extendedVlrBeyond4GbIsRead() throws IOException {
    Path p = dir.resolve("sparse14.las");
    TinyLas t = new TinyLas().minor(4).format(6).pointOffset(POINTS_AT)
        .globalEncoding(LasHeader.WKT_BIT);
    t.point(new byte[30]);
    ByteBuffer head = ByteBuffer.wrap(t.head()).order(ByteOrder.LITTLE_ENDIAN);
    head.putLong(235, EVLR_AT).putInt(243, 1);
    byte[] wkt = "PROJCS[\"p\",GEOGCS[\"g\"],UNIT[\"foot\",0.3048]]\0"
        .getBytes(StandardCharsets.US_ASCII);
    ByteBuffer evlr = ByteBuffer.allocate(60).order(ByteOrder.LITTLE_ENDIAN);
    evlr.put(2, "LASF_Projection".getBytes(StandardCharsets.US_ASCII));
    evlr.putShort(18, (short) Vlr.WKT_RECORD).putLong(20, wkt.length);
    try (RandomAccessFile f = new RandomAccessFile(p.toFile(), "rw")) {
      f.write(head.array());
      f.setLength(EVLR_AT);
      f.seek(EVLR_AT);
      f.write(evlr.array());
      f.write(wkt);
    }
    LasFile file = LasFile.open(p);
    assertTrue(file.size() > (1L << 32));
    assertEquals(1, file.evlrs().size());
    assertEquals(EVLR_AT, file.evlrs().get(0).headerOffset());
    assertEquals(Optional.of(LinearUnit.FOOT), file.crs().horizontal());
  }
}
