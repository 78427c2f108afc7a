package org.clearance.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.clearance.line.ConductorLibrary;
import org.clearance.line.LineSpec;
import org.clearance.line.LineSpecReader;
import picocli.CommandLine.Option;

/** The input files of a corridor: survey, structures, line specifications, own conductors. */
public final class LineInputOptions {

  @Option(names = "--survey", arity = "1..*", required = true, paramLabel = "FILE",
      description = "Uncompressed LAS files (tiles) of the survey.")
  List<Path> survey;

  @Option(names = "--structures", required = true, paramLabel = "FILE",
      description = "Structures file, CSV or GeoJSON (docs/line-inputs.md).")
  Path structures;

  @Option(names = "--line", arity = "1..*", required = true, paramLabel = "FILE",
      description = "Line specification, YAML, one per line (docs/line-inputs.md).")
  List<Path> lines;

  @Option(names = "--conductors", paramLabel = "FILE",
      description = "Your own conductor types (CSV), added to the built-in library.")
  Path conductors;

  /** The built-in conductor library with the user's file added. */
  ConductorLibrary library() {
    return conductors == null ? ConductorLibrary.builtin()
        : ConductorLibrary.builtin().withUserFile(conductors);
  }

  /** The line specifications, read against {@link #library()}. */
  List<LineSpec> specs() {
    ConductorLibrary library = library();
    List<LineSpec> specs = new ArrayList<>();
    for (Path p : lines) {
      specs.add(LineSpecReader.read(p, library));
    }
    return specs;
  }
}
