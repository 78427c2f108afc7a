package org.clearance.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.clearance.examples.ClassificationMode;
import org.clearance.examples.Benchmark;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code clearance bench}: the speed and memory benchmark (docs/benchmark.md). */
@Command(
    name = "bench",
    description = {
      "Generates a large synthetic corridor in each classification mode and times a cold read "
          + "of its file, a raw scan, a decoding pass (read) and every stage of a whole check: "
          + "points per second, ratio to the read, peak heap; then the goal ratios of issue 12. "
          + "See docs/benchmark.md."
    },
    mixinStandardHelpOptions = true)
public final class BenchCommand implements Callable<Integer> {

  @Option(names = "--points", paramLabel = "N", defaultValue = "50000000",
      description = "Approximate survey size in points (default: ${DEFAULT-VALUE}).")
  long points;

  @Option(names = "--dir", paramLabel = "DIR", defaultValue = "bench-run",
      description = "Working folder for the corridor and the run (default: ${DEFAULT-VALUE}).")
  Path dir;

  @Option(names = "--threads", paramLabel = "N",
      description = "Worker threads (default: cores, at most 4).")
  Integer threads;

  @Option(names = "--modes", paramLabel = "MODE", split = ",",
      defaultValue = "classified,ground-only,unclassified",
      description = "Classification modes of the generated survey, each generated and checked in "
          + "turn; the first is the base of the mode ratios: classified, wires-unlabelled, "
          + "ground-only, unclassified (default: ${DEFAULT-VALUE}).")
  List<String> modes;

  @Option(names = "--profile",
      description = "Record JFR method samples and print the top frames of every stage.")
  boolean profile;

  @Option(names = "--rules", paramLabel = "NAME|FILE", defaultValue = "example-utility",
      description = "Rule profile of the timed check (default: ${DEFAULT-VALUE}).")
  String rules;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() throws IOException {
    if (points < 100_000) {
      throw new CommandLine.ParameterException(spec.commandLine(),
          "--points must be at least 100000: " + points);
    }
    int n = threads != null ? threads
        : Math.min(CheckSettings.DEFAULT_MAX_THREADS, Runtime.getRuntime().availableProcessors());
    List<ClassificationMode> chosen = new ArrayList<>();
    for (String m : modes) {
      chosen.add(Benchmark.mode(m.strip()).orElseThrow(() -> new CommandLine.ParameterException(
          spec.commandLine(), "--modes: unknown classification mode '" + m + "' ("
              + java.util.Arrays.stream(ClassificationMode.values()).map(Benchmark::modeName)
                  .collect(java.util.stream.Collectors.joining(", ")) + ")")));
    }
    try {
      Benchmark.run(new Benchmark.Options(points, dir, n, rules, chosen, profile),
          spec.commandLine().getOut());
    } catch (OutOfMemoryError e) {
      spec.commandLine().getErr().println("bench: out of memory with a "
          + Runtime.getRuntime().maxMemory() / (1024 * 1024) + " MiB heap at " + points
          + " points: give the JVM more heap (-Xmx) or fewer --points");
      return ClearanceCommand.EXIT_FAILURE;
    }
    return ClearanceCommand.EXIT_OK;
  }
}
