package jonquil.optics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Fresnel coefficients against published formulas and values; each check names its source. */
class FresnelTest {
  static final Complex AIR = Complex.ONE;
  static final Complex GLASS = new Complex(1.5);

  @Test
  void glassReflectsFourPercentAtNormalIncidence() {
    // Hecht, Optics, 5th ed. 2017, §4.6.2: R = ((nt − ni)/(nt + ni))², about 4 % for glass of
    // n = 1.5 in air (the 4 % figure is quoted there; section number from memory).
    Fresnel.Coefficients c = Fresnel.at(AIR, GLASS, 0);
    assertEquals(0.04, c.Rs(), 1e-15);
    assertEquals(0.04, c.Rp(), 1e-15);
    assertEquals(0.96, c.Ts(), 1e-15);
    assertEquals(0.96, c.Tp(), 1e-15);
  }

  @ParameterizedTest
  @ValueSource(doubles = {10, 30, 45, 56, 70, 85})
  void matchFresnelsSineAndTangentForms(double degrees) {
    // Hecht, Optics, 5th ed. 2017, eqs. 4.42–4.45 (equation numbers from memory):
    // r⊥ = −sin(θi − θt)/sin(θi + θt), r∥ = tan(θi − θt)/tan(θi + θt),
    // t⊥ = 2 sin θt cos θi / sin(θi + θt), t∥ = 2 sin θt cos θi / (sin(θi + θt) cos(θi − θt)).
    double ti = Math.toRadians(degrees);
    double tt = Math.asin(Math.sin(ti) / 1.5);
    Fresnel.Coefficients c = Fresnel.at(AIR, GLASS, ti);
    assertEquals(-Math.sin(ti - tt) / Math.sin(ti + tt), c.rs().getReal(), 1e-14);
    assertEquals(Math.tan(ti - tt) / Math.tan(ti + tt), c.rp().getReal(), 1e-14);
    assertEquals(2 * Math.sin(tt) * Math.cos(ti) / Math.sin(ti + tt), c.ts().getReal(), 1e-14);
    assertEquals(
        2 * Math.sin(tt) * Math.cos(ti) / (Math.sin(ti + tt) * Math.cos(ti - tt)),
        c.tp().getReal(),
        1e-14);
    // Between lossless media the coefficients are real (the forms above, Hecht eqs. 4.42–4.45).
    assertEquals(0, c.rs().getImaginary(), 1e-15);
    assertEquals(0, c.rp().getImaginary(), 1e-15);
  }

  @Test
  void brewsterAngleOfGlassIs56Point31DegreesAndCancelsRp() {
    // Hecht, Optics, 5th ed. 2017, §8.6.1, Brewster's law tan θp = nt/ni (about 56° for glass;
    // 56.31° is atan 1.5 to two decimals).
    double b = Fresnel.brewsterAngle(1.0, 1.5);
    assertEquals(56.31, Math.toDegrees(b), 0.005);
    Fresnel.Coefficients c = Fresnel.at(AIR, GLASS, b);
    assertEquals(0, c.Rp(), 1e-25);
    assertTrue(c.Rs() > 0.1, "s light is still reflected at Brewster's angle");
  }

  @Test
  void criticalAngleFromGlassToAirIs41Point81Degrees() {
    // Hecht, Optics, 5th ed. 2017, §4.7: sin θc = nt/ni; for n = 1.5 glass to air θc ≈ 41.8°
    // (from memory: Hecht quotes "about 42°").
    assertEquals(41.81, Math.toDegrees(Fresnel.criticalAngle(1.5, 1.0).getAsDouble()), 0.005);
    assertFalse(
        Fresnel.criticalAngle(1.0, 1.5).isPresent(),
        "no total reflection going to a denser medium");
    Fresnel.Coefficients justBelow = Fresnel.at(GLASS, AIR, Math.toRadians(41.5));
    assertTrue(justBelow.Rs() < 1 && justBelow.Ts() > 0);
  }

  @ParameterizedTest
  @ValueSource(doubles = {42, 45, 50, 60, 75, 89})
  void totalInternalReflectionPhasesMatchClosedForms(double degrees) {
    // Born & Wolf, Principles of Optics, 7th ed. 1999, §1.5.4 (eqs. 60–61, numbering from
    // memory): |r| = 1 and tan(δ⊥/2) = √(sin²θ − n²)/cos θ, tan(δ∥/2) = √(sin²θ − n²)/(n² cos θ)
    // with n = n2/n1. Under e^{−iωt} with the decaying branch the reflected phases are advances,
    // i.e. arg r = −δ (the sign is this package's convention; B&W give the magnitudes).
    double th = Math.toRadians(degrees);
    double n = 1.0 / 1.5;
    double q = Math.sqrt(Math.sin(th) * Math.sin(th) - n * n);
    Fresnel.Coefficients c = Fresnel.at(GLASS, AIR, th);
    assertEquals(1, c.Rs(), 1e-14);
    assertEquals(1, c.Rp(), 1e-14);
    assertEquals(0, c.Ts(), 0);
    assertEquals(0, c.Tp(), 0);
    assertEquals(-2 * Math.atan(q / Math.cos(th)), c.rs().getArgument(), 1e-12);
    assertEquals(-2 * Math.atan(q / (n * n * Math.cos(th))), c.rp().getArgument(), 1e-12);
  }

  @ParameterizedTest
  @ValueSource(doubles = {48 + 37 / 60.0, 54 + 37 / 60.0})
  void fresnelRhombAnglesGiveAnEighthWaveBetweenPAndS(double degrees) {
    // Born & Wolf, Principles of Optics, 7th ed. 1999, §1.5.4 (from memory): for n = 1.51 a
    // relative phase of 45° between the p and s reflections occurs at θ = 48°37' and 54°37'
    // (the Fresnel rhomb). The sign (p lags s here) follows from the convention above.
    Fresnel.Coefficients c = Fresnel.at(new Complex(1.51), AIR, Math.toRadians(degrees));
    assertEquals(-45, Math.toDegrees(Fresnel.retardance(c)), 0.05);
  }

  @Test
  void silverAt632NanometresMatchesTheTextbookMetalFormulas() {
    // Index: Johnson & Christy, Phys. Rev. B 6, 4370 (1972), silver at 632.8 nm,
    // n = 0.0562 + 4.2776i as commonly tabulated (from memory; not re-checked against the table).
    // Reference formulas, evaluated independently here: Azzam & Bashara, Ellipsometry and
    // Polarized Light, 1977, §4.2 (section from memory), with N = n2/n1 and w = √(N² − sin²θ):
    // rs = (cos θ − w)/(cos θ + w), rp = (N² cos θ − w)/(N² cos θ + w).
    Complex silver = new Complex(0.0562, 4.2776);
    double th = Math.toRadians(45);
    Complex n2 = silver.multiply(silver);
    Complex w = n2.subtract(Math.sin(th) * Math.sin(th)).sqrt();
    Complex rs = new Complex(Math.cos(th)).subtract(w).divide(w.add(Math.cos(th)));
    Complex rp = n2.multiply(Math.cos(th)).subtract(w).divide(n2.multiply(Math.cos(th)).add(w));
    Fresnel.Coefficients c = Fresnel.at(AIR, silver, th);
    assertEquals(rs.abs() * rs.abs(), c.Rs(), 1e-13);
    assertEquals(rp.abs() * rp.abs(), c.Rp(), 1e-13);
    double delta = rp.getArgument() - rs.getArgument();
    assertEquals(Math.IEEEremainder(delta, 2 * Math.PI), Fresnel.retardance(c), 1e-12);
    // Abelès's 45° relation rp = rs² (Azzam & Bashara 1977, §4.3, from memory) holds for
    // absorbing media too.
    Complex rs2 = c.rs().multiply(c.rs());
    assertEquals(rs2.getReal(), c.rp().getReal(), 1e-13);
    assertEquals(rs2.getImaginary(), c.rp().getImaginary(), 1e-13);
    // Normal incidence: R = ((n − 1)² + κ²)/((n + 1)² + κ²) (Born & Wolf 1999, §14.2, from
    // memory); silver reflects over 98 % of red light (widely published; from memory).
    Fresnel.Coefficients normal = Fresnel.at(AIR, silver, 0);
    double nr = silver.getReal();
    double k = silver.getImaginary();
    double r0 = ((nr - 1) * (nr - 1) + k * k) / ((nr + 1) * (nr + 1) + k * k);
    assertEquals(r0, normal.Rs(), 1e-14);
    assertTrue(r0 > 0.98, "R = " + r0);
    // At 45° a metal reflects s more strongly than p and the retardance is neither 0 nor π.
    assertTrue(c.Rs() > c.Rp());
    assertTrue(
        Math.abs(Fresnel.retardance(c)) > 0.1 && Math.abs(Fresnel.retardance(c)) < Math.PI - 0.1);
  }

  @Test
  void absorbingMediumGetsTheDecayingBranch() {
    // With n = n' + iκ, κ > 0, the transmitted field e^{i k0 ξ z} must decay: Im ξ > 0.
    Complex xi = Fresnel.normalComponent(new Complex(0.2, 3.0), new Complex(Math.sin(0.7)));
    assertTrue(xi.getImaginary() > 0);
    Complex evanescent =
        Fresnel.normalComponent(new Complex(1.0), new Complex(1.5 * Math.sin(1.0)));
    // Beyond the critical angle the normal component is purely imaginary (Born & Wolf, Principles
    // of Optics, 7th ed. 1999, §1.5.4, section number from memory).
    assertEquals(0, evanescent.getReal(), 1e-15);
    assertTrue(evanescent.getImaginary() > 0);
    // A lossless medium whose radicand picked up a −6e-19 imaginary part by rounding still
    // propagates forwards (regression: the root used to flip to Re < 0).
    Complex propagating = Fresnel.normalComponent(new Complex(1.52), new Complex(0.3, 1e-18));
    assertTrue(propagating.getReal() > 1.4, propagating.toString());
  }

  @RepeatedTest(200)
  void interfacesConserveEnergy(RepetitionInfo info) {
    // Born & Wolf 1999, §1.5.3 (from memory): R + T = 1 for each polarization. The normal
    // Poynting flux is continuous across the interface, so it holds for an absorbing second
    // medium too when T is that flux just inside it.
    SplittableRandom rnd = new SplittableRandom(1000 + info.getCurrentRepetition());
    Complex n1 = new Complex(1 + 2 * rnd.nextDouble());
    Complex n2 =
        new Complex(0.05 + 3 * rnd.nextDouble(), rnd.nextBoolean() ? 0 : 5 * rnd.nextDouble());
    double th = rnd.nextDouble() * Math.toRadians(89.9);
    Fresnel.Coefficients c = Fresnel.at(n1, n2, th);
    assertEquals(1, c.Rs() + c.Ts(), 1e-12, () -> "s: " + n1 + " → " + n2 + " at " + th);
    assertEquals(1, c.Rp() + c.Tp(), 1e-12, () -> "p: " + n1 + " → " + n2 + " at " + th);
  }

  @RepeatedTest(100)
  void abelesRelationHoldsAt45Degrees(RepetitionInfo info) {
    // Azzam & Bashara, Ellipsometry and Polarized Light, 1977 (Abelès's relation, from memory):
    // at 45° incidence rp = rs² for any interface.
    SplittableRandom rnd = new SplittableRandom(2000 + info.getCurrentRepetition());
    Complex n2 = new Complex(0.05 + 4 * rnd.nextDouble(), 6 * rnd.nextDouble());
    Fresnel.Coefficients c = Fresnel.at(AIR, n2, Math.PI / 4);
    Complex rs2 = c.rs().multiply(c.rs());
    assertEquals(rs2.getReal(), c.rp().getReal(), 1e-12);
    assertEquals(rs2.getImaginary(), c.rp().getImaginary(), 1e-12);
  }

  @Test
  void retardanceIsWrappedIntoTheHalfOpenInterval() {
    Fresnel.Coefficients c =
        new Fresnel.Coefficients(
            new Complex(-1, 0.0), new Complex(1), Complex.ONE, Complex.ONE, 1, 1, 0, 0);
    assertEquals(Math.PI, Fresnel.retardance(c), 1e-15);
  }
}
