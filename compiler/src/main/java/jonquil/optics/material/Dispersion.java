package jonquil.optics.material;

import java.util.Optional;
import org.apache.commons.math3.complex.Complex;

/**
 * The one question every optical model asks of a medium: its complex refractive index at a
 * wavelength.
 *
 * <p>Conventions, fixed here for every implementation:
 *
 * <ul>
 *   <li>The wavelength is in metres. Whether it is the vacuum wavelength or the wavelength in air
 *       is a property of the source paper's formula; {@link CatalogMaterial} records it and
 *       converts for consumers.
 *   <li>The index is {@code n + iκ} with {@code κ ≥ 0} for an absorbing medium, for fields written
 *       as {@code e^{i(kz − ωt)}}: a wave travelling in +z then decays as {@code e^{−2πκz/λ}}.
 *   <li>Evaluating outside {@link #validRange()} is allowed (the model extrapolates, or a table
 *       clamps); callers that care ask {@link #isValidAt(double)} and report it.
 * </ul>
 */
public interface Dispersion {
  /** Complex refractive index {@code n + iκ} at {@code wavelength} (metres). */
  Complex index(double wavelength);

  /**
   * Where the model is backed by its source; empty when it holds at every wavelength (e.g. vacuum).
   */
  Optional<WavelengthRange> validRange();

  /** True when {@code wavelength} lies inside {@link #validRange()}, or the model has no limit. */
  default boolean isValidAt(double wavelength) {
    return validRange()
        .map(r -> r.contains(wavelength))
        .orElse(wavelength > 0 && Double.isFinite(wavelength));
  }

  /** Rejects wavelengths no formula can take: zero, negative, NaN or infinite. */
  static void requireWavelength(double wavelength) {
    if (!(wavelength > 0) || !Double.isFinite(wavelength)) {
      throw new IllegalArgumentException(
          "wavelength must be a positive finite number of metres; got " + wavelength);
    }
  }
}
