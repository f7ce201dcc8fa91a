package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;
import jonquil.Result;
import jonquil.resolve.ResolvedModel;
import org.junit.jupiter.api.Test;

/**
 * Interference judged end to end: a Mach–Zehnder written in the network syntax (the second arm
 * enters the recombining splitter by its side face) goes through the whole checker, and the
 * visibility and the power range at each output come from the arrivals the propagation records.
 */
class MachZehnderNetworkTest {
  static final double P_IN = 2e-3;

  /**
   * A Mach–Zehnder of two splitters reflecting {@code r1} and {@code r2}, lossless fold mirrors, a
   * half-wave plate at {@code hwpDeg} in the reflected arm (none when NaN), that arm {@code
   * extraMm} longer, and {@code coherence} appended to the source.
   */
  static String spec(
      double r1, double r2, double hwpDeg, double extraMm, String coherence, String require) {
    boolean plate = !Double.isNaN(hwpDeg);
    return "source s { wavelength 633 nm; power 2 mW; polarization linear 0 deg"
        + coherence
        + " }\n"
        + "splitter bs1 { ratio "
        + r1 * 100
        + " %; aoi 45 deg }\n"
        + "splitter bs2 { ratio "
        + r2 * 100
        + " %; aoi 45 deg }\n"
        + "mirror m1 { reflectance 100 %; aoi 45 deg }\n"
        + "mirror m2 { reflectance 100 %; aoi 45 deg }\n"
        + (plate
            ? "waveplate hwp { retardance 0.5 wave at 633 nm; fast_axis " + hwpDeg + " deg }\n"
            : "")
        + "detector d1\ndetector d2\n"
        + "train mz {\n"
        + "  s -> 100 mm -> bs1.through -> 150 mm -> m1 -> 150 mm -> bs2.through -> 100 mm -> d1\n"
        + "  bs1.reflected -> 150 mm -> m2 -> 50 mm"
        + (plate ? " -> hwp" : "")
        + " -> "
        + (100 + extraMm)
        + " mm -> bs2.side -> 100 mm -> d2\n"
        + "}\n"
        + "require {\n"
        + require
        + "}\n";
  }

  record Checked(Result result, ResolvedModel model, TrainSolution solution) {
    PortInterference at(String place) {
      List<PortInterference> lines = PortInterference.at(model, solution, place);
      assertEquals(1, lines.size(), place + ": " + lines);
      return lines.get(0);
    }

    RequirementOutcome requirement(int i) {
      return result.requirements().get(i);
    }
  }

  static Checked check(String spec) {
    Result r = Bench.check(spec);
    return new Checked(
        r, r.models().values().iterator().next(), r.solutions().values().iterator().next());
  }

  static Checked balanced(double hwpDeg) {
    return check(spec(0.5, 0.5, hwpDeg, 0, "", "  visibility at d1 >= 0.5\n"));
  }

  @Test
  void parallelLinearArmsOfEqualPowerHaveVisibilityOne() {
    Checked c = balanced(Double.NaN);
    // Hecht, Optics, 5th ed., §9.1: equal parallel beams swing from 0 to 4·I, V = 1 (from memory).
    assertEquals(1.0, c.at("d1").visibility().getAsDouble(), 1e-12);
    assertEquals(1.0, c.at("d2").visibility().getAsDouble(), 1e-12); // Hecht §9.1
    assertEquals(0.0, c.at("d1").range().min(), 1e-15); // Hecht §9.1, dark fringe (from memory)
    assertEquals(P_IN, c.at("d1").range().max(), 1e-15); // 4 · P_IN/4 (Hecht §9.1)
    assertEquals(1.0, c.requirement(0).value().getAsDouble(), 1e-12); // as above
    assertEquals(RequirementStatus.PASS, c.requirement(0).status());
  }

  @Test
  void orthogonalArmsDoNotInterfere() {
    // A half-wave plate at 45° turns linear 0° into 90°: orthogonal to the other arm, so no
    // fringes (Fresnel–Arago laws; Hecht, Optics, 5th ed., §8.7.1 for the plate, from memory).
    Checked c = balanced(45);
    assertEquals(0.0, c.at("d1").visibility().getAsDouble(), 1e-12);
    assertEquals(P_IN / 2, c.at("d1").range().min(), 1e-15); // definition: powers add
    assertEquals(P_IN / 2, c.at("d1").range().max(), 1e-15); // definition: powers add
    assertEquals(RequirementStatus.FAIL, c.requirement(0).status());
  }

  @Test
  void aHalfWavePlateInOneArmSweepsVisibilityAsCosineOfTwiceItsAngle() {
    for (int deg = 0; deg <= 90; deg += 5) {
      Checked c = balanced(deg);
      // A half-wave plate at θ turns linear 0° into 2θ (Hecht, Optics, 5th ed., §8.7.1, from
      // memory); for equal powers and |γ| = 1, V = |cos 2θ| (Born & Wolf, Principles of Optics,
      // 7th ed., §10.4.1 with the overlap of linear states 2θ apart as the polarization factor).
      double expected = Math.abs(Math.cos(2 * Math.toRadians(deg)));
      assertEquals(expected, c.at("d1").visibility().getAsDouble(), 1e-9, deg + " deg");
      assertEquals(expected, c.at("d2").visibility().getAsDouble(), 1e-9, deg + " deg");
    }
  }

  @Test
  void beamsOutsideTheCoherenceLengthAddAsPower() {
    // 200 mm of path difference against a 1 mm coherence length: |γ| = e^−200 (Goodman,
    // Statistical Optics, §5.2, Lorentzian line, from memory), so the arms add as powers.
    Checked c =
        check(
            spec(0.5, 0.5, Double.NaN, 200, "; coherence_length 1 mm", "  power at d1 <= 2 mW\n"));
    PortInterference i = c.at("d1");
    assertTrue(i.visibility().getAsDouble() < 1e-80, "visibility " + i.visibility());
    assertEquals(P_IN / 2, i.range().min(), 1e-18); // definition: powers add
    assertEquals(P_IN / 2, i.range().max(), 1e-18); // definition: powers add
    assertEquals(P_IN / 2, c.requirement(0).value().getAsDouble(), 1e-18); // as above
    // Inside it (the same bench, 1 m of coherence) they still swing by nearly all of it.
    Checked inside =
        check(spec(0.5, 0.5, Double.NaN, 200, "; coherence_length 1 m", "  power at d1 <= 2 mW\n"));
    // The arms run in air: ΔL = n_air · 200 mm, n_air ≈ 1.00027 at 633 nm (from memory).
    List<PortArrival> arms = inside.solution().arrivalsAt("d1");
    double dl = Math.abs(arms.get(1).opticalPath() - arms.get(0).opticalPath());
    assertEquals(0.2 * 1.00027, dl, 0.2 * 2e-5);
    // |γ| = exp(−ΔL/Lc) (Goodman §5.2, from memory), with equal powers and parallel states.
    assertEquals(Math.exp(-dl), inside.at("d1").visibility().getAsDouble(), 1e-12);
  }

  @Test
  void theOutputsOfALosslessMachZehnderSumToTheInputAtEveryPhase() {
    SplittableRandom random = new SplittableRandom(626);
    for (int trial = 0; trial < 25; trial++) {
      double r1 = Math.rint(50 + 900 * random.nextDouble()) / 1000;
      double r2 = Math.rint(50 + 900 * random.nextDouble()) / 1000;
      double hwp = Math.rint(random.nextDouble() * 900) / 10;
      double extra = Math.rint(random.nextDouble() * 500) / 10;
      double lc = 1 + Math.rint(random.nextDouble() * 999);
      Checked c =
          check(
              spec(
                  r1,
                  r2,
                  hwp,
                  extra,
                  "; coherence_length " + lc + " mm",
                  "  power at d1 <= 2 W\n"));
      PortInterference one = c.at("d1");
      PortInterference two = c.at("d2");
      String at = "r1 " + r1 + ", r2 " + r2 + ", hwp " + hwp + ", +" + extra + " mm, Lc " + lc;
      // A lossless splitter sends what one output gains to the other (Stokes relations: Hecht,
      // Optics, 5th ed., §4.10, from memory): the outputs' fringes are complementary, so at every
      // phase φ, P1(φ) + P2(φ) = P_in, and the dark end of one is the bright end of the other.
      assertEquals(P_IN, one.range().incoherent() + two.range().incoherent(), 1e-15, at);
      assertEquals(P_IN, one.range().min() + two.range().max(), 1e-15, at);
      assertEquals(P_IN, one.range().max() + two.range().min(), 1e-15, at);
      double s1 = (one.range().max() - one.range().min()) / 2;
      double s2 = (two.range().max() - two.range().min()) / 2;
      for (double phi = 0; phi < 2 * Math.PI; phi += 0.5) {
        double p1 = one.range().incoherent() + s1 * Math.cos(phi);
        double p2 = two.range().incoherent() - s2 * Math.cos(phi);
        assertEquals(P_IN, p1 + p2, 1e-15, at + ", phase " + phi); // conservation (definition)
      }
      assertEquals(0, c.solution().conservationError(), 1e-12, at); // the budget closes
    }
  }

  @Test
  void aPowerBoundAtAnInterferingPortMustHoldAtTheBrightFringe() {
    // Incoherently the output carries 1 mW; its bright fringe is 2 mW (Hecht §9.1, from memory).
    Checked c = check(spec(0.5, 0.5, Double.NaN, 0, "", "  power at bs2.through <= 1.5 mW\n"));
    assertEquals(1e-3, c.solution().port("bs2.through").orElseThrow().power(), 1e-15);
    assertEquals(RequirementStatus.FAIL, c.requirement(0).status(), c.requirement(0).reason());
    assertEquals(P_IN, c.requirement(0).value().getAsDouble(), 1e-15); // the bright fringe
  }

  @Test
  void aDumpAfterTheMeetingTakesBothArmsAndIsRatedAtTheBrightFringe() {
    String spec =
        spec(0.5, 0.5, Double.NaN, 0, "", "  power at d1 <= 2 W\n")
            .replace("detector d1\n", "dump d1 { rating 1.5 mW }\n");
    Checked c = check(spec);
    // The light arriving at the dump is both arms, 1 mW together when they add as powers
    // (definition: 2 mW halved twice, each arm a quarter).
    assertEquals(1e-3, c.solution().incidentAt("d1").orElseThrow().power(), 1e-15);
    // At the bright fringe it takes 2 mW (Hecht §9.1, from memory), above its 1.5 mW rating.
    assertTrue(
        c.result().diagnostics().stream()
            .anyMatch(d -> d.message().contains("dump 'd1' takes 2 mW, above its rating")),
        c.result().diagnostics().toString());
  }

  @Test
  void partiallyPolarizedArmsHaveNoVisibilityAndAnEnclosingRange() {
    // Half of one arm's light leaves a depolarizer unpolarized: how its parts pair with the other
    // arm is not followed, so the visibility fails closed and the power range encloses the truth.
    Checked c =
        check(
            """
            source s { wavelength 633 nm; power 2 mW; polarization linear 0 deg }
            splitter bs1 { ratio 50 %; aoi 45 deg }
            splitter bs2 { ratio 50 %; aoi 45 deg }
            depolarizer dp { depolarization 50 % }
            detector d1
            detector d2
            train mz {
              s -> 100 mm -> bs1.through -> 300 mm -> bs2.through -> 100 mm -> d1
              bs1.reflected -> 150 mm -> dp -> 150 mm -> bs2.side -> 100 mm -> d2
            }
            require {
              visibility at d1 >= 0.1
            }
            """);
    RequirementOutcome v = c.requirement(0);
    assertEquals(RequirementStatus.NOT_EVALUATED, v.status(), v.reason());
    assertTrue(v.reason().contains("partially polarized"), v.reason());
    PortInterference i = c.at("d1");
    assertFalse(i.range().exact());
    // The polarized quarter of the second arm (0.25 mW) meets the first (0.5 mW), the rest adds
    // as power: 1 mW ± 2√(0.5 · 0.25) mW (Born & Wolf, Principles of Optics, 7th ed., §10.4.1,
    // from memory); the enclosure holds that range.
    double swing = 2 * Math.sqrt(0.5e-3 * 0.25e-3);
    assertTrue(i.range().max() >= 1e-3 + swing, i.range().toString());
    assertTrue(i.range().min() <= 1e-3 - swing, i.range().toString());
    assertEquals(1e-3, i.range().incoherent(), 1e-15); // definition: powers add
  }

  @Test
  void aLoopsManyBeamsReachTheResonantMaximumOfAFabryPerot() {
    double r1 = 0.9;
    double r2 = 0.8;
    Checked c =
        check(
            """
            source s { wavelength 1064 nm; power 1 W; polarization linear 0 deg }
            splitter m1 { ratio 90 %; aoi 0 deg }
            splitter m2 { ratio 80 %; aoi 0 deg }
            probe out
            dump d1
            train t {
              s -> 100 mm -> m1 -> 50 mm -> m2 -> 100 mm -> out
              m2.reflected -> 50 mm -> m1.back
              m1.side -> 50 mm -> m2.front
              m1.reflected -> 100 mm -> d1
            }
            require {
              power at out <= 1 W
            }
            """);
    assertTrue(c.solution().arrivalsAt("out").size() > 64, "round trips summed pair by pair");
    PortInterference i = c.at("out");
    // Airy transmission of a Fabry–Perot: T1T2/(1 ∓ √(R1R2))² at resonance and between (Born &
    // Wolf, Principles of Optics, 7th ed., §7.6.1, from memory). The loop stops once below 1e-12 of
    // the source in power, so 1e-6 in amplitude, which the tolerance allows.
    double t1t2 = (1 - r1) * (1 - r2);
    double resonant = t1t2 / Math.pow(1 - Math.sqrt(r1 * r2), 2);
    double between = t1t2 / Math.pow(1 + Math.sqrt(r1 * r2), 2);
    assertEquals(resonant, i.range().max(), 1e-4 * resonant);
    assertTrue(i.range().min() <= between, i.range().toString());
    assertEquals(t1t2 / (1 - r1 * r2), i.range().incoherent(), 1e-11); // incoherent Airy sum
    assertTrue(i.visibility().isEmpty(), "a visibility is judged for two beams");
  }

  @Test
  void aSinglePathRecordsNoMeetingAndTheLinewidthIsFlagged() {
    Result r =
        Bench.check(
            "source s { wavelength 633 nm; power 2 mW; linewidth 1 MHz }\n"
                + "splitter bs1 { ratio 50 %; aoi 45 deg }\ndetector d1\ndetector d2\n"
                + "train t {\n  s -> 100 mm -> bs1.through -> 100 mm -> d1\n"
                + "  bs1.reflected -> 100 mm -> d2\n}\n");
    assertTrue(r.solutions().values().iterator().next().arrivals().isEmpty());
    assertTrue(r.diagnostics().stream().anyMatch(d -> d.code().id().equals("J626")));
  }
}
