package jonquil.analysis;

import java.nio.file.Path;
import java.util.OptionalDouble;
import jonquil.source.TextRange;

/**
 * Light that leaves the train without reaching a probe, a detector or a dump; the vacuum wavelength
 * of its line when it is one line's (a ghost), empty when it sums every line at a port.
 */
public record StrayBeam(
    String origin,
    String description,
    double power,
    boolean backward,
    Path file,
    TextRange range,
    OptionalDouble wavelength) {

  /** A stray beam that carries every line leaving one port, summed. */
  public StrayBeam(
      String origin,
      String description,
      double power,
      boolean backward,
      Path file,
      TextRange range) {
    this(origin, description, power, backward, file, range, OptionalDouble.empty());
  }
}
