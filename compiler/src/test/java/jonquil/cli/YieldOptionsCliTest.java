package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * '--seed' and '--builds' on 'jonquil check', and the yield's interval in every report: the JSON
 * 'yield' object (checked against the published schema), the text finding and SARIF.
 */
class YieldOptionsCliTest {
  static final String SPEC =
      """
      source s { wavelength 633 nm; power 10 mW; polarization linear 0 deg }
      polarizer p45 { axis 45 deg ± 10 deg }
      probe mid
      train t { s -> 10 mm -> p45 -> 10 mm -> mid }
      require {
        yield >= 40 % for power at mid >= 5 mW
      }
      """;

  @TempDir Path dir;

  private JsonObject yieldOf(String... options) throws Exception {
    Files.writeString(dir.resolve("bench.jonq"), SPEC);
    List<String> args =
        new java.util.ArrayList<>(List.of("check", "--root", dir.toString(), "--format", "json"));
    args.addAll(List.of(options));
    args.add("bench.jonq");
    CliRun run = CliRun.of(dir, args.toArray(String[]::new));
    assertEquals(
        List.of(),
        SchemaCheck.fromClasspath("jonquil/cli/check-result.schema.json").errors(run.out()));
    return JsonParser.parseString(run.out())
        .getAsJsonObject()
        .getAsJsonArray("requirements")
        .get(0)
        .getAsJsonObject()
        .getAsJsonObject("yield");
  }

  @Test
  void theJsonCarriesTheBuildsTheIntervalAndTheSeed() throws Exception {
    JsonObject y = yieldOf();
    assertEquals(400, y.get("builds").getAsInt());
    assertEquals("wilson", y.getAsJsonObject("interval").get("method").getAsString());
    assertEquals(0.95, y.getAsJsonObject("interval").get("confidence").getAsDouble());
    assertTrue(y.get("settled").getAsBoolean());
    assertEquals(y, yieldOf(), "the same spec drew other builds");
  }

  @Test
  void aSeedGivesAnotherDrawAndBuildsSetTheCount() throws Exception {
    JsonObject plain = yieldOf();
    JsonObject seeded = yieldOf("--seed", "5", "--builds", "1000");
    assertNotEquals(plain.get("seed"), seeded.get("seed"));
    assertEquals(1000, seeded.get("builds").getAsInt());
    assertEquals(seeded, yieldOf("--seed", "5", "--builds", "1000"));
  }

  @Test
  void buildsOutsideTheirRangeAreBadUsage() throws Exception {
    Files.writeString(dir.resolve("bench.jonq"), SPEC);
    CliRun run = CliRun.of(dir, "check", "--builds", "0", "bench.jonq");
    assertEquals(2, run.exitCode());
    assertTrue(run.err().contains("--builds must be from 1 to 100000"), run.err());
  }

  @Test
  void textAndSarifStateTheInterval() throws Exception {
    Files.writeString(dir.resolve("bench.jonq"), SPEC);
    String text = CliRun.of(dir, "check", "--root", dir.toString(), "bench.jonq").out();
    assertTrue(text.contains("95 % Wilson interval"), text);
    String sarif =
        CliRun.of(dir, "check", "--root", dir.toString(), "--format", "sarif", "bench.jonq").out();
    assertTrue(sarif.contains("95 % Wilson interval"), sarif);
  }
}
