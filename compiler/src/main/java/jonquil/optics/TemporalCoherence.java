package jonquil.optics;

import java.util.OptionalDouble;

/**
 * How well a laser line interferes with itself after a path difference ΔL: the modulus of its
 * complex degree of coherence |γ(ΔL)|, for a Lorentzian line (the lineshape of a single
 * homogeneously broadened or phase-diffusing mode). Its normalized autocorrelation is γ(τ) =
 * exp(−πΔν|τ|)·e^{−i2πν̄τ}, so |γ| = exp(−|ΔL|/Lc) with the coherence length Lc = c·τc = c/(πΔν),
 * τc = ∫|γ(τ)|²dτ being Mandel's coherence time (Goodman, Statistical Optics, 1985, §5.2). A line
 * stated by its coherence length uses the same exponential with that Lc. A line that states neither
 * has an unknown |γ| in [0, 1] except at zero path difference, where |γ| = 1 by definition.
 */
public record TemporalCoherence(OptionalDouble coherenceLength) {
  /** c, in m/s (SI definition of the metre). */
  public static final double SPEED_OF_LIGHT = 299_792_458.0;

  /**
   * Path differences below this are rounding in the sum of a path's distances, not a delay: a
   * picometre is far below any coherence length and any stated distance.
   */
  public static final double ZERO_PATH = 1e-12;

  /** A line that states neither a linewidth nor a coherence length. */
  public static final TemporalCoherence UNSTATED = new TemporalCoherence(OptionalDouble.empty());

  public TemporalCoherence {
    // An infinite length (a linewidth too narrow for a double) is a line that never decoheres.
    if (coherenceLength.isPresent() && !(coherenceLength.getAsDouble() > 0)) {
      throw new IllegalArgumentException("coherence length must be positive: " + coherenceLength);
    }
  }

  /** A line stated by its coherence length Lc, in metres. */
  public static TemporalCoherence ofLength(double length) {
    return new TemporalCoherence(OptionalDouble.of(length));
  }

  /** A Lorentzian line of full width at half maximum Δν (Hz): Lc = c/(πΔν). */
  public static TemporalCoherence lorentzian(double linewidth) {
    if (!(linewidth > 0) || Double.isInfinite(linewidth)) {
      throw new IllegalArgumentException("linewidth must be positive and finite: " + linewidth);
    }
    return ofLength(SPEED_OF_LIGHT / (Math.PI * linewidth));
  }

  /** |γ(ΔL)|; empty when the line states no coherence and the path difference is not zero. */
  public OptionalDouble factor(double pathDifference) {
    double d = Math.abs(pathDifference);
    if (d <= ZERO_PATH) {
      return OptionalDouble.of(1);
    }
    if (coherenceLength.isEmpty()) {
      return OptionalDouble.empty();
    }
    return OptionalDouble.of(Math.exp(-d / coherenceLength.getAsDouble()));
  }

  /** The largest |γ(ΔL)| can be: the factor when known, else 1 (the widest power range). */
  public double factorAtMost(double pathDifference) {
    return factor(pathDifference).orElse(1);
  }
}
