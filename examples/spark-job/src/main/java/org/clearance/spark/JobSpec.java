package org.clearance.spark;

import java.io.Serializable;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.UnitsChoice;

/**
 * What every task of a run needs to rebuild the run's inputs on its own JVM: the input files
 * (paths every executor can read, such as a shared mount) and the choices of the command line.
 * Small and serializable; the inputs themselves are read once per JVM ({@link JobContext}).
 *
 * @param tiles the LAS files, in order
 * @param structures the structures file
 * @param lines the line specifications
 * @param conductors a user conductor library, or null
 * @param horizontal horizontal unit given (a {@link LinearUnit} name), or null
 * @param vertical vertical unit given, or null
 * @param verticalFollows z takes the horizontal unit
 * @param overrideFile the given units replace the files' units
 * @param vegetationClasses ASPRS classes taken as vegetation, or null for the default
 * @param toolVersion version recorded in the run
 */
record JobSpec(
    List<String> tiles, String structures, List<String> lines, String conductors,
    String horizontal, String vertical, boolean verticalFollows, boolean overrideFile,
    List<Integer> vegetationClasses, String toolVersion) implements Serializable {

  JobSpec {
    tiles = List.copyOf(tiles);
    lines = List.copyOf(lines);
    Objects.requireNonNull(structures, "structures");
    vegetationClasses = vegetationClasses == null ? null : List.copyOf(vegetationClasses);
  }

  /** The spec of a run. */
  static JobSpec of(List<Path> tiles, UnitsChoice units, Path structures, List<Path> lines,
      Optional<Path> conductors, Set<Integer> vegetationClasses, String toolVersion) {
    return new JobSpec(tiles.stream().map(Path::toString).toList(), structures.toString(),
        lines.stream().map(Path::toString).toList(), conductors.map(Path::toString).orElse(null),
        units.horizontal().map(Enum::name).orElse(null),
        units.vertical().map(Enum::name).orElse(null), units.verticalFollowsHorizontal(),
        units.overrideFile(),
        vegetationClasses == null ? null : vegetationClasses.stream().sorted().toList(),
        toolVersion);
  }

  /** The units choice this spec was made from. */
  UnitsChoice units() {
    return new UnitsChoice(Optional.ofNullable(horizontal).map(LinearUnit::valueOf),
        Optional.ofNullable(vertical).map(LinearUnit::valueOf), verticalFollows, overrideFile);
  }
}
