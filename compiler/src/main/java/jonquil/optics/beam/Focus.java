package jonquil.optics.beam;

import java.util.Optional;

/**
 * A waist ahead of some plane, so an analysis can report "a focus of W0 = 5 µm lies 2.8 mm after
 * the lens" without redoing the beam algebra.
 *
 * @param distance distance from the plane to the waist along the beam, m (≥ 0)
 * @param radius 1/e² radius of the real beam at the waist, m
 * @param rayleighRange z_R of the real beam at the waist, in the medium there, m
 * @param index refractive index of the medium holding the waist
 */
public record Focus(double distance, double radius, double rayleighRange, double index) {

  /**
   * The waist formed by a thin lens of focal length {@code focalLength} placed at the beam's
   * current plane.
   */
  public static Optional<Focus> afterThinLens(GaussianBeam beam, double focalLength) {
    return beam.throughThinLens(focalLength).nextFocus();
  }

  /** Depth of focus as the full length 2 z_R over which the radius stays within √2 of the waist. */
  public double depthOfFocus() {
    return 2 * rayleighRange;
  }
}
