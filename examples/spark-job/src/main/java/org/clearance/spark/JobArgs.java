package org.clearance.spark;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Stream;
import org.clearance.InputException;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.UnitsChoice;

/** The job's command line (the options of {@code clearance check} that a cluster run needs). */
final class JobArgs {
  static final String USAGE = "usage: clearance-spark --survey TILE|FOLDER... --structures FILE"
      + " --line FILE... [--rules NAME|FILE] [--conductors FILE] [--survey-units m|ft|usft]"
      + " [--vegetation-classes 3,4,5] [--partitions N] --out PATH|URI";

  private JobArgs() {}

  /** @throws InputException naming the option for a missing or bad value */
  static SparkCheck.Request parse(String[] args) {
    List<Path> tiles = new ArrayList<>();
    List<Path> lines = new ArrayList<>();
    Path structures = null;
    Optional<String> rules = Optional.empty();
    Optional<Path> conductors = Optional.empty();
    UnitsChoice units = UnitsChoice.fromFile();
    Set<Integer> classes = null;
    int partitions = 0;
    String out = null;
    for (int i = 0; i < args.length; i++) {
      String option = args[i];
      if (i + 1 >= args.length) {
        throw new InputException(option, null, null, "needs a value");
      }
      String value = args[++i];
      switch (option) {
        case "--survey" -> tiles.addAll(tiles(Path.of(value)));
        case "--structures" -> structures = Path.of(value);
        case "--line" -> lines.add(Path.of(value));
        case "--rules" -> rules = Optional.of(value);
        case "--conductors" -> conductors = Optional.of(Path.of(value));
        case "--survey-units" -> units = UnitsChoice.of(unit(value));
        case "--vegetation-classes" -> {
          classes = new HashSet<>();
          for (String c : value.split(",")) {
            classes.add(integer(option, c.trim()));
          }
        }
        case "--partitions" -> partitions = integer(option, value);
        case "--out" -> out = value;
        default -> throw new InputException(option, null, null, "unknown option");
      }
    }
    if (tiles.isEmpty()) {
      throw new InputException("--survey", null, null, "give at least one LAS file or folder");
    }
    if (structures == null) {
      throw new InputException("--structures", null, null, "is required");
    }
    if (lines.isEmpty()) {
      throw new InputException("--line", null, null, "give at least one line specification");
    }
    if (out == null) {
      throw new InputException("--out", null, null, "is required");
    }
    String version = Optional.ofNullable(SparkCheck.class.getPackage().getImplementationVersion())
        .orElse("development");
    return new SparkCheck.Request(JobSpec.of(tiles, units, structures, lines, conductors,
        classes, version), rules, out, partitions);
  }

  /** A file, or every {@code .las} file of a folder in name order. */
  static List<Path> tiles(Path p) {
    if (!Files.isDirectory(p)) {
      return List.of(p);
    }
    try (Stream<Path> s = Files.list(p)) {
      return s.filter(f -> f.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".las"))
          .sorted().toList();
    } catch (IOException e) {
      throw new UncheckedIOException("cannot list " + p, e);
    }
  }

  private static LinearUnit unit(String v) {
    return switch (v) {
      case "m" -> LinearUnit.METRE;
      case "ft" -> LinearUnit.FOOT;
      case "usft" -> LinearUnit.US_SURVEY_FOOT;
      default -> throw new InputException("--survey-units", null, null, "'" + v
          + "' is not one of " + UnitsChoice.UNIT_VALUES);
    };
  }

  private static int integer(String option, String v) {
    try {
      return Integer.parseInt(v);
    } catch (NumberFormatException e) {
      throw new InputException(option, null, null, "'" + v + "' is not a whole number");
    }
  }
}
