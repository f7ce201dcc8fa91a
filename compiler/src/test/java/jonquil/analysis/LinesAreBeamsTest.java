package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import org.junit.jupiter.api.Test;

/**
 * A source with several lines carries each as its own beam: a requirement can name its line, a band
 * judges the lines inside it and says which, and eye safety adds the lines that act on the same
 * part of the eye.
 */
class LinesAreBeamsTest {
  /** 20 mW at 532 nm and 50 mW at 1064 nm through a 400–700 nm filter that blocks at OD 3. */
  static final String TWO_LINES =
      """
      source laser {
        line 532 nm 20 mW
        line 1064 nm 50 mW
        polarization linear 0 deg
        beam waist 1 mm
      }
      filter kg { transmission 90 %; band 400 nm .. 700 nm; blocking OD 3 }
      detector det
      train t { laser -> 10 mm -> kg -> 10 mm -> det }
      """;

  static List<RequirementOutcome> outcomes(String spec, String... requirements) {
    return Bench.check(spec + "require {\n" + String.join("\n", requirements) + "\n}\n")
        .requirements();
  }

  @Test
  void eachLineCrossesTheFilterAtItsOwnTransmission() {
    // Inside its band the filter passes its stated 90 %; outside it its blocking OD 3 passes
    // 10^-3 (definition of optical density, T = 10^-OD).
    List<RequirementOutcome> o =
        outcomes(
            TWO_LINES,
            "power at det for line 532 nm >= 1 mW",
            "power at det for line 1064 nm <= 1 mW",
            "power at det >= 1 mW");
    assertEquals(0.9 * 20e-3, o.get(0).value().getAsDouble(), 1e-12); // definition
    assertEquals(1e-3 * 50e-3, o.get(1).value().getAsDouble(), 1e-15); // definition
    assertEquals(RequirementStatus.PASS, o.get(0).status());
    assertEquals(RequirementStatus.PASS, o.get(1).status());
    // Without a line named, the lines' powers add (incoherent lines; definition).
    assertEquals(0.9 * 20e-3 + 1e-3 * 50e-3, o.get(2).value().getAsDouble(), 1e-12);
    assertTrue(o.get(0).reason().contains("line 532 nm alone"), o.get(0).reason());
  }

  @Test
  void aBandJudgesEachLineInsideItAndNamesThem() {
    List<RequirementOutcome> o =
        outcomes(
            TWO_LINES,
            "power at det >= 1 mW over wavelength 500 nm .. 1100 nm",
            "power at det >= 1 mW over wavelength 500 nm .. 600 nm");
    // The worst line of the band decides: the blocked 1064 nm line, 50 µW (definition, as above).
    assertEquals(RequirementStatus.FAIL, o.get(0).status());
    assertEquals(50e-6, o.get(0).value().getAsDouble(), 1e-15); // definition
    assertTrue(o.get(0).reason().contains("532 nm, 1064 nm; worst 1064 nm"), o.get(0).reason());
    assertEquals(RequirementStatus.PASS, o.get(1).status());
    assertTrue(o.get(1).reason().contains("line 532 nm, the one line in the band"));
  }

  @Test
  void aBandHoldingNoLineFailsClosed() {
    List<RequirementOutcome> o =
        outcomes(TWO_LINES, "power at det >= 1 mW over wavelength 600 nm .. 700 nm");
    assertEquals(RequirementStatus.NOT_EVALUATED, o.get(0).status());
    assertTrue(o.get(0).reason().contains("no laser line lies in the band"), o.get(0).reason());
    assertTrue(o.get(0).reason().contains("the lines are 532 nm, 1064 nm"), o.get(0).reason());
  }

  @Test
  void aSourceWithoutLinesIsOneLineForABand() {
    String one =
        """
        source laser { wavelength 1064 nm; power 1 W; beam waist 1 mm }
        detector det
        train t { laser -> 10 mm -> det }
        """;
    List<RequirementOutcome> o =
        outcomes(
            one,
            "power at det >= 1 W over wavelength 1060 nm .. 1070 nm",
            "power at det >= 1 W over wavelength 1070 nm .. 1080 nm");
    assertEquals(RequirementStatus.PASS, o.get(0).status());
    assertTrue(o.get(0).reason().contains("line 1064 nm, the one line in the band"));
    assertEquals(RequirementStatus.NOT_EVALUATED, o.get(1).status());
  }

  @Test
  void aLineTheSourceLacksIsAnErrorListingItsLines() {
    Path root = Path.of("/virtual/lines").toAbsolutePath();
    Path file = root.resolve("test.jonq");
    Result r =
        Checker.check(
            Workspace.withOverlay(
                root,
                Map.of(file, TWO_LINES + "require {\n  power at det for line 633 nm <= 1 mW\n}\n")),
            List.of(file));
    List<Diagnostic> unknown =
        r.diagnostics().stream().filter(d -> d.code() == DiagnosticCode.UNKNOWN_LINE).toList();
    assertEquals(1, unknown.size(), r.diagnostics().toString());
    assertEquals(
        "'laser' has no line at 633 nm; its lines are 532 nm, 1064 nm;"
            + " did you mean 'for line 532 nm'?",
        unknown.get(0).message());
    assertEquals(RequirementStatus.NOT_EVALUATED, r.requirements().get(0).status());
  }

  /** A 7 mm probe 1 m from a source of two lines, each given its own power. */
  static String eyeBench(String first, double firstWatts, String second, double secondWatts) {
    return "source src { line "
        + first
        + " "
        + firstWatts
        + " W; line "
        + second
        + " "
        + secondWatts
        + " W; beam waist 0.5 mm }\n"
        + "probe eye { aperture 7 mm; exposure_time 0.25 s }\n"
        + "train t { src -> 1 m -> eye }\n";
  }

  /** Each line's fraction of its own MPE when it is alone, for 1 mW on each line. */
  static double[] aloneAtOneMilliwatt(String first, String second) {
    List<RequirementOutcome> o =
        outcomes(
            eyeBench(first, 1e-3, second, 1e-3),
            "exposure at eye for line " + first + " <= 100 %",
            "exposure at eye for line " + second + " <= 100 %");
    return new double[] {o.get(0).value().getAsDouble(), o.get(1).value().getAsDouble()};
  }

  @Test
  void twoLinesOnTheRetinaAtSixtyPercentEachAreOneHundredTwentyPercent() {
    // IEC 60825-1:2014, 4.3 (radiation of several wavelengths, from memory): where the lines act
    // on the same part of the eye the exposure is the sum of each line's ratio to its own limit,
    // which must not exceed 1. 532 nm and 633 nm both act on the retina (400 nm to 1400 nm).
    double[] alone = aloneAtOneMilliwatt("532 nm", "633 nm");
    // Exposure scales with power (definition of the ratio), so these powers give 60 % each.
    String bench = eyeBench("532 nm", 1e-3 * 0.6 / alone[0], "633 nm", 1e-3 * 0.6 / alone[1]);
    List<RequirementOutcome> o =
        outcomes(
            bench,
            "exposure at eye for line 532 nm <= 100 %",
            "exposure at eye for line 633 nm <= 100 %",
            "exposure at eye <= 100 %");
    assertEquals(0.6, o.get(0).value().getAsDouble(), 1e-9); // definition, as above
    assertEquals(0.6, o.get(1).value().getAsDouble(), 1e-9); // definition, as above
    assertEquals(RequirementStatus.PASS, o.get(0).status());
    assertEquals(RequirementStatus.PASS, o.get(1).status());
    // IEC 60825-1:2014, 4.3 (from memory): 0.6 + 0.6 = 1.2 > 1, so the pair fails.
    assertEquals(1.2, o.get(2).value().getAsDouble(), 1e-9);
    assertEquals(RequirementStatus.FAIL, o.get(2).status());
    assertTrue(o.get(2).reason().contains("IEC 60825-1:2014, 4.3"), o.get(2).reason());
    assertTrue(o.get(2).reason().contains("the retina"), o.get(2).reason());
  }

  @Test
  void twoLinesEachBelowTheClassOneLimitAreTogetherClassTwo() {
    // The Class 1 AEL for visible cw light is 0.39 mW and the Class 2 AEL 1 mW (IEC 60825-1:2014,
    // Tables 3 and 5, from memory). 0.3 mW at 635 nm and 0.3 mW at 650 nm are each Class 1
    // alone; both act on the retina, so their ratios add (4.3): 0.6 mW is Class 2.
    String bench =
        """
        source src { line 635 nm 0.3 mW; line 650 nm 0.3 mW; beam waist 0.4 mm, m2 1.2 }
        probe eye
        train t { src -> 1 m -> eye }
        """;
    List<RequirementOutcome> o =
        outcomes(
            bench,
            "hazard class <= 1 at src",
            "hazard class <= 2 at src",
            "hazard class <= 1 at src for line 635 nm");
    assertEquals(RequirementStatus.FAIL, o.get(0).status());
    assertEquals(RequirementStatus.PASS, o.get(1).status());
    assertTrue(o.get(1).reason().contains("judged as their total 600 µW"), o.get(1).reason());
    assertEquals(RequirementStatus.PASS, o.get(2).status());
  }

  @Test
  void aLineWhoseLimitIsUnknownLeavesTheSumNotEvaluated() {
    // Jonquil has no MPE for 1300 nm (the 1250-1400 nm corneal/lens dual limit): the pair cannot
    // be judged, so it is not met (fail closed), where judging the total at the 532 nm limit alone
    // would have let it pass.
    List<RequirementOutcome> o =
        outcomes(eyeBench("532 nm", 1e-4, "1300 nm", 1e-4), "exposure at eye <= 100 %");
    assertEquals(RequirementStatus.NOT_EVALUATED, o.get(0).status());
    assertTrue(o.get(0).reason().startsWith("line 1300 nm: "), o.get(0).reason());
  }

  @Test
  void theRetinalHazardRegionDecidesWhichLinesAdd() {
    // The retinal hazard region is 400 nm to 1400 nm (IEC 60825-1:2014, 3.x definitions, from
    // memory); the rest acts on the cornea and lens.
    assertEquals(jonquil.safety.OcularEffect.RETINA, jonquil.safety.OcularEffect.of(400e-9));
    assertEquals(jonquil.safety.OcularEffect.RETINA, jonquil.safety.OcularEffect.of(1064e-9));
    assertEquals(jonquil.safety.OcularEffect.ANTERIOR_EYE, jonquil.safety.OcularEffect.of(355e-9));
    assertEquals(jonquil.safety.OcularEffect.ANTERIOR_EYE, jonquil.safety.OcularEffect.of(1400e-9));
  }
}
