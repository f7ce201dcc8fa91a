package jonquil.safety;

/**
 * Why it exists: the skin maximum permissible exposure, IEC 60825-1:2014 (Ed. 3) Annex A Table A.5,
 * from 180 nm to 1 mm and 100 fs to 3×10⁴ s, averaged over the limiting aperture of Table A.3 (3.5
 * mm; 11 mm above 100 µm). In the ultraviolet the photochemical dose and the thermal limit both
 * apply and the stricter governs ({@link MaximumPermissibleExposure#governingLimit()}).
 */
public final class SkinMpe extends MpeCalculator {
  private static final String TABLE = Ed3.MPE_SKIN_TABLE + ", " + Ed3.FACTORS_TABLE;
  private static final SkinMpe IEC = new SkinMpe();

  /** No repetitive-pulse rule: C5 is a retinal-thermal rule (Ed. 3, from memory). */
  private SkinMpe() {
    super(TABLE, TABLE, TableScope.Tissue.IEC_SKIN, PulseRules.NAMES, TABLE, Ed3::skinMpe);
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
    if (lambda < TableScope.LAMBDA_MIN_IEC || lambda > TableScope.LAMBDA_MAX_IEC) {
      return wavelengthRefused(
          lambda, "is outside 180 nm–1 mm, where the skin tables of Ed. 3 end");
    }
    return null;
  }

  @Override
  protected double aperture(double lambda, double t) {
    return LimitingAperture.skin(lambda);
  }

  @Override
  protected String governing(double lambda, double t) {
    return Ed3.skinLimit(lambda, t).describe();
  }

  @Override
  protected String rowsBelowShortestPulse() {
    return "Table A.5 starts at 100 fs";
  }
}
