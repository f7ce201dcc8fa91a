package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import jonquil.Result;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.optics.Coherency;
import org.junit.jupiter.api.Test;

/** Every requirement measure means what its name says, and is shown in the unit of its bound. */
class MeasuresMeanTheirNamesTest {
  private static Result check(String source, String requirement) {
    return Bench.check(
        source + "probe mid\ntrain t { s -> 10 mm -> mid }\nrequire {\n  " + requirement + "\n}\n");
  }

  private static String verdictMessage(Result r) {
    return r.diagnostics().stream()
        .filter(
            d ->
                d.code() == DiagnosticCode.REQUIREMENT_MET
                    || d.code() == DiagnosticCode.REQUIREMENT_FAILED)
        .map(Diagnostic::message)
        .findFirst()
        .orElseThrow(() -> new AssertionError(r.diagnostics().toString()));
  }

  private static final String LINEAR_0 =
      "source s { wavelength 633 nm; power 10 mW; polarization linear 0 deg }\n";

  @Test
  void extinctionIsWhatARotatingIdealAnalyserSees() {
    // Definition: an ideal linear analyser at θ passes I(θ) = ½(S0 + S1 cos 2θ + S2 sin 2θ)
    // (Born & Wolf, Principles of Optics, §10.8.3 — section from memory), so max/min =
    // (S0 + √(S1² + S2²)) / (S0 − √(S1² + S2²)). S = (1, 0, 0.6, 0.8): (1.6)/(0.4) = 4.
    assertEquals(4, Coherency.fromStokes(1, 0, 0.6, 0.8).extinctionRatio(), 1e-12);
    // Circular light: every analyser angle passes half, ratio 1 (definition).
    assertEquals(1, Coherency.fromStokes(1, 0, 0, 1).extinctionRatio(), 1e-12);
    // Half unpolarized, half linear: (1 + 0.5)/(1 − 0.5) = 3 (definition).
    assertEquals(3, Coherency.fromStokes(1, 0.5, 0, 0).extinctionRatio(), 1e-12);
  }

  @Test
  void circularLightFailsAnExtinctionBound() {
    Result r =
        check(
            "source s { wavelength 633 nm; power 10 mW; polarization circular right }\n",
            "extinction at mid >= 100");
    assertEquals(RequirementStatus.FAIL, r.requirements().get(0).status());
  }

  @Test
  void anEllipticityBoundWithoutHandednessComparesTheMagnitude() {
    // Left-circular light has ellipticity angle −45° (definition, S3 < 0); its magnitude is 45°.
    Result r =
        check(
            "source s { wavelength 633 nm; power 10 mW; polarization circular left }\n",
            "ellipticity at mid >= 40 deg");
    assertEquals(RequirementStatus.PASS, r.requirements().get(0).status());
    Result small =
        check(
            "source s { wavelength 633 nm; power 10 mW; polarization circular left }\n",
            "ellipticity at mid <= 2 deg");
    assertEquals(RequirementStatus.FAIL, small.requirements().get(0).status());
  }

  @Test
  void aRangeReportsItsNearestEnd() {
    // 10 mW in 9 mW .. 100 mW: the low end is 1 mW away, the high end 90 mW (arithmetic).
    RequirementOutcome o = check(LINEAR_0, "power at mid in 9 mW .. 100 mW").requirements().get(0);
    assertEquals(RequirementStatus.PASS, o.status());
    // The nearest end and its distance (definition of a range's margin, README 'Requirements').
    assertEquals(0.009, o.bound().getAsDouble(), 1e-15);
    assertEquals(0.001, o.margin().getAsDouble(), 1e-15);
  }

  @Test
  void aValueIsShownInTheUnitOfItsBound() {
    // 10 mW of 10 mW is 0 dB, a transmission of 1 is 100 % (definition of the dB power ratio and of
    // percent).
    String db = verdictMessage(check(LINEAR_0, "power at mid >= -3 dB"));
    assertTrue(db.contains("is 0 dB"), db);
    String pct = verdictMessage(check(LINEAR_0, "transmission from s to mid >= 50 %"));
    assertTrue(pct.contains("is 100 %"), pct);
    // A 90° ± 2° bound on light at −88.2° shows 91.8°: linear azimuths repeat every 180°
    // (definition).
    String az =
        verdictMessage(
            check(
                "source s { wavelength 633 nm; power 10 mW; polarization linear -88.2 deg }\n",
                "polarization at mid is linear 90 deg ± 2 deg"));
    assertTrue(az.contains("91.8"), az);
    assertFalse(az.contains("-88.2"), az);
  }

  @Test
  void exposureIsAPercentageOfTheMpe() {
    String m =
        verdictMessage(
            Bench.check(
                "source s { wavelength 532 nm; power 0.5 mW; beam waist 1 mm }\n"
                    + "probe eye { aperture 7 mm }\ntrain t { s -> 1 m -> eye }\n"
                    + "require {\n  exposure at eye <= 100 %\n}\n"));
    assertTrue(m.matches(".*exposure is [0-9.]+ % .*"), m);
  }

  @Test
  void aHazardClassHasALabelAndNoMargin() {
    // 0.9 mW at 635 nm is Class 2 (IEC 60825-1:2014, Table 5: Class 2 AEL 1 mW for cw visible).
    Result r =
        Bench.check(
            "source s { wavelength 635 nm; power 0.9 mW; beam waist 0.5 mm }\nprobe eye\n"
                + "train t { s -> 1 m -> eye }\nrequire {\n  hazard class <= 3R at s\n}\n");
    RequirementOutcome o = r.requirements().get(0);
    assertTrue(o.margin().isEmpty(), o.toString());
    assertFalse(verdictMessage(r).contains("margin"), verdictMessage(r));
  }

  @Test
  void aCompoundRequirementSaysWhichConditionFailed() {
    Result r = check(LINEAR_0, "polarization at mid is linear 0 deg ± 2 deg, dop <= 0.5");
    assertEquals(RequirementStatus.FAIL, r.requirements().get(0).status());
    String m = verdictMessage(r);
    assertTrue(m.contains("'dop <= 0.5'"), m);
    assertTrue(m.startsWith("requirement not met: dop is"), m);
    assertFalse(m.contains("'is linear 0 deg ± 2 deg'"), m);
  }

  @Test
  void peakIrradianceIsTheTimeAndSpacePeakAndTheAveragesPeakHasItsOwnName() {
    // 1 mJ in 10 ns at 1 kHz, 1 mm waist: average power 1 W, pulse peak power E/τ = 100 kW
    // (definition, rectangular pulse); Gaussian spatial peak 2P/(πw²) (definition of the 1/e²
    // radius). The time-and-space peak is 1e5 times the spatial peak of the average.
    String pulsed =
        "source s { wavelength 1064 nm; pulse_energy 1 mJ; pulse_duration 10 ns;"
            + " repetition_rate 1 kHz; beam waist 1 mm }\n";
    double w =
        Bench.solve(pulsed + "probe mid\ntrain t { s -> 10 mm -> mid }\n")
            .port("mid")
            .orElseThrow()
            .exposure()
            .orElseThrow()
            .beamRadius();
    RequirementOutcome peak =
        check(pulsed, "peak irradiance at mid <= 1 W/cm2").requirements().get(0);
    assertEquals(
        2 * 1e5 / (Math.PI * w * w), peak.value().getAsDouble(), 1e-6 * peak.value().getAsDouble());
    RequirementOutcome averagePeak =
        check(pulsed, "peak average irradiance at mid <= 1 W/cm2").requirements().get(0);
    assertEquals(
        2 * 1.0 / (Math.PI * w * w),
        averagePeak.value().getAsDouble(),
        1e-6 * averagePeak.value().getAsDouble());
  }
}
