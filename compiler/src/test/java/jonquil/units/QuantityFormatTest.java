package jonquil.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * How values read back to people. The SI inputs are the printed values converted with the factors
 * the parser table cites (SI Brochure Table 7 prefixes; NIST SP 811 for W/cm²).
 */
class QuantityFormatTest {
  @ParameterizedTest(name = "{0} {1} -> {2}")
  @CsvSource(
      delimiter = '|',
      quoteCharacter = '"',
      value = {
        "0.5       | POWER        | 500 mW",
        "0.0005    | POWER        | 500 µW",
        "0.99996   | POWER        | 1 W",
        "2.5e13    | POWER        | 25 TW",
        "1.064e-6  | LENGTH       | 1064 nm",
        "1.55e-6   | LENGTH       | 1550 nm",
        "1.06e-5   | LENGTH       | 10.6 µm",
        "0.00017   | LENGTH       | 170 µm",
        "0.15      | LENGTH       | 150 mm",
        "2.5       | LENGTH       | 2.5 m",
        "1500      | LENGTH       | 1.5 km",
        "1e-10     | LENGTH       | 100 pm",
        "0         | LENGTH       | 0 m",
        "-0.002    | LENGTH       | -2 mm",
        "1e7       | IRRADIANCE   | 1 kW/cm²",
        "1e4       | IRRADIANCE   | 1 W/cm²",
        "3e14      | IRRADIANCE   | 30 GW/cm²",
        "1e4       | FLUENCE      | 1 J/cm²",
        "50        | FLUENCE      | 5 mJ/cm²",
        "3e7       | ELECTRIC_FIELD | 30 MV/m",
        "2500      | ELECTRIC_FIELD | 2.5 kV/m",
        "0.3926990816987241 | ANGLE | 22.5°",
        "0.5       | DIMENSIONLESS | 0.5",
        "8e-9      | TIME         | 8 ns",
        "1.2e-13   | TIME         | 120 fs",
        "3600      | TIME         | 3600 s",
        "1000      | FREQUENCY    | 1 kHz",
        "2.818e14  | FREQUENCY    | 281.8 THz",
        "300       | TEMPERATURE  | 300 K",
        "150       | INVERSE_LENGTH | 1.5 /cm",
        "1e-6      | AREA         | 1 mm²",
        "4.2e-15   | AREA         | 0.0042 µm²",
        "1.5e-27   | LENGTH4      | 0.0015 µm⁴",
        "0.5       | RESPONSIVITY | 500 mA/W",
        "123456789 | POWER        | 123.5 MW",
        "1e-20     | POWER        | 1e-5 fW",
      })
  void formatsInTheUnitTheTradeReads(double si, String dimension, String expected)
      throws Exception {
    Dimension dim = (Dimension) Dimension.class.getField(dimension).get(null);
    assertEquals(expected, QuantityFormat.format(si, dim));
  }

  @Test
  void unnamedDimensionsPrintInCoherentSiUnitsTheLanguageCanRead() {
    assertEquals("3 kg·m/s²", QuantityFormat.format(3, new Dimension(1, 1, -2, 0, 0, 0)));
    assertEquals("2 rad/s", QuantityFormat.format(2, Dimension.ANGLE.divide(Dimension.TIME)));
  }

  @Test
  void tinyAndHugeNumbersUseScientificNotation() {
    assertEquals("1.5e-25 fW", QuantityFormat.format(1.5e-40, Dimension.POWER));
    assertEquals("1.235e7 PW", QuantityFormat.format(1.2346e22, Dimension.POWER));
  }

  @Test
  void powerAlternativesIncludeWattsAndDbm() {
    // 0.5 mW is 10·log10(0.5) dBm = −3.0103 dBm (IEC 60027-3 definition of the level, from memory).
    List<String> alts = QuantityFormat.alternatives(0.0005, Dimension.POWER);
    assertTrue(alts.contains("0.0005 W"), alts::toString);
    assertTrue(alts.contains("-3.01 dBm"), alts::toString);
    assertFalse(alts.contains("500 mW"), "must not repeat format()");
  }

  @Test
  void irradianceAlternativesIncludeBothAreas() {
    List<String> alts = QuantityFormat.alternatives(1e7, Dimension.IRRADIANCE);
    assertTrue(alts.contains("1e7 W/m²"), alts::toString);
    assertTrue(alts.contains("1000 W/cm²"), alts::toString);
  }

  @Test
  void angleAlternativesIncludeRadians() {
    List<String> alts = QuantityFormat.alternatives(Math.PI / 8, Dimension.ANGLE);
    assertTrue(alts.contains("0.3927 rad"), alts::toString);
    assertTrue(alts.contains("392.7 mrad"), alts::toString);
  }

  @Test
  void lengthAlternativesIncludeMetresAndMicrometres() {
    List<String> alts = QuantityFormat.alternatives(1.064e-6, Dimension.LENGTH);
    assertTrue(alts.contains("1.064e-6 m"), alts::toString);
    assertTrue(alts.contains("1.064 µm"), alts::toString);
  }

  @Test
  void temperatureAlternativesIncludeCelsius() {
    // 300 K − 273.15 = 26.85 °C (SI Brochure 9th ed., Sect. 2.3.1, from memory).
    assertTrue(QuantityFormat.alternatives(300, Dimension.TEMPERATURE).contains("26.85 °C"));
  }

  @Test
  void ratioAlternativesIncludePercentDecibelAndOpticalDensity() {
    List<String> alts = QuantityFormat.alternatives(1e-3, Dimension.DIMENSIONLESS);
    assertTrue(alts.contains("0.1 %"), alts::toString);
    assertTrue(alts.contains("-30 dB"), alts::toString);
    assertTrue(alts.contains("OD 3"), alts::toString);
  }
}
