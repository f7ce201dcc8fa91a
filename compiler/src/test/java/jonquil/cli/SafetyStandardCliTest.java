package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The governing standard is chosen by a spec's 'standard' line or by 'check --standard' (which
 * wins), IEC 60825-1:2014 by default; the others are stated beside the figure in text and JSON.
 */
class SafetyStandardCliTest {
  @TempDir Path dir;

  /**
   * A 1550 nm ranging transmitter: Directive 2006/25/EC Table 2.3 has a row there (E = 1000 W/m2
   * over 3.5 mm from 10 s, from memory), as IEC 60825-1:2014 Table A.1 and ANSI Z136.1 do.
   */
  static final String RANGING =
      "source tx { wavelength 1550 nm; power 5 mW; beam waist 2 mm }\n"
          + "probe eye { aperture 7 mm }\n"
          + "train t { tx -> 1 m -> eye }\n"
          + "require {\n  exposure at eye <= 100 %\n}\n";

  /**
   * A 1310 nm link: the IEC code of this version still leaves 1250-1400 nm not evaluated (its
   * retinal and corneal rows meet there), Directive 2006/25/EC Table 2.3 has a row (from memory).
   */
  static final String O_BAND =
      "source tx { wavelength 1310 nm; power 5 mW; beam waist 2 mm }\n"
          + "probe eye { aperture 7 mm }\n"
          + "train t { tx -> 1 m -> eye }\n"
          + "require {\n  exposure at eye <= 100 %\n}\n";

  /** A visible pointer both standards cover, where they agree (Tables 2.2 and A.1: 18 t^0.75). */
  static final String POINTER =
      "source p { wavelength 532 nm; power 0.5 mW; beam waist 1 mm }\n"
          + "probe eye { aperture 7 mm }\n"
          + "train t { p -> 1 m -> eye }\n"
          + "require {\n  exposure at eye <= 100 %\n}\n";

  private CliRun run(String spec, String... options) throws IOException {
    return CliRun.checkSpec(dir, spec, options);
  }

  @Test
  void byDefaultIecGatesAndTheDirectiveIsItsCrossCheck() throws IOException {
    CliRun r = run(POINTER);
    assertEquals(0, r.exitCode(), r.out());
    assertTrue(
        r.out().contains("IEC 60825-1:2014 (Ed. 3); beside it: Directive 2006/25/EC, Annex II"),
        r.out());
    assertTrue(
        r.out().contains("(agrees: the directive's public table is the sourced cross-check)"),
        r.out());
    assertTrue(r.out().contains("Computed estimate only"), r.out());
  }

  @Test
  void theIecCodeFailsClosedWhereTheDirectiveEvaluates() throws IOException {
    CliRun iec = run(O_BAND);
    assertEquals(1, iec.exitCode(), iec.out());
    assertTrue(iec.out().contains("[J613]"), iec.out());
    assertTrue(iec.out().contains("beside it: Directive 2006/25/EC, Annex II"), iec.out());

    CliRun directive = run(O_BAND, "--standard", "directive");
    assertEquals(0, directive.exitCode(), directive.out());
    assertTrue(directive.out().contains("requirement met: exposure is"), directive.out());
    assertTrue(
        directive
            .out()
            .contains("Directive 2006/25/EC; beside it: IEC 60825-1:2014 (Ed. 3) not evaluated"),
        directive.out());
    assertTrue(directive.out().contains("Computed estimate only"), directive.out());
  }

  @Test
  void theSpecLineChoosesAndTheOptionWins() throws IOException {
    CliRun spec = run("standard directive\n" + O_BAND);
    assertEquals(0, spec.exitCode(), spec.out());
    CliRun overridden = run("standard directive\n" + O_BAND, "--standard", "iec");
    assertEquals(1, overridden.exitCode(), overridden.out());
  }

  @Test
  void jsonCarriesTheComparison() throws IOException {
    CliRun r = run("standard directive\n" + RANGING, "--format", "json");
    assertEquals(0, r.exitCode(), r.out());
    JsonObject report = JsonParser.parseString(r.out()).getAsJsonObject();
    JsonObject requirement = report.getAsJsonArray("requirements").get(0).getAsJsonObject();
    String reason = requirement.get("reason").getAsString();
    assertTrue(reason.contains("; Directive 2006/25/EC; beside it:"), reason);
    assertTrue(reason.contains("ANSI Z136.1-2014 40.47 % (agrees)"), reason);
    assertTrue(reason.contains("Computed estimate only"), reason);
  }

  @Test
  void anUnknownStandardOnTheCommandLineIsBadUsageWithASuggestion() throws IOException {
    CliRun r = run(POINTER, "--standard", "directiv");
    assertEquals(2, r.exitCode(), r.out() + r.err());
    assertTrue(
        r.err().contains("unknown safety standard 'directiv'; did you mean 'directive'?"), r.err());
  }

  @Test
  void sarifCarriesTheGoverningStandardAndTheComparison() throws IOException {
    CliRun r = run(RANGING, "--standard", "directive", "--format", "sarif");
    assertEquals(0, r.exitCode(), r.out());
    assertTrue(r.out().contains("Directive 2006/25/EC; beside it: IEC 60825-1:2014"), r.out());
    assertTrue(r.out().contains("Computed estimate only"), r.out());
  }

  @Test
  void theStandardIsChosenOnceWithItsNameAlone() throws IOException {
    CliRun twice = run("standard directive\nstandard ansi\n" + RANGING);
    assertEquals(1, twice.exitCode(), twice.out());
    assertTrue(twice.out().contains("the safety standard is chosen twice"), twice.out());
    CliRun withBlock = run("standard directive { edition 2006 }\n" + RANGING);
    assertEquals(1, withBlock.exitCode(), withBlock.out());
    assertTrue(withBlock.out().contains("write the standard's name alone"), withBlock.out());
  }

  @Test
  void aPartLibraryMayNotChooseTheStandard() throws IOException {
    Files.writeString(dir.resolve("parts.jonq"), "standard directive\nprobe spare\n");
    CliRun r = run("use \"parts.jonq\"\n" + RANGING);
    assertEquals(1, r.exitCode(), r.out());
    assertTrue(r.out().contains("choose the safety standard in the main spec"), r.out());
  }
}
