package jonquil.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Reference cases for the ocular MPE, IEC 60825-1:2014 (Ed. 3) Table A.1, point source. Each row
 * names its source; "from memory" rows were not confirmed by a published source during this work.
 */
class OcularMpeTest {

  @ParameterizedTest(name = "{0} nm cw for {1} s -> {2} W/m2 ({3})")
  @CsvSource(
      delimiter = '|',
      value = {
        // λ nm | t s | irradiance MPE W/m² | source
        "532 | 0.25 | 25.5 | from memory: Table A.1, 18 t^0.75 J/m2 over t ="
            + " 18 * 0.25^0.75 / 0.25 = 25.46 W/m2 (computed)",
        "488 | 0.25 | 25.5 | from memory: the same Table A.1 row, 400-700 nm, 0.25 s -> 25.46"
            + " W/m2",
        "633 | 1    | 18.0 | from memory: Table A.1, 18 t^0.75 J/m2 at t = 1 s",
        "1064 | 100 | 50.0 | from memory: 10 C4 C7 W/m2, C4 = 5 (C4 confirmed, ICNIRP C_A)",
        "1064 | 1   | 90.0 | from memory: 90 t^0.75 C7 J/m2 (= 18 C4 t^0.75, C4 = 5)",
        "808 | 100  | 16.44 | from memory: 10 C4 W/m2 with C4 = 10^(0.002*108) (C4 formula"
            + " confirmed)",
        "450 | 1000 | 1.0  | from memory: photochemical 1 C3 W/m2 (C3 = 1 at 450 nm, confirmed)"
            + " below thermal 10 W/m2",
        "532 | 1000 | 10.0 | from memory: thermal 10 W/m2 below photochemical C3 = 43.7 W/m2",
        "1175 | 100 | 140.9 | from memory: 10 C4 C7 W/m2, C7 = 10^(0.018*25) (C7 formula confirmed,"
            + " ICNIRP C_C)",
      })
  void continuousWave(double nm, double t, double irradiance, String source) {
    Outcome<MaximumPermissibleExposure> o = OcularMpe.at(Emission.continuous(nm * 1e-9, 1e-3), t);
    assertTrue(o.evaluated(), source);
    assertEquals(irradiance, o.get().irradiance(), irradiance * 0.01, source);
    assertEquals(irradiance * t, o.get().radiantExposure(), irradiance * t * 0.01, source);
    // The 7 mm limiting aperture of the eye, 400–1400 nm (IEC 60825-1:2014, Annex A, from memory).
    assertEquals(7e-3, o.get().apertureDiameter(), 1e-12);
    assertEquals(Outcome.CAUTION, o.caution());
  }

  @ParameterizedTest(name = "{0} nm single {1} s pulse -> {2} J/m2 ({3})")
  @CsvSource(
      delimiter = '|',
      value = {
        "532 | 1e-8 | 2e-3 | from memory: Ed. 3 / ANSI Z136.1-2014 Table 5a value 2e-3 J/m2 for 10"
            + " ps-5 us (Ed. 2: 5e-3)",
        "1064 | 1e-8 | 2e-2 | from memory: Ed. 3 2e-2 C7 J/m2 for 10 ps-13 us (Ed. 2: 5e-2)",
        "532 | 1e-3 | 0.1012 | confirmed row 18 t^0.75 J/m2 at 1 ms",
        "905 | 1e-7 | 5.14e-3 | from memory: 2e-3 C4 J/m2, C4 = 10^(0.002*205) = 2.57",
      })
  void singlePulse(double nm, double tau, double h, String source) {
    Outcome<MaximumPermissibleExposure> o =
        OcularMpe.at(Emission.singlePulse(nm * 1e-9, 1e-6, tau), 0.25);
    assertTrue(o.evaluated(), source);
    assertEquals(h, o.get().radiantExposure(), h * 0.01, source);
    assertEquals("single pulse", o.get().limitingCriterion());
  }

  /**
   * Breakpoints of Table A.1 join within a few per cent: a wrong coefficient or exponent shows up
   * here.
   */
  @ParameterizedTest(name = "{0} nm continuous at {1} s")
  @CsvSource({"532, 5e-6", "808, 5e-6", "1064, 1.3e-5", "532, 10", "1064, 10", "905, 10"})
  void breakpointsJoin(double nm, double t) {
    double below = Ed3.ocularMpe(nm * 1e-9, t * (1 - 1e-9));
    double above = Ed3.ocularMpe(nm * 1e-9, t);
    // Common practice in reading Table A.1: adjacent rows meet at their breakpoint (within 6 %).
    assertEquals(1.0, below / above, 0.06, "jump at " + t + " s");
  }

  @Test
  void lowRateTrainIsLimitedBySinglePulse() {
    // 532 nm, 10 ns, 1 kHz, 0.25 s: single 2e-3; average 6.364/250 = 0.0255; repetitive (C5 = 1) =
    // single.
    MaximumPermissibleExposure x =
        OcularMpe.at(Emission.pulseTrain(532e-9, 1e-6, 1e-8, 1e3), 0.25).get();
    // IEC 60825-1:2014, Table A.1 (from memory): single pulse 2e-3 J/m² (400–700 nm, 10 ns);
    // average rule 18 t^0.75 J/m² over the 250 pulses of 0.25 s; the limit is the smaller, and
    // as an irradiance it is per-pulse limit × rate = 2e-3 × 1000 = 2 W/m² (definition).
    assertEquals(2e-3, x.radiantExposure(), 1e-6);
    assertEquals(18 * Math.pow(0.25, 0.75) / 250, x.averagePower(), 1e-6);
    assertEquals("single pulse", x.limitingCriterion());
    assertEquals(2.0, x.irradiance(), 1e-3);
  }

  @Test
  void highRateTrainIsLimitedByAveragePower() {
    // 532 nm, 10 ns, 10 MHz, 0.25 s: average 6.364/2.5e6 = 2.55e-6 J/m2 per pulse; pulses within
    // T_i = 5 us
    // grouped: 18 (5e-6)^0.75 / 50 = 3.8e-5; single 2e-3.
    MaximumPermissibleExposure x =
        OcularMpe.at(Emission.pulseTrain(532e-9, 1e-9, 1e-8, 1e7), 0.25).get();
    // IEC 60825-1:2014, Table A.1 and its pulse rules (from memory): average rule 18 t^0.75 J/m²
    // over the 2.5e6 pulses of 0.25 s; pulses within T_i = 5 µs (the time constant for
    // 400–1050 nm, from memory) are grouped, 50 to a group, as one pulse of 5 µs.
    assertEquals(18 * Math.pow(0.25, 0.75) / 2.5e6, x.radiantExposure(), 1e-9);
    assertEquals(18 * Math.pow(5e-6, 0.75) / 50, x.repetitivePulse(), 1e-8);
    assertTrue(x.limitingCriterion().startsWith("average power"));
    // averaged back over the exposure it equals the cw MPE for 0.25 s
    assertEquals(25.46, x.irradiance(), 0.05);
  }

  @Test
  void nearInfraredTrainGroupsPulsesWithinTi() {
    // 1064 nm, 10 ns, 100 kHz, 10 s: T_i = 13 us (from memory) > 10 us spacing -> 1.3 pulses per
    // group.
    MaximumPermissibleExposure x =
        OcularMpe.at(Emission.pulseTrain(1064e-9, 1e-6, 1e-8, 1e5), 10).get();
    assertEquals(90 * Math.pow(1.3e-5, 0.75) / 1.3, x.repetitivePulse(), 1e-6);
    assertEquals(500.0 / 1e6, x.radiantExposure(), 1e-9);
  }

  @ParameterizedTest(name = "{0} nm, pulse {1} s, exposure {2} s: not evaluated")
  @CsvSource(
      delimiter = '|',
      value = {
        "2e6   | 0     | 10   | beyond 1 mm, where the tables end",
        "150   | 0     | 10   | below 180 nm, where the tables start",
        "1300  | 0     | 10   | 1250-1400 nm: corneal dual limit not implemented",
        "1350  | 1e-8  | 10   | 1250-1400 nm, pulsed",
        "532   | 1e-14 | 0.25 | pulse below 100 fs, where Table A.1 starts",
        "532   | 0     | 1e5  | beyond 3e4 s",
      })
  void outsideCoverageIsNotEvaluated(double nm, double tau, double t, String why) {
    Emission e =
        tau == 0
            ? Emission.continuous(nm * 1e-9, 1)
            : Emission.pulseTrain(nm * 1e-9, 1e-6, tau, 1e3);
    Outcome<MaximumPermissibleExposure> o = OcularMpe.at(e, t);
    assertFalse(o.evaluated(), why);
    assertFalse(o.reason().isBlank());
    assertEquals(Outcome.CAUTION, o.caution());
  }
}
