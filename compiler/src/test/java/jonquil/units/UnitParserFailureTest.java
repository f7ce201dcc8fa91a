package jonquil.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** What an author reads when a unit is wrong: one plain sentence, never an exception. */
class UnitParserFailureTest {
  @ParameterizedTest(name = "{0}")
  @CsvSource(
      delimiter = '|',
      quoteCharacter = '"',
      value = {
        "mmm      | unknown unit 'mmm'; did you mean 'mm'?",
        "mw       | unknown unit 'mw'; did you mean 'mW'?",
        "hz       | unknown unit 'hz'; did you mean 'Hz'?",
        "nM       | unknown unit 'nM'; did you mean 'nm'?",
        "wavez    | unknown unit 'wavez'; did you mean 'wave'?",
        "xyzzy    | unknown unit 'xyzzy'",
        "cd       | unknown unit 'cd'; did you mean 'cm'?",
        "W/cmm2   | unknown unit 'cmm'; did you mean 'mm'?",
        "dB/m     | 'dB' cannot be combined with other units",
        "mW/dB    | 'dB' cannot be combined with other units",
        "OD*m     | 'OD' cannot be combined with other units",
        "%/nm     | '%' cannot be combined with other units",
        "ppm/K    | 'ppm' cannot be combined with other units",
        "/dB      | 'dB' cannot be combined with other units",
        "dB2      | 'dB' cannot be raised to a power",
        "°C/W     | '°C' cannot be combined with other units; use 'K' for temperature differences",
        "W/       | missing unit after '/' in 'W/'",
        "W/*m     | missing unit between two operators in 'W/*m'",
        "*W       | missing unit before '*' in '*W'",
        "m^       | missing whole-number exponent after '^' in 'm^'",
        "m^x      | missing whole-number exponent after '^' in 'm^x'",
        "m^0      | exponent '^0' in 'm^0' is zero, which cancels the unit",
        "m^13     | exponent '^13' in 'm^13' is out of range (at most 12)",
        "m99999999999 | exponent '99999999999' in 'm99999999999' is out of range (at most 12)",
        "m-1      | unexpected '-' after 'm' in 'm-1'; write a negative exponent as 'm^-1'",
        "W/cm2s   | unexpected 's' after 'cm2' in 'W/cm2s'; join units with '*' or '/'",
        "W!       | unexpected character '!' in 'W!'",
        "2W       | unexpected character '2' in '2W'",
        "Qm^12    | unit 'Qm^12' is too large to work with",
        "qm^-12   | unit 'qm^-12' is too large to work with",
      })
  void failsWithExactMessage(String text, String message) {
    UnitParse.Failure f = assertInstanceOf(UnitParse.Failure.class, UnitParser.parse(text));
    assertEquals(message, f.message());
  }

  @Test
  void emptyAndNullAreFailuresNotExceptions() {
    assertEquals(new UnitParse.Failure("no unit written"), UnitParser.parse(""));
    assertEquals(new UnitParse.Failure("no unit written"), UnitParser.parse("  "));
    assertEquals(new UnitParse.Failure("no unit written"), UnitParser.parse(null));
  }
}
