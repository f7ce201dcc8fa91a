package jonquil.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import jonquil.cli.Commands;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code jonquil fmt} through the real command line: what it writes, prints and exits with. */
class FormatCommandTest {
  private static final String MESSY = "probe   p\nlens l { focal 3 mm }";
  private static final String CANONICAL = "probe p\nlens l {\n  focal 3 mm\n}\n";

  @TempDir Path dir;

  private record Run(int exitCode, String out, String err) {}

  private Run fmt(String... args) {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    ByteArrayOutputStream err = new ByteArrayOutputStream();
    String[] all = new String[args.length + 1];
    all[0] = "fmt";
    System.arraycopy(args, 0, all, 1, args.length);
    int code =
        Commands.run(
            all,
            new PrintStream(out, true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8),
            dir);
    return new Run(
        code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
  }

  private Path write(String name, String text) throws IOException {
    return Files.writeString(dir.resolve(name), text, StandardCharsets.UTF_8);
  }

  private String read(String name) throws IOException {
    return Files.readString(dir.resolve(name), StandardCharsets.UTF_8);
  }

  @Test
  void rewritesAFileInPlace() throws IOException {
    write("a.jonq", MESSY);
    Run run = fmt("a.jonq");
    assertEquals(new Run(0, "", ""), run);
    assertEquals(CANONICAL, read("a.jonq"));
  }

  @Test
  void leavesAnUnchangedFileUntouched() throws IOException {
    Path file = write("a.jonq", CANONICAL);
    FileTime old = FileTime.fromMillis(1_000_000_000L);
    Files.setLastModifiedTime(file, old);
    assertEquals(0, fmt("a.jonq").exitCode());
    assertEquals(old, Files.getLastModifiedTime(file));
  }

  @Test
  void checkWritesNothingAndListsFilesThatWouldChange() throws IOException {
    write("messy.jonq", MESSY);
    write("tidy.jonq", CANONICAL);
    Run run = fmt("--check", ".");
    assertEquals(new Run(1, "messy.jonq\n", ""), run);
    assertEquals(MESSY, read("messy.jonq"));
    assertEquals(0, fmt("--check", "tidy.jonq").exitCode());
  }

  @Test
  void stdoutPrintsTheFormattedTextAndWritesNothing() throws IOException {
    write("a.jonq", MESSY);
    assertEquals(new Run(0, CANONICAL, ""), fmt("--stdout", "a.jonq"));
    assertEquals(MESSY, read("a.jonq"));
  }

  @Test
  void aFileWithSyntaxErrorsIsReportedAndNeverTouched() throws IOException {
    String broken = "lens l {  focal 3 mm\nprobe   p\n";
    write("broken.jonq", broken);
    write("ok.jonq", MESSY);
    Run run = fmt("broken.jonq", "ok.jonq");
    assertEquals(1, run.exitCode());
    assertTrue(run.err().startsWith("broken.jonq:1:8: error: unclosed '{'"), run.err());
    assertTrue(run.err().endsWith("[J103]\n"), run.err());
    assertEquals(broken, read("broken.jonq"));
    assertEquals(CANONICAL, read("ok.jonq"), "the other files are still formatted");
  }

  @Test
  void usageAndInputProblemsExitTwo() throws IOException {
    assertEquals(2, fmt().exitCode());
    assertEquals(2, fmt("--frobnicate", "a.jonq").exitCode());
    write("a.jonq", MESSY);
    Run both = fmt("--check", "--stdout", "a.jonq");
    assertEquals(2, both.exitCode());
    assertTrue(
        both.err().startsWith("jonquil: --check and --stdout cannot be used together\n"),
        both.err());
    assertEquals(
        new Run(2, "", "jonquil: cannot read 'gone.jonq': no such file\n"), fmt("gone.jonq"));
    Files.write(dir.resolve("bad.jonq"), new byte[] {(byte) 0xC3, (byte) 0x28});
    assertEquals(
        new Run(2, "", "jonquil: cannot read 'bad.jonq': not valid UTF-8\n"), fmt("bad.jonq"));
  }

  @Test
  void helpNamesTheOptions() {
    Run run = fmt("--help");
    assertEquals(0, run.exitCode());
    assertTrue(run.out().contains("--check") && run.out().contains("--stdout"), run.out());
  }
}
