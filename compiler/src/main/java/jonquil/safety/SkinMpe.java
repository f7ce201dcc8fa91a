package jonquil.safety;

/**
 * Why it exists: the skin maximum permissible exposure, IEC 60825-1:2014 (Ed. 3) Annex A Table A.5,
 * for 400–1400 nm and 1 ns to 3×10⁴ s, averaged over the 3.5 mm limiting aperture.
 */
public final class SkinMpe {
  private SkinMpe() {}

  /** Limiting aperture for the skin, m. */
  public static final double LIMITING_APERTURE = Ed3.APERTURE_SKIN;

  /**
   * The skin MPE. Pulse trains: the more restrictive of the single-pulse and average-power rules
   * (the repetitive-pulse C5 rule is a retinal-thermal rule and is not applied to the skin; Ed. 3,
   * from memory).
   */
  public static Outcome<Exposure> at(Emission e, double exposureDuration) {
    String table = Ed3.MPE_SKIN_TABLE + ", " + Ed3.FACTORS_TABLE;
    double n = Ed3.nm(e.wavelength());
    if (n < 400 || n >= 1400) {
      return Outcome.notEvaluated(
          "wavelength "
              + OcularMpe.fmt(n)
              + " nm is outside 400–1400 nm: skin MPEs for"
              + " other wavelengths are not implemented",
          table);
    }
    double lambda = e.wavelength();
    if (!e.singlePulseOnly()) {
      if (!(exposureDuration > 0) || exposureDuration > Ed3.T_MAX) {
        return Outcome.notEvaluated("exposure duration must be in (0, 3e4] s", table);
      }
      if (exposureDuration < Ed3.T_MIN_SKIN) {
        return Outcome.notEvaluated("exposure below 1 ns: not implemented", table);
      }
    }
    if (!e.pulsed()) {
      double h = Ed3.skinMpe(lambda, exposureDuration);
      return Outcome.of(
          new Exposure(
              h,
              h / exposureDuration,
              exposureDuration,
              LIMITING_APERTURE,
              Double.NaN,
              Double.NaN,
              Double.NaN,
              "continuous wave",
              table),
          table);
    }
    double tau = e.pulseDuration();
    if (tau < Ed3.T_MIN_SKIN) {
      return Outcome.notEvaluated(
          "pulse duration " + tau + " s is below 1 ns: not implemented", table);
    }
    if (e.singlePulseOnly()) {
      if (tau > Ed3.T_MAX) {
        return Outcome.notEvaluated("pulse longer than 3e4 s", table);
      }
      double h = Ed3.skinMpe(lambda, tau);
      return Outcome.of(
          new Exposure(
              h, h / tau, tau, LIMITING_APERTURE, h, Double.NaN, Double.NaN, "single pulse", table),
          table);
    }
    String trainRefusal = e.trainProblem(exposureDuration);
    if (trainRefusal != null) {
      return Outcome.notEvaluated(trainRefusal, table);
    }
    return Outcome.of(
        PulseRules.train(
            t -> Ed3.skinMpe(lambda, t),
            tau,
            e.repetitionRate(),
            exposureDuration,
            Double.NaN,
            LIMITING_APERTURE,
            table),
        table);
  }
}
