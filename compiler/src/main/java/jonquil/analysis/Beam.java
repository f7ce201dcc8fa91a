package jonquil.analysis;

import jonquil.optics.Coherency;
import jonquil.resolve.Symbol;

/**
 * Light of one laser line at one point of the train: its polarization and power as a
 * coherency matrix (watts) in the beam's carried frame, and the medium it runs in.
 * Lines of one source are incoherent, so each travels as its own Beam.
 */
public record Beam(Symbol source, int line, double wavelength, Coherency light, BeamFrame frame, Medium medium) {
  public Beam with(Coherency next) {
    return new Beam(source, line, wavelength, next, frame, medium);
  }

  public Beam with(Coherency next, BeamFrame nextFrame) {
    return new Beam(source, line, wavelength, next, nextFrame, medium);
  }

  public Beam in(Medium next) {
    return new Beam(source, line, wavelength, light, frame, next);
  }

  public double power() {
    return light.power();
  }
}
