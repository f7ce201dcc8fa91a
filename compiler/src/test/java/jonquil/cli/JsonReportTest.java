package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.util.List;
import org.junit.jupiter.api.Test;

class JsonReportTest {
  /** Loaded only by the tests that validate, so the others still run if the validator cannot. */
  private static SchemaCheck checkResult() {
    return SchemaCheck.fromClasspath("jonquil/cli/check-result.schema.json");
  }

  private static JsonObject report() {
    return JsonParser.parseString(JsonReport.render(SampleRun.run())).getAsJsonObject();
  }

  @Test
  void outputMatchesThePublishedSchema() {
    assertEquals(List.of(), checkResult().errors(JsonReport.render(SampleRun.run())));
  }

  @Test
  void thePublishedSchemaRejectsAWrongSeverityAndAMissingSummary() {
    JsonObject broken = report();
    broken.getAsJsonArray("diagnostics").get(0).getAsJsonObject().addProperty("severity", "fatal");
    broken.remove("summary");
    List<String> errors = checkResult().errors(broken.toString());
    assertEquals(2, errors.size(), errors.toString());
  }

  @Test
  void namesItsSchemaVersionAndTool() {
    JsonObject report = report();
    assertEquals("jonquil.check/2", report.get("schema").getAsString());
    assertEquals(
        ToolVersion.current(), report.getAsJsonObject("tool").get("version").getAsString());
  }

  @Test
  void keysComeInTheDocumentedOrderWithTwoSpaceIndent() {
    String json = JsonReport.render(SampleRun.run());
    assertTrue(
        json.startsWith("{\n  \"schema\": \"jonquil.check/2\",\n  \"tool\": {\n    \"name\""),
        json);
    List<String> keys = List.copyOf(report().keySet());
    assertEquals(
        List.of("schema", "tool", "files", "diagnostics", "requirements", "values", "summary"),
        keys);
  }

  @Test
  void filesAreSortedAndRelativeToTheRoot() {
    JsonArray files = report().getAsJsonArray("files");
    assertEquals("specs/main.jonq", files.get(0).getAsJsonObject().get("path").getAsString());
    assertEquals(
        "specs/parts lib/Lïnsen.jonq", files.get(1).getAsJsonObject().get("path").getAsString());
  }

  @Test
  void positionsGiveCodePointColumnsAndUtf16Offsets() {
    JsonObject duplicate = report().getAsJsonArray("diagnostics").get(1).getAsJsonObject();
    assertEquals("J201", duplicate.get("code").getAsString());
    assertEquals("duplicate-name", duplicate.get("rule").getAsString());
    JsonObject start = duplicate.getAsJsonObject("range").getAsJsonObject("start");
    assertEquals(4, start.get("line").getAsInt());
    assertEquals(17, start.get("column").getAsInt());
    // The emoji takes two UTF-16 units, so the offset runs one ahead of the column count.
    assertEquals(SampleRun.MAIN_TEXT.lastIndexOf("laser"), start.get("offset").getAsInt());
  }

  @Test
  void messagesKeepQuotesAndNonAsciiExactly() {
    JsonObject duplicate = report().getAsJsonArray("diagnostics").get(1).getAsJsonObject();
    assertEquals(
        "the name 'laser' is already declared — pick another \"name\" <here>",
        duplicate.get("message").getAsString());
    assertFalse(
        JsonReport.render(SampleRun.run()).contains("\\u003c"), "HTML escaping must be off");
  }

  @Test
  void requirementsCarryNumbersOrNullAndTheSummaryCountsThem() {
    JsonObject report = report();
    JsonObject pass = report.getAsJsonArray("requirements").get(0).getAsJsonObject();
    assertEquals(0.005, pass.get("value").getAsDouble());
    assertEquals("W", pass.get("unit").getAsString());
    JsonObject notEvaluated = report.getAsJsonArray("requirements").get(2).getAsJsonObject();
    assertEquals("not-evaluated", notEvaluated.get("status").getAsString());
    assertTrue(notEvaluated.get("value").isJsonNull());
    assertEquals("beam waists are not computed yet", notEvaluated.get("reason").getAsString());
    JsonObject summary = report.getAsJsonObject("summary");
    assertEquals(2, summary.get("files").getAsInt());
    assertEquals(2, summary.get("errors").getAsInt());
    assertEquals(1, summary.get("warnings").getAsInt());
    assertEquals(1, summary.get("notes").getAsInt());
    assertEquals(1, summary.getAsJsonObject("requirements").get("not_evaluated").getAsInt());
  }
}
