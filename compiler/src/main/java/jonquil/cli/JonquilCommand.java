package jonquil.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** The top-level {@code jonquil} command: only help, version, and the subcommands. */
@Command(
    name = "jonquil",
    mixinStandardHelpOptions = true,
    versionProvider = ToolVersion.class,
    description = "Checks plain-text specifications of laser and optical trains.",
    footer = {"", "Run 'jonquil COMMAND --help' for the options of one command."})
final class JonquilCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  /** Reached only without a subcommand, which is a usage error like any other. */
  @Override
  public Integer call() {
    throw new ParameterException(spec.commandLine(), "missing command (for example 'check')");
  }
}
