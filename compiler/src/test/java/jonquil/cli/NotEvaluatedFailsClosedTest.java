package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Fail closed: a requirement the checker cannot evaluate is not met. It is an error of its own
 * (J613) with its reason in every format, and the exit status is 1 with or without --strict.
 */
class NotEvaluatedFailsClosedTest {
  @TempDir Path dir;

  private static final String PROBE =
      "probe eye { aperture 7 mm }\ntrain t { s -> 1 m -> eye }\nrequire {\n";

  /**
   * 1300 nm lies in 1250–1400 nm, where this version does not implement the corneal/lens limit
   * (definition of its scope).
   */
  static final String ULTRAVIOLET =
      "source s { wavelength 1300 nm; power 1 W; beam waist 1 mm }\n"
          + PROBE
          + "  hazard class <= 1 at s\n}\n";

  /** 1320 nm lies in the same unimplemented 1250–1400 nm rows. */
  static final String TELECOM_SAFETY_ONLY =
      "source s { wavelength 1320 nm; power 2 W; beam waist 1 mm }\n"
          + PROBE
          + "  hazard class <= 1 at s\n  exposure at eye <= 100 %\n}\n";

  static final String NOHD_UNSUPPORTED =
      "source s { wavelength 1320 nm; power 2 W; beam waist 1 mm }\n"
          + PROBE
          + "  nohd <= 1 m at s\n}\n";

  private CliRun run(String spec, String... options) throws IOException {
    return CliRun.checkSpec(dir, spec, options);
  }

  @Test
  void anUltravioletSourceBoundToClassOneExitsOneWithTheReason() throws IOException {
    CliRun text = run(ULTRAVIOLET);
    assertEquals(1, text.exitCode(), text.out());
    assertTrue(text.out().contains("error: requirement not evaluated"), text.out());
    assertTrue(text.out().contains("1250–1400 nm"), text.out());
    assertTrue(text.out().contains("[J613]"), text.out());
    assertEquals(1, run(ULTRAVIOLET, "--strict").exitCode());
  }

  @Test
  void aBenchWithOnlyUnevaluatedSafetyRequirementsExitsOneInEveryFormat() throws IOException {
    for (String format : new String[] {"text", "json", "sarif"}) {
      CliRun r = run(TELECOM_SAFETY_ONLY, "--format", format);
      assertEquals(1, r.exitCode(), format + ": " + r.out());
      assertTrue(r.out().contains("J613"), format + ": " + r.out());
    }
    JsonObject json =
        JsonParser.parseString(run(TELECOM_SAFETY_ONLY, "--format", "json").out())
            .getAsJsonObject();
    assertEquals(2, json.getAsJsonObject("summary").get("errors").getAsInt());
  }

  @Test
  void anUnevaluatedSafetyFigureCarriesTheCautionAndAsksForAQualifiedPerson() throws IOException {
    CliRun r = run(NOHD_UNSUPPORTED);
    assertEquals(1, r.exitCode(), r.out());
    assertTrue(r.out().contains("qualified person must assess the emission"), r.out());
    assertTrue(r.out().contains("laser safety officer"), r.out());
  }

  @Test
  void aPulsedSourceKnownToBeAboveClass3RFailsClassOne() throws IOException {
    // 10 µJ, 100 ns at 308 nm, 10 kHz: the classifier places it above Class 3R (IEC 60825-1:2014
    // Table 6 AEL exceeded, the 302.5-315 nm single-pulse Class 3B AEL of Table 8 not
    // implemented), so a bound of Class 1 is broken whatever the exact class.
    String lidar =
        "source s { wavelength 308 nm; pulse_energy 10 uJ; pulse_duration 100 ns;"
            + " repetition_rate 10 kHz; beam waist 1 mm }\n"
            + PROBE
            + "  hazard class <= 1 at s\n}\n";
    CliRun r = run(lidar);
    assertEquals(1, r.exitCode(), r.out());
    assertTrue(r.out().contains("requirement not met"), r.out());
    assertTrue(r.out().contains("at least 3B"), r.out());
    assertTrue(r.out().contains("[J609]"), r.out());
    JsonObject req =
        JsonParser.parseString(run(lidar, "--format", "json").out())
            .getAsJsonObject()
            .getAsJsonArray("requirements")
            .get(0)
            .getAsJsonObject();
    assertEquals("fail", req.get("status").getAsString());
    // A class is a label, in JSON too, and a class has no numeric margin.
    assertEquals("3B", req.get("value").getAsString());
    assertEquals("1", req.get("bound").getAsString());
    assertTrue(req.get("margin").isJsonNull());
    assertTrue(req.get("value_is_lower_bound").getAsBoolean());
    assertEquals("at least 3B", req.getAsJsonObject("shown").get("value").getAsString());
  }

  @Test
  void anEditorsQuickPassShowsTheSameErrorAndLeavesOnlyAYieldToItsFullPass() {
    Path file = dir.resolve("bench.jonq");
    jonquil.Result editor =
        jonquil.Checker.check(
            jonquil.Workspace.withOverlay(dir, java.util.Map.of(file, ULTRAVIOLET)),
            java.util.List.of(file),
            jonquil.CheckOptions.EDITOR);
    assertTrue(
        editor.diagnostics().stream()
            .anyMatch(d -> d.code() == jonquil.diag.DiagnosticCode.REQUIREMENT_NOT_EVALUATED));
    String yield =
        "source s { wavelength 633 nm; power 1 mW ± 0.1 mW }\n"
            + "probe eye\n"
            + "train t { s -> 1 m -> eye }\n"
            + "require {\n"
            + "  yield >= 90 % for power at eye >= 0.5 mW\n"
            + "}\n";
    jonquil.Result typing =
        jonquil.Checker.check(
            jonquil.Workspace.withOverlay(dir, java.util.Map.of(file, yield)),
            java.util.List.of(file),
            jonquil.CheckOptions.EDITOR);
    // The quick pass has no finding for the undrawn yield; the editor's full pass (the lsp
    // module's EditorYieldsFailClosedTest) then shows the gate's verdict.
    assertEquals(List.of(), typing.diagnostics().stream().map(d -> d.code()).toList());
  }

  @Test
  void aRequirementLeftUnevaluatedFailsTheGateEvenWithoutAFinding() {
    jonquil.Result unevaluated =
        new jonquil.Result(
            java.util.Map.of(),
            List.of(),
            List.of(
                jonquil.analysis.RequirementOutcome.notEvaluated(
                    dir.resolve("a.jonq"),
                    jonquil.source.TextRange.EMPTY,
                    "nohd <= 1 m at s",
                    "the spec has errors")));
    assertEquals(ExitCode.FINDINGS, ExitCode.of(unevaluated, false, false, false));
  }
}
