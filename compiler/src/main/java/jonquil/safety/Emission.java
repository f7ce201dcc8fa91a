package jonquil.safety;

/**
 * Why it exists: the laser output the safety figures are computed from, in SI units.
 *
 * @param wavelength vacuum wavelength, m
 * @param averagePower time-averaged power, W (for a single pulse: 0)
 * @param pulseEnergy energy per pulse, J (0 for continuous wave)
 * @param pulseDuration pulse duration (FWHM), s (0 for continuous wave)
 * @param repetitionRate pulse repetition rate, Hz (0 for continuous wave or a single pulse)
 */
public record Emission(
    double wavelength,
    double averagePower,
    double pulseEnergy,
    double pulseDuration,
    double repetitionRate) {

  public Emission {
    requireFinite(wavelength, "wavelength");
    requireFinite(averagePower, "averagePower");
    requireFinite(pulseEnergy, "pulseEnergy");
    requireFinite(pulseDuration, "pulseDuration");
    requireFinite(repetitionRate, "repetitionRate");
    if (!(wavelength > 0)) {
      throw new IllegalArgumentException("wavelength must be > 0 m");
    }
    if (averagePower < 0 || pulseEnergy < 0 || pulseDuration < 0 || repetitionRate < 0) {
      throw new IllegalArgumentException("power, energy, duration and rate must be >= 0");
    }
    if (pulseDuration > 0 && pulseEnergy == 0) {
      throw new IllegalArgumentException("a pulsed emission needs a pulse energy");
    }
    if (pulseDuration == 0 && (pulseEnergy > 0 || repetitionRate > 0)) {
      throw new IllegalArgumentException("pulse energy or rate given without a pulse duration");
    }
  }

  /** A continuous-wave emission. */
  public static Emission continuous(double wavelength, double power) {
    return new Emission(wavelength, power, 0, 0, 0);
  }

  /** A repetitively pulsed emission; the average power is energy × rate. */
  public static Emission pulseTrain(
      double wavelength, double pulseEnergy, double pulseDuration, double repetitionRate) {
    return new Emission(
        wavelength, pulseEnergy * repetitionRate, pulseEnergy, pulseDuration, repetitionRate);
  }

  /** A single pulse. */
  public static Emission singlePulse(double wavelength, double pulseEnergy, double pulseDuration) {
    return new Emission(wavelength, 0, pulseEnergy, pulseDuration, 0);
  }

  public boolean pulsed() {
    return pulseDuration > 0;
  }

  public boolean singlePulseOnly() {
    return pulsed() && repetitionRate == 0;
  }

  private static void requireFinite(double v, String name) {
    if (!Double.isFinite(v)) {
      throw new IllegalArgumentException(name + " must be finite");
    }
  }

  /**
   * Why a pulse train cannot be judged as pulses over an exposure duration, or null when it can:
   * both standards' pulse rules assume pulses shorter than their spacing and the exposure.
   */
  public String trainProblem(double exposureDuration) {
    if (pulseDuration() * repetitionRate() >= 1) {
      return "pulse duration × repetition rate ≥ 1: treat the emission as continuous wave";
    }
    if (pulseDuration() > exposureDuration) {
      return "pulse longer than the exposure duration";
    }
    return null;
  }
}
