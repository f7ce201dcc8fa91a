package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.nio.file.Path;
import jonquil.optics.material.CiddorAir;
import jonquil.testing.Repo;
import org.junit.jupiter.api.Test;

/**
 * One uncoated window of index 1.5 between a 1 W source and a detector, checked in the default air
 * and under {@code ambient vacuum}: the ambient is what each surface sees on its air side, so the
 * same bound passes in one and fails in the other, in text, JSON and SARIF alike.
 */
class AmbientBenchCliTest {
  private static final Path DIR = Repo.testResources().resolve("ambient");

  /**
   * A slab's two uncoated faces with incoherent multiple reflections pass (1 − R)/(1 + R), R the
   * normal-incidence Fresnel reflectance ((n − n₀)/(n + n₀))² (Hecht, Optics, 5th ed., sec. 4.6.2
   * for R; the slab sum is a geometric series, definition).
   */
  private static double slab(double n0) {
    double r = Math.pow((1.5 - n0) / (1.5 + n0), 2);
    return (1 - r) / (1 + r);
  }

  private static JsonObject requirement(String file) {
    CliRun run = CliRun.of(DIR, "check", "--format", "json", file);
    return JsonParser.parseString(run.out())
        .getAsJsonObject()
        .getAsJsonArray("requirements")
        .get(0)
        .getAsJsonObject();
  }

  @Test
  void defaultAirPassesAndVacuumFailsInText() {
    CliRun air = CliRun.of(DIR, "check", "air.jonq");
    CliRun vacuum = CliRun.of(DIR, "check", "vacuum.jonq");
    assertEquals(0, air.exitCode(), air.out());
    assertTrue(air.out().contains("requirement met: power is 923.2 mW"), air.out());
    assertEquals(1, vacuum.exitCode(), vacuum.out());
    assertTrue(vacuum.out().contains("requirement not met: power is 923.1 mW"), vacuum.out());
  }

  @Test
  void jsonValuesFollowTheAmbientIndex() {
    JsonObject air = requirement("air.jonq");
    JsonObject vacuum = requirement("vacuum.jonq");
    assertEquals("pass", air.get("status").getAsString());
    assertEquals("fail", vacuum.get("status").getAsString());
    // Vacuum: R = 0.04 exactly, so the slab passes 0.96/1.04 = 12/13 (definition).
    assertEquals(12.0 / 13.0, vacuum.get("value").getAsDouble(), 1e-12);
    // Default air: Ciddor's dry air at 20 °C, 101.325 kPa, 450 ppm CO₂ at 633 nm (definition of
    // the default ambient; Ciddor 1996 for n₀).
    double n0 = CiddorAir.dryAt(293.15).index(633e-9).getReal();
    assertEquals(slab(n0), air.get("value").getAsDouble(), 1e-12);
  }

  private static java.util.List<String> sarifRuleIds(String file) {
    String sarif = CliRun.of(DIR, "check", "--format", "sarif", file).out();
    java.util.List<String> ids = new java.util.ArrayList<>();
    JsonParser.parseString(sarif)
        .getAsJsonObject()
        .getAsJsonArray("runs")
        .get(0)
        .getAsJsonObject()
        .getAsJsonArray("results")
        .forEach(r -> ids.add(r.getAsJsonObject().get("ruleId").getAsString()));
    return ids;
  }

  @Test
  void sarifReportsTheVacuumFailureAndTheAirPass() {
    assertTrue(sarifRuleIds("air.jonq").contains("J611"));
    assertTrue(!sarifRuleIds("air.jonq").contains("J609"));
    assertTrue(sarifRuleIds("vacuum.jonq").contains("J609"));
  }
}
