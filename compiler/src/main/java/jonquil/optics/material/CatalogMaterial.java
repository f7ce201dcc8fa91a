package jonquil.optics.material;

import java.util.Objects;
import java.util.Optional;
import org.apache.commons.math3.complex.Complex;

/**
 * One named material of the built-in catalog with its source, so consumers get both the index and
 * its provenance.
 *
 * <p>{@link #dispersion()} evaluates the published formula exactly as printed: for a {@link
 * IndexBasis#RELATIVE_TO_AIR} entry that is the index relative to air as a function of the
 * wavelength in air. Consumers that work in vacuum wavelengths (everything downstream) call {@link
 * #absoluteIndex(double)}, which converts: with {@code n_air} the index of dry air at 101 325 Pa
 * and the entry's own temperature (Ciddor 1996, see {@link CiddorAir#dryAt}), the formula is
 * evaluated at the air wavelength {@code λ_vac / n_air} and the result is multiplied by {@code
 * n_air}. That is the air the paper measured in, never the bench's ambient (a spec's {@code
 * ambient} line changes what light crosses between elements, not a glass's published index). {@link
 * IndexBasis#ABSOLUTE} entries are returned unchanged. Outside Ciddor's 230–1690 nm the air index
 * is extrapolated with the same equations; air dispersion is weak there, and the error is far below
 * that of the crystal data.
 *
 * <p>For birefringent crystals {@link #dispersion()} is the ordinary index and {@link #uniaxial()}
 * holds both.
 *
 * @param temperatureKelvin the temperature at which the source's data hold (nominal 293.15 K where
 *     the source says only "room temperature", and for vacuum, whose index does not depend on it)
 * @param valid where the source backs the data; every catalog entry has one
 */
public record CatalogMaterial(
    String name,
    Dispersion dispersion,
    Reference reference,
    IndexBasis basis,
    double temperatureKelvin,
    Optional<WavelengthRange> valid,
    Optional<Uniaxial> uniaxial) {

  public CatalogMaterial {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(dispersion, "dispersion");
    Objects.requireNonNull(reference, "reference");
    Objects.requireNonNull(basis, "basis");
    Objects.requireNonNull(valid, "valid");
    Objects.requireNonNull(uniaxial, "uniaxial");
    if (!(temperatureKelvin > 0) || !Double.isFinite(temperatureKelvin)) {
      throw new IllegalArgumentException(
          name + ": temperature must be a positive number of kelvin");
    }
    if (uniaxial.isPresent() && uniaxial.get().ordinary() != dispersion) {
      throw new IllegalArgumentException(
          name + ": dispersion() must be the ordinary index of the uniaxial pair");
    }
  }

  /** An isotropic entry. */
  public CatalogMaterial(
      String name,
      Dispersion dispersion,
      Reference reference,
      IndexBasis basis,
      double temperatureKelvin,
      Optional<WavelengthRange> valid) {
    this(name, dispersion, reference, basis, temperatureKelvin, valid, Optional.empty());
  }

  /** True for uniaxial crystals. */
  public boolean isBirefringent() {
    return uniaxial.isPresent();
  }

  /** True when the vacuum {@code wavelength} (metres) lies inside {@link #valid()}. */
  public boolean isValidAt(double wavelength) {
    return valid.map(r -> r.contains(wavelength)).orElse(true);
  }

  /**
   * The absolute index at the vacuum {@code wavelength} (metres); the ordinary index for a uniaxial
   * crystal.
   */
  public Complex absoluteIndex(double wavelength) {
    return absolute(dispersion, wavelength);
  }

  /** The absolute extraordinary index at the vacuum {@code wavelength}, for uniaxial crystals. */
  public Optional<Complex> absoluteExtraordinaryIndex(double wavelength) {
    return uniaxial.map(u -> absolute(u.extraordinary(), wavelength));
  }

  private Complex absolute(Dispersion d, double wavelength) {
    Dispersion.requireWavelength(wavelength);
    if (basis == IndexBasis.ABSOLUTE) {
      return d.index(wavelength);
    }
    double nAir = CiddorAir.dryAt(temperatureKelvin).index(wavelength).getReal();
    return d.index(wavelength / nAir).multiply(nAir);
  }
}
