package jonquil.safety;

/**
 * Why it exists: IEC 60825-1:2014 (Ed. 3)'s names for the pulse-train rules of clause 4.3 f) and
 * Annex A (A.3), and its repetitive-pulse rule, which {@link PulseTrain} applies for the eye.
 *
 * <p>Rules (Ed. 3, from memory; the three-rule structure is confirmed by published safety
 * guidance):
 *
 * <ol>
 *   <li>single pulse: each pulse ≤ the MPE for one pulse of its duration;
 *   <li>average power: the train's total exposure over T ≤ the MPE for T, i.e. per pulse ≤
 *       MPE(T)/N;
 *   <li>repetitive pulse (retinal thermal only): per pulse ≤ MPE(τ) × C5. In Ed. 3, C5 = 1 for a
 *       point source (α ≤ α_min; from memory), where Ed. 2 and ANSI Z136.1 used N^−0.25. Pulses
 *       closer than T_i are added and treated as one pulse of duration T_i.
 * </ol>
 */
final class PulseRules {
  private PulseRules() {}

  static final String C5_NOTE =
      "C5 = 1 for a point source (IEC 60825-1:2014 Ed. 3, clause 4.3 f, from memory);"
          + " Ed. 2 (2007) and the N^-0.25 rule would be more restrictive";

  static final PulseTrain.RuleNames NAMES =
      new PulseTrain.RuleNames("single pulse", "average power over the exposure duration");

  /** Rule 3 for the thermal confinement time T_i (s): pulses within T_i add up, else C5 = 1. */
  static PulseTrain.RepetitiveRule repetitive(double ti) {
    return (mpe, single, pulses, rate) -> {
      if (1 / rate < ti) {
        double perGroup = rate * ti;
        return new PulseTrain.Limit(
            mpe.applyAsDouble(ti) / perGroup,
            "repetitive pulse (pulses within T_i = " + ti + " s added)");
      }
      return new PulseTrain.Limit(single, "repetitive pulse (" + C5_NOTE + ")");
    };
  }
}
