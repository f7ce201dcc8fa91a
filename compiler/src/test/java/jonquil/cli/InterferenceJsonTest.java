package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import jonquil.analysis.PortArrival;
import jonquil.analysis.TrainSolution;
import jonquil.optics.JonesVector;
import org.junit.jupiter.api.Test;

/**
 * The JSON report shows each line's visibility and power range where beams of one line meet, with
 * arrivals placed by hand as the network propagation places them (InterferenceNetworkCliTest).
 */
class InterferenceJsonTest {
  static final Path ROOT = Path.of("/virtual/interference-json").toAbsolutePath();

  static String json(String coherence, double pathDifference) {
    Path file = ROOT.resolve("mz.jonq");
    String spec =
        "source s { wavelength 633 nm; power 1 mW; polarization linear 0 deg"
            + coherence
            + " }\nsplitter bs { ratio 50 % }\ndetector d1\ndetector d2\n"
            + "train t {\n  s -> 100 mm -> bs.through -> 100 mm -> d1\n"
            + "  bs.reflected -> 100 mm -> d2\n}\n";
    Result r = Checker.check(Workspace.withOverlay(ROOT, Map.of(file, spec)), List.of(file));
    TrainSolution s = r.solutions().get(file);
    String line = PortArrival.lineKey("s", 0);
    List<PortArrival> arms =
        List.of(
            new PortArrival(line, 633e-9, JonesVector.linear(0, 0.25e-3), 0.2),
            new PortArrival(line, 633e-9, JonesVector.linear(0, 0.25e-3), 0.2 + pathDifference));
    TrainSolution met = s.withArrivals(Map.of("bs.through", arms));
    Result withArms =
        new Result(
            r.files(), r.trees(), r.diagnostics(), r.requirements(), r.models(), Map.of(file, met));
    return JsonReport.render(new CheckRun(withArms, ROOT, ROOT, List.of()));
  }

  static JsonObject through(String json) {
    JsonArray ports =
        JsonParser.parseString(json)
            .getAsJsonObject()
            .getAsJsonArray("values")
            .get(0)
            .getAsJsonObject()
            .getAsJsonArray("ports");
    for (var p : ports) {
      JsonObject o = p.getAsJsonObject();
      if (o.get("element").getAsString().equals("bs")
          && o.get("port").getAsString().equals("through")) {
        return o;
      }
    }
    throw new AssertionError("no bs.through in " + ports);
  }

  @Test
  void aPortWhereArmsMeetCarriesVisibilityAndPowerRange() {
    String json = json("; coherence_length 10 cm", 0);
    assertEquals(
        List.of(), SchemaCheck.fromClasspath("jonquil/cli/check-result.schema.json").errors(json));
    JsonObject i = through(json).getAsJsonArray("interference").get(0).getAsJsonObject();
    assertEquals("s#0", i.get("line").getAsString());
    assertEquals(2, i.get("beams").getAsInt());
    // Equal parallel arms at zero path difference: V = 1, power 0 .. 4·0.25 mW (Hecht, Optics,
    // 5th ed., §9.1; from memory).
    assertEquals(1.0, i.get("visibility").getAsDouble(), 1e-12);
    assertEquals(0.0, i.get("power_min_W").getAsDouble(), 1e-15);
    assertEquals(1e-3, i.get("power_max_W").getAsDouble(), 1e-15);
    assertTrue(i.get("range_exact").getAsBoolean());
    assertFalse(through(json("; coherence_length 10 cm", 0)).toString().contains("unknown"));
  }

  @Test
  void anUnknownVisibilityIsNullWithItsReason() {
    String json = json("", 0.05);
    assertEquals(
        List.of(), SchemaCheck.fromClasspath("jonquil/cli/check-result.schema.json").errors(json));
    JsonObject i = through(json).getAsJsonArray("interference").get(0).getAsJsonObject();
    assertTrue(i.get("visibility").isJsonNull());
    assertTrue(i.get("visibility_unknown").getAsString().contains("'coherence_length'"));
  }

  @Test
  void portsWhereNothingMeetsHaveNoInterferenceEntry() {
    assertFalse(json("; coherence_length 10 cm", 0).contains("\"interference\": []"));
    JsonArray ports =
        JsonParser.parseString(json("", 0))
            .getAsJsonObject()
            .getAsJsonArray("values")
            .get(0)
            .getAsJsonObject()
            .getAsJsonArray("ports");
    long with = 0;
    for (var p : ports) {
      with += p.getAsJsonObject().has("interference") ? 1 : 0;
    }
    assertEquals(1, with);
  }
}
