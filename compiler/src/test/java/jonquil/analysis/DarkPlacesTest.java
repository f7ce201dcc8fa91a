package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import jonquil.Result;
import jonquil.diag.DiagnosticCode;
import org.junit.jupiter.api.Test;

/**
 * A safety figure where no light arrives is that of no light, for a pulsed source too. Found by the
 * fuzzer: a scan mirror's reflectance mutated to '00 %' made the checker fail internally (a pulse
 * train of no pulse energy) on the exposure behind it.
 */
class DarkPlacesTest {
  static final String SPEC =
      "source uv { wavelength 355 nm; pulse_energy 20 uJ; pulse_duration 15 ns;"
          + " repetition_rate 50 kHz; power 1 W; polarization linear 0 deg; beam waist 0.35 mm }\n"
          + "mirror scan { reflectance 0 %; aoi 30 deg }\n"
          + "probe eye { aperture 1 mm; exposure_time 10 s }\n"
          + "dump d\n"
          + "train t { uv -> 100 mm -> scan -> 100 mm -> eye -> 10 mm -> d }\n"
          + "require {\n"
          + "  exposure at eye <= 50 %\n"
          + "  eyewear od at eye <= OD 1\n"
          + "  exposure at eye <= 50 % for viewing specular for reflectance 4 %\n"
          + "}\n";

  @Test
  void behindAMirrorThatReflectsNothingEveryFigureIsThatOfNoLight() {
    Result r = Bench.check(SPEC);
    assertTrue(
        r.diagnostics().stream().noneMatch(d -> d.code() == DiagnosticCode.INTERNAL_ERROR),
        r.diagnostics().toString());
    for (var q : r.requirements()) {
      // No light, no exposure (definition).
      assertEquals(jonquil.analysis.RequirementStatus.PASS, q.status(), q.reason());
      assertEquals(0.0, q.value().getAsDouble(), 0.0, q.reason());
    }
  }
}
