package jonquil.safety;

import java.util.function.DoubleUnaryOperator;

/**
 * Why it exists: the repetitive-pulse rules of IEC 60825-1:2014 (Ed. 3), clause 4.3 f) and Annex A
 * (A.3), applied once for the eye and the skin so that both use the same arithmetic.
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

  /**
   * Per-pulse limit (J/m²) for a train, and the limiting criterion.
   *
   * @param mpe radiant exposure MPE over a duration, J/m²
   * @param tau pulse duration, s
   * @param rate repetition rate, Hz (> 0)
   * @param exposure exposure duration, s
   * @param ti thermal confinement time for the repetitive rule, s; NaN when rule 3 does not apply
   */
  static Exposure train(
      DoubleUnaryOperator mpe,
      double tau,
      double rate,
      double exposure,
      double ti,
      double aperture,
      String table) {
    double n = Math.max(1, rate * exposure);
    double single = mpe.applyAsDouble(tau);
    double average = mpe.applyAsDouble(exposure) / n;
    double repetitive = Double.NaN;
    String repetitiveName = "";
    if (!Double.isNaN(ti)) {
      if (1 / rate < ti) {
        double perGroup = rate * ti;
        repetitive = mpe.applyAsDouble(ti) / perGroup;
        repetitiveName = "repetitive pulse (pulses within T_i = " + ti + " s added)";
      } else {
        repetitive = single; // C5 = 1
        repetitiveName = "repetitive pulse (" + C5_NOTE + ")";
      }
    }
    double limit = single;
    String criterion = "single pulse";
    if (average < limit) {
      limit = average;
      criterion = "average power over the exposure duration";
    }
    if (!Double.isNaN(repetitive) && repetitive < limit) {
      limit = repetitive;
      criterion = repetitiveName;
    }
    return new Exposure(
        limit, limit * rate, exposure, aperture, single, average, repetitive, criterion, table);
  }
}
