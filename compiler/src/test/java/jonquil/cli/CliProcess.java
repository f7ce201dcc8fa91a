package jonquil.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

/**
 * The command line in a child JVM, for what an in-process run cannot show: the platform's stream
 * encoding, process limits. Its {@link #main} is the entry point the child runs, as the jar's is.
 */
record CliProcess(int exitCode, byte[] out, byte[] err) {
  public static void main(String[] args) {
    System.exit(Commands.run(args, System.out, System.err, Path.of("").toAbsolutePath()));
  }

  /** Runs {@code java [jvmOptions] CliProcess args} in {@code cwd} with {@code env} added. */
  static CliProcess run(Path cwd, Map<String, String> env, List<String> jvmOptions, String... args)
      throws IOException, InterruptedException {
    List<String> command = new ArrayList<>();
    command.add(java());
    command.addAll(jvmOptions);
    command.add("-cp");
    command.add(System.getProperty("java.class.path"));
    command.add(CliProcess.class.getName());
    command.addAll(List.of(args));
    return run(cwd, env, command);
  }

  /** Runs {@code command} as it stands (e.g. through 'sh -c' to set a limit first). */
  static CliProcess run(Path cwd, Map<String, String> env, List<String> command)
      throws IOException, InterruptedException {
    return run(cwd, env, command, 60);
  }

  /** Runs {@code command}, failing when it has not finished within {@code seconds}. */
  static CliProcess run(Path cwd, Map<String, String> env, List<String> command, int seconds)
      throws IOException, InterruptedException {
    ProcessBuilder builder = new ProcessBuilder(command).directory(cwd.toFile());
    builder.environment().putAll(env);
    Path out = java.nio.file.Files.createTempFile("cli-out", ".bin");
    Path err = java.nio.file.Files.createTempFile("cli-err", ".bin");
    try {
      builder.redirectOutput(out.toFile()).redirectError(err.toFile());
      Process process = builder.start();
      if (!process.waitFor(seconds, TimeUnit.SECONDS)) {
        process.destroyForcibly();
        throw new AssertionError(
            "the child JVM did not finish within " + seconds + " s: " + command);
      }
      return new CliProcess(
          process.exitValue(),
          java.nio.file.Files.readAllBytes(out),
          java.nio.file.Files.readAllBytes(err));
    } finally {
      java.nio.file.Files.deleteIfExists(out);
      java.nio.file.Files.deleteIfExists(err);
    }
  }

  /** The java binary running this test, so the child gets the same JDK. */
  static String java() {
    return ProcessHandle.current()
        .info()
        .command()
        .orElseThrow(() -> new AssertionError("cannot tell which java runs the tests"));
  }

  String outText() {
    return new String(out, StandardCharsets.UTF_8);
  }

  String errText() {
    return new String(err, StandardCharsets.UTF_8);
  }
}
