package jonquil.safety.ansi;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import jonquil.safety.Emission;
import jonquil.safety.MaximumPermissibleExposure;
import jonquil.safety.Outcome;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Reference cases for the skin MPE after ANSI Z136.1-2014 Table 7, 400–1400 nm, 3.5 mm aperture.
 * All rows are from memory except where the C_A form (confirmed, ICNIRP) is what is being
 * exercised.
 */
class AnsiSkinMpeTest {

  @ParameterizedTest(name = "{0} nm cw for {1} s -> {2} W/m2 ({3})")
  @CsvSource(
      delimiter = '|',
      value = {
        "532 | 1   | 1.1e4 | from memory: Table 7 1.1 C_A t^0.25 J/cm2 at 1 s",
        "808 | 100 | 3288  | from memory: 0.2 C_A W/cm2, C_A = 1.644 (C_A form confirmed)",
        "1064 | 100 | 1e4  | from memory: 0.2 C_A W/cm2, C_A = 5",
      })
  void continuousWave(double nm, double t, double irradiance, String source) {
    Outcome<MaximumPermissibleExposure> o = AnsiSkinMpe.at(Emission.continuous(nm * 1e-9, 1), t);
    assertTrue(o.evaluated(), source);
    assertEquals(irradiance, o.get().irradiance(), irradiance * 0.002, source);
    // The 3.5 mm limiting aperture of the skin (ANSI Z136.1-2014, Table 8, table number from
    // memory).
    assertEquals(3.5e-3, o.get().apertureDiameter(), 1e-12);
    assertTrue(o.standard().contains("Table 7"));
    assertEquals(Outcome.CAUTION, o.caution());
  }

  @ParameterizedTest(name = "{0} nm single {1} s pulse -> {2} J/m2 ({3})")
  @CsvSource(
      delimiter = '|',
      value = {
        "1064 | 1e-8 | 1000  | from memory: Table 7 1 ns-100 ns row 2 C_A e-2 J/cm2, C_A = 5",
        "532  | 1e-8 | 200   | from memory: 2e-2 J/cm2",
        "532  | 1e-6 | 347.9 | from memory: 1.1 t^0.25 J/cm2 at 1 us",
      })
  void singlePulse(double nm, double tau, double h, String source) {
    Outcome<MaximumPermissibleExposure> o =
        AnsiSkinMpe.at(Emission.singlePulse(nm * 1e-9, 1e-3, tau), 10);
    assertTrue(o.evaluated(), source);
    assertEquals(h, o.get().radiantExposure(), h * 0.002, source);
  }

  @Test
  void trainUsesRules1And2Only() {
    // from memory: 1064 nm, 10 ns, 100 Hz, 10 s: Rule 1 1000 J/m2; Rule 2 0.2 x 5 W/cm2 x 10 s /
    // 1000 = 100 J/m2.
    MaximumPermissibleExposure x =
        AnsiSkinMpe.at(Emission.pulseTrain(1064e-9, 1e-3, 1e-8, 100), 10).get();
    assertEquals(100, x.radiantExposure(), 1e-6);
    assertEquals(AnsiPulseRules.RULE2, x.limitingCriterion());
    assertTrue(Double.isNaN(x.repetitivePulse()), "Rule 3 is retinal only");
  }

  @ParameterizedTest(name = "skin breakpoint at {0} s")
  @CsvSource({"1e-7", "10"})
  void breakpointsJoin(double t) {
    // Common practice in reading Table 7: adjacent rows meet at their breakpoint (within 3 %).
    assertEquals(1.0, Z136.skin(532e-9, t * (1 - 1e-9)) / Z136.skin(532e-9, t), 0.03);
  }

  @ParameterizedTest(name = "{0} nm, pulse {1} s: not evaluated")
  @CsvSource({"250, 0", "10600, 0", "1400, 0", "532, 1e-10"})
  void outsideCoverageIsNotEvaluated(double nm, double tau) {
    Emission e =
        tau == 0 ? Emission.continuous(nm * 1e-9, 1) : Emission.singlePulse(nm * 1e-9, 1e-6, tau);
    Outcome<MaximumPermissibleExposure> o = AnsiSkinMpe.at(e, 10);
    assertFalse(o.evaluated());
    assertFalse(o.reason().isBlank());
    assertEquals(Outcome.CAUTION, o.caution());
  }
}
