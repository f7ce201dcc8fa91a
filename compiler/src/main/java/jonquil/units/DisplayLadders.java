package jonquil.units;

import static jonquil.units.SiPrefix.*;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Which units the trade reads each dimension in, largest first: the format picks the first rung the
 * value reaches. Irradiance and fluence use per-cm² as laser work does.
 */
final class DisplayLadders {
  private static final double CM2 = 1e-4;

  private DisplayLadders() {}

  static final List<DisplayUnit> LENGTH =
      List.of(
          DisplayUnit.prefixed(KILO, "m", 1),
          DisplayUnit.of("m", 1),
          DisplayUnit.prefixed(MILLI, "m", 1),
          // Wavelengths are read in nm up to 10 µm: "1064 nm", not "1.064 µm".
          DisplayUnit.prefixed(MICRO, "m", 1).from(10e-6),
          DisplayUnit.prefixed(NANO, "m", 1),
          DisplayUnit.prefixed(PICO, "m", 1),
          DisplayUnit.prefixed(FEMTO, "m", 1));

  static final List<DisplayUnit> AREA =
      List.of(
          DisplayUnit.of("m²", 1),
          DisplayUnit.of("cm²", 1e-4),
          DisplayUnit.of("mm²", 1e-6),
          // Down to 0.001 µm², the range of second Cauchy coefficients.
          DisplayUnit.of("µm²", 1e-12).from(1e-15),
          DisplayUnit.of("nm²", 1e-18));

  static final List<DisplayUnit> LENGTH4 = List.of(DisplayUnit.of("µm⁴", 1e-24));

  static final List<DisplayUnit> INVERSE_LENGTH = List.of(DisplayUnit.of("/cm", 1e2));

  static final List<DisplayUnit> POWER =
      ladder("W", 1, PETA, TERA, GIGA, MEGA, KILO, null, MILLI, MICRO, NANO, PICO, FEMTO);
  static final List<DisplayUnit> ENERGY =
      ladder("J", 1, MEGA, KILO, null, MILLI, MICRO, NANO, PICO, FEMTO);
  static final List<DisplayUnit> TIME = ladder("s", 1, null, MILLI, MICRO, NANO, PICO, FEMTO, ATTO);
  static final List<DisplayUnit> FREQUENCY =
      ladder("Hz", 1, PETA, TERA, GIGA, MEGA, KILO, null, MILLI);
  static final List<DisplayUnit> IRRADIANCE =
      ladder("W/cm²", 1 / CM2, TERA, GIGA, MEGA, KILO, null, MILLI, MICRO, NANO);
  static final List<DisplayUnit> FLUENCE = ladder("J/cm²", 1 / CM2, KILO, null, MILLI, MICRO, NANO);
  static final List<DisplayUnit> LINEAR_POWER_DENSITY = ladder("W/cm", 1e2, KILO, null, MILLI);
  static final List<DisplayUnit> ELECTRIC_FIELD = ladder("V/m", 1, GIGA, MEGA, KILO, null, MILLI);
  static final List<DisplayUnit> VOLTAGE = ladder("V", 1, MEGA, KILO, null, MILLI, MICRO);
  static final List<DisplayUnit> CURRENT = ladder("A", 1, KILO, null, MILLI, MICRO, NANO, PICO);
  static final List<DisplayUnit> RESPONSIVITY = ladder("A/W", 1, null, MILLI, MICRO);
  static final List<DisplayUnit> MASS =
      List.of(
          DisplayUnit.of("kg", 1),
          DisplayUnit.of("g", 1e-3),
          DisplayUnit.prefixed(MILLI, "g", 1e-3),
          DisplayUnit.prefixed(MICRO, "g", 1e-3),
          DisplayUnit.prefixed(NANO, "g", 1e-3));
  static final List<DisplayUnit> TEMPERATURE = List.of(DisplayUnit.of("K", 1));
  // Angles print in degrees whatever their size; radian forms go to the alternatives.
  static final DisplayUnit DEGREE = new DisplayUnit("°", Math.PI / 180, 0, 0, false);
  static final List<DisplayUnit> ANGLE = List.of(DEGREE);
  static final List<DisplayUnit> DIMENSIONLESS = List.of(DisplayUnit.of("", 1));

  static final Map<Dimension, List<DisplayUnit>> BY_DIMENSION =
      Map.ofEntries(
          Map.entry(Dimension.LENGTH, LENGTH),
          Map.entry(Dimension.AREA, AREA),
          Map.entry(Dimension.LENGTH4, LENGTH4),
          Map.entry(Dimension.INVERSE_LENGTH, INVERSE_LENGTH),
          Map.entry(Dimension.POWER, POWER),
          Map.entry(Dimension.ENERGY, ENERGY),
          Map.entry(Dimension.TIME, TIME),
          Map.entry(Dimension.FREQUENCY, FREQUENCY),
          Map.entry(Dimension.IRRADIANCE, IRRADIANCE),
          Map.entry(Dimension.FLUENCE, FLUENCE),
          Map.entry(Dimension.LINEAR_POWER_DENSITY, LINEAR_POWER_DENSITY),
          Map.entry(Dimension.ELECTRIC_FIELD, ELECTRIC_FIELD),
          Map.entry(Dimension.VOLTAGE, VOLTAGE),
          Map.entry(Dimension.CURRENT, CURRENT),
          Map.entry(Dimension.RESPONSIVITY, RESPONSIVITY),
          Map.entry(Dimension.MASS, MASS),
          Map.entry(Dimension.TEMPERATURE, TEMPERATURE),
          Map.entry(Dimension.ANGLE, ANGLE),
          Map.entry(Dimension.DIMENSIONLESS, DIMENSIONLESS));

  /** Coherent SI units of ladders that have no factor-1 rung, written as the trade writes them. */
  static final Map<Dimension, DisplayUnit> COHERENT_NAMES =
      Map.of(
          Dimension.IRRADIANCE,
          DisplayUnit.of("W/m²", 1),
          Dimension.FLUENCE,
          DisplayUnit.of("J/m²", 1),
          Dimension.LINEAR_POWER_DENSITY,
          DisplayUnit.of("W/m", 1),
          Dimension.INVERSE_LENGTH,
          DisplayUnit.of("/m", 1),
          Dimension.LENGTH4,
          DisplayUnit.of("m⁴", 1),
          Dimension.ANGLE,
          DisplayUnit.of("rad", 1));

  /** Prefixed forms of one symbol; {@code null} stands for the unprefixed symbol. */
  private static List<DisplayUnit> ladder(String symbol, double factor, SiPrefix... prefixes) {
    List<DisplayUnit> out = new ArrayList<>();
    for (SiPrefix p : prefixes) {
      out.add(p == null ? DisplayUnit.of(symbol, factor) : DisplayUnit.prefixed(p, symbol, factor));
    }
    return List.copyOf(out);
  }

  /**
   * The coherent SI unit of any dimension, in a form the spec language can read back: positive
   * powers joined by "·", each negative one after its own "/" ("kg·m²/s³").
   */
  static DisplayUnit coherent(Dimension dim) {
    StringBuilder num = new StringBuilder();
    StringBuilder den = new StringBuilder();
    int[] exps = dim.exponents();
    for (int i = 0; i < exps.length; i++) {
      int e = exps[i];
      if (e == 0) {
        continue;
      }
      String factor =
          Dimension.BASE_SYMBOLS[i] + (Math.abs(e) == 1 ? "" : Superscripts.of(Math.abs(e)));
      if (e > 0) {
        num.append(num.length() > 0 ? "·" : "").append(factor);
      } else {
        den.append('/').append(factor);
      }
    }
    return DisplayUnit.of(num.toString() + den, 1);
  }
}
