package jonquil.safety.ansi;

import jonquil.safety.Emission;
import jonquil.safety.Exposure;
import jonquil.safety.Outcome;

/**
 * Why it exists: the skin MPE after ANSI Z136.1-2014 Table 7 (with the Table 6 factor C_A),
 * 400–1400 nm, 1 ns to 3×10⁴ s, averaged over the 3.5 mm limiting aperture, beside {@link
 * jonquil.safety.SkinMpe}.
 */
public final class AnsiSkinMpe {
  private AnsiSkinMpe() {}

  /** Limiting aperture for the skin, 400–1400 nm, m (ANSI Z136.1-2014 Table 8, from memory). */
  public static final double LIMITING_APERTURE = Z136.APERTURE_SKIN;

  /**
   * The skin MPE. Pulse trains: the more restrictive of Rules 1 and 2 of section 8.2.3; Rule 3
   * (C_P) is a retinal-thermal rule and is not applied to the skin (from memory). The long-exposure
   * row assumes an irradiated area ≤ 100 cm² (larger areas: lower MPE in the edition, from memory;
   * not implemented).
   */
  public static Outcome<Exposure> at(Emission e, double exposureDuration) {
    String table =
        Z136.SKIN_TABLE
            + "; "
            + Z136.FACTORS_TABLE
            + "; "
            + Z136.APERTURE_TABLE
            + "; skin area <= 100 cm2 assumed";
    double n = Z136.nm(e.wavelength());
    if (e.wavelength() < Z136.LAMBDA_MIN || e.wavelength() >= Z136.LAMBDA_MAX_SKIN) {
      return Outcome.notEvaluated(
          "wavelength "
              + AnsiOcularMpe.fmt(n)
              + " nm is outside 400–1400 nm: other rows"
              + " of Table 7 are not implemented",
          table);
    }
    double lambda = e.wavelength();
    if (!e.singlePulseOnly()) {
      String timeRefusal = AnsiOcularMpe.durationRefusal(exposureDuration, Z136.T_MIN_SKIN, "1 ns");
      if (timeRefusal != null) {
        return Outcome.notEvaluated(timeRefusal, table);
      }
    }
    if (!e.pulsed()) {
      double h = Z136.skin(lambda, exposureDuration);
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
    if (tau < Z136.T_MIN_SKIN) {
      return Outcome.notEvaluated(
          "pulse duration "
              + tau
              + " s is below 1 ns: the sub-ns rows of Table 7 are"
              + " not implemented",
          table);
    }
    if (tau > Z136.T_MAX) {
      return Outcome.notEvaluated("pulse longer than 3e4 s, the end of Table 7", table);
    }
    if (e.singlePulseOnly()) {
      double h = Z136.skin(lambda, tau);
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
    String rules = table + "; " + Z136.PULSE_RULES + " (Rules 1 and 2 only)";
    return Outcome.of(
        AnsiPulseRules.train(
            t -> Z136.skin(lambda, t),
            tau,
            e.repetitionRate(),
            exposureDuration,
            false,
            LIMITING_APERTURE,
            rules),
        rules);
  }
}
