package jonquil.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Reference cases for the ocular and skin MPE of IEC 60825-1:2014 (Ed. 3), Annex A, Tables A.1 and
 * A.5, across the whole spectrum: at least one per band (UV-C/B 180–315 nm, UV-A 315–400 nm,
 * visible, IR-A 700–1400 nm, IR-B 1400–3000 nm, IR-C 3 µm–1 mm) and per pulse regime (fs, ps, ns,
 * µs, ms, cw). The standard was not at hand: each row says which row of the table it rests on and
 * whether that row is from memory; the expected value is worked out by hand from that row.
 */
class SpectrumReferenceTest {

  @ParameterizedTest(name = "eye {0} nm, {1} s exposure -> H = {2} J/m2, {4}")
  @CsvSource(
      delimiter = '|',
      value = {
        // λ nm | duration s | H J/m² | aperture m | governing effect | source
        "266 | 3e4 | 30 | 1e-3 | ultraviolet photochemical | from memory: Table A.1 180-302.5 nm,"
            + " 30 J/m2 from 1 ns to 3e4 s (dose accumulates over the whole day)",
        "266 | 1e-8 | 30 | 1e-3 | ultraviolet photochemical | from memory: 30 J/m2 is below the"
            + " thermal C1 = 5.6e3 (1e-8)^0.25 = 56 J/m2, so the photochemical limit governs",
        "308 | 1 | 398.1 | 1e-3 | ultraviolet photochemical | from memory: Table A.1 302.5-315 nm,"
            + " C2 = 10^(0.2(308-295)) = 398.1 J/m2 beyond T1 = 2.5e-5 s",
        "308 | 1e-8 | 56.0 | 1e-3 | ultraviolet thermal | from memory: below T1 the thermal C1 ="
            + " 5.6e3 (1e-8)^0.25 = 56.0 J/m2 governs",
        "355 | 1e-8 | 56.0 | 1e-3 | ultraviolet thermal | from memory: Table A.1 315-400 nm, C1"
            + " = 56.0 J/m2 at 10 ns",
        "355 | 100 | 1e4 | 1e-3 | ultraviolet photochemical | from memory: Table A.1 315-400 nm,"
            + " 1e4 J/m2 for 10-1e3 s",
        "355 | 3e4 | 3e5 | 1e-3 | ultraviolet photochemical | from memory: Table A.1 315-400 nm,"
            + " 10 W/m2 beyond 1e3 s",
        "355 | 1e-13 | 3e-3 | 1e-3 | ultraviolet thermal | from memory: Table A.1 below 1 ns,"
            + " 3e10 W/m2 x 100 fs",
        "532 | 1e-13 | 1e-3 | 7e-3 | retinal thermal | from memory: Table A.1 400-700 nm below 10"
            + " ps, 1e-3 J/m2 (= ANSI Z136.1-2014 Table 5a 1.0e-7 J/cm2)",
        "532 | 1e-6 | 2e-3 | 7e-3 | retinal thermal | from memory: Table A.1 10 ps-5 us, 2e-3 J/m2",
        "450 | 1000 | 1000 | 7e-3 | retinal photochemical | from memory: 1 C3 W/m2 (C3 = 1) is"
            + " stricter than the thermal 10 W/m2",
        "800 | 1e-13 | 1.585e-3 | 7e-3 | retinal thermal | from memory: Table A.1 below 10 ps,"
            + " 1e-3 C4 J/m2, C4 = 10^(0.002*100) = 1.585 (C4 confirmed, ICNIRP C_A)",
        "1064 | 1e-12 | 1e-2 | 7e-3 | retinal thermal | from memory: Table A.1 1050-1400 nm below"
            + " 10 ps, 1e-2 C7 J/m2 (= ANSI Z136.1-2014 1.0e-6 C_C J/cm2)",
        "1450 | 1e-4 | 1000 | 1e-3 | corneal thermal | from memory: Table A.1 1400-1500 nm, 1e3"
            + " J/m2 for 1 ns-1 ms",
        "1550 | 1e-8 | 1e4 | 1e-3 | corneal thermal | from memory: Table A.1 1500-1800 nm, 1e4"
            + " J/m2 for 1 ns-10 s",
        "1550 | 10 | 1e4 | 3.5e-3 | corneal thermal | from memory: Table A.1 1500-1800 nm, 1000"
            + " W/m2 beyond 10 s; 3.5 mm aperture (Table A.3)",
        "1550 | 1e-12 | 10 | 1e-3 | corneal thermal | from memory: Table A.1 1500-1800 nm, below 1"
            + " ns 1e13 W/m2",
        "2000 | 0.1 | 3149 | 1e-3 | corneal thermal | from memory: Table A.1 1800-2600 nm, 5.6e3"
            + " t^0.25 = 3149 J/m2 at 0.1 s",
        "2940 | 2.5e-4 | 704.2 | 1e-3 | corneal thermal | from memory: Table A.1 2600 nm-1 mm,"
            + " 5.6e3 (2.5e-4)^0.25 = 704.2 J/m2",
        "10600 | 5e-8 | 100 | 1e-3 | corneal thermal | from memory: Table A.1 2600 nm-1 mm, 100"
            + " J/m2 for 1-100 ns",
        "10600 | 1 | 5600 | 1.5e-3 | corneal thermal | from memory: 5.6e3 t^0.25 at 1 s; aperture"
            + " 1.5 t^0.375 mm = 1.5 mm (Table A.3)",
        "10600 | 100 | 1e5 | 3.5e-3 | corneal thermal | from memory: 1000 W/m2 beyond 10 s",
        "500000 | 100 | 1e5 | 11e-3 | corneal thermal | from memory: 1000 W/m2; 11 mm aperture"
            + " above 100 um (Table A.3)",
      })
  void ocular(double nm, double t, double h, double aperture, String effect, String source) {
    Emission e =
        t >= 1e-3 ? Emission.continuous(nm * 1e-9, 1e-3) : Emission.singlePulse(nm * 1e-9, 1, t);
    Outcome<MaximumPermissibleExposure> o = OcularMpe.at(e, t);
    assertTrue(o.evaluated(), source + ": " + o.reason());
    assertEquals(h, o.get().radiantExposure(), h * 0.005, source);
    assertEquals(aperture, o.get().apertureDiameter(), 1e-9, source);
    assertTrue(o.get().governingLimit().startsWith(effect), o.get().governingLimit());
    assertEquals(Outcome.CAUTION, o.caution());
  }

  @ParameterizedTest(name = "skin {0} nm, {1} s -> H = {2} J/m2")
  @CsvSource(
      delimiter = '|',
      value = {
        "266 | 100 | 30 | 3.5e-3 | from memory: Table A.5 repeats the eye's 180-302.5 nm rows",
        "355 | 3e4 | 3e5 | 3.5e-3 | from memory: Table A.5 315-400 nm, 10 W/m2 beyond 1e3 s",
        "1064 | 1e-10 | 100 | 3.5e-3 | from memory: Table A.5 400-1400 nm below 1 ns, 2e11 C4"
            + " W/m2 x 100 ps, C4 = 5",
        "1550 | 1e-8 | 1e4 | 3.5e-3 | from memory: Table A.5 1500-1800 nm, the eye's 1e4 J/m2",
        "10600 | 100 | 1e5 | 3.5e-3 | from memory: Table A.5, 1000 W/m2 beyond 10 s",
        "500000 | 100 | 1e5 | 11e-3 | from memory: 11 mm aperture above 100 um (Table A.3)",
      })
  void skin(double nm, double t, double h, double aperture, String source) {
    Emission e =
        t >= 1e-3 ? Emission.continuous(nm * 1e-9, 1e-3) : Emission.singlePulse(nm * 1e-9, 1, t);
    Outcome<MaximumPermissibleExposure> o = SkinMpe.at(e, t);
    assertTrue(o.evaluated(), source + ": " + o.reason());
    assertEquals(h, o.get().radiantExposure(), h * 0.005, source);
    assertEquals(aperture, o.get().apertureDiameter(), 1e-9, source);
    assertEquals(Outcome.CAUTION, o.caution());
  }

  @ParameterizedTest(name = "{0} nm train {1} s pulses at {2} Hz for {3} s -> {4} J/m2")
  @CsvSource(
      delimiter = '|',
      value = {
        // λ nm | τ s | rate Hz | T s | per-pulse H J/m² | criterion | source
        "355 | 1e-8 | 1e4 | 3e4 | 1e-3 | average power | from memory: Table A.1 315-400 nm, 10"
            + " W/m2 over 3e4 s = 3e5 J/m2 shared by 3e8 pulses (the UV dose accumulates)",
        "1550 | 5e-9 | 5e4 | 10 | 0.02 | average power | from memory: 1500-1800 nm, 1e4 J/m2 over"
            + " 10 s shared by 5e5 pulses; T_i = 10 s (Directive 2006/25/EC Table 2.6)",
        "10600 | 1e-6 | 1e3 | 10 | 1.0 | average power | from memory: 2600 nm-1 mm, 1e4 J/m2 over"
            + " 10 s shared by 1e4 pulses (single 177 J/m2, C5 = 0.5)",
        "532 | 1e-8 | 1e3 | 0.25 | 2e-3 | single pulse | from memory: Table A.1 2e-3 J/m2 per"
            + " pulse; average 6.36/250 = 0.025 J/m2",
        "1064 | 1e-12 | 1e3 | 10 | 1e-2 | single pulse | from memory: 1e-2 C7 J/m2 below 10 ps;"
            + " average 506/1e4 = 0.051 J/m2",
        "1064 | 1e-3 | 10 | 10 | 0.5061 | single pulse | from memory: Table A.1 90 t^0.75 C7 at 1"
            + " ms = 0.506 J/m2, below the average 90 x 10^0.75 / 100 = 5.06 J/m2",
      })
  void pulseTrain(
      double nm,
      double tau,
      double rate,
      double t,
      double perPulse,
      String criterion,
      String source) {
    Outcome<MaximumPermissibleExposure> o =
        OcularMpe.at(Emission.pulseTrain(nm * 1e-9, 1e-6, tau, rate), t);
    assertTrue(o.evaluated(), source + ": " + o.reason());
    assertEquals(perPulse, o.get().radiantExposure(), perPulse * 0.01, source);
    assertTrue(o.get().limitingCriterion().startsWith(criterion), o.get().limitingCriterion());
  }

  @ParameterizedTest(name = "extended {0} nm, alpha {2} rad, {1} s -> E = {3} W/m2")
  @CsvSource(
      delimiter = '|',
      value = {
        "532 | 0.25 | 10e-3 | 169.7 | retinal thermal | from memory: Table A.1 18 t^0.75 C6 with C6"
            + " = 10/1.5 (Table 9: C6 = alpha/alpha_min up to alpha_max = 100 mrad at 0.25 s)",
        "532 | 0.25 | 0.2 | 1697 | retinal thermal | from memory: C6 capped at alpha_max/alpha_min"
            + " = 100/1.5 beyond alpha_max",
        "532 | 1e-8 | 10e-3 | 6.667e5 | retinal thermal | from memory: alpha_max = 5 mrad below"
            + " 625 us, so C6 = 5/1.5 and H = 2e-3 x 3.333 J/m2 over 10 ns",
        "532 | 1000 | 10e-3 | 43.65 | retinal photochemical | from memory: 1 C3 W/m2 = 43.65"
            + " (C3 = 10^(0.02*82), confirmed) below the thermal 18 C6 T2^-0.25 = 64.2 W/m2, T2 ="
            + " 10 x 10^(8.5/98.5) s (T2 confirmed: Directive 2006/25/EC Table 2.5)",
        "450 | 1000 | 0.1 | 8.264 | retinal photochemical | from memory: 1 C3 W/m2 x"
            + " (alpha/gamma_ph)^2 = (100/34.79)^2 = 8.264 W/m2 (gamma_ph = 1.1 sqrt(1000) mrad,"
            + " Directive 2006/25/EC Table 2.5), below the thermal 18 C6 T2^-0.25 = 18 x 66.7 x"
            + " 100^-0.25 = 379.5 W/m2 (T2 = 100 s at alpha = 100 mrad)",
      })
  void extendedSource(double nm, double t, double alpha, double e, String effect, String source) {
    Emission emission =
        t >= 1e-3 ? Emission.continuous(nm * 1e-9, 1e-3) : Emission.singlePulse(nm * 1e-9, 1e-6, t);
    Outcome<MaximumPermissibleExposure> o = OcularMpe.at(emission, t, alpha);
    assertTrue(o.evaluated(), source + ": " + o.reason());
    assertEquals(e, o.get().irradiance(), e * 0.01, source);
    assertTrue(o.get().governingLimit().startsWith(effect), o.get().governingLimit());
  }

  @org.junit.jupiter.api.Test
  void whereTwoLimitsApplyTheCitedTablesNameTheGoverningOne() {
    // From memory: Table A.1, 450 nm over 1000 s, photochemical 1 C3 W/m2 below thermal 10 W/m2.
    Outcome<MaximumPermissibleExposure> o = OcularMpe.at(Emission.continuous(450e-9, 1e-3), 1000);
    assertTrue(
        o.standard()
            .endsWith(
                "governing limit: retinal photochemical (stricter than retinal" + " thermal)"),
        o.standard());
    Outcome<MaximumPermissibleExposure> single =
        OcularMpe.at(Emission.continuous(1064e-9, 1e-3), 10);
    assertTrue(single.standard().indexOf("governing") < 0, single.standard());
  }
}
