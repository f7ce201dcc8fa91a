package jonquil;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.diag.Severity;
import jonquil.resolve.Ambient;
import org.junit.jupiter.api.Test;

/**
 * The bench's medium: 'ambient air { … }' with one condition per line, or 'ambient vacuum'. Every
 * condition changes what is computed, conditions outside Ciddor's validity are refused at their
 * line (J411), and a spec without an ambient line gets the stated default.
 */
class AmbientTest {
  private static final Path ROOT = Path.of("/ambient-test");
  private static final Path FILE = ROOT.resolve("bench.jonq");

  private static String bench(String ambient) {
    return ambient
        + "\nsource lamp { wavelength 633 nm; power 1 W; polarization linear 0 deg }\n"
        + "material glass = index 1.5\n"
        + "window pane { material glass; thickness 2 mm }\n"
        + "detector meter\n"
        + "train bench { lamp -> 50 mm -> pane -> 50 mm -> meter }\n"
        + "require { power at meter >= 1 mW }\n";
  }

  private static Result check(String text) {
    return Checker.check(
        Workspace.withOverlay(ROOT, Map.of(FILE, text)), List.of(FILE), CheckOptions.EDITOR);
  }

  private static double meter(String ambient) {
    Result r = check(bench(ambient));
    assertEquals(0, r.count(Severity.ERROR), () -> r.diagnostics().toString());
    return r.requirements().get(0).value().getAsDouble();
  }

  private static List<Diagnostic> errors(String ambient) {
    return check(bench(ambient)).diagnostics().stream()
        .filter(d -> d.severity() == Severity.ERROR)
        .toList();
  }

  private static final String DEFAULTS =
      "ambient air {\n  temperature 20 degC\n  pressure 101.325 kPa\n  humidity 0 %\n"
          + "  co2 450 ppm\n}";

  @Test
  void theStatedDefaultsAreTheDefault() {
    assertEquals(meter(""), meter(DEFAULTS), 0);
    assertEquals(meter(""), meter("ambient air"), 0);
    Result r = check(bench(""));
    assertEquals(Ambient.DEFAULT, r.models().get(FILE).ambient());
    assertEquals(
        "air at 20 °C, 101.325 kPa, 0 % RH, 450 ppm CO₂ (Ciddor 1996)", Ambient.DEFAULT.describe());
  }

  @Test
  void everyConditionChangesTheResult() {
    double base = meter(DEFAULTS);
    for (String[] change :
        new String[][] {
          {"temperature 20 degC", "temperature 30 degC"},
          {"pressure 101.325 kPa", "pressure 90 kPa"},
          {"humidity 0 %", "humidity 60 %"},
          {"co2 450 ppm", "co2 1500 ppm"},
        }) {
      String changed = DEFAULTS.replace(change[0], change[1]);
      assertNotEquals(base, meter(changed), change[1] + " changed nothing");
    }
  }

  @Test
  void vacuumIsIndexOne() {
    // Vacuum: R = ((1.5 − 1)/(1.5 + 1))² = 0.04 per face, and the slab passes 0.96/1.04 (Hecht,
    // Optics, 5th ed., sec. 4.6.2 for R; the incoherent slab sum is a geometric series,
    // definition).
    assertEquals(0.96 / 1.04, meter("ambient vacuum"), 1e-12);
    assertTrue(meter("ambient vacuum") < meter(""));
  }

  @Test
  void conditionsOutsideCiddorAreRefusedAtTheirLine() {
    for (String[] bad :
        new String[][] {
          {"temperature 20 degC", "temperature 150 degC"},
          {"pressure 101.325 kPa", "pressure 60 kPa"},
          {"humidity 0 %", "humidity 120 %"},
          {"co2 450 ppm", "co2 3000 ppm"},
        }) {
      List<Diagnostic> errors = errors(DEFAULTS.replace(bad[0], bad[1]));
      assertEquals(1, errors.size(), bad[1] + ": " + errors);
      assertEquals(DiagnosticCode.AMBIENT_OUT_OF_RANGE, errors.get(0).code());
      String text = bench(DEFAULTS.replace(bad[0], bad[1]));
      assertEquals(text.indexOf(bad[1]), errors.get(0).range().start(), bad[1]);
    }
  }

  @Test
  void malformedAmbientsAreRefused() {
    assertEquals(
        DiagnosticCode.BAD_ARGUMENT, errors("ambient water").get(0).code(), "unknown fill");
    assertEquals(
        DiagnosticCode.UNKNOWN_PARAMETER,
        errors("ambient vacuum { temperature 20 degC }").get(0).code());
    assertEquals(
        DiagnosticCode.UNKNOWN_PARAMETER,
        errors("ambient air { temprature 20 degC }").get(0).code());
    assertEquals(
        DiagnosticCode.DUPLICATE_PARAMETER, errors("ambient vacuum\nambient air").get(0).code());
    assertEquals(
        DiagnosticCode.BAD_ARGUMENT,
        errors("ambient air { temperature 20 degC ± 1 degC }").get(0).code());
    assertEquals(
        DiagnosticCode.WRONG_DIMENSION, errors("ambient air { pressure 3 mm }").get(0).code());
  }
}
