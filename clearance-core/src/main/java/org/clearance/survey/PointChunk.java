package org.clearance.survey;

/**
 * A reusable block of survey points in structure-of-arrays form.
 *
 * <p>Readers fill a chunk, consumers read it, and the same arrays are reused for the next block, so
 * memory does not grow with the size of the survey. Coordinates are in <b>metres</b> (the survey
 * CRS's own coordinates multiplied by its linear unit), so all geometry downstream is SI; the
 * {@link SurveyUnits} of the survey convert back for output. Attributes a point format does not
 * carry are zero (GPS time: NaN).
 *
 * <p>Arrays are exposed for speed in tight loops; only indices {@code [0, size())} are valid. A
 * chunk is not thread-safe: one chunk belongs to one thread at a time.
 */
public final class PointChunk {
  /** Bit in {@link #flags()}: synthetic point. */
  public static final int FLAG_SYNTHETIC = 1;
  /** Bit in {@link #flags()}: key-point. */
  public static final int FLAG_KEY_POINT = 2;
  /** Bit in {@link #flags()}: withheld (should be treated as deleted). */
  public static final int FLAG_WITHHELD = 4;
  /** Bit in {@link #flags()}: overlap (formats 6-10 only; class 12 in formats 0-5). */
  public static final int FLAG_OVERLAP = 8;

  private final int capacity;
  private int size;
  private int fileIndex;
  private long firstRecord;

  private final double[] x;
  private final double[] y;
  private final double[] z;
  private final int[] intensity;
  private final byte[] returnNumber;
  private final byte[] numberOfReturns;
  private final short[] classification;
  private final byte[] flags;
  private final byte[] scannerChannel;
  private final byte[] scanDirection;
  private final byte[] edgeOfFlightLine;
  private final float[] scanAngle;
  private final short[] userData;
  private final int[] pointSourceId;
  private final double[] gpsTime;
  private final int[] red;
  private final int[] green;
  private final int[] blue;
  private final int[] nir;

  /** @param capacity maximum number of points held, at least 1 */
  public PointChunk(int capacity) {
    if (capacity < 1) {
      throw new IllegalArgumentException("capacity must be at least 1: " + capacity);
    }
    this.capacity = capacity;
    x = new double[capacity];
    y = new double[capacity];
    z = new double[capacity];
    intensity = new int[capacity];
    returnNumber = new byte[capacity];
    numberOfReturns = new byte[capacity];
    classification = new short[capacity];
    flags = new byte[capacity];
    scannerChannel = new byte[capacity];
    scanDirection = new byte[capacity];
    edgeOfFlightLine = new byte[capacity];
    scanAngle = new float[capacity];
    userData = new short[capacity];
    pointSourceId = new int[capacity];
    gpsTime = new double[capacity];
    red = new int[capacity];
    green = new int[capacity];
    blue = new int[capacity];
    nir = new int[capacity];
  }

  /** Empties the chunk and records where its points come from. */
  public void reset(int fileIndex, long firstRecord) {
    this.size = 0;
    this.fileIndex = fileIndex;
    this.firstRecord = firstRecord;
  }

  /** Sets the number of valid points (after a reader filled the arrays). */
  public void setSize(int size) {
    if (size < 0 || size > capacity) {
      throw new IllegalArgumentException("size " + size + " outside [0, " + capacity + "]");
    }
    this.size = size;
  }

  /**
   * Appends one point with the attributes most producers need; the others are zero (GPS time
   * NaN). Returns the index of the new point.
   *
   * @param xm easting in metres
   * @param ym northing in metres
   * @param zm elevation in metres
   * @param cls ASPRS classification code 0-255
   */
  public int add(double xm, double ym, double zm, int cls) {
    if (size == capacity) {
      throw new IllegalStateException("chunk full at " + capacity + " points");
    }
    int i = size++;
    x[i] = xm;
    y[i] = ym;
    z[i] = zm;
    classification[i] = (short) cls;
    intensity[i] = 0;
    returnNumber[i] = 1;
    numberOfReturns[i] = 1;
    flags[i] = 0;
    scannerChannel[i] = 0;
    scanDirection[i] = 0;
    edgeOfFlightLine[i] = 0;
    scanAngle[i] = 0f;
    userData[i] = 0;
    pointSourceId[i] = 0;
    gpsTime[i] = Double.NaN;
    red[i] = 0;
    green[i] = 0;
    blue[i] = 0;
    nir[i] = 0;
    return i;
  }

  /** Copies point {@code i} of {@code src} to the end of this chunk; returns its new index. */
  public int addCopy(PointChunk src, int i) {
    int j = add(src.x[i], src.y[i], src.z[i], src.classification[i]);
    intensity[j] = src.intensity[i];
    returnNumber[j] = src.returnNumber[i];
    numberOfReturns[j] = src.numberOfReturns[i];
    flags[j] = src.flags[i];
    scannerChannel[j] = src.scannerChannel[i];
    scanDirection[j] = src.scanDirection[i];
    edgeOfFlightLine[j] = src.edgeOfFlightLine[i];
    scanAngle[j] = src.scanAngle[i];
    userData[j] = src.userData[i];
    pointSourceId[j] = src.pointSourceId[i];
    gpsTime[j] = src.gpsTime[i];
    red[j] = src.red[i];
    green[j] = src.green[i];
    blue[j] = src.blue[i];
    nir[j] = src.nir[i];
    return j;
  }

  /** Returns true when no more points fit. */
  public boolean isFull() {
    return size == capacity;
  }

  public int size() {
    return size;
  }

  public int capacity() {
    return capacity;
  }

  /** Index of the file (within its survey) the points were read from; 0 for generated chunks. */
  public int fileIndex() {
    return fileIndex;
  }

  /** Zero-based record number, within its file, of the chunk's first point. */
  public long firstRecord() {
    return firstRecord;
  }

  /** Easting, metres. */
  public double[] x() {
    return x;
  }

  /** Northing, metres. */
  public double[] y() {
    return y;
  }

  /** Elevation, metres. */
  public double[] z() {
    return z;
  }

  /** Return intensity, 0-65535. */
  public int[] intensity() {
    return intensity;
  }

  /** Return number, 1-15 (0 in malformed files). */
  public byte[] returnNumber() {
    return returnNumber;
  }

  /** Number of returns of the pulse, 1-15 (0 in malformed files). */
  public byte[] numberOfReturns() {
    return numberOfReturns;
  }

  /** ASPRS classification code, 0-255 (0-31 in formats 0-5). */
  public short[] classification() {
    return classification;
  }

  /** Classification flags: {@link #FLAG_SYNTHETIC}, {@link #FLAG_KEY_POINT}, ... */
  public byte[] flags() {
    return flags;
  }

  /** Scanner channel 0-3 (formats 6-10). */
  public byte[] scannerChannel() {
    return scannerChannel;
  }

  /** Scan direction flag, 0 or 1. */
  public byte[] scanDirection() {
    return scanDirection;
  }

  /** Edge-of-flight-line flag, 0 or 1. */
  public byte[] edgeOfFlightLine() {
    return edgeOfFlightLine;
  }

  /** Scan angle, degrees (formats 0-5: the rank, -90..90; formats 6-10: 0.006 degree steps). */
  public float[] scanAngle() {
    return scanAngle;
  }

  /** User data byte, 0-255. */
  public short[] userData() {
    return userData;
  }

  /** Point source (flight line) id, 0-65535. */
  public int[] pointSourceId() {
    return pointSourceId;
  }

  /** GPS time, seconds (as the file's global encoding defines it); NaN where the format has none. */
  public double[] gpsTime() {
    return gpsTime;
  }

  /** Red, 0-65535 (formats 2, 3, 5, 7, 8, 10). */
  public int[] red() {
    return red;
  }

  /** Green, 0-65535. */
  public int[] green() {
    return green;
  }

  /** Blue, 0-65535. */
  public int[] blue() {
    return blue;
  }

  /** Near infrared, 0-65535 (formats 8 and 10). */
  public int[] nir() {
    return nir;
  }

  @Override
  public String toString() {
    return "PointChunk[size=" + size + ", file=" + fileIndex + ", first=" + firstRecord + "]";
  }
}
