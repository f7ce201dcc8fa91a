package jonquil.cli;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

/** One in-process run of the command line with both streams captured. */
record CliRun(int exitCode, String out, String err) {
  static CliRun of(Path cwd, String... args) {
    return withCommands(cwd, new Object[0], args);
  }

  static CliRun withCommands(Path cwd, Object[] extraSubcommands, String... args) {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    ByteArrayOutputStream err = new ByteArrayOutputStream();
    int code =
        Commands.run(
            args,
            new PrintStream(out, true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8),
            cwd,
            extraSubcommands);
    return new CliRun(
        code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
  }
}
