package jonquil.cli;

import picocli.CommandLine.Option;

/**
 * The {@code -h, --help} option every subcommand takes, worded once; a picocli mixin, public so the
 * language server's command shares it.
 */
public final class HelpOption {
  @Option(
      names = {"-h", "--help"},
      usageHelp = true,
      description = "Show this help and exit.")
  boolean help;
}
