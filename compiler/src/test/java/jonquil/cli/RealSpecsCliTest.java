package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonParser;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Pattern;
import jonquil.testing.Repo;
import org.junit.jupiter.api.Test;

/** The CLI gate on the real bundled samples and real broken specs, end to end. */
class RealSpecsCliTest {
  static final Pattern FINDING =
      Pattern.compile("^[^:]+:\\d+:\\d+: (error|warning|note): .+ \\[J\\d{3}\\]$");
  static final Path REPO = Repo.root();

  @Test
  void aPassingSampleExitsZero() {
    CliRun run = CliRun.of(REPO, "check", "samples/optical_trap.jonq");
    assertEquals(0, run.exitCode(), run.out() + run.err());
    assertTrue(
        run.out().contains("samples/optical_trap.jonq:"),
        "prints the requirement verdicts: " + run.out());
    assertTrue(run.out().strip().endsWith("not evaluated"), run.out());
  }

  @Test
  void theWholeSamplesFolderExitsZero() {
    CliRun run = CliRun.of(REPO, "check", "--strict", "samples");
    assertEquals(0, run.exitCode(), run.out() + run.err());
  }

  @Test
  void aBrokenSpecExitsOneWithCompilerStyleLines() {
    CliRun run =
        CliRun.of(REPO, "check", "compiler/src/test/resources/diagnostics/train/port_on_dump.jonq");
    assertEquals(1, run.exitCode(), run.out() + run.err());
    List<String> findings = run.out().lines().filter(l -> l.contains(": error: ")).toList();
    assertFalse(findings.isEmpty());
    findings.forEach(l -> assertTrue(FINDING.matcher(l).matches(), l));
    assertTrue(
        findings
            .get(0)
            .startsWith("compiler/src/test/resources/diagnostics/train/port_on_dump.jonq:"),
        findings.get(0));
  }

  @Test
  void aMissingFileExitsTwo() {
    CliRun run = CliRun.of(REPO, "check", "samples/no_such_bench.jonq");
    assertEquals(2, run.exitCode());
    assertEquals(
        "jonquil: cannot read 'samples/no_such_bench.jonq': no such file", run.err().strip());
  }

  @Test
  void sarifOfARealBrokenSpecIsValidSarif210WithRelativePaths() {
    CliRun run =
        CliRun.of(
            REPO,
            "check",
            "--root",
            ".",
            "--format",
            "sarif",
            "compiler/src/test/resources/diagnostics/require/unknown_hazard_class.jonq",
            "compiler/src/test/resources/diagnostics/use/cycle_two_files");
    assertEquals(1, run.exitCode(), run.err());
    List<String> errors =
        SchemaCheck.fromClasspath("schema/sarif-schema-2.1.0.json").errors(run.out());
    assertTrue(errors.isEmpty(), String.join("\n", errors));
    var results =
        JsonParser.parseString(run.out())
            .getAsJsonObject()
            .getAsJsonArray("runs")
            .get(0)
            .getAsJsonObject()
            .getAsJsonArray("results");
    assertTrue(results.size() >= 2);
    results.forEach(
        r -> {
          String uri =
              r.getAsJsonObject()
                  .getAsJsonArray("locations")
                  .get(0)
                  .getAsJsonObject()
                  .getAsJsonObject("physicalLocation")
                  .getAsJsonObject("artifactLocation")
                  .get("uri")
                  .getAsString();
          assertTrue(uri.startsWith("compiler/src/test/resources/diagnostics/"), uri);
        });
  }

  @Test
  void ruleIdsAreStableAcrossRuns() {
    String[] args = {
      "check", "--format", "sarif", "compiler/src/test/resources/diagnostics/params"
    };
    assertEquals(CliRun.of(REPO, args).out(), CliRun.of(REPO, args).out());
  }

  @Test
  void jsonOfARealSpecValidatesAgainstItsPublishedSchema() {
    CliRun run = CliRun.of(REPO, "check", "--format", "json", "samples/polarimetry_arm.jonq");
    assertEquals(0, run.exitCode(), run.err());
    List<String> errors =
        SchemaCheck.fromClasspath("jonquil/cli/check-result.schema.json").errors(run.out());
    assertTrue(errors.isEmpty(), String.join("\n", errors));
  }
}
