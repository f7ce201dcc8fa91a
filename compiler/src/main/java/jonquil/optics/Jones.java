package jonquil.optics;

import java.util.Locale;
import org.apache.commons.math3.complex.Complex;

/** A Jones matrix kept in eight primitive doubles, because chains of them are the hot path. */
public final class Jones {
  /** The element that leaves every polarization state unchanged. */
  public static final Jones IDENTITY = new Jones(1, 0, 0, 0, 0, 0, 1, 0);

  private final double aRe;
  private final double aIm;
  private final double bRe;
  private final double bIm;
  private final double cRe;
  private final double cIm;
  private final double dRe;
  private final double dIm;

  private Jones(
      double aRe,
      double aIm,
      double bRe,
      double bIm,
      double cRe,
      double cIm,
      double dRe,
      double dIm) {
    this.aRe = aRe;
    this.aIm = aIm;
    this.bRe = bRe;
    this.bIm = bIm;
    this.cRe = cRe;
    this.cIm = cIm;
    this.dRe = dRe;
    this.dIm = dIm;
  }

  /** The matrix [[a, b], [c, d]]; rejects NaN and infinities. */
  public static Jones of(Complex a, Complex b, Complex c, Complex d) {
    for (Complex entry : new Complex[] {a, b, c, d}) {
      if (!Double.isFinite(entry.getReal()) || !Double.isFinite(entry.getImaginary())) {
        throw new IllegalArgumentException("Jones matrix entries must be finite");
      }
    }
    return new Jones(
        a.getReal(),
        a.getImaginary(),
        b.getReal(),
        b.getImaginary(),
        c.getReal(),
        c.getImaginary(),
        d.getReal(),
        d.getImaginary());
  }

  /** diag(p, s): independent complex factors on x' and y'. */
  public static Jones diagonal(double pRe, double pIm, double sRe, double sIm) {
    return of(new Complex(pRe, pIm), Complex.ZERO, Complex.ZERO, new Complex(sRe, sIm));
  }

  /** R(θ) = [[cos θ, −sin θ], [sin θ, cos θ]]. */
  public static Jones rotation(double theta) {
    requireFinite(theta, "angle");
    double c = Math.cos(theta);
    double s = Math.sin(theta);
    return new Jones(c, 0, -s, 0, s, 0, c, 0);
  }

  /**
   * A linear retarder: fast axis at {@code fastAxis}, the slow component delayed by {@code
   * retardance}.
   */
  public static Jones retarder(double retardance, double fastAxis) {
    requireFinite(retardance, "retardance");
    return diagonal(1, 0, Math.cos(retardance), Math.sin(retardance)).rotatedBy(fastAxis);
  }

  /**
   * A linear polarizer (diattenuator): power transmittance T along {@code axis} and T/ER across it;
   * ER may be infinite for an ideal polarizer.
   */
  public static Jones polarizer(
      double axis, double principalTransmittance, double extinctionRatio) {
    if (!(principalTransmittance >= 0 && principalTransmittance <= 1)) {
      throw new IllegalArgumentException(
          "principal transmittance must be in [0, 1]: " + principalTransmittance);
    }
    if (!(extinctionRatio >= 1)) {
      throw new IllegalArgumentException("extinction ratio must be at least 1: " + extinctionRatio);
    }
    double across =
        Double.isInfinite(extinctionRatio)
            ? 0
            : Math.sqrt(principalTransmittance / extinctionRatio);
    return diagonal(Math.sqrt(principalTransmittance), 0, across, 0).rotatedBy(axis);
  }

  /**
   * A rotator (optical activity, Faraday rotation in one pass): turns the field by {@code angle}.
   */
  public static Jones rotator(double angle) {
    return rotation(angle);
  }

  /**
   * A reflection, R(φ)·diag(rp, rs)·R(−φ), with the plane of incidence at azimuth φ (p along φ, s
   * along φ + 90°), expressed in the reflected beam's frame that keeps the s axis.
   */
  public static Jones reflection(Complex rp, Complex rs, double planeAzimuth) {
    return diagonal(rp.getReal(), rp.getImaginary(), rs.getReal(), rs.getImaginary())
        .rotatedBy(planeAzimuth);
  }

  /**
   * A transmission through an interface, with amplitudes scaled by √(power factor) so that |J·E|²
   * is the transmitted power (the factor is Re(n2 cos θt)/Re(n1 cos θi) or its p form).
   */
  public static Jones transmission(
      Complex tp, Complex ts, double planeAzimuth, double powerFactorP, double powerFactorS) {
    if (!(powerFactorP >= 0)
        || !(powerFactorS >= 0)
        || Double.isInfinite(powerFactorP)
        || Double.isInfinite(powerFactorS)) {
      throw new IllegalArgumentException("power factors must be finite and non-negative");
    }
    double kp = Math.sqrt(powerFactorP);
    double ks = Math.sqrt(powerFactorS);
    return diagonal(
            tp.getReal() * kp, tp.getImaginary() * kp, ts.getReal() * ks, ts.getImaginary() * ks)
        .rotatedBy(planeAzimuth);
  }

  /** this · o: o acts first, as in a train read from source to receiver right to left. */
  public Jones times(Jones o) {
    return new Jones(
        aRe * o.aRe - aIm * o.aIm + bRe * o.cRe - bIm * o.cIm,
        aRe * o.aIm + aIm * o.aRe + bRe * o.cIm + bIm * o.cRe,
        aRe * o.bRe - aIm * o.bIm + bRe * o.dRe - bIm * o.dIm,
        aRe * o.bIm + aIm * o.bRe + bRe * o.dIm + bIm * o.dRe,
        cRe * o.aRe - cIm * o.aIm + dRe * o.cRe - dIm * o.cIm,
        cRe * o.aIm + cIm * o.aRe + dRe * o.cIm + dIm * o.cRe,
        cRe * o.bRe - cIm * o.bIm + dRe * o.dRe - dIm * o.dIm,
        cRe * o.bIm + cIm * o.bRe + dRe * o.dIm + dIm * o.dRe);
  }

  /** The conjugate transpose. */
  public Jones dagger() {
    return new Jones(aRe, -aIm, cRe, -cIm, bRe, -bIm, dRe, -dIm);
  }

  /** Every entry times a real k (an amplitude factor: power scales by k²). */
  public Jones scaled(double k) {
    requireFinite(k, "scale");
    return new Jones(aRe * k, aIm * k, bRe * k, bIm * k, cRe * k, cIm * k, dRe * k, dIm * k);
  }

  /** R(θ)·this·R(−θ): the same element turned by θ about the beam. */
  public Jones rotatedBy(double theta) {
    return rotation(theta).times(this).times(rotation(-theta));
  }

  /** Whether J†J = I within {@code tol} on every entry: lossless elements only. */
  public boolean isUnitary(double tol) {
    Jones h = dagger().times(this);
    return Math.abs(h.aRe - 1) <= tol
        && Math.abs(h.aIm) <= tol
        && Math.abs(h.bRe) <= tol
        && Math.abs(h.bIm) <= tol
        && Math.abs(h.cRe) <= tol
        && Math.abs(h.cIm) <= tol
        && Math.abs(h.dRe - 1) <= tol
        && Math.abs(h.dIm) <= tol;
  }

  /**
   * The largest factor by which this element can multiply the power of any input state (largest
   * eigenvalue of J†J); a passive element has at most 1.
   */
  public double maxPowerGain() {
    double h11 = aRe * aRe + aIm * aIm + cRe * cRe + cIm * cIm;
    double h22 = bRe * bRe + bIm * bIm + dRe * dRe + dIm * dIm;
    // h12 = a* b + c* d
    double h12Re = aRe * bRe + aIm * bIm + cRe * dRe + cIm * dIm;
    double h12Im = aRe * bIm - aIm * bRe + cRe * dIm - cIm * dRe;
    double half = (h11 - h22) / 2;
    return (h11 + h22) / 2 + Math.sqrt(half * half + h12Re * h12Re + h12Im * h12Im);
  }

  /** Whether no input state gains more than a fraction {@code tol} of power. */
  public boolean isPassive(double tol) {
    return maxPowerGain() <= 1 + tol;
  }

  /** Entry-wise comparison within an absolute tolerance. */
  public boolean approxEquals(Jones o, double tol) {
    return Math.abs(aRe - o.aRe) <= tol
        && Math.abs(aIm - o.aIm) <= tol
        && Math.abs(bRe - o.bRe) <= tol
        && Math.abs(bIm - o.bIm) <= tol
        && Math.abs(cRe - o.cRe) <= tol
        && Math.abs(cIm - o.cIm) <= tol
        && Math.abs(dRe - o.dRe) <= tol
        && Math.abs(dIm - o.dIm) <= tol;
  }

  public Complex a() {
    return new Complex(aRe, aIm);
  }

  public Complex b() {
    return new Complex(bRe, bIm);
  }

  public Complex c() {
    return new Complex(cRe, cIm);
  }

  public Complex d() {
    return new Complex(dRe, dIm);
  }

  public double aRe() {
    return aRe;
  }

  public double aIm() {
    return aIm;
  }

  public double bRe() {
    return bRe;
  }

  public double bIm() {
    return bIm;
  }

  public double cRe() {
    return cRe;
  }

  public double cIm() {
    return cIm;
  }

  public double dRe() {
    return dRe;
  }

  public double dIm() {
    return dIm;
  }

  @Override
  public boolean equals(Object o) {
    if (this == o) {
      return true;
    }
    if (!(o instanceof Jones)) {
      return false;
    }
    Jones j = (Jones) o;
    return Double.compare(aRe, j.aRe) == 0
        && Double.compare(aIm, j.aIm) == 0
        && Double.compare(bRe, j.bRe) == 0
        && Double.compare(bIm, j.bIm) == 0
        && Double.compare(cRe, j.cRe) == 0
        && Double.compare(cIm, j.cIm) == 0
        && Double.compare(dRe, j.dRe) == 0
        && Double.compare(dIm, j.dIm) == 0;
  }

  @Override
  public int hashCode() {
    int h = Double.hashCode(aRe);
    h = 31 * h + Double.hashCode(aIm);
    h = 31 * h + Double.hashCode(bRe);
    h = 31 * h + Double.hashCode(bIm);
    h = 31 * h + Double.hashCode(cRe);
    h = 31 * h + Double.hashCode(cIm);
    h = 31 * h + Double.hashCode(dRe);
    return 31 * h + Double.hashCode(dIm);
  }

  @Override
  public String toString() {
    return "Jones[["
        + fmt(aRe, aIm)
        + ", "
        + fmt(bRe, bIm)
        + "], ["
        + fmt(cRe, cIm)
        + ", "
        + fmt(dRe, dIm)
        + "]]";
  }

  private static String fmt(double re, double im) {
    return String.format(Locale.ROOT, "%.6g%+.6gi", re, im);
  }

  private static void requireFinite(double v, String what) {
    if (!Double.isFinite(v)) {
      throw new IllegalArgumentException(what + " must be finite: " + v);
    }
  }
}
