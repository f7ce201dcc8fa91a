package jonquil.optics.beam;

import java.util.Optional;
import java.util.OptionalDouble;
import org.apache.commons.math3.complex.Complex;

/**
 * A real laser beam of quality M² at one plane of a train, propagated as Siegman's embedded
 * Gaussian so that the whole train can be followed with ABCD matrices.
 *
 * <p>{@code waistRadius} is the 1/e² intensity radius W0 of the real beam at its waist; {@code
 * waistPosition} is the distance from the current plane to that waist, positive when the waist lies
 * ahead (a converging beam). The waist radius is the same in every medium; only the Rayleigh range
 * and divergence depend on the index. See the package documentation for the q convention.
 */
public record GaussianBeam(
    double wavelength, double m2, double waistRadius, double waistPosition, double index) {

  public GaussianBeam {
    if (!(wavelength > 0) || !Double.isFinite(wavelength)) {
      throw new IllegalArgumentException("wavelength must be positive and finite: " + wavelength);
    }
    // ISO 11146-1 defines M² ≥ 1, with 1 only for the ideal TEM00 beam.
    if (!(m2 >= 1) || !Double.isFinite(m2)) {
      throw new IllegalArgumentException("M² must be at least 1 and finite: " + m2);
    }
    if (!(waistRadius > 0) || !Double.isFinite(waistRadius)) {
      throw new IllegalArgumentException(
          "waist radius must be positive and finite: " + waistRadius);
    }
    if (!Double.isFinite(waistPosition)) {
      throw new IllegalArgumentException("waist position must be finite: " + waistPosition);
    }
    Abcd.requireIndex(index);
  }

  /**
   * A beam whose waist of radius {@code waistRadius} lies {@code waistAhead} metres ahead
   * (negative: behind).
   */
  public static GaussianBeam fromWaist(
      double wavelength, double m2, double waistRadius, double waistAhead, double index) {
    return new GaussianBeam(wavelength, m2, waistRadius, waistAhead, index);
  }

  /**
   * A beam given by its far-field half angle in the medium, as data sheets often state it: W0 = M²
   * λ/(π n θ).
   */
  public static GaussianBeam fromDivergence(
      double wavelength, double m2, double halfAngleFarField, double waistAhead, double index) {
    if (!(halfAngleFarField > 0) || !Double.isFinite(halfAngleFarField)) {
      throw new IllegalArgumentException(
          "divergence must be positive and finite: " + halfAngleFarField);
    }
    Abcd.requireIndex(index);
    return new GaussianBeam(
        wavelength, m2, m2 * wavelength / (Math.PI * index * halfAngleFarField), waistAhead, index);
  }

  /**
   * The beam whose embedded Gaussian has complex parameter {@code q} (Im q &gt; 0) in a medium of
   * index {@code index}.
   */
  public static GaussianBeam fromQ(Complex q, double wavelength, double m2, double index) {
    double zr = q.getImaginary();
    if (!(zr > 0) || !Double.isFinite(zr) || !Double.isFinite(q.getReal())) {
      throw new IllegalArgumentException("q must have a positive, finite imaginary part: " + q);
    }
    Abcd.requireIndex(index);
    double w0 = Math.sqrt(m2 * wavelength * zr / (Math.PI * index));
    return new GaussianBeam(wavelength, m2, w0, -q.getReal(), index);
  }

  /** z_R = π n W0²/(M² λ): the distance over which the beam area doubles. */
  public double rayleighRange() {
    return Math.PI * index * waistRadius * waistRadius / (m2 * wavelength);
  }

  /** The 1/e² radius of the real beam at the current plane. */
  public double radius() {
    return radiusAt(0);
  }

  /** The 1/e² radius {@code dz} metres further along the beam, in the current medium. */
  public double radiusAt(double dz) {
    // hypot keeps the far field free of overflow in (z/z_R)².
    return waistRadius * Math.hypot(1, (dz - waistPosition) / rayleighRange());
  }

  /**
   * The wavefront radius of curvature at the current plane: positive diverging, negative
   * converging, +∞ exactly at the waist.
   */
  public double curvatureRadius() {
    double z = -waistPosition;
    if (z == 0) {
      return Double.POSITIVE_INFINITY;
    }
    double zr = rayleighRange();
    return z + zr * zr / z;
  }

  /** The far-field half angle θ = M² λ/(π n W0) in the current medium. */
  public double divergence() {
    return m2 * wavelength / (Math.PI * index * waistRadius);
  }

  /** W0 θ = M² λ/(π n): invariant under lenses and free space, so a train cannot improve it. */
  public double beamParameterProduct() {
    return waistRadius * divergence();
  }

  /** The embedded Gaussian's q = z + i z_R at the current plane (z = distance past the waist). */
  public Complex q() {
    return new Complex(-waistPosition, rayleighRange());
  }

  /**
   * The same beam {@code distance} metres further on, in the current medium (negative goes back).
   */
  public GaussianBeam propagate(double distance) {
    return new GaussianBeam(wavelength, m2, waistRadius, waistPosition - distance, index);
  }

  /** The beam just after a thin lens of focal length {@code focalLength} at the current plane. */
  public GaussianBeam throughThinLens(double focalLength) {
    return apply(Abcd.thinLens(focalLength), index);
  }

  /**
   * The beam just after a flat interface at normal incidence into index {@code newIndex}. q scales
   * by n2/n1 (Siegman 1986, ch. 20): the waist keeps its size and its apparent distance scales with
   * the index.
   */
  public GaussianBeam intoMedium(double newIndex) {
    Abcd.requireIndex(newIndex);
    return new GaussianBeam(
        wavelength, m2, waistRadius, waistPosition * newIndex / index, newIndex);
  }

  /**
   * The beam after a general paraxial element. The output index follows from the determinant, n_out
   * = n_in / (AD − BC), which is exact for the matrices of {@link Abcd}.
   */
  public GaussianBeam apply(Abcd m) {
    double det = m.determinant();
    if (!(det > 0)) {
      throw new IllegalArgumentException(
          "ABCD determinant must be positive (it is n_in/n_out): " + det);
    }
    return apply(m, index / det);
  }

  /**
   * The beam after a general paraxial element that ends in a medium of index {@code newIndex}; the
   * determinant must agree with n_in/n_out to 1e-9, since otherwise the element is not a passive
   * paraxial system in the stated media.
   */
  public GaussianBeam apply(Abcd m, double newIndex) {
    Abcd.requireIndex(newIndex);
    double expected = index / newIndex;
    if (Math.abs(m.determinant() - expected) > 1e-9 * expected) {
      throw new IllegalArgumentException(
          "ABCD determinant " + m.determinant() + " does not match n_in/n_out = " + expected);
    }
    return fromQ(m.transform(q()), wavelength, m2, newIndex);
  }

  /**
   * Distance to the waist when it lies at or ahead of the current plane; empty for a diverging
   * beam.
   */
  public OptionalDouble waistAhead() {
    return waistPosition >= 0 ? OptionalDouble.of(waistPosition) : OptionalDouble.empty();
  }

  /** The next waist at or ahead of the current plane, if any, with its size and Rayleigh range. */
  public Optional<Focus> nextFocus() {
    return waistPosition >= 0
        ? Optional.of(new Focus(waistPosition, waistRadius, rayleighRange(), index))
        : Optional.empty();
  }
}
