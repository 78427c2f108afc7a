package org.clearance.line;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.clearance.InputException;
import org.clearance.io.Decimal;
import org.clearance.io.TextFiles;
import org.clearance.io.ValueRange;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.SurveyUnits;

/**
 * Reads a structures file (docs/line-inputs.md): CSV with a header row, or a GeoJSON
 * FeatureCollection of Point features. Coordinates are converted to metres with the survey's
 * horizontal unit, elevations with its vertical unit.
 *
 * <p>Strict: a missing required column, an unknown column, a value that is not a plain finite
 * number, a bad type, a duplicate structure id or sequence within a line, or a row with the wrong
 * number of fields is an {@link InputException} naming the file, the 1-based line and the column.
 */
public final class StructureReader {

  static final String ID = "structure_id";
  static final String X = "x";
  static final String Y = "y";
  static final String LINE_ID = "line_id";
  static final String SEQUENCE = "sequence";
  static final String TYPE = "type";
  static final String GROUND_Z = "ground_z";
  static final String EQUIPMENT = "equipment";
  static final String ATTACH_PREFIX = "attach_z_";
  static final List<String> REQUIRED = List.of(ID, X, Y);
  private static final List<String> FIXED = List.of(ID, X, Y, LINE_ID, SEQUENCE, TYPE, GROUND_Z,
      EQUIPMENT);
  /**
   * Plausible projected coordinates, metres: eastings and northings of every projected CRS in
   * use stay within 1e8 m (UTM northings reach 1e7 m). Common practice, no source.
   */
  static final ValueRange PLAN = new ValueRange(-1e8, 1e8, "m",
      "projected coordinates, common practice, no source");
  /**
   * Plausible elevations, metres: from the Dead Sea shore (about -430 m) to above the highest
   * lines (about 5 500 m), rounded out; the same limits as the line specification's altitude.
   */
  static final ValueRange ELEVATION = new ValueRange(-1000, 10000, "m",
      "lowest and highest ground with lines, rounded out, from memory");
  private static final String COLUMN_LIST =
      String.join(", ", FIXED) + ", " + ATTACH_PREFIX + "<position>";

  /**
   * One field value as read, before checking.
   *
   * @param text trimmed text; empty when blank or JSON null
   * @param line 1-based line of the value
   */
  record Field(String text, int line) {}

  /**
   * One structure as read: canonical column name to field.
   *
   * @param line 1-based line of the row or feature
   * @param fields values by canonical column name (blank values included)
   */
  record RawRecord(int line, Map<String, Field> fields) {}

  private StructureReader() {}

  /**
   * Reads a structures file; the format is GeoJSON when the name ends in {@code .geojson} or
   * {@code .json} or the text starts with <code>{</code>, else CSV.
   *
   * @param file the file
   * @param units survey units: x, y use the horizontal unit, ground_z and attach_z_* the vertical
   * @return the structures in file order
   * @throws InputException for any problem with the file, naming file, line and column
   */
  public static List<Structure> read(Path file, SurveyUnits units) {
    String name = file.toString();
    String text = TextFiles.read(file, TextFiles.MAX_STRUCTURES_BYTES,
        "the structures table (CSV or GeoJSON text)");
    String lower = name.toLowerCase(Locale.ROOT);
    boolean json = lower.endsWith(".geojson") || lower.endsWith(".json")
        || text.stripLeading().startsWith("{");
    if (!json) {
      TextFiles.refuseYamlForTable(name, text, "the structures table (CSV with a header line, "
          + "or GeoJSON)");
    }
    List<RawRecord> records = json
        ? GeoJsonStructures.records(text, name)
        : csvRecords(text, name);
    return build(records, name, units);
  }

  /**
   * The canonical name of a column or property, or null when it is not one of ours. Fixed names
   * match case-insensitively; in {@code attach_z_<position>} the position keeps its case.
   */
  static String canonical(String name) {
    String lower = name.strip().toLowerCase(Locale.ROOT);
    if (FIXED.contains(lower)) {
      return lower;
    }
    if (lower.startsWith(ATTACH_PREFIX) && lower.length() > ATTACH_PREFIX.length()) {
      return ATTACH_PREFIX + name.strip().substring(ATTACH_PREFIX.length());
    }
    return null;
  }

  /** The error for a column that is not ours. */
  static InputException unknownColumn(String file, int line, String name) {
    return new InputException(file, "line " + line, name,
        "unknown column; the columns are " + COLUMN_LIST);
  }

  private static List<RawRecord> csvRecords(String text, String file) {
    CsvTable table;
    try {
      table = CsvTable.read(new BufferedReader(new StringReader(text)), file);
    } catch (IOException e) {
      throw new AssertionError("reading a string cannot fail", e);
    }
    List<String> names = new ArrayList<>();
    for (String h : table.header()) {
      String c = canonical(h);
      if (c == null) {
        throw unknownColumn(file, table.headerLine(), h);
      }
      if (names.contains(c)) {
        throw new InputException(file, "line " + table.headerLine(), h,
            "column named twice in the header");
      }
      names.add(c);
    }
    for (String r : REQUIRED) {
      if (!names.contains(r)) {
        throw new InputException(file, "line " + table.headerLine(), r,
            "required column missing from the header");
      }
    }
    List<RawRecord> out = new ArrayList<>();
    for (CsvTable.Row row : table.rows()) {
      Map<String, Field> fields = new LinkedHashMap<>();
      for (int c = 0; c < names.size(); c++) {
        fields.put(names.get(c), new Field(row.fields().get(c), row.line()));
      }
      out.add(new RawRecord(row.line(), fields));
    }
    return out;
  }

  private static List<Structure> build(List<RawRecord> records, String file, SurveyUnits units) {
    if (records.isEmpty()) {
      throw new InputException(file, null, null, "no structures in the file");
    }
    Field firstSequence = null;
    List<Structure> out = new ArrayList<>();
    Map<String, Structure> byId = new HashMap<>();
    Map<String, Structure> bySequence = new HashMap<>();
    for (int i = 0; i < records.size(); i++) {
      RawRecord r = records.get(i);
      Field seq = r.fields().get(SEQUENCE);
      boolean hasSeq = seq != null && !seq.text().isEmpty();
      if (i == 0 && hasSeq) {
        firstSequence = seq;
      }
      if (hasSeq != (firstSequence != null)) {
        Field at = seq != null ? seq : new Field("", r.line());
        throw new InputException(file, "line " + at.line(), SEQUENCE, hasSeq
            ? "sequence given here but not on the first structure; give it on every one or none"
            : "sequence missing here but given on the first structure; give it on every one");
      }
      int sequence = hasSeq ? integer(seq, file) : i + 1;
      Structure s = structure(r, sequence, file, units);
      String idKey = s.lineId() + "\u0000" + s.id();
      Structure twin = byId.putIfAbsent(idKey, s);
      if (twin != null) {
        throw new InputException(file, "line " + r.line(), ID, "structure id '" + s.id()
            + "' appears twice in line '" + s.lineId() + "' (first on line " + twin.sourceLine()
            + ")");
      }
      Structure seqTwin = bySequence.putIfAbsent(s.lineId() + "\u0000" + sequence, s);
      if (seqTwin != null) {
        throw new InputException(file, "line " + seq.line(), SEQUENCE, "sequence " + sequence
            + " appears twice in line '" + s.lineId() + "' (first on line "
            + seqTwin.sourceLine() + ")");
      }
      out.add(s);
    }
    return List.copyOf(out);
  }

  private static Structure structure(RawRecord r, int sequence, String file, SurveyUnits units) {
    Map<String, Field> f = r.fields();
    for (String req : REQUIRED) {
      if (!f.containsKey(req)) {
        throw new InputException(file, "line " + r.line(), req, "required property missing");
      }
    }
    Field id = f.get(ID);
    if (id.text().isEmpty()) {
      throw new InputException(file, "line " + id.line(), ID, "no structure id");
    }
    LinearUnit h = units.horizontal();
    LinearUnit v = units.vertical();
    double x = plausible(h.toMetres(number(f.get(X), X, h, file)), PLAN, f.get(X), X, file);
    double y = plausible(h.toMetres(number(f.get(Y), Y, h, file)), PLAN, f.get(Y), Y, file);
    Field lineField = f.get(LINE_ID);
    String lineId = lineField == null ? "" : lineField.text();
    StructureType type = type(f.get(TYPE), file);
    double groundZ = optionalNumber(f.get(GROUND_Z), GROUND_Z, v, file);
    Map<String, Double> attach = new LinkedHashMap<>();
    for (Map.Entry<String, Field> e : f.entrySet()) {
      if (e.getKey().startsWith(ATTACH_PREFIX)) {
        double z = optionalNumber(e.getValue(), e.getKey(), v, file);
        if (!Double.isNaN(z)) {
          plausible(v.toMetres(z), ELEVATION, e.getValue(), e.getKey(), file);
          attach.put(e.getKey().substring(ATTACH_PREFIX.length()), z);
        }
      }
    }
    if (!Double.isNaN(groundZ)) {
      plausible(v.toMetres(groundZ), ELEVATION, f.get(GROUND_Z), GROUND_Z, file);
    }
    return new Structure(id.text(), lineId, sequence, type, x, y,
        Double.isNaN(groundZ) ? Double.NaN : v.toMetres(groundZ), toMetres(attach, v), file,
        r.line(), equipment(f.get(EQUIPMENT), file));
  }

  /** The value in metres when inside the range, else an error naming the field. */
  private static double plausible(double metres, ValueRange range, Field field, String column,
      String file) {
    String problem = range.problem(metres);
    if (problem != null) {
      throw new InputException(file, "line " + field.line(), column, "in metres, " + problem);
    }
    return metres;
  }

  private static Map<String, Double> toMetres(Map<String, Double> values, LinearUnit unit) {
    Map<String, Double> out = new LinkedHashMap<>();
    values.forEach((k, z) -> out.put(k, unit.toMetres(z)));
    return out;
  }

  private static double number(Field field, String column, LinearUnit unit, String file) {
    String problem = Decimal.problem(field.text(), unitName(unit));
    if (problem != null) {
      throw new InputException(file, "line " + field.line(), column, problem);
    }
    return Double.parseDouble(field.text());
  }

  private static double optionalNumber(Field field, String column, LinearUnit unit, String file) {
    if (field == null || field.text().isEmpty()) {
      return Double.NaN;
    }
    return number(field, column, unit, file);
  }

  private static String unitName(LinearUnit unit) {
    return "survey units (" + unit.symbol() + ")";
  }

  private static int integer(Field field, String file) {
    if (!Decimal.isInteger(field.text())) {
      throw new InputException(file, "line " + field.line(), SEQUENCE,
          "'" + field.text() + "' is not a whole number");
    }
    return Integer.parseInt(field.text());
  }

  /**
   * The equipment column: kinds separated by {@code ;} (or spaces), each once; blank = none.
   */
  private static java.util.Set<PoleEquipment> equipment(Field field, String file) {
    java.util.Set<PoleEquipment> out = java.util.EnumSet.noneOf(PoleEquipment.class);
    if (field == null || field.text().isEmpty()) {
      return out;
    }
    for (String word : field.text().split("[;\\s]+")) {
      if (word.isEmpty()) {
        continue;
      }
      PoleEquipment e = PoleEquipment.ofFileName(word);
      if (e == null) {
        throw new InputException(file, "line " + field.line(), EQUIPMENT, "'" + word
            + "' is not equipment; use transformer, switch, fuse, arrester, dead_end or corner,"
            + " separated by ';'");
      }
      if (!out.add(e)) {
        throw new InputException(file, "line " + field.line(), EQUIPMENT, "'" + word
            + "' is listed twice");
      }
    }
    return out;
  }

  private static StructureType type(Field field, String file) {
    if (field == null || field.text().isEmpty()) {
      return StructureType.SUSPENSION;
    }
    switch (field.text().toLowerCase(Locale.ROOT)) {
      case "suspension":
        return StructureType.SUSPENSION;
      case "dead_end":
      case "dead-end":
        return StructureType.DEAD_END;
      default:
        throw new InputException(file, "line " + field.line(), TYPE,
            "'" + field.text() + "' is not a structure type; use suspension or dead_end");
    }
  }
}
