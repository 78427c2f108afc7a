package org.clearance.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.Properties;
import org.clearance.InputException;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code clearance} command: entry point and the home of exit codes and error handling.
 *
 * <p>Exit codes: {@link #EXIT_OK} when the work is done, {@link #EXIT_FAILURE} when it could not be
 * done for a reason other than the user's input, {@link #EXIT_INPUT} for a usage error or bad
 * input. User errors print one line naming file, record and field; never a stack trace.
 */
@Command(
    name = "clearance",
    mixinStandardHelpOptions = true,
    versionProvider = ClearanceCommand.Version.class,
    description = {
      "Screens overhead power-line corridors for vegetation that is, or will be, too close to the "
          + "conductors, from ASPRS LAS lidar surveys.",
      "",
      "A screening aid: the utility's rules, the local regulator and qualified line-clearance "
          + "personnel govern."
    },
    subcommands = {
      CommandLine.HelpCommand.class,
      DemoCommand.class,
      CheckCommand.class,
      WiresCommand.class,
      SurveyCommand.class,
      EvaluateCommand.class,
      RulesCommand.class,
      BenchCommand.class
    })
public final class ClearanceCommand implements Runnable {
  /** The work was done. */
  public static final int EXIT_OK = 0;
  /** The work could not be done (an internal or environment failure). */
  public static final int EXIT_FAILURE = 1;
  /** A usage error or bad input the user can fix. */
  public static final int EXIT_INPUT = 2;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Override
  public void run() {
    spec.commandLine().usage(spec.commandLine().getOut());
  }

  /** Builds the configured command line; tests use it with their own writers. */
  public static CommandLine commandLine() {
    CommandLine cl = new CommandLine(new ClearanceCommand());
    cl.setExitCodeExceptionMapper(ClearanceCommand::exitCodeOf);
    cl.setExecutionExceptionHandler(ClearanceCommand::handleExecutionException);
    cl.setParameterExceptionHandler(ClearanceCommand::handleParameterException);
    cl.getCommandSpec().exitCodeOnInvalidInput(EXIT_INPUT);
    cl.getCommandSpec().exitCodeOnUsageHelp(EXIT_OK);
    cl.getCommandSpec().exitCodeOnVersionHelp(EXIT_OK);
    cl.getCommandSpec().exitCodeOnSuccess(EXIT_OK);
    cl.getCommandSpec().exitCodeOnExecutionException(EXIT_FAILURE);
    CommandLine.IParameterExceptionHandler usual = cl.getParameterExceptionHandler();
    cl.setParameterExceptionHandler((ex, args) -> {
      List<String> unknown = UnknownOptions.of(ex.getCommandLine(), args);
      if (unknown.isEmpty()) {
        return usual.handleParseException(ex, args);
      }
      PrintWriter err = ex.getCommandLine().getErr();
      for (String u : unknown) {
        err.println("clearance " + ex.getCommandLine().getCommandName() + ": unknown option "
            + u + UnknownOptions.suggestion(ex.getCommandLine(), u));
      }
      err.println("See: clearance " + ex.getCommandLine().getCommandSpec().qualifiedName(" ")
          .replaceFirst("^clearance ?", "") + " --help");
      err.flush();
      return EXIT_INPUT;
    });
    return cl;
  }

  public static void main(String[] args) {
    System.exit(commandLine().execute(args));
  }

  private static int exitCodeOf(Throwable t) {
    return isInputError(t) ? EXIT_INPUT : EXIT_FAILURE;
  }

  private static boolean isInputError(Throwable t) {
    return t instanceof InputException || t instanceof CommandLine.ParameterException;
  }

  /**
   * A usage error: one line naming the problem and one pointing to the command's help, instead
   * of the whole usage text.
   */
  private static int handleParameterException(CommandLine.ParameterException ex, String[] args) {
    CommandLine cl = ex.getCommandLine();
    PrintWriter err = cl.getErr();
    err.println("clearance: " + InputException.printable(ex.getMessage()));
    String name = cl.getCommandSpec().qualifiedName();
    err.println("Try '" + name + " --help' for the options.");
    err.flush();
    return EXIT_INPUT;
  }

  private static int handleExecutionException(
      Exception ex, CommandLine cl, CommandLine.ParseResult parseResult) {
    PrintWriter err = cl.getErr();
    Throwable cause = ex;
    String context = "";
    if (cause instanceof UncheckedIOException && cause.getCause() != null) {
      String wrapper = cause.getMessage();
      cause = cause.getCause();
      if (wrapper != null && !wrapper.equals(cause.toString())) {
        context = wrapper + ": ";
      }
    }
    if (cause instanceof InputException) {
      err.println("clearance: " + cause.getMessage());
      err.flush();
      return EXIT_INPUT;
    }
    if (cause instanceof IOException io) {
      err.println("clearance: I/O error: " + InputException.printable(context + describe(io)));
      err.flush();
      return EXIT_FAILURE;
    }
    err.println("clearance: internal error (please report it with the command you ran):");
    cause.printStackTrace(err);
    err.flush();
    return EXIT_FAILURE;
  }

  /**
   * An I/O failure in words that name the file: the file system's own exceptions carry the path
   * (and the other path of a move); an exception without one gets its class name only when it
   * has no message at all.
   */
  static String describe(IOException e) {
    if (e instanceof java.nio.file.FileSystemException fs && fs.getFile() != null) {
      String reason = fs.getReason() != null ? fs.getReason()
          : e instanceof java.nio.file.NoSuchFileException ? "no such file or folder"
          : e instanceof java.nio.file.AccessDeniedException ? "permission denied"
          : e instanceof java.nio.file.FileAlreadyExistsException ? "already exists"
          : e instanceof java.nio.file.DirectoryNotEmptyException ? "folder not empty"
          : e.getClass().getSimpleName();
      return fs.getFile() + (fs.getOtherFile() != null ? " -> " + fs.getOtherFile() : "") + ": "
          + reason;
    }
    return e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName();
  }

  /** Reads the version Maven wrote into the jar. */
  static final class Version implements CommandLine.IVersionProvider {
    @Override
    public String[] getVersion() {
      return new String[] {"clearance " + version()};
    }
  }

  /** The tool version, e.g. {@code 0.1.0-SNAPSHOT}. */
  public static String version() {
    Properties p = new Properties();
    try (InputStream in = ClearanceCommand.class.getResourceAsStream("version.properties")) {
      if (in != null) {
        p.load(in);
      }
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return p.getProperty("version", "unknown");
  }
}
