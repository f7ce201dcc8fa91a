package jonquil.analysis;

import java.nio.file.Path;
import java.util.Optional;
import jonquil.optics.Coherency;
import jonquil.optics.beam.GaussianBeam;
import jonquil.source.TextRange;

/**
 * The light leaving one port of one element (or arriving at a beam stop), summed over the source's
 * lines, with its polarization expressed in the table frame.
 */
public record PortValue(
    String element,
    String port,
    Path file,
    TextRange range,
    Coherency light,
    boolean vertical,
    Optional<GaussianBeam> mode,
    Optional<Pulses> pulses,
    double index,
    double wavelength) {
  public double power() {
    return light.power();
  }

  /** The exposure this light gives, when its beam size is known. */
  public Optional<BeamExposure> exposure() {
    return mode.map(m -> BeamExposure.of(power(), m.radius(), pulses, index));
  }

  /** The same light and beam with its power multiplied by {@code k} (a fringe of interference). */
  public PortValue scaledBy(double k) {
    return new PortValue(
        element, port, file, range, light.scaled(k), vertical, mode, pulses, index, wavelength);
  }

  /** "element.port", or the element alone for its only port. */
  public String key() {
    return port.isEmpty() ? element : element + "." + port;
  }
}
