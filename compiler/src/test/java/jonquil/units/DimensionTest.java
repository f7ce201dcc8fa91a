package jonquil.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The named dimensions agree with the base-unit forms of their SI units and read well in messages.
 */
class DimensionTest {
  static Stream<Arguments> baseForms() {
    // The coherent unit of each named dimension in base units, as the source writes it.
    return Stream.of(
        Arguments.of(Dimension.POWER, "kg·m²·s⁻³", Sources.SI_T4 + ", watt"),
        Arguments.of(Dimension.ENERGY, "kg·m²·s⁻²", Sources.SI_T4 + ", joule"),
        Arguments.of(Dimension.FREQUENCY, "s⁻¹", Sources.SI_T4 + ", hertz"),
        Arguments.of(Dimension.VOLTAGE, "kg·m²·s⁻³·A⁻¹", Sources.SI_T4 + ", volt"),
        Arguments.of(Dimension.ELECTRIC_FIELD, "kg·m·s⁻³·A⁻¹", Sources.SI_T4 + ", volt per metre"),
        Arguments.of(Dimension.IRRADIANCE, "kg·s⁻³", Sources.SI_T4 + ", watt per square metre"),
        Arguments.of(Dimension.FLUENCE, "kg·s⁻²", Sources.SI_T4 + ", joule per square metre"),
        Arguments.of(Dimension.RESPONSIVITY, "kg⁻¹·m⁻²·s³·A", Sources.SI_T4 + ", ampere per watt"),
        Arguments.of(
            Dimension.LINEAR_POWER_DENSITY, "kg·m·s⁻³", Sources.SI_T4 + ", watt per metre"),
        Arguments.of(Dimension.LENGTH4, "m⁴", Sources.SI_T2),
        Arguments.of(Dimension.INVERSE_LENGTH, "m⁻¹", Sources.SI_5_4));
  }

  @ParameterizedTest(name = "{2}")
  @MethodSource("baseForms")
  void namedDimensionsHaveTheirSiBaseForm(Dimension dim, String formula, String source) {
    assertEquals(formula, dim.formula(), source);
  }

  @Test
  void describeGivesFriendlyNames() {
    assertEquals("length", Dimension.LENGTH.describe());
    assertEquals("power", Dimension.POWER.describe());
    assertEquals("energy", Dimension.ENERGY.describe());
    assertEquals("time", Dimension.TIME.describe());
    assertEquals("frequency", Dimension.FREQUENCY.describe());
    assertEquals("angle", Dimension.ANGLE.describe());
    assertEquals("area", Dimension.AREA.describe());
    assertEquals("plain number (ratio)", Dimension.DIMENSIONLESS.describe());
    assertEquals("irradiance (power per area)", Dimension.IRRADIANCE.describe());
    assertEquals("fluence (energy per area)", Dimension.FLUENCE.describe());
    assertEquals("power per length", Dimension.LINEAR_POWER_DENSITY.describe());
    assertEquals("electric field strength", Dimension.ELECTRIC_FIELD.describe());
    assertEquals("temperature", Dimension.TEMPERATURE.describe());
  }

  @Test
  void unnamedDimensionsFallBackToTheFormula() {
    // Force has no entry: the newton is kg·m·s⁻² (SI Brochure 9th ed., Table 4, from memory).
    assertEquals("kg·m·s⁻²", new Dimension(1, 1, -2, 0, 0, 0).describe());
    assertEquals("m·rad", Dimension.LENGTH.times(Dimension.ANGLE).describe());
  }

  @Test
  void angleIsNotDimensionless() {
    assertFalse(Dimension.ANGLE.isDimensionless());
    assertTrue(Dimension.LENGTH.divide(Dimension.LENGTH).isDimensionless());
  }
}
