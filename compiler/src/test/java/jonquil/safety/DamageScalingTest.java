package jonquil.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Common-practice LIDT scaling: F ∝ sqrt(tau) (Stuart et al., Phys. Rev. B 53, 1749 (1996), valid
 * for tau >~ 50 ps; 10 ps–100 ns window is common practice) and F ∝ lambda (common practice, from
 * memory).
 */
class DamageScalingTest {

  @ParameterizedTest(name = "1e5 J/m2 at 10 ns, 1064 nm -> {0} s, {1} nm = {2}")
  @CsvSource({
    "1e-9, 1064, 31623", // /sqrt(10)
    "1e-8, 532, 50000", // x 532/1064
    "1e-10, 532, 5000", // x 0.1 x 0.5
    "1e-7, 1064, 316228", // x sqrt(10)
  })
  void scales(double tau2, double nm2, double expected) {
    Outcome<Double> o = DamageScaling.pulsedFluence(1e5, 1e-8, 1064e-9, tau2, nm2 * 1e-9);
    assertEquals(expected, o.get(), expected * 1e-4);
    assertNotEquals(Outcome.CAUTION, o.caution()); // a damage threshold is not a safety limit
  }

  @ParameterizedTest(name = "{0} s is outside the window")
  @CsvSource({"1e-13", "1e-12", "1e-6", "1e-3"})
  void outsideWindowIsNotEvaluated(double tau2) {
    Outcome<Double> o = DamageScaling.pulsedFluence(1e5, 1e-8, 1064e-9, tau2, 1064e-9);
    assertFalse(o.evaluated());
  }

  @Test
  void continuousThresholdIsUsedAsIs() {
    assertEquals(1e9, DamageScaling.continuous(1e9).get());
  }
}
