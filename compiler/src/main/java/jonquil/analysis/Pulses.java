package jonquil.analysis;

import java.util.Optional;
import jonquil.resolve.Param;
import jonquil.resolve.ResolvedElement;

/**
 * The pulses of a pulsed source: repetition rate and pulse duration (FWHM), both SI. A rate of 0 is
 * a single pulse, which the train carries at its peak power E/τ (the rectangular-equivalent peak
 * power, by definition), since it has no average power.
 */
public record Pulses(double repetitionRate, double duration) {
  /**
   * The pulses of a source: a duration with a rate (or with energy and average power), or a single
   * pulse (energy and duration alone).
   */
  static Optional<Pulses> of(ResolvedElement source) {
    var duration = source.number(Param.PULSE_DURATION, "duration");
    if (duration.isEmpty()) {
      return Optional.empty();
    }
    var rate = source.number(Param.REPETITION_RATE, "rate");
    if (rate.isPresent()) {
      return Optional.of(new Pulses(rate.getAsDouble(), duration.getAsDouble()));
    }
    var energy = source.number(Param.PULSE_ENERGY, "energy");
    var power = source.number(Param.POWER, "power");
    if (energy.isPresent() && power.isPresent() && energy.getAsDouble() > 0) {
      return Optional.of(
          new Pulses(power.getAsDouble() / energy.getAsDouble(), duration.getAsDouble()));
    }
    if (energy.isPresent() && power.isEmpty()) {
      return Optional.of(new Pulses(0, duration.getAsDouble()));
    }
    return Optional.empty();
  }

  public boolean single() {
    return repetitionRate == 0;
  }

  /**
   * Energy per pulse carried by a traced power: the average power over the rate, or for a single
   * pulse its peak power times its duration.
   */
  public double energy(double tracedPower) {
    return single() ? tracedPower * duration : tracedPower / repetitionRate;
  }
}
