package jonquil.optics;

import java.util.Locale;

/**
 * The coherency (polarization) matrix Φ = ⟨E E†⟩ in watts, because it carries partially polarized
 * light through Jones elements exactly, where a Jones vector cannot.
 */
public final class Coherency {
  /** No light. */
  public static final Coherency ZERO = new Coherency(0, 0, 0, 0);

  /** Below this fraction of S0, a circular component is rounding noise, not a handedness. */
  private static final double HANDEDNESS_FLOOR = 1e-9;

  /** Eigenvalue ratios beyond this are below double rounding and reported as infinite. */
  private static final double EXTINCTION_CEILING = 1e15;

  private final double xx;
  private final double yy;
  private final double xyRe;
  private final double xyIm;

  private Coherency(double xx, double yy, double xyRe, double xyIm) {
    if (!(Double.isFinite(xx)
        && Double.isFinite(yy)
        && Double.isFinite(xyRe)
        && Double.isFinite(xyIm))) {
      throw new IllegalArgumentException("coherency entries must be finite");
    }
    this.xx = xx;
    this.yy = yy;
    this.xyRe = xyRe;
    this.xyIm = xyIm;
  }

  /** Φ from its entries (watts); Φyx is the conjugate of Φxy. Not checked for physicality. */
  public static Coherency of(double xx, double yy, double xyRe, double xyIm) {
    return new Coherency(xx, yy, xyRe, xyIm);
  }

  /** Φ from Stokes parameters (watts). Not checked for physicality. */
  public static Coherency fromStokes(double s0, double s1, double s2, double s3) {
    return new Coherency((s0 + s1) / 2, (s0 - s1) / 2, s2 / 2, s3 / 2);
  }

  /** Unpolarized light of the given power. */
  public static Coherency unpolarized(double power) {
    requirePower(power);
    return new Coherency(power / 2, power / 2, 0, 0);
  }

  /** Linearly polarized light along {@code azimuth}. */
  public static Coherency linear(double azimuth, double power) {
    requirePower(power);
    requireFinite(azimuth, "azimuth");
    double c = Math.cos(azimuth);
    double s = Math.sin(azimuth);
    return new Coherency(power * c * c, power * s * s, power * c * s, 0);
  }

  /** Circularly polarized light; RIGHT is (1, −i)/√2, S3 &gt; 0. */
  public static Coherency circular(Handedness h, double power) {
    requirePower(power);
    switch (h) {
      case RIGHT:
        return new Coherency(power / 2, power / 2, 0, power / 2);
      case LEFT:
        return new Coherency(power / 2, power / 2, 0, -power / 2);
      default:
        throw new IllegalArgumentException("circular light needs a hand, not " + h);
    }
  }

  /**
   * Fully polarized elliptical light: azimuth ψ, ellipticity angle χ in [−π/4, π/4] (positive =
   * right).
   */
  public static Coherency elliptical(double azimuth, double ellipticityAngle, double power) {
    requirePower(power);
    requireFinite(azimuth, "azimuth");
    if (!(Math.abs(ellipticityAngle) <= Math.PI / 4 + 1e-15)) {
      throw new IllegalArgumentException(
          "ellipticity angle must be within ±π/4: " + ellipticityAngle);
    }
    double c2x = Math.cos(2 * ellipticityAngle);
    return fromStokes(
        power,
        power * c2x * Math.cos(2 * azimuth),
        power * c2x * Math.sin(2 * azimuth),
        power * Math.sin(2 * ellipticityAngle));
  }

  /** The fully polarized state of a Jones vector; its power is |E|². */
  public static Coherency fromJonesVector(double exRe, double exIm, double eyRe, double eyIm) {
    // Φxy = Ex Ey*
    return new Coherency(
        exRe * exRe + exIm * exIm,
        eyRe * eyRe + eyIm * eyIm,
        exRe * eyRe + exIm * eyIm,
        exIm * eyRe - exRe * eyIm);
  }

  /**
   * Two orthogonal fully polarized fields, strongest first, that are mutually incoherent and
   * together are this light: the eigenvectors of Φ scaled by the square roots of their eigenvalues
   * (Φ = Σ λ v v†). Each travels as its own Jones vector, so beams of one line that meet again
   * interfere part by part. The second is zero for fully polarized light.
   */
  public java.util.List<JonesVector> polarizedParts() {
    double half = (xx - yy) / 2;
    double root = Math.sqrt(half * half + xyRe * xyRe + xyIm * xyIm);
    double mean = (xx + yy) / 2;
    double major = Math.max(0, mean + root);
    double minor = Math.max(0, mean - root);
    if (root <= 1e-15 * Math.abs(mean) || Math.hypot(xyRe, xyIm) <= 1e-300) {
      // Diagonal (or unpolarized): the table axes are eigenvectors, larger first.
      JonesVector x = new JonesVector(Math.sqrt(Math.max(0, xx)), 0, 0, 0);
      JonesVector y = new JonesVector(0, 0, Math.sqrt(Math.max(0, yy)), 0);
      return xx >= yy ? java.util.List.of(x, y) : java.util.List.of(y, x);
    }
    return java.util.List.of(eigenField(major), eigenField(minor));
  }

  /** √λ times the unit eigenvector of Φ for eigenvalue λ, from the better-conditioned row. */
  private JonesVector eigenField(double lambda) {
    // Row 1 gives v = (Φxy, λ − Φxx); row 2 gives v = (λ − Φyy, Φxy*). Take the longer one.
    double r1 = Math.hypot(Math.hypot(xyRe, xyIm), lambda - xx);
    double r2 = Math.hypot(lambda - yy, Math.hypot(xyRe, xyIm));
    double a = Math.sqrt(lambda);
    if (r1 >= r2) {
      return new JonesVector(a * xyRe / r1, a * xyIm / r1, a * (lambda - xx) / r1, 0);
    }
    return new JonesVector(a * (lambda - yy) / r2, 0, a * xyRe / r2, -a * xyIm / r2);
  }

  /** J Φ J†: the light after the element. */
  public Coherency transform(Jones j) {
    double ar = j.aRe();
    double ai = j.aIm();
    double br = j.bRe();
    double bi = j.bIm();
    double cr = j.cRe();
    double ci = j.cIm();
    double dr = j.dRe();
    double di = j.dIm();
    double p = xx;
    double r = yy;
    double qr = xyRe;
    double qi = xyIm;
    // M = J Φ with Φ = [[p, q], [q*, r]]
    double m11r = ar * p + br * qr + bi * qi;
    double m11i = ai * p + bi * qr - br * qi;
    double m12r = ar * qr - ai * qi + br * r;
    double m12i = ar * qi + ai * qr + bi * r;
    double m21r = cr * p + dr * qr + di * qi;
    double m21i = ci * p + di * qr - dr * qi;
    double m22r = cr * qr - ci * qi + dr * r;
    double m22i = cr * qi + ci * qr + di * r;
    // Φ' = M J†; only the upper triangle is needed because Φ' is Hermitian.
    double nxx = m11r * ar + m11i * ai + m12r * br + m12i * bi;
    double nyy = m21r * cr + m21i * ci + m22r * dr + m22i * di;
    double nxyRe = m11r * cr + m11i * ci + m12r * dr + m12i * di;
    double nxyIm = m11i * cr - m11r * ci + m12i * dr - m12r * di;
    return new Coherency(nxx, nyy, nxyRe, nxyIm);
  }

  /** Incoherent sum: the coherency matrices of mutually incoherent beams add. */
  public Coherency plus(Coherency o) {
    return new Coherency(xx + o.xx, yy + o.yy, xyRe + o.xyRe, xyIm + o.xyIm);
  }

  /** The same state with its power multiplied by k ≥ 0. */
  public Coherency scaled(double k) {
    if (!(k >= 0) || Double.isInfinite(k)) {
      throw new IllegalArgumentException("power scale must be finite and non-negative: " + k);
    }
    return new Coherency(xx * k, yy * k, xyRe * k, xyIm * k);
  }

  /** (1 − f)Φ + f·(S0/2)·I: a fraction f of the power loses its polarization, none is lost. */
  public Coherency depolarized(double fraction) {
    if (!(fraction >= 0 && fraction <= 1)) {
      throw new IllegalArgumentException("depolarized fraction must be in [0, 1]: " + fraction);
    }
    double half = fraction * (xx + yy) / 2;
    double keep = 1 - fraction;
    return new Coherency(keep * xx + half, keep * yy + half, keep * xyRe, keep * xyIm);
  }

  /** The same light described in transverse axes turned by {@code angle} (azimuths drop by it). */
  public Coherency inFrameRotatedBy(double angle) {
    return transform(Jones.rotation(-angle));
  }

  /** S0, in watts. */
  public double power() {
    return xx + yy;
  }

  /** [S0, S1, S2, S3] in watts. */
  public double[] stokes() {
    return new double[] {xx + yy, xx - yy, 2 * xyRe, 2 * xyIm};
  }

  /** Degree of polarization in [0, 1]; 0 when there is no light. */
  public double dop() {
    double s0 = xx + yy;
    if (s0 <= 0) {
      return 0;
    }
    // Rounding can put a pure state a few ulps past 1; the physical quantity cannot be.
    return Math.min(1, polarizedPower() / s0);
  }

  /** Azimuth of the polarization ellipse's major axis, in (−π/2, π/2]. */
  public double azimuth() {
    // Adding +0.0 turns −0.0 into +0.0 so that atan2 never lands on the excluded −π.
    double psi = Math.atan2(2 * xyRe + 0.0, xx - yy + 0.0) / 2;
    return psi <= -Math.PI / 2 ? psi + Math.PI : psi;
  }

  /** Ellipticity angle χ in [−π/4, π/4]; positive for right-handed light. */
  public double ellipticityAngle() {
    double s1 = xx - yy;
    double s2 = 2 * xyRe;
    return Math.atan2(2 * xyIm, Math.sqrt(s1 * s1 + s2 * s2)) / 2;
  }

  /** RIGHT when S3 &gt; 0, LEFT when S3 &lt; 0, NONE when the circular part is negligible. */
  public Handedness handedness() {
    double s3 = 2 * xyIm;
    double floor = HANDEDNESS_FLOOR * Math.abs(xx + yy);
    if (s3 > floor) {
      return Handedness.RIGHT;
    }
    if (s3 < -floor) {
      return Handedness.LEFT;
    }
    return Handedness.NONE;
  }

  /**
   * What a rotating ideal linear analyser sees, max/min over its angle: it passes I(θ) = ½(S0 + S1
   * cos 2θ + S2 sin 2θ) (definition of the Stokes parameters), so the ratio is (S0 + L)/(S0 − L)
   * with L = √(S1² + S2²). The circular and the unpolarized parts both lower it: 1 for circular or
   * unpolarized light (and for no light), infinite only for pure linear light.
   */
  public double extinctionRatio() {
    double s0 = xx + yy;
    if (s0 <= 0) {
      return 1;
    }
    double s1 = xx - yy;
    double s2 = 2 * xyRe;
    double s3 = 2 * xyIm;
    double linear = Math.min(Math.hypot(s1, s2), s0);
    double max = (s0 + linear) / 2;
    // (S0² − L²) = 4 det Φ + S3², which avoids the cancellation in (S0 − L)/2 for nearly pure
    // linear states.
    double det = Math.max(0, xx * yy - xyRe * xyRe - xyIm * xyIm);
    double min = (4 * det + s3 * s3) / (2 * (s0 + linear));
    if (min * EXTINCTION_CEILING <= max) {
      return Double.POSITIVE_INFINITY;
    }
    return max / min;
  }

  /**
   * Whether Φ is positive semidefinite within {@code tol} relative to its power (it is Hermitian by
   * construction).
   */
  public boolean isPhysical(double tol) {
    double scale = Math.max(Math.abs(xx) + Math.abs(yy), Double.MIN_NORMAL);
    return xx >= -tol * scale && yy >= -tol * scale && polarizedPower() - (xx + yy) <= tol * scale;
  }

  /** Entry-wise comparison within an absolute tolerance (watts). */
  public boolean approxEquals(Coherency o, double tol) {
    return Math.abs(xx - o.xx) <= tol
        && Math.abs(yy - o.yy) <= tol
        && Math.abs(xyRe - o.xyRe) <= tol
        && Math.abs(xyIm - o.xyIm) <= tol;
  }

  public double xx() {
    return xx;
  }

  public double yy() {
    return yy;
  }

  public double xyRe() {
    return xyRe;
  }

  public double xyIm() {
    return xyIm;
  }

  private double polarizedPower() {
    double s1 = xx - yy;
    double s2 = 2 * xyRe;
    double s3 = 2 * xyIm;
    return Math.sqrt(s1 * s1 + s2 * s2 + s3 * s3);
  }

  @Override
  public boolean equals(Object o) {
    if (this == o) {
      return true;
    }
    if (!(o instanceof Coherency)) {
      return false;
    }
    Coherency c = (Coherency) o;
    return Double.compare(xx, c.xx) == 0
        && Double.compare(yy, c.yy) == 0
        && Double.compare(xyRe, c.xyRe) == 0
        && Double.compare(xyIm, c.xyIm) == 0;
  }

  @Override
  public int hashCode() {
    int h = Double.hashCode(xx);
    h = 31 * h + Double.hashCode(yy);
    h = 31 * h + Double.hashCode(xyRe);
    return 31 * h + Double.hashCode(xyIm);
  }

  @Override
  public String toString() {
    return String.format(
        Locale.ROOT, "Coherency[xx=%.6g W, yy=%.6g W, xy=%.6g%+.6gi W]", xx, yy, xyRe, xyIm);
  }

  private static void requirePower(double power) {
    if (!(power >= 0) || Double.isInfinite(power)) {
      throw new IllegalArgumentException("power must be finite and non-negative: " + power);
    }
  }

  private static void requireFinite(double v, String what) {
    if (!Double.isFinite(v)) {
      throw new IllegalArgumentException(what + " must be finite: " + v);
    }
  }
}
