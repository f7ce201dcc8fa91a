package jonquil.safety.ansi;

import jonquil.safety.Emission;
import jonquil.safety.MaximumPermissibleExposure;
import jonquil.safety.Outcome;
import jonquil.safety.TableScope;
import jonquil.safety.TableScope.Tissue;

/**
 * Why it exists: the skin MPE after ANSI Z136.1-2014 Table 7 (with the Table 6 factor C_A),
 * 400–1400 nm, 1 ns to 3×10⁴ s, averaged over the 3.5 mm limiting aperture, beside {@link
 * jonquil.safety.SkinMpe}.
 */
public final class AnsiSkinMpe extends Z136Mpe {
  private static final String TABLE =
      Z136.SKIN_TABLE
          + "; "
          + Z136.FACTORS_TABLE
          + "; "
          + Z136.APERTURE_TABLE
          + "; skin area <= 100 cm2 assumed";
  private static final String TRAIN_TABLE =
      TABLE + "; " + Z136.PULSE_RULES + " (Rules 1 and 2 only)";
  private static final AnsiSkinMpe ANSI = new AnsiSkinMpe();

  /** Rules 1 and 2 only: Rule 3 (C_P) is a retinal-thermal rule (from memory). */
  private AnsiSkinMpe() {
    super(TABLE, TRAIN_TABLE, Tissue.SKIN, Z136::skin, "Table 7");
  }

  /**
   * The skin MPE. Pulse trains: the more restrictive of Rules 1 and 2 of section 8.2.3; Rule 3
   * (C_P) is a retinal-thermal rule and is not applied to the skin (from memory). The long-exposure
   * row assumes an irradiated area ≤ 100 cm² (larger areas: lower MPE in the edition, from memory;
   * not implemented).
   */
  public static Outcome<MaximumPermissibleExposure> at(Emission e, double exposureDuration) {
    return ANSI.evaluate(e, exposureDuration);
  }

  @Override
  protected String wavelengthRefusal(double lambda) {
    if (lambda < TableScope.LAMBDA_MIN || lambda >= TableScope.LAMBDA_MAX_SKIN) {
      return wavelengthRefused(
          lambda, "is outside 400–1400 nm: other rows of Table 7 are not implemented");
    }
    return null;
  }

  @Override
  protected String rowsBelowShortestPulse() {
    return "the sub-ns rows of Table 7 are not implemented";
  }
}
