package jonquil.optics.material;

import java.util.Objects;
import java.util.Optional;
import org.apache.commons.math3.complex.Complex;

/**
 * Adds a weak bulk absorption to a transparent dispersion model, because glass and crystal data
 * sheets quote absorption as a coefficient α rather than as κ.
 *
 * <p>{@code α} is the intensity absorption coefficient in 1/m, so the internal transmittance of a
 * thickness {@code d} is {@code exp(−α d)}. It enters the index as {@code κ = α λ / (4π)}, which
 * reproduces that decay for fields {@code e^{i(kz − ωt)}}. α is taken as constant over the
 * wavelengths where it is used.
 */
public record BulkAbsorption(Dispersion base, double alpha) implements Dispersion {
  public BulkAbsorption {
    Objects.requireNonNull(base, "base");
    if (!(alpha >= 0) || !Double.isFinite(alpha)) {
      throw new IllegalArgumentException(
          "absorption coefficient must be finite and >= 0 (1/m); got " + alpha);
    }
  }

  @Override
  public Complex index(double wavelength) {
    Complex b = base.index(wavelength);
    return new Complex(b.getReal(), b.getImaginary() + alpha * wavelength / (4 * Math.PI));
  }

  @Override
  public Optional<WavelengthRange> validRange() {
    return base.validRange();
  }

  /**
   * Internal transmittance {@code exp(−α d)} of the added absorption over {@code thickness} metres
   * (surfaces excluded).
   */
  public double internalTransmittance(double thickness) {
    if (!(thickness >= 0) || !Double.isFinite(thickness)) {
      throw new IllegalArgumentException("thickness must be finite and >= 0 (m); got " + thickness);
    }
    return Math.exp(-alpha * thickness);
  }
}
