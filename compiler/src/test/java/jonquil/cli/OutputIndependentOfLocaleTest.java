package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The CLI writes UTF-8 whatever the platform's locale: under LANG=C a JVM's default charset is
 * ASCII, and 'µm' or '°' printed through it would come out as '?'.
 */
class OutputIndependentOfLocaleTest {
  private static final Map<String, String> C_LOCALE = Map.of("LANG", "C", "LC_ALL", "C");
  private static final List<String> ASCII_JVM =
      List.of(
          "-Dfile.encoding=ANSI_X3.4-1968",
          "-Dsun.stdout.encoding=ANSI_X3.4-1968",
          "-Dsun.stderr.encoding=ANSI_X3.4-1968");

  @TempDir Path dir;

  @Test
  void textReportKeepsMicroAndDegreeUnderTheCLocale() throws Exception {
    Files.writeString(
        dir.resolve("bench.jonq"),
        "source s {\n  wavelength 30 um\n  power 1 mW\n}\nmirror m { aoi 95 deg }\n",
        StandardCharsets.UTF_8);
    Files.createFile(dir.resolve(".jonquil-root"));

    CliProcess run = CliProcess.run(dir, C_LOCALE, ASCII_JVM, "check", "bench.jonq");

    assertEquals(1, run.exitCode(), run.errText());
    String out = run.outText();
    assertTrue(out.contains("20 µm"), "µ as UTF-8 (C2 B5):\n" + out);
    assertTrue(out.contains("90°"), "° as UTF-8 (C2 B0):\n" + out);
    assertTrue(!out.contains("?"), "no character replaced by '?':\n" + out);
  }

  @Test
  void anArgumentTheLocaleCannotSpellIsAPlainProblem() throws Exception {
    // Under LANG=C the JVM decodes 'ö' in an argument to a character no path may hold.
    CliProcess run = CliProcess.run(dir, C_LOCALE, ASCII_JVM, "check", "n\u00f6-such-file.jonq");

    assertEquals(2, run.exitCode());
    assertTrue(run.errText().startsWith("jonquil: cannot read '"), run.errText());
    assertTrue(!run.errText().contains("internal error"), run.errText());
  }
}
