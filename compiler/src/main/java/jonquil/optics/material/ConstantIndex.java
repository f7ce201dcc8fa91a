package jonquil.optics.material;

import java.util.Optional;
import org.apache.commons.math3.complex.Complex;

/**
 * A wavelength-independent index, for vacuum and for quick what-if media that need no dispersion.
 */
public record ConstantIndex(double n, double k) implements Dispersion {
  public static final ConstantIndex VACUUM = new ConstantIndex(1, 0);

  public ConstantIndex {
    if (!(n > 0) || !Double.isFinite(n) || !(k >= 0) || !Double.isFinite(k)) {
      throw new IllegalArgumentException(
          "constant index needs n > 0 and k >= 0, both finite; got " + n + ", " + k);
    }
  }

  @Override
  public Complex index(double wavelength) {
    Dispersion.requireWavelength(wavelength);
    return new Complex(n, k);
  }

  @Override
  public Optional<WavelengthRange> validRange() {
    return Optional.empty();
  }
}
