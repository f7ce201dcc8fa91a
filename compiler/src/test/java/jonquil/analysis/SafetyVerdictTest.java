package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import jonquil.Result;
import jonquil.diag.DiagnosticCode;
import org.junit.jupiter.api.Test;

/**
 * Eye-safety requirements on solved trains: evaluated where the implemented standard covers the
 * emission, reported as not evaluated (never guessed) elsewhere, and always with the caution that a
 * laser safety officer must confirm them.
 */
class SafetyVerdictTest {
  static List<RequirementOutcome> check(String source, String requirement) {
    Result r =
        Bench.check(
            source
                + """
                probe eye { aperture 7 mm }
                train t { src -> 1 m -> eye }
                require {
                """
                + requirement
                + "\n}\n");
    return r.requirements();
  }

  @Test
  void theFilmStressStationsProbeDiodeIsClassTwoWithTheCaution() {
    // The probe diode of samples/polarimetry_arm.jonq: 0.8 mW cw at 635 nm, a 0.4 mm waist, all of
    // it inside the 7 mm aperture. The Class 1 AEL for visible cw light is 0.39 mW and the Class 2
    // AEL 1 mW (IEC 60825-1:2014, Tables 3 and 5, from memory; computed as the MPE 10 W/m² times
    // the aperture area π(3.5 mm)² = 3.85e-5 m² for Class 1), so 0.39 mW < 0.8 mW <= 1 mW is
    // Class 2: '<= 2' is met and '<= 1' fails.
    String bench =
        """
        source src { wavelength 635 nm; power 0.8 mW; beam waist 0.4 mm, m2 1.2 }
        probe eye
        train t { src -> 1 m -> eye }
        require {
          hazard class <= 2 at src
          hazard class <= 1 at src
        }
        """;
    Result r = Bench.check(bench);
    assertEquals(RequirementStatus.PASS, r.requirements().get(0).status());
    assertEquals(RequirementStatus.FAIL, r.requirements().get(1).status());
    assertTrue(
        r.diagnostics().stream()
            .anyMatch(
                d ->
                    d.code() == DiagnosticCode.REQUIREMENT_MET
                        && d.message().contains("laser safety officer")),
        r.diagnostics().toString());
  }

  @Test
  void aWavelengthOutsideTheImplementedTablesIsNotEvaluatedRatherThanGuessed() {
    RequirementOutcome o =
        check(
                "source src { wavelength 1300 nm; power 10 mW; beam waist 1 mm }\n",
                "  hazard class <= 1 at src")
            .get(0);
    assertEquals(RequirementStatus.NOT_EVALUATED, o.status());
    assertTrue(o.reason().contains("IEC 60825-1"), o.reason());
  }

  @Test
  void exposureAtAProbeIsAFractionOfTheMpe() {
    // 0.5 mW at 532 nm in a beam smaller than the 7 mm aperture: about 13 W/m² against an MPE of
    // 25.4 W/m² at 0.25 s (18 t^0.75 J/m², IEC 60825-1:2014 Table A.1) — roughly half the MPE.
    RequirementOutcome o =
        check(
                "source src { wavelength 532 nm; power 0.5 mW; beam waist 1 mm }\n",
                "  exposure at eye <= 100 %")
            .get(0);
    assertEquals(RequirementStatus.PASS, o.status());
    double expected = 0.5e-3 / (Math.PI * 3.5e-3 * 3.5e-3) / (18 * Math.pow(0.25, 0.75) / 0.25);
    assertEquals(expected, o.value().getAsDouble(), expected * 0.02);
  }

  @Test
  void damageMarginsUseTheThresholdScaledToTheActualPulse() {
    // 10 J/cm² at 10 ns scaled to 40 ns by √(τ2/τ1) = 2 → 20 J/cm² (common practice).
    TrainSolution s =
        Bench.solve(
            """
            source src { wavelength 1064 nm; pulse_energy 1 mJ; pulse_duration 40 ns; repetition_rate 1 kHz;
              beam waist 1 mm }
            mirror m { reflectance 99 %; damage 10 J/cm2 for 10 ns at 1064 nm }
            dump d
            train t { src -> 10 mm -> m -> 10 mm -> d }
            """);
    Result r =
        Bench.check(
            """
            source src { wavelength 1064 nm; pulse_energy 1 mJ; pulse_duration 40 ns; repetition_rate 1 kHz;
              beam waist 1 mm }
            mirror m { reflectance 99 %; damage 10 J/cm2 for 10 ns at 1064 nm }
            dump d
            train t { src -> 10 mm -> m -> 10 mm -> d }
            require {
              margin damage >= 2 at m
            }
            """);
    double w = s.incidentAt("m").orElseThrow().exposure().orElseThrow().beamRadius();
    double peakFluence = 2 * 1e-3 / (Math.PI * w * w);
    assertEquals(
        20e4 / peakFluence,
        r.requirements().get(0).value().getAsDouble(),
        1e-6 * 20e4 / peakFluence);
  }
}
