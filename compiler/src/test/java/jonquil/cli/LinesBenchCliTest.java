package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.util.List;
import jonquil.testing.Repo;
import org.junit.jupiter.api.Test;

/**
 * The three-line sample bench (samples/excitation_combiner.jonq) end to end in text, JSON and
 * SARIF: per-line verdicts, the lines a band judged, and the safety sum over lines.
 */
class LinesBenchCliTest {
  static final String BENCH = "samples/excitation_combiner.jonq";

  @Test
  void textNamesTheLineEachVerdictJudged() {
    CliRun run = CliRun.of(Repo.root(), "check", BENCH);
    assertEquals(0, run.exitCode(), run.out() + run.err());
    assertTrue(run.out().contains("power is 2 µW (line 808 nm alone)"), run.out());
    assertTrue(
        run.out().contains("(lines in the band, each alone: 488 nm, 561 nm; worst 488 nm)"),
        run.out());
    assertTrue(run.out().contains("IEC 60825-1:2014, 4.3"), run.out());
  }

  @Test
  void jsonCarriesEachLinesValueAndValidates() {
    CliRun run = CliRun.of(Repo.root(), "check", "--format", "json", BENCH);
    assertEquals(0, run.exitCode(), run.err());
    List<String> errors =
        SchemaCheck.fromClasspath("jonquil/cli/check-result.schema.json").errors(run.out());
    assertTrue(errors.isEmpty(), String.join("\n", errors));
    JsonObject first = requirement(JsonParser.parseString(run.out()).getAsJsonObject(), 0);
    assertEquals("line 488 nm alone", first.get("reason").getAsString());
    // 6 mW at 488 nm through the filter's 92 % in-band transmission (definition): 5.52 mW.
    assertEquals(6e-3 * 0.92, first.get("value").getAsDouble(), 1e-12);
    JsonObject third = requirement(JsonParser.parseString(run.out()).getAsJsonObject(), 2);
    // 20 mW at 808 nm, outside the band, through blocking OD 4 (definition, T = 10^-OD): 2 µW.
    assertEquals(20e-3 * 1e-4, third.get("value").getAsDouble(), 1e-15);
  }

  @Test
  void sarifOfTheBenchAndOfAnUnknownLineIsValid() {
    CliRun run =
        CliRun.of(
            Repo.root(),
            "check",
            "--format",
            "sarif",
            BENCH,
            "compiler/src/test/resources/diagnostics/require/unknown_line.jonq");
    assertEquals(1, run.exitCode(), run.err());
    List<String> errors =
        SchemaCheck.fromClasspath("schema/sarif-schema-2.1.0.json").errors(run.out());
    assertTrue(errors.isEmpty(), String.join("\n", errors));
    JsonArray results =
        JsonParser.parseString(run.out())
            .getAsJsonObject()
            .getAsJsonArray("runs")
            .get(0)
            .getAsJsonObject()
            .getAsJsonArray("results");
    long unknownLine = 0;
    long met = 0;
    for (var r : results) {
      String rule = r.getAsJsonObject().get("ruleId").getAsString();
      unknownLine += rule.equals("J619") ? 1 : 0;
      met += rule.equals("J611") ? 1 : 0;
    }
    assertEquals(1, unknownLine, run.out());
    assertEquals(6, met, run.out());
  }

  private static JsonObject requirement(JsonObject report, int index) {
    return report.getAsJsonArray("requirements").get(index).getAsJsonObject();
  }
}
