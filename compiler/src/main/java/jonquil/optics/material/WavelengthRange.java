package jonquil.optics.material;

/**
 * The closed wavelength interval over which a dispersion model is backed by its source, so that a
 * consumer can tell interpolation from extrapolation.
 *
 * <p>Both ends are in metres. {@code max} may be {@link Double#POSITIVE_INFINITY} for models
 * without an upper limit; {@code min} may be 0 for models without a lower one.
 */
public record WavelengthRange(double min, double max) {
  /** Every wavelength: for media such as vacuum whose index does not depend on it. */
  public static final WavelengthRange ALL = new WavelengthRange(0, Double.POSITIVE_INFINITY);

  public WavelengthRange {
    if (!(min >= 0) || Double.isInfinite(min) || Double.isNaN(max) || !(max > min)) {
      throw new IllegalArgumentException(
          "wavelength range needs 0 <= min < max; got " + min + " to " + max);
    }
  }

  /** A range given in micrometres, the unit dispersion papers use. */
  public static WavelengthRange ofMicrometres(double minMicrometres, double maxMicrometres) {
    return new WavelengthRange(minMicrometres * 1e-6, maxMicrometres * 1e-6);
  }

  /** True when {@code wavelength} (metres) is positive, finite and inside the closed interval. */
  public boolean contains(double wavelength) {
    return wavelength > 0 && Double.isFinite(wavelength) && wavelength >= min && wavelength <= max;
  }

  /** The overlap of two ranges; throws when they do not overlap. */
  public WavelengthRange intersect(WavelengthRange other) {
    double lo = Math.max(min, other.min);
    double hi = Math.min(max, other.max);
    if (!(hi > lo)) {
      throw new IllegalArgumentException("ranges " + this + " and " + other + " do not overlap");
    }
    return new WavelengthRange(lo, hi);
  }
}
