package jonquil.safety;

import jonquil.optics.beam.Irradiance;

/**
 * Why it exists: the optical density protective eyewear needs, OD = log10(H/MPE), where H is the
 * anticipated exposure (ANSI Z136.1-2014, eyewear OD formula; EN 207 uses the same ratio — clause
 * numbers from memory; formula and worked example confirmed by a university laser-safety "Sample
 * calculations" appendix, see EyewearTest). Never negative: 0 means the exposure is already at or
 * below the MPE.
 */
public final class Eyewear {
  private Eyewear() {}

  static final String FORMULA = "OD = log10(H/MPE), ANSI Z136.1-2014 (eyewear)";

  /** The bare formula; exposure and MPE in the same unit. */
  public static Outcome<Double> forLimit(double exposure, double mpe) {
    if (!(mpe > 0) || !(exposure >= 0)) {
      throw new IllegalArgumentException("need mpe > 0 and exposure >= 0");
    }
    return Outcome.of(od(exposure, mpe), FORMULA);
  }

  /**
   * OD for the direct beam at the point where its 1/e² diameter is beamDiameter: averaged over the
   * 7 mm aperture and at the Gaussian peak. cw: irradiance against the irradiance MPE; pulsed:
   * per-pulse radiant exposure against the per-pulse MPE.
   */
  public static Outcome<OpticalDensity> required(
      Emission e, double beamDiameter, double exposureDuration) {
    if (!(beamDiameter > 0)) {
      throw new IllegalArgumentException("beam diameter must be > 0 m");
    }
    Outcome<MaximumPermissibleExposure> mpe = OcularMpe.at(e, exposureDuration);
    String standard = FORMULA + "; MPE: " + mpe.standard();
    if (!mpe.evaluated()) {
      return Outcome.notEvaluated(mpe.reason(), standard);
    }
    double q = e.pulsed() ? e.pulseEnergy() : e.averagePower();
    double limit = e.pulsed() ? mpe.get().radiantExposure() : mpe.get().irradiance();
    double ap = Irradiance.meanOverAperture(q, beamDiameter / 2, OcularMpe.LIMITING_APERTURE);
    double peak = Irradiance.peak(q, beamDiameter / 2);
    return Outcome.of(
        new OpticalDensity(od(ap, limit), od(peak, limit), ap, peak, limit), standard);
  }

  private static double od(double exposure, double mpe) {
    return exposure <= mpe ? 0.0 : Math.log10(exposure / mpe);
  }
}
