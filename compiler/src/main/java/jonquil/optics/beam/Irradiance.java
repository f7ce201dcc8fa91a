package jonquil.optics.beam;

/**
 * The irradiance (or, for a pulse's energy, the radiant exposure) of a round Gaussian beam of 1/e²
 * radius W: its peak on axis, its mean over the 1/e² disc and its mean over a centred aperture, in
 * one place for the analyses and the safety figures alike.
 */
public final class Irradiance {
  private Irradiance() {}

  /**
   * On-axis peak 2P/(πW²) of a Gaussian profile carrying {@code powerOrEnergy} (Siegman 1986,
   * §17.1; Saleh &amp; Teich 2007, §3.1).
   */
  public static double peak(double powerOrEnergy, double beamRadius) {
    return 2 * powerOrEnergy / (Math.PI * beamRadius * beamRadius);
  }

  /** P/(πW²): the power spread evenly over the 1/e² disc, half the peak. */
  public static double mean(double power, double beamRadius) {
    return power / (Math.PI * beamRadius * beamRadius);
  }

  /**
   * Mean over a centred circular aperture of diameter D: the part the aperture passes ({@link
   * Clipping#transmittedFraction}) divided by its area πD²/4, as an exposure limit averaged over a
   * limiting aperture reads it.
   */
  public static double meanOverAperture(
      double powerOrEnergy, double beamRadius, double apertureDiameter) {
    double area = Math.PI * apertureDiameter * apertureDiameter / 4;
    return powerOrEnergy * Clipping.transmittedFraction(beamRadius, apertureDiameter) / area;
  }
}
