package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A file name with a line break in it cannot split one finding into two lines of text output: the
 * text report escapes it ('\n'), while JSON and SARIF, which have string escapes of their own,
 * carry the name exactly.
 */
class FileNamesStayOnOneLineTest {
  private static final String NAME = "two\nlines.jonq";

  @TempDir Path dir;

  @BeforeEach
  void specWithALineBreakInItsName() throws IOException {
    Files.createFile(dir.resolve(".jonquil-root"));
    try {
      Files.writeString(dir.resolve(NAME), "mirror m {\n  aoi  95 deg\n  reflectance 99 %\n}\n");
    } catch (java.nio.file.InvalidPathException | IOException e) {
      Assumptions.abort("this file system does not allow a line break in a name");
    }
  }

  @Test
  void textEscapesTheLineBreak() {
    CliRun run = CliRun.of(dir, "check", ".");
    assertEquals(1, run.exitCode(), run.err());
    String[] lines = run.out().split("\n");
    assertEquals(2, lines.length, run.out());
    assertTrue(lines[0].startsWith("two\\nlines.jonq:2:8: error: 'aoi' must be"), run.out());
    assertTrue(lines[1].startsWith("checked 1 file"), run.out());
  }

  @Test
  void fmtCheckListsTheNameOnOneLine() {
    CliRun run = CliRun.of(dir, "fmt", "--check", ".");
    assertEquals(1, run.exitCode(), run.err());
    assertEquals("two\\nlines.jonq\n", run.out());
  }

  @Test
  void jsonCarriesTheExactName() {
    CliRun run = CliRun.of(dir, "check", "--format", "json", ".");
    JsonObject doc = JsonParser.parseString(run.out()).getAsJsonObject();
    JsonObject first = doc.getAsJsonArray("diagnostics").get(0).getAsJsonObject();
    assertEquals(NAME, first.get("path").getAsString(), run.out());
  }

  @Test
  void sarifCarriesTheExactName() {
    CliRun run = CliRun.of(dir, "check", "--format", "sarif", ".");
    assertTrue(run.out().contains("\"uri\": \"two%0Alines.jonq\""), run.out());
  }
}
