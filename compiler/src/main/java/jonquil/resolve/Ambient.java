package jonquil.resolve;

import java.util.Optional;
import jonquil.source.TextRange;

/**
 * The medium light crosses between elements and that every surface sees on its air side: air of
 * stated conditions (Ciddor 1996's variables) or vacuum. A spec without an {@code ambient} line
 * gets {@link #DEFAULT}.
 *
 * @param fill air or vacuum
 * @param temperatureKelvin air temperature (ignored for vacuum, which has none)
 * @param pressurePascal total air pressure
 * @param relativeHumidity a fraction from 0 to 1
 * @param co2Fraction CO₂ mole fraction (450 ppm is 450e-6)
 * @param declared where the spec states it; empty for the default
 */
public record Ambient(
    Fill fill,
    double temperatureKelvin,
    double pressurePascal,
    double relativeHumidity,
    double co2Fraction,
    Optional<TextRange> declared) {

  /** What fills the bench. */
  public enum Fill {
    AIR,
    VACUUM
  }

  /** Default laboratory air: 20 °C, 101.325 kPa, dry (0 % RH), 450 ppm CO₂. */
  public static final Ambient DEFAULT =
      new Ambient(Fill.AIR, 293.15, 101_325, 0, 450e-6, Optional.empty());

  /** Vacuum, as declared at {@code at}. */
  public static Ambient vacuum(TextRange at) {
    return new Ambient(Fill.VACUUM, 0, 0, 0, 0, Optional.of(at));
  }

  /** One line for hovers and findings: "air at 20 °C, 101.325 kPa, 0 % RH, 450 ppm CO₂". */
  public String describe() {
    return switch (fill) {
      case VACUUM -> "vacuum (index 1)";
      case AIR ->
          "air at "
              + plain(temperatureKelvin - 273.15)
              + " °C, "
              + plain(pressurePascal / 1000)
              + " kPa, "
              + plain(relativeHumidity * 100)
              + " % RH, "
              + plain(co2Fraction * 1e6)
              + " ppm CO₂ (Ciddor 1996)";
    };
  }

  private static String plain(double v) {
    return new java.math.BigDecimal(v)
        .round(new java.math.MathContext(6))
        .stripTrailingZeros()
        .toPlainString();
  }
}
