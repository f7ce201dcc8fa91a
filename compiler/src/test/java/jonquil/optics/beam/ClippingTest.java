package jonquil.optics.beam;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Aperture transmission of a Gaussian beam against published values; each check names its source.
 */
class ClippingTest {

  @Test
  void anApertureOfTheOneOverESquaredDiameterPasses86Percent() {
    // Saleh & Teich 2007, §3.1: the power within radius ρ0 is 1 − exp(−2ρ0²/W²); about 86 % lies
    // within ρ0 = W. Siegman 1986, §17.1 gives the same aperture transmission (from memory).
    double w = 1.7e-3;
    assertEquals(1 - Math.exp(-2), Clipping.transmittedFraction(w, 2 * w), 1e-15);
    assertEquals(0.8647, Clipping.transmittedFraction(w, 2 * w), 1e-4);
  }

  @Test
  void anApertureOfOneAndAHalfRadiiPassesAbout99Percent() {
    // Saleh & Teich 2007, §3.1 (from memory): "about 99 %" within ρ0 = 1.5 W. Exactly
    // 1 − e^(−4.5) = 98.89 %, so such an aperture still loses just over 1 %.
    double t = Clipping.transmittedFraction(1e-3, 3e-3);
    assertEquals(0.98889, t, 1e-5);
    assertTrue(Clipping.significant(t));
  }

  @Test
  void theDiameterPiWCriterionPassesAbove99Percent() {
    // Siegman 1986, §17.1 (from memory): an aperture of diameter π w passes ≈ 99 % of a TEM00 beam.
    // Exactly 1 − exp(−π²/2) = 99.28 %.
    double t = Clipping.transmittedFraction(1e-3, Math.PI * 1e-3);
    assertEquals(1 - Math.exp(-Math.PI * Math.PI / 2), t, 1e-15);
    assertTrue(t > 0.99);
    assertFalse(Clipping.significant(t));
  }

  @Test
  void limitsAndInverse() {
    assertEquals(0, Clipping.transmittedFraction(1e-3, 0));
    assertEquals(1, Clipping.transmittedFraction(1e-3, Double.POSITIVE_INFINITY));
    // A pinhole much smaller than the beam passes its area times the peak intensity 2P/(πW²)
    // (Saleh & Teich 2007, §3.1, peak intensity of a Gaussian beam), to first order in (a/W)².
    double w = 1e-3;
    double a = 1e-6;
    assertEquals(
        Math.PI * a * a * 2 / (Math.PI * w * w), Clipping.transmittedFraction(w, 2 * a), 1e-11);
    assertEquals(2 * w, Clipping.apertureFor(w, 1 - Math.exp(-2)), 1e-15);
    assertThrows(IllegalArgumentException.class, () -> Clipping.transmittedFraction(0, 1));
    assertThrows(IllegalArgumentException.class, () -> Clipping.significant(1.2));
  }
}
