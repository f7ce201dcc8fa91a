package jonquil.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Classes across the spectrum and the pulse regimes, IEC 60825-1:2014 (Ed. 3), Tables 3, 5, 6, 8,
 * for a small, slowly diverging beam (all of it through the 7 mm aperture of condition 3 and the 50
 * mm aperture of condition 1). Outside 400–1250 nm the Class 1 AEL is the Table A.1 MPE times the
 * Table A.3 aperture area (from memory that Table 3 is built so); each row works out the limit.
 */
class ClassSpectrumTest {
  static final double BEAM = 1e-3;
  static final double DIVERGENCE = 1e-3;

  @ParameterizedTest(name = "{0} nm cw {1} W -> {2}")
  @CsvSource(
      delimiter = '|',
      value = {
        "355 | 5e-6 | CLASS_1 | from memory: Class 1 315-400 nm over 3e4 s = 10 W/m2 x 1 mm area"
            + " = 7.85 uW",
        "355 | 1e-3 | CLASS_3B | from memory: above 3R (5 x 7.85 uW), below the 0.5 W of Table 8",
        "266 | 1e-3 | CLASS_3B | from memory: Table 8 180-302.5 nm, Class 3B 1.5 mW beyond 0.25 s",
        "266 | 2e-3 | CLASS_4 | from memory: above the 1.5 mW of Table 8 at 180-302.5 nm",
        "1550 | 9e-3 | CLASS_1 | from memory: 1000 W/m2 x 3.5 mm area = 9.6 mW (Table 3 gives 10"
            + " mW for 1400-4000 nm, from memory)",
        "1550 | 20e-3 | CLASS_3R | from memory: 3R = 5 x 9.6 mW = 48 mW (Table 6)",
        "1550 | 0.1 | CLASS_3B | from memory: 3B up to 0.5 W (Table 8)",
        "10600 | 5e-3 | CLASS_1 | from memory: 9.6 mW as at 1550 nm; condition 1 does not apply"
            + " beyond 4 um (Table 10)",
        "10600 | 0.3 | CLASS_3B | from memory: Table 8, 0.5 W",
        "10600 | 30 | CLASS_4 | from memory: Table 8, above 0.5 W",
      })
  void continuous(double nm, double watts, HazardClass expected, String source) {
    Outcome<HazardClass> o =
        Classifier.classify(Emission.continuous(nm * 1e-9, watts), BEAM, DIVERGENCE);
    assertTrue(o.evaluated(), source + ": " + o.reason());
    assertEquals(expected, o.get(), source);
  }

  @ParameterizedTest(name = "{0} nm single {2} s pulse of {1} J -> {3}")
  @CsvSource(
      delimiter = '|',
      value = {
        "1064 | 1e-2 | 1e-8 | CLASS_3B | from memory: Table 8 1050-1400 nm, 0.15 C7 J per pulse",
        "1064 | 0.2 | 1e-8 | CLASS_4 | from memory: above 0.15 J",
        "532 | 0.02 | 1e-8 | CLASS_3B | from memory: Table 8 400-700 nm, 0.03 J per pulse",
        "532 | 0.05 | 1e-8 | CLASS_4 | from memory: above 0.03 J",
        "355 | 0.1 | 1e-8 | CLASS_3B | from memory: Table 8 315-400 nm, 0.125 J per pulse",
        "355 | 0.2 | 1e-8 | CLASS_4 | from memory: above 0.125 J",
        "1550 | 5e-3 | 1e-8 | CLASS_1 | from memory: 1e4 J/m2 x 1 mm area = 7.85 mJ",
        "1550 | 0.05 | 1e-8 | CLASS_3B | from memory: above 3R (39 mJ), below 0.125 J",
        "800 | 1e-9 | 1e-13 | CLASS_1 | from memory: below 10 ps 1e-3 C4 J/m2 x 7 mm area = 61 nJ",
        "800 | 3e-6 | 1e-13 | CLASS_3B | from memory: 3B below 1 ns is 3e7 C4 W x t (joins 0.03"
            + " C4 J at 1 ns) = 4.8 uJ at 100 fs, above 3R = 5 x 61 nJ",
        "800 | 1e-3 | 1e-13 | CLASS_4 | from memory: a 1 mJ femtosecond pulse is above 4.8 uJ",
      })
  void singlePulse(double nm, double joules, double tau, HazardClass expected, String source) {
    Outcome<HazardClass> o =
        Classifier.classify(Emission.singlePulse(nm * 1e-9, joules, tau), BEAM, DIVERGENCE);
    assertTrue(o.evaluated(), source + ": " + o.reason());
    assertEquals(expected, o.get(), source);
  }

  @Test
  void pulsedMarkerAboveHalfAWattIsClass4() {
    // From memory: Table 8, 0.5 W average; a 355 nm marker at 50 uJ x 50 kHz = 2.5 W.
    Outcome<HazardClass> o =
        Classifier.classify(Emission.pulseTrain(355e-9, 50e-6, 2e-8, 5e4), BEAM, DIVERGENCE);
    assertEquals(HazardClass.CLASS_4, o.get());
  }

  @Test
  void extendedSourceRaisesTheLimit() {
    // From memory: Table 3 with C6 = 10/1.5 and T2 = 12.2 s: the photochemical 3.9e-5 C3 W =
    // 1.7 mW governs at 532 nm, so 1 mW is Class 1 for a 10 mrad source but Class 2 for a point.
    Emission e = Emission.continuous(532e-9, 1e-3);
    assertEquals(HazardClass.CLASS_2, Classifier.classify(e, BEAM, DIVERGENCE).get());
    assertEquals(HazardClass.CLASS_1, Classifier.classify(e, BEAM, DIVERGENCE, 10e-3).get());
    assertTrue(Classifier.assess(e, BEAM, DIVERGENCE, 10e-3).standard().contains("C6"));
  }

  @Test
  void class3bUnknownIn302To315IsAtLeast3b() {
    Outcome<HazardClass> o =
        Classifier.classify(Emission.singlePulse(308e-9, 1e-3, 1e-8), BEAM, DIVERGENCE);
    assertFalse(o.evaluated());
    assertEquals(HazardClass.CLASS_3B, o.atLeast().get());
    assertTrue(o.reason().contains("Table 8"), o.reason());
  }

  @Test
  void class1AelOutsideTheRetinaIsMpeTimesAperture() {
    // Definition of the derivation (AccessibleEmissionLimits): MPE x area of the Table A.3
    // aperture; 1550 nm at 100 s: 1000 W/m2 x 100 s x pi (3.5 mm)^2 / 4 = 0.962 J.
    assertEquals(
        1000 * 100 * Math.PI * 3.5e-3 * 3.5e-3 / 4,
        AccessibleEmissionLimits.class1(1550e-9, 100, ExtendedSource.ALPHA_MIN),
        1e-9);
  }

  @Test
  void aWidePulsedBeamSafeOnlyToTheNakedEyeIsClass1m() {
    // From memory: Tables 3 and 8 with Table 10. 4 uJ at 10 kHz (40 mW) at 1550 nm in a 30 mm
    // beam: about 10 % passes the 7 mm stop of condition 3 (4.1 mW, below the 9.6 mW Class 1
    // AEL), nearly all the 50 mm stop of condition 1, which stays within Class 3B (0.125 J per
    // pulse, 0.5 W). Class 1M exists only for 302.5-4000 nm (published class summaries of Ed. 3).
    Outcome<Classification> c =
        Classifier.assess(Emission.pulseTrain(1550e-9, 4e-6, 5e-9, 1e4), 30e-3, 0.1e-3);
    assertTrue(c.evaluated(), c.reason());
    assertEquals(HazardClass.CLASS_1M, c.get().hazardClass());
    assertEquals(0.103, c.get().fractionCondition3(), 0.002);
  }
}
