package jonquil.optics.beam;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;

/** Invariants that must hold for any beam and any paraxial train, over seeded random cases. */
class BeamPropertiesTest {

  static double logUniform(SplittableRandom rnd, double lo, double hi) {
    return lo * Math.pow(hi / lo, rnd.nextDouble());
  }

  static GaussianBeam randomBeam(SplittableRandom rnd) {
    double lambda = logUniform(rnd, 200e-9, 11e-6);
    double m2 = 1 + 20 * rnd.nextDouble() * rnd.nextDouble();
    double w0 = logUniform(rnd, 1e-6, 2e-2);
    double n = 1 + 3 * rnd.nextDouble();
    GaussianBeam b = GaussianBeam.fromWaist(lambda, m2, w0, 0, n);
    // Waist positions spread over several Rayleigh ranges either side, whatever z_R is.
    return b.propagate((rnd.nextDouble() - 0.5) * 10 * b.rayleighRange());
  }

  /**
   * A random element and the index behind it; the matrix is always a valid passive paraxial
   * element.
   */
  static Abcd randomElement(SplittableRandom rnd, double nIn, double[] nOut, double scale) {
    switch (rnd.nextInt(4)) {
      case 0:
        nOut[0] = nIn;
        return Abcd.freeSpace(rnd.nextDouble() * 3 * scale);
      case 1:
        nOut[0] = nIn;
        return Abcd.thinLens((rnd.nextBoolean() ? 1 : -1) * logUniform(rnd, 0.05, 20) * scale);
      case 2:
        nOut[0] = 1 + 3 * rnd.nextDouble();
        return Abcd.flatInterface(nIn, nOut[0]);
      default:
        nOut[0] = 1 + 3 * rnd.nextDouble();
        return Abcd.curvedInterface(
            nIn, nOut[0], (rnd.nextBoolean() ? 1 : -1) * logUniform(rnd, 0.1, 10) * scale);
    }
  }

  static void assertSameBeam(GaussianBeam expected, GaussianBeam actual, double rel) {
    double scale = expected.rayleighRange() + Math.abs(expected.waistPosition());
    assertEquals(
        expected.waistRadius(), actual.waistRadius(), rel * expected.waistRadius(), "waist radius");
    assertEquals(expected.waistPosition(), actual.waistPosition(), rel * scale, "waist position");
    assertEquals(expected.index(), actual.index(), rel * expected.index(), "index");
    assertEquals(expected.m2(), actual.m2());
    assertEquals(expected.wavelength(), actual.wavelength());
  }

  @RepeatedTest(300)
  void theRadiusIsNeverBelowTheWaist(RepetitionInfo info) {
    // Siegman 1986, §17.1: W(z) = W0 √(1 + (z/z_R)²) ≥ W0.
    SplittableRandom rnd = new SplittableRandom(11_000 + info.getCurrentRepetition());
    GaussianBeam b = randomBeam(rnd);
    for (int i = 0; i < 20; i++) {
      double dz = (rnd.nextDouble() - 0.5) * 100 * b.rayleighRange();
      double w = b.radiusAt(dz);
      assertTrue(w >= b.waistRadius() && Double.isFinite(w), () -> b + " at " + dz);
    }
    assertEquals(b.waistRadius(), b.radiusAt(b.waistPosition()), 1e-15 * b.waistRadius());
  }

  @RepeatedTest(300)
  void propagationIsAdditive(RepetitionInfo info) {
    SplittableRandom rnd = new SplittableRandom(12_000 + info.getCurrentRepetition());
    GaussianBeam b = randomBeam(rnd);
    double d1 = (rnd.nextDouble() - 0.3) * 5 * b.rayleighRange();
    double d2 = (rnd.nextDouble() - 0.3) * 5 * b.rayleighRange();
    assertSameBeam(b.propagate(d1 + d2), b.propagate(d1).propagate(d2), 1e-12);
    // Through the ABCD law as well, which does not share the shortcut in propagate().
    assertSameBeam(
        b.propagate(d1 + d2), b.apply(Abcd.freeSpace(d1)).apply(Abcd.freeSpace(d2)), 1e-9);
    assertEquals(b.propagate(d1).radius(), b.radiusAt(d1), 1e-12 * b.radiusAt(d1));
  }

  @RepeatedTest(300)
  void aWholeTrainActsLikeItsStepsAndKeepsItsDeterminant(RepetitionInfo info) {
    SplittableRandom rnd = new SplittableRandom(13_000 + info.getCurrentRepetition());
    GaussianBeam start = randomBeam(rnd);
    double scale = Math.max(start.rayleighRange(), 1e-3);
    GaussianBeam stepwise = start;
    Abcd system = Abcd.IDENTITY;
    double detProduct = 1;
    double[] nOut = new double[1];
    int steps = 1 + rnd.nextInt(8);
    for (int i = 0; i < steps; i++) {
      Abcd e = randomElement(rnd, stepwise.index(), nOut, scale);
      assertEquals(
          stepwise.index() / nOut[0], e.determinant(), 1e-15 * e.determinant(), "det = n_in/n_out");
      stepwise = stepwise.apply(e, nOut[0]);
      system = system.then(e);
      detProduct *= e.determinant();
    }
    // Determinants multiply, so a train of any length has det = n_first/n_last.
    assertEquals(detProduct, system.determinant(), 1e-9 * detProduct);
    assertEquals(start.index() / stepwise.index(), system.determinant(), 1e-9 * detProduct);
    GaussianBeam whole = start.apply(system);
    assertSameBeam(stepwise, whole, 1e-6);
    assertTrue(whole.radius() > 0 && Double.isFinite(whole.radius()));
    assertTrue(whole.waistRadius() > 0 && Double.isFinite(whole.waistRadius()));
    // M² λ/(π n) is the beam parameter product: lenses cannot change it, only the medium can.
    assertEquals(
        start.beamParameterProduct() * start.index() / whole.index(),
        whole.beamParameterProduct(),
        1e-6 * whole.beamParameterProduct());
  }

  @RepeatedTest(200)
  void qMatchesRadiusAndCurvatureEverywhere(RepetitionInfo info) {
    // The package convention, 1/q = 1/R − i M² λ/(π n W²), checked on random beams.
    SplittableRandom rnd = new SplittableRandom(14_000 + info.getCurrentRepetition());
    GaussianBeam b = randomBeam(rnd);
    Complex inv = b.q().reciprocal();
    double r = b.curvatureRadius();
    assertEquals(1 / r, inv.getReal(), 1e-9 * Math.abs(inv.abs()));
    double im = -b.m2() * b.wavelength() / (Math.PI * b.index() * b.radius() * b.radius());
    assertEquals(im, inv.getImaginary(), 1e-9 * Math.abs(im));
    assertSameBeam(b, GaussianBeam.fromQ(b.q(), b.wavelength(), b.m2(), b.index()), 1e-12);
  }

  @RepeatedTest(200)
  void elementsUndoThemselves(RepetitionInfo info) {
    SplittableRandom rnd = new SplittableRandom(15_000 + info.getCurrentRepetition());
    GaussianBeam b = randomBeam(rnd);
    double f = (rnd.nextBoolean() ? 1 : -1) * logUniform(rnd, 1e-3, 10);
    assertSameBeam(b, b.throughThinLens(f).throughThinLens(-f), 1e-6);
    double n = 1 + 3 * rnd.nextDouble();
    assertSameBeam(b, b.intoMedium(n).intoMedium(b.index()), 1e-12);
    // The shortcut in intoMedium() agrees with the ABCD law for a flat interface.
    assertSameBeam(b.apply(Abcd.flatInterface(b.index(), n), n), b.intoMedium(n), 1e-12);
    // Lenses and interfaces are thin: the radius does not jump across them.
    assertEquals(b.radius(), b.throughThinLens(f).radius(), 1e-9 * b.radius());
    assertEquals(b.radius(), b.intoMedium(n).radius(), 1e-12 * b.radius());
  }
}
