package jonquil.safety.ansi;

import jonquil.safety.CorrectionFactors;
import jonquil.safety.Emission;
import jonquil.safety.MaximumPermissibleExposure;
import jonquil.safety.MpeCalculator;
import jonquil.safety.Outcome;
import jonquil.safety.PulseTrain;
import jonquil.safety.TableScope;
import jonquil.safety.TableScope.Tissue;

/**
 * Why it exists: the ocular MPE for intrabeam (point-source) viewing after ANSI Z136.1-2014 Table
 * 5a with the Table 6 factors and the section 8.2.3 pulse rules, so it can be shown beside the IEC
 * 60825-1:2014 (Ed. 3) figure of {@link jonquil.safety.OcularMpe}: retinal 400 nm ≤ λ &lt; 1200 nm
 * (7 mm aperture), and the corneal rows of 180–400 nm and 1400 nm–1 mm for continuous wave and
 * single pulses from 1 ns (Table 8 apertures; from memory). 1200–1400 nm stays not evaluated.
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
public final class AnsiOcularMpe extends Z136Mpe {
  private static final String TABLE =
      Z136.OCULAR_TABLE + "; " + Z136.FACTORS_TABLE + "; " + Z136.APERTURE_TABLE;
  private static final String TRAIN_TABLE = TABLE + "; " + Z136.PULSE_RULES;
  private static final AnsiOcularMpe ANSI = new AnsiOcularMpe();

  private AnsiOcularMpe() {
    super(TABLE, TRAIN_TABLE, Tissue.EYE, Z136::ocular, "Table 5a");
  }

  /**
   * The MPE for an emission and an exposure duration T (s). Continuous wave: MPE(T). Single pulse:
   * MPE(τ) (T is ignored). Pulse train: the most restrictive per-pulse limit of Rules 1–3, with the
   * rule named in {@link MaximumPermissibleExposure#limitingCriterion()} and each rule's value in
   * the record.
   */
  public static Outcome<MaximumPermissibleExposure> at(Emission e, double exposureDuration) {
    double lambda = e.wavelength();
    double t = e.pulsed() ? e.pulseDuration() : exposureDuration;
    boolean cornea = lambda < TableScope.LAMBDA_MIN || lambda >= TableScope.LAMBDA_MAX_SKIN;
    if (cornea && ANSI.wavelengthRefusal(lambda) == null && t > 0 && t < Z136.T_MIN_CORNEA) {
      return Outcome.notEvaluated(
          "exposure or pulse of "
              + MpeCalculator.seconds(t)
              + ": the ultraviolet and infrared rows of Table 5a start"
              + " at 1 ns (from memory); not implemented below",
          TABLE);
    }
    Outcome<MaximumPermissibleExposure> o = ANSI.evaluate(e, exposureDuration);
    if (!o.evaluated() || !cornea) {
      return o;
    }
    MaximumPermissibleExposure m = o.get();
    return Outcome.of(
        m.restated(Z136.eyeAperture(lambda, m.exposureDuration()), m.table()), o.standard());
  }

  @Override
  protected String wavelengthRefusal(double lambda) {
    double n = CorrectionFactors.nm(lambda);
    if (n < 180 || n > 1e6) {
      return wavelengthRefused(lambda, "is outside 180 nm to 1 mm, the range of Table 5a");
    }
    if (lambda < TableScope.LAMBDA_MIN || n >= 1400) {
      return null;
    }
    if (lambda >= Z136.LAMBDA_MAX_EYE) {
      return wavelengthRefused(
          lambda,
          "is in 1200–1400 nm, where the 2014 C_C and the added corneal/lens"
              + " limit were not confirmed; not implemented");
    }
    return null;
  }

  @Override
  protected String rowsBelowShortestPulse() {
    return "the 100 fs–10 ps row of Table 5a is not implemented";
  }

  @Override
  protected PulseTrain.RepetitiveRule repetitiveRule(double lambda) {
    return AnsiPulseRules.MULTIPLE_PULSE;
  }

  @Override
  protected String trainRefusal(Emission e) {
    double n = CorrectionFactors.nm(e.wavelength());
    if (n < 400 || n >= 1400) {
      return "pulse trains below 400 nm or from 1400 nm: the t_min and Rule 3 of Table 6 /"
          + " section 8.2.3 for the cornea were not confirmed, so the train is not evaluated"
          + " (single pulses and continuous wave are)";
    }
    double tau = e.pulseDuration();
    double tMin = CorrectionFactors.pulseGroupTime(e.wavelength());
    if (tau >= tMin) {
      return null;
    }
    return "pulse duration "
        + MpeCalculator.seconds(tau)
        + " is below t_min = "
        + MpeCalculator.seconds(tMin)
        + ": for such trains ANSI Z136.1-2014 section 8.2.3 / Table 6 adds pulses within"
        + " t_min and modifies C_P (from memory); those provisions were not confirmed, so the"
        + " train is not evaluated (single pulses are)";
  }
}
