package jonquil.optics.beam;

import org.apache.commons.math3.complex.Complex;

/** A paraxial ray-transfer matrix, so that trains of elements compose by multiplication. */
public record Abcd(double a, double b, double c, double d) {

  public Abcd {
    if (!(Double.isFinite(a) && Double.isFinite(b) && Double.isFinite(c) && Double.isFinite(d))) {
      throw new IllegalArgumentException(
          "ABCD elements must be finite: " + a + ", " + b + ", " + c + ", " + d);
    }
  }

  /** The identity: no element at all. */
  public static final Abcd IDENTITY = new Abcd(1, 0, 0, 1);

  /** Propagation over {@code length} metres in a homogeneous medium. */
  public static Abcd freeSpace(double length) {
    return new Abcd(1, length, 0, 1);
  }

  /**
   * A thin lens of focal length {@code focal} (positive converges); infinite focal length is no
   * lens.
   */
  public static Abcd thinLens(double focal) {
    if (focal == 0 || Double.isNaN(focal)) {
      throw new IllegalArgumentException("focal length must be non-zero: " + focal);
    }
    return new Abcd(1, 0, -1 / focal, 1);
  }

  /** A flat interface at normal incidence from index n1 into index n2; the determinant is n1/n2. */
  public static Abcd flatInterface(double n1, double n2) {
    requireIndex(n1);
    requireIndex(n2);
    return new Abcd(1, 0, 0, n1 / n2);
  }

  /**
   * A spherical interface of radius {@code radius} (positive when the centre lies ahead) from index
   * n1 into n2.
   */
  public static Abcd curvedInterface(double n1, double n2, double radius) {
    requireIndex(n1);
    requireIndex(n2);
    if (radius == 0 || Double.isNaN(radius)) {
      throw new IllegalArgumentException("radius must be non-zero: " + radius);
    }
    return new Abcd(1, 0, (n1 - n2) / (radius * n2), n1 / n2);
  }

  /**
   * This element followed by {@code next}: the product next · this, since the ray meets this first.
   */
  public Abcd then(Abcd next) {
    return new Abcd(
        next.a * a + next.b * c,
        next.a * b + next.b * d,
        next.c * a + next.d * c,
        next.c * b + next.d * d);
  }

  /**
   * AD − BC; equal to n_in/n_out for any train of paraxial elements in this package's ray
   * convention.
   */
  public double determinant() {
    return a * d - b * c;
  }

  /** The ABCD law q' = (Aq + B)/(Cq + D). */
  public Complex transform(Complex q) {
    return q.multiply(a).add(b).divide(q.multiply(c).add(d));
  }

  static void requireIndex(double n) {
    if (!(n > 0) || !Double.isFinite(n)) {
      throw new IllegalArgumentException("refractive index must be positive and finite: " + n);
    }
  }
}
