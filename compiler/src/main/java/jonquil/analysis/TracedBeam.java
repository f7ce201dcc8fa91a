package jonquil.analysis;

import java.util.Optional;
import jonquil.optics.Coherency;
import jonquil.optics.beam.GaussianBeam;
import jonquil.resolve.Symbol;

/**
 * Light of one laser line at one point of the train: its polarization and power as a coherency
 * matrix (watts) in the beam's carried frame, the medium it runs in, and its Gaussian mode when the
 * source states one. Lines of one source are incoherent, so each travels as its own beam.
 */
public record TracedBeam(
    Symbol source,
    int line,
    double wavelength,
    Coherency light,
    BeamFrame frame,
    Medium medium,
    Optional<GaussianBeam> mode) {

  public TracedBeam with(Coherency next) {
    return new TracedBeam(source, line, wavelength, next, frame, medium, mode);
  }

  public TracedBeam with(Coherency next, BeamFrame nextFrame) {
    return new TracedBeam(source, line, wavelength, next, nextFrame, medium, mode);
  }

  public TracedBeam in(Medium next) {
    return new TracedBeam(source, line, wavelength, light, frame, next, mode);
  }

  public TracedBeam withMode(Optional<GaussianBeam> next) {
    return new TracedBeam(source, line, wavelength, light, frame, medium, next);
  }

  public double power() {
    return light.power();
  }
}
