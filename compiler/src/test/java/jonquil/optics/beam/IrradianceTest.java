package jonquil.optics.beam;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The one Gaussian irradiance and aperture transmission, against the closed forms of Siegman
 * "Lasers" (1986), §17.1: I(r) = (2P/(πw²)) exp(−2r²/w²), so the peak is 2P/(πw²) and a centred
 * aperture of radius a passes 1 − exp(−2a²/w²).
 */
class IrradianceTest {

  @Test
  void thePeakIsTwiceTheMeanOverTheOneOverESquaredDisc() {
    // Siegman 1986, §17.1: peak 2P/(πw²). 1 W in w = 1 mm: 2/(π·1e-6) = 6.3662e5 W/m².
    assertEquals(6.3662e5, Irradiance.peak(1, 1e-3), 1);
    assertEquals(Irradiance.peak(1, 1e-3) / 2, Irradiance.mean(1, 1e-3), 1e-9);
  }

  @Test
  void transmissionMatchesTheClosedFormOverSeededBeamsAndApertures() {
    // Siegman 1986, §17.1: T(a) = 1 − exp(−2a²/w²) for an aperture of radius a.
    SplittableRandom random = new SplittableRandom(20240611L);
    for (int i = 0; i < 1000; i++) {
      double w = 1e-5 + random.nextDouble() * 1e-2;
      double a = random.nextDouble() * 3 * w;
      double closed = 1 - Math.exp(-2 * a * a / (w * w));
      assertEquals(closed, Clipping.transmittedFraction(w, 2 * a), 1e-14, "w=" + w + " a=" + a);
    }
  }

  @Test
  void theMeanOverAnApertureIsWhatItPassesOverItsArea() {
    // Definition; with the closed form above. A 7 mm aperture on a beam of w = 3.5 mm passes
    // 1 − e^−2; over the aperture area π(3.5 mm)² that is (1 − e^−2)·P/(πw²).
    double w = 3.5e-3;
    double expected = (1 - Math.exp(-2)) / (Math.PI * w * w);
    assertEquals(expected, Irradiance.meanOverAperture(1, w, 7e-3), expected * 1e-12);
  }

  @Test
  void aPinholeSeesThePeak() {
    // Siegman 1986, §17.1: as a → 0 the mean over the aperture tends to the on-axis peak.
    double w = 1e-3;
    assertEquals(
        Irradiance.peak(1, w),
        Irradiance.meanOverAperture(1, w, 2e-7),
        Irradiance.peak(1, w) * 1e-6);
  }
}
