package jonquil.safety;

import java.util.function.DoubleUnaryOperator;

/**
 * The per-pulse limit of a pulse train, worked out once for both standards and both tissues: the
 * single-pulse and average-power rules, which IEC 60825-1:2014 (Ed. 3) clause 4.3 f and ANSI
 * Z136.1-2014 section 8.2.3 state alike, and the standard's own third (repetitive-pulse) rule
 * plugged in. The most restrictive rule limits, and every rule's value is kept.
 */
public final class PulseTrain {
  private PulseTrain() {}

  /** What a standard's repetitive-pulse rule allows per pulse, and under which name. */
  public record Limit(double perPulse, String criterion) {}

  /** A standard's third rule, given the MPE over a duration and the train. */
  @FunctionalInterface
  public interface RepetitiveRule {
    /**
     * The rule's per-pulse limit.
     *
     * @param mpe radiant-exposure MPE over a duration, J/m²
     * @param single the single-pulse limit, J/m²
     * @param pulses number of pulses in the exposure duration (at least 1)
     * @param rate repetition rate, Hz
     */
    Limit apply(DoubleUnaryOperator mpe, double single, double pulses, double rate);
  }

  /** The names a standard gives its first two rules. */
  public record RuleNames(String singlePulse, String averagePower) {}

  /**
   * The train's MPE.
   *
   * @param mpe radiant-exposure MPE over a duration, J/m²
   * @param tau pulse duration, s
   * @param rate repetition rate, Hz (&gt; 0)
   * @param exposure exposure duration, s
   * @param names the standard's names for the single-pulse and average-power rules
   * @param third the repetitive-pulse rule, or null where the standard does not apply one
   * @param aperture limiting aperture, m
   * @param table standard, edition and tables
   */
  public static MaximumPermissibleExposure limit(
      DoubleUnaryOperator mpe,
      double tau,
      double rate,
      double exposure,
      RuleNames names,
      RepetitiveRule third,
      double aperture,
      String table) {
    double n = Math.max(1, rate * exposure);
    double single = mpe.applyAsDouble(tau);
    double average = mpe.applyAsDouble(exposure) / n;
    double limit = single;
    String criterion = names.singlePulse();
    if (average < limit) {
      limit = average;
      criterion = names.averagePower();
    }
    double repetitive = Double.NaN;
    if (third != null) {
      Limit r = third.apply(mpe, single, n, rate);
      repetitive = r.perPulse();
      if (repetitive < limit) {
        limit = repetitive;
        criterion = r.criterion();
      }
    }
    // The governing biological effect is named by the calculator (MaximumPermissibleExposure.with).
    return new MaximumPermissibleExposure(
        limit, limit * rate, exposure, aperture, single, average, repetitive, criterion, table, "");
  }
}
