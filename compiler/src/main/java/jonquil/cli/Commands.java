package jonquil.cli;

import java.io.OutputStreamWriter;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import picocli.CommandLine;
import picocli.CommandLine.ParameterException;

/**
 * The command line as a function from arguments and streams to an exit code. It never touches
 * System.out or System.exit, so the language server and tests can run it in-process.
 */
public final class Commands {
  private Commands() {}

  /**
   * Runs one command line. {@code cwd} anchors relative paths; {@code extraSubcommands} (picocli
   * command objects) let modules that depend on this one add commands.
   */
  public static int run(
      String[] args, PrintStream out, PrintStream err, Path cwd, Object... extraSubcommands) {
    // Reports are UTF-8 whatever the platform's default: under LANG=C it would print '?' for 'µ'.
    PrintStream utf8Out = new PrintStream(out, true, StandardCharsets.UTF_8);
    PrintStream utf8Err = new PrintStream(err, true, StandardCharsets.UTF_8);
    try {
      return run(args, utf8Out, utf8Err, cwd, List.of(extraSubcommands));
    } finally {
      utf8Out.flush();
      utf8Err.flush();
    }
  }

  private static int run(
      String[] args, PrintStream out, PrintStream err, Path cwd, List<Object> extraSubcommands) {
    CommandLine cli = new CommandLine(new JonquilCommand());
    cli.addSubcommand(new CommandLine(new CheckCommand(out, err, cwd)));
    cli.addSubcommand(new CommandLine(new FormatCommand(out, err, cwd)));
    for (Object extra : extraSubcommands) {
      cli.addSubcommand(extra);
    }
    // Set after adding subcommands: picocli hands the writers down only to those it already has.
    cli.setOut(new PrintWriter(new OutputStreamWriter(out, StandardCharsets.UTF_8), true));
    cli.setErr(new PrintWriter(new OutputStreamWriter(err, StandardCharsets.UTF_8), true));
    cli.setParameterExceptionHandler(Commands::usageError);
    cli.setExecutionExceptionHandler(
        (e, commandLine, parseResult) -> {
          reportInternalError(e, Arrays.asList(args).contains("--debug"), err);
          return ExitCode.TROUBLE.code();
        });
    try {
      return cli.execute(args);
    } catch (RuntimeException | StackOverflowError e) {
      // Only a failure inside picocli or a handler gets here; it still must not print a trace.
      reportInternalError(e, Arrays.asList(args).contains("--debug"), err);
      return ExitCode.TROUBLE.code();
    }
  }

  /** One line naming the problem and where to learn more; picocli's own text can span several. */
  private static int usageError(ParameterException e, String[] args) {
    CommandLine at = e.getCommandLine();
    PrintWriter err = at.getErr();
    err.println("jonquil: " + lowerFirst(firstLine(e.getMessage())));
    err.println("try '" + at.getCommandSpec().qualifiedName() + " --help'");
    err.flush();
    return ExitCode.TROUBLE.code();
  }

  static void reportInternalError(Throwable e, boolean debug, PrintStream err) {
    String message =
        e.getMessage() == null || e.getMessage().isBlank()
            ? e.getClass().getSimpleName()
            : firstLine(e.getMessage());
    if (debug) {
      err.println("jonquil: internal error: " + message);
      e.printStackTrace(err);
    } else {
      err.println(
          "jonquil: internal error: " + message + " (run again with --debug for the stack trace)");
    }
    err.flush();
  }

  private static String firstLine(String text) {
    if (text == null || text.isBlank()) {
      return "invalid command line";
    }
    return text.strip().lines().findFirst().orElse("").strip();
  }

  private static String lowerFirst(String text) {
    return text.isEmpty()
        ? text
        : text.substring(0, 1).toLowerCase(Locale.ROOT) + text.substring(1);
  }
}
