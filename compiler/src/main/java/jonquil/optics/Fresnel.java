package jonquil.optics;

import java.util.OptionalDouble;
import org.apache.commons.math3.complex.Complex;

/** Reflection and transmission at one plane interface, under the package's sign conventions. */
public final class Fresnel {
  private Fresnel() {}

  /**
   * Amplitude and power coefficients of an interface (or of a whole stack, for {@link ThinFilm}).
   * Powers are fractions of the incident power; T is the normal Poynting flux leaving the last
   * interface.
   */
  public record Coefficients(
      Complex rs, Complex rp, Complex ts, Complex tp, double Rs, double Rp, double Ts, double Tp) {}

  /**
   * Coefficients for light in medium n1 meeting medium n2 at angle of incidence {@code aoi}
   * (radians, 0 ≤ aoi ≤ π/2). The incidence medium should be lossless; n2 may absorb.
   */
  public static Coefficients at(Complex n1, Complex n2, double aoi) {
    requireAngle(aoi);
    Complex u = n1.multiply(Math.sin(aoi));
    Complex xi1 = normalComponent(n1, u);
    Complex xi2 = normalComponent(n2, u);
    Complex n1sq = n1.multiply(n1);
    Complex n2sq = n2.multiply(n2);
    // Written with ξ = n cos θ so that nothing divides by n2 and the branch is chosen once.
    Complex rs = xi1.subtract(xi2).divide(xi1.add(xi2));
    Complex pNum = n2sq.multiply(xi1);
    Complex pOther = n1sq.multiply(xi2);
    Complex rp = pNum.subtract(pOther).divide(pNum.add(pOther));
    Complex ts = xi1.multiply(2).divide(xi1.add(xi2));
    Complex tp = n1.multiply(n2).multiply(xi1).multiply(2).divide(pNum.add(pOther));
    return coefficients(n1, xi1, n2, xi2, rs, rp, ts, tp);
  }

  /** Brewster's angle, atan(n2/n1), where Rp vanishes for lossless media. */
  public static double brewsterAngle(double n1, double n2) {
    requireIndex(n1);
    requireIndex(n2);
    return Math.atan2(n2, n1);
  }

  /** The critical angle asin(n2/n1) when going to a lower index, else empty. */
  public static OptionalDouble criticalAngle(double n1, double n2) {
    requireIndex(n1);
    requireIndex(n2);
    return n2 < n1 ? OptionalDouble.of(Math.asin(n2 / n1)) : OptionalDouble.empty();
  }

  /** arg(rp) − arg(rs) in (−π, π]: the phase a reflection adds to p relative to s. */
  public static double retardance(Coefficients c) {
    double d = c.rp().getArgument() - c.rs().getArgument();
    d = Math.IEEEremainder(d, 2 * Math.PI);
    return d <= -Math.PI ? d + 2 * Math.PI : d;
  }

  /**
   * ξ = n cos θ = √(n² − u²) for the invariant u = n1 sin θi, on the branch where the wave leaves
   * the interface: Re ξ ≥ 0 for a propagating wave, Im ξ ≥ 0 for an evanescent one.
   */
  static Complex normalComponent(Complex n, Complex u) {
    Complex radicand = n.multiply(n).subtract(u.multiply(u));
    double im = radicand.getImaginary();
    // For passive media Im(n² − u²) ≥ 0 exactly; a tiny negative part is rounding (e.g. from a
    // complex sine in a lossless layer) and must not flip a propagating wave to the backward root.
    if (im <= 0 && -im <= 1e-12 * radicand.abs()) {
      radicand = new Complex(radicand.getReal(), 0.0);
    }
    Complex xi = radicand.sqrt();
    // Principal roots have Re ≥ 0: a wave carrying power away from the interface. Flip only
    // when the root is mostly evanescent and would grow (Im < 0 dominating): that is total
    // reflection seen through an absorbing incidence medium, whose small loss tilts n² − u²
    // below the real axis. A propagating wave keeps Re ≥ 0 even then.
    boolean growingEvanescent = xi.getImaginary() < 0 && -xi.getImaginary() > xi.getReal();
    if (growingEvanescent || (xi.getImaginary() == 0 && xi.getReal() < 0)) {
      xi = xi.negate();
    }
    return xi;
  }

  /** Bundles amplitudes with the power fractions they imply, shared with the stack method. */
  static Coefficients coefficients(
      Complex n1,
      Complex xi1,
      Complex n2,
      Complex xi2,
      Complex rs,
      Complex rp,
      Complex ts,
      Complex tp) {
    double rsAbs = rs.abs();
    double rpAbs = rp.abs();
    double tsAbs = ts.abs();
    double tpAbs = tp.abs();
    double inS = xi1.getReal();
    double inP = pFlux(n1, xi1);
    double ts2 = inS > 0 ? Math.max(0, xi2.getReal()) / inS * tsAbs * tsAbs : 0;
    double tp2 = inP > 0 ? Math.max(0, pFlux(n2, xi2)) / inP * tpAbs * tpAbs : 0;
    return new Coefficients(rs, rp, ts, tp, rsAbs * rsAbs, rpAbs * rpAbs, ts2, tp2);
  }

  /** Re(n* cos θ) = Re(n* ξ / n): the normal Poynting flux of a p wave per |E|². */
  private static double pFlux(Complex n, Complex xi) {
    return n.conjugate().multiply(xi).divide(n).getReal();
  }

  static void requireAngle(double aoi) {
    if (!(aoi >= 0 && aoi <= Math.PI / 2)) {
      throw new IllegalArgumentException("angle of incidence must be in [0, π/2] radians: " + aoi);
    }
  }

  private static void requireIndex(double n) {
    if (!(n > 0) || Double.isInfinite(n)) {
      throw new IllegalArgumentException("refractive index must be positive and finite: " + n);
    }
  }
}
