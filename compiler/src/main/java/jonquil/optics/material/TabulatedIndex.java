package jonquil.optics.material;

import java.util.Arrays;
import java.util.Objects;
import java.util.Optional;
import org.apache.commons.math3.complex.Complex;

/**
 * Measured optical constants given as a table, the form in which metal data (n, κ) are published.
 *
 * <p>Wavelengths are in metres and strictly increasing. Between rows {@code n} and {@code k} are
 * interpolated linearly in wavelength; outside the table the nearest row is returned (clamped), and
 * {@link #validRange()} spans exactly the first to the last row so a caller can report the
 * extrapolation.
 */
public record TabulatedIndex(double[] wavelengths, double[] n, double[] k) implements Dispersion {
  public TabulatedIndex {
    Objects.requireNonNull(wavelengths, "wavelengths");
    Objects.requireNonNull(n, "n");
    Objects.requireNonNull(k, "k");
    if (wavelengths.length < 2
        || n.length != wavelengths.length
        || k.length != wavelengths.length) {
      throw new IllegalArgumentException(
          "a table needs at least two rows and equal-length columns; got "
              + wavelengths.length
              + ", "
              + n.length
              + ", "
              + k.length);
    }
    wavelengths = wavelengths.clone();
    n = n.clone();
    k = k.clone();
    for (int i = 0; i < wavelengths.length; i++) {
      if (!(wavelengths[i] > 0) || !Double.isFinite(wavelengths[i])) {
        throw new IllegalArgumentException("row " + i + ": wavelength must be positive and finite");
      }
      if (i > 0 && !(wavelengths[i] > wavelengths[i - 1])) {
        throw new IllegalArgumentException(
            "row " + i + ": wavelengths must be strictly increasing");
      }
      if (!Double.isFinite(n[i]) || !(k[i] >= 0) || !Double.isFinite(k[i])) {
        throw new IllegalArgumentException("row " + i + ": n must be finite and k finite and >= 0");
      }
    }
  }

  /**
   * A table written as rows of {@code {wavelength in µm, n, k}}, the layout of the published
   * tables, so the embedded data can be compared with the paper line by line.
   */
  public static TabulatedIndex ofMicrometreRows(double[][] rows) {
    double[] w = new double[rows.length];
    double[] n = new double[rows.length];
    double[] k = new double[rows.length];
    for (int i = 0; i < rows.length; i++) {
      if (rows[i].length != 3) {
        throw new IllegalArgumentException("row " + i + " must be {µm, n, k}");
      }
      w[i] = rows[i][0] * 1e-6;
      n[i] = rows[i][1];
      k[i] = rows[i][2];
    }
    return new TabulatedIndex(w, n, k);
  }

  @Override
  public double[] wavelengths() {
    return wavelengths.clone();
  }

  @Override
  public double[] n() {
    return n.clone();
  }

  @Override
  public double[] k() {
    return k.clone();
  }

  @Override
  public Complex index(double wavelength) {
    Dispersion.requireWavelength(wavelength);
    int last = wavelengths.length - 1;
    if (wavelength <= wavelengths[0]) {
      return new Complex(n[0], k[0]);
    }
    if (wavelength >= wavelengths[last]) {
      return new Complex(n[last], k[last]);
    }
    int hit = Arrays.binarySearch(wavelengths, wavelength);
    if (hit >= 0) {
      return new Complex(n[hit], k[hit]);
    }
    int hi = -hit - 1;
    int lo = hi - 1;
    double t = (wavelength - wavelengths[lo]) / (wavelengths[hi] - wavelengths[lo]);
    return new Complex(n[lo] + t * (n[hi] - n[lo]), k[lo] + t * (k[hi] - k[lo]));
  }

  @Override
  public Optional<WavelengthRange> validRange() {
    return Optional.of(new WavelengthRange(wavelengths[0], wavelengths[wavelengths.length - 1]));
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof TabulatedIndex t
        && Arrays.equals(wavelengths, t.wavelengths)
        && Arrays.equals(n, t.n)
        && Arrays.equals(k, t.k);
  }

  @Override
  public int hashCode() {
    return Objects.hash(Arrays.hashCode(wavelengths), Arrays.hashCode(n), Arrays.hashCode(k));
  }

  @Override
  public String toString() {
    return "TabulatedIndex["
        + wavelengths.length
        + " rows, "
        + wavelengths[0]
        + " m to "
        + wavelengths[wavelengths.length - 1]
        + " m]";
  }
}
