package jonquil.optics.beam;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Gaussian-beam propagation against published closed forms; each check names its source. */
class GaussianBeamTest {
  static final double HENE = 632.8e-9;

  @Test
  void rayleighRangeOfAHeliumNeonBeam() {
    // Saleh & Teich, Fundamentals of Photonics, 2nd ed. 2007, §3.1: z0 = π W0²/λ.
    // Siegman, Lasers, 1986, §17.1: z_R = π w0²/λ. For 632.8 nm and w0 = 0.5 mm: 1.2411 m.
    GaussianBeam b = GaussianBeam.fromWaist(HENE, 1, 0.5e-3, 0, 1);
    assertEquals(Math.PI * 0.25e-6 / HENE, b.rayleighRange(), 1e-15);
    assertEquals(1.2411, b.rayleighRange(), 1e-4);
  }

  @Test
  void atOneRayleighRangeTheRadiusGrowsByRootTwoAndTheCurvatureIsTwiceZr() {
    // Saleh & Teich 2007, §3.1: W(z0) = √2 W0 and R(z0) = 2 z0.
    // Siegman 1986, §17.1 (section number from memory): the same values at z = z_R.
    GaussianBeam b = GaussianBeam.fromWaist(HENE, 1, 0.5e-3, 0, 1);
    GaussianBeam there = b.propagate(b.rayleighRange());
    assertEquals(Math.sqrt(2) * 0.5e-3, there.radius(), 1e-15);
    assertEquals(2 * b.rayleighRange(), there.curvatureRadius(), 1e-12);
    assertEquals(Double.POSITIVE_INFINITY, b.curvatureRadius(), "a plane wavefront at the waist");
  }

  @Test
  void theWavefrontIsMostCurvedAtOneRayleighRange() {
    // Saleh & Teich 2007, §3.1: R(z) = z[1 + (z0/z)²] has its minimum, 2 z0, at z = z0.
    GaussianBeam b = GaussianBeam.fromWaist(1064e-9, 1, 1e-3, 0, 1);
    double zr = b.rayleighRange();
    double bestZ = 0;
    double bestR = Double.POSITIVE_INFINITY;
    for (int i = 1; i <= 4000; i++) {
      double z = i * 1e-3 * zr;
      double r = b.propagate(z).curvatureRadius();
      if (r < bestR) {
        bestR = r;
        bestZ = z;
      }
    }
    assertEquals(zr, bestZ, 1e-3 * zr);
    assertEquals(2 * zr, bestR, 1e-9 * zr);
  }

  @Test
  void convergingBeamsHaveNegativeCurvature() {
    // Siegman 1986, ch. 17 sign convention: R > 0 diverging, R < 0 converging (from memory).
    GaussianBeam b = GaussianBeam.fromWaist(HENE, 1, 0.5e-3, 2.0, 1);
    assertTrue(b.curvatureRadius() < 0);
    assertTrue(b.propagate(4.0).curvatureRadius() > 0);
    assertEquals(-b.propagate(4.0).curvatureRadius(), b.curvatureRadius(), 1e-12);
  }

  @Test
  void farFieldDivergenceOfATem00Beam() {
    // Saleh & Teich 2007, §3.1: θ0 = λ/(π W0), and W(z) ≈ θ0 z for z ≫ z0.
    GaussianBeam b = GaussianBeam.fromWaist(HENE, 1, 0.5e-3, 0, 1);
    assertEquals(HENE / (Math.PI * 0.5e-3), b.divergence(), 1e-18);
    assertEquals(4.0286e-4, b.divergence(), 1e-8);
    double far = 1e4 * b.rayleighRange();
    assertEquals(b.divergence(), b.radiusAt(far) / far, 1e-8 * b.divergence());
  }

  @ParameterizedTest
  @CsvSource({"1.0", "1.3", "4.0", "25.0"})
  void mSquaredScalesDivergenceAndShortensTheRayleighRange(double m2) {
    // ISO 11146-1:2005, definition of the beam propagation ratio: M² = (π/λ)·d0·Θ/4 with d0 the
    // waist diameter and Θ the full divergence angle (form of the equation from memory).
    // Siegman's embedded Gaussian: a beam of quality M² propagates like TEM00 with λ → M²λ, so
    // θ = M² λ/(π W0) and z_R = π W0²/(M² λ) (Siegman, "New developments in laser resonators",
    // Proc. SPIE 1224, 2 (1990); citation from memory).
    GaussianBeam ideal = GaussianBeam.fromWaist(1064e-9, 1, 0.8e-3, 0, 1);
    GaussianBeam real = GaussianBeam.fromWaist(1064e-9, m2, 0.8e-3, 0, 1);
    assertEquals(m2 * ideal.divergence(), real.divergence(), 1e-12 * real.divergence());
    assertEquals(ideal.rayleighRange() / m2, real.rayleighRange(), 1e-12 * ideal.rayleighRange());
    double isoM2 = Math.PI / 1064e-9 * (2 * real.waistRadius()) * (2 * real.divergence()) / 4;
    assertEquals(m2, isoM2, 1e-12 * m2);
    // The hyperbola W² = W0² + θ² z² of ISO 11146-1 holds at every distance.
    for (double z : new double[] {0.1, 1, 7}) {
      double expected = Math.sqrt(0.64e-6 + Math.pow(real.divergence() * z, 2));
      assertEquals(expected, real.radiusAt(z), 1e-12 * expected);
    }
  }

  @Test
  void fromDivergenceInvertsTheDivergence() {
    // Same relation, θ = M² λ/(π n W0), solved for W0.
    GaussianBeam b = GaussianBeam.fromDivergence(1550e-9, 1.5, 2e-3, 0.1, 1);
    // θ = M² λ/(π n W0) (Siegman, Lasers, 1986, §17.1, section number from memory).
    assertEquals(1.5 * 1550e-9 / (Math.PI * 2e-3), b.waistRadius(), 1e-18);
    assertEquals(2e-3, b.divergence(), 1e-15);
    assertEquals(0.1, b.waistPosition());
  }

  @ParameterizedTest
  @CsvSource({
    // wavelength, M², W0, distance s from input waist to lens, f
    "632.8e-9, 1, 0.5e-3, 0.3, 0.1",
    "632.8e-9, 1, 0.5e-3, 2.0, 0.1",
    "1064e-9, 1, 2e-3, 0, 0.05",
    "1064e-9, 1.8, 1e-3, 0.5, 0.2",
    "10.6e-6, 1.2, 5e-3, 1.5, 0.25",
    "532e-9, 3, 0.2e-3, 0.05, -0.1",
    "800e-9, 1, 50e-6, 0.01, 0.02"
  })
  void thinLensImageWaistMatchesTheClosedForm(
      double lambda, double m2, double w0, double s, double f) {
    // Self, "Focusing of spherical Gaussian beams", Appl. Opt. 22, 658 (1983):
    //   1/(s + z_R²/(s − f)) + 1/s'' = 1/f, and with the magnification
    //   m = 1/√((1 − s/f)² + (z_R/f)²): W0'' = m W0 and s'' − f = m² (s − f).
    // Saleh & Teich 2007, §3.2 give the same magnification form. For M² > 1 the embedded-Gaussian
    // z_R of the real beam is used (Siegman's λ → M²λ).
    GaussianBeam in = GaussianBeam.fromWaist(lambda, m2, w0, -s, 1);
    double zr = in.rayleighRange();
    GaussianBeam out = in.throughThinLens(f);
    double mag = 1 / Math.sqrt(Math.pow(1 - s / f, 2) + Math.pow(zr / f, 2));
    double sImage = f + mag * mag * (s - f);
    assertEquals(sImage, out.waistPosition(), 1e-9 * (Math.abs(sImage) + Math.abs(f)));
    assertEquals(mag * w0, out.waistRadius(), 1e-9 * mag * w0);
    double selfsForm = 1 / (1 / f - 1 / (s + zr * zr / (s - f)));
    assertEquals(selfsForm, out.waistPosition(), 1e-9 * (Math.abs(sImage) + Math.abs(f)));
    // The radius itself is continuous across a thin lens.
    assertEquals(in.radius(), out.radius(), 1e-12 * in.radius());
  }

  @Test
  void aWaistAtTheFrontFocalPlaneIsImagedToTheBackFocalPlane() {
    // Self 1983 (above) with s = f: s'' = f for every z_R; W0'' = λ f/(π W0) (Siegman 1986,
    // §17.4, from memory).
    GaussianBeam in = GaussianBeam.fromWaist(1064e-9, 1, 1e-3, -0.1, 1);
    GaussianBeam out = in.throughThinLens(0.1);
    assertEquals(0.1, out.waistPosition(), 1e-12);
    assertEquals(1064e-9 * 0.1 / (Math.PI * 1e-3), out.waistRadius(), 1e-15);
  }

  @Test
  void aNearlyPointLikeWaistObeysTheGeometricLensEquation() {
    // Self 1983: as z_R → 0 the Gaussian lens law reduces to 1/s + 1/s'' = 1/f (Saleh & Teich
    // 2007, §1.2 for the geometric form).
    GaussianBeam in = GaussianBeam.fromWaist(500e-9, 1, 2e-6, -0.3, 1);
    assertTrue(in.rayleighRange() < 1e-4);
    double expected = 1 / (1 / 0.1 - 1 / 0.3);
    assertEquals(expected, in.throughThinLens(0.1).waistPosition(), 1e-6);
  }

  @ParameterizedTest
  @CsvSource({
    "1064e-9, 1, 3e-3, 0.05",
    "1064e-9, 1.4, 4e-3, 0.1",
    "355e-9, 2, 2e-3, 0.02",
    "10.6e-6, 1.1, 10e-3, 0.1"
  })
  void aCollimatedBeamFocusesToMSquaredLambdaFOverPiW(
      double lambda, double m2, double w, double f) {
    // Siegman 1986, §17.4 (from memory); Saleh & Teich 2007, §3.2: a collimated beam (waist at
    // the lens) focuses at about f to W0'' ≈ M² λ f/(π W) when z_R ≫ f. Exactly,
    // W0'' = W/√(1 + (z_R/f)²), so the approximation's relative error is about ½(f/z_R)².
    GaussianBeam in = GaussianBeam.fromWaist(lambda, m2, w, 0, 1);
    double ratio = f / in.rayleighRange();
    assertTrue(ratio < 0.05, "the test must stay in the limit it claims: z_R ≫ f");
    Focus focus = Focus.afterThinLens(in, f).orElseThrow();
    double approx = m2 * lambda * f / (Math.PI * w);
    assertEquals(approx, focus.radius(), ratio * ratio * approx);
    assertEquals(f, focus.distance(), ratio * ratio * f);
    assertTrue(
        focus.distance() < f,
        "the waist of a collimated beam lies slightly before the focal point");
  }

  @Test
  void theCollimatedFocusApproximationFailsOutsideItsLimit() {
    // Same exact form: with z_R = f the waist is 1/√2 of the input radius, while the
    // approximation gives the full input radius, 41 % too large.
    GaussianBeam in = GaussianBeam.fromWaist(1064e-9, 1, 0.2e-3, 0, 1);
    double f = in.rayleighRange();
    Focus focus = Focus.afterThinLens(in, f).orElseThrow();
    double approx = 1064e-9 * f / (Math.PI * 0.2e-3);
    // Thin-lens focusing of a Gaussian beam (Self, Appl. Opt. 22, 658 (1983); from memory):
    // with z_R = f the waist is W/√2.
    assertEquals(0.2e-3 / Math.sqrt(2), focus.radius(), 1e-15);
    // Focus at f/2 for z_R = f (same relation, Self 1983, from memory).
    assertEquals(f / 2, focus.distance(), 1e-12 * f);
    assertTrue(approx / focus.radius() > 1.4);
  }

  @Test
  void reportsAFocusAfterALens() {
    // A 1 mm radius 1064 nm beam focused by f = 10 mm: W0'' ≈ λf/(πW) = 3.39 µm at about 10 mm
    // (same sources as the collimated-focus test).
    GaussianBeam in = GaussianBeam.fromWaist(1064e-9, 1, 1e-3, 0, 1);
    Focus focus = Focus.afterThinLens(in, 0.01).orElseThrow();
    // λf/(πW) = 1064e-9 · 0.01/(π · 1e-3) = 3.387 µm (Self, Appl. Opt. 22, 658 (1983), citation
    // from memory); the waist sits within 1e-6 m of the focal point.
    assertEquals(3.387e-6, focus.radius(), 1e-9);
    assertEquals(0.01, focus.distance(), 1e-6);
    assertEquals(2 * focus.rayleighRange(), focus.depthOfFocus());
    assertTrue(
        GaussianBeam.fromWaist(1064e-9, 1, 1e-3, -0.2, 1).waistAhead().isEmpty(),
        "diverging: no waist ahead");
    assertTrue(
        in.throughThinLens(-0.05).nextFocus().isEmpty(), "a negative lens makes a virtual waist");
  }

  @Test
  void inGlassTheRayleighRangeGrowsWithTheIndexAndTheDivergenceShrinks() {
    // Siegman 1986, ch. 20 (from memory): at a flat interface q2 = (n2/n1) q1, so the waist keeps
    // its size, z_R scales with n, and the divergence follows the paraxial Snell law n1θ1 = n2θ2.
    // Saleh & Teich 2007, §3.1: z0 = π W0²/λ with λ the wavelength in the medium, λ0/n.
    GaussianBeam air = GaussianBeam.fromWaist(1064e-9, 1.2, 0.5e-3, 0.3, 1);
    GaussianBeam glass = air.intoMedium(1.5);
    assertEquals(1.5 * air.rayleighRange(), glass.rayleighRange(), 1e-12);
    assertEquals(air.divergence() / 1.5, glass.divergence(), 1e-18);
    assertEquals(air.waistRadius(), glass.waistRadius());
    assertEquals(
        0.45, glass.waistPosition(), 1e-15, "the focus moves deeper by n, as in geometric optics");
    assertEquals(
        air.radius(), glass.radius(), 1e-15, "the radius is continuous across the interface");
    assertEquals(1.5 * air.curvatureRadius(), glass.curvatureRadius(), 1e-12);
  }

  @Test
  void aCurvedInterfaceInTheGeometricLimitObeysTheRefractionEquation() {
    // Saleh & Teich 2007, §1.2 (paraxial refraction at a spherical boundary, from memory):
    // n1/s + n2/s' = (n2 − n1)/R. A waist of tiny z_R behaves as a point object.
    GaussianBeam in = GaussianBeam.fromWaist(500e-9, 1, 2e-6, -0.2, 1.0);
    GaussianBeam out = in.apply(Abcd.curvedInterface(1.0, 1.5, 0.05));
    double expected = 1.5 / ((1.5 - 1.0) / 0.05 - 1.0 / 0.2);
    assertEquals(1.5, out.index(), 1e-15);
    assertEquals(expected, out.waistPosition(), 1e-6 * expected);
  }

  @Test
  void qFollowsTheStatedConvention() {
    // Kogelnik & Li, "Laser beams and resonators", Appl. Opt. 5, 1550 (1966): 1/q = 1/R − iλ/(πw²),
    // with λ → λ/n in a medium and, for the embedded Gaussian, λ → M²λ (Siegman, above).
    GaussianBeam b = GaussianBeam.fromWaist(1064e-9, 2.5, 0.3e-3, -0.7, 1.45);
    Complex inv = b.q().reciprocal();
    assertEquals(1 / b.curvatureRadius(), inv.getReal(), 1e-12);
    double expectedIm = -2.5 * 1064e-9 / (Math.PI * 1.45 * b.radius() * b.radius());
    assertEquals(expectedIm, inv.getImaginary(), 1e-12 * Math.abs(expectedIm));
  }

  @Test
  void rejectsUnphysicalBeams() {
    assertThrows(
        IllegalArgumentException.class, () -> GaussianBeam.fromWaist(1e-6, 0.9, 1e-3, 0, 1));
    assertThrows(IllegalArgumentException.class, () -> GaussianBeam.fromWaist(1e-6, 1, 0, 0, 1));
    assertThrows(
        IllegalArgumentException.class, () -> GaussianBeam.fromWaist(-1e-6, 1, 1e-3, 0, 1));
    assertThrows(
        IllegalArgumentException.class, () -> GaussianBeam.fromWaist(1e-6, 1, 1e-3, Double.NaN, 1));
    assertThrows(IllegalArgumentException.class, () -> GaussianBeam.fromWaist(1e-6, 1, 1e-3, 0, 0));
    assertThrows(
        IllegalArgumentException.class, () -> GaussianBeam.fromQ(new Complex(1, -1), 1e-6, 1, 1));
    GaussianBeam b = GaussianBeam.fromWaist(1e-6, 1, 1e-3, 0, 1);
    assertThrows(IllegalArgumentException.class, () -> b.apply(new Abcd(1, 0, 0, -1)));
    assertThrows(IllegalArgumentException.class, () -> b.apply(Abcd.flatInterface(1, 1.5), 1.0));
    assertEquals(1.5, b.apply(Abcd.flatInterface(1, 1.5), 1.5).index());
  }
}
