package jonquil.safety.ansi;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import jonquil.safety.Emission;
import jonquil.safety.MaximumPermissibleExposure;
import jonquil.safety.OcularMpe;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Documents where ANSI Z136.1-2014 and IEC 60825-1:2014 (Ed. 3) agree and differ for a point
 * source, using both implementations side by side. Both sides are from memory for the rules
 * compared (see each case).
 */
class AnsiVersusIecTest {

  @Test
  void repetitivePulsesAnsiAppliesCpWhereEd3HasC5EqualOne() {
    // 532 nm, 100 us pulses at 100 Hz viewed for 0.25 s (n = 25; pulse spacing 10 ms > T_i and
    // t_min).
    // IEC Ed. 3 (jonquil.safety, from memory): C5 = 1 for a point source -> per pulse =
    // single-pulse MPE 0.018 J/m2.
    // ANSI Z136.1-2014 section 8.2.3 Rule 3 (from memory): C_P = 25^-0.25 = 0.447 -> 8.05e-3 J/m2.
    Emission train = Emission.pulseTrain(532e-9, 1e-6, 1e-4, 100);
    MaximumPermissibleExposure iec = OcularMpe.at(train, 0.25).get();
    MaximumPermissibleExposure ansi = AnsiOcularMpe.at(train, 0.25).get();
    assertEquals(0.018, iec.radiantExposure(), 1e-6);
    assertEquals("single pulse", iec.limitingCriterion());
    assertEquals(iec.singlePulse(), ansi.singlePulse(), 1e-9, "same single-pulse row in both");
    assertEquals(Math.pow(25, -0.25), ansi.radiantExposure() / iec.radiantExposure(), 1e-6);
    assertTrue(ansi.limitingCriterion().startsWith(AnsiPulseRules.RULE3));
  }

  @ParameterizedTest(name = "{0} nm, {1} s single pulse: same value in both 2014 documents")
  @CsvSource({"532, 1e-8", "1064, 1e-8", "532, 1e-3"})
  void singlePulsesAgree(double nm, double tau) {
    // from memory: both follow the same retinal-thermal rows (2e-7 C_A / 2e-6 C_C J/cm2 below t_min
    // = T_i).
    Emission e = Emission.singlePulse(nm * 1e-9, 1e-6, tau);
    assertEquals(
        OcularMpe.at(e, 0.25).get().radiantExposure(),
        AnsiOcularMpe.at(e, 0.25).get().radiantExposure(),
        1e-9);
  }

  @Test
  void continuousVisibleAgrees() {
    // confirmed form 1.8 t^0.75 mJ/cm2 at 0.25 s in both: 2.55 mW/cm2.
    Emission e = Emission.continuous(532e-9, 1e-3);
    assertEquals(
        OcularMpe.at(e, 0.25).get().irradiance(),
        AnsiOcularMpe.at(e, 0.25).get().irradiance(),
        1e-9);
  }
}
