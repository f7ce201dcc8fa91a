package jonquil.optics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;

/** Invariants that must hold for any element and any state, over seeded random cases. */
class PropertiesTest {

  static Coherency randomState(SplittableRandom rnd) {
    double power = rnd.nextDouble() * 2;
    Coherency pure =
        Coherency.elliptical(
            (rnd.nextDouble() - 0.5) * Math.PI, (rnd.nextDouble() - 0.5) * Math.PI / 2, power);
    return pure.depolarized(rnd.nextDouble());
  }

  static Complex randomDisc(SplittableRandom rnd) {
    double r = Math.sqrt(rnd.nextDouble());
    double a = rnd.nextDouble() * 2 * Math.PI;
    return new Complex(r * Math.cos(a), r * Math.sin(a));
  }

  static Jones randomPassive(SplittableRandom rnd) {
    double angle = (rnd.nextDouble() - 0.5) * 2 * Math.PI;
    switch (rnd.nextInt(5)) {
      case 0:
        return Jones.retarder(rnd.nextDouble() * 2 * Math.PI, angle);
      case 1:
        return Jones.polarizer(angle, rnd.nextDouble(), 1 + rnd.nextDouble() * 1e6);
      case 2:
        return Jones.reflection(randomDisc(rnd), randomDisc(rnd), angle);
      case 3:
        return Jones.rotator(angle);
      default:
        Fresnel.Coefficients c =
            Fresnel.at(
                Complex.ONE,
                new Complex(1 + 3 * rnd.nextDouble(), 4 * rnd.nextDouble()),
                rnd.nextDouble() * 1.5);
        return Jones.reflection(c.rp(), c.rs(), angle);
    }
  }

  @RepeatedTest(200)
  void idealRetardersAndRotatorsAreUnitary(RepetitionInfo info) {
    SplittableRandom rnd = new SplittableRandom(6000 + info.getCurrentRepetition());
    assertTrue(
        Jones.retarder(rnd.nextDouble() * 4 * Math.PI, rnd.nextDouble() * 7).isUnitary(1e-14));
    assertTrue(Jones.rotator(rnd.nextDouble() * 7).isUnitary(1e-14));
    assertTrue(
        !Jones.polarizer(rnd.nextDouble(), 0.99, 10).isUnitary(1e-3), "a polarizer is lossy");
  }

  @RepeatedTest(300)
  void passiveElementsNeverAddPower(RepetitionInfo info) {
    SplittableRandom rnd = new SplittableRandom(7000 + info.getCurrentRepetition());
    Jones j = randomPassive(rnd);
    assertTrue(j.isPassive(1e-12), j::toString);
    for (int i = 0; i < 10; i++) {
      Coherency in = randomState(rnd);
      Coherency out = in.transform(j);
      assertTrue(out.power() <= in.power() * (1 + 1e-12) + 1e-300, () -> j + " on " + in);
      assertTrue(out.power() <= in.power() * j.maxPowerGain() * (1 + 1e-12) + 1e-300);
    }
  }

  @RepeatedTest(200)
  void randomChainsKeepStatesPhysical(RepetitionInfo info) {
    SplittableRandom rnd = new SplittableRandom(8000 + info.getCurrentRepetition());
    Coherency state = randomState(rnd);
    for (int i = 0; i < 30; i++) {
      state = state.transform(randomPassive(rnd));
      if (rnd.nextInt(4) == 0) {
        state = state.depolarized(rnd.nextDouble());
      }
      assertTrue(state.isPhysical(1e-12), state.toString());
      double[] s = state.stokes();
      double polarized = Math.sqrt(s[1] * s[1] + s[2] * s[2] + s[3] * s[3]);
      assertTrue(polarized <= s[0] * (1 + 1e-12) + 1e-300, state.toString());
      assertTrue(state.dop() >= 0 && state.dop() <= 1);
    }
  }

  @RepeatedTest(200)
  void stokesAndEllipseParametersRoundTrip(RepetitionInfo info) {
    SplittableRandom rnd = new SplittableRandom(9000 + info.getCurrentRepetition());
    double psi = (rnd.nextDouble() - 0.5) * Math.PI * 0.999;
    double chi = (rnd.nextDouble() - 0.5) * Math.PI / 2 * 0.999;
    double power = 0.01 + rnd.nextDouble();
    Coherency c = Coherency.elliptical(psi, chi, power);
    double[] s = c.stokes();
    // (S0 ± S1)/2 rounds in the last bit, so the round trip is exact to an ulp, not bitwise.
    assertTrue(c.approxEquals(Coherency.fromStokes(s[0], s[1], s[2], s[3]), 1e-15 * power));
    assertEquals(power, c.power(), 1e-14);
    assertEquals(chi, c.ellipticityAngle(), 1e-9);
    if (Math.abs(Math.abs(chi) - Math.PI / 4) > 1e-3) {
      assertEquals(psi, c.azimuth(), 1e-9);
    }
    // A fully polarized state has dop 1 (definition of the degree of polarization).
    assertEquals(1, c.dop(), 1e-12);
    Coherency mixed = c.depolarized(rnd.nextDouble());
    double[] m = mixed.stokes();
    assertTrue(mixed.approxEquals(Coherency.fromStokes(m[0], m[1], m[2], m[3]), 1e-15 * power));
  }

  @RepeatedTest(200)
  void jonesVectorAndMatrixViewsAgree(RepetitionInfo info) {
    // Transforming Φ = E E† by J must equal the coherency of J·E, for any J and E.
    SplittableRandom rnd = new SplittableRandom(10000 + info.getCurrentRepetition());
    double[] e = {rnd.nextGaussian(), rnd.nextGaussian(), rnd.nextGaussian(), rnd.nextGaussian()};
    Jones j =
        Jones.of(
            new Complex(rnd.nextGaussian(), rnd.nextGaussian()),
            new Complex(rnd.nextGaussian(), rnd.nextGaussian()),
            new Complex(rnd.nextGaussian(), rnd.nextGaussian()),
            new Complex(rnd.nextGaussian(), rnd.nextGaussian()));
    Complex ex = new Complex(e[0], e[1]);
    Complex ey = new Complex(e[2], e[3]);
    Complex ox = j.a().multiply(ex).add(j.b().multiply(ey));
    Complex oy = j.c().multiply(ex).add(j.d().multiply(ey));
    Coherency viaMatrix = Coherency.fromJonesVector(e[0], e[1], e[2], e[3]).transform(j);
    Coherency viaVector =
        Coherency.fromJonesVector(ox.getReal(), ox.getImaginary(), oy.getReal(), oy.getImaginary());
    assertTrue(viaMatrix.approxEquals(viaVector, 1e-12), viaMatrix + " vs " + viaVector);
    // (AB)† = B†A†, and rotating an element equals rotating the frame around it.
    Jones k = randomPassive(rnd);
    assertTrue(j.times(k).dagger().approxEquals(k.dagger().times(j.dagger()), 1e-12));
    double th = rnd.nextDouble() * 6;
    Coherency s = randomState(rnd);
    Coherency a = s.transform(j.rotatedBy(th));
    Coherency b = s.inFrameRotatedBy(th).transform(j).inFrameRotatedBy(-th);
    assertTrue(a.approxEquals(b, 1e-12), a + " vs " + b);
  }
}
