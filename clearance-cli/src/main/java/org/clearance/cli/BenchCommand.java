package org.clearance.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.clearance.examples.Benchmark;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code clearance bench}: the speed and memory benchmark (docs/benchmark.md). */
@Command(
    name = "bench",
    description = {
      "Generates a large synthetic corridor and times a raw scan of its file, a decoding pass "
          + "and every stage of a whole check: points per second, ratio to the raw scan, peak "
          + "heap. See docs/benchmark.md."
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
    Benchmark.run(new Benchmark.Options(points, dir, n, rules), spec.commandLine().getOut());
    return ClearanceCommand.EXIT_OK;
  }
}
