package jonquil.analysis;

import java.util.OptionalDouble;
import jonquil.resolve.Param;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.Value;
import jonquil.safety.DamageScaling;
import jonquil.units.Dimension;

/**
 * The damage margin of a part: its declared thresholds divided by the exposure it takes (the light
 * arriving at it). Continuous thresholds compare with the Gaussian peak irradiance, or with P/(2w)
 * for linear power density (common practice: power over the 1/e² diameter); pulsed fluence
 * thresholds are scaled to the actual pulse duration and wavelength (√τ and λ rules, common
 * practice) and compared with the peak fluence.
 */
final class DamageModel {
  private DamageModel() {}

  /**
   * The smallest margin over the part's thresholds that apply to this beam; empty when none does.
   */
  static OptionalDouble margin(ResolvedElement part, PortValue incident, double wavelength) {
    if (part.all(Param.DAMAGE).isEmpty()
        || incident.exposure().isEmpty()
        || incident.power() <= 0) {
      return OptionalDouble.empty();
    }
    BeamExposure x = incident.exposure().get();
    double worst = Double.POSITIVE_INFINITY;
    for (Value.Group threshold : part.all(Param.DAMAGE)) {
      if (!(threshold.slot("threshold").orElse(null) instanceof Value.Num t)) {
        continue;
      }
      double margin = Double.NaN;
      if (t.dimension().equals(Dimension.IRRADIANCE)) {
        margin = t.si() / x.peakIrradiance();
      } else if (t.dimension().equals(Dimension.LINEAR_POWER_DENSITY)) {
        margin = t.si() / (x.power() / (2 * x.beamRadius()));
      } else if (t.dimension().equals(Dimension.FLUENCE) && x.pulsed()) {
        double stated = t.si();
        OptionalDouble tau = threshold.number("duration");
        double atWavelength = threshold.number("wavelength").orElse(wavelength);
        double scaled = stated;
        if (tau.isPresent()) {
          var s =
              DamageScaling.pulsedFluence(
                  stated,
                  tau.getAsDouble(),
                  atWavelength,
                  incident.pulses().orElseThrow().duration(),
                  wavelength);
          if (!s.evaluated()) {
            continue; // outside the scaling rule's window: this threshold says nothing about this
            // pulse
          }
          scaled = s.get();
        }
        margin = scaled / x.peakFluence().getAsDouble();
      }
      if (!Double.isNaN(margin)) {
        worst = Math.min(worst, margin);
      }
    }
    return Double.isInfinite(worst) ? OptionalDouble.empty() : OptionalDouble.of(worst);
  }
}
