package jonquil.safety;

/**
 * The extended-source correction of IEC 60825-1:2014 (Ed. 3), written once so that a caller can
 * pass the angular subtense α of the apparent source: C6, its bounds α_min and α_max(t), the time
 * T2 after which the retinal thermal limit stops rising, and the acceptance angle γ_ph of the
 * retinal photochemical limit.
 *
 * <p>Sources: C6 = α/α_min between α_min = 1.5 mrad and α_max, α_max = 5 mrad below 625 µs, 200
 * t^0.5 mrad up to 0.25 s, 100 mrad above; T2 = 10 × 10^((α − 1.5)/98.5) s: Ed. 3 Table 9 (from
 * memory; the bounds join continuously, 200·√625 µs = 5 mrad and 200·√0.25 s = 100 mrad, which
 * ExtendedSourceTest checks). γ_ph = 11 mrad for 10–100 s, 1.1 t^0.5 mrad for 100–10⁴ s, 110 mrad
 * beyond: confirmed by Directive 2006/25/EC, Annex II, Table 2.5 (γ = 1.1 t^0.5 mrad, 110 mrad
 * above 10⁴ s); that Ed. 3 uses the same angles is from memory.
 */
public final class ExtendedSource {
  private ExtendedSource() {}

  /** α_min, rad: at or below it a source is a point source and C6 = 1 (Ed. 3, Table 9). */
  public static final double ALPHA_MIN = 1.5e-3;

  static final String TABLE =
      Ed3.EDITION + ", Table 9 (C6, α_min = 1.5 mrad, α_max(t), T2; from memory)";

  /** α_max for the exposure duration t (s), rad: 5 mrad, 200 t^0.5 mrad, 100 mrad. */
  public static double alphaMax(double t) {
    if (t < 625e-6) {
      return 5e-3;
    }
    return t < 0.25 ? 0.2 * Math.sqrt(t) : 0.1;
  }

  /** C6 for a source of angular subtense alpha (rad) seen for t (s): 1 up to α_min. */
  public static double c6(double alpha, double t) {
    requireAlpha(alpha);
    return Math.min(Math.max(alpha, ALPHA_MIN), alphaMax(t)) / ALPHA_MIN;
  }

  /**
   * T2, s: 10 s for a point source, 10 × 10^((α − 1.5 mrad)/98.5 mrad) up to α = 100 mrad, 100 s
   * beyond.
   */
  public static double t2(double alpha) {
    requireAlpha(alpha);
    double mrad = Math.min(Math.max(alpha, ALPHA_MIN), 0.1) * 1e3;
    return 10 * Math.pow(10, (mrad - 1.5) / 98.5);
  }

  /** γ_ph, rad: the field of view the photochemical limit averages over for t ≥ 10 s. */
  public static double photochemicalAcceptance(double t) {
    if (t < 100) {
      return 11e-3;
    }
    return t < 1e4 ? 1.1e-3 * Math.sqrt(t) : 0.11;
  }

  /**
   * How much a photochemical irradiance limit rises for a source larger than γ_ph: only the part of
   * a uniform source inside the field of view counts, (α/γ_ph)², 1 for a smaller source.
   */
  static double photochemicalDilution(double alpha, double t) {
    double gamma = photochemicalAcceptance(t);
    return alpha > gamma ? (alpha / gamma) * (alpha / gamma) : 1.0;
  }

  static void requireAlpha(double alpha) {
    if (!(alpha >= 0) || !Double.isFinite(alpha)) {
      throw new IllegalArgumentException("angular subtense must be a finite angle >= 0 rad");
    }
  }
}
