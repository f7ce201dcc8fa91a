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
  void jsonGivesEachLinesOwnSafetyFiguresBesideTheSummedOnes() {
    CliRun run = CliRun.of(Repo.root(), "check", "--format", "json", BENCH);
    assertEquals(0, run.exitCode(), run.err());
    JsonObject engine =
        JsonParser.parseString(run.out())
            .getAsJsonObject()
            .getAsJsonArray("values")
            .get(0)
            .getAsJsonObject()
            .getAsJsonArray("safety")
            .get(0)
            .getAsJsonObject();
    var lines = engine.getAsJsonArray("lines");
    assertEquals(3, lines.size(), engine.toString());
    // Each line alone, in wavelength order: 488, 561 and 808 nm (the source's own lines, by
    // definition of the bench).
    assertEquals(488e-9, lines.get(0).getAsJsonObject().get("wavelength_m").getAsDouble(), 1e-15);
    assertEquals(808e-9, lines.get(2).getAsJsonObject().get("wavelength_m").getAsDouble(), 1e-15);
    // 6 mW at 488 nm is above the 5 mW Class 3R limit of the visible: Class 3B (IEC
    // 60825-1:2014, Table 7, from memory), whatever the other lines add.
    assertEquals(
        "3B",
        lines.get(0).getAsJsonObject().getAsJsonObject("hazard_class").get("value").getAsString());
    // The ocular MPE differs per line: 25.46 W/m2 in the visible for 0.25 s (18 t^0.75 / t,
    // IEC 60825-1:2014 Table A.1), lower at 808 nm for its 10 s default duration.
    double visible =
        lines
            .get(0)
            .getAsJsonObject()
            .getAsJsonObject("mpe")
            .getAsJsonObject("value")
            .get("irradiance_W_m2")
            .getAsDouble();
    double infrared =
        lines
            .get(2)
            .getAsJsonObject()
            .getAsJsonObject("mpe")
            .getAsJsonObject("value")
            .get("irradiance_W_m2")
            .getAsDouble();
    // 18 t^0.75 J/m2 over t = 0.25 s (IEC 60825-1:2014 Table A.1, 400-700 nm, from memory).
    assertEquals(18 * Math.pow(0.25, 0.75) / 0.25, visible, 1e-9);
    assertTrue(infrared < visible, infrared + " vs " + visible);
    assertTrue(engine.has("mpe_directive_2006_25"), engine.toString());
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
