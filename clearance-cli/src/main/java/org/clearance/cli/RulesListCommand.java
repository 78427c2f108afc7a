package org.clearance.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.clearance.rules.RuleProfile;
import org.clearance.rules.RuleProfiles;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** {@code clearance rules list}: the built-in rule profiles with their titles. */
@Command(name = "list", description = "Lists the built-in rule profiles.",
    mixinStandardHelpOptions = true)
public final class RulesListCommand implements Callable<Integer> {

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() {
    PrintWriter out = spec.commandLine().getOut();
    for (String name : RuleProfiles.names()) {
      RuleProfile p = RuleProfiles.builtin(name);
      out.print(String.format(Locale.ROOT, "%-28s %s%n", name, p.title()));
    }
    out.println();
    out.println("Show one with 'clearance rules show NAME'; any of them can be copied and "
        + "adapted as a file.");
    out.flush();
    return ClearanceCommand.EXIT_OK;
  }
}
