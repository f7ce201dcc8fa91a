package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import jonquil.Result;
import jonquil.diag.DiagnosticCode;
import org.junit.jupiter.api.Test;

/**
 * A bound on ellipticity without a handedness bounds its size; with one ({@code >= 40 deg right})
 * the size and the sense of rotation both.
 */
class EllipticityHandednessTest {
  private static RequirementStatus status(String polarization, String requirement) {
    Result r =
        Bench.check(
            "source s { wavelength 633 nm; power 10 mW; polarization "
                + polarization
                + " }\nprobe mid\ntrain t { s -> 10 mm -> mid }\nrequire {\n  "
                + requirement
                + "\n}\n");
    assertEquals(1, r.requirements().size());
    return r.requirements().get(0).status();
  }

  @Test
  void leftCircularLightMeetsALeftBoundAndFailsARightOne() {
    // Left-circular light: ellipticity angle −45° (definition, S3 < 0 for left-handed light in
    // optics/package-info.java), so its size is 45° and its sense left.
    assertEquals(RequirementStatus.PASS, status("circular left", "ellipticity at mid >= 40 deg"));
    assertEquals(
        RequirementStatus.PASS, status("circular left", "ellipticity at mid >= 40 deg left"));
    assertEquals(
        RequirementStatus.FAIL, status("circular left", "ellipticity at mid >= 40 deg right"));
  }

  @Test
  void anUpperBoundWithAHandednessNeedsThatHand() {
    // Linear light has no sense of rotation (definition): it meets '<= 5 deg' by its size alone,
    // but not '<= 5 deg right', and right-circular light is too large for either.
    assertEquals(RequirementStatus.PASS, status("linear 0 deg", "ellipticity at mid <= 5 deg"));
    assertEquals(
        RequirementStatus.FAIL, status("linear 0 deg", "ellipticity at mid <= 5 deg right"));
    assertEquals(
        RequirementStatus.FAIL, status("circular right", "ellipticity at mid <= 5 deg right"));
    assertEquals(
        RequirementStatus.PASS,
        status("elliptical 0 deg 0.05 right", "ellipticity at mid <= 5 deg right"));
    assertEquals(
        RequirementStatus.FAIL,
        status("elliptical 0 deg 0.05 left", "ellipticity at mid <= 5 deg right"));
  }

  @Test
  void theValueIsCountedInTheStatedSense() {
    Result r =
        Bench.check(
            """
            source s { wavelength 633 nm; power 10 mW; polarization circular left }
            probe mid
            train t { s -> 10 mm -> mid }
            require {
              ellipticity at mid >= 40 deg right
            }
            """);
    RequirementOutcome o = r.requirements().get(0);
    // −45° counted in the right-handed sense (definition), against the stated 40°.
    assertEquals(-45, Math.toDegrees(o.value().getAsDouble()), 1e-9);
    assertTrue(o.margin().getAsDouble() < 0);
  }

  @Test
  void onlyAnEllipticityBoundTakesAHandedness() {
    java.nio.file.Path file = Bench.ROOT.resolve("test.jonq");
    String spec =
        """
        source s { wavelength 633 nm; power 10 mW; polarization circular left }
        probe mid
        train t { s -> 10 mm -> mid }
        require {
          azimuth at mid <= 5 deg right
        }
        """;
    Result r =
        jonquil.Checker.check(
            jonquil.Workspace.withOverlay(Bench.ROOT, java.util.Map.of(file, spec)),
            java.util.List.of(file));
    assertTrue(
        r.diagnostics().stream()
            .anyMatch(
                d ->
                    d.code() == DiagnosticCode.BAD_ARGUMENT
                        && d.message().startsWith("only an 'ellipticity' bound takes")),
        r.diagnostics().toString());
  }
}
