package jonquil.safety.directive;

import jonquil.safety.Emission;
import jonquil.safety.MaximumPermissibleExposure;
import jonquil.safety.Outcome;

/**
 * The exposure limit value for the eye after Directive 2006/25/EC, Annex II, Tables 2.2 and 2.3
 * with the factors of Table 2.5 (point source, C_E = 1) and the pulse rules of Table 2.6, 180 nm to
 * 1 mm and 10⁻¹³ s to 3×10⁴ s, so that it can gate a bench or stand beside the IEC 60825-1:2014
 * figure of {@link jonquil.safety.OcularMpe}.
 */
public final class DirectiveEyeLimit extends AnnexIILimit {
  private static final DirectiveEyeLimit EYE = new DirectiveEyeLimit();

  private DirectiveEyeLimit() {
    super(AnnexII.EYE_SHORT + "; " + AnnexII.EYE_LONG, AnnexII::eye);
  }

  /**
   * The limit for an emission and an exposure duration (s): continuous wave over the duration, a
   * single pulse over its own duration, a pulse train per pulse by the most restrictive of the
   * three rules of Table 2.6. The answer names its table and limiting aperture.
   */
  public static Outcome<MaximumPermissibleExposure> at(Emission e, double exposureDuration) {
    return EYE.limit(e, exposureDuration);
  }

  @Override
  String table(double lambda, double t) {
    return t < AnnexII.SHORT_LONG ? AnnexII.EYE_SHORT : AnnexII.EYE_LONG;
  }

  @Override
  protected double aperture(double lambda, double t) {
    return AnnexII.eyeAperture(lambda, t);
  }
}
