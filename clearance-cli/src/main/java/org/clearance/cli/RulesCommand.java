package org.clearance.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** {@code clearance rules}: the rule profiles - list, show, validate, explain. */
@Command(
    name = "rules",
    description = {
      "Rule profiles: the clearance zones, growth rates and fall-in rule a run is checked "
          + "against. See docs/rules.md for the file format."
    },
    mixinStandardHelpOptions = true,
    subcommands = {RulesListCommand.class, RulesShowCommand.class, RulesValidateCommand.class,
        RulesExplainCommand.class})
public final class RulesCommand implements Runnable {

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Override
  public void run() {
    spec.commandLine().usage(spec.commandLine().getOut());
  }
}
