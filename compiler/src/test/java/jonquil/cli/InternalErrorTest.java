package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

class InternalErrorTest {
  @TempDir Path dir;

  /** Stands in for a subcommand with a bug, the way the lsp module adds its own. */
  @Command(name = "explode")
  static final class Explode implements Callable<Integer> {
    @Option(names = "--debug")
    boolean debug;

    @Override
    public Integer call() {
      throw new IllegalStateException("beam went sideways");
    }
  }

  @Test
  void anInternalErrorIsOneLineExitingTwo() {
    CliRun run = CliRun.withCommands(dir, new Object[] {new Explode()}, "explode");
    assertEquals(2, run.exitCode());
    assertEquals(
        "jonquil: internal error: beam went sideways (run again with --debug for the stack"
            + " trace)\n",
        run.err());
  }

  @Test
  void debugAddsTheStackTrace() {
    CliRun run = CliRun.withCommands(dir, new Object[] {new Explode()}, "explode", "--debug");
    assertEquals(2, run.exitCode());
    assertTrue(run.err().startsWith("jonquil: internal error: beam went sideways\n"), run.err());
    assertTrue(run.err().contains("\tat "), run.err());
  }

  @Test
  void extraSubcommandsAppearInTheHelp() {
    CliRun run = CliRun.withCommands(dir, new Object[] {new Explode()}, "--help");
    assertTrue(run.out().contains("explode"), run.out());
  }
}
