package jonquil.safety.directive;

import static org.junit.jupiter.api.Assertions.assertEquals;

import jonquil.safety.Emission;
import jonquil.safety.MaximumPermissibleExposure;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Reference values of the skin's exposure limit values, Directive 2006/25/EC Annex II Table 2.4
 * (rows from memory, see {@link AnnexII}), with the Table 2.5 factor C_A, per band and duration.
 */
class DirectiveSkinLimitTest {

  @ParameterizedTest(name = "{0} nm over {1} s: {2} J/m2 ({4})")
  @CsvSource({
    // nm, t (s), H (J/m2), aperture (mm), Table 2.4 row and working
    "193,   1e-8,  30,       3.5, Table 2.4 UV-C: H = 30",
    "355,   1e-8,  56,       3.5, Table 2.4 UV-A: C1 = 5.6e3 t^0.25",
    "532,   1e-10, 20,       3.5, Table 2.4 visible below 1 ns: E = 2e11 C_A W/m2",
    "532,   1e-8,  200,      3.5, Table 2.4 visible 1e-9-1e-7 s: 200 C_A",
    "532,   1e-3,  1956.1,   3.5, Table 2.4 1e-7-10 s: 1.1e4 C_A t^0.25",
    "808,   1e-8,  328.87,   3.5, Table 2.4 IR-A: 200 C_A with C_A = 10^0.216 (Table 2.5)",
    "1064,  1e-8,  1000,     3.5, Table 2.4 IR-A: 200 C_A with C_A = 5",
    "1550,  1e-8,  1e4,      3.5, Table 2.4 IR-B 1500-1800 nm: 1e4",
    "10600, 1e-5,  314.91,   3.5, Table 2.4 IR-C: C1",
    "500000, 1e-5, 314.91,   11,  Table 2.4 far infrared: C1 over 11 mm"
  })
  void singlePulses(double nm, double t, double h, double apertureMm, String table) {
    MaximumPermissibleExposure m =
        DirectiveSkinLimit.at(Emission.singlePulse(nm * 1e-9, 1e-9, t), 1).get();
    assertEquals(h, m.radiantExposure(), h * 1e-4, table);
    assertEquals(apertureMm * 1e-3, m.apertureDiameter(), 1e-6, table);
  }

  @ParameterizedTest(name = "{0} nm continuous over {1} s: {2} W/m2 ({3})")
  @CsvSource({
    "355,   1e4, 10,     Table 2.4 UV-A 1e3-3e4 s: E = 10",
    "532,   100, 2000,   Table 2.4 visible from 10 s: E = 2000 C_A",
    "1064,  100, 10000,  Table 2.4 IR-A: E = 2000 C_A with C_A = 5",
    "10600, 100, 1000,   Table 2.4 IR-C from 10 s: E = 1000"
  })
  void continuousWave(double nm, double t, double e, String table) {
    assertEquals(
        e,
        DirectiveSkinLimit.at(Emission.continuous(nm * 1e-9, 1), t).get().irradiance(),
        e * 1e-4,
        table);
  }
}
