package jonquil.safety.ansi;

import java.util.function.DoubleUnaryOperator;
import jonquil.safety.Exposure;

/**
 * Why it exists: the three pulse-train rules of ANSI Z136.1-2014 section 8.2.3, applied once for
 * the eye and the skin so that both use the same arithmetic.
 *
 * <ol>
 *   <li>Rule 1 (single pulse): each pulse ≤ the MPE for one pulse of its duration τ.
 *   <li>Rule 2 (average power): the train's exposure over T ≤ the MPE for T, i.e. per pulse ≤
 *       MPE(T)/n, n = F·T. For a uniform train the full T is the binding group for these tables
 *       (MPE(t)/t never increases with t), so shorter groups are not checked separately.
 *   <li>Rule 3 (multiple-pulse thermal, eye 400–1400 nm only): per pulse ≤ MPE(τ) × C_P, C_P =
 *       n^−0.25. Callers apply it only for τ ≥ t_min; the 2014 edition treats pulses shorter than
 *       t_min (pulses within t_min acting together and a modified C_P, from memory) by provisions
 *       that were not confirmed, so such trains are "not evaluated" rather than guessed.
 * </ol>
 *
 * The three-rule structure and the N^−1/4 form are confirmed qualitatively (see {@link Z136}); the
 * exact wording of the 2014 edition is from memory.
 */
final class AnsiPulseRules {
  private AnsiPulseRules() {}

  static final String RULE1 = "Rule 1 (single pulse)";
  static final String RULE2 = "Rule 2 (average power over the exposure duration)";
  static final String RULE3 = "Rule 3 (multiple-pulse thermal, C_P = n^-0.25)";

  /**
   * Per-pulse limit (J/m²) for a train, and the rule that limited it.
   *
   * @param mpe radiant-exposure MPE over a duration, J/m²
   * @param tau pulse duration, s
   * @param rate repetition rate, Hz (&gt; 0)
   * @param exposure exposure duration T, s
   * @param rule3 whether Rule 3 applies (retinal thermal, τ ≥ t_min)
   */
  static Exposure train(
      DoubleUnaryOperator mpe,
      double tau,
      double rate,
      double exposure,
      boolean rule3,
      double aperture,
      String table) {
    double n = Math.max(1, rate * exposure);
    double single = mpe.applyAsDouble(tau);
    double average = mpe.applyAsDouble(exposure) / n;
    double repetitive = rule3 ? single * Z136.cP(n) : Double.NaN;
    double limit = single;
    String criterion = RULE1;
    if (average < limit) {
      limit = average;
      criterion = RULE2;
    }
    if (rule3 && repetitive < limit) {
      limit = repetitive;
      criterion = RULE3 + ", n = " + fmt(n) + ", C_P = " + fmt(Z136.cP(n));
    }
    return new Exposure(
        limit, limit * rate, exposure, aperture, single, average, repetitive, criterion, table);
  }

  static String fmt(double v) {
    return String.format(java.util.Locale.ROOT, "%.4g", v);
  }
}
