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
            "repetitive pulse (pulses within T_i = " + MpeCalculator.seconds(ti) + " added)");
      }
      return new PulseTrain.Limit(single, "repetitive pulse (" + C5_NOTE + ")");
    };
  }

  /**
   * T_i, s, at any wavelength of the tables: 1 ns for 180–400 nm; {@link
   * CorrectionFactors#pulseGroupTime} for 400–1400 nm; 1 ms for 1400–1500 nm; 10 s for 1500–1800
   * nm; 1 ms for 1800–2600 nm; 100 ns for 2600 nm–1 mm. The ultraviolet and infrared values are
   * confirmed by Directive 2006/25/EC, Annex II, Table 2.6 (T_min: 1 ns for 315–400 nm, 1 ms for
   * 1400–1500 nm, 10 s for 1500–1800 nm) and so are 1800 nm–1 mm (cross-checked: Table 2.6, rows
   * 1800–2600 nm, T_min = 1 ms, and 2600–10⁶ nm, T_min = 100 ns, as read in the directive's public
   * text, see {@code jonquil.safety.directive.AnnexII}); 180–315 nm, where the directive gives no
   * T_min, and that Ed. 3 keeps them, are from memory. They match the row breakpoints of Table A.1.
   */
  static double groupTime(double lambda) {
    double n = CorrectionFactors.nm(lambda);
    if (n < 400) {
      return 1e-9;
    }
    if (n < 1400) {
      return CorrectionFactors.pulseGroupTime(lambda);
    }
    if (n < 1500) {
      return 1e-3;
    }
    if (n < 1800) {
      return 10;
    }
    return n < 2600 ? 1e-3 : 1e-7;
  }

  /**
   * C5 for N pulses (or groups of pulses within T_i) of duration tau (s) from a source of subtense
   * alpha (rad), in a train lasting exposure (s). Ed. 3 clause 4.3 f) 3) (from memory): 1 for
   * pulses of 0.25 s or longer and in the ultraviolet (the rule protects against thermal injury,
   * Directive 2006/25/EC Table 2.6, and the photochemical dose of rule 2 governs there); 400–1400
   * nm: 1 up to α = 5 mrad, N^−0.25 (at least 0.4) up to α_max, N^−0.25 up to N = 625 and 0.2
   * beyond for larger sources; 1400 nm–1 mm: 1 up to N = 600, 5 N^−0.25 (at least 0.4) beyond.
   */
  static double c5(double lambda, double alpha, double tau, double pulses, double exposure) {
    double n = CorrectionFactors.nm(lambda);
    if (tau >= 0.25 || n < 400) {
      return 1;
    }
    double quarter = Math.pow(pulses, -0.25);
    if (n < 1400) {
      if (alpha <= 5e-3) {
        return 1;
      }
      if (alpha <= ExtendedSource.alphaMax(exposure)) {
        return pulses <= 40 ? quarter : 0.4;
      }
      return pulses <= 625 ? quarter : 0.2;
    }
    return pulses <= 600 ? 1 : Math.max(0.4, 5 * quarter);
  }

  /**
   * Rule 3 at any wavelength: pulses within T_i are added and treated as one (over at most the
   * exposure), and the single-pulse (or group) limit is multiplied by C5. For a point source in
   * 400–1400 nm it is {@link #repetitive(double)} exactly.
   */
  static PulseTrain.RepetitiveRule repetitive(double lambda, double alpha, double tau) {
    double ti = groupTime(lambda);
    boolean retinalPoint =
        alpha <= ExtendedSource.ALPHA_MIN
            && CorrectionFactors.nm(lambda) >= 400
            && CorrectionFactors.nm(lambda) < 1400;
    if (retinalPoint) {
      return repetitive(ti);
    }
    return (mpe, single, pulses, rate) -> {
      double exposure = pulses / rate;
      if (1 / rate < ti) {
        double span = Math.min(ti, exposure);
        double perGroup = Math.max(1, rate * span);
        double groups = Math.max(1, pulses / perGroup);
        double c5 = c5(lambda, alpha, tau, groups, exposure);
        return new PulseTrain.Limit(
            mpe.applyAsDouble(span) * c5 / perGroup,
            "repetitive pulse (pulses within T_i = "
                + MpeCalculator.seconds(ti)
                + " added, C5 = "
                + round(c5)
                + ")");
      }
      double c5 = c5(lambda, alpha, tau, pulses, exposure);
      return new PulseTrain.Limit(
          single * c5, "repetitive pulse (C5 = " + round(c5) + ", N = " + round(pulses) + ")");
    };
  }

  private static String round(double v) {
    return String.format(java.util.Locale.ROOT, "%.4g", v);
  }
}
