package jonquil.safety.directive;

import static org.junit.jupiter.api.Assertions.assertEquals;

import jonquil.safety.Emission;
import jonquil.safety.MaximumPermissibleExposure;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Reference values of the skin's exposure limit values, Directive 2006/25/EC Annex II Table 2.4
 * with the Table 2.5 factor C_A, per band and duration, worked by hand from the row named. [FR]:
 * read in the directive's Table 2.4 as restated by the French transposition (see {@link AnnexII});
 * the ultraviolet and infrared rows refer to the eye's (Tables 2.2 [FR] and 2.3, from memory).
 */
class DirectiveSkinLimitTest {

  @ParameterizedTest(name = "{0} nm over {1} s: {2} J/m2 ({4})")
  @CsvSource({
    // nm, t (s), H (J/m2), aperture (mm), Table 2.4 row [FR] and working
    "193,   1e-8,  30,       3.5, Table 2.4 row 180-400 nm: the eye's Table 2.2 row, H = 30",
    "193,   1e-10, 3,        3.5, Table 2.4 row 180-400 nm below 1e-9 s: E = 3e10 W/m2",
    "308,   1,     400,      3.5, Table 2.4 row 180-400 nm: the eye's Table 2.2 row 308 nm",
    "355,   1e-8,  56,       3.5, Table 2.4 row 180-400 nm: the eye's 5.6e3 t^0.25",
    "400,   1e-8,  56,       3.5, Table 2.4 note a at 400 nm: the UV 5.6e3 t^0.25 below 200 C_A",
    "532,   1e-10, 20,       3.5, Table 2.4 row 400-700 nm below 1e-9 s: E = 2e11 W/m2",
    "532,   1e-8,  200,      3.5, Table 2.4 row 400-700 nm 1e-9-1e-7 s: 200 C_A",
    "532,   1e-3,  1956.1,   3.5, Table 2.4 row 400-700 nm 1e-7-10 s: 1.1e4 C_A t^0.25",
    "808,   1e-10, 32.887,   3.5, Table 2.4 row 700-1400 nm below 1e-9 s: 2e11 C_A W/m2",
    "808,   1e-8,  328.87,   3.5, Table 2.4 row 700-1400 nm: 200 C_A with C_A = 10^0.216 (Table"
        + " 2.5)",
    "1064,  1e-8,  1000,     3.5, Table 2.4 row 700-1400 nm: 200 C_A with C_A = 5",
    "1064,  1,     55000,    3.5, Table 2.4 row 700-1400 nm 1e-7-10 s: 1.1e4 x 5 x 1^0.25",
    "1550,  1e-8,  1e4,      3.5, Table 2.4 row 1500-1800 nm: the eye's Table 2.2 row, 1e4",
    "1550,  1e-12, 10,       3.5, Table 2.4 row 1500-1800 nm below 1e-9 s: E = 1e13 W/m2",
    "10600, 1e-5,  314.91,   3.5, Table 2.4 row 2600 nm-1e6 nm: the eye's 5.6e3 t^0.25",
    "500000, 1e-5, 314.91,   3.5, Table 2.4 row 2600 nm-1e6 nm: 3.5 mm here too (aperture column)"
  })
  void singlePulses(double nm, double t, double h, double apertureMm, String table) {
    MaximumPermissibleExposure m =
        DirectiveSkinLimit.at(Emission.singlePulse(nm * 1e-9, 1e-9, t), 1).get();
    assertEquals(h, m.radiantExposure(), h * 1e-4, table);
    assertEquals(apertureMm * 1e-3, m.apertureDiameter(), 1e-6, table);
  }

  @ParameterizedTest(name = "{0} nm continuous over {1} s: {2} W/m2 ({3})")
  @CsvSource({
    // nm, T (s), E (W/m2), Table 2.4 row and working
    "355,   1e4, 10,     Table 2.4 row 180-400 nm: the eye's Table 2.3 UV-A E = 10 (from memory)",
    "532,   100, 2000,   Table 2.4 row 400-700 nm 10 s-3e4 s [FR]: E = 2e3 C_A",
    "1064,  100, 10000,  Table 2.4 row 700-1400 nm 10 s-3e4 s [FR]: E = 2e3 C_A, C_A = 5",
    "808,   3e4, 3288.7, Table 2.4 row 700-1400 nm [FR]: E = 2e3 C_A, C_A = 10^0.216",
    "10600, 100, 1000,   Table 2.4 row 2600 nm-1e6 nm: the eye's Table 2.3 E = 1000 (from memory)"
  })
  void continuousWave(double nm, double t, double e, String table) {
    assertEquals(
        e,
        DirectiveSkinLimit.at(Emission.continuous(nm * 1e-9, 1), t).get().irradiance(),
        e * 1e-4,
        table);
  }
}
