package jonquil.optics;

import org.apache.commons.math3.complex.Complex;

/**
 * A fully polarized field (Ex, Ey) in the beam's carried frame, scaled so that |E|² is the power in
 * watts; kept where beams of one line meet again, because their interference needs the phases a
 * coherency matrix discards.
 */
public record JonesVector(double exRe, double exIm, double eyRe, double eyIm) {
  /** No light. */
  public static final JonesVector ZERO = new JonesVector(0, 0, 0, 0);

  public JonesVector {
    if (!(Double.isFinite(exRe)
        && Double.isFinite(exIm)
        && Double.isFinite(eyRe)
        && Double.isFinite(eyIm))) {
      throw new IllegalArgumentException("Jones vector entries must be finite");
    }
  }

  public static JonesVector of(Complex ex, Complex ey) {
    return new JonesVector(ex.getReal(), ex.getImaginary(), ey.getReal(), ey.getImaginary());
  }

  /** Linearly polarized light along {@code azimuth}, with the given power. */
  public static JonesVector linear(double azimuth, double power) {
    if (!(power >= 0) || Double.isInfinite(power)) {
      throw new IllegalArgumentException("power must be finite and non-negative: " + power);
    }
    double a = Math.sqrt(power);
    return new JonesVector(a * Math.cos(azimuth), 0, a * Math.sin(azimuth), 0);
  }

  public Complex ex() {
    return new Complex(exRe, exIm);
  }

  public Complex ey() {
    return new Complex(eyRe, eyIm);
  }

  /** |Ex|² + |Ey|², in watts. */
  public double power() {
    return exRe * exRe + exIm * exIm + eyRe * eyRe + eyIm * eyIm;
  }

  /** The inner product this† · o = Ex* oEx + Ey* oEy, in watts. */
  public Complex inner(JonesVector o) {
    return new Complex(
        exRe * o.exRe + exIm * o.exIm + eyRe * o.eyRe + eyIm * o.eyIm,
        exRe * o.exIm - exIm * o.exRe + eyRe * o.eyIm - eyIm * o.eyRe);
  }

  /** J · E: the field after the element. */
  public JonesVector transformedBy(Jones j) {
    return new JonesVector(
        j.aRe() * exRe - j.aIm() * exIm + j.bRe() * eyRe - j.bIm() * eyIm,
        j.aRe() * exIm + j.aIm() * exRe + j.bRe() * eyIm + j.bIm() * eyRe,
        j.cRe() * exRe - j.cIm() * exIm + j.dRe() * eyRe - j.dIm() * eyIm,
        j.cRe() * exIm + j.cIm() * exRe + j.dRe() * eyIm + j.dIm() * eyRe);
  }

  /**
   * E · e^{iφ}: the same field after a common phase φ (a path of φ/k in the e^{ikz} convention).
   */
  public JonesVector phased(double phase) {
    double c = Math.cos(phase);
    double s = Math.sin(phase);
    return new JonesVector(
        exRe * c - exIm * s, exRe * s + exIm * c, eyRe * c - eyIm * s, eyRe * s + eyIm * c);
  }

  /** E + o: fields of one coherent beam add as amplitudes. */
  public JonesVector plus(JonesVector o) {
    return new JonesVector(exRe + o.exRe, exIm + o.exIm, eyRe + o.eyRe, eyIm + o.eyIm);
  }

  /** E E†: the coherency matrix of this fully polarized field. */
  public Coherency coherency() {
    return Coherency.fromJonesVector(exRe, exIm, eyRe, eyIm);
  }
}
