package org.clearance.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

/**
 * One run of the {@code clearance} command in the test's own JVM, with what it printed.
 *
 * @param exit exit code
 * @param out standard output
 * @param err standard error
 */
record CliRun(int exit, String out, String err) {

  /** Runs {@code clearance args...} with its writers captured. */
  static CliRun of(String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    var cl = ClearanceCommand.commandLine();
    cl.setOut(new PrintWriter(out));
    cl.setErr(new PrintWriter(err));
    int exit = cl.execute(args);
    return new CliRun(exit, out.toString(), err.toString());
  }
}
