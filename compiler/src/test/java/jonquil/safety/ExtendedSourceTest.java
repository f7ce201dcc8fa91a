package jonquil.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** C6, α_max, T2 and γ_ph of IEC 60825-1:2014 (Ed. 3) Table 9, each row with its source. */
class ExtendedSourceTest {

  @ParameterizedTest(name = "C6({0} rad, {1} s) = {2}")
  @CsvSource(
      delimiter = '|',
      value = {
        "1e-3 | 1 | 1 | from memory: Table 9, C6 = 1 up to alpha_min = 1.5 mrad",
        "15e-3 | 1 | 10 | from memory: Table 9, C6 = alpha/alpha_min",
        "0.5 | 1 | 66.67 | from memory: Table 9, alpha_max = 100 mrad beyond 0.25 s",
        "0.5 | 1e-6 | 3.333 | from memory: Table 9, alpha_max = 5 mrad below 625 us",
        "0.5 | 0.01 | 13.33 | from memory: Table 9, alpha_max = 200 t^0.5 mrad = 20 mrad at 10 ms",
      })
  void c6(double alpha, double t, double expected, String source) {
    assertEquals(expected, ExtendedSource.c6(alpha, t), expected * 1e-3, source);
  }

  @ParameterizedTest(name = "T2({0} rad) = {1} s")
  @CsvSource(
      delimiter = '|',
      value = {
        "1e-3 | 10 | Directive 2006/25/EC Table 2.5 (same form in Ed. 3 Table 9, from memory)",
        "0.1 | 100 | Directive 2006/25/EC Table 2.5: 10 x 10^((100-1.5)/98.5) s",
        "0.5 | 100 | Directive 2006/25/EC Table 2.5: 100 s beyond 100 mrad",
      })
  void t2(double alpha, double expected, String source) {
    assertEquals(expected, ExtendedSource.t2(alpha), expected * 1e-9, source);
  }

  @ParameterizedTest(name = "alpha_max joins at {0} s")
  @CsvSource({"625e-6, 5e-3", "0.25, 0.1"})
  void alphaMaxJoins(double t, double alpha) {
    // From memory (Table 9): the rows of alpha_max meet at their breakpoints.
    assertEquals(alpha, ExtendedSource.alphaMax(t * (1 - 1e-12)), alpha * 1e-6);
    assertEquals(alpha, ExtendedSource.alphaMax(t), alpha * 1e-6);
  }

  @ParameterizedTest(name = "gamma_ph({0} s) = {1} rad")
  @CsvSource({"50, 11e-3", "1000, 34.79e-3", "2e4, 0.11"})
  void photochemicalAcceptance(double t, double gamma) {
    // Directive 2006/25/EC, Annex II, Table 2.5: 11 mrad, 1.1 t^0.5 mrad, 110 mrad.
    assertEquals(gamma, ExtendedSource.photochemicalAcceptance(t), gamma * 1e-3);
  }

  @org.junit.jupiter.api.Test
  void negativeSubtenseIsRefused() {
    assertThrows(IllegalArgumentException.class, () -> ExtendedSource.c6(-1e-3, 1));
  }
}
