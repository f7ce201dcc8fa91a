package jonquil.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Class boundaries, IEC 60825-1:2014 (Ed. 3): Class 1 AEL Table 3, Class 2 Table 5, Class 3R Table
 * 6, Class 3B Table 8 (table numbers and values from memory, as in Ed3.java; the standard's text
 * was not at hand). A row marked "confirmed" agreed with secondary class summaries consulted during
 * earlier work; those are not published works and are not cited, so every row counts as from memory
 * until it is checked against the standard.
 */
class ClassifierTest {

  static final double SMALL_BEAM = 1e-3;
  static final double DIVERGENCE = 1e-3;

  @ParameterizedTest(name = "{0} nm cw {1} W -> {2}")
  @CsvSource(
      delimiter = '|',
      value = {
        "532  | 0.30e-3 | CLASS_1  | confirmed: Class 1 visible cw 0.39 mW",
        "532  | 0.40e-3 | CLASS_2  | confirmed: above 0.39 mW, below 1 mW",
        "532  | 0.99e-3 | CLASS_2  | confirmed: Class 2 1 mW",
        "532  | 1.01e-3 | CLASS_3R | confirmed: Class 3R 1-5 mW visible",
        "635  | 4.9e-3  | CLASS_3R | confirmed: 3R up to 5 mW",
        "532  | 5.1e-3  | CLASS_3B | confirmed: above 5 mW",
        "450  | 0.49    | CLASS_3B | confirmed: 3B up to 0.5 W",
        "532  | 0.51    | CLASS_4  | confirmed: above 0.5 W",
        "445  | 0.035e-3 | CLASS_1 | from memory: 0.039 mW Class 1 at 400-450 nm (photochemical)",
        "445  | 0.05e-3 | CLASS_2  | from memory (0.039 mW) and confirmed (1 mW): visible",
        "1064 | 1.9e-3  | CLASS_1  | from memory: 3.9e-4 C4 C7 W = 1.95 mW (C4 = 5 confirmed)",
        "1064 | 2.0e-3  | CLASS_3R | 3R = 5 x Class 1 outside 400-700 nm (rule confirmed) = 9.75"
            + " mW",
        "1064 | 9.7e-3  | CLASS_3R | 3R = 5 x 1.95 mW",
        "1064 | 9.8e-3  | CLASS_3B | above 9.75 mW",
        "1064 | 0.49    | CLASS_3B | confirmed: 3B cw 0.5 W",
        "1064 | 0.51    | CLASS_4  | confirmed: above 0.5 W",
      })
  void continuousSmallBeam(double nm, double watts, HazardClass expected, String source) {
    Outcome<HazardClass> o =
        Classifier.classify(Emission.continuous(nm * 1e-9, watts), SMALL_BEAM, DIVERGENCE);
    assertTrue(o.evaluated(), o.reason());
    assertEquals(expected, o.get(), source);
    assertEquals(Outcome.CAUTION, o.caution());
  }

  @Test
  void wideCollimatedNearInfraredIsClass1M() {
    // 20 mm beam: 7 mm at 100 mm passes 1-exp(-2*49/400) = 21.7 % -> 1.74 mW <= 1.95 mW; 50 mm at 2
    // m passes all 8 mW.
    Classification c = Classifier.assess(Emission.continuous(1064e-9, 8e-3), 20e-3, 1e-4).get();
    assertEquals(HazardClass.CLASS_1M, c.hazardClass());
    // Power of a Gaussian beam through a centred circular aperture, 1 − exp(−2r²/w²) (Siegman,
    // Lasers, 1986, §17.1, from memory), at the measurement conditions of IEC 60825-1:2014:
    // condition 3 a 7 mm aperture at 100 mm, condition 1 a 50 mm aperture at 2 m (Table 10,
    // table number from memory).
    assertEquals(1 - Math.exp(-2 * 49.0 / 400), c.fractionCondition3(), 1e-3);
    assertEquals(1 - Math.exp(-12.5), c.fractionCondition1(), 1e-7); // beam grows 0.2 mm in 2 m
  }

  @Test
  void wideCollimatedVisibleIsClass2M() {
    // 2 mW, 20 mm: 0.435 mW through 7 mm (> 0.39 mW Class 1, <= 1 mW Class 2); 2 mW through 50 mm
    // (> 1 mW).
    assertEquals(
        HazardClass.CLASS_2M,
        Classifier.classify(Emission.continuous(532e-9, 2e-3), 20e-3, 1e-4).get());
  }

  @Test
  void aperturesAreGaussianFractions() {
    // 1 - exp(-D^2/(2 w^2)) with w = d/2: a beam as wide as the aperture passes 1 - e^-2 = 86.5 %
    // (Siegman 1986, §17.1). A collimated beam 7 mm wide through condition 3's 7 mm aperture:
    Classification c = Classifier.assess(Emission.continuous(532e-9, 1e-4), 7e-3, 0).get();
    assertEquals(1 - Math.exp(-2), c.fractionCondition3(), 1e-12);
  }

  @ParameterizedTest(name = "532 nm, 10 ns, 1 kHz, {0} J per pulse -> {1}")
  @CsvSource(
      delimiter = '|',
      value = {
        "1e-8 | CLASS_1  | from memory: Class 1 single-pulse AEL 7.7e-8 J (= 2e-3 J/m2 x 7 mm"
            + " aperture)",
        "1e-7 | CLASS_3R | 5 x 7.7e-8 J = 3.85e-7 J (3R rule confirmed; Class 2 = Class 1 below"
            + " 0.25 s)",
        "1e-3 | CLASS_4  | average 1 W through 7 mm > 0.5 W",
      })
  void pulsed(double joules, HazardClass expected, String source) {
    Outcome<HazardClass> o =
        Classifier.classify(Emission.pulseTrain(532e-9, joules, 1e-8, 1e3), SMALL_BEAM, DIVERGENCE);
    assertTrue(o.evaluated(), o.reason());
    assertEquals(expected, o.get(), source);
  }

  @Test
  void pulsedBetween3rAnd3bIsClass3b() {
    // From memory: Table 8 of Ed. 3, Class 3B 400-700 nm: 0.03 J per pulse (1 ns-0.25 s) and 0.5 W
    // average; 10 uJ at 1 kHz (10 mW) is above 3R and within both.
    Outcome<HazardClass> o =
        Classifier.classify(Emission.pulseTrain(532e-9, 1e-5, 1e-8, 1e3), SMALL_BEAM, DIVERGENCE);
    assertTrue(o.evaluated(), o.reason());
    assertEquals(HazardClass.CLASS_3B, o.get());
  }

  /**
   * Table 3 coefficients are the MPE times the 7 mm aperture area, rounded: checks both tables at
   * once.
   */
  @ParameterizedTest(name = "{0} nm, {1} s")
  @CsvSource({
    "532, 1e-8",
    "532, 1e-3",
    "532, 100",
    "808, 1",
    "1064, 1e-8",
    "1064, 1e-3",
    "1064, 100",
    "450, 1000"
  })
  void class1AelIsMpeTimesPupil(double nm, double t) {
    double area = Math.PI * 3.5e-3 * 3.5e-3;
    // IEC 60825-1:2014, Table 3 (from memory): the Class 1 AEL is the MPE of Table A.1 times the
    // area of the 7 mm limiting aperture.
    assertEquals(1.0, Ed3.class1Ael(nm * 1e-9, t) / (Ed3.ocularMpe(nm * 1e-9, t) * area), 0.03);
  }

  @ParameterizedTest(name = "{0} nm not evaluated")
  @CsvSource({"150", "1300", "1350", "2e6"})
  void outsideCoverage(double nm) {
    Outcome<HazardClass> o =
        Classifier.classify(Emission.continuous(nm * 1e-9, 1e-3), SMALL_BEAM, DIVERGENCE);
    assertFalse(o.evaluated());
    assertFalse(o.reason().isBlank());
  }
}
