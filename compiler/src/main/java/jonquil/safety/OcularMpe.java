package jonquil.safety;

/**
 * Why it exists: the ocular maximum permissible exposure, IEC 60825-1:2014 (Ed. 3) Annex A Table
 * A.1, from 180 nm to 1 mm and 100 fs to 3×10⁴ s, continuous or pulsed, for a point source or an
 * extended source of given angular subtense (C6, T2, γ_ph: {@link ExtendedSource}); 1250–1400 nm,
 * where Ed. 3 adds a corneal/lens limit that could not be confirmed, is reported as not evaluated.
 * Where two limits apply (photochemical and thermal) the stricter governs, and {@link
 * MaximumPermissibleExposure#governingLimit()} says which.
 */
public final class OcularMpe extends MpeCalculator {
  private static final String TABLE = Ed3.MPE_EYE_TABLE + ", " + Ed3.FACTORS_TABLE;
  private static final String TRAIN_TABLE =
      TABLE + "; repetitive pulses: clause 4.3 f) / A.3, " + PulseRules.C5_NOTE;
  private static final OcularMpe IEC = new OcularMpe(ExtendedSource.ALPHA_MIN);

  private final double alpha;

  private OcularMpe(double alpha) {
    super(
        TABLE,
        TRAIN_TABLE,
        TableScope.Tissue.IEC_EYE,
        PulseRules.NAMES,
        TABLE,
        (lambda, t) -> Ed3.ocularLimit(lambda, t, alpha).exposure());
    this.alpha = alpha;
  }

  /** Limiting aperture for the eye, 400–1400 nm, m (other bands: {@link LimitingAperture#eye}). */
  public static final double LIMITING_APERTURE = TableScope.APERTURE_EYE;

  /**
   * The MPE for an emission and an exposure duration (s), point source. For a pulse train the
   * per-pulse limit is the most restrictive of the single-pulse, average-power and repetitive-pulse
   * rules (see {@link PulseRules}).
   */
  public static Outcome<MaximumPermissibleExposure> at(Emission e, double exposureDuration) {
    return IEC.evaluate(e, exposureDuration);
  }

  /**
   * The same for an apparent source of angular subtense alpha (rad, full angle): C6 = α/α_min
   * between α_min = 1.5 mrad and α_max(t); at or below α_min the point-source figure.
   */
  public static Outcome<MaximumPermissibleExposure> at(
      Emission e, double exposureDuration, double alpha) {
    ExtendedSource.requireAlpha(alpha);
    return alpha <= ExtendedSource.ALPHA_MIN
        ? at(e, exposureDuration)
        : new OcularMpe(alpha).evaluate(e, exposureDuration);
  }

  @Override
  protected String wavelengthRefusal(double lambda) {
    return coverage(lambda);
  }

  @Override
  protected String rowsBelowShortestPulse() {
    return "Table A.1 starts at 100 fs";
  }

  @Override
  protected PulseTrain.RepetitiveRule repetitiveRule(Emission e) {
    return PulseRules.repetitive(e.wavelength(), alpha, e.pulseDuration());
  }

  @Override
  protected double aperture(double lambda, double t) {
    return LimitingAperture.eye(lambda, t);
  }

  @Override
  protected String governing(double lambda, double t) {
    return Ed3.ocularLimit(lambda, t, alpha).describe();
  }

  /** Why IEC's ocular rows do not cover the wavelength, or null when they do. */
  static String coverage(double lambda) {
    if (lambda < TableScope.LAMBDA_MIN_IEC) {
      return wavelengthRefused(lambda, "is below 180 nm, where the tables of Ed. 3 start");
    }
    if (lambda > TableScope.LAMBDA_MAX_IEC) {
      return wavelengthRefused(lambda, "is above 1 mm, where the tables of Ed. 3 end");
    }
    if (lambda >= Ed3.LAMBDA_MAX_EYE && CorrectionFactors.nm(lambda) < 1400) {
      return wavelengthRefused(
          lambda,
          "is in 1250–1400 nm, where Ed. 3 adds a corneal/lens dual limit and C7"
              + " rises steeply; not implemented");
    }
    return null;
  }
}
