package jonquil.safety;

/**
 * Why it exists: one maximum permissible exposure (MPE), stated both as radiant exposure and as
 * irradiance, with the aperture it is averaged over and the criterion that limited it.
 *
 * @param radiantExposure MPE as radiant exposure, J/m²: per pulse for pulsed emission, over the
 *     whole exposure duration for continuous wave
 * @param irradiance MPE as irradiance, W/m²: for cw and pulse trains the time-averaged irradiance
 *     over the exposure duration (per-pulse limit × repetition rate); for a single pulse the
 *     radiant exposure divided by the pulse duration
 * @param exposureDuration exposure duration the MPE applies to, s
 * @param apertureDiameter limiting aperture the exposure is averaged over, m
 * @param singlePulse per-pulse limit from the single-pulse rule, J/m² (NaN for cw)
 * @param averagePower per-pulse limit from the average-power rule, J/m² (NaN for cw or a single
 *     pulse)
 * @param repetitivePulse per-pulse limit from the repetitive-pulse (C5 / T_i) rule, J/m² (NaN where
 *     not applied)
 * @param limitingCriterion which criterion gave the value
 * @param table standard, edition and table it came from
 * @param governingLimit the biological effect whose limit governs, and the more lenient one that
 *     also applied (e.g. "retinal photochemical (stricter than retinal thermal)"); empty where the
 *     standard's calculator does not say
 */
public record MaximumPermissibleExposure(
    double radiantExposure,
    double irradiance,
    double exposureDuration,
    double apertureDiameter,
    double singlePulse,
    double averagePower,
    double repetitivePulse,
    String limitingCriterion,
    String table,
    String governingLimit) {

  /** The same MPE averaged over another aperture and with its governing effect named. */
  public MaximumPermissibleExposure with(double aperture, String governing) {
    return copy(aperture, table, governing);
  }

  /**
   * The same MPE over another aperture, cited from {@code cited}: another standard's restatement.
   */
  public MaximumPermissibleExposure restated(double aperture, String cited) {
    return copy(aperture, cited, governingLimit);
  }

  private MaximumPermissibleExposure copy(double aperture, String cited, String governing) {
    return new MaximumPermissibleExposure(
        radiantExposure,
        irradiance,
        exposureDuration,
        aperture,
        singlePulse,
        averagePower,
        repetitivePulse,
        limitingCriterion,
        cited,
        governing);
  }

  /** The caution that goes with every MPE. */
  public String caution() {
    return Outcome.CAUTION;
  }
}
