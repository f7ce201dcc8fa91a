package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonParser;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CliTest {
  @TempDir Path dir;

  private Path spec(String name) throws IOException {
    Path file = dir.resolve(name);
    Files.createDirectories(file.getParent());
    return Files.writeString(file, "");
  }

  private static void assertNoStackTrace(CliRun run) {
    assertFalse(run.err().contains("\tat "), run.err());
    assertFalse(run.err().contains("Exception"), run.err());
  }

  @Test
  void helpExitsZeroAndListsTheCheckCommand() {
    CliRun run = CliRun.of(dir, "--help");
    assertEquals(0, run.exitCode());
    assertTrue(run.out().contains("check"), run.out());
  }

  @Test
  void checkHelpExplainsTheLineFormatAndColumns() {
    CliRun run = CliRun.of(dir, "check", "--help");
    assertEquals(0, run.exitCode());
    assertTrue(run.out().contains("PATH:LINE:COLUMN: SEVERITY: MESSAGE [CODE]"), run.out());
    assertTrue(run.out().contains("Unicode code points"), run.out());
  }

  @Test
  void versionExitsZeroAndPrintsNameAndVersion() {
    CliRun run = CliRun.of(dir, "--version");
    assertEquals(0, run.exitCode());
    assertEquals("jonquil " + ToolVersion.current(), run.out().strip());
  }

  @Test
  void anUnknownFlagIsAUsageError() {
    CliRun run = CliRun.of(dir, "check", "--frobnicate", "a.jonq");
    assertEquals(2, run.exitCode());
    assertEquals(
        "jonquil: unknown option: '--frobnicate'\ntry 'jonquil check --help'\n", run.err());
    assertEquals("", run.out());
  }

  @Test
  void anUnknownFormatIsAUsageErrorNamingTheChoices() {
    CliRun run = CliRun.of(dir, "check", "--format", "xml", "a.jonq");
    assertEquals(2, run.exitCode());
    assertTrue(
        run.err().startsWith("jonquil: ")
            && run.err().contains("unknown format 'xml' (expected one of text, json, sarif)"),
        run.err());
    assertTrue(run.err().endsWith("try 'jonquil check --help'\n"), run.err());
  }

  @Test
  void checkWithoutAPathIsAUsageError() {
    CliRun run = CliRun.of(dir, "check");
    assertEquals(2, run.exitCode());
    assertTrue(run.err().endsWith("try 'jonquil check --help'\n"), run.err());
  }

  @Test
  void noCommandAtAllIsAUsageError() {
    CliRun run = CliRun.of(dir);
    assertEquals(2, run.exitCode());
    assertTrue(run.err().endsWith("try 'jonquil --help'\n"), run.err());
  }

  @Test
  void aMissingFileExitsTwoWithOneLineAndNoStackTrace() {
    CliRun run = CliRun.of(dir, "check", "x.jonq");
    assertEquals(2, run.exitCode());
    assertEquals("jonquil: cannot read 'x.jonq': no such file\n", run.err());
    assertNoStackTrace(run);
  }

  @Test
  void aMissingFileNextToACleanOneStillExitsTwo() throws IOException {
    spec("ok.jonq");
    CliRun run = CliRun.of(dir, "check", "ok.jonq", "gone.jonq");
    assertEquals(2, run.exitCode());
    assertEquals("jonquil: cannot read 'gone.jonq': no such file\n", run.err());
  }

  @Test
  void exitZeroDoesNotHideAMissingFile() {
    assertEquals(2, CliRun.of(dir, "check", "--exit-zero", "x.jonq").exitCode());
  }

  @Test
  void aCleanFileExitsZeroWithOnlyTheSummary() throws IOException {
    spec("clean.jonq");
    CliRun run = CliRun.of(dir, "check", "clean.jonq");
    assertEquals(0, run.exitCode(), run.err());
    assertEquals(
        "checked 1 file: 0 errors, 0 warnings, 0 notes; requirements: 0 pass, 0 fail, 0 not"
            + " evaluated\n",
        run.out());
    assertEquals("", run.err());
  }

  @Test
  void aDirectoryMeansEverySpecBelowItAndNothingElse() throws IOException {
    spec("specs/b.jonq");
    spec("specs/a.jonq");
    spec("specs/deeper/c.jonq");
    Files.writeString(dir.resolve("specs/notes.txt"), "not a spec");
    CliRun run = CliRun.of(dir, "check", "--format", "json", "specs");
    assertEquals(0, run.exitCode(), run.err());
    assertEquals(
        3, JsonParser.parseString(run.out()).getAsJsonObject().getAsJsonArray("files").size());
  }

  @Test
  void aDirectoryWithoutSpecsIsReportedAndExitsTwo() throws IOException {
    Files.createDirectories(dir.resolve("empty"));
    CliRun run = CliRun.of(dir, "check", "empty");
    assertEquals(2, run.exitCode());
    assertEquals("jonquil: no .jonq files in 'empty'\n", run.err());
  }

  @Test
  void jsonAndSarifGoToStdoutAsOneDocument() throws IOException {
    spec("clean.jonq");
    CliRun json = CliRun.of(dir, "check", "--format", "json", "clean.jonq");
    assertEquals(
        "jonquil.check/2",
        JsonParser.parseString(json.out()).getAsJsonObject().get("schema").getAsString());
    CliRun sarif = CliRun.of(dir, "check", "--format", "sarif", "clean.jonq");
    assertEquals(
        "2.1.0",
        JsonParser.parseString(sarif.out()).getAsJsonObject().get("version").getAsString());
  }

  @Test
  void aRootThatIsNotADirectoryIsAUsageError() throws IOException {
    spec("clean.jonq");
    CliRun run = CliRun.of(dir, "check", "--root", "nowhere", "clean.jonq");
    assertEquals(2, run.exitCode());
    assertTrue(run.err().startsWith("jonquil: --root 'nowhere' is not a directory\n"), run.err());
  }

  @Test
  void theRootOptionAnchorsReportPaths() throws IOException {
    spec("proj/specs/clean.jonq");
    CliRun run =
        CliRun.of(dir, "check", "--format", "json", "--root", "proj", "proj/specs/clean.jonq");
    String path =
        JsonParser.parseString(run.out())
            .getAsJsonObject()
            .getAsJsonArray("files")
            .get(0)
            .getAsJsonObject()
            .get("path")
            .getAsString();
    assertEquals("specs/clean.jonq", path);
  }
}
