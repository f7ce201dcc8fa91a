package jonquil.safety.ansi;

import jonquil.safety.PulseTrain;

/**
 * Why it exists: ANSI Z136.1-2014's names for the three pulse-train rules of section 8.2.3, and its
 * Rule 3, which {@link PulseTrain} applies for the eye.
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

  static final PulseTrain.RuleNames NAMES = new PulseTrain.RuleNames(RULE1, RULE2);

  /** Rule 3: per pulse ≤ MPE(τ) × C_P, C_P = n^−0.25, named with its n and C_P. */
  static final PulseTrain.RepetitiveRule MULTIPLE_PULSE =
      (mpe, single, pulses, rate) ->
          new PulseTrain.Limit(
              single * Z136.cP(pulses),
              RULE3 + ", n = " + fmt(pulses) + ", C_P = " + fmt(Z136.cP(pulses)));

  static String fmt(double v) {
    return String.format(java.util.Locale.ROOT, "%.4g", v);
  }
}
