package jonquil.analysis;

import java.util.Optional;
import jonquil.resolve.Param;
import jonquil.resolve.ResolvedElement;

/** The pulse train of a pulsed source: repetition rate and pulse duration (FWHM), both SI. */
public record Pulses(double repetitionRate, double duration) {
  /** The pulses of a source, when it states a duration and a rate (or energy and average power). */
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
    return Optional.empty();
  }

  /** Energy per pulse carried by an average power. */
  public double energy(double averagePower) {
    return averagePower / repetitionRate;
  }
}
