package jonquil.safety.directive;

import jonquil.safety.Emission;
import jonquil.safety.MaximumPermissibleExposure;
import jonquil.safety.Outcome;

/**
 * The exposure limit value for the skin after Directive 2006/25/EC, Annex II, Table 2.4 with the
 * factors of Table 2.5 and the pulse rules of Table 2.6, 180 nm to 1 mm and 10⁻¹³ s to 3×10⁴ s,
 * beside the IEC 60825-1:2014 figure of {@link jonquil.safety.SkinMpe}.
 */
public final class DirectiveSkinLimit extends AnnexIILimit {
  private static final DirectiveSkinLimit SKIN = new DirectiveSkinLimit();

  private DirectiveSkinLimit() {
    super(AnnexII.SKIN, AnnexII::skin);
  }

  /**
   * The limit for an emission and an exposure duration (s), as {@link DirectiveEyeLimit#at} does
   * for the eye; rule 3 of Table 2.6 applies to the skin too, its limits being thermal.
   */
  public static Outcome<MaximumPermissibleExposure> at(Emission e, double exposureDuration) {
    return SKIN.limit(e, exposureDuration);
  }

  @Override
  String table(double lambda, double t) {
    return AnnexII.SKIN;
  }

  @Override
  protected double aperture(double lambda, double t) {
    return AnnexII.skinAperture(lambda);
  }
}
