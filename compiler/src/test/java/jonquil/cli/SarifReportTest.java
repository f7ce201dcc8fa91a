package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import jonquil.Result;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import org.junit.jupiter.api.Test;

class SarifReportTest {
  /** Loaded only by the tests that validate, so the others still run if the validator cannot. */
  private static SchemaCheck sarif210() {
    return SchemaCheck.fromClasspath("schema/sarif-schema-2.1.0.json");
  }

  private static JsonObject sarifRun(CheckRun run) {
    return JsonParser.parseString(SarifReport.render(run))
        .getAsJsonObject()
        .getAsJsonArray("runs")
        .get(0)
        .getAsJsonObject();
  }

  private static List<JsonObject> results(JsonObject run) {
    List<JsonObject> all = new ArrayList<>();
    run.getAsJsonArray("results").forEach(r -> all.add(r.getAsJsonObject()));
    return all;
  }

  @Test
  void outputIsValidSarif210() {
    assertEquals(List.of(), sarif210().errors(SarifReport.render(SampleRun.run())));
  }

  @Test
  void outputWithUnreadableInputsIsValidSarif210AndMarkedUnsuccessful() {
    CheckRun partial =
        new CheckRun(
            SampleRun.result(),
            SampleRun.ROOT,
            SampleRun.ROOT,
            List.of("jonquil: cannot read 'gone.jonq': no such file"));
    String sarif = SarifReport.render(partial);
    assertEquals(List.of(), sarif210().errors(sarif));
    JsonObject invocation =
        sarifRun(partial).getAsJsonArray("invocations").get(0).getAsJsonObject();
    assertFalse(invocation.get("executionSuccessful").getAsBoolean());
  }

  @Test
  void theSchemaCheckRejectsABrokenDocument() {
    JsonObject broken = SarifReport.build(SampleRun.run());
    broken.addProperty("version", "2.0.0");
    broken
        .getAsJsonArray("runs")
        .get(0)
        .getAsJsonObject()
        .getAsJsonArray("results")
        .get(0)
        .getAsJsonObject()
        .addProperty("level", "fatal");
    assertFalse(sarif210().errors(broken.toString()).isEmpty());
  }

  @Test
  void declaresOneRulePerDiagnosticCodeInDeclarationOrder() {
    JsonArray rules =
        sarifRun(SampleRun.run())
            .getAsJsonObject("tool")
            .getAsJsonObject("driver")
            .getAsJsonArray("rules");
    assertEquals(DiagnosticCode.values().length, rules.size());
    for (DiagnosticCode code : DiagnosticCode.values()) {
      JsonObject rule = rules.get(code.ordinal()).getAsJsonObject();
      assertEquals(code.id(), rule.get("id").getAsString());
      assertEquals(code.ruleName(), rule.get("name").getAsString());
      assertEquals(
          code.summary(), rule.getAsJsonObject("shortDescription").get("text").getAsString());
    }
  }

  @Test
  void everyResultPointsAtItsOwnRule() {
    JsonObject run = sarifRun(SampleRun.run());
    JsonArray rules = run.getAsJsonObject("tool").getAsJsonObject("driver").getAsJsonArray("rules");
    for (JsonObject result : results(run)) {
      JsonObject rule = rules.get(result.get("ruleIndex").getAsInt()).getAsJsonObject();
      assertEquals(result.get("ruleId").getAsString(), rule.get("id").getAsString());
    }
  }

  @Test
  void twoRunsGiveIdenticalRulesAndFingerprints() {
    assertEquals(SarifReport.render(SampleRun.run()), SarifReport.render(SampleRun.run()));
  }

  @Test
  void locationsAreRelativeToTheRootWithForwardSlashesAndEncoded() {
    JsonObject run = sarifRun(SampleRun.run());
    String rootUri =
        run.getAsJsonObject("originalUriBaseIds")
            .getAsJsonObject("SRCROOT")
            .get("uri")
            .getAsString();
    assertTrue(rootUri.startsWith("file:") && rootUri.endsWith("/"), rootUri);
    List<String> uris = new ArrayList<>();
    for (JsonObject result : results(run)) {
      JsonObject artifact =
          result
              .getAsJsonArray("locations")
              .get(0)
              .getAsJsonObject()
              .getAsJsonObject("physicalLocation")
              .getAsJsonObject("artifactLocation");
      assertEquals("SRCROOT", artifact.get("uriBaseId").getAsString());
      uris.add(artifact.get("uri").getAsString());
    }
    assertTrue(uris.contains("specs/main.jonq"), uris.toString());
    assertTrue(uris.contains("specs/parts%20lib/L%C3%AFnsen.jonq"), uris.toString());
  }

  @Test
  void columnsCountCodePointsAndSaySo() {
    JsonObject run = sarifRun(SampleRun.run());
    assertEquals("unicodeCodePoints", run.get("columnKind").getAsString());
    JsonObject duplicate =
        results(run).stream()
            .filter(r -> r.get("ruleId").getAsString().equals("J201"))
            .findFirst()
            .orElseThrow();
    JsonObject region =
        duplicate
            .getAsJsonArray("locations")
            .get(0)
            .getAsJsonObject()
            .getAsJsonObject("physicalLocation")
            .getAsJsonObject("region");
    // Line 4 is: source "🔦 Grün" laser {}  — 'laser' starts at code point 17.
    assertEquals(4, region.get("startLine").getAsInt());
    assertEquals(17, region.get("startColumn").getAsInt());
    assertEquals(22, region.get("endColumn").getAsInt());
  }

  @Test
  void relatedPlacesAndFixesAreCarriedOver() {
    JsonObject duplicate =
        results(sarifRun(SampleRun.run())).stream()
            .filter(r -> r.get("ruleId").getAsString().equals("J201"))
            .findFirst()
            .orElseThrow();
    JsonObject related = duplicate.getAsJsonArray("relatedLocations").get(0).getAsJsonObject();
    assertEquals(
        "first declared here", related.getAsJsonObject("message").get("text").getAsString());
    JsonObject replacement =
        duplicate
            .getAsJsonArray("fixes")
            .get(0)
            .getAsJsonObject()
            .getAsJsonArray("artifactChanges")
            .get(0)
            .getAsJsonObject()
            .getAsJsonArray("replacements")
            .get(0)
            .getAsJsonObject();
    assertEquals(
        "laser2", replacement.getAsJsonObject("insertedContent").get("text").getAsString());
    assertEquals(17, replacement.getAsJsonObject("deletedRegion").get("startColumn").getAsInt());
  }

  @Test
  void aFixTouchingTwoFilesHasOneChangePerFile() {
    JsonObject undefined =
        results(sarifRun(SampleRun.run())).stream()
            .filter(r -> r.get("ruleId").getAsString().equals("J202"))
            .findFirst()
            .orElseThrow();
    JsonArray changes =
        undefined
            .getAsJsonArray("fixes")
            .get(0)
            .getAsJsonObject()
            .getAsJsonArray("artifactChanges");
    assertEquals(2, changes.size());
  }

  @Test
  void fingerprintsTellApartTheSameFindingTwiceInOneFile() {
    Diagnostic once =
        Diagnostic.of(
            DiagnosticCode.UNKNOWN_UNIT, SampleRun.MAIN, TextRange.of(0, 1), "unknown unit 'mw'");
    Diagnostic again =
        Diagnostic.of(
            DiagnosticCode.UNKNOWN_UNIT, SampleRun.MAIN, TextRange.of(9, 10), "unknown unit 'mw'");
    Result twice =
        new Result(
            Map.of(SampleRun.MAIN, new SourceFile(SampleRun.MAIN, SampleRun.MAIN_TEXT)),
            List.of(once, again),
            List.of());
    List<String> prints = new ArrayList<>();
    for (JsonObject result :
        results(sarifRun(new CheckRun(twice, SampleRun.ROOT, SampleRun.ROOT, List.of())))) {
      prints.add(
          result
              .getAsJsonObject("partialFingerprints")
              .get(SarifReport.FINGERPRINT_KEY)
              .getAsString());
    }
    assertEquals(2, prints.stream().distinct().count(), prints.toString());
  }

  @Test
  void fingerprintsIgnoreTheLineSoAlertsSurviveEditsAbove() {
    Diagnostic high =
        Diagnostic.of(
            DiagnosticCode.UNKNOWN_UNIT, SampleRun.MAIN, TextRange.of(0, 1), "unknown unit 'mw'");
    Diagnostic low =
        Diagnostic.of(
            DiagnosticCode.UNKNOWN_UNIT, SampleRun.MAIN, TextRange.of(30, 31), "unknown unit 'mw'");
    assertEquals(fingerprintOfOnly(high), fingerprintOfOnly(low));
  }

  private static String fingerprintOfOnly(Diagnostic d) {
    Result one =
        new Result(
            Map.of(SampleRun.MAIN, new SourceFile(SampleRun.MAIN, SampleRun.MAIN_TEXT)),
            List.of(d),
            List.of());
    return results(sarifRun(new CheckRun(one, SampleRun.ROOT, SampleRun.ROOT, List.of())))
        .get(0)
        .getAsJsonObject("partialFingerprints")
        .get(SarifReport.FINGERPRINT_KEY)
        .getAsString();
  }
}
