package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The command line on a Mach–Zehnder written in the network syntax: the text report and the JSON
 * report both state the visibility that the arms meeting at the recombining splitter give.
 */
class InterferenceNetworkCliTest {
  static final String SPEC =
      """
      source s { wavelength 633 nm; power 2 mW; polarization linear 0 deg; coherence_length 1 m }
      splitter split { ratio 50 %; aoi 45 deg }
      splitter recombine { ratio 50 %; aoi 45 deg }
      mirror m1 { reflectance 100 %; aoi 45 deg }
      mirror m2 { reflectance 100 %; aoi 45 deg }
      waveplate hwp { retardance 0.5 wave at 633 nm; fast_axis 22.5 deg }
      detector d1
      detector d2
      train mz {
        s -> 100 mm -> split.through -> 150 mm -> m1 -> 150 mm -> recombine.through -> 100 mm -> d1
        split.reflected -> 150 mm -> m2 -> 50 mm -> hwp -> 100 mm -> recombine.side -> 100 mm -> d2
      }
      require {
        visibility at d1 >= 0.7
        power at recombine.through <= 1.5 mW
      }
      """;

  /** A half-wave plate at 22.5° turns one arm by 45°: V = |cos 45°| (definition, equal arms). */
  static final double VISIBILITY = Math.cos(Math.PI / 4);

  @Test
  void theTextReportStatesTheVisibilityAndThePowerOverPhase(@TempDir Path dir) throws IOException {
    Files.writeString(dir.resolve("mz.jonq"), SPEC);
    CliRun run = CliRun.of(dir, "check", "mz.jonq");
    assertTrue(
        run.out()
            .contains(
                "mz.jonq:14:3: note: requirement met: visibility is 0.7071 (line 633 nm),"
                    + " bound 0.7, margin 0.007107 [J611]"),
        run.out());
    // 1 mW · (1 ± 0.7071) (Hecht, Optics, 5th ed., §9.1, from memory): 292.9 µW .. 1.707 mW.
    assertTrue(
        run.out()
            .contains(
                "mz.jonq:15:3: error: requirement not met: power is 1.707 mW (over the unknown"
                    + " phase of beams that meet here: 292.9 µW .. 1.707 mW), bound 1.5 mW"),
        run.out());
    assertEquals(1, run.exitCode(), run.err());
  }

  @Test
  void theJsonReportCarriesTheVisibilityOfTheRequirementAndOfThePort(@TempDir Path dir)
      throws IOException {
    Files.writeString(dir.resolve("mz.jonq"), SPEC);
    CliRun run = CliRun.of(dir, "check", "--format", "json", "mz.jonq");
    JsonObject report = JsonParser.parseString(run.out()).getAsJsonObject();
    JsonObject visibility = report.getAsJsonArray("requirements").get(0).getAsJsonObject();
    assertEquals("visibility at d1 >= 0.7", visibility.get("text").getAsString());
    assertEquals("pass", visibility.get("status").getAsString());
    assertEquals(VISIBILITY, visibility.get("value").getAsDouble(), 1e-9); // definition
    JsonArray ports =
        report.getAsJsonArray("values").get(0).getAsJsonObject().getAsJsonArray("ports");
    JsonObject through = null;
    for (var p : ports) {
      JsonObject o = p.getAsJsonObject();
      if (o.get("element").getAsString().equals("recombine")
          && o.get("port").getAsString().equals("through")) {
        through = o;
      }
    }
    assertTrue(through != null, ports.toString());
    JsonObject line = through.getAsJsonArray("interference").get(0).getAsJsonObject();
    assertEquals("s#0", line.get("line").getAsString());
    assertEquals(2, line.get("beams").getAsInt());
    assertEquals(VISIBILITY, line.get("visibility").getAsDouble(), 1e-9); // definition
    // Hecht §9.1 (from memory): P = 1 mW · (1 ± V), the two arms each bringing 0.5 mW.
    assertEquals(1e-3 * (1 - VISIBILITY), line.get("power_min_W").getAsDouble(), 1e-15);
    assertEquals(1e-3 * (1 + VISIBILITY), line.get("power_max_W").getAsDouble(), 1e-15);
    assertTrue(line.get("range_exact").getAsBoolean());
  }
}
