package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import jonquil.optics.Handedness;
import org.junit.jupiter.api.Test;

/**
 * Whole-train reference cases: each compares the solved train with a published result, named next
 * to the check.
 */
class TrainPhysicsTest {
  /** Index of the ambient standard air at 633 nm, from the catalog's Ciddor (1996) formula. */
  static final double AIR_633 =
      jonquil.optics.material.MaterialCatalog.lookup("air")
          .orElseThrow()
          .absoluteIndex(633e-9)
          .getReal();

  static final String LINEAR_SOURCE =
      "source s { wavelength 633 nm; power 1 W; polarization linear 0 deg }\n";

  @Test
  void aPeriscopeWithFoldsInPerpendicularPlanesTurnsLinearPolarizationByNinetyDegrees() {
    // Geometry of a two-mirror periscope whose second fold turns the beam by 90°. Ideal mirrors
    // isolate the geometry from coatings.
    TrainSolution s =
        Bench.solve(
            LINEAR_SOURCE
                + """
                mirror up   { reflectance 100 %; aoi 45 deg; plane 90 deg }
                mirror across { reflectance 100 %; aoi 45 deg; plane 0 deg }
                probe p
                train t { s -> 100 mm -> up -> 100 mm -> across -> 100 mm -> p }
                """);
    var light = s.port("p").orElseThrow().light();
    // Independent computation with the laws of reflection at a perfect conductor (the tangential
    // field reverses, the normal one stays: E' = 2(E·n)n − E, k' = k − 2(k·n)n; Jackson,
    // Classical Electrodynamics, 3rd ed. 1999, §8.1, section from memory). The beam runs along z
    // with E along x (table plane xz); the first fold sends it up y, the second along x.
    double[] k = {0, 0, 1};
    double[] e = {1, 0, 0};
    double h = Math.sqrt(0.5);
    for (double[] normal : new double[][] {{0, h, -h}, {h, -h, 0}}) {
      k = mirrorLaw(k, normal, -1);
      e = mirrorLaw(e, normal, 1);
    }
    assertEquals(1, k[0], 1e-12); // the beam leaves along x, level again
    double outOfTablePlane = Math.toDegrees(Math.asin(Math.min(1, Math.abs(e[1]))));
    assertEquals(outOfTablePlane, Math.abs(Math.toDegrees(light.azimuth())), 1e-9);
    assertEquals(90, outOfTablePlane, 1e-9); // derived above (definition of the azimuth)
    // Ideal mirrors: reflectance 100 % by definition.
    assertEquals(1.0, light.power(), 1e-12);
  }

  /** sign −1: k − 2(k·n)n (the direction); sign +1: 2(E·n)n − E (the field at a conductor). */
  private static double[] mirrorLaw(double[] v, double[] n, int sign) {
    double dot = v[0] * n[0] + v[1] * n[1] + v[2] * n[2];
    double[] out = new double[3];
    for (int i = 0; i < 3; i++) {
      out[i] = sign < 0 ? v[i] - 2 * dot * n[i] : 2 * dot * n[i] - v[i];
    }
    return out;
  }

  @Test
  void aParallelOffsetPeriscopeKeepsThePolarization() {
    // Two folds in the same plane send the beam on parallel to itself: no rotation (the same
    // reflection law as above with both normals in the yz plane keeps E along x; Jackson,
    // Classical Electrodynamics, 3rd ed. 1999, §8.1, section from memory).
    TrainSolution s =
        Bench.solve(
            LINEAR_SOURCE
                + """
                mirror up   { reflectance 100 %; aoi 45 deg; plane 90 deg }
                mirror back { reflectance 100 %; aoi 45 deg; plane 270 deg }
                probe p
                train t { s -> 100 mm -> up -> 100 mm -> back -> 100 mm -> p }
                """);
    assertEquals(0, Math.toDegrees(s.port("p").orElseThrow().light().azimuth()), 1e-9);
  }

  @Test
  void malusLawThroughAnIdealPolarizer() {
    // Malus's law I = I0 cos²θ (Hecht, Optics, 5th ed. 2017, eq. 8.24, equation number from
    // memory).
    TrainSolution s =
        Bench.solve(
            LINEAR_SOURCE
                + """
                polarizer pol { axis 30 deg }
                probe p
                train t { s -> 10 mm -> pol -> 10 mm -> p }
                """);
    assertEquals(
        Math.pow(Math.cos(Math.toRadians(30)), 2), s.port("p").orElseThrow().power(), 1e-9);
  }

  @Test
  void unpolarizedLightKeepsHalfItsPowerThroughAnIdealPolarizerAndBecomesFullyPolarized() {
    // An ideal linear polarizer passes half of natural light and polarizes it fully (Hecht,
    // Optics, 5th ed. 2017, §8.2, section number from memory).
    TrainSolution s =
        Bench.solve(
            """
            source s { wavelength 633 nm; power 2 W; polarization unpolarized }
            polarizer pol { axis 0 deg }
            probe p
            train t { s -> 10 mm -> pol -> 10 mm -> p }
            """);
    var light = s.port("p").orElseThrow().light();
    // Half of 2 W, fully polarized: Hecht, Optics, 5th ed. 2017, §8.2 (section from memory).
    assertEquals(1.0, light.power(), 1e-9);
    assertEquals(1.0, light.dop(), 1e-9);
  }

  @Test
  void aBrewsterWindowPassesPLightWithoutReflectionLoss() {
    // At Brewster's angle tan θB = n2/n1 the p reflectance vanishes (Hecht, Optics, 5th ed.
    // 2017, eq. 4.43, equation number from memory); n = 1.5 gives θB = 56.31°. p is in the plane
    // of incidence (azimuth 0).
    // The bench's ambient medium is standard air, so the angle is atan(1.5 / n_air).
    double brewster = Math.toDegrees(Math.atan(1.5 / AIR_633));
    TrainSolution s =
        Bench.solve(
            String.format(
                java.util.Locale.ROOT,
                """
                source s { wavelength 633 nm; power 1 W; polarization linear 0 deg }
                material glass = index 1.5
                window w { material glass; thickness 3 mm; aoi %.9f deg }
                probe p
                train t { s -> 10 mm -> w -> 10 mm -> p }
                """,
                brewster));
    // Rp = 0 at θB on both faces (Hecht, Optics, 5th ed. 2017, eq. 4.43, from memory).
    assertEquals(1.0, s.port("p").orElseThrow().power(), 1e-8);
    assertEquals(0.0, s.port("w.reflected").orElseThrow().power(), 1e-8);
  }

  @Test
  void aWindowAtNormalIncidenceLosesTheIncoherentSumOfItsSurfaceReflections() {
    // Incoherent plate: T = (1−R)²/(1−R²) = (1−R)/(1+R) with R = ((n−1)/(n+1))² = 4 % for
    // n = 1.5 (Born & Wolf, Principles of Optics, 7th ed. 1999, §1.5.3 for R; the sum of the
    // multiple incoherent reflections is a geometric series; section numbers from memory).
    TrainSolution s =
        Bench.solve(
            """
            source s { wavelength 633 nm; power 1 W }
            material glass = index 1.5
            window w { material glass; thickness 3 mm }
            probe p
            dump d
            train t {
              s -> 10 mm -> w -> 10 mm -> p
            }
            """);
    // Born & Wolf, 7th ed., §1.5.3 (from memory): 4 % in vacuum; the bench is in air.
    double r = Math.pow((1.5 - AIR_633) / (1.5 + AIR_633), 2);
    assertEquals((1 - r) / (1 + r), s.port("p").orElseThrow().power(), 1e-12);
  }

  @Test
  void aFresnelRhombMakesCircularLightFromLinearAtFortyFiveDegrees() {
    // Fresnel's rhomb: two total internal reflections at 54.6° in glass of n = 1.51 give
    // 45° each, a quarter wave in all (Hecht, Optics, 5th ed. 2017, §8.7.4, Fig. 8.44; section
    // and figure numbers from memory).
    TrainSolution s =
        Bench.solve(
            LINEAR_SOURCE
                + """
                material crown = index 1.51
                rhomb fr { material crown; aoi 54.6 deg; reflections 2; axis 45 deg }
                probe p
                train t { s -> 10 mm -> fr -> 10 mm -> p }
                """);
    var light = s.port("p").orElseThrow().light();
    // Quarter wave: ellipticity angle 45° (Hecht, 5th ed., §8.7.4, from memory).
    assertEquals(45, Math.abs(Math.toDegrees(light.ellipticityAngle())), 0.5);
    assertTrue(light.handedness() != Handedness.NONE);
  }

  @Test
  void aPolarizingSplitterSendsPThroughAndSAway() {
    // A 45° linear input splits equally between p (through) and s (reflected): its p and s
    // amplitudes are cos 45° and sin 45°, so each carries cos²45° = ½ of the power (Malus's law,
    // Hecht, Optics, 5th ed. 2017, eq. 8.24, equation number from memory).
    TrainSolution s =
        Bench.solve(
            """
            source s { wavelength 1064 nm; power 2 W; polarization linear 45 deg }
            splitter pbs { polarizing; transmit_p 100 %; reflect_s 100 %; extinction 1e9 }
            dump d
            probe p
            train t {
              s -> 10 mm -> pbs.through -> 10 mm -> p
              pbs.reflected -> 10 mm -> d
            }
            """);
    // Malus's law on 2 W (Hecht, eq. 8.24, from memory): 1 W each way.
    assertEquals(1.0, s.port("p").orElseThrow().power(), 1e-6);
    assertEquals(1.0, s.port("pbs.reflected").orElseThrow().power(), 1e-6);
    // The through port leaks s at 1/extinction in power (definition of the extinction ratio):
    // atan(√1e-9) ≈ 0.0018°.
    assertEquals(
        Math.toDegrees(Math.atan(Math.sqrt(1e-9))),
        Math.toDegrees(s.port("p").orElseThrow().light().azimuth()),
        1e-6);
  }

  @Test
  void aHalfWavePlateAtTwentyTwoAndAHalfDegreesTurnsLinearByFortyFive() {
    // A half-wave plate at θ turns linear polarization by 2θ (Hecht, Optics, 5th ed. 2017,
    // §8.7.1, section number from memory).
    TrainSolution s =
        Bench.solve(
            LINEAR_SOURCE
                + """
                waveplate h { retardance 0.5 wave at 633 nm; fast_axis 22.5 deg }
                probe p
                train t { s -> 10 mm -> h -> 10 mm -> p }
                """);
    assertEquals(45, Math.toDegrees(s.port("p").orElseThrow().light().azimuth()), 1e-9);
  }

  @Test
  void everyWattIsAccountedFor() {
    TrainSolution s =
        Bench.solve(
            """
            source s { wavelength 1064 nm; power 2 W; polarization linear 20 deg }
            material glass = index 1.5 k 0.0001
            splitter bs { ratio 30 % }
            window w { material glass; thickness 5 mm; aoi 10 deg }
            lens l { focal 50 mm; material glass }
            filter nd { od OD 1 }
            dump d
            probe p
            train t {
              s -> 10 mm -> bs.through -> 10 mm -> w -> 20 mm -> l -> 5 mm -> nd -> 10 mm -> p
              bs.reflected -> 10 mm -> d
            }
            """);
    assertTrue(s.conservationError() < 1e-9, "error " + s.conservationError());
    assertTrue(s.strayPower() > 0, "the window's ghost and the lens's back reflections are stray");
  }

  @Test
  void aCoatedWaveplateSendsItsFaceReflectionsBackAsStrayLight() {
    // Two faces of residual reflectance R, summed incoherently: T = (1 − R)/(1 + R), the rest
    // heads back (same series as the window above; Born & Wolf, 7th ed. 1999, §1.5.3 for R,
    // section number from memory).
    TrainSolution s =
        Bench.solve(
            LINEAR_SOURCE
                + """
                waveplate q { retardance 0.25 wave at 633 nm; fast_axis 45 deg; coating ar 1 % }
                probe p
                train t { s -> 10 mm -> q -> 10 mm -> p }
                """);
    double r = 0.01;
    assertEquals((1 - r) / (1 + r), s.port("p").orElseThrow().power(), 1e-12);
    assertEquals(1 - (1 - r) / (1 + r), s.backReflected(), 1e-12);
    assertTrue(s.conservationError() < 1e-12);
  }
}
