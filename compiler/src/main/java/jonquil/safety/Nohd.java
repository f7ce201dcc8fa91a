package jonquil.safety;

/**
 * Why it exists: the nominal ocular hazard distance, the distance beyond which the beam no longer
 * exceeds the ocular MPE: NOHD = (√(4P/(π·MPE)) − a)/φ (ANSI Z136.1-2014, section 3 hazard
 * evaluation, NOHD formula for a circular beam; IEC TR 60825-14:2004 (Ed. 1), clause on the NOHD —
 * formula confirmed by university laser-safety guidance, e.g. the UNIRPA "Guide to calculating
 * nominal optical hazard distance"; the clause numbers are from memory). For pulses P is the
 * per-pulse energy and MPE the per-pulse radiant-exposure MPE.
 */
public final class Nohd {
  private Nohd() {}

  static final String FORMULA =
      "NOHD = (sqrt(4P/(pi MPE)) - a)/phi, ANSI Z136.1-2014 / IEC TR 60825-14:2004 (Ed. 1)";

  /**
   * The bare formula, with a and φ as the standard defines them (ANSI Z136.1: diameter and
   * divergence at the 1/e irradiance points). 0 when the beam is below the MPE at the exit; +∞ for
   * a hazardous beam that does not diverge.
   *
   * @param powerOrEnergy W (cw, MPE in W/m²) or J per pulse (MPE in J/m²)
   * @param exitDiameter a, m
   * @param divergence φ, full angle, rad
   * @param mpe W/m² or J/m², same basis as powerOrEnergy
   */
  public static Outcome<Double> forLimit(
      double powerOrEnergy, double exitDiameter, double divergence, double mpe) {
    if (!(mpe > 0) || !(powerOrEnergy >= 0) || !(exitDiameter >= 0) || !(divergence >= 0)) {
      throw new IllegalArgumentException(
          "need mpe > 0 and non-negative power, diameter, divergence");
    }
    double hazardDiameter = Math.sqrt(4 * powerOrEnergy / (Math.PI * mpe));
    if (hazardDiameter <= exitDiameter) {
      return Outcome.of(0.0, FORMULA);
    }
    if (divergence == 0) {
      return Outcome.of(Double.POSITIVE_INFINITY, FORMULA);
    }
    return Outcome.of((hazardDiameter - exitDiameter) / divergence, FORMULA);
  }

  /**
   * NOHD of a Gaussian beam given by its 1/e² exit diameter and full-angle 1/e² divergence, with
   * the ocular MPE of {@link OcularMpe} for the exposure duration. The 1/e² values are converted to
   * the 1/e values the formula uses (÷√2), which makes P/(π a²/4) the beam's peak irradiance —
   * conservative against the 7 mm aperture average.
   */
  public static Outcome<Double> of(
      Emission e, double exitDiameter1e2, double divergence1e2, double exposureDuration) {
    return of(OcularLimit.IEC, e, exitDiameter1e2, divergence1e2, exposureDuration);
  }

  /** As above, against {@code limit}'s MPE. */
  public static Outcome<Double> of(
      OcularLimit limit,
      Emission e,
      double exitDiameter1e2,
      double divergence1e2,
      double exposureDuration) {
    Outcome<MaximumPermissibleExposure> mpe = limit.at(e, exposureDuration);
    String standard = FORMULA + "; MPE: " + mpe.standard();
    if (!mpe.evaluated()) {
      return Outcome.notEvaluated(mpe.reason(), standard);
    }
    double a = exitDiameter1e2 / Math.sqrt(2);
    double phi = divergence1e2 / Math.sqrt(2);
    Outcome<Double> d =
        e.pulsed()
            ? forLimit(e.pulseEnergy(), a, phi, mpe.get().radiantExposure())
            : forLimit(e.averagePower(), a, phi, mpe.get().irradiance());
    return Outcome.of(d.get(), standard);
  }

  static final String SPECULAR =
      "specular: the reflected beam is the beam with rho P (ANSI Z136.1-2014, specular-reflection"
          + " NHZ; IEC TR 60825-14:2004; from memory)";

  static final String DIFFUSE =
      "NOHD = sqrt(rho P cos(theta)/(pi MPE)), Lambertian reflection (ANSI Z136.1-2014, diffuse"
          + " reflection NHZ; IEC TR 60825-14:2004; equation numbers from memory)";

  /**
   * NOHD of a mirror-like reflection of the beam, measured along the beam's path from the exit: the
   * beam with its power scaled by the reflectance ρ, which a flat mirror leaves unchanged in size
   * and divergence.
   */
  public static Outcome<Double> specular(
      Emission e,
      double exitDiameter1e2,
      double divergence1e2,
      double exposureDuration,
      double reflectance) {
    return specular(
        OcularLimit.IEC, e, exitDiameter1e2, divergence1e2, exposureDuration, reflectance);
  }

  /** As above, against {@code limit}'s MPE. */
  public static Outcome<Double> specular(
      OcularLimit limit,
      Emission e,
      double exitDiameter1e2,
      double divergence1e2,
      double exposureDuration,
      double reflectance) {
    requireReflectance(reflectance);
    if (reflectance == 0) {
      return Outcome.of(0.0, SPECULAR);
    }
    Emission reflected = scaled(e, reflectance);
    Outcome<Double> d = of(limit, reflected, exitDiameter1e2, divergence1e2, exposureDuration);
    String standard = d.standard() + "; " + SPECULAR;
    return d.evaluated()
        ? Outcome.of(d.get(), standard)
        : Outcome.notEvaluated(d.reason(), standard);
  }

  /**
   * The bare Lambertian formula: the distance from a diffusely reflecting spot beyond which the
   * irradiance ρ P cos θ/(π r²) of a perfect diffuser stays below the MPE. The spot is taken as a
   * point source, which is never lenient (its C6 would only raise the MPE).
   *
   * @param powerOrEnergy W (cw, MPE in W/m²) or J per pulse (MPE in J/m²) reaching the spot
   * @param reflectance ρ, 0 to 1
   * @param cosTheta cosine of the viewing angle from the surface normal
   * @param mpe same basis as powerOrEnergy
   */
  public static Outcome<Double> diffuseForLimit(
      double powerOrEnergy, double reflectance, double cosTheta, double mpe) {
    requireReflectance(reflectance);
    if (!(mpe > 0) || !(powerOrEnergy >= 0) || !(cosTheta >= 0 && cosTheta <= 1)) {
      throw new IllegalArgumentException("need mpe > 0, power >= 0 and 0 <= cos theta <= 1");
    }
    return Outcome.of(Math.sqrt(reflectance * powerOrEnergy * cosTheta / (Math.PI * mpe)), DIFFUSE);
  }

  /**
   * NOHD of a diffuse reflection of the whole emission, viewed along the normal (cos θ = 1, the
   * worst case), measured from the reflecting spot.
   */
  public static Outcome<Double> diffuse(Emission e, double exposureDuration, double reflectance) {
    return diffuse(OcularLimit.IEC, e, exposureDuration, reflectance);
  }

  /** As above, against {@code limit}'s MPE. */
  public static Outcome<Double> diffuse(
      OcularLimit limit, Emission e, double exposureDuration, double reflectance) {
    Outcome<MaximumPermissibleExposure> mpe = limit.at(e, exposureDuration);
    String standard = DIFFUSE + "; point-source MPE, conservative; MPE: " + mpe.standard();
    if (!mpe.evaluated()) {
      return Outcome.notEvaluated(mpe.reason(), standard);
    }
    Outcome<Double> d =
        e.pulsed()
            ? diffuseForLimit(e.pulseEnergy(), reflectance, 1, mpe.get().radiantExposure())
            : diffuseForLimit(e.averagePower(), reflectance, 1, mpe.get().irradiance());
    return Outcome.of(d.get(), standard);
  }

  /** The emission with its power (and pulse energy) scaled by a reflectance. */
  static Emission scaled(Emission e, double reflectance) {
    return new Emission(
        e.wavelength(),
        e.averagePower() * reflectance,
        e.pulseEnergy() * reflectance,
        e.pulseDuration(),
        e.repetitionRate());
  }

  private static void requireReflectance(double r) {
    if (!(r >= 0 && r <= 1)) {
      throw new IllegalArgumentException("reflectance must be within 0..1");
    }
  }
}
