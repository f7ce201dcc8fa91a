package jonquil.optics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Thin-film stacks against published closed forms; each check names its source. */
class ThinFilmTest {
  static final Complex AIR = Complex.ONE;
  static final double LAMBDA = 550e-9;

  @Test
  void quarterWaveMagnesiumFluorideOnGlassReflectsAbout1Point26Percent() {
    // Macleod, Thin-Film Optical Filters, 4th ed. 2010, ch. 3 (single-layer antireflection
    // coating, from memory): R = ((n0 ns − n1²)/(n0 ns + n1²))² for a quarter-wave layer;
    // MgF2 (1.38) on glass (1.52) gives about 1.26 %.
    double n1 = 1.38;
    double ns = 1.52;
    List<ThinFilm.Layer> layers =
        List.of(new ThinFilm.Layer(new Complex(n1), ThinFilm.quarterWaveThickness(n1, LAMBDA, 0)));
    Fresnel.Coefficients c = ThinFilm.stack(AIR, layers, new Complex(ns), 0, LAMBDA);
    double expected = Math.pow((ns - n1 * n1) / (ns + n1 * n1), 2);
    assertEquals(expected, c.Rs(), 1e-14);
    assertEquals(expected, c.Rp(), 1e-14);
    assertEquals(0.0126, c.Rs(), 0.00005);
    assertEquals(1, c.Rs() + c.Ts(), 1e-13);
  }

  @Test
  void halfWaveLayerIsAbsentee() {
    // Macleod 2010, ch. 2 (from memory): a half-wave layer at its design wavelength leaves the
    // reflectance of the bare substrate unchanged (an "absentee" layer).
    double d = 2 * ThinFilm.quarterWaveThickness(2.1, LAMBDA, 0);
    Fresnel.Coefficients c =
        ThinFilm.stack(
            AIR, List.of(new ThinFilm.Layer(new Complex(2.1), d)), new Complex(1.52), 0, LAMBDA);
    Fresnel.Coefficients bare = Fresnel.at(AIR, new Complex(1.52), 0);
    assertEquals(bare.Rs(), c.Rs(), 1e-14);
    assertEquals(bare.Rp(), c.Rp(), 1e-14);
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2, 3, 5})
  void quarterWaveHighReflectorMatchesClosedForm(int pairs) {
    // Macleod 2010, ch. 6, quarter-wave stack (from memory): for (HL)^x H on a substrate the
    // admittance is Y = (nH/nL)^{2x} nH²/ns and R = ((n0 − Y)/(n0 + Y))².
    double nH = 2.35;
    double nL = 1.38;
    double ns = 1.52;
    List<ThinFilm.Layer> layers = new ArrayList<>();
    for (int i = 0; i < pairs; i++) {
      layers.add(new ThinFilm.Layer(new Complex(nH), ThinFilm.quarterWaveThickness(nH, LAMBDA, 0)));
      layers.add(new ThinFilm.Layer(new Complex(nL), ThinFilm.quarterWaveThickness(nL, LAMBDA, 0)));
    }
    layers.add(new ThinFilm.Layer(new Complex(nH), ThinFilm.quarterWaveThickness(nH, LAMBDA, 0)));
    double y = Math.pow(nH / nL, 2 * pairs) * nH * nH / ns;
    Fresnel.Coefficients c = ThinFilm.stack(AIR, layers, new Complex(ns), 0, LAMBDA);
    assertEquals(Math.pow((1 - y) / (1 + y), 2), c.Rs(), 1e-12);
  }

  @ParameterizedTest
  @ValueSource(doubles = {0, 20, 45, 70})
  void singleFilmMatchesTheAirySum(double degrees) {
    // Born & Wolf, Principles of Optics, 7th ed. 1999, §1.6.4 (eq. 1.6.(58), from memory), also
    // Hecht 2017 §9.7: r = (r01 + r12 e^{2iβ})/(1 + r01 r12 e^{2iβ}),
    // t = t01 t12 e^{iβ}/(1 + r01 r12 e^{2iβ}), β = k0 n1 d cos θ1, built here from
    // single-interface
    // coefficients. An absorbing film makes the sign of the matrix's off-diagonal terms matter.
    for (Complex film :
        new Complex[] {new Complex(2.0), new Complex(0.5, 3.2), new Complex(1.7, 0.05)}) {
      double aoi = Math.toRadians(degrees);
      Complex n0 = AIR;
      Complex ns = new Complex(1.52);
      double d = 37e-9;
      Fresnel.Coefficients c01 = Fresnel.at(n0, film, aoi);
      Complex u = n0.multiply(Math.sin(aoi));
      Complex xi1 = Fresnel.normalComponent(film, u);
      // Angle inside the film, for the second interface: sin θ1 = u / n1.
      Complex sin1 = u.divide(film);
      Complex cos1 = xi1.divide(film);
      Fresnel.Coefficients c12 = interfaceFromInside(film, cos1, sin1, ns);
      Complex phase = Complex.I.multiply(xi1.multiply(2 * Math.PI / LAMBDA * d)).exp();
      Complex phase2 = phase.multiply(phase);
      Fresnel.Coefficients c =
          ThinFilm.stack(n0, List.of(new ThinFilm.Layer(film, d)), ns, aoi, LAMBDA);
      assertClose(airyR(c01.rs(), c12.rs(), phase2), c.rs(), "rs " + film);
      assertClose(airyR(c01.rp(), c12.rp(), phase2), c.rp(), "rp " + film);
      assertClose(
          airyT(c01.ts(), c12.ts(), c01.rs(), c12.rs(), phase, phase2), c.ts(), "ts " + film);
      assertClose(
          airyT(c01.tp(), c12.tp(), c01.rp(), c12.rp(), phase, phase2), c.tp(), "tp " + film);
    }
  }

  /** Hecht-form coefficients from a film whose complex angle is known, written out longhand. */
  private static Fresnel.Coefficients interfaceFromInside(
      Complex n1, Complex cos1, Complex sin1, Complex n2) {
    Complex sin2 = n1.multiply(sin1).divide(n2);
    Complex cos2 = Complex.ONE.subtract(sin2.multiply(sin2)).sqrt();
    // Rounding leaves ~1e-18 imaginary parts on real cosines; only a genuine growth flips the root.
    if (n2.multiply(cos2).getImaginary() < -1e-12 * cos2.abs()) {
      cos2 = cos2.negate();
    }
    Complex a = n1.multiply(cos1);
    Complex b = n2.multiply(cos2);
    Complex e = n2.multiply(cos1);
    Complex f = n1.multiply(cos2);
    Complex rs = a.subtract(b).divide(a.add(b));
    Complex rp = e.subtract(f).divide(e.add(f));
    Complex ts = a.multiply(2).divide(a.add(b));
    Complex tp = a.multiply(2).divide(e.add(f));
    return new Fresnel.Coefficients(rs, rp, ts, tp, 0, 0, 0, 0);
  }

  private static Complex airyR(Complex r01, Complex r12, Complex phase2) {
    return r01.add(r12.multiply(phase2))
        .divide(Complex.ONE.add(r01.multiply(r12).multiply(phase2)));
  }

  private static Complex airyT(
      Complex t01, Complex t12, Complex r01, Complex r12, Complex phase, Complex phase2) {
    return t01.multiply(t12)
        .multiply(phase)
        .divide(Complex.ONE.add(r01.multiply(r12).multiply(phase2)));
  }

  private static void assertClose(Complex expected, Complex actual, String what) {
    assertEquals(
        expected.getReal(), actual.getReal(), 1e-12, what + ": " + expected + " vs " + actual);
    assertEquals(
        expected.getImaginary(),
        actual.getImaginary(),
        1e-12,
        what + ": " + expected + " vs " + actual);
  }

  @RepeatedTest(100)
  void emptyStackEqualsTheBareInterface(RepetitionInfo info) {
    SplittableRandom rnd = new SplittableRandom(3000 + info.getCurrentRepetition());
    Complex n0 = new Complex(1 + rnd.nextDouble());
    Complex ns =
        new Complex(0.1 + 3 * rnd.nextDouble(), rnd.nextBoolean() ? 0 : 4 * rnd.nextDouble());
    double aoi = rnd.nextDouble() * Math.toRadians(89);
    Fresnel.Coefficients bare = Fresnel.at(n0, ns, aoi);
    Fresnel.Coefficients empty = ThinFilm.stack(n0, List.of(), ns, aoi, LAMBDA);
    assertClose(bare.rs(), empty.rs(), "rs");
    assertClose(bare.rp(), empty.rp(), "rp");
    assertClose(bare.ts(), empty.ts(), "ts");
    assertClose(bare.tp(), empty.tp(), "tp");
    assertEquals(bare.Ts(), empty.Ts(), 1e-12);
    assertEquals(bare.Tp(), empty.Tp(), 1e-12);
  }

  @RepeatedTest(100)
  void losslessStacksConserveEnergy(RepetitionInfo info) {
    // Born & Wolf 1999 §1.6 (from memory): with no absorption, R + T = 1 for any stack.
    SplittableRandom rnd = new SplittableRandom(4000 + info.getCurrentRepetition());
    List<ThinFilm.Layer> layers = new ArrayList<>();
    int count = rnd.nextInt(12);
    for (int i = 0; i < count; i++) {
      layers.add(
          new ThinFilm.Layer(new Complex(1.2 + 1.5 * rnd.nextDouble()), rnd.nextDouble() * 400e-9));
    }
    double aoi = rnd.nextDouble() * Math.toRadians(85);
    Fresnel.Coefficients c =
        ThinFilm.stack(AIR, layers, new Complex(1.4 + rnd.nextDouble()), aoi, LAMBDA);
    assertEquals(1, c.Rs() + c.Ts(), 1e-11);
    assertEquals(1, c.Rp() + c.Tp(), 1e-11);
  }

  @RepeatedTest(50)
  void absorbingStacksLoseEnergyNeverGainIt(RepetitionInfo info) {
    SplittableRandom rnd = new SplittableRandom(5000 + info.getCurrentRepetition());
    List<ThinFilm.Layer> layers =
        List.of(
            new ThinFilm.Layer(
                new Complex(0.2 + 2 * rnd.nextDouble(), 0.01 + 3 * rnd.nextDouble()),
                5e-9 + 50e-9 * rnd.nextDouble()),
            new ThinFilm.Layer(new Complex(1.3 + rnd.nextDouble()), 200e-9 * rnd.nextDouble()));
    double aoi = rnd.nextDouble() * Math.toRadians(85);
    Fresnel.Coefficients c = ThinFilm.stack(AIR, layers, new Complex(1.52), aoi, LAMBDA);
    assertEquals(true, c.Rs() + c.Ts() < 1, "s absorbs");
    assertEquals(true, c.Rp() + c.Tp() < 1, "p absorbs");
  }

  @Test
  void obliqueQuarterWaveUsesTheAngleInsideTheLayer() {
    // Macleod 2010 ch. 2 (from memory): the phase thickness is 2π n d cos θ / λ, θ inside the
    // layer.
    double d = ThinFilm.quarterWaveThickness(1.5, LAMBDA, Math.toRadians(45));
    double cosInside = Math.sqrt(1 - 0.5 / 2.25);
    assertEquals(Math.PI / 2, 2 * Math.PI * 1.5 * d * cosInside / LAMBDA, 1e-14);
  }
}
