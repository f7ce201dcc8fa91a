package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.FilterOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * 'jonquil fmt' replaces a spec whole or not at all: the new text goes to a temporary file beside
 * it, which is synced and renamed over the original. A write that fails part-way leaves the
 * original byte for byte and no temporary file behind.
 */
class FormatterNeverDestroysASpecTest {
  @TempDir Path dir;
  private Path spec;
  private byte[] original;

  @BeforeEach
  void unformattedSpec() throws IOException {
    StringBuilder text = new StringBuilder();
    for (int i = 0; i < 400; i++) {
      text.append("material m").append(i).append(" {index   1.5}\n");
    }
    spec = dir.resolve("bench.jonq");
    original = text.toString().getBytes(StandardCharsets.UTF_8);
    Files.write(spec, original);
  }

  private List<Path> othersInDir() throws IOException {
    try (Stream<Path> files = Files.list(dir)) {
      return files.filter(f -> !f.equals(spec)).toList();
    }
  }

  /**
   * A real failing write: the child JVM may write no file beyond 4 KiB ('ulimit -f'), so the
   * formatted text (over 10 KiB) cannot be written in full.
   */
  @Test
  void aWriteCutShortByTheFileSizeLimitLeavesTheSpecWhole() throws Exception {
    Assumptions.assumeTrue(Files.isExecutable(Path.of("/bin/sh")), "needs a POSIX shell");
    List<String> command =
        List.of(
            "/bin/sh",
            "-c",
            "ulimit -f 8 && exec \"$0\" -cp \"$1\" "
                + CliProcess.class.getName()
                + " fmt bench.jonq",
            CliProcess.java(),
            System.getProperty("java.class.path"));
    CliProcess run = CliProcess.run(dir, Map.of(), command);

    assertEquals(2, run.exitCode(), run.errText());
    assertTrue(run.errText().startsWith("jonquil: cannot write 'bench.jonq': "), run.errText());
    assertArrayEquals(original, Files.readAllBytes(spec), "the spec is unchanged");
    assertEquals(List.of(), othersInDir(), "no temporary file is left");
  }

  @Test
  void aSuccessfulFormatReplacesTheSpecAndLeavesNothingElse() throws IOException {
    CliRun run = CliRun.of(dir, "fmt", "bench.jonq");
    assertEquals(0, run.exitCode(), run.err());
    assertNotEquals(new String(original, StandardCharsets.UTF_8), Files.readString(spec));
    assertTrue(Files.readString(spec).startsWith("material m0 {\n  index 1.5\n}\n"));
    assertEquals(List.of(), othersInDir());
  }

  /** The same through the seam: a stream that fails after 1000 bytes, mid-file. */
  @Test
  void aWriteThatFailsPartWayLeavesTheSpecWhole() throws IOException {
    byte[] formatted =
        "material m {\n  index 1.5\n}\n".repeat(200).getBytes(StandardCharsets.UTF_8);
    IOException failure =
        assertThrows(
            IOException.class, () -> AtomicFile.replace(spec, formatted, FailAfter::thousandBytes));
    assertEquals("no space left (simulated)", failure.getMessage());
    assertArrayEquals(original, Files.readAllBytes(spec), "the spec is unchanged");
    assertEquals(List.of(), othersInDir(), "no temporary file is left");
  }

  @Test
  void permissionsAreKept() throws IOException {
    Assumptions.assumeTrue(
        Files.getFileAttributeView(spec, PosixFileAttributeView.class) != null, "needs POSIX");
    Set<PosixFilePermission> unusual = PosixFilePermissions.fromString("rw-r-x---");
    Files.setPosixFilePermissions(spec, unusual);
    CliRun run = CliRun.of(dir, "fmt", "bench.jonq");
    assertEquals(0, run.exitCode(), run.err());
    assertNotEquals(new String(original, StandardCharsets.UTF_8), Files.readString(spec));
    assertEquals(unusual, Files.getPosixFilePermissions(spec));
  }

  /**
   * Also as root (CI runs as root), whom the system lets write anything: a spec marked read-only
   * for everyone is the owner's word, and fmt keeps it.
   */
  @Test
  void aReadOnlySpecIsNotReplaced() throws IOException {
    Assumptions.assumeTrue(
        Files.getFileAttributeView(spec, PosixFileAttributeView.class) != null, "needs POSIX");
    Files.setPosixFilePermissions(spec, PosixFilePermissions.fromString("r--r--r--"));
    CliRun run = CliRun.of(dir, "fmt", "bench.jonq");
    assertEquals(2, run.exitCode());
    assertEquals("jonquil: cannot write 'bench.jonq': permission denied\n", run.err());
    assertArrayEquals(original, Files.readAllBytes(spec));
    assertEquals(List.of(), othersInDir());
  }

  @Test
  void crlfLineEndingsAndLinksAreKept() throws IOException {
    Files.writeString(spec, "material m {index   1.5}\r\nmaterial n = index 1.6\r\n");
    Path link = dir.resolve("link.jonq");
    try {
      Files.createSymbolicLink(link, spec.getFileName());
    } catch (UnsupportedOperationException e) {
      Assumptions.abort("no symbolic links here");
    }
    CliRun run = CliRun.of(dir, "fmt", "link.jonq");
    assertEquals(0, run.exitCode(), run.err());
    assertTrue(Files.isSymbolicLink(link), "the link is still a link");
    assertEquals(
        "material m {\r\n  index 1.5\r\n}\r\nmaterial n = index 1.6\r\n", Files.readString(spec));
  }

  /** Stands for a disk that fills up: the first 1000 bytes go through, then the write fails. */
  private static final class FailAfter extends FilterOutputStream {
    private int left = 1000;

    private FailAfter(OutputStream out) {
      super(out);
    }

    static OutputStream thousandBytes(OutputStream out) {
      return new FailAfter(out);
    }

    @Override
    public void write(int b) throws IOException {
      if (left-- <= 0) {
        throw new IOException("no space left (simulated)");
      }
      out.write(b);
    }

    @Override
    public void write(byte[] b, int off, int len) throws IOException {
      for (int i = 0; i < len; i++) {
        write(b[off + i]);
      }
    }
  }
}
