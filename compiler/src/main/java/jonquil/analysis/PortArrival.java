package jonquil.analysis;

import java.util.List;
import jonquil.optics.Interference;
import jonquil.optics.JonesVector;

/**
 * One beam of one laser line arriving at a port where beams of that line meet again: the line
 * ({@link #lineKey}), its vacuum wavelength (m), its field after its route (a Jones vector in the
 * table frame, as {@link PortValue} gives light, so that arrivals by different routes share one
 * frame; |E|² = watts; without the propagation phase), the optical path from the source (m, Σ n·d)
 * and, for partially polarized light, the second, mutually incoherent polarized part after the same
 * route ({@link jonquil.optics.Coherency#polarizedParts()}; zero otherwise).
 */
public record PortArrival(
    String line, double wavelength, JonesVector field, double opticalPath, JonesVector otherPart) {
  /** An arrival of fully polarized light. */
  public PortArrival(String line, double wavelength, JonesVector field, double opticalPath) {
    this(line, wavelength, field, opticalPath, JonesVector.ZERO);
  }

  /** "source#index": the line of a source, counted from 0 as {@link TracedBeam#line()} does. */
  public static String lineKey(String source, int line) {
    return source + "#" + line;
  }

  /** The name of the source that emits this line. */
  public String source() {
    int hash = line.lastIndexOf('#');
    return hash < 0 ? line : line.substring(0, hash);
  }

  public double power() {
    return field.power() + otherPart.power();
  }

  /** This arrival as one arm of an interference sum. */
  public Interference.Beam beam() {
    return new Interference.Beam(List.of(field, otherPart), opticalPath);
  }
}
