package jonquil.safety;

import java.util.Locale;

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
 *
 * <p>{@link #of} is the factor a caller outside the tables applies (a reflection's apparent source,
 * a diffuse spot): only where it is certain not to be lenient, 400–1400 nm, continuous wave or a
 * single pulse, and not where the photochemical limit may govern (400–600 nm beyond 10 s), whose
 * extended-source rule is a field of view, not C6. Beyond 10 s it is C6·(T2/10 s)^−0.25: exact
 * beyond T2 and stricter than the table between 10 s and T2. Elsewhere C6 = 1 (the point-source
 * MPE, never above the extended-source one) and the note says why.
 */
public final class ExtendedSource {
  private ExtendedSource() {}

  /** α_min, rad: at or below it a source is a point source and C6 = 1 (Ed. 3, Table 9). */
  public static final double ALPHA_MIN = 1.5e-3;

  static final String TABLE =
      Ed3.EDITION + ", Table 9 (C6, α_min = 1.5 mrad, α_max(t), T2; from memory)";

  /**
   * The correction applied and why.
   *
   * @param c6 the factor the point-source MPE is multiplied by (≥ 1)
   * @param alpha the apparent source subtense, rad
   * @param alphaMax α_max for the duration, rad
   * @param note how C6 was found, for findings
   */
  public record Correction(double c6, double alpha, double alphaMax, String note) {}

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

  /** C6 for this emission, or 1 with the reason it is not applied. */
  public static Correction of(Emission e, double alpha, double exposureDuration) {
    double nm = CorrectionFactors.nm(e.wavelength());
    double t = e.singlePulseOnly() ? e.pulseDuration() : exposureDuration;
    double max = alphaMax(t);
    String angle = String.format(Locale.ROOT, "alpha %.3g mrad", alpha * 1e3);
    if (nm < 400 || nm >= 1400) {
      return new Correction(
          1, alpha, max, angle + ": C6 = 1, no retinal image outside 400-1400 nm");
    }
    if (e.pulsed() && !e.singlePulseOnly()) {
      return new Correction(
          1,
          alpha,
          max,
          angle + ": C6 = 1 kept for a pulse train (C5 depends on alpha), conservative");
    }
    if (nm < 600 && t > 10) {
      return new Correction(
          1,
          alpha,
          max,
          angle + ": C6 = 1 kept, the photochemical limit may govern (400-600 nm, > 10 s)");
    }
    double c6 = c6(alpha, t);
    String c6Text =
        String.format(
            Locale.ROOT,
            "%s: C6 = %.3g (alpha_min 1.5 mrad, alpha_max %.3g mrad; %s)",
            angle,
            c6,
            max * 1e3,
            TABLE);
    if (t <= 10) {
      return new Correction(c6, alpha, max, c6Text);
    }
    double t2 = t2(alpha);
    double factor = c6 * Math.pow(t2 / 10, -0.25);
    return new Correction(
        factor,
        alpha,
        max,
        String.format(
            Locale.ROOT,
            "%s, beyond 10 s with T2 = %.3g s: factor C6 (T2/10 s)^-0.25 = %.3g",
            c6Text,
            t2,
            factor));
  }

  static void requireAlpha(double alpha) {
    if (!(alpha >= 0) || !Double.isFinite(alpha)) {
      throw new IllegalArgumentException("angular subtense must be a finite angle >= 0 rad");
    }
  }
}
