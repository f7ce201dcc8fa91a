package jonquil.optics.material;

import java.util.Arrays;
import java.util.Objects;
import java.util.Optional;
import org.apache.commons.math3.complex.Complex;

/**
 * The Sellmeier dispersion formula, in which most published crystal and glass data are given.
 *
 * <p>{@code n² = 1 + A + Σᵢ Bᵢ λ² / (λ² − Cᵢ)}, with λ and {@code √Cᵢ} (the resonance wavelengths)
 * in metres, so {@code Cᵢ} is in m². The constant {@code A} is zero in the classic form; some
 * papers (e.g. Ghosh 1999) add it. Papers usually quote {@code Cᵢ} in µm² or the resonance
 * wavelengths in µm: use {@link #fromMicrometres} or {@link #fromResonancesMicrometres} to convert.
 * Near a resonance {@code n²} can turn negative; the index is then the root with non-negative
 * imaginary part, as for any evanescent medium.
 */
public record Sellmeier(
    double[] b, double[] c, double constant, Optional<WavelengthRange> validRange)
    implements Dispersion {

  public Sellmeier {
    Objects.requireNonNull(b, "b");
    Objects.requireNonNull(c, "c");
    Objects.requireNonNull(validRange, "validRange");
    if (b.length != c.length || b.length == 0) {
      throw new IllegalArgumentException(
          "Sellmeier needs as many B as C terms, at least one; got "
              + b.length
              + " and "
              + c.length);
    }
    b = b.clone();
    c = c.clone();
    for (int i = 0; i < b.length; i++) {
      if (!Double.isFinite(b[i]) || !Double.isFinite(c[i]) || c[i] < 0) {
        throw new IllegalArgumentException(
            "Sellmeier term " + i + " needs finite B and C >= 0 (m²)");
      }
    }
    if (!Double.isFinite(constant)) {
      throw new IllegalArgumentException("Sellmeier constant must be finite");
    }
  }

  /** The classic form, without the constant term and with no stated range. */
  public Sellmeier(double[] b, double[] c) {
    this(b, c, 0, Optional.empty());
  }

  /**
   * From the {@code n² = 1 + A + Σ B λ²/(λ² − C)} form with {@code C} in µm², as Ghosh 1999 and
   * Daimon 2007 print it.
   */
  public static Sellmeier fromMicrometres(
      double constant, double[] b, double[] cMicrometres2, WavelengthRange range) {
    double[] c = new double[cMicrometres2.length];
    for (int i = 0; i < c.length; i++) {
      c[i] = cMicrometres2[i] * 1e-12;
    }
    return new Sellmeier(b, c, constant, Optional.of(range));
  }

  /**
   * From the {@code n² − 1 = Σ B λ²/(λ² − λᵢ²)} form with resonance wavelengths λᵢ in µm, as
   * Malitson prints it.
   */
  public static Sellmeier fromResonancesMicrometres(
      double[] b, double[] resonancesMicrometres, WavelengthRange range) {
    double[] c = new double[resonancesMicrometres.length];
    for (int i = 0; i < c.length; i++) {
      double l = resonancesMicrometres[i] * 1e-6;
      c[i] = l * l;
    }
    return new Sellmeier(b, c, 0, Optional.of(range));
  }

  @Override
  public double[] b() {
    return b.clone();
  }

  @Override
  public double[] c() {
    return c.clone();
  }

  @Override
  public Complex index(double wavelength) {
    Dispersion.requireWavelength(wavelength);
    double l2 = wavelength * wavelength;
    double n2 = 1 + constant;
    for (int i = 0; i < b.length; i++) {
      n2 += b[i] * l2 / (l2 - c[i]);
    }
    if (n2 >= 0) {
      return new Complex(Math.sqrt(n2), 0);
    }
    return new Complex(0, Math.sqrt(-n2));
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof Sellmeier s
        && Arrays.equals(b, s.b)
        && Arrays.equals(c, s.c)
        && Double.compare(constant, s.constant) == 0
        && validRange.equals(s.validRange);
  }

  @Override
  public int hashCode() {
    return Objects.hash(Arrays.hashCode(b), Arrays.hashCode(c), constant, validRange);
  }

  @Override
  public String toString() {
    return "Sellmeier[b="
        + Arrays.toString(b)
        + ", c="
        + Arrays.toString(c)
        + " m², constant="
        + constant
        + ", validRange="
        + validRange
        + "]";
  }
}
