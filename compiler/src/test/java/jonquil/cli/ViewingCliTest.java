package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import jonquil.safety.Outcome;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Safety requirements with a viewing and a duration, end to end: the text and the JSON state which
 * exposure duration each figure assumed and why, and keep the caution.
 */
class ViewingCliTest {
  static final String SPEC =
      """
      source pointer { wavelength 532 nm; power 50 mW; beam waist 0.5 mm }
      probe card
      train { pointer -> 1 m -> card }
      require {
        exposure at card <= 100 % for viewing diffuse for reflectance 90 %
        nohd at pointer <= 200 m for viewing specular for reflectance 4 %
        eyewear od at card <= OD 3 for duration 10 s
        nohd at pointer <= 1 km
      }
      """;

  @TempDir Path dir;

  @Test
  void textStatesTheDurationAndWhy() throws IOException {
    Files.writeString(dir.resolve("viewing.jonq"), SPEC);
    CliRun run = CliRun.of(dir, "check", "viewing.jonq");
    assertEquals(0, run.exitCode(), run.out() + run.err());
    String out = run.out();
    assertTrue(out.contains("exposure duration 100 s: diffuse viewing triggers no aversion"), out);
    assertTrue(out.contains("exposure duration 0.25 s: aversion response, visible"), out);
    assertTrue(out.contains("exposure duration 10 s: stated on the requirement"), out);
    assertTrue(out.contains("eyewear EN 207 D 532 LB4"), out);
    assertTrue(out.contains("alignment eyewear EN 208 532 RB2"), out);
    for (String line : out.lines().filter(l -> l.contains("requirement met")).toList()) {
      assertTrue(line.contains(Outcome.CAUTION), line);
    }
  }

  @Test
  void jsonStatesTheDurationAndWhyAndValidates() throws IOException {
    Files.writeString(dir.resolve("viewing.jonq"), SPEC);
    CliRun run = CliRun.of(dir, "check", "--format", "json", "viewing.jonq");
    assertEquals(0, run.exitCode(), run.err());
    List<String> errors =
        SchemaCheck.fromClasspath("jonquil/cli/check-result.schema.json").errors(run.out());
    assertTrue(errors.isEmpty(), String.join("\n", errors));
    JsonObject report = JsonParser.parseString(run.out()).getAsJsonObject();
    JsonArray requirements = report.getAsJsonArray("requirements");
    assertEquals(4, requirements.size());
    for (var r : requirements) {
      String reason = r.getAsJsonObject().get("reason").getAsString();
      assertTrue(reason.contains("exposure duration "), reason);
      assertTrue(reason.contains(Outcome.CAUTION), reason);
    }
    JsonObject diffuse = requirements.get(0).getAsJsonObject();
    // 0.9 * 50 mW/(pi (0.1 m)^2) = 1.432 W/m2 over the 10 W/m2 MPE for 100 s (Lambertian formula,
    // ANSI Z136.1-2014 from memory; MPE IEC 60825-1:2014 Table A.1, from memory)
    assertEquals(0.9 * 0.05 / (Math.PI * 0.01) / 10, diffuse.get("value").getAsDouble(), 1e-6);
    // Specular at 4 %: 2 mW, MPE 25.46 W/m2 (532 nm, 0.25 s; IEC 60825-1:2014, from memory);
    // a = 1 mm/sqrt(2), phi = 2 lambda/(pi w0)/sqrt(2) = 0.479 mrad at 1/e (Gaussian definition):
    // (sqrt(4*0.002/(pi*25.46)) - 0.000707)/0.000479 = 19.40 m (ANSI Z136.1-2014 NOHD, from memory)
    assertEquals(19.40, requirements.get(1).getAsJsonObject().get("value").getAsDouble(), 0.05);
    JsonObject source =
        report
            .getAsJsonArray("values")
            .get(0)
            .getAsJsonObject()
            .getAsJsonArray("safety")
            .get(0)
            .getAsJsonObject();
    assertTrue(
        source.get("exposure_time_reason").getAsString().startsWith("aversion response, visible"),
        source.toString());
  }

  @Test
  void theSumOverLinesNamesTheGoverningLine() {
    CliRun run = CliRun.of(jonquil.testing.Repo.root(), "check", LinesBenchCliTest.BENCH);
    assertEquals(0, run.exitCode(), run.out() + run.err());
    // Of 488 nm OD 0.7509 and 561 nm OD 0.8758 (and 808 nm OD 0), 561 nm carries
    // 10^0.8758 / (10^0.7509 + 10^0.8758 + 1) = 53.1 % of the sum (definition of the share)
    assertTrue(run.out().contains("governing line 561 nm (53.1 % of the sum)"), run.out());
    assertTrue(run.out().contains("at 488 nm, the strictest of their wavelengths"), run.out());
  }

  @Test
  void aMirrorsReflectanceAndAStatedSubtenseAreUsedAndSaid() throws IOException {
    Files.writeString(
        dir.resolve("mirror.jonq"),
        """
        source pointer { wavelength 635 nm; power 50 mW; beam waist 0.5 mm }
        mirror m1 { reflectance 99 %; aoi 45 deg }
        probe card
        train { pointer -> 1 m -> m1 -> 1 m -> card }
        require {
          exposure at m1 <= 10000 % for viewing specular
          exposure at m1 <= 10000 % for viewing specular for subtense 3 mrad
        }
        """);
    CliRun run = CliRun.of(dir, "check", "--format", "json", "mirror.jonq");
    assertEquals(0, run.exitCode(), run.out() + run.err());
    JsonArray requirements =
        JsonParser.parseString(run.out()).getAsJsonObject().getAsJsonArray("requirements");
    JsonObject point = requirements.get(0).getAsJsonObject();
    JsonObject extended = requirements.get(1).getAsJsonObject();
    assertTrue(
        point.get("reason").getAsString().contains("(its 'reflectance' on 'm1')"), run.out());
    // 3 mrad over 0.25 s: C6 = 3/1.5 = 2 (IEC 60825-1:2014 Table 10, from memory) halves it
    assertEquals(point.get("value").getAsDouble() / 2, extended.get("value").getAsDouble(), 1e-9);
    assertTrue(extended.get("reason").getAsString().contains("C6 = 2"), run.out());
  }
}
