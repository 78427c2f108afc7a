package org.clearance.cli;

import java.util.concurrent.Callable;
import org.clearance.report.ProfileText;
import org.clearance.rules.RuleProfiles;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code clearance rules show NAME|FILE}: a profile as resolved (inheritance applied). */
@Command(name = "show", description = "Prints a rule profile as resolved: its own values "
    + "merged over those of the profiles it extends.", mixinStandardHelpOptions = true)
public final class RulesShowCommand implements Callable<Integer> {

  @Parameters(paramLabel = "NAME|FILE", description = "Built-in profile name or profile file.")
  String profile;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() {
    spec.commandLine().getOut().print(ProfileText.describe(RuleProfiles.byNameOrPath(profile)));
    spec.commandLine().getOut().flush();
    return ClearanceCommand.EXIT_OK;
  }
}
