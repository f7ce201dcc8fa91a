package jonquil.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Units whose numbers are not a plain multiple of SI: logarithmic ratios and shifted temperature
 * zeros.
 */
class ScaleAndOffsetTest {
  private static Unit unit(String text) {
    return assertInstanceOf(UnitParse.Ok.class, UnitParser.parse(text)).unit();
  }

  @ParameterizedTest(name = "{1} {0} = {2} [{3}]")
  @CsvSource(
      delimiter = '|',
      quoteCharacter = '"',
      value = {
        // Written value | unit | SI value | source
        "10    | dB   | 10                 | " + Sources.DB_DEF,
        "20    | dB   | 100                | " + Sources.DB_DEF,
        "-10   | dB   | 0.1                | " + Sources.DB_DEF,
        "0     | dB   | 1                  | " + Sources.DB_DEF,
        "3     | dB   | 1.9952623149688795 | " + Sources.DB_DEF + "; 10^0.3 computed, from memory",
        "0     | dBm  | 1e-3               | " + Sources.DB_DEF + "; dBm is referred to 1 mW",
        "30    | dBm  | 1                  | " + Sources.DB_DEF + "; dBm is referred to 1 mW",
        "3     | OD   | 1e-3               | " + Sources.OD_DEF,
        "0     | OD   | 1                  | " + Sources.OD_DEF,
        "6     | OD   | 1e-6               | " + Sources.OD_DEF,
        "0     | °C   | 273.15             | " + Sources.SI_CELSIUS,
        "100   | degC | 373.15             | " + Sources.SI_CELSIUS,
        "-273.15 | °C | 0                  | " + Sources.SI_CELSIUS,
        "32    | °F   | 273.15             | " + Sources.NIST_811_F,
        "212   | degF | 373.15             | " + Sources.NIST_811_F,
        "-40   | °F   | 233.15             | " + Sources.NIST_811_F + "; -40 °F = -40 °C",
      })
  void toSiAndBack(double written, String symbol, double si, String source) {
    Unit u = unit(symbol);
    assertEquals(si, u.toSi(written), Math.max(1e-12, Math.abs(si) * 1e-12), source);
    assertEquals(written, u.fromSi(si), 1e-9, source);
  }
}
