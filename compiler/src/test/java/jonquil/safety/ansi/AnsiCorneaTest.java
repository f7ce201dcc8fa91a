package jonquil.safety.ansi;

import static org.junit.jupiter.api.Assertions.assertEquals;

import jonquil.safety.Emission;
import jonquil.safety.MaximumPermissibleExposure;
import jonquil.safety.directive.DirectiveEyeLimit;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The corneal rows of ANSI Z136.1-2014 Table 5a (ultraviolet and far infrared) with the Table 8
 * apertures, all from memory, and their cross-check against Directive 2006/25/EC Annex II, whose
 * tables are public: both reproduce the ICNIRP values, so they must agree within rounding.
 */
class AnsiCorneaTest {

  @ParameterizedTest(name = "{0} nm over {1} s: {2} J/m2 ({4})")
  @CsvSource({
    // nm, t (s), H (J/m2), aperture (mm), Table 5a row (from memory), in J/cm2
    "193,   1e-8, 30,     1,   Table 5a 180-302 nm photochemical 3e-3 J/cm2",
    "308,   1,    398.11, 1,   Table 5a 302-315 nm photochemical 10^(0.2(λ-295)) 1e-4 J/cm2",
    "355,   1e-8, 56,     1,   Table 5a 315-400 nm thermal 0.56 t^0.25 J/cm2",
    "355,   100,  1e4,    1,   Table 5a 315-400 nm 10-1e3 s 1 J/cm2",
    "1550,  1e-8, 1e4,    1,   Table 5a 1500-1800 nm 1.0 J/cm2",
    "2000,  1,    5600,   1.5, Table 5a 1800-2600 nm 0.56 t^0.25 J/cm2; Table 8 1.5 t^0.375 mm",
    "10600, 1e-8, 100,    1,   Table 5a 2600 nm-1 mm 1e-2 J/cm2",
    "10600, 100,  1e5,    3.5, Table 5a from 10 s 0.1 W/cm2; Table 8 3.5 mm"
  })
  void cornealRows(double nm, double t, double h, double apertureMm, String row) {
    Emission e =
        t < 10 ? Emission.singlePulse(nm * 1e-9, 1e-6, t) : Emission.continuous(nm * 1e-9, 1e-3);
    MaximumPermissibleExposure m = AnsiOcularMpe.at(e, t).get();
    assertEquals(h, m.radiantExposure(), h * 1e-4, row);
    assertEquals(apertureMm * 1e-3, m.apertureDiameter(), 1e-6, row);
  }

  @ParameterizedTest(name = "{0} nm over {1} s: ANSI agrees with the directive")
  @CsvSource({
    "193, 1e-6", "250, 100", "310, 1e-3", "310, 100", "355, 1", "380, 1e4", "1450, 1e-4",
    "1450, 1", "1650, 1e-5", "2000, 0.01", "3000, 1e-6", "10600, 1", "10600, 3e4", "500000, 1"
  })
  void agreesWithTheDirective(double nm, double t) {
    // Directive 2006/25/EC Tables 2.2/2.3 against ANSI Z136.1-2014 Table 5a (from memory): the
    // same ICNIRP rows, equal within 1 % (common practice for the tables' rounding).
    Emission e =
        t < 10 ? Emission.singlePulse(nm * 1e-9, 1e-6, t) : Emission.continuous(nm * 1e-9, 1e-3);
    double ansi = AnsiOcularMpe.at(e, t).get().radiantExposure();
    double directive = DirectiveEyeLimit.at(e, t).get().radiantExposure();
    assertEquals(1, ansi / directive, 0.01, nm + " nm over " + t + " s");
  }
}
