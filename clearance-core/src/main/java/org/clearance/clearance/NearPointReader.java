package org.clearance.clearance;

import java.io.BufferedInputStream;
import java.io.DataInputStream;
import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.Consumer;
import org.clearance.InputException;

/** Reads {@link NearPointFile near-points.bin} back, streaming, one record at a time. */
public final class NearPointReader {

  private NearPointReader() {}

  /** Reads only the header. */
  public static NearPointFile header(Path file) throws IOException {
    try (DataInputStream in = open(file)) {
      return readHeader(file, in);
    }
  }

  /** Calls {@code sink} for every record in file order; returns the header. */
  public static NearPointFile forEach(Path file, Consumer<PointClearance> sink) throws IOException {
    try (DataInputStream in = open(file)) {
      NearPointFile layout = readHeader(file, in);
      int n = layout.conditions().size();
      byte[] rec = new byte[layout.recordBytes()];
      ByteBuffer buf = ByteBuffer.wrap(rec).order(ByteOrder.LITTLE_ENDIAN);
      long index = 0;
      while (true) {
        int got = in.readNBytes(rec, 0, rec.length);
        if (got == 0) {
          return layout;
        }
        if (got < rec.length) {
          throw new InputException(file, "record " + index, null,
              "truncated record: the run folder is damaged; run the check again");
        }
        buf.clear();
        int span = buf.getInt();
        double x = buf.getDouble();
        double y = buf.getDouble();
        double z = buf.getDouble();
        int cls = buf.getShort();
        double hag = buf.getFloat();
        List<ConditionDistance> ds = new ArrayList<>(n);
        for (int c = 0; c < n; c++) {
          double d = buf.getFloat();
          double h = buf.getFloat();
          double v = buf.getFloat();
          int conductor = buf.getShort();
          double st = buf.getFloat();
          ds.add(new ConditionDistance(layout.conditions().get(c), layout.groups().get(c), d, h, v,
              conductor < 0 ? "" : layout.conductors().get(conductor), st));
        }
        if (span < 0 || span >= layout.spanIds().size()) {
          throw new InputException(file, "record " + index, "span index",
              "span index " + span + " outside the header's " + layout.spanIds().size());
        }
        sink.accept(new PointClearance(layout.spanIds().get(span), x, y, z, cls, hag, ds));
        index++;
      }
    }
  }

  private static DataInputStream open(Path file) throws IOException {
    InputStream raw = Files.newInputStream(file);
    return new DataInputStream(new BufferedInputStream(raw, 1 << 20));
  }

  private static NearPointFile readHeader(Path file, DataInputStream in) throws IOException {
    try {
      byte[] magic = in.readNBytes(NearPointFile.MAGIC.length);
      if (!Arrays.equals(magic, NearPointFile.MAGIC)) {
        throw new InputException(file, "header", "magic",
            "not a near-points file of this Clearance version");
      }
      List<String> conditions = readStrings(in);
      List<String> groups = new ArrayList<>();
      for (int i = 0; i < conditions.size(); i++) {
        groups.add(readString(in));
      }
      List<String> spans = readStrings(in);
      List<String> conductors = readStrings(in);
      return new NearPointFile(conditions, groups, spans, conductors);
    } catch (EOFException e) {
      throw new InputException(file, "header", null, "file ends inside its header");
    }
  }

  private static List<String> readStrings(DataInputStream in) throws IOException {
    int n = Integer.reverseBytes(in.readInt());
    if (n < 0 || n > 10_000_000) {
      throw new IOException("implausible list length " + n);
    }
    List<String> out = new ArrayList<>(n);
    for (int i = 0; i < n; i++) {
      out.add(readString(in));
    }
    return out;
  }

  private static String readString(DataInputStream in) throws IOException {
    int len = Short.reverseBytes(in.readShort()) & 0xFFFF;
    return new String(in.readNBytes(len), StandardCharsets.UTF_8);
  }
}
