package jonquil.safety;

/**
 * Why it exists: the ocular maximum permissible exposure for intrabeam (point-source, C6 = 1)
 * viewing, IEC 60825-1:2014 (Ed. 3) Annex A Table A.1, for 400 nm ≤ λ &lt; 1250 nm and 10 ps to
 * 3×10⁴ s, continuous or pulsed; everything else is reported as not evaluated.
 */
public final class OcularMpe extends MpeCalculator {
  private static final String TABLE = Ed3.MPE_EYE_TABLE + ", " + Ed3.FACTORS_TABLE;
  private static final String TRAIN_TABLE =
      TABLE + "; repetitive pulses: clause 4.3 f) / A.3, " + PulseRules.C5_NOTE;
  private static final OcularMpe IEC = new OcularMpe();

  private OcularMpe() {
    super(TABLE, TRAIN_TABLE, TableScope.Tissue.EYE, PulseRules.NAMES, TABLE, Ed3::ocularMpe);
  }

  /** Limiting aperture for the eye, 400–1400 nm, m. */
  public static final double LIMITING_APERTURE = TableScope.APERTURE_EYE;

  /**
   * The MPE for an emission and an exposure duration (s). For a pulse train the per-pulse limit is
   * the most restrictive of the single-pulse, average-power and repetitive-pulse rules (see {@link
   * PulseRules}).
   */
  public static Outcome<MaximumPermissibleExposure> at(Emission e, double exposureDuration) {
    return IEC.evaluate(e, exposureDuration);
  }

  @Override
  protected String wavelengthRefusal(double lambda) {
    return coverage(lambda);
  }

  @Override
  protected String rowsBelowShortestPulse() {
    return "the sub-10-ps rows of Table A.1 are not implemented";
  }

  @Override
  protected PulseTrain.RepetitiveRule repetitiveRule(double lambda) {
    return PulseRules.repetitive(CorrectionFactors.pulseGroupTime(lambda));
  }

  /** Why IEC's ocular rows do not cover the wavelength, or null when they do. */
  static String coverage(double lambda) {
    double n = CorrectionFactors.nm(lambda);
    if (n < 400) {
      return wavelengthRefused(
          lambda, "is below 400 nm: ultraviolet MPEs (photochemical/corneal) are not implemented");
    }
    if (n >= 1400) {
      return wavelengthRefused(
          lambda,
          "is outside the retinal hazard region 400–1400 nm: corneal/infrared MPEs"
              + " are not implemented");
    }
    if (lambda >= Ed3.LAMBDA_MAX_EYE) {
      return wavelengthRefused(
          lambda,
          "is in 1250–1400 nm, where Ed. 3 adds a corneal/lens dual limit and C7"
              + " rises steeply; not implemented");
    }
    return null;
  }
}
