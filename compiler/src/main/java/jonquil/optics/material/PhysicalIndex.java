package jonquil.optics.material;

import java.util.Optional;
import org.apache.commons.math3.complex.Complex;

/**
 * What a refractive index must be for the optics to mean anything: finite, n within [1e-3, 1e3] and
 * κ within [0, 1e3]. A chosen bound: every real material lies far inside (metals reach n ≈ 0.03 in
 * the visible and κ ≈ 100 in the infrared), and beyond it squares and ratios of indices overflow or
 * lose every digit.
 */
public final class PhysicalIndex {
  public static final double MIN_N = 1e-3;
  public static final double MAX_N = 1e3;
  public static final double MAX_K = 1e3;

  private PhysicalIndex() {}

  /** Why {@code index} is not a physical index, or empty when it is one. */
  public static Optional<String> problem(Complex index) {
    double n = index.getReal();
    double k = index.getImaginary();
    if (!Double.isFinite(n) || !Double.isFinite(k)) {
      return Optional.of("n = " + n + ", κ = " + k + " is not a finite number");
    }
    if (!(n >= MIN_N && n <= MAX_N)) {
      return Optional.of("n = " + n + " is outside " + MIN_N + " to " + MAX_N);
    }
    if (!(k >= 0 && k <= MAX_K)) {
      return Optional.of("κ = " + k + " is outside 0 to " + MAX_K);
    }
    return Optional.empty();
  }
}
