package jonquil.optics.material;

import java.util.Arrays;
import java.util.Objects;
import java.util.Optional;
import org.apache.commons.math3.complex.Complex;

/**
 * The Lorentz–Drude model of a metal's dielectric function, in which Rakić et al. (1998) publish
 * their fits, so a metal can be evaluated at any wavelength of its fitted range rather than only at
 * tabulated rows.
 *
 * <p>With photon energy {@code ħω} in eV, plasma energy {@code ħωₚ}, free-electron strength {@code
 * f₀} and damping {@code Γ₀}, and oscillators {@code (fⱼ, Γⱼ, ωⱼ)}:
 *
 * <pre>
 *   ε(ω) = 1 − f₀ ωₚ² / (ω (ω + iΓ₀)) + Σⱼ fⱼ ωₚ² / (ωⱼ² − ω² − iωΓⱼ)
 * </pre>
 *
 * This is the {@code e^{−iωt}} form, so {@code Im ε ≥ 0} and the index {@code √ε} has {@code κ ≥
 * 0}.
 */
public record LorentzDrude(
    double plasmaEnergy,
    double f0,
    double gamma0,
    double[] strengths,
    double[] dampings,
    double[] resonances,
    Optional<WavelengthRange> validRange)
    implements Dispersion {

  /**
   * {@code hc/e} in eV·m (from the exact 2019 SI values of h, c and e): photon energy in eV is this
   * over the wavelength.
   */
  public static final double EV_METRE = 1.23984198406e-6;

  public LorentzDrude {
    Objects.requireNonNull(strengths, "strengths");
    Objects.requireNonNull(dampings, "dampings");
    Objects.requireNonNull(resonances, "resonances");
    Objects.requireNonNull(validRange, "validRange");
    if (strengths.length != dampings.length || strengths.length != resonances.length) {
      throw new IllegalArgumentException(
          "each oscillator needs a strength, a damping and a resonance");
    }
    if (!(plasmaEnergy > 0) || !(f0 >= 0) || !(gamma0 >= 0)) {
      throw new IllegalArgumentException(
          "Lorentz–Drude needs plasma energy > 0, f0 >= 0 and Γ0 >= 0");
    }
    strengths = strengths.clone();
    dampings = dampings.clone();
    resonances = resonances.clone();
    for (int j = 0; j < strengths.length; j++) {
      if (!(strengths[j] >= 0) || !(dampings[j] >= 0) || !(resonances[j] >= 0)) {
        throw new IllegalArgumentException("oscillator " + j + " needs f, Γ and ω all >= 0");
      }
    }
  }

  @Override
  public double[] strengths() {
    return strengths.clone();
  }

  @Override
  public double[] dampings() {
    return dampings.clone();
  }

  @Override
  public double[] resonances() {
    return resonances.clone();
  }

  /** The relative permittivity {@code ε} at {@code wavelength} (metres). */
  public Complex permittivity(double wavelength) {
    Dispersion.requireWavelength(wavelength);
    double w = EV_METRE / wavelength;
    double wp2 = plasmaEnergy * plasmaEnergy;
    Complex eps =
        Complex.ONE.subtract(new Complex(f0 * wp2, 0).divide(new Complex(w * w, w * gamma0)));
    for (int j = 0; j < strengths.length; j++) {
      Complex denominator = new Complex(resonances[j] * resonances[j] - w * w, -w * dampings[j]);
      eps = eps.add(new Complex(strengths[j] * wp2, 0).divide(denominator));
    }
    return eps;
  }

  @Override
  public Complex index(double wavelength) {
    Complex root = permittivity(wavelength).sqrt();
    // The principal root already has Re ≥ 0; with Im ε ≥ 0 it also has Im ≥ 0. Guard the sign all
    // the same.
    return root.getImaginary() < 0 ? root.negate() : root;
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof LorentzDrude l
        && Double.compare(plasmaEnergy, l.plasmaEnergy) == 0
        && Double.compare(f0, l.f0) == 0
        && Double.compare(gamma0, l.gamma0) == 0
        && Arrays.equals(strengths, l.strengths)
        && Arrays.equals(dampings, l.dampings)
        && Arrays.equals(resonances, l.resonances)
        && validRange.equals(l.validRange);
  }

  @Override
  public int hashCode() {
    return Objects.hash(
        plasmaEnergy,
        f0,
        gamma0,
        Arrays.hashCode(strengths),
        Arrays.hashCode(dampings),
        Arrays.hashCode(resonances),
        validRange);
  }

  @Override
  public String toString() {
    return "LorentzDrude[ħωp="
        + plasmaEnergy
        + " eV, f0="
        + f0
        + ", Γ0="
        + gamma0
        + " eV, "
        + strengths.length
        + " oscillators, validRange="
        + validRange
        + "]";
  }
}
