package jonquil.safety;

/**
 * A limit as both standards tabulate it over the exposure duration t, so that each standard's table
 * holds only its cited numbers: a constant radiant exposure below {@code constantUntil}, then
 * {@code coefficient} × t^{@code exponent} below {@code risingUntil}, then a constant irradiance
 * (radiant exposure {@code irradiance} × t).
 *
 * @param constantUntil end of the constant row, s
 * @param constant radiant exposure (J/m²) or energy (J) of the first row
 * @param risingUntil end of the rising row, s
 * @param coefficient factor of t^exponent in the rising row
 * @param exponent power of t in the rising row
 * @param irradiance irradiance (W/m²) or power (W) of the last row
 */
public record LimitRows(
    double constantUntil,
    double constant,
    double risingUntil,
    double coefficient,
    double exponent,
    double irradiance) {

  /** The limit over the exposure duration t, s. */
  public double at(double t) {
    if (t < constantUntil) {
      return constant;
    }
    if (t < risingUntil) {
      return coefficient * Math.pow(t, exponent);
    }
    return irradiance * t;
  }

  /**
   * The retinal photochemical rows both standards add for point sources: 400–600 nm and t ≥ 10 s
   * only, {@code constant} from 10 s to 100 s, then {@code irradiance} × t. NaN where they do not
   * apply, so {@link #lowerOf} keeps the thermal limit alone.
   */
  public static double photochemical(double lambda, double t, double constant, double irradiance) {
    if (CorrectionFactors.nm(lambda) >= 600 || t < 10) {
      return Double.NaN;
    }
    return t < 100 ? constant : irradiance * t;
  }

  /** The lower of a limit and its dual limit, which is NaN where it does not apply. */
  public static double lowerOf(double limit, double dualOrNaN) {
    return Double.isNaN(dualOrNaN) ? limit : Math.min(limit, dualOrNaN);
  }
}
