package jonquil.optics.material;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/** The dispersion formulas evaluated on cases small enough to work out by hand. */
class DispersionModelsTest {
  private static final double UM = 1e-6;

  @Test
  void sellmeierOneTermByHand() {
    // n² = 1 + 1·λ²/(λ² − (0.5 µm)²) at λ = 1 µm: 1 + 1/(1 − 0.25) = 7/3.
    Sellmeier s = new Sellmeier(new double[] {1}, new double[] {0.25e-12});
    // Definition of the Sellmeier form n² = 1 + Σ B λ²/(λ² − C).
    assertEquals(Math.sqrt(7.0 / 3), s.index(1 * UM).getReal(), 1e-12);
    assertEquals(0, s.index(1 * UM).getImaginary());
  }

  @Test
  void sellmeierTwoTermsWithConstantByHand() {
    // n² = 1 + 0.5 + 1·λ²/(λ² − 0.25 µm²) + 2·λ²/(λ² − 100 µm²) at λ = 1 µm:
    // 1.5 + 4/3 + 2·1/(1 − 100) = 2.8333… − 0.0202020… = 2.8131313…
    Sellmeier s =
        Sellmeier.fromMicrometres(
            0.5,
            new double[] {1, 2},
            new double[] {0.25, 100},
            WavelengthRange.ofMicrometres(0.6, 5));
    double expected = Math.sqrt(1.5 + 4.0 / 3 - 2.0 / 99);
    assertEquals(expected, s.index(1 * UM).getReal(), 1e-12);
    assertTrue(s.isValidAt(1 * UM));
    assertFalse(s.isValidAt(0.5 * UM));
    assertFalse(s.isValidAt(6 * UM));
  }

  @Test
  void sellmeierResonanceFormSquaresTheWavelengths() {
    // λ₀ = 0.5 µm must enter as C = 0.25 µm², so this equals the 7/3 case above.
    Sellmeier s =
        Sellmeier.fromResonancesMicrometres(
            new double[] {1}, new double[] {0.5}, WavelengthRange.ofMicrometres(0.6, 2));
    // Definition of the Sellmeier form with C = λ₀² (7/3 as above).
    assertEquals(Math.sqrt(7.0 / 3), s.index(1 * UM).getReal(), 1e-12);
  }

  @Test
  void sellmeierInsideAResonanceGivesAnEvanescentIndexWithPositiveKappa() {
    // Just above the resonance at 1 µm: n² = 1 + 1·0.81/(0.81 − 1) = 1 − 4.263… < 0.
    Sellmeier s = new Sellmeier(new double[] {1}, new double[] {1e-12});
    Complex n = s.index(0.9 * UM);
    assertEquals(0, n.getReal());
    // Definition of the Sellmeier form: n² < 0 gives n = i√(−n²).
    assertEquals(Math.sqrt(0.81 / 0.19 - 1), n.getImaginary(), 1e-12);
  }

  @Test
  void sellmeierIsImmutable() {
    double[] b = {1};
    Sellmeier s = new Sellmeier(b, new double[] {0.25e-12});
    b[0] = 99;
    s.b()[0] = 99;
    // Definition of the Sellmeier form (7/3 as above): the copies did not change it.
    assertEquals(Math.sqrt(7.0 / 3), s.index(1 * UM).getReal(), 1e-12);
    assertEquals(s, new Sellmeier(new double[] {1}, new double[] {0.25e-12}));
  }

  @Test
  void cauchyByHand() {
    // n = 1.5 + 4e-15 m²/λ² + 1e-27 m⁴/λ⁴ at 1 µm: 1.5 + 0.004 + 0.001.
    // Definition of the Cauchy form n = A + B/λ² + C/λ⁴.
    assertEquals(1.505, new Cauchy(1.5, 4e-15, 1e-27).index(1 * UM).getReal(), 1e-12);
    // At 0.5 µm: 1.5 + 0.016 + 0.016.
    assertEquals(1.532, new Cauchy(1.5, 4e-15, 1e-27).index(0.5 * UM).getReal(), 1e-12);
    assertTrue(new Cauchy(1.5, 0, 0).validRange().isEmpty());
  }

  @Test
  void tableInterpolatesLinearlyInNAndK() {
    TabulatedIndex t =
        TabulatedIndex.ofMicrometreRows(
            new double[][] {{0.5, 1.0, 2.0}, {1.0, 2.0, 4.0}, {2.0, 0.5, 10.0}});
    assertEquals(new Complex(1.0, 2.0), t.index(0.5 * UM));
    assertEquals(new Complex(2.0, 4.0), t.index(1.0 * UM));
    Complex quarter = t.index(0.625 * UM);
    // Definition of linear interpolation in wavelength between the table's rows.
    assertEquals(1.25, quarter.getReal(), 1e-12);
    assertEquals(2.5, quarter.getImaginary(), 1e-12);
    Complex mid = t.index(1.5 * UM);
    assertEquals(1.25, mid.getReal(), 1e-12);
    assertEquals(7.0, mid.getImaginary(), 1e-12);
  }

  @Test
  void tableClampsOutsideAndSaysSo() {
    TabulatedIndex t =
        TabulatedIndex.ofMicrometreRows(new double[][] {{0.5, 1.0, 2.0}, {1.0, 2.0, 4.0}});
    assertEquals(new Complex(1.0, 2.0), t.index(0.1 * UM));
    assertEquals(new Complex(2.0, 4.0), t.index(5 * UM));
    assertEquals(Optional.of(WavelengthRange.ofMicrometres(0.5, 1.0)), t.validRange());
    assertFalse(t.isValidAt(0.1 * UM));
    assertFalse(t.isValidAt(5 * UM));
    assertTrue(t.isValidAt(0.75 * UM));
  }

  @Test
  void tableRejectsMalformedData() {
    assertThrows(
        IllegalArgumentException.class,
        () -> TabulatedIndex.ofMicrometreRows(new double[][] {{1.0, 1, 0}, {0.5, 1, 0}}));
    assertThrows(
        IllegalArgumentException.class,
        () -> TabulatedIndex.ofMicrometreRows(new double[][] {{0.5, 1, -0.1}, {1.0, 1, 0}}));
    assertThrows(
        IllegalArgumentException.class,
        () -> TabulatedIndex.ofMicrometreRows(new double[][] {{0.5, 1, 0}}));
    assertThrows(
        IllegalArgumentException.class,
        () -> new TabulatedIndex(new double[] {1e-6, 2e-6}, new double[] {1}, new double[] {0, 0}));
  }

  @Test
  void uniaxialBirefringenceAndAngleDependence() {
    Uniaxial u = new Uniaxial(new ConstantIndex(1.6, 0), new ConstantIndex(1.5, 0));
    // Definition of a uniaxial index: Δn = ne − no; n(θ) from 1/n² = cos²θ/no² + sin²θ/ne²
    // (Born & Wolf, Principles of Optics, 7th ed. 1999, §15.3, section number from memory).
    assertEquals(-0.1, u.birefringence(1 * UM), 1e-12);
    assertEquals(1.6, u.extraordinaryIndexAt(1 * UM, 0), 1e-12);
    assertEquals(1.5, u.extraordinaryIndexAt(1 * UM, Math.PI / 2), 1e-12);
    // At 45°: 1/n² = (1/1.6² + 1/1.5²)/2.
    double at45 = 1 / Math.sqrt(0.5 / (1.6 * 1.6) + 0.5 / (1.5 * 1.5));
    assertEquals(at45, u.extraordinaryIndexAt(1 * UM, Math.PI / 4), 1e-12);
  }

  @Test
  void uniaxialRangeIsTheOverlap() {
    Uniaxial u =
        new Uniaxial(
            Sellmeier.fromMicrometres(
                0, new double[] {1}, new double[] {0.01}, WavelengthRange.ofMicrometres(0.2, 3)),
            Sellmeier.fromMicrometres(
                0, new double[] {1}, new double[] {0.01}, WavelengthRange.ofMicrometres(0.3, 5)));
    assertEquals(Optional.of(WavelengthRange.ofMicrometres(0.3, 3)), u.validRange());
  }

  @Test
  void bulkAbsorptionAddsKappaAndGivesBeerLambert() {
    // α = 100 /m at 1 µm: κ = αλ/4π = 1e-4/(4π); 1 cm of it transmits e^-1.
    BulkAbsorption a = new BulkAbsorption(new ConstantIndex(1.5, 0), 100);
    // Beer–Lambert, T = e^(−αd), with κ = αλ/4π (Born & Wolf, 7th ed. 1999, §14.1, section number
    // from memory).
    assertEquals(1.5, a.index(1 * UM).getReal(), 0);
    assertEquals(1e-4 / (4 * Math.PI), a.index(1 * UM).getImaginary(), 1e-18);
    assertEquals(Math.exp(-1), a.internalTransmittance(0.01), 1e-15);
    // The field amplitude e^{-2πκz/λ} squared gives the same intensity decay over 1 cm.
    double kappa = a.index(1 * UM).getImaginary();
    assertEquals(
        a.internalTransmittance(0.01), Math.exp(-4 * Math.PI * kappa * 0.01 / (1 * UM)), 1e-15);
    assertThrows(
        IllegalArgumentException.class, () -> new BulkAbsorption(new ConstantIndex(1.5, 0), -1));
  }

  @Test
  void drudeMetalByHand() {
    // ħωp = 10 eV, f0 = 1, no damping, ħω = 5 eV: ε = 1 − 100/25 = −3, so n = i√3.
    LorentzDrude free =
        new LorentzDrude(10, 1, 0, new double[0], new double[0], new double[0], Optional.empty());
    double lambda = LorentzDrude.EV_METRE / 5;
    // Definition of the Drude term ε = 1 − f0 ωp²/(ω(ω + iΓ0)) (Rakić et al., Appl. Opt. 37, 5271
    // (1998), eq. 1, equation number from memory).
    assertEquals(-3, free.permittivity(lambda).getReal(), 1e-12);
    assertEquals(0, free.index(lambda).getReal(), 1e-12);
    assertEquals(Math.sqrt(3), free.index(lambda).getImaginary(), 1e-12);

    // With Γ0 = 1 eV: ε = 1 − 100/(5(5 + i)) = 1 − (25 − 5i)·100/650.
    LorentzDrude damped =
        new LorentzDrude(10, 1, 1, new double[0], new double[0], new double[0], Optional.empty());
    Complex eps = damped.permittivity(lambda);
    // Same Drude definition with damping.
    assertEquals(1 - 2500.0 / 650, eps.getReal(), 1e-12);
    assertEquals(500.0 / 650, eps.getImaginary(), 1e-12);
    assertTrue(damped.index(lambda).getImaginary() > 0);
  }

  @Test
  void lorentzOscillatorByHand() {
    // f0 = 0, one oscillator f = 1, ω1 = 4 eV, Γ1 = 0, ħωp = 3 eV; at 2 eV: ε = 1 + 9/(16 − 4) =
    // 1.75.
    LorentzDrude l =
        new LorentzDrude(
            3, 0, 0, new double[] {1}, new double[] {0}, new double[] {4}, Optional.empty());
    // Definition of a Lorentz term f ωp²/(ω1² − ω² − iωΓ1) (Rakić et al. 1998, eq. 1, from memory).
    assertEquals(Math.sqrt(1.75), l.index(LorentzDrude.EV_METRE / 2).getReal(), 1e-12);
  }

  @Test
  void constantIndexAndRanges() {
    assertEquals(new Complex(1, 0), ConstantIndex.VACUUM.index(1 * UM));
    assertTrue(ConstantIndex.VACUUM.isValidAt(1e-9));
    assertThrows(IllegalArgumentException.class, () -> new ConstantIndex(1.5, -0.1));
    assertThrows(IllegalArgumentException.class, () -> ConstantIndex.VACUUM.index(0));
    assertThrows(IllegalArgumentException.class, () -> ConstantIndex.VACUUM.index(Double.NaN));
    assertThrows(IllegalArgumentException.class, () -> new WavelengthRange(2e-6, 1e-6));
    assertTrue(WavelengthRange.ALL.contains(1e3));
    assertFalse(WavelengthRange.ALL.contains(Double.POSITIVE_INFINITY));
    assertArrayEquals(
        new double[] {1e-6, 2e-6},
        new double[] {
          WavelengthRange.ofMicrometres(1, 2).min(), WavelengthRange.ofMicrometres(1, 2).max()
        },
        1e-20);
  }
}
