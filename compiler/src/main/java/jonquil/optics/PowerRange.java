package jonquil.optics;

/**
 * The power leaving a port where beams of one line meet, over every relative phase they may have:
 * {@code min} and {@code max} in watts, with {@code incoherent} the sum of their powers (what they
 * give when they do not interfere). {@code exact} when min and max are reached by some phase (two
 * beams); otherwise they enclose every phase and may be wider than the truth.
 */
public record PowerRange(double min, double max, double incoherent, boolean exact) {
  public PowerRange {
    if (!(min >= 0 && min <= max && Double.isFinite(max))) {
      throw new IllegalArgumentException(
          "power range must be 0 <= min <= max: " + min + ", " + max);
    }
  }

  /** One value, known exactly (no interference, or a fixed phase). */
  public static PowerRange of(double power) {
    return new PowerRange(power, power, power, true);
  }

  /** (max − min)/(max + min), the contrast of the fringes the phase sweeps out; 0 with no light. */
  public double visibility() {
    return max + min > 0 ? (max - min) / (max + min) : 0;
  }

  /** Whether the phase changes the power at all. */
  public boolean varies() {
    return max > min;
  }
}
