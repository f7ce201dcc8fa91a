package jonquil.analysis;

import java.util.Optional;
import jonquil.optics.Coherency;
import jonquil.optics.beam.GaussianBeam;
import jonquil.resolve.Symbol;

/**
 * Light of one laser line at one point of the train: its polarization and power as a coherency
 * matrix (watts) in the beam's carried frame, the medium it runs in, its Gaussian mode when the
 * source states one, and the optical path (Σ n·L over the distances, metres) it has run since its
 * source. Lines of one source are incoherent, so each travels as its own beam.
 */
public record TracedBeam(
    Symbol source,
    int line,
    double wavelength,
    Coherency light,
    BeamFrame frame,
    Medium medium,
    Optional<GaussianBeam> mode,
    double opticalPath) {

  public TracedBeam with(Coherency next) {
    return new TracedBeam(source, line, wavelength, next, frame, medium, mode, opticalPath);
  }

  public TracedBeam with(Coherency next, BeamFrame nextFrame) {
    return new TracedBeam(source, line, wavelength, next, nextFrame, medium, mode, opticalPath);
  }

  public TracedBeam in(Medium next) {
    return new TracedBeam(source, line, wavelength, light, frame, next, mode, opticalPath);
  }

  public TracedBeam withMode(Optional<GaussianBeam> next) {
    return new TracedBeam(source, line, wavelength, light, frame, medium, next, opticalPath);
  }

  /** The same beam after running a further optical path {@code nl} (metres). */
  public TracedBeam advanced(double nl) {
    return new TracedBeam(source, line, wavelength, light, frame, medium, mode, opticalPath + nl);
  }

  public double power() {
    return light.power();
  }
}
