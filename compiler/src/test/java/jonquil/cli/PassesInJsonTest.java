package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.util.ArrayList;
import java.util.List;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import jonquil.testing.Repo;
import org.junit.jupiter.api.Test;

/** The JSON report of a double pass lists each pass in the order light takes them. */
class PassesInJsonTest {
  @Test
  void theDoublePassSampleListsItsPassesInTheOrderLightTakesThem() {
    Result r =
        Checker.check(
            Workspace.onDisk(Repo.samples()),
            List.of(Repo.samples().resolve("double_pass_switch.jonq")));
    String json = JsonReport.render(new CheckRun(r, Repo.samples(), Repo.samples(), List.of()));
    assertEquals(
        List.of(), SchemaCheck.fromClasspath("jonquil/cli/check-result.schema.json").errors(json));
    JsonObject values =
        JsonParser.parseString(json)
            .getAsJsonObject()
            .getAsJsonArray("values")
            .get(0)
            .getAsJsonObject();
    JsonArray passes = values.getAsJsonArray("passes");
    List<String> order = new ArrayList<>();
    passes.forEach(
        p ->
            order.add(
                p.getAsJsonObject().get("element").getAsString()
                    + "."
                    + p.getAsJsonObject().get("face").getAsString()));
    assertEquals(List.of("pbs1.front", "qwp1.front", "qwp1.back", "pbs1.back"), order);
    assertEquals(
        "align_laser",
        values
            .getAsJsonArray("returned_to_sources")
            .get(0)
            .getAsJsonObject()
            .get("source")
            .getAsString());
  }
}
