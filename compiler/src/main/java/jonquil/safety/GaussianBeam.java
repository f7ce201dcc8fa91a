package jonquil.safety;

/**
 * Why it exists: the beam geometry the safety figures assume: a round Gaussian beam, waist at the
 * exit, 1/e² diameter d(z) = √(d₀² + (φ z)²) with φ the full-angle 1/e² divergence (far-field
 * approximation).
 */
public final class GaussianBeam {
  private GaussianBeam() {}

  /** 1/e² diameter at distance z from the exit, m. */
  public static double diameterAt(double exitDiameter, double divergence, double z) {
    return Math.hypot(exitDiameter, divergence * z);
  }

  /**
   * Fraction of the power of a Gaussian beam of 1/e² radius w = d/2 that passes a centred circular
   * aperture of diameter D: 1 − exp(−D²/(2w²)) = 1 − exp(−2D²/d²) (integral of the Gaussian
   * profile).
   */
  public static double fractionThrough(double apertureDiameter, double beamDiameter) {
    double w = beamDiameter / 2;
    return -Math.expm1(-apertureDiameter * apertureDiameter / (2 * w * w));
  }

  /** Peak irradiance (or radiant exposure) of a Gaussian beam: 2P/(πw²), w = 1/e² radius. */
  public static double peak(double powerOrEnergy, double beamDiameter) {
    double w = beamDiameter / 2;
    return 2 * powerOrEnergy / (Math.PI * w * w);
  }

  /** Mean irradiance (or radiant exposure) over a centred circular aperture of diameter D. */
  public static double averagedOver(
      double powerOrEnergy, double beamDiameter, double apertureDiameter) {
    double area = Math.PI * apertureDiameter * apertureDiameter / 4;
    return powerOrEnergy * fractionThrough(apertureDiameter, beamDiameter) / area;
  }
}
