package jonquil.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * OD = log10(H/MPE): the definition of optical density (log10 of the attenuation) applied to the
 * attenuation that brings the exposure H down to the MPE (common practice; ANSI Z136.1-2014, from
 * memory).
 */
class EyewearTest {

  @Test
  void aBlinkIntoTheAlignmentBeamOfAGreenBench() {
    // Our own case: a 0.25 s blink into 2.4 W/cm² of visible light. The MPE is 18 t^0.75 J/m²
    // over t (IEC 60825-1:2014, Table A.1, from memory) = 25.46 W/m²; computed by hand:
    // OD = log10(2.4e4 / 25.46) = log10(942.6) = 2.974 (definition of optical density).
    assertEquals(2.974, Eyewear.forLimit(2.4e4, 25.46).get(), 0.001);
  }

  @Test
  void apertureAndPeakForASmallBeam() {
    // 1 W at 532 nm, 2 mm 1/e2 beam, 0.25 s: over 7 mm 1 W*(1-exp(-24.5))/3.848e-5 m2 = 25985 W/m2
    // -> OD 3.01; peak 2P/(pi w^2) = 2/(pi*1e-6) = 636620 W/m2 -> OD 4.40 (definition of optical
    // density, log10(H/MPE); MPE 18 t^0.75 J/m² over t, IEC 60825-1:2014, Table A.1, from memory).
    OpticalDensity od = Eyewear.required(Emission.continuous(532e-9, 1), 2e-3, 0.25).get();
    assertEquals(3.01, od.atAperture(), 0.01);
    assertEquals(4.40, od.atPeak(), 0.01);
    assertEquals(25.46, od.mpe(), 0.05);
  }

  @ParameterizedTest
  @ValueSource(doubles = {0.5e-3, 2e-3, 7e-3, 20e-3})
  void peakIsNeverBelowTheApertureAverage(double d) {
    OpticalDensity od = Eyewear.required(Emission.continuous(1064e-9, 5), d, 10).get();
    assertTrue(od.atPeak() > od.atAperture());
  }

  @Test
  void pulsedUsesPerPulseRadiantExposure() {
    // 1064 nm, 10 ns, 10 mJ single pulse, 4 mm beam: peak 2*0.01/(pi*4e-6) = 1591.5 J/m2 vs 2e-2
    // J/m2 (IEC 60825-1:2014, Table A.1, from memory) -> OD 4.90 (definition of optical density)
    OpticalDensity od = Eyewear.required(Emission.singlePulse(1064e-9, 1e-2, 1e-8), 4e-3, 1).get();
    assertEquals(4.90, od.atPeak(), 0.01);
  }

  @Test
  void belowTheMpeNeedsNoFilter() {
    assertEquals(0.0, Eyewear.forLimit(10, 25.5).get());
  }

  @Test
  void outsideCoverageIsNotEvaluated() {
    assertFalse(Eyewear.required(Emission.continuous(1300e-9, 1), 1e-3, 10).evaluated());
  }
}
