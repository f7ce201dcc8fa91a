package jonquil.safety;

/**
 * The limiting apertures of IEC 60825-1:2014 (Ed. 3), Table A.3 (from memory; same values as
 * ICNIRP): the circle an exposure is averaged over, by tissue, band and exposure duration.
 *
 * <ul>
 *   <li>Eye, 180–400 nm: 1 mm. Eye, 400–1400 nm: 7 mm. Eye, 1400 nm–100 µm: 1 mm below 0.35 s, 1.5
 *       t^(3/8) mm for 0.35–10 s, 3.5 mm beyond (the rows join: 1.5·0.35^0.375 = 1.0 and
 *       1.5·10^0.375 = 3.55). Eye, 100 µm–1 mm: 11 mm.
 *   <li>Skin, 180 nm–100 µm: 3.5 mm. Skin, 100 µm–1 mm: 11 mm.
 * </ul>
 *
 * Cross-checked where Directive 2006/25/EC, Annex II has the same value (its Tables 2.2 and 2.4 as
 * read in their public text, see {@code jonquil.safety.directive.AnnexII}): eye 400–1400 nm, 7 mm
 * (Table 2.2, aperture column, rows 400–1400 nm); eye 100 µm–1 mm, 11 mm (Table 2.2, note b); skin
 * 180 nm–100 µm, 3.5 mm (Table 2.4, aperture column). The others differ: the directive grows the
 * ultraviolet eye aperture like the infrared one, starts the growth at 0.3 s, and keeps 3.5 mm for
 * the skin up to 1 mm.
 */
public final class LimitingAperture {
  private LimitingAperture() {}

  static final String TABLE =
      Ed3.EDITION + ", Annex A, Table A.3 (limiting apertures; from memory)";

  /** The eye's limiting aperture diameter, m, at wavelength lambda (m) for exposure t (s). */
  public static double eye(double lambda, double t) {
    double n = CorrectionFactors.nm(lambda);
    if (n < 400) {
      return 1e-3;
    }
    if (n < 1400) {
      return TableScope.APERTURE_EYE;
    }
    if (n < 1e5) {
      return growing(t);
    }
    return 11e-3;
  }

  /** The skin's limiting aperture diameter, m. */
  public static double skin(double lambda) {
    return CorrectionFactors.nm(lambda) < 1e5 ? TableScope.APERTURE_SKIN : 11e-3;
  }

  /** 1 mm below 0.35 s, 1.5 t^(3/8) mm to 10 s, 3.5 mm beyond. */
  private static double growing(double t) {
    if (t < 0.35) {
      return 1e-3;
    }
    return t < 10 ? 1.5e-3 * Math.pow(t, 0.375) : 3.5e-3;
  }

  /** Area of a circle of diameter d, m². */
  static double area(double d) {
    return Math.PI * d * d / 4;
  }
}
