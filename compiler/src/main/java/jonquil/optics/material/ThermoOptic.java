package jonquil.optics.material;

import java.util.Optional;
import org.apache.commons.math3.complex.Complex;

/**
 * How the index of a catalog entry changes with its temperature, for the entries whose change is
 * published; a spec that gives a temperature for any other material is refused, since the index it
 * would get is unknown.
 *
 * @param minKelvin lowest temperature the published data cover
 * @param maxKelvin highest temperature the published data cover
 * @param reference where the temperature dependence comes from
 */
public record ThermoOptic(String name, double minKelvin, double maxKelvin, String reference) {
  /**
   * dn/dT of fused silica near 293 K, per kelvin: Corning 7980 measured by D. B. Leviton and B. J.
   * Frey, "Temperature-dependent absolute refractive index measurements of synthetic fused silica",
   * Proc. SPIE 6273, 62732K (2006), arXiv:0805.0091 (30-310 K, 0.4-2.6 µm); their fits give 8.74e-6
   * /K in the visible falling to 8.16e-6 /K at 1.55 µm (L. Rego, Sensors 23(13), 6023, 2023). The
   * middle, 8.45e-6 /K, is within 3.5 % of both ends, far inside the effect of a few kelvin.
   */
  public static final double FUSED_SILICA_DN_DT = 8.45e-6;

  private static final ThermoOptic FUSED_SILICA =
      new ThermoOptic(
          "fused_silica",
          250,
          310,
          "dn/dT = 8.45e-6 /K from D. B. Leviton and B. J. Frey, Proc. SPIE 6273, 62732K (2006)");

  /**
   * Dry air at any temperature is Ciddor's own equation (Applied Optics 35(9), 1566-1573, 1996),
   * which the paper states for -40 °C to +100 °C (from memory).
   */
  private static final ThermoOptic AIR =
      new ThermoOptic(
          "air", 233.15, 373.15, "P. E. Ciddor, Applied Optics 35(9), 1566-1573 (1996)");

  /** The published temperature dependence of a catalog entry, when Jonquil has one. */
  public static Optional<ThermoOptic> of(String catalogName) {
    return switch (catalogName) {
      case "fused_silica" -> Optional.of(FUSED_SILICA);
      case "air" -> Optional.of(AIR);
      default -> Optional.empty();
    };
  }

  /** The names of the entries that take a temperature, for messages. */
  public static String names() {
    return FUSED_SILICA.name + ", " + AIR.name;
  }

  public boolean covers(double kelvin) {
    return kelvin >= minKelvin && kelvin <= maxKelvin;
  }

  /** The absolute index of {@code entry} at the vacuum wavelength and this temperature. */
  public Complex index(CatalogMaterial entry, double wavelength, double kelvin) {
    if (this == AIR) {
      return CiddorAir.dryAt(kelvin).index(wavelength);
    }
    Complex atData = entry.absoluteIndex(wavelength);
    double shift = FUSED_SILICA_DN_DT * (kelvin - entry.temperatureKelvin());
    return new Complex(atData.getReal() + shift, atData.getImaginary());
  }
}
