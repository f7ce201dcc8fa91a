package jonquil.safety;

import java.util.Locale;

/**
 * The extended-source correction C6 of the retinal thermal limits, IEC 60825-1:2014 (Ed. 3), Table
 * 10 and its notes (from memory): a source subtending α at the eye spreads its image over the
 * retina, so the limit rises by C6 = 1 for α ≤ α_min = 1.5 mrad, α/α_min up to α_max, and
 * α_max/α_min beyond it, where α_max is 5 mrad for t &lt; 625 µs, 200·t^0.5 mrad from 625 µs to
 * 0.25 s and 100 mrad above 0.25 s. Directive 2006/25/EC, Annex II, Table 2.5 states the same α_min
 * and the 100 mrad ceiling for its C_E.
 *
 * <p>Beyond 10 s the thermal limit of a point source is flat from T2 = 10 s, but an extended
 * source's T2 = 10·10^((α − 1.5 mrad)/98.5 mrad) s (100 s from α = 100 mrad; IEC 60825-1:2014 Table
 * 10, from memory) is later, so the factor is C6·(T2/10 s)^−0.25: exact beyond T2 and stricter than
 * the table between 10 s and T2.
 *
 * <p>Applied only where it is certain not to be lenient: 400–1400 nm, continuous wave or a single
 * pulse, and not where the photochemical limit may govern (400–600 nm beyond 10 s), whose
 * extended-source rule is a field of view, not C6. Elsewhere C6 = 1 (the point-source MPE, never
 * above the extended-source one) and the note says why.
 */
public final class ExtendedSource {
  private ExtendedSource() {}

  /** α_min, rad. */
  public static final double ALPHA_MIN = 1.5e-3;

  /**
   * The correction applied and why.
   *
   * @param c6 the factor the point-source MPE is multiplied by (≥ 1)
   * @param alpha the apparent source subtense, rad
   * @param alphaMax α_max for the duration, rad
   * @param note how C6 was found, for findings
   */
  public record Correction(double c6, double alpha, double alphaMax, String note) {}

  /** α_max for a duration t (s): the exposure or, for a single pulse, the pulse. */
  public static double alphaMax(double t) {
    if (t < 625e-6) {
      return 5e-3;
    }
    return t <= 0.25 ? 0.2 * Math.sqrt(t) : 0.1;
  }

  /** T2 for subtense α (rad), s: 10 s up to α_min, 100 s from 100 mrad. */
  public static double t2(double alpha) {
    double mrad = Math.max(1.5, Math.min(alpha * 1e3, 100));
    return 10 * Math.pow(10, (mrad - 1.5) / 98.5);
  }

  /** C6 at subtense α (rad) and duration t (s), without regard to where it applies. */
  public static double c6(double alpha, double t) {
    if (!(alpha >= 0) || !(t > 0)) {
      throw new IllegalArgumentException("need alpha >= 0 and t > 0");
    }
    return Math.max(ALPHA_MIN, Math.min(alpha, alphaMax(t))) / ALPHA_MIN;
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
            "%s: C6 = %.3g (alpha_min 1.5 mrad, alpha_max %.3g mrad; IEC 60825-1:2014 Table 10,"
                + " from memory)",
            angle,
            c6,
            max * 1e3);
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
}
