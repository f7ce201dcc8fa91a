package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A file's size and type are checked before it is read, and no read takes more than the limit and
 * one byte: a 2 GB file, /dev/zero or a FIFO (as an argument, through 'use' or through 'table')
 * gets a plain diagnostic at once instead of running out of memory or waiting forever. The timeouts
 * only guard against a hang; they are generous.
 */
class ReadsAreBoundedTest {
  private static final Duration HANG_GUARD = Duration.ofSeconds(10);

  @TempDir Path dir;

  @BeforeEach
  void projectRoot() throws IOException {
    Files.createFile(dir.resolve(".jonquil-root"));
  }

  /** A 2 GB file that takes no disk: its length is set, nothing is written. */
  private Path sparse(String name) throws IOException {
    Path file = dir.resolve(name);
    try (RandomAccessFile raf = new RandomAccessFile(file.toFile(), "rw")) {
      raf.setLength(2L * 1024 * 1024 * 1024);
    }
    return file;
  }

  private Path fifo(String name) throws IOException, InterruptedException {
    Path file = dir.resolve(name);
    Process p;
    try {
      p = new ProcessBuilder("mkfifo", file.toString()).start();
    } catch (IOException e) {
      Assumptions.abort("this system has no mkfifo: " + e.getMessage());
      throw e;
    }
    assertEquals(0, p.waitFor(), "mkfifo failed");
    assertTrue(Files.exists(file) && !Files.isRegularFile(file), "mkfifo made no FIFO");
    return file;
  }

  private CliRun check(String... paths) {
    String[] args = new String[paths.length + 1];
    args[0] = "check";
    System.arraycopy(paths, 0, args, 1, paths.length);
    return assertTimeoutPreemptively(HANG_GUARD, () -> CliRun.of(dir, args));
  }

  private void write(String name, String text) throws IOException {
    Files.writeString(dir.resolve(name), text, StandardCharsets.UTF_8);
  }

  private static String tableSpec(String tableFile) {
    return "material glass { table \"" + tableFile + "\" }\n";
  }

  @Test
  void aTwoGigabyteSpecGivenAsArgumentIsTooLarge() throws IOException {
    sparse("big.jonq");
    CliRun run = check("big.jonq");
    assertEquals(1, run.exitCode(), run.err());
    assertTrue(run.out().contains("big.jonq:1:1: error: file is larger than 4 MiB;"), run.out());
    assertTrue(run.out().contains("[J109]"), run.out());
  }

  @Test
  void aTwoGigabyteSpecReachedByUseIsTooLarge() throws IOException {
    sparse("big.jonq");
    write("main.jonq", "use \"big.jonq\"\n");
    CliRun run = check("main.jonq");
    assertEquals(1, run.exitCode(), run.err());
    assertTrue(run.out().contains("big.jonq:1:1: error: file is larger than 4 MiB"), run.out());
  }

  @Test
  void aTwoGigabyteTableIsTooLarge() throws IOException {
    sparse("big_nk.txt");
    write("main.jonq", tableSpec("big_nk.txt"));
    CliRun run = check("main.jonq");
    assertEquals(1, run.exitCode(), run.err());
    assertTrue(
        run.out()
            .contains(
                "main.jonq:1:24: error: table file 'big_nk.txt' cannot be read: larger"
                    + " than 4 MiB [J213]"),
        run.out());
  }

  @Test
  void aTwoGigabyteSpecIsNotFormatted() throws IOException {
    Path big = sparse("big.jonq");
    CliRun run = assertTimeoutPreemptively(HANG_GUARD, () -> CliRun.of(dir, "fmt", "big.jonq"));
    assertEquals(2, run.exitCode());
    assertEquals("jonquil: cannot read 'big.jonq': larger than 4 MiB\n", run.err());
    assertEquals(2L * 1024 * 1024 * 1024, Files.size(big), "left as it was");
  }

  @Test
  void theZeroDeviceAsArgumentIsRefused() {
    Assumptions.assumeTrue(Files.exists(Path.of("/dev/zero")), "this system has no /dev/zero");
    CliRun run = check("/dev/zero");
    assertEquals(2, run.exitCode());
    assertEquals("jonquil: cannot read '/dev/zero': not a regular file\n", run.err());
    CliRun fmt = assertTimeoutPreemptively(HANG_GUARD, () -> CliRun.of(dir, "fmt", "/dev/zero"));
    assertEquals(2, fmt.exitCode());
    assertEquals("jonquil: cannot read '/dev/zero': not a regular file\n", fmt.err());
  }

  @Test
  void aFifoAsArgumentIsRefusedByCheckAndFmt() throws Exception {
    fifo("pipe.jonq");
    CliRun run = check("pipe.jonq");
    assertEquals(2, run.exitCode());
    assertEquals("jonquil: cannot read 'pipe.jonq': not a regular file\n", run.err());
    CliRun fmt = assertTimeoutPreemptively(HANG_GUARD, () -> CliRun.of(dir, "fmt", "pipe.jonq"));
    assertEquals(2, fmt.exitCode());
    assertEquals("jonquil: cannot read 'pipe.jonq': not a regular file\n", fmt.err());
  }

  @Test
  void aFifoReachedByUseIsUnreadable() throws Exception {
    fifo("pipe.jonq");
    write("main.jonq", "use \"pipe.jonq\"\n");
    CliRun run = check("main.jonq");
    assertEquals(1, run.exitCode(), run.err());
    assertTrue(
        run.out()
            .contains(
                "main.jonq:1:5: error: file 'pipe.jonq' cannot be read: not a regular file"
                    + " [J211]"),
        run.out());
  }

  @Test
  void aFifoNamedByTableIsUnreadable() throws Exception {
    fifo("pipe_nk.txt");
    write("main.jonq", tableSpec("pipe_nk.txt"));
    CliRun run = check("main.jonq");
    assertEquals(1, run.exitCode(), run.err());
    assertTrue(
        run.out()
            .contains(
                "main.jonq:1:24: error: table file 'pipe_nk.txt' cannot be read: not a"
                    + " regular file [J213]"),
        run.out());
  }

  @Test
  void aDirectoryNamedByTableIsUnreadable() throws IOException {
    Files.createDirectory(dir.resolve("nk"));
    write("main.jonq", tableSpec("nk"));
    CliRun run = check("main.jonq");
    assertTrue(
        run.out()
            .contains(
                "main.jonq:1:24: error: table file 'nk' cannot be read: not a regular file"
                    + " [J213]"),
        run.out());
  }

  @Test
  void aTableThatIsNotUtf8SaysSo() throws IOException {
    Files.write(
        dir.resolve("latin1_nk.txt"),
        "532 nm 1.5 0\n633 nm 1.49 0 # \u00e9\n".getBytes(StandardCharsets.ISO_8859_1));
    write("main.jonq", tableSpec("latin1_nk.txt"));
    CliRun run = check("main.jonq");
    assertTrue(
        run.out()
            .contains(
                "main.jonq:1:24: error: table file 'latin1_nk.txt' cannot be read: not"
                    + " valid UTF-8 [J213]"),
        run.out());
    assertFalse(run.out().contains("not found"), run.out());
  }
}
