package org.clearance.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.clearance.InputException;
import org.clearance.rules.RuleProfile;
import org.clearance.rules.RuleProfileReader;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/**
 * {@code clearance rules validate FILE}: reads a profile file and everything it extends; exit 0
 * and a one-line summary when it is valid, exit 2 and the first error (file, line, key) when not.
 */
@Command(name = "validate", description = "Checks a rule profile file; prints the first error "
    + "with its file, line and key.", mixinStandardHelpOptions = true)
public final class RulesValidateCommand implements Callable<Integer> {

  @Parameters(paramLabel = "FILE", description = "Rule profile file (YAML).")
  Path file;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() {
    if (!Files.isRegularFile(file)) {
      throw new InputException(file, null, null, "no such file");
    }
    RuleProfile p = RuleProfileReader.read(file);
    spec.commandLine().getOut().print(String.format(Locale.ROOT, "%s: valid rule profile %s "
        + "(%d zone%s; content SHA-256 %s)%n", file, p.name(), p.zones().size(),
        p.zones().size() == 1 ? "" : "s", p.contentHash()));
    spec.commandLine().getOut().flush();
    return ClearanceCommand.EXIT_OK;
  }
}
