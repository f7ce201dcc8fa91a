package jonquil.safety;

/**
 * Why it exists: the eyewear optical density needed, stated twice because the two usual readings
 * differ by up to log10(2) and more for small beams.
 *
 * @param atAperture OD with the exposure averaged over the 7 mm limiting aperture (the standard's
 *     basis)
 * @param atPeak OD with the Gaussian peak 2P/(πw²) (worst case for beams larger than the aperture)
 * @param exposureAtAperture exposure averaged over the aperture, W/m² (cw) or J/m² per pulse
 * @param exposureAtPeak peak exposure, same unit
 * @param mpe the MPE compared with, same unit
 */
public record OpticalDensity(
    double atAperture,
    double atPeak,
    double exposureAtAperture,
    double exposureAtPeak,
    double mpe) {

  /** The caution that goes with every OD. */
  public String caution() {
    return Outcome.CAUTION;
  }
}
