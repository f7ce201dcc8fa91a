package jonquil.safety;

/**
 * Why it exists: the skin maximum permissible exposure, IEC 60825-1:2014 (Ed. 3) Annex A Table A.5,
 * for 400–1400 nm and 1 ns to 3×10⁴ s, averaged over the 3.5 mm limiting aperture.
 */
public final class SkinMpe extends MpeCalculator {
  private static final String TABLE = Ed3.MPE_SKIN_TABLE + ", " + Ed3.FACTORS_TABLE;
  private static final SkinMpe IEC = new SkinMpe();

  /** No repetitive-pulse rule: C5 is a retinal-thermal rule (Ed. 3, from memory). */
  private SkinMpe() {
    super(TABLE, TABLE, TableScope.Tissue.SKIN, PulseRules.NAMES, TABLE, Ed3::skinMpe);
  }

  /**
   * The skin MPE. Pulse trains: the more restrictive of the single-pulse and average-power rules
   * (the repetitive-pulse C5 rule is a retinal-thermal rule and is not applied to the skin; Ed. 3,
   * from memory).
   */
  public static Outcome<MaximumPermissibleExposure> at(Emission e, double exposureDuration) {
    return IEC.evaluate(e, exposureDuration);
  }

  @Override
  protected String wavelengthRefusal(double lambda) {
    double n = CorrectionFactors.nm(lambda);
    if (n < 400 || n >= 1400) {
      return wavelengthRefused(
          lambda, "is outside 400–1400 nm: skin MPEs for other wavelengths are not implemented");
    }
    return null;
  }

  @Override
  protected String durationRefusal(double t) {
    if (!(t > 0) || t > TableScope.T_MAX) {
      return "exposure duration must be in (0, 3e4] s";
    }
    return t < TableScope.T_MIN_SKIN ? "exposure below 1 ns: not implemented" : null;
  }

  @Override
  protected String rowsBelowShortestPulse() {
    return "not implemented";
  }
}
