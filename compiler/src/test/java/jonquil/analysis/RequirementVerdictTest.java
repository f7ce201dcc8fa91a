package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import jonquil.Result;
import jonquil.diag.DiagnosticCode;
import jonquil.optics.Handedness;
import org.junit.jupiter.api.Test;

/** Requirements judged on solved trains: value, bound and margin in SI units; failures are J609. */
class RequirementVerdictTest {
  static final String BENCH =
      """
      source s { wavelength 633 nm; power 10 mW; polarization linear 0 deg }
      polarizer p45 { axis 45 deg }
      probe mid
      detector end
      train t { s -> 10 mm -> p45 -> 10 mm -> mid -> 10 mm -> end }
      """;

  static List<RequirementOutcome> verdicts(String requirements) {
    Result r = Bench.check(BENCH + "require {\n" + requirements + "\n}\n");
    return r.requirements();
  }

  @Test
  void absolutePowerPassesWithItsMargin() {
    RequirementOutcome o = verdicts("power at mid >= 4 mW").get(0);
    assertEquals(RequirementStatus.PASS, o.status());
    // Malus's law, 10 mW · cos² 45° (Hecht, Optics, 5th ed. 2017, eq. 8.24, from memory); the
    // margin is value − bound by definition.
    assertEquals(0.005, o.value().getAsDouble(), 1e-12);
    assertEquals(0.001, o.margin().getAsDouble(), 1e-12);
    assertEquals("W", o.siUnit());
  }

  @Test
  void relativePowerInDecibelsIsAgainstTheSourcePower() {
    // 5 mW of 10 mW (Malus's law, Hecht, Optics, 5th ed. 2017, eq. 8.24, from memory) is
    // 10·log10(0.5) = −3.01 dB (definition of the decibel for a power ratio): '>= -3 dB' fails
    // by a hair, '>= -3.1 dB' passes.
    assertEquals(RequirementStatus.FAIL, verdicts("power at mid >= -3 dB").get(0).status());
    assertEquals(RequirementStatus.PASS, verdicts("power at mid >= -3.1 dB").get(0).status());
  }

  @Test
  void transmissionBetweenTwoPlaces() {
    RequirementOutcome o = verdicts("transmission from s to mid >= 49 %").get(0);
    assertEquals(RequirementStatus.PASS, o.status());
    // cos² 45° (Malus's law, Hecht, Optics, 5th ed. 2017, eq. 8.24, from memory).
    assertEquals(0.5, o.value().getAsDouble(), 1e-12);
  }

  @Test
  void aFailedRequirementIsAnErrorAtItsLine() {
    Result r = Bench.check(BENCH + "require {\n  power at end >= 6 mW\n}\n");
    assertEquals(RequirementStatus.FAIL, r.requirements().get(0).status());
    assertTrue(
        r.diagnostics().stream()
            .anyMatch(
                d ->
                    d.code() == DiagnosticCode.REQUIREMENT_FAILED
                        && d.message().contains("margin")),
        r.diagnostics().toString());
    assertTrue(r.fails(false));
  }

  @Test
  void polarizationAzimuthWithinItsTolerance() {
    assertEquals(
        RequirementStatus.PASS,
        verdicts("polarization at mid is linear 45 deg ± 0.5 deg").get(0).status());
    assertEquals(
        RequirementStatus.FAIL,
        verdicts("polarization at mid is linear 40 deg ± 2 deg").get(0).status());
  }

  @Test
  void exposureNeedsTheBeamSizeAndSaysSoWhenItIsMissing() {
    RequirementOutcome o = verdicts("irradiance at mid <= 1 kW/cm2").get(0);
    assertEquals(RequirementStatus.NOT_EVALUATED, o.status());
    assertTrue(o.reason().contains("beam size is unknown"), o.reason());
  }

  @Test
  void aYieldNeedsTolerancesToMeanAnything() {
    RequirementOutcome o = verdicts("yield >= 99 % for power at mid >= 4 mW").get(0);
    assertEquals(RequirementStatus.NOT_EVALUATED, o.status());
    assertTrue(o.reason().contains("no tolerances"), o.reason());
  }

  @Test
  void aYieldIsTheFractionOfTolerancedBuildsThatPass() {
    // Polarizer axis 45° ± 10° on linear 0° light: P = 10 mW · cos²θ with θ uniform in [35°, 55°].
    // P >= 5 mW exactly when θ <= 45°, so half the builds pass (Malus's law, Hecht 5th ed. eq.
    // 8.24, equation number from memory).
    Result r =
        Bench.check(
            """
            source s { wavelength 633 nm; power 10 mW; polarization linear 0 deg }
            polarizer p45 { axis 45 deg ± 10 deg }
            probe mid
            train t { s -> 10 mm -> p45 -> 10 mm -> mid }
            require {
              yield >= 40 % for power at mid >= 5 mW
              yield >= 60 % for power at mid >= 5 mW
            }
            """);
    RequirementOutcome met = r.requirements().get(0);
    RequirementOutcome missed = r.requirements().get(1);
    assertEquals(RequirementStatus.PASS, met.status());
    assertEquals(RequirementStatus.FAIL, missed.status());
    assertEquals(
        0.5, met.value().getAsDouble(), 0.075); // 3σ of a binomial estimate from 400 builds
  }

  @Test
  void linesOfOneSourceAddIncoherently() {
    // Two equal lines, one turned by a half-wave plate and the other not (a plate designed
    // for 1064 nm is a full wave at 532 nm in the 1/λ scaling): their sum is partially
    // polarized, which a coherent sum could never be (Born & Wolf, 7th ed. 1999, §10.8.1). [section
    // numbers from memory]
    TrainSolution s =
        Bench.solve(
            """
            source two { line 1064 nm 1 W; line 532 nm 1 W; polarization linear 0 deg }
            waveplate hwp { retardance 0.5 wave at 1064 nm; fast_axis 45 deg }
            probe p
            train t { two -> 10 mm -> hwp -> 10 mm -> p }
            """);
    var light = s.port("p").orElseThrow().light();
    assertEquals(2.0, light.power(), 1e-12);
    assertEquals(0.0, light.dop(), 1e-9); // 1 W at 90° plus 1 W at 0°: no net polarization
  }

  @Test
  void aMirrorTurnsRightCircularIntoLeft() {
    // Reflection reverses the handedness of circular light (Hecht, Optics, 5th ed. 2017, §8.6,
    // section number from memory).
    TrainSolution s =
        Bench.solve(
            """
            source s { wavelength 633 nm; power 1 W; polarization circular right }
            mirror m { reflectance 100 %; aoi 45 deg }
            probe p
            train t { s -> 10 mm -> m -> 10 mm -> p }
            """);
    assertEquals(Handedness.LEFT, s.port("p").orElseThrow().light().handedness());
  }
}
