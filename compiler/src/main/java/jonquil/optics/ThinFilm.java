package jonquil.optics;

import java.util.List;
import java.util.Objects;
import org.apache.commons.math3.complex.Complex;

/**
 * Reflection and transmission of a stack of plane-parallel layers by the characteristic-matrix
 * method (Born &amp; Wolf §1.6; Macleod ch. 2), with the same signs as {@link Fresnel}.
 */
public final class ThinFilm {
  private ThinFilm() {}

  /** One homogeneous isotropic layer: complex index and physical thickness in metres. */
  public record Layer(Complex n, double thickness) {
    public Layer {
      Objects.requireNonNull(n, "index");
      if (!(thickness >= 0) || Double.isInfinite(thickness)) {
        throw new IllegalArgumentException(
            "layer thickness must be finite and non-negative: " + thickness);
      }
      if (n.isNaN() || n.isInfinite()) {
        throw new IllegalArgumentException("layer index must be finite: " + n);
      }
    }
  }

  /**
   * Coefficients of a stack seen from the incidence medium n0 (lossless), layers listed from the
   * incidence side to the substrate, at angle {@code aoi} in n0 and vacuum {@code wavelength}. An
   * empty stack gives {@link Fresnel#at(Complex, Complex, double)}.
   */
  public static Fresnel.Coefficients stack(
      Complex n0, List<Layer> layers, Complex substrate, double aoi, double wavelength) {
    Fresnel.requireAngle(aoi);
    if (!(wavelength > 0) || Double.isInfinite(wavelength)) {
      throw new IllegalArgumentException("wavelength must be positive and finite: " + wavelength);
    }
    List<Layer> copy = List.copyOf(layers);
    Complex u = n0.multiply(Math.sin(aoi));
    Complex xi0 = Fresnel.normalComponent(n0, u);
    Complex xiSub = Fresnel.normalComponent(substrate, u);
    double k0 = 2 * Math.PI / wavelength;

    // s: admittance p = n cos θ = ξ. p (TM): q = cos θ / n = ξ / n², the H-field form of B&W.
    Complex[] s = {Complex.ONE, Complex.ZERO, Complex.ZERO, Complex.ONE};
    Complex[] p = {Complex.ONE, Complex.ZERO, Complex.ZERO, Complex.ONE};
    for (Layer layer : copy) {
      Complex xi = Fresnel.normalComponent(layer.n(), u);
      Complex beta = xi.multiply(k0 * layer.thickness());
      Complex cos = beta.cos();
      Complex sin = beta.sin();
      s = multiply(s, characteristic(cos, sin, xi));
      p = multiply(p, characteristic(cos, sin, xi.divide(layer.n().multiply(layer.n()))));
    }
    Complex sIn = xi0;
    Complex sOut = xiSub;
    Complex pIn = xi0.divide(n0.multiply(n0));
    Complex pOut = xiSub.divide(substrate.multiply(substrate));
    Complex[] rtS = reflectTransmit(s, sIn, sOut);
    Complex[] rtP = reflectTransmit(p, pIn, pOut);
    // B&W's TM coefficients are for H; the transmitted E amplitude is (n0/ns) times the H one.
    Complex tp = rtP[1].multiply(n0).divide(substrate);
    return Fresnel.coefficients(n0, xi0, substrate, xiSub, rtS[0], rtP[0], rtS[1], tp);
  }

  /**
   * The physical thickness of a quarter-wave layer of index n at the given vacuum wavelength, for
   * light arriving at {@code aoi} from vacuum (index 1): λ / (4 n cos θ_layer).
   */
  public static double quarterWaveThickness(double n, double wavelength, double aoi) {
    return quarterWaveThickness(n, wavelength, 1.0, aoi);
  }

  /**
   * As {@link #quarterWaveThickness(double, double, double)}, arriving from a medium of index n0.
   */
  public static double quarterWaveThickness(double n, double wavelength, double n0, double aoi) {
    Fresnel.requireAngle(aoi);
    if (!(n > 0) || !(wavelength > 0) || !(n0 > 0)) {
      throw new IllegalArgumentException("indices and wavelength must be positive");
    }
    double sinLayer = n0 * Math.sin(aoi) / n;
    if (sinLayer >= 1) {
      throw new IllegalArgumentException("no propagating wave in the layer at this angle");
    }
    return wavelength / (4 * n * Math.sqrt(1 - sinLayer * sinLayer));
  }

  /** B&amp;W's characteristic matrix [[cos β, −i sin β / p], [−i p sin β, cos β]] for e^{−iωt}. */
  private static Complex[] characteristic(Complex cos, Complex sin, Complex admittance) {
    Complex minusI = Complex.I.negate();
    return new Complex[] {
      cos, minusI.multiply(sin).divide(admittance), minusI.multiply(admittance).multiply(sin), cos
    };
  }

  private static Complex[] multiply(Complex[] m, Complex[] n) {
    return new Complex[] {
      m[0].multiply(n[0]).add(m[1].multiply(n[2])), m[0].multiply(n[1]).add(m[1].multiply(n[3])),
      m[2].multiply(n[0]).add(m[3].multiply(n[2])), m[2].multiply(n[1]).add(m[3].multiply(n[3]))
    };
  }

  /** r = (p₁B − C)/(p₁B + C), t = 2p₁/(p₁B + C) with (B, C) = M·(1, p_sub). */
  private static Complex[] reflectTransmit(Complex[] m, Complex pIn, Complex pOut) {
    Complex b = m[0].add(m[1].multiply(pOut));
    Complex c = m[2].add(m[3].multiply(pOut));
    Complex pb = pIn.multiply(b);
    Complex den = pb.add(c);
    return new Complex[] {pb.subtract(c).divide(den), pIn.multiply(2).divide(den)};
  }
}
