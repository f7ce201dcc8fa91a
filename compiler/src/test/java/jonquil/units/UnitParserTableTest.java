package jonquil.units;

import static jonquil.units.Dimension.*;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** Unit texts an author may write, each with the SI factor and dimension its source gives. */
class UnitParserTableTest {
  private static final double DEG = Math.PI / 180;

  static Arguments row(String text, double factor, Dimension dim, String source) {
    return Arguments.of(text, factor, dim, source);
  }

  static Stream<Arguments> rows() {
    return Stream.of(
        row("m", 1, LENGTH, Sources.SI_T2),
        row("nm", 1e-9, LENGTH, Sources.SI_T7),
        row("um", 1e-6, LENGTH, Sources.SI_T7),
        row("µm", 1e-6, LENGTH, Sources.SI_T7),
        row("μm", 1e-6, LENGTH, Sources.SI_T7),
        row("mm", 1e-3, LENGTH, Sources.SI_T7),
        row("cm", 1e-2, LENGTH, Sources.SI_T7),
        row("dm", 1e-1, LENGTH, Sources.SI_T7),
        row("dam", 1e1, LENGTH, Sources.SI_T7),
        row("hm", 1e2, LENGTH, Sources.SI_T7),
        row("km", 1e3, LENGTH, Sources.SI_T7),
        row("pm", 1e-12, LENGTH, Sources.SI_T7),
        row("fm", 1e-15, LENGTH, Sources.SI_T7),
        row("am", 1e-18, LENGTH, Sources.SI_T7),
        row("zm", 1e-21, LENGTH, Sources.SI_T7),
        row("ym", 1e-24, LENGTH, Sources.SI_T7),
        row("rm", 1e-27, LENGTH, Sources.CGPM_2022),
        row("qm", 1e-30, LENGTH, Sources.CGPM_2022),
        row("W", 1, POWER, Sources.SI_T4),
        row("mW", 1e-3, POWER, Sources.SI_T7),
        row("kW", 1e3, POWER, Sources.SI_T7),
        row("MW", 1e6, POWER, Sources.SI_T7),
        row("GW", 1e9, POWER, Sources.SI_T7),
        row("TW", 1e12, POWER, Sources.SI_T7),
        row("PW", 1e15, POWER, Sources.SI_T7),
        row("EW", 1e18, POWER, Sources.SI_T7),
        row("ZW", 1e21, POWER, Sources.SI_T7),
        row("YW", 1e24, POWER, Sources.SI_T7),
        row("RW", 1e27, POWER, Sources.CGPM_2022),
        row("QW", 1e30, POWER, Sources.CGPM_2022),
        row("J", 1, ENERGY, Sources.SI_T4),
        row("mJ", 1e-3, ENERGY, Sources.SI_T7),
        row("uJ", 1e-6, ENERGY, Sources.SI_T7),
        row("eV", 1.602176634e-19, ENERGY, Sources.SI_EV),
        row("keV", 1.602176634e-16, ENERGY, Sources.SI_EV),
        row("s", 1, TIME, Sources.SI_T2),
        row("ms", 1e-3, TIME, Sources.SI_T7),
        row("ns", 1e-9, TIME, Sources.SI_T7),
        row("ps", 1e-12, TIME, Sources.SI_T7),
        row("fs", 1e-15, TIME, Sources.SI_T7),
        row("min", 60, TIME, Sources.SI_T8),
        row("h", 3600, TIME, Sources.SI_T8),
        row("d", 86400, TIME, Sources.SI_T8),
        row("Hz", 1, FREQUENCY, Sources.SI_T4),
        row("kHz", 1e3, FREQUENCY, Sources.SI_T7),
        row("MHz", 1e6, FREQUENCY, Sources.SI_T7),
        row("rad", 1, ANGLE, Sources.SI_T4),
        row("mrad", 1e-3, ANGLE, Sources.SI_T7),
        row("urad", 1e-6, ANGLE, Sources.SI_T7),
        row("deg", DEG, ANGLE, Sources.SI_T8),
        row("°", DEG, ANGLE, Sources.SI_T8),
        row("arcmin", Math.PI / 10800, ANGLE, Sources.SI_T8),
        row("arcsec", Math.PI / 648000, ANGLE, Sources.SI_T8),
        row("wave", 2 * Math.PI, ANGLE, Sources.WAVE),
        row("waves", 2 * Math.PI, ANGLE, Sources.WAVE),
        row("K", 1, TEMPERATURE, Sources.SI_T2),
        row("mK", 1e-3, TEMPERATURE, Sources.SI_T7),
        row("%", 1e-2, DIMENSIONLESS, Sources.SI_PERCENT),
        row("ppm", 1e-6, DIMENSIONLESS, Sources.SI_PERCENT),
        row("A", 1, CURRENT, Sources.SI_T2),
        row("mA", 1e-3, CURRENT, Sources.SI_T7),
        row("V", 1, VOLTAGE, Sources.SI_T4),
        row("g", 1e-3, MASS, Sources.SI_T2),
        row("kg", 1, MASS, Sources.SI_T2),
        row("mg", 1e-6, MASS, Sources.SI_T7),
        row("cm2", 1e-4, AREA, Sources.SI_5_4),
        row("cm^2", 1e-4, AREA, Sources.SI_5_4),
        row("cm²", 1e-4, AREA, Sources.SI_5_4),
        row("cm3", 1e-6, LENGTH.pow(3), Sources.SI_5_4),
        row("um2", 1e-12, AREA, Sources.SI_5_4),
        row("µm^2", 1e-12, AREA, Sources.SI_5_4),
        row("nm2", 1e-18, AREA, Sources.SI_5_4),
        row("um4", 1e-24, LENGTH4, Sources.SI_5_4),
        row("/cm", 1e2, INVERSE_LENGTH, Sources.SI_5_4),
        row("cm^-1", 1e2, INVERSE_LENGTH, Sources.SI_5_4),
        row("cm⁻¹", 1e2, INVERSE_LENGTH, Sources.SI_5_4),
        row("1/cm", 1e2, INVERSE_LENGTH, Sources.SI_5_4),
        row("/m", 1, INVERSE_LENGTH, Sources.SI_5_4),
        row("m^-1", 1, INVERSE_LENGTH, Sources.SI_5_4),
        row("V/cm", 1e2, ELECTRIC_FIELD, Sources.SI_5_4),
        row("V/m", 1, ELECTRIC_FIELD, Sources.SI_T4),
        row("kV/cm", 1e5, ELECTRIC_FIELD, Sources.SI_5_4),
        row("MV/m", 1e6, ELECTRIC_FIELD, Sources.SI_T7),
        row("W/cm2", 1e4, IRRADIANCE, Sources.NIST_811_WCM2),
        row("W/cm^2", 1e4, IRRADIANCE, Sources.NIST_811_WCM2),
        row("W/cm²", 1e4, IRRADIANCE, Sources.NIST_811_WCM2),
        row("kW/cm2", 1e7, IRRADIANCE, Sources.NIST_811_WCM2),
        row("MW/cm2", 1e10, IRRADIANCE, Sources.NIST_811_WCM2),
        row("W/m2", 1, IRRADIANCE, Sources.SI_T4),
        row("W·m^-2", 1, IRRADIANCE, Sources.SI_T4),
        row("W*m^-2", 1, IRRADIANCE, Sources.SI_T4),
        row("J/cm2", 1e4, FLUENCE, Sources.SI_5_4),
        row("mJ/cm2", 1e1, FLUENCE, Sources.SI_5_4),
        row("W/cm", 1e2, LINEAR_POWER_DENSITY, Sources.SI_5_4),
        row("A/W", 1, RESPONSIVITY, Sources.SI_T4),
        row("W/m/s", 1, POWER.divide(LENGTH).divide(TIME), Sources.SI_T4),
        row("kg·m²·s⁻³", 1, POWER, Sources.SI_T4),
        row("kg·m/s²", 1, new Dimension(1, 1, -2, 0, 0, 0), Sources.SI_T4),
        row("Hz·s", 1, DIMENSIONLESS, Sources.SI_T4));
  }

  @ParameterizedTest(name = "{0} [{3}]")
  @MethodSource("rows")
  void parsesToSourceFactorAndDimension(String text, double factor, Dimension dim, String source) {
    UnitParse.Ok ok = assertInstanceOf(UnitParse.Ok.class, UnitParser.parse(text), source);
    assertEquals(factor, ok.unit().factor(), Math.abs(factor) * 1e-12, source);
    assertEquals(dim, ok.unit().dimension(), source);
    assertEquals(Scale.LINEAR, ok.unit().scale(), source);
    assertEquals(1.0 * factor, ok.unit().toSi(1), Math.abs(factor) * 1e-12, source);
  }
}
