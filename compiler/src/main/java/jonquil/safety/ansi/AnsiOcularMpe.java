package jonquil.safety.ansi;

import jonquil.safety.Emission;
import jonquil.safety.Exposure;
import jonquil.safety.Outcome;

/**
 * Why it exists: the ocular MPE for intrabeam (point-source) viewing after ANSI Z136.1-2014 Table
 * 5a with the Table 6 factors and the section 8.2.3 pulse rules, 400 nm ≤ λ &lt; 1200 nm, 7 mm
 * limiting aperture, so it can be shown beside the IEC 60825-1:2014 (Ed. 3) figure of {@link
 * jonquil.safety.OcularMpe}.
 *
 * <p>Where the two differ (both from memory unless noted):
 *
 * <ul>
 *   <li>Repetitive pulses: ANSI Rule 3 multiplies the single-pulse MPE by C_P = n^−0.25 (n = pulses
 *       in the exposure); IEC Ed. 3 uses C5 = 1 for a point source and instead adds pulses that
 *       fall within T_i. For a point-source train of pulses longer than t_min ANSI is therefore
 *       lower by n^−0.25.
 *   <li>Nanosecond single pulses: both 2014 documents give 2 × 10⁻⁷ C_A J/cm² (400–1050 nm) and 2 ×
 *       10⁻⁶ C_C J/cm² (1050–1400 nm) — the same value, both lowered from the earlier editions.
 *   <li>Coverage: ANSI here stops at 1200 nm (Ed. 3 code at 1250 nm); ANSI trains of pulses shorter
 *       than t_min are not evaluated.
 * </ul>
 */
public final class AnsiOcularMpe {
  private AnsiOcularMpe() {}

  /** Limiting aperture for the eye, 400–1400 nm, m (ANSI Z136.1-2014 Table 8, from memory). */
  public static final double LIMITING_APERTURE = Z136.APERTURE_EYE;

  /**
   * The MPE for an emission and an exposure duration T (s). Continuous wave: MPE(T). Single pulse:
   * MPE(τ) (T is ignored). Pulse train: the most restrictive per-pulse limit of Rules 1–3, with the
   * rule named in {@link Exposure#limitingCriterion()} and each rule's value in the record.
   */
  public static Outcome<Exposure> at(Emission e, double exposureDuration) {
    String table = Z136.OCULAR_TABLE + "; " + Z136.FACTORS_TABLE + "; " + Z136.APERTURE_TABLE;
    String refusal = coverage(e.wavelength());
    if (refusal != null) {
      return Outcome.notEvaluated(refusal, table);
    }
    double lambda = e.wavelength();
    if (!e.singlePulseOnly()) {
      String timeRefusal = durationRefusal(exposureDuration, Z136.T_MIN_EYE, "10 ps");
      if (timeRefusal != null) {
        return Outcome.notEvaluated(timeRefusal, table);
      }
    }
    if (!e.pulsed()) {
      double h = Z136.ocular(lambda, exposureDuration);
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
    if (tau < Z136.T_MIN_EYE) {
      return Outcome.notEvaluated(
          "pulse duration "
              + tau
              + " s is below 10 ps: the 100 fs–10 ps row of"
              + " Table 5a is not implemented",
          table);
    }
    if (tau > Z136.T_MAX) {
      return Outcome.notEvaluated("pulse longer than 3e4 s, the end of Table 5a", table);
    }
    if (e.singlePulseOnly()) {
      double h = Z136.ocular(lambda, tau);
      return Outcome.of(
          new Exposure(
              h,
              h / tau,
              tau,
              LIMITING_APERTURE,
              h,
              Double.NaN,
              Double.NaN,
              AnsiPulseRules.RULE1,
              table),
          table);
    }
    String trainRefusal = e.trainProblem(exposureDuration);
    if (trainRefusal != null) {
      return Outcome.notEvaluated(trainRefusal, Z136.PULSE_RULES);
    }
    double tMin = Z136.tMin(lambda);
    if (tau < tMin) {
      return Outcome.notEvaluated(
          "pulse duration "
              + tau
              + " s is below t_min = "
              + tMin
              + " s: for such trains ANSI Z136.1-2014 section 8.2.3 / Table 6 adds pulses within"
              + " t_min and modifies C_P (from memory); those provisions were not confirmed, so the"
              + " train is not evaluated (single pulses are)",
          Z136.PULSE_RULES);
    }
    String rules = table + "; " + Z136.PULSE_RULES;
    return Outcome.of(
        AnsiPulseRules.train(
            t -> Z136.ocular(lambda, t),
            tau,
            e.repetitionRate(),
            exposureDuration,
            true,
            LIMITING_APERTURE,
            rules),
        rules);
  }

  static String coverage(double lambda) {
    double n = Z136.nm(lambda);
    if (lambda < Z136.LAMBDA_MIN) {
      return "wavelength "
          + fmt(n)
          + " nm is below 400 nm: ultraviolet MPEs of Table 5a are not implemented";
    }
    if (n >= 1400) {
      return "wavelength "
          + fmt(n)
          + " nm is outside the retinal hazard region 400–1400 nm: infrared (corneal)"
          + " MPEs of Table 5a are not implemented";
    }
    if (lambda >= Z136.LAMBDA_MAX_EYE) {
      return "wavelength "
          + fmt(n)
          + " nm is in 1200–1400 nm, where the 2014 C_C and the added corneal/lens"
          + " limit were not confirmed; not implemented";
    }
    return null;
  }

  static String durationRefusal(double t, double shortest, String shortestText) {
    if (!(t > 0) || !Double.isFinite(t)) {
      return "exposure duration must be > 0 s";
    }
    if (t > Z136.T_MAX) {
      return "exposure duration " + t + " s exceeds 3e4 s, the end of the tables";
    }
    if (t < shortest) {
      return "exposure duration " + t + " s is below " + shortestText + "; not implemented";
    }
    return null;
  }

  static String fmt(double v) {
    return String.format(java.util.Locale.ROOT, "%.1f", v);
  }
}
