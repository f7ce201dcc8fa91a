package jonquil.optics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Jones elements and coherency matrices against published laws; each check names its source. */
class PolarizationTest {
  static final double W = 1e-3;

  @ParameterizedTest
  @ValueSource(doubles = {0, 15, 30, 45, 60, 90, 120})
  void malusLaw(double degrees) {
    // Hecht, Optics, 5th ed. 2017, §8.2, Malus's law I(θ) = I(0) cos²θ (eq. 8.24, from memory).
    double th = Math.toRadians(degrees);
    Coherency out =
        Coherency.linear(0, W).transform(Jones.polarizer(th, 1, Double.POSITIVE_INFINITY));
    assertEquals(W * Math.cos(th) * Math.cos(th), out.power(), 1e-18);
  }

  @ParameterizedTest
  @ValueSource(doubles = {5, 22.5, 30, 40})
  void halfWavePlateRotatesLinearLightByTwiceItsAngle(double degrees) {
    // Hecht 2017, §8.7.1 (from memory): a half-wave plate with its fast axis at θ to the plane of
    // vibration turns linear light through 2θ.
    double th = Math.toRadians(degrees);
    Coherency out = Coherency.linear(0, W).transform(Jones.retarder(Math.PI, th));
    assertEquals(2 * th, out.azimuth(), 1e-12);
    assertEquals(1, out.dop(), 1e-12);
    assertSame(Handedness.NONE, out.handedness());
  }

  @Test
  void horizontalLightThroughQuarterWaveAt45DegreesIsRightCircular() {
    // The package convention: fast axis at +45°, horizontal input → S3 = +S0, RIGHT.
    Coherency out = Coherency.linear(0, W).transform(Jones.retarder(Math.PI / 2, Math.PI / 4));
    assertEquals(W, out.stokes()[3], 1e-15);
    assertSame(Handedness.RIGHT, out.handedness());
    // S3 = +S0 and χ = π/4 for right circular light: definition (optics/package-info.java).
    assertEquals(Math.PI / 4, out.ellipticityAngle(), 1e-12);
    // Independent of any Stokes sign: follow the real field Re{E e^{−iωt}} in time and read its
    // sense of rotation as the receiver sees it (x' right, y' up, beam towards the viewer).
    // Born & Wolf 1999 §1.4.2 (from memory) call clockwise-for-the-receiver "right-handed".
    Jones j = Jones.retarder(Math.PI / 2, Math.PI / 4);
    assertTrue(clockwiseForReceiver(j.a(), j.c()), "field should turn clockwise for the receiver");
  }

  @Test
  void collettsQuarterWaveExampleInThisConvention() {
    // Collett, Field Guide to Polarization, SPIE 2005, "Wave plates": with the fast axis
    // horizontal, light linear at +45° leaves a quarter-wave plate circular; Collett labels the
    // result RCP. In this package the same physical set-up yields S3 = −S0, which we call LEFT,
    // and the time-domain check shows the field turns counter-clockwise for the receiver. The
    // disagreement is one of labelling between Collett's phase and handedness conventions and
    // ours (it is reported, not hidden): the rotation sense asserted here is the physics.
    Coherency out = Coherency.linear(Math.PI / 4, W).transform(Jones.retarder(Math.PI / 2, 0));
    assertEquals(-W, out.stokes()[3], 1e-15);
    assertSame(Handedness.LEFT, out.handedness());
    Jones j = Jones.retarder(Math.PI / 2, 0);
    Complex ex = j.a().add(j.b()).divide(Math.sqrt(2));
    Complex ey = j.c().add(j.d()).divide(Math.sqrt(2));
    assertTrue(!clockwiseForReceiver(ex, ey));
  }

  /** Sign of (E × dE/dt)·ẑ over a period: negative means clockwise seen from +z, looking back. */
  private static boolean clockwiseForReceiver(Complex ex, Complex ey) {
    double turning = 0;
    for (int i = 0; i < 16; i++) {
      double wt = i * Math.PI / 8;
      Complex phase = new Complex(Math.cos(wt), -Math.sin(wt));
      double x = ex.multiply(phase).getReal();
      double y = ey.multiply(phase).getReal();
      // d/dt of Re{E e^{−iωt}} is Re{−iω E e^{−iωt}}
      Complex dPhase = phase.multiply(Complex.I.negate());
      double dx = ex.multiply(dPhase).getReal();
      double dy = ey.multiply(dPhase).getReal();
      turning += x * dy - y * dx;
    }
    return turning < 0;
  }

  @Test
  void jonesVectorConventionForCircularStates() {
    // The package convention, checked on the defining vectors: (1, −i)/√2 is RIGHT, (1, i)/√2 LEFT.
    double r = Math.sqrt(0.5);
    Coherency right = Coherency.fromJonesVector(r, 0, 0, -r);
    Coherency left = Coherency.fromJonesVector(r, 0, 0, r);
    assertTrue(right.approxEquals(Coherency.circular(Handedness.RIGHT, 1), 1e-15));
    assertTrue(left.approxEquals(Coherency.circular(Handedness.LEFT, 1), 1e-15));
    assertTrue(clockwiseForReceiver(new Complex(r), new Complex(0, -r)));
    assertTrue(Handedness.RIGHT.describe().contains("clockwise as seen by the receiver"));
  }

  @Test
  void unpolarizedLightThroughAnIdealPolarizerKeepsHalfAndBecomesPolarized() {
    // Hecht 2017, §8.2 (from memory): an ideal polarizer passes half the irradiance of natural
    // light, and what passes is linearly polarized along its axis.
    Coherency out =
        Coherency.unpolarized(W).transform(Jones.polarizer(0.3, 1, Double.POSITIVE_INFINITY));
    assertEquals(W / 2, out.power(), 1e-18);
    assertEquals(1, out.dop(), 1e-12);
    assertEquals(0.3, out.azimuth(), 1e-12);
    assertEquals(Double.POSITIVE_INFINITY, out.extinctionRatio());
    assertEquals(0, Coherency.unpolarized(W).dop(), 0);
    assertEquals(1, Coherency.unpolarized(W).extinctionRatio(), 0);
  }

  @Test
  void realPolarizerLeaksOneOverItsExtinctionRatio() {
    // Definitions of a polarizer's transmission (0.9 of light along its axis) and extinction ratio
    // (the crossed state passes 1/1000 of the aligned one); unpolarized input gives that ratio.
    Jones p = Jones.polarizer(0, 0.9, 1000);
    assertEquals(0.9 * W, Coherency.linear(0, W).transform(p).power(), 1e-18);
    assertEquals(0.9 * W / 1000, Coherency.linear(Math.PI / 2, W).transform(p).power(), 1e-18);
    Coherency out = Coherency.unpolarized(W).transform(p);
    assertEquals(1000, out.extinctionRatio(), 1e-9);
  }

  @Test
  void perfectMirrorFlipsCircularHandedness() {
    // The package convention: a normal-incidence mirror is diag(1, −1) in the reflected frame.
    Jones mirror = Jones.reflection(Complex.ONE, new Complex(-1), 0.7);
    Coherency out = Coherency.circular(Handedness.RIGHT, W).transform(mirror);
    assertSame(Handedness.LEFT, out.handedness());
    assertEquals(W, out.power(), 1e-18);
    // A real metal approaches the perfect mirror as κ grows.
    Fresnel.Coefficients c = Fresnel.at(Complex.ONE, new Complex(0, 1e5), 0);
    // A perfect conductor gives rp = 1, rs = −1 in Hecht's sign convention (Hecht, Optics, 5th ed.
    // 2017, §4.6, section number from memory); the mirror above keeps W by definition.
    assertEquals(1, c.rp().getReal(), 1e-4);
    assertEquals(-1, c.rs().getReal(), 1e-4);
    // Any interface at normal incidence has rp = −rs, so glass flips the hand too.
    Fresnel.Coefficients glass = Fresnel.at(Complex.ONE, new Complex(1.5), 0);
    Coherency fromGlass =
        Coherency.circular(Handedness.RIGHT, W)
            .transform(Jones.reflection(glass.rp(), glass.rs(), 0));
    assertSame(Handedness.LEFT, fromGlass.handedness());
    assertEquals(0.04 * W, fromGlass.power(), 1e-18);
  }

  @Test
  void reflectionMatrixPutsPAlongThePlaneAzimuth() {
    double phi = 0.4;
    Fresnel.Coefficients c = Fresnel.at(Complex.ONE, new Complex(1.5), Math.toRadians(60));
    Jones r = Jones.reflection(c.rp(), c.rs(), phi);
    assertEquals(c.Rp() * W, Coherency.linear(phi, W).transform(r).power(), 1e-18);
    assertEquals(c.Rs() * W, Coherency.linear(phi + Math.PI / 2, W).transform(r).power(), 1e-18);
    Jones t =
        Jones.transmission(
            c.tp(),
            c.ts(),
            phi,
            c.Tp() / (c.tp().abs() * c.tp().abs()),
            c.Ts() / (c.ts().abs() * c.ts().abs()));
    assertEquals(c.Tp() * W, Coherency.linear(phi, W).transform(t).power(), 1e-18);
    assertEquals(c.Ts() * W, Coherency.linear(phi + Math.PI / 2, W).transform(t).power(), 1e-18);
  }

  @Test
  void rotatorTurnsTheAzimuthAndFrameRotationUndoesIt() {
    Coherency in = Coherency.elliptical(0.2, 0.3, W);
    Coherency turned = in.transform(Jones.rotator(0.5));
    // Definition of a rotator: it adds its angle (0.5 rad) to the azimuth and keeps the
    // ellipticity; a frame turned by 0.5 rad sees the azimuth 0.5 rad smaller (definition).
    assertEquals(0.7, turned.azimuth(), 1e-12);
    assertEquals(0.3, turned.ellipticityAngle(), 1e-12);
    assertEquals(-0.3, in.inFrameRotatedBy(0.5).azimuth(), 1e-12);
  }

  @Test
  void derivedQuantitiesOfAPartiallyPolarizedBeam() {
    // Born & Wolf 1999 §10.8 (from memory): a beam is the sum of an unpolarized and a fully
    // polarized part; DOP = polarized power / total, and the eigenvalues of Φ are (S0 ± |S|)/2.
    Coherency beam = Coherency.linear(0.1, 0.6 * W).plus(Coherency.unpolarized(0.4 * W));
    assertEquals(0.6, beam.dop(), 1e-12);
    assertEquals((1 + 0.6) / (1 - 0.6), beam.extinctionRatio(), 1e-9);
    assertEquals(0.1, beam.azimuth(), 1e-12);
    assertEquals(0.6, Coherency.linear(0.1, W).depolarized(0.4).dop(), 1e-12);
    assertEquals(Math.PI / 2, Coherency.linear(Math.PI / 2, W).azimuth(), 0);
    assertEquals(Math.PI / 2, Coherency.linear(-Math.PI / 2, W).azimuth(), 1e-12);
    assertEquals(0, Coherency.ZERO.dop(), 0);
  }

  @Test
  void unitsStayWatts() {
    // Power is S0, in watts (definition of the Stokes parameters).
    assertEquals(2.5, Coherency.circular(Handedness.LEFT, 2.5).power(), 0);
    assertEquals(2.5 * 0.25, Coherency.circular(Handedness.LEFT, 2.5).scaled(0.25).power(), 1e-15);
  }
}
