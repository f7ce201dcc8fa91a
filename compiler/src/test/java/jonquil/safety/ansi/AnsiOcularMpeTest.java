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
 * Reference cases for the ocular MPE after ANSI Z136.1-2014 Table 5a (point source), Table 6 and
 * section 8.2.3. Each row names its source; "from memory" rows were not confirmed by a published
 * source during this work. 1 mW/cm² = 10 W/m²; 1 J/cm² = 10⁴ J/m².
 */
class AnsiOcularMpeTest {

  @ParameterizedTest(name = "{0} nm cw for {1} s -> {2} W/m2 ({3})")
  @CsvSource(
      delimiter = '|',
      value = {
        // λ nm | t s | irradiance MPE W/m² | source
        "532  | 0.25 | 25.46 | from memory: Table 5a, 1.8 t^0.75 mJ/cm2 over t ="
            + " 1.8 * 0.25^0.75 / 0.25 = 2.546 mW/cm2 (computed)",
        "633  | 1    | 18.0  | same confirmed 1.8 t^0.75 mJ/cm2 form at 1 s",
        "1064 | 10   | 50.0  | from memory: Table 5a 10 s-3e4 s row 5.0 C_C mW/cm2 (the 9.0 C_C"
            + " t^0.75 mJ/cm2 row gives 5.06 mW/cm2 just below 10 s; the lower value is used at the"
            + " breakpoint)",
        "1064 | 9.99 | 50.62 | from memory: 9.0 C_C t^0.75 mJ/cm2 (= 1.8 C_A t^0.75, C_A = 5"
            + " confirmed ICNIRP form) -> 5.06 mW/cm2",
        "808  | 100  | 16.44 | from memory: C_A mW/cm2 with C_A = 10^(0.002*108) (C_A form"
            + " confirmed)",
        "450  | 1000 | 1.0   | from memory: photochemical C_B x 1e-4 W/cm2 (C_B = 1 at 450 nm,"
            + " confirmed form) below thermal 1 mW/cm2",
        "532  | 1000 | 10.0  | from memory: thermal 1 mW/cm2 below photochemical C_B x 0.1 mW/cm2 ="
            + " 4.37 mW/cm2",
        "1175 | 100  | 140.9 | from memory: 5.0 C_C mW/cm2 with C_C = 10^(0.018*25) (C_C form"
            + " confirmed, ICNIRP)",
      })
  void continuousWave(double nm, double t, double irradiance, String source) {
    Outcome<MaximumPermissibleExposure> o =
        AnsiOcularMpe.at(Emission.continuous(nm * 1e-9, 1e-3), t);
    assertTrue(o.evaluated(), source);
    assertEquals(irradiance, o.get().irradiance(), irradiance * 0.002, source);
    assertEquals(irradiance * t, o.get().radiantExposure(), irradiance * t * 0.002, source);
    // The 7 mm limiting aperture of the eye (ANSI Z136.1-2014, Table 8, table number from memory).
    assertEquals(7e-3, o.get().apertureDiameter(), 1e-12);
    assertTrue(o.standard().contains("ANSI Z136.1-2014, Table 5a"), o.standard());
    assertEquals(Outcome.CAUTION, o.caution());
  }

  @ParameterizedTest(name = "{0} nm single {1} s pulse -> {2} J/m2 ({3})")
  @CsvSource(
      delimiter = '|',
      value = {
        "532  | 1e-8 | 2e-3    | from memory: Table 5a 10 ps-5 us row 2.0e-7 J/cm2 (2007: 5.0e-7);"
            + " a 2014 change in the visible ns regime is confirmed qualitatively, J. Biomed. Opt."
            + " 20(9) 095011 (2015)",
        "1064 | 1e-8 | 2e-2    | from memory: Table 5a 10 ps-13 us row 2.0 C_C e-6 J/cm2 (NIR"
            + " change confirmed qualitatively, same paper)",
        "905  | 1e-7 | 5.14e-3 | from memory: 2.0 C_A e-7 J/cm2, C_A = 10^(0.002*205) = 2.57 (C_A"
            + " form confirmed)",
        "532  | 1e-3 | 0.1012  | confirmed form 1.8 t^0.75 mJ/cm2 at 1 ms",
        "1064 | 1e-3 | 0.5060  | from memory: 9.0 C_C t^0.75 mJ/cm2 at 1 ms",
      })
  void singlePulse(double nm, double tau, double h, String source) {
    Outcome<MaximumPermissibleExposure> o =
        AnsiOcularMpe.at(Emission.singlePulse(nm * 1e-9, 1e-6, tau), 0.25);
    assertTrue(o.evaluated(), source);
    assertEquals(h, o.get().radiantExposure(), h * 0.002, source);
    assertEquals(AnsiPulseRules.RULE1, o.get().limitingCriterion());
  }

  @Test
  void visibleTrainIsLimitedByRule3() {
    // from memory (Rule 3 with C_P = n^-0.25, t >= t_min; N^-1/4 form confirmed qualitatively, JLA
    // 25(4) 2013):
    // 532 nm, 100 us pulses, 100 Hz, 0.25 s -> n = 25. Rule 1: 1.8e-3 (1e-4)^0.75 J/cm2 = 0.018
    // J/m2;
    // Rule 2: 6.364 J/m2 / 25 = 0.2546; Rule 3: 0.018 x 25^-0.25 = 8.05e-3 J/m2.
    MaximumPermissibleExposure x =
        AnsiOcularMpe.at(Emission.pulseTrain(532e-9, 1e-6, 1e-4, 100), 0.25).get();
    assertEquals(0.018, x.singlePulse(), 1e-6);
    assertEquals(18 * Math.pow(0.25, 0.75) / 25, x.averagePower(), 1e-6);
    assertEquals(0.018 * Math.pow(25, -0.25), x.repetitivePulse(), 1e-7);
    assertEquals(x.repetitivePulse(), x.radiantExposure(), 0);
    assertTrue(x.limitingCriterion().startsWith(AnsiPulseRules.RULE3), x.limitingCriterion());
    assertEquals(x.radiantExposure() * 100, x.irradiance(), 1e-9);
  }

  @Test
  void nearInfraredTrainIsLimitedByRule3() {
    // from memory: 1064 nm, 100 us, 1 kHz, 10 s -> n = 1e4, C_P = 0.1. Rule 1: 9e-3 (1e-4)^0.75
    // J/cm2 = 0.09 J/m2;
    // Rule 2: 5 mW/cm2 x 10 s / 1e4 = 0.05 J/m2; Rule 3: 0.009 J/m2.
    MaximumPermissibleExposure x =
        AnsiOcularMpe.at(Emission.pulseTrain(1064e-9, 1e-6, 1e-4, 1e3), 10).get();
    assertEquals(0.09, x.singlePulse(), 1e-6);
    assertEquals(0.05, x.averagePower(), 1e-6);
    assertEquals(0.009, x.radiantExposure(), 1e-7);
    assertTrue(x.limitingCriterion().startsWith(AnsiPulseRules.RULE3));
  }

  @Test
  void bluePhotochemicalTrainIsLimitedByRule2() {
    // from memory: 420 nm, 1 ms, 500 Hz, 1000 s -> n = 5e5. Rule 2: photochemical C_B x 1e-4 W/cm2
    // = 1 W/m2 x
    // 1000 s / 5e5 = 2e-3 J/m2; Rule 3: 1.8e-3 (1e-3)^0.75 J/cm2 x (5e5)^-0.25 = 3.81e-3 J/m2.
    MaximumPermissibleExposure x =
        AnsiOcularMpe.at(Emission.pulseTrain(420e-9, 1e-6, 1e-3, 500), 1000).get();
    assertEquals(2e-3, x.radiantExposure(), 1e-9);
    assertEquals(18 * Math.pow(1e-3, 0.75) * Math.pow(5e5, -0.25), x.repetitivePulse(), 1e-7);
    assertEquals(AnsiPulseRules.RULE2, x.limitingCriterion());
  }

  /**
   * Breakpoints of Table 5a join within a few per cent: a wrong coefficient or exponent shows up
   * here.
   */
  @ParameterizedTest(name = "{0} nm at {1} s")
  @CsvSource({
    "532, 5e-6",
    "808, 5e-6",
    "1064, 1.3e-5",
    "1175, 1.3e-5",
    "532, 10",
    "1064, 10",
    "905, 10"
  })
  void breakpointsJoin(double nm, double t) {
    double below = Z136.ocular(nm * 1e-9, t * (1 - 1e-9));
    double above = Z136.ocular(nm * 1e-9, t);
    // Common practice in reading Table 5a: adjacent rows meet at their breakpoint (within 6 %).
    assertEquals(1.0, below / above, 0.06, "jump at " + t + " s");
  }

  @ParameterizedTest(name = "{0} nm, pulse {1} s, rate {2} Hz, exposure {3} s: not evaluated ({4})")
  @CsvSource(
      delimiter = '|',
      value = {
        "10600 | 1e-8  | 1e3  | 10   | CO2 laser pulse train: corneal t_min and Rule 3 not"
            + " confirmed",
        "250   | 1e-12 | 0    | 10   | ultraviolet pulse below the 1 ns rows",
        "1300  | 0     | 0    | 10   | 1200-1400 nm: 2014 C_C and corneal/lens limit not confirmed",
        "1550  | 1e-10 | 0    | 10   | infrared pulse below the 1 ns rows",
        "150   | 0     | 0    | 10   | below 180 nm, outside Table 5a",
        "532   | 1e-12 | 0    | 0.25 | sub-10-ps single pulse",
        "532   | 1e-8  | 1e3  | 0.25 | ns train: tau < t_min = 5 us, 2014 sub-t_min provisions not"
            + " confirmed",
        "1064  | 1e-6  | 1e3  | 10   | us train: tau < t_min = 13 us",
        "532   | 0     | 0    | 1e5  | beyond 3e4 s",
        "532   | 1e-4  | 2e4  | 1    | duty cycle >= 1",
      })
  void outsideCoverageIsNotEvaluated(double nm, double tau, double rate, double t, String why) {
    Emission e =
        tau == 0
            ? Emission.continuous(nm * 1e-9, 1)
            : rate == 0
                ? Emission.singlePulse(nm * 1e-9, 1e-6, tau)
                : Emission.pulseTrain(nm * 1e-9, 1e-6, tau, rate);
    Outcome<MaximumPermissibleExposure> o = AnsiOcularMpe.at(e, t);
    assertFalse(o.evaluated(), why);
    assertFalse(o.reason().isBlank());
    assertTrue(o.standard().startsWith("ANSI Z136.1-2014"), o.standard());
    assertEquals(Outcome.CAUTION, o.caution());
  }
}
