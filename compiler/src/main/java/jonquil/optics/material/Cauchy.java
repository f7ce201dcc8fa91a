package jonquil.optics.material;

import java.util.Objects;
import java.util.Optional;
import org.apache.commons.math3.complex.Complex;

/**
 * Cauchy's three-term formula, the usual quick fit for coatings and polymers in the visible.
 *
 * <p>{@code n = a + b/λ² + c/λ⁴} with λ in metres, so {@code b} is in m² and {@code c} in m⁴. It
 * has no absorption and is only trustworthy away from resonances, hence the optional {@code
 * validRange}.
 */
public record Cauchy(double a, double b, double c, Optional<WavelengthRange> validRange)
    implements Dispersion {
  public Cauchy {
    Objects.requireNonNull(validRange, "validRange");
    if (!Double.isFinite(a) || !Double.isFinite(b) || !Double.isFinite(c)) {
      throw new IllegalArgumentException("Cauchy coefficients must be finite");
    }
  }

  /** Without a stated range. */
  public Cauchy(double a, double b, double c) {
    this(a, b, c, Optional.empty());
  }

  @Override
  public Complex index(double wavelength) {
    Dispersion.requireWavelength(wavelength);
    double l2 = wavelength * wavelength;
    return new Complex(a + b / l2 + c / (l2 * l2), 0);
  }
}
