package jonquil.optics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** Two-beam and N-beam interference of one laser line, against reference values. */
class InterferenceTest {
  static final double TOL = 1e-12;

  @Test
  void parallelLinearStatesOfEqualPowerGiveFullVisibility() {
    JonesVector a = JonesVector.linear(Math.toRadians(20), 1e-3);
    JonesVector b = JonesVector.linear(Math.toRadians(20), 1e-3).phased(1.3);
    // Hecht, Optics, 5th ed., §9.1: I = I1 + I2 + 2√(I1I2) cos δ, so equal, parallel beams swing
    // from 0 to 4I; V = (Imax − Imin)/(Imax + Imin) = 1 (section from memory).
    assertEquals(1.0, Interference.visibility(a, b, 1), TOL);
    PowerRange r = Interference.range(List.of(beam(a, 0), beam(b, 0)), TemporalCoherence.UNSTATED);
    assertEquals(0.0, r.min(), TOL); // Hecht §9.1, δ = π (from memory)
    assertEquals(4e-3, r.max(), TOL); // Hecht §9.1, δ = 0 (from memory)
    assertEquals(1.0, r.visibility(), TOL); // definition of visibility
    assertTrue(r.exact());
  }

  @Test
  void orthogonalStatesDoNotInterfere() {
    JonesVector h = JonesVector.linear(0, 1);
    JonesVector v = JonesVector.linear(Math.PI / 2, 1);
    // Fresnel–Arago laws: orthogonally polarized beams of one source give no fringes (Hecht,
    // Optics, 5th ed., §8.? on the Fresnel–Arago laws; chapter from memory).
    assertEquals(0.0, Interference.visibility(h, v, 1), TOL);
    JonesVector right =
        JonesVector.of(
            new org.apache.commons.math3.complex.Complex(Math.sqrt(0.5), 0),
            new org.apache.commons.math3.complex.Complex(0, -Math.sqrt(0.5)));
    JonesVector left =
        JonesVector.of(
            new org.apache.commons.math3.complex.Complex(Math.sqrt(0.5), 0),
            new org.apache.commons.math3.complex.Complex(0, Math.sqrt(0.5)));
    // Right and left circular are orthogonal too (Fresnel–Arago, as above; from memory).
    assertEquals(0.0, Interference.visibility(right, left, 1), TOL);
    PowerRange r = Interference.range(List.of(beam(h, 0), beam(v, 0)), TemporalCoherence.UNSTATED);
    assertEquals(2.0, r.min(), TOL); // definition: no cross term, powers add
    assertEquals(2.0, r.max(), TOL); // definition
    assertEquals(0.0, r.max() - r.min(), 1e-15); // definition: no swing
  }

  @Test
  void aHalfWavePlateInOneArmSweepsVisibilityAsCosineOfTwiceItsAngle() {
    JonesVector in = JonesVector.linear(0, 1);
    for (int deg = 0; deg <= 90; deg += 5) {
      double theta = Math.toRadians(deg);
      JonesVector arm1 = in.transformedBy(Jones.IDENTITY.scaled(Math.sqrt(0.5)));
      JonesVector arm2 = in.transformedBy(Jones.retarder(Math.PI, theta).scaled(Math.sqrt(0.5)));
      // A half-wave plate at θ turns linear 0° into linear 2θ (Hecht, Optics, 5th ed., §8.7.1,
      // from memory); the overlap of linear states 2θ apart is |cos 2θ| (definition), so with
      // equal arms V = |cos 2θ|.
      assertEquals(
          Math.abs(Math.cos(2 * theta)), Interference.visibility(arm1, arm2, 1), 1e-12, "θ=" + deg);
    }
  }

  @Test
  void unequalPowersLowerVisibilityByThePowerBalance() {
    double p1 = 1e-3;
    double p2 = 0.25e-3;
    JonesVector a = JonesVector.linear(0.3, p1);
    JonesVector b = JonesVector.linear(0.3, p2);
    // Born & Wolf, Principles of Optics, 7th ed., §10.4.1: V = 2√(I1I2)/(I1 + I2)·|γ12| (equation
    // number from memory); here 2·0.5/1.25 = 0.8.
    assertEquals(0.8, Interference.visibility(a, b, 1), TOL);
    assertEquals(0.8 * 0.5, Interference.visibility(a, b, 0.5), TOL); // Born & Wolf §10.4.1
    PowerRange r = Interference.range(List.of(beam(a, 0), beam(b, 0)), TemporalCoherence.UNSTATED);
    // Born & Wolf §10.4.1: Imax, Imin = I1 + I2 ± 2√(I1I2)|γ12| (from memory).
    assertEquals(p1 + p2 - 2 * Math.sqrt(p1 * p2), r.min(), TOL);
    assertEquals(p1 + p2 + 2 * Math.sqrt(p1 * p2), r.max(), TOL);
  }

  @Test
  void theRangeIsTheIncoherentSumPlusOrMinusTheOverlapAndCoherenceTerm() {
    double p1 = 2.0;
    double p2 = 0.5;
    double angle = Math.toRadians(30);
    double lc = 0.1;
    double dl = 0.05;
    JonesVector a = JonesVector.linear(0, p1);
    JonesVector b = JonesVector.linear(angle, p2);
    PowerRange r =
        Interference.range(
            List.of(beam(a, 1.0), beam(b, 1.0 + dl)), TemporalCoherence.ofLength(lc));
    double swing = 2 * Math.sqrt(p1 * p2) * Math.cos(angle) * Math.exp(-dl / lc);
    // min/max = P1 + P2 ∓ 2√(P1P2)·|overlap|·|γ| (Born & Wolf §10.4.1 with the overlap as the
    // polarization factor; from memory).
    assertEquals(p1 + p2 - swing, r.min(), 1e-12);
    assertEquals(p1 + p2 + swing, r.max(), 1e-12);
    assertEquals(p1 + p2, r.incoherent(), 1e-12); // definition
    // The range's own visibility is the product formula (definition of V).
    assertEquals(
        Interference.powerBalance(p1, p2) * Math.cos(angle) * Math.exp(-dl / lc),
        r.visibility(),
        1e-12);
  }

  @Test
  void theCoherenceFactorIsOneAtZeroPathDifferenceAndDecaysAsALorentzianLine() {
    TemporalCoherence line = TemporalCoherence.lorentzian(1e6);
    // Goodman, Statistical Optics (1985), §5.2: a Lorentzian line has τc = 1/(πΔν), so
    // Lc = c/(πΔν) = 299792458/(π·1e6) m = 95.426 m (from memory).
    assertEquals(299792458.0 / (Math.PI * 1e6), line.coherenceLength().getAsDouble(), 1e-9);
    assertEquals(95.426, line.coherenceLength().getAsDouble(), 1e-3); // Goodman §5.2
    assertEquals(1.0, line.factor(0).getAsDouble(), 0); // definition: γ(0) = 1
    double lc = line.coherenceLength().getAsDouble();
    // |γ(τ)| = exp(−πΔν|τ|) for a Lorentzian line (Goodman §5.2, from memory): 1/e at Lc.
    assertEquals(Math.exp(-1), line.factor(lc).getAsDouble(), 1e-15);
    assertEquals(Math.exp(-1), line.factor(-lc).getAsDouble(), 1e-15); // |γ| is even in τ
    assertEquals(Math.exp(-10), line.factor(10 * lc).getAsDouble(), 1e-18);
    // Far outside the coherence length the beams add as power (definition).
    JonesVector a = JonesVector.linear(0, 1);
    PowerRange r = Interference.range(List.of(beam(a, 0), beam(a, 100 * lc)), line);
    assertEquals(2.0, r.min(), 1e-12); // definition
    assertEquals(2.0, r.max(), 1e-12); // definition
  }

  @Test
  void aLineWithoutStatedCoherenceIsUnknownAwayFromZeroPathDifference() {
    assertEquals(1.0, TemporalCoherence.UNSTATED.factor(0).getAsDouble(), 0); // definition
    assertTrue(TemporalCoherence.UNSTATED.factor(0.01).isEmpty());
    assertEquals(1.0, TemporalCoherence.UNSTATED.factorAtMost(0.01), 0); // definition: |γ| ≤ 1
    JonesVector a = JonesVector.linear(0, 1);
    List<Interference.Beam> beams = List.of(beam(a, 0), beam(a, 0.01));
    assertTrue(Interference.power(beams, 633e-9, TemporalCoherence.UNSTATED).isEmpty());
  }

  @Test
  void aFixedPathDifferenceGivesTheExactPower() {
    double wl = 1064e-9;
    JonesVector a = JonesVector.linear(0, 1);
    TemporalCoherence line = TemporalCoherence.ofLength(1);
    // Hecht §9.1 (from memory): I = I1 + I2 + 2√(I1I2) cos(k₀ΔL), with |γ| = exp(−ΔL/Lc) ≈ 1.
    double half = wl / 2;
    assertEquals(
        2 - 2 * Math.exp(-half),
        Interference.power(List.of(beam(a, 0), beam(a, half)), wl, line).getAsDouble(),
        1e-12);
    assertEquals(
        2 + 2 * Math.exp(-wl),
        Interference.power(List.of(beam(a, 0), beam(a, wl)), wl, line).getAsDouble(),
        1e-12);
    double quarter = wl / 4;
    assertEquals( // cos(π/2) = 0: the powers add (Hecht §9.1, from memory)
        2.0,
        Interference.power(List.of(beam(a, 0), beam(a, quarter)), wl, line).getAsDouble(),
        1e-9);
  }

  @Test
  void manyBeamsOfOneStateReachTheSquareOfTheSumOfAmplitudes() {
    JonesVector a = JonesVector.linear(0, 1);
    JonesVector b = JonesVector.linear(0, 4);
    JonesVector c = JonesVector.linear(0, 9);
    PowerRange r =
        Interference.range(List.of(beam(a, 0), beam(b, 0), beam(c, 0)), TemporalCoherence.UNSTATED);
    // In phase, N coherent parallel fields give (Σ√Pk)² = (1 + 2 + 3)² = 36 (definition).
    assertEquals(36.0, r.max(), 1e-12);
    assertEquals(0.0, r.min(), 0); // 14 − 22 < 0, clipped: an enclosure
    assertFalse(r.exact());
  }

  @Test
  void partiallyPolarizedLightInterferesPartByPartLikeItsMutualCoherencyTrace() {
    SplittableRandom rnd = new SplittableRandom(12);
    for (int i = 0; i < 500; i++) {
      Coherency source =
          Coherency.unpolarized(rnd.nextDouble())
              .plus(
                  Coherency.elliptical(
                      rnd.nextDouble(-2, 2), rnd.nextDouble(-0.78, 0.78), rnd.nextDouble()));
      Jones j1 = randomJones(rnd);
      Jones j2 = randomJones(rnd);
      List<JonesVector> parts = source.polarizedParts();
      Coherency back = parts.get(0).coherency().plus(parts.get(1).coherency());
      assertTrue(back.approxEquals(source, 1e-12), "parts sum to the light: " + source);
      Interference.Beam arm1 =
          new Interference.Beam(parts.stream().map(p -> p.transformedBy(j1)).toList(), 0);
      Interference.Beam arm2 =
          new Interference.Beam(parts.stream().map(p -> p.transformedBy(j2)).toList(), 0);
      // tr(J1†J2Φ0) = Σp (J1 Ep)†(J2 Ep) because Φ0 = Σp Ep Ep† (definition).
      assertEquals(
          Interference.visibility(source, j1, j2, 1), Interference.visibility(arm1, arm2, 1), 1e-9);
      assertEquals(source.transform(j1).power(), arm1.power(), 1e-12);
    }
    // Unpolarized light split into two equal, unchanged arms still gives V = 1 (each part with
    // itself); crossing one arm with a half-wave plate at 45° gives V = 0 (definition).
    Coherency u = Coherency.unpolarized(1);
    Jones half = Jones.IDENTITY.scaled(Math.sqrt(0.5));
    assertEquals(1.0, Interference.visibility(u, half, half, 1), 1e-12); // definition
    Jones swap = Jones.retarder(Math.PI, Math.PI / 4).scaled(Math.sqrt(0.5));
    // Unpolarized in, x and y swapped in one arm: tr(J1†J2Φ0) = tr(swap)/2·... = 0 (definition).
    assertEquals(0.0, Interference.visibility(u, half, swap, 1), 1e-12);
  }

  /**
   * Seeded property: for random pairs of Jones vectors, paths and coherence lengths, min ≤ the
   * incoherent sum ≤ max, max + min = 2 × the incoherent sum, and any fixed phase lies inside.
   */
  @Test
  void theRangeBracketsTheIncoherentSumSymmetrically() {
    SplittableRandom rnd = new SplittableRandom(20261203L);
    for (int i = 0; i < 2000; i++) {
      JonesVector a = randomVector(rnd);
      JonesVector b = randomVector(rnd);
      TemporalCoherence line =
          rnd.nextBoolean()
              ? TemporalCoherence.UNSTATED
              : TemporalCoherence.ofLength(Math.pow(10, rnd.nextDouble(-4, 2)));
      double l1 = rnd.nextDouble(0, 2);
      double l2 = rnd.nextBoolean() ? l1 : rnd.nextDouble(0, 2);
      List<Interference.Beam> beams = List.of(beam(a, l1), beam(b, l2));
      PowerRange r = Interference.range(beams, line);
      double sum = a.power() + b.power();
      double scale = Math.max(sum, 1e-300);
      assertTrue(r.min() <= sum + 1e-12 * scale && sum <= r.max() + 1e-12 * scale, r::toString);
      assertEquals(2 * sum, r.max() + r.min(), 1e-12 * scale, r::toString);
      assertTrue(r.visibility() >= 0 && r.visibility() <= 1 + 1e-12, r::toString);
      if (line.coherenceLength().isPresent()) {
        double exact = Interference.power(beams, 633e-9, line).getAsDouble();
        assertTrue(
            exact >= r.min() - 1e-12 * scale && exact <= r.max() + 1e-12 * scale,
            exact + " outside " + r);
      }
    }
  }

  static Interference.Beam beam(JonesVector v, double path) {
    return new Interference.Beam(v, path);
  }

  static JonesVector randomVector(SplittableRandom rnd) {
    return new JonesVector(
        rnd.nextDouble(-1, 1), rnd.nextDouble(-1, 1), rnd.nextDouble(-1, 1), rnd.nextDouble(-1, 1));
  }

  static Jones randomJones(SplittableRandom rnd) {
    org.apache.commons.math3.complex.Complex[] e = new org.apache.commons.math3.complex.Complex[4];
    for (int k = 0; k < 4; k++) {
      e[k] =
          new org.apache.commons.math3.complex.Complex(
              rnd.nextDouble(-1, 1), rnd.nextDouble(-1, 1));
    }
    return Jones.of(e[0], e[1], e[2], e[3]);
  }
}
