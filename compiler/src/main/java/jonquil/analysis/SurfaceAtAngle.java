package jonquil.analysis;

import java.util.OptionalDouble;
import org.apache.commons.math3.complex.Complex;

/**
 * An interface as the light met it: the indices either side at the wavelength in use, the angle of
 * incidence, the power reflectances and transmittances the analysis used (with the coating, if
 * any), and the Brewster and critical angles of the bare indices.
 */
public record SurfaceAtAngle(
    double wavelength,
    double aoi,
    Complex n1,
    Complex n2,
    boolean coated,
    double rs,
    double rp,
    double ts,
    double tp) {

  /** Brewster's angle of the bare indices, tan θB = n2/n1 (real parts). */
  public OptionalDouble brewster() {
    double a = n1.getReal();
    double b = n2.getReal();
    return a > 0 && b > 0 ? OptionalDouble.of(Math.atan2(b, a)) : OptionalDouble.empty();
  }

  /** The critical angle of the bare indices, sin θc = n2/n1 when n2 &lt; n1 (real parts). */
  public OptionalDouble critical() {
    double a = n1.getReal();
    double b = n2.getReal();
    return a > 0 && b > 0 && b < a ? OptionalDouble.of(Math.asin(b / a)) : OptionalDouble.empty();
  }
}
