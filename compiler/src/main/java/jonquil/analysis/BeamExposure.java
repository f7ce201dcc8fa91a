package jonquil.analysis;

import java.util.OptionalDouble;
import jonquil.optics.beam.Irradiance;

/**
 * What a beam delivers at one plane, from its power, its 1/e² radius w and its pulses: average
 * irradiance P/(πw²), the Gaussian peak 2P/(πw²), and for pulsed beams the pulse energy, peak power
 * E/τ and peak fluence 2E/(πw²); the peak electric field amplitude follows from I = ½ n ε₀ c |E₀|²
 * in the local medium.
 */
public record BeamExposure(
    double power,
    double beamRadius,
    double averageIrradiance,
    double peakIrradiance,
    OptionalDouble pulseEnergy,
    OptionalDouble peakPower,
    OptionalDouble peakFluence,
    double peakField,
    double index) {

  /**
   * The irradiance at its peak in time and space (what 'peak irradiance' means): 2P/(πw²) with the
   * pulse's peak power for a pulsed beam; for a continuous one, {@link #peakIrradiance}, the
   * spatial peak of the average.
   */
  public double timeAndSpacePeakIrradiance() {
    return peakPower.isPresent()
        ? Irradiance.peak(peakPower.getAsDouble(), beamRadius)
        : peakIrradiance;
  }

  /** Vacuum permittivity, F/m (CODATA 2018 recommended value). */
  public static final double EPSILON_0 = 8.8541878128e-12;

  /** Speed of light in vacuum, m/s (exact by definition of the metre, SI 2019). */
  public static final double C = 299_792_458.0;

  public static BeamExposure of(
      double power, double radius, java.util.Optional<Pulses> pulses, double index) {
    double average = Irradiance.mean(power, radius);
    double peak = Irradiance.peak(power, radius);
    OptionalDouble energy = OptionalDouble.empty();
    OptionalDouble peakPower = OptionalDouble.empty();
    OptionalDouble fluence = OptionalDouble.empty();
    double fieldIrradiance = peak;
    if (pulses.isPresent()) {
      double e = pulses.get().energy(power);
      double pp = e / pulses.get().duration();
      energy = OptionalDouble.of(e);
      peakPower = OptionalDouble.of(pp);
      fluence = OptionalDouble.of(Irradiance.peak(e, radius));
      fieldIrradiance = Irradiance.peak(pp, radius);
    }
    return new BeamExposure(
        power,
        radius,
        average,
        peak,
        energy,
        peakPower,
        fluence,
        peakField(fieldIrradiance, index),
        index);
  }

  /** |E₀| = √(2I/(n ε₀ c)), in V/m. */
  public static double peakField(double irradiance, double index) {
    return Math.sqrt(2 * irradiance / (index * EPSILON_0 * C));
  }

  public boolean pulsed() {
    return pulseEnergy.isPresent();
  }
}
