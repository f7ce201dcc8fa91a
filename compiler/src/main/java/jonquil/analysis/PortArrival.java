package jonquil.analysis;

import java.util.List;
import jonquil.optics.Interference;
import jonquil.optics.JonesVector;

/**
 * One beam of one laser line arriving at a place where another beam of that line arrives too (a
 * recombining splitter, a combiner's second input, a loop coming round): the line ({@link
 * #lineKey}), its vacuum wavelength (m), its field after its route (a Jones vector in the table
 * frame, as {@link PortValue} gives light, so that arrivals by different routes share one frame;
 * |E|² = watts; without the propagation phase, which interference takes as unknown), the optical
 * path from the source (m, Σ n·d) and, for partially polarized light, the second, mutually
 * incoherent polarized part ({@link jonquil.optics.Coherency#polarizedParts()}; zero otherwise).
 *
 * <p>{@code partsFollowed} says whether the two parts were each followed along the route, so that
 * part k of one arm meets part k of the other. The propagation carries coherency matrices, which
 * keep no such pairing: its arrivals of partially polarized light have it false, and their
 * visibility is not known (only an enclosure of their power range is).
 */
public record PortArrival(
    String line,
    double wavelength,
    JonesVector field,
    double opticalPath,
    JonesVector otherPart,
    boolean partsFollowed) {
  /** An arrival of fully polarized light. */
  public PortArrival(String line, double wavelength, JonesVector field, double opticalPath) {
    this(line, wavelength, field, opticalPath, JonesVector.ZERO, true);
  }

  /** An arrival whose two polarized parts were each followed along its route. */
  public PortArrival(
      String line, double wavelength, JonesVector field, double opticalPath, JonesVector other) {
    this(line, wavelength, field, opticalPath, other, true);
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

  /** Whether the light is partially polarized (it has a second polarized part). */
  public boolean partiallyPolarized() {
    return otherPart.power() > 0;
  }

  /** This arrival as one arm of an interference sum. */
  public Interference.Beam beam() {
    return new Interference.Beam(List.of(field, otherPart), opticalPath);
  }
}
