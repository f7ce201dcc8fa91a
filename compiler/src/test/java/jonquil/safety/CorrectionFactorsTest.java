package jonquil.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The ICNIRP correction factors both standards share (IEC C4/C3/C7 = ANSI C_A/C_B/C_C). Expected
 * values from the forms in the Norwegian regulations on action and limit values §11-5 (Directive
 * 2006/25/EC, ICNIRP laser tables), evaluated by hand.
 */
class CorrectionFactorsTest {
  @ParameterizedTest(name = "C_A({0} nm) = {1}")
  @CsvSource({
    "532, 1.0", // below 700 nm: 1
    "700, 1.0", // 10^(0.002·0)
    "800, 1.5849", // 10^0.2
    "1000, 3.9811", // 10^0.6
    "1064, 5.0", // 1050–1400 nm: 5
  })
  void cA(double nm, double expected) {
    assertEquals(expected, CorrectionFactors.cA(nm * 1e-9), 1e-4);
  }

  @ParameterizedTest(name = "C_B({0} nm) = {1}")
  @CsvSource({
    "420, 1.0", // 400–450 nm: 1
    "500, 10.0", // 10^(0.02·50)
    "550, 100.0", // 10^(0.02·100)
  })
  void cB(double nm, double expected) {
    assertEquals(expected, CorrectionFactors.cB(nm * 1e-9), 1e-9 * expected);
  }

  @ParameterizedTest(name = "C_C({0} nm) = {1}")
  @CsvSource({
    "1064, 1.0", // below 1150 nm: 1
    "1175, 2.8184", // 10^(0.018·25) = 10^0.45
  })
  void cC(double nm, double expected) {
    assertEquals(expected, CorrectionFactors.cC(nm * 1e-9), 1e-4);
  }

  @ParameterizedTest(name = "C_C is refused at {0} nm, where the standards differ")
  @CsvSource({"1200", "1300"})
  void cCRefusedFrom1200(double nm) {
    assertThrows(IllegalArgumentException.class, () -> CorrectionFactors.cC(nm * 1e-9));
  }

  @ParameterizedTest(name = "T_i = t_min at {0} nm = {1} s")
  @CsvSource({"532, 5e-6", "1049, 5e-6", "1064, 1.3e-5"}) // from memory, both 2014 editions
  void pulseGroupTime(double nm, double expected) {
    assertEquals(expected, CorrectionFactors.pulseGroupTime(nm * 1e-9));
  }
}
