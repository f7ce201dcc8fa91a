package jonquil.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** T_i and C5 of IEC 60825-1:2014 (Ed. 3) clause 4.3 f), at every wavelength, with sources. */
class PulseRulesTest {

  @ParameterizedTest(name = "T_i({0} nm) = {1} s")
  @CsvSource(
      delimiter = '|',
      value = {
        "355 | 1e-9 | Directive 2006/25/EC Table 2.6: T_min 1 ns for 315-400 nm",
        "532 | 5e-6 | from memory: Ed. 3, 5 us for 400-1050 nm",
        "1064 | 1.3e-5 | from memory: Ed. 3, 13 us for 1050-1400 nm",
        "1450 | 1e-3 | Directive 2006/25/EC Table 2.6: 1 ms for 1400-1500 nm",
        "1550 | 10 | Directive 2006/25/EC Table 2.6: 10 s for 1500-1800 nm",
        "2100 | 1e-3 | from memory: 1 ms for 1800-2600 nm",
        "10600 | 1e-7 | from memory: 100 ns for 2600 nm-1 mm",
      })
  void groupTime(double nm, double ti, String source) {
    assertEquals(ti, PulseRules.groupTime(nm * 1e-9), ti * 1e-12, source);
  }

  @ParameterizedTest(name = "C5({0} nm, alpha {1}, N {2}) = {3}")
  @CsvSource(
      delimiter = '|',
      value = {
        "532 | 1.5e-3 | 1e4 | 1 | from memory: clause 4.3 f), C5 = 1 up to alpha = 5 mrad",
        "532 | 20e-3 | 16 | 0.5 | from memory: N^-0.25 up to alpha_max (100 mrad at 1 s)",
        "532 | 20e-3 | 1000 | 0.4 | from memory: at least 0.4 up to alpha_max",
        "532 | 0.2 | 1e4 | 0.2 | from memory: 0.2 beyond N = 625 above alpha_max",
        "1550 | 0 | 500 | 1 | from memory: 1 up to N = 600 in 1400 nm-1 mm",
        "10600 | 0 | 1e4 | 0.5 | from memory: 5 N^-0.25 = 0.5 beyond N = 600",
        "10600 | 0 | 1e8 | 0.4 | from memory: 5 N^-0.25 at least 0.4",
        "355 | 0 | 1e6 | 1 | from memory: 1 in the ultraviolet, where the dose rule governs",
      })
  void c5(double nm, double alpha, double pulses, double expected, String source) {
    assertEquals(expected, PulseRules.c5(nm * 1e-9, alpha, 1e-8, pulses, 1), 1e-9, source);
  }

  @Test
  void c5AppliesToExtendedSourceTrains() {
    // From memory: Table A.1 18 t^0.75 C6 J/m2 for one 1 ms pulse of a 20 mrad source, C6 capped
    // by alpha_max = 200 sqrt(1 ms) = 6.32 mrad at 6.32/1.5 = 4.216 (Table 9), times C5 = 0.4 for
    // 1000 pulses over 10 s (clause 4.3 f).
    Outcome<MaximumPermissibleExposure> o =
        OcularMpe.at(Emission.pulseTrain(532e-9, 1e-9, 1e-3, 100), 10, 20e-3);
    double single = 18 * Math.pow(1e-3, 0.75) * 0.2 * Math.sqrt(1e-3) / 1.5e-3;
    assertEquals(single * 0.4, o.get().repetitivePulse(), single * 1e-6);
  }
}
