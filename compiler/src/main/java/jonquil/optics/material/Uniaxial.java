package jonquil.optics.material;

import java.util.Objects;
import java.util.Optional;

/**
 * The two principal indices of a uniaxial crystal, which wave plates, polarizers and walk-off all
 * need.
 *
 * <p>The ordinary index applies to light polarized perpendicular to the optic axis, the
 * extraordinary index to light polarized along it. The sign convention of {@link #birefringence} is
 * {@code Δn = nₑ − nₒ}: positive for quartz and magnesium fluoride, negative for calcite and
 * sapphire.
 */
public record Uniaxial(Dispersion ordinary, Dispersion extraordinary) {
  public Uniaxial {
    Objects.requireNonNull(ordinary, "ordinary");
    Objects.requireNonNull(extraordinary, "extraordinary");
  }

  /** {@code nₑ − nₒ} (real parts) at {@code wavelength} (metres). */
  public double birefringence(double wavelength) {
    return extraordinary.index(wavelength).getReal() - ordinary.index(wavelength).getReal();
  }

  /**
   * The index of the extraordinary wave whose wave vector makes {@code angle} (radians) with the
   * optic axis: {@code 1/n(θ)² = cos²θ/nₒ² + sin²θ/nₑ²} (real parts; for transparent crystals).
   */
  public double extraordinaryIndexAt(double wavelength, double angle) {
    double no = ordinary.index(wavelength).getReal();
    double ne = extraordinary.index(wavelength).getReal();
    double c = Math.cos(angle);
    double s = Math.sin(angle);
    return 1 / Math.sqrt(c * c / (no * no) + s * s / (ne * ne));
  }

  /** Where both indices are backed by their source: the overlap of the two ranges. */
  public Optional<WavelengthRange> validRange() {
    Optional<WavelengthRange> o = ordinary.validRange();
    Optional<WavelengthRange> e = extraordinary.validRange();
    if (o.isEmpty()) {
      return e;
    }
    if (e.isEmpty()) {
      return o;
    }
    return Optional.of(o.get().intersect(e.get()));
  }
}
