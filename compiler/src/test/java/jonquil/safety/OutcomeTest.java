package jonquil.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** The caution text is fixed (README.md, Status); a not-evaluated outcome must say why. */
class OutcomeTest {

  @Test
  void cautionTextIsExact() {
    assertEquals(
        "Computed estimate only: a qualified laser safety officer must confirm it under the"
            + " applicable standard and local regulations; this tool does not replace a hazard"
            + " evaluation.",
        Outcome.CAUTION);
  }

  @Test
  void notEvaluatedNeedsAReason() {
    assertThrows(IllegalArgumentException.class, () -> Outcome.notEvaluated(" ", "x"));
    assertThrows(IllegalStateException.class, () -> Outcome.notEvaluated("why", "x").get());
  }

  @Test
  void emissionRejectsInconsistentInput() {
    assertThrows(IllegalArgumentException.class, () -> new Emission(532e-9, 1, 1e-3, 0, 0));
    assertThrows(IllegalArgumentException.class, () -> Emission.continuous(-1, 1));
    assertThrows(IllegalArgumentException.class, () -> Emission.continuous(532e-9, Double.NaN));
  }
}
