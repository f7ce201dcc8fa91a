package jonquil.analysis;

import java.nio.file.Path;
import jonquil.optics.Coherency;
import jonquil.source.TextRange;

/**
 * The light leaving one port of one element (or arriving at a beam stop), summed over
 * the source's lines, with its polarization expressed in the table frame.
 */
public record PortValue(String element, String port, Path file, TextRange range, Coherency light, boolean vertical) {
  public double power() {
    return light.power();
  }

  /** "element.port", or the element alone for its only port. */
  public String key() {
    return port.isEmpty() ? element : element + "." + port;
  }
}
