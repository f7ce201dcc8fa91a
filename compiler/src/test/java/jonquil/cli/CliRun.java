package jonquil.cli;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

/** One in-process run of the command line with both streams captured. */
record CliRun(int exitCode, String out, String err) {
  /**
   * {@code spec} written as bench.jonq in {@code dir} (a project root), then 'check', {@code
   * options} and the file.
   */
  static CliRun checkSpec(Path dir, String spec, String... options) throws java.io.IOException {
    java.nio.file.Files.writeString(dir.resolve(".jonquil-root"), "");
    java.nio.file.Files.writeString(dir.resolve("bench.jonq"), spec);
    String[] args = new String[options.length + 2];
    args[0] = "check";
    System.arraycopy(options, 0, args, 1, options.length);
    args[args.length - 1] = "bench.jonq";
    return of(dir, args);
  }

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
