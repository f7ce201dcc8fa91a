package jonquil.safety;

/**
 * Why it exists: carries a laser-induced damage threshold (LIDT) quoted for one pulse duration and
 * wavelength over to another, by the common-practice rules, and refuses outside their window.
 *
 * <p>Pulse duration: F₂ = F₁ √(τ₂/τ₁), the thermal-diffusion scaling. Confirmed for dielectrics by
 * B. C. Stuart et al., "Nanosecond-to-femtosecond laser-induced breakdown in dielectrics", Phys.
 * Rev. B 53, 1749 (1996): τ^½ holds for τ ≳ 50 ps and breaks down for τ ≲ 10 ps (measured 140 fs–1
 * ns at 1053 and 526 nm). The window used here, 10 ps–100 ns, is common practice; its upper end is
 * from memory. Wavelength: F₂ = F₁ λ₂/λ₁, common practice (from memory; no primary source
 * confirmed). ISO 21254 (all parts) is the test method the thresholds should come from.
 * Continuous-wave thresholds (W/m², or W/m for line-focus data) are used as given, without scaling.
 */
public final class DamageScaling {
  private DamageScaling() {}

  public static final double TAU_MIN = 1e-11;
  public static final double TAU_MAX = 1e-7;

  static final String CAUTION =
      "Common-practice scaling, not a measurement: confirm the damage threshold of the"
          + " actual part (ISO 21254 test) before relying on it.";
  static final String RULES =
      "common practice: F ∝ sqrt(tau) (Stuart et al., Phys. Rev. B 53, 1749 (1996), tau >~ 50 ps),"
          + " F ∝ lambda (common practice, from memory); window 10 ps–100 ns";

  /** Scales a pulsed fluence threshold (J/m²) from (τ₁, λ₁) to (τ₂, λ₂). */
  public static Outcome<Double> pulsedFluence(
      double fluence1, double tau1, double lambda1, double tau2, double lambda2) {
    if (!(fluence1 >= 0) || !(tau1 > 0) || !(tau2 > 0) || !(lambda1 > 0) || !(lambda2 > 0)) {
      throw new IllegalArgumentException("fluence >= 0, durations and wavelengths > 0");
    }
    if (outside(tau1) || outside(tau2)) {
      return Outcome.<Double>notEvaluated(
              "pulse durations "
                  + MpeCalculator.seconds(tau1)
                  + " → "
                  + MpeCalculator.seconds(tau2)
                  + " leave the 10 ps–100 ns window"
                  + " of the sqrt(tau) rule; use a threshold measured at the target duration",
              RULES)
          .withCaution(CAUTION);
    }
    double f2 = fluence1 * Math.sqrt(tau2 / tau1) * (lambda2 / lambda1);
    return Outcome.of(f2, RULES).withCaution(CAUTION);
  }

  /**
   * Outside the window, with a relative slack of 1e-9 so that '100 ns' written in a spec counts as
   * inside.
   */
  private static boolean outside(double tau) {
    return tau < TAU_MIN * (1 - 1e-9) || tau > TAU_MAX * (1 + 1e-9);
  }

  /**
   * A continuous-wave threshold in W/m² or W/m, returned unchanged (no scaling rule is applied).
   */
  public static Outcome<Double> continuous(double threshold) {
    if (!(threshold >= 0)) {
      throw new IllegalArgumentException("threshold >= 0");
    }
    return Outcome.of(threshold, "cw threshold used as given (W/m² or W/m); no scaling")
        .withCaution(CAUTION);
  }
}
