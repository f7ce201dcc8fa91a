package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import jonquil.optics.Jones;
import jonquil.optics.JonesVector;
import jonquil.optics.PowerRange;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.ResolvedRequirement;
import org.junit.jupiter.api.Test;

/**
 * Requirements at a port where two beams of one line meet, judged on arrivals placed there by hand
 * (as the propagation through a network places them: MachZehnderNetworkTest): the two arms of a
 * Mach–Zehnder-like pair, 0.5 mW each, the second through a half-wave plate at θ.
 */
class InterferenceRequirementsTest {
  static final Path ROOT = Path.of("/virtual/interference").toAbsolutePath();

  /** One checked spec with its model, its solution and its requirements by text. */
  record Bench(ResolvedModel model, TrainSolution solution) {
    ResolvedRequirement requirement(String start) {
      return model.requirements().stream()
          .filter(r -> r.syntax().text().startsWith(start))
          .findFirst()
          .orElseThrow();
    }

    /** The solution with two arms of line s#0 arriving at the detector. */
    TrainSolution withArms(double hwpAngle, double pathDifference) {
      JonesVector in = JonesVector.linear(0, 1e-3);
      JonesVector arm1 = in.transformedBy(Jones.IDENTITY.scaled(Math.sqrt(0.5)));
      JonesVector arm2 = in.transformedBy(Jones.retarder(Math.PI, hwpAngle).scaled(Math.sqrt(0.5)));
      String line = PortArrival.lineKey("s", 0);
      return with(
          List.of(
              new PortArrival(line, 633e-9, arm1, 0.3),
              new PortArrival(line, 633e-9, arm2, 0.3 + pathDifference)));
    }

    TrainSolution with(List<PortArrival> arrivals) {
      TrainSolution s = solution;
      return s.withArrivals(Map.of("d", arrivals));
    }

    RequirementEvaluator.Verdict judge(String requirement, TrainSolution s) {
      return RequirementEvaluator.evaluate(requirement(requirement), model, s);
    }
  }

  static Bench bench(String coherence) {
    String spec =
        "source s { wavelength 633 nm; power 1 mW; polarization linear 0 deg; beam waist 1 mm"
            + coherence
            + " }\n"
            + "detector d\n"
            + "train t { s -> 300 mm -> d }\n"
            + "require {\n"
            + "  visibility at d >= 0.9\n"
            + "  power at d >= 0.5 mW\n"
            + "  power at d <= 3 mW\n"
            + "  irradiance at d <= 1 W/cm2\n"
            + "  transmission from s to d >= 50 %\n"
            + "}\n";
    Path file = ROOT.resolve("mz.jonq");
    Result r = Checker.check(Workspace.withOverlay(ROOT, Map.of(file, spec)), List.of(file));
    return new Bench(r.models().get(file), r.solutions().get(file));
  }

  @Test
  void parallelArmsOfEqualPowerHaveFullVisibility() {
    Bench b = bench("; coherence_length 10 cm");
    RequirementEvaluator.Verdict v = b.judge("visibility", b.withArms(0, 0));
    assertTrue(v.evaluated(), v.text());
    // Equal powers, parallel linear states, zero path difference: V = 1 (Born & Wolf, Principles
    // of Optics, 7th ed., §10.4.1, with |γ(0)| = 1 by definition; from memory).
    assertEquals(1.0, v.value(), 1e-12);
    assertTrue(v.pass());
  }

  @Test
  void aHalfWavePlateInOneArmGivesCosineOfTwiceItsAngle() {
    Bench b = bench("; coherence_length 10 cm");
    for (int deg : new int[] {0, 10, 22, 30, 45, 60, 80}) {
      double theta = Math.toRadians(deg);
      RequirementEvaluator.Verdict v = b.judge("visibility", b.withArms(theta, 0));
      // A half-wave plate at θ turns linear 0° into linear 2θ (Hecht, Optics, 5th ed., §8.7.1;
      // from memory); the overlap of the arms is then |cos 2θ| (definition).
      assertEquals(Math.abs(Math.cos(2 * theta)), v.value(), 1e-12, "θ = " + deg);
      assertEquals(Math.abs(Math.cos(2 * theta)) >= 0.9, v.pass(), "θ = " + deg);
    }
  }

  @Test
  void crossedArmsAddAsPowerSoTheirPowerIsExact() {
    Bench b = bench("; coherence_length 10 cm");
    TrainSolution crossed = b.withArms(Math.PI / 4, 0);
    RequirementEvaluator.Verdict v = b.judge("visibility", crossed);
    assertEquals(0.0, v.value(), 1e-12); // orthogonal states: Fresnel–Arago laws (from memory)
    RequirementEvaluator.Verdict p = b.judge("power at d >= 0.5 mW", crossed);
    assertTrue(p.pass(), p.text());
    assertEquals(1e-3, p.value(), 1e-15); // definition: 0.5 mW + 0.5 mW with no cross term
  }

  @Test
  void aPowerBoundMustHoldOverTheWholePhaseRange() {
    Bench b = bench("; coherence_length 10 cm");
    TrainSolution parallel = b.withArms(0, 0);
    PowerRange range = PortInterference.powerRange(b.model(), parallel, "d", 1e-3);
    // P1 + P2 ∓ 2√(P1P2) = 1 mW ∓ 1 mW (Hecht, Optics, 5th ed., §9.1; from memory).
    assertEquals(0.0, range.min(), 1e-15);
    assertEquals(2e-3, range.max(), 1e-15);
    RequirementEvaluator.Verdict low = b.judge("power at d >= 0.5 mW", parallel);
    assertFalse(low.pass(), "dark fringe at 0 W breaks '>= 0.5 mW'");
    assertEquals(0.0, low.value(), 1e-15); // the dark fringe (definition)
    assertTrue(low.text().contains("over the unknown phase"), low.text());
    RequirementEvaluator.Verdict high = b.judge("power at d <= 3 mW", parallel);
    assertTrue(high.pass());
    assertEquals(2e-3, high.value(), 1e-15); // the bright fringe (definition)
  }

  @Test
  void exposureAndTransmissionBoundsAreJudgedAtTheWorstPhase() {
    Bench b = bench("; coherence_length 10 cm");
    TrainSolution parallel = b.withArms(0, 0);
    RequirementEvaluator.Verdict alone = b.judge("irradiance", b.solution());
    RequirementEvaluator.Verdict bright = b.judge("irradiance", parallel);
    // The bright fringe carries 2 mW where the incoherent sum is 1 mW, on the same beam: twice
    // the irradiance (definition: irradiance is proportional to power for a fixed beam).
    assertEquals(2 * alone.value(), bright.value(), 1e-9 * alone.value());
    RequirementEvaluator.Verdict t = b.judge("transmission", parallel);
    // A lower bound meets the dark fringe: 0 of the source (definition).
    assertEquals(0.0, t.value(), 1e-15);
    assertFalse(t.pass());
    assertTrue(b.judge("transmission", b.withArms(Math.PI / 4, 0)).pass());
  }

  @Test
  void safetyLimitsAreJudgedAtTheBrightFringe() {
    Path file = ROOT.resolve("probe.jonq");
    String spec =
        "source s { wavelength 633 nm; power 1 mW; polarization linear 0 deg; beam waist 1 mm;"
            + " coherence_length 10 cm }\nprobe d\ntrain t { s -> 300 mm -> d }\n"
            + "require {\n  exposure at d < 100 %\n}\n";
    Result r = Checker.check(Workspace.withOverlay(ROOT, Map.of(file, spec)), List.of(file));
    Bench b = new Bench(r.models().get(file), r.solutions().get(file));
    double alone = b.judge("exposure", b.solution()).value();
    double bright = b.judge("exposure", b.withArms(0, 0)).value();
    // Twice the power on the same beam, twice the fraction of a CW MPE (definition: the MPE of a
    // continuous beam bounds irradiance, which is proportional to power).
    assertEquals(2 * alone, bright, 1e-9 * alone);
  }

  @Test
  void beyondTheCoherenceLengthTheArmsStopInterfering() {
    Bench b = bench("; coherence_length 10 cm");
    RequirementEvaluator.Verdict v = b.judge("visibility", b.withArms(0, 0.10));
    // |γ| = exp(−ΔL/Lc) = e^−1 at ΔL = Lc (Goodman, Statistical Optics, §5.2, Lorentzian line;
    // from memory).
    assertEquals(Math.exp(-1), v.value(), 1e-12);
    RequirementEvaluator.Verdict far = b.judge("power at d >= 0.5 mW", b.withArms(0, 10));
    assertTrue(far.pass(), far.text()); // e^−100: the arms add as power (definition)
  }

  @Test
  void aLinewidthSetsTheCoherenceLengthOfALorentzianLine() {
    Bench b = bench("; linewidth 100 MHz");
    double dl = 0.5;
    RequirementEvaluator.Verdict v = b.judge("visibility", b.withArms(0, dl));
    // Lc = c/(πΔν) (Goodman, Statistical Optics, §5.2; from memory): 0.954 m at 100 MHz.
    assertEquals(Math.exp(-dl * Math.PI * 100e6 / 299792458.0), v.value(), 1e-12);
  }

  @Test
  void withoutAStatedCoherenceAVisibilityAwayFromZeroPathIsNotEvaluated() {
    Bench b = bench("");
    RequirementEvaluator.Verdict v = b.judge("visibility", b.withArms(0, 0.01));
    assertFalse(v.evaluated());
    assertTrue(v.text().contains("'linewidth'"), v.text());
    // At zero path difference |γ| = 1 whatever the line (definition).
    assertEquals(1.0, b.judge("visibility", b.withArms(0, 0)).value(), 1e-12);
    // The power range takes |γ| ≤ 1, the widest: the dark fringe still fails '>= 0.5 mW'.
    assertFalse(b.judge("power at d >= 0.5 mW", b.withArms(0, 0.01)).pass());
  }

  @Test
  void aVisibilityWhereNoTwoBeamsOfOneLineMeetFailsClosed() {
    Bench b = bench("; coherence_length 10 cm");
    RequirementEvaluator.Verdict none = b.judge("visibility", b.solution());
    assertFalse(none.evaluated());
    assertEquals(PortInterference.NONE_MEET, none.text());
    // Two beams of different lines do not interfere either.
    JonesVector e = JonesVector.linear(0, 0.5e-3);
    TrainSolution twoLines =
        b.with(
            List.of(
                new PortArrival(PortArrival.lineKey("s", 0), 633e-9, e, 0.3),
                new PortArrival(PortArrival.lineKey("s", 1), 532e-9, e, 0.3)));
    assertFalse(b.judge("visibility", twoLines).evaluated());
    assertTrue(b.judge("power at d >= 0.5 mW", twoLines).pass());
  }

  @Test
  void noBeamsMeetingLeavesTheLinewidthWithAWarning() {
    Path file = ROOT.resolve("w.jonq");
    String spec =
        "source s { wavelength 633 nm; power 1 mW; linewidth 1 MHz }\ndetector d\n"
            + "train t { s -> 300 mm -> d }\n";
    Result r = Checker.check(Workspace.withOverlay(ROOT, Map.of(file, spec)), List.of(file));
    assertEquals(
        List.of("J626"),
        r.diagnostics().stream().map(d -> d.code().id()).filter(id -> id.equals("J626")).toList());
  }
}
