package jonquil.safety;

/**
 * Why it exists: the ocular maximum permissible exposure for intrabeam (point-source, C6 = 1)
 * viewing, IEC 60825-1:2014 (Ed. 3) Annex A Table A.1, for 400 nm ≤ λ &lt; 1250 nm and 10 ps to
 * 3×10⁴ s, continuous or pulsed; everything else is reported as not evaluated.
 */
public final class OcularMpe {
  private OcularMpe() {}

  /** Limiting aperture for the eye, 400–1400 nm, m. */
  public static final double LIMITING_APERTURE = Ed3.APERTURE_EYE;

  /**
   * The MPE for an emission and an exposure duration (s). For a pulse train the per-pulse limit is
   * the most restrictive of the single-pulse, average-power and repetitive-pulse rules (see {@link
   * Exposure}).
   */
  public static Outcome<Exposure> at(Emission e, double exposureDuration) {
    String table = Ed3.MPE_EYE_TABLE + ", " + Ed3.FACTORS_TABLE;
    String refusal = coverage(e.wavelength(), table);
    if (refusal != null) {
      return Outcome.notEvaluated(refusal, table);
    }
    double lambda = e.wavelength();
    if (!e.singlePulseOnly()) {
      String timeRefusal = durationRefusal(exposureDuration);
      if (timeRefusal != null) {
        return Outcome.notEvaluated(timeRefusal, table);
      }
    }
    if (!e.pulsed()) {
      double h = Ed3.ocularMpe(lambda, exposureDuration);
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
    if (tau < Ed3.T_MIN_EYE) {
      return Outcome.notEvaluated(
          "pulse duration "
              + tau
              + " s is below 10 ps: the sub-10-ps rows of Table A.1"
              + " are not implemented",
          table);
    }
    if (e.singlePulseOnly()) {
      if (tau > Ed3.T_MAX) {
        return Outcome.notEvaluated("pulse longer than 3e4 s", table);
      }
      double h = Ed3.ocularMpe(lambda, tau);
      return Outcome.of(
          new Exposure(
              h, h / tau, tau, LIMITING_APERTURE, h, Double.NaN, Double.NaN, "single pulse", table),
          table);
    }
    String trainRefusal = e.trainProblem(exposureDuration);
    if (trainRefusal != null) {
      return Outcome.notEvaluated(trainRefusal, table);
    }
    String rules = table + "; repetitive pulses: clause 4.3 f) / A.3, " + PulseRules.C5_NOTE;
    return Outcome.of(
        PulseRules.train(
            t -> Ed3.ocularMpe(lambda, t),
            tau,
            e.repetitionRate(),
            exposureDuration,
            Ed3.ti(lambda),
            LIMITING_APERTURE,
            rules),
        rules);
  }

  static String coverage(double lambda, String table) {
    double n = Ed3.nm(lambda);
    if (n < 400) {
      return "wavelength "
          + fmt(n)
          + " nm is below 400 nm: ultraviolet MPEs (photochemical/corneal) are not implemented";
    }
    if (n >= 1400) {
      return "wavelength "
          + fmt(n)
          + " nm is outside the retinal hazard region 400–1400 nm: corneal/infrared MPEs"
          + " are not implemented";
    }
    if (lambda >= Ed3.LAMBDA_MAX_EYE) {
      return "wavelength "
          + fmt(n)
          + " nm is in 1250–1400 nm, where Ed. 3 adds a corneal/lens dual limit and C7"
          + " rises steeply; not implemented";
    }
    return null;
  }

  static String durationRefusal(double t) {
    if (!(t > 0) || !Double.isFinite(t)) {
      return "exposure duration must be > 0 s";
    }
    if (t > Ed3.T_MAX) {
      return "exposure duration " + t + " s exceeds 3e4 s, the end of the tables";
    }
    if (t < Ed3.T_MIN_EYE) {
      return "exposure duration " + t + " s is below 10 ps; not implemented";
    }
    return null;
  }

  static String fmt(double v) {
    return String.format(java.util.Locale.ROOT, "%.1f", v);
  }
}
