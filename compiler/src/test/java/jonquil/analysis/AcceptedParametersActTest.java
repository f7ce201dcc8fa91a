package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import jonquil.diag.Diagnostic;
import jonquil.optics.beam.GaussianBeam;
import jonquil.optics.material.CatalogMaterial;
import jonquil.optics.material.MaterialCatalog;
import jonquil.optics.material.ThermoOptic;
import jonquil.safety.Emission;
import jonquil.safety.Nohd;
import org.junit.jupiter.api.Test;

/**
 * What each parameter that used to be accepted and ignored now does, with its expected value and
 * the source of that value (rule 4 of issue 10: nothing accepted is ignored).
 */
class AcceptedParametersActTest {
  static final Path ROOT = Path.of("/virtual/accepted").toAbsolutePath();

  static Result check(String spec) {
    Path file = ROOT.resolve("test.jonq");
    return Checker.check(Workspace.withOverlay(ROOT, Map.of(file, spec)), List.of(file));
  }

  static List<Diagnostic> coded(Result r, String id) {
    return r.diagnostics().stream().filter(d -> d.code().id().equals(id)).toList();
  }

  static double value(Result r, String requirementStart) {
    return r.requirements().stream()
        .filter(o -> o.text().startsWith(requirementStart))
        .findFirst()
        .orElseThrow()
        .value()
        .orElseThrow();
  }

  static String single(String pulse) {
    return "source s { wavelength 1064 nm; "
        + pulse
        + "; beam waist 1 mm }\nprobe p\ntrain t { s -> 1 m -> p }\n"
        + "require {\n  nohd < 1 m at s\n  exposure at p < 100 %\n  hazard class <= 1 at s\n}\n";
  }

  @Test
  void aSinglePulseIsJudgedAsASinglePulseNotAsNoLaser() {
    Result r = check(single("pulse_energy 10 mJ; pulse_duration 8 ns"));
    TrainSolution s = r.solutions().values().iterator().next();
    // The train carries the rectangular-equivalent peak power E/τ = 10 mJ / 8 ns = 1.25 MW
    // (definition), not 0 W.
    assertEquals(1.25e6, s.sourcePower(), 1e-3);
    PortValue exit = s.port("s.out").orElseThrow();
    assertEquals(0.01, exit.exposure().orElseThrow().pulseEnergy().orElseThrow(), 1e-12);
    // NOHD of a single 10 mJ, 8 ns pulse from the safety module's own single-pulse limits (IEC
    // 60825-1:2014 Table A.1 as implemented in jonquil.safety), with the beam at the exit.
    GaussianBeam mode = exit.mode().orElseThrow();
    double expected =
        Nohd.of(
                Emission.singlePulse(1064e-9, 0.01, 8e-9),
                2 * mode.radius(),
                2 * mode.divergence(),
                SafetyModel.defaultExposureTime(1064e-9))
            .get();
    assertEquals(expected, value(r, "nohd"), 1e-9 * expected);
    assertTrue(value(r, "nohd") > 1, "a 10 mJ pulse has a hazard distance");
    assertTrue(value(r, "exposure") > 1, "a 10 mJ pulse is above the MPE at 1 m");
    // Not class 1: failed, or not evaluated with its reason, never passed.
    var hazard =
        r.requirements().stream()
            .filter(o -> o.text().startsWith("hazard"))
            .findFirst()
            .orElseThrow();
    assertNotEquals(RequirementStatus.PASS, hazard.status(), hazard.toString());
    assertFalse(hazard.reason().isBlank(), "a hazard class not evaluated says why");
  }

  @Test
  void waistAndDivergenceTogetherGiveTheBeamQuality() {
    Result r =
        check(
            "source s { wavelength 1064 nm; power 1 W; beam waist 1 mm, divergence 0.5 mrad }\n"
                + "probe p\ntrain t { s -> 1 m -> p }\n");
    GaussianBeam mode =
        r.solutions().values().iterator().next().port("s.out").orElseThrow().mode().orElseThrow();
    // θ = M² λ/(π n W0) (Siegman, Lasers, 1986, ch. 17): M² = π n W0 θ/λ = 1.4763 n, n of air
    // 1.00027 at 1064 nm (Ciddor 1996).
    assertEquals(Math.PI * 1e-3 * 0.5e-3 / 1064e-9, mode.m2(), 1e-3);
    assertEquals(1e-3, mode.waistRadius(), 1e-12);
    assertEquals(0.5e-3, mode.divergence(), 1e-9);
  }

  @Test
  void anOverDeterminedBeamMustAgreeAndCannotBeatTheDiffractionLimit() {
    String base =
        "source s { wavelength 1064 nm; power 1 W; beam %s }\nprobe p\n"
            + "train t { s -> 1 m -> p }\n";
    // π · 1 mm · 0.5 mrad / 1064 nm = 1.476 against a stated 1: 48 % apart.
    assertEquals(
        1, coded(check(base.formatted("waist 1 mm, divergence 0.5 mrad, m2 1")), "J406").size());
    // Within rounding (5 %): accepted.
    assertEquals(
        0, coded(check(base.formatted("waist 1 mm, divergence 0.5 mrad, m2 1.45")), "J406").size());
    // 0.1 mrad gives M² = 0.295: below the diffraction limit.
    assertEquals(1, coded(check(base.formatted("waist 1 mm, divergence 0.1 mrad")), "J405").size());
  }

  static String filter(String params) {
    return "source s { wavelength 1064 nm; power 1 W }\nfilter f { "
        + params
        + " }\nprobe p\ntrain t { s -> 10 mm -> f -> 10 mm -> p }\n";
  }

  @Test
  void aFilterActsOnlyInItsBandAndBlocksAsStatedOutsideIt() {
    // T = 10^-OD (definition of optical density).
    double in =
        check(filter("od 4; band 1000 nm .. 1100 nm; blocking 1"))
            .solutions()
            .values()
            .iterator()
            .next()
            .port("p")
            .orElseThrow()
            .power();
    double out =
        check(filter("od 4; band 400 nm .. 700 nm; blocking 1"))
            .solutions()
            .values()
            .iterator()
            .next()
            .port("p")
            .orElseThrow()
            .power();
    // 1 W through OD 4 in band and OD 1 outside it: T = 10^-OD (definition).
    assertEquals(1e-4, in, 1e-9);
    assertEquals(0.1, out, 1e-9);
    // Fail closed: a band without a stated out-of-band blocking is refused, and the reverse.
    assertEquals(1, coded(check(filter("od 4; band 400 nm .. 700 nm")), "J402").size());
    assertEquals(1, coded(check(filter("od 4; blocking 1")), "J402").size());
  }

  @Test
  void aDumpAboveItsRatingOrADetectorAboveItsDamageThresholdIsAnError() {
    String dump =
        "source s { wavelength 1064 nm; power 1 W; beam waist 1 mm }\ndump d {\n  rating %s\n}\n"
            + "train t { s -> 10 mm -> d }\n";
    List<Diagnostic> over = coded(check(dump.formatted("0.5 W")), "J616");
    assertEquals(1, over.size());
    assertTrue(over.get(0).message().contains("above its rating"), over.toString());
    assertEquals(0, coded(check(dump.formatted("2 W")), "J616").size());
    // Peak irradiance 2P/(πw²) = 2 × 1 W/(π × 0.1 cm)² = 63.7 W/cm² (Gaussian peak, definition),
    // 10 mm from the waist where w has grown by 1e-4 (z_R = 2.95 m).
    String detector =
        "source s { wavelength 1064 nm; power 1 W; beam waist 1 mm }\n"
            + "detector d {\n"
            + "  damage %s\n"
            + "}\n"
            + "train t { s -> 10 mm -> d }\n";
    assertEquals(1, coded(check(detector.formatted("60 W/cm2")), "J616").size());
    assertEquals(0, coded(check(detector.formatted("70 W/cm2")), "J616").size());
  }

  @Test
  void backReflectionAtAPlaceIsTheLightHeadingBackFromThere() {
    String spec =
        "source s { wavelength 1064 nm; power 1 W }\nmaterial glass { index 1.5 }\n"
            + "lens l1 { focal 100 mm; material glass }\n"
            + "lens l2 { focal 100 mm; material glass; coating ar 0.5 % }\nprobe p\n"
            + "train t { s -> 10 mm -> l1 -> 10 mm -> l2 -> 10 mm -> p }\n"
            + "require {\n  back reflection at l1 < 1 W\n  back reflection at l2 < 1 W\n"
            + "  back reflection < 1 W\n  back reflection at s < 1 W\n}\n";
    Result r = check(spec);
    double l1 = value(r, "back reflection at l1");
    double l2 = value(r, "back reflection at l2");
    // Uncoated glass of n = 1.5 in air: R = ((n−1)/(n+1))² = 0.04 per face (Hecht, Optics, Fresnel
    // at normal incidence); two faces summed incoherently give 2R/(1+R) = 0.0769 (definition).
    assertEquals(2 * 0.04 / 1.04, l1, 2e-4);
    // 0.5 % per coated face, on the 92.3 % l1 passes: 2 × 0.005/1.005 × 0.923 = 0.0092.
    assertEquals(2 * 0.005 / 1.005 * (1 - 2 * 0.04 / 1.04), l2, 1e-4);
    // Both ghosts run back to the source; l2's crosses l1 on the way, which passes 1 − 2R/(1+R)
    // of it (definition: what the plate does not reflect; the glass does not absorb).
    double back = l1 + l2 * (1 - 2 * 0.04 / 1.04);
    assertEquals(back, value(r, "back reflection <"), 1e-4 * back);
    assertEquals(back, value(r, "back reflection at s"), 1e-4 * back);
  }

  @Test
  void aMissingDistanceIsRefusedWhereTheBeamSizeDependsOnIt() {
    String sized = "source s { wavelength 1064 nm; power 1 W; beam waist 1 mm }\n";
    String unsized = "source s { wavelength 1064 nm; power 1 W }\n";
    String rest = "polarizer a { axis 0 deg }\nprobe p\ntrain t { s -> 10 mm -> a -> p }\n";
    List<Diagnostic> missing = coded(check(sized + rest), "J515");
    assertEquals(1, missing.size());
    assertTrue(missing.get(0).message().contains("'a' and 'p'"), missing.toString());
    assertEquals(0, coded(check(unsized + rest), "J515").size());
    // Parts in contact say so.
    assertEquals(
        0,
        coded(check(sized + rest.replace("a -> p", "a -> 0 mm -> p")), "J515").size()
            + coded(check(sized + rest.replace("a -> p", "a -> 0 mm -> p")), "J405").size());
    // A branch is checked too: its light comes from the sized source through the splitter.
    String branch =
        sized
            + "splitter b { ratio 50 % }\ndump d\nprobe p\n"
            + "train t {\n  s -> 10 mm -> b -> 10 mm -> p\n  b.reflected -> d\n}\n";
    assertEquals(1, coded(check(branch), "J515").size());
  }

  @Test
  void anElementThatNoPathPlacesIsAWarning() {
    Result r =
        check(
            "source s { wavelength 1064 nm; power 1 W }\npolarizer spare { axis 0 deg }\n"
                + "material glass { index 1.5 }\nprobe p\ntrain t { s -> 10 mm -> p }\n");
    List<Diagnostic> w = coded(r, "J517");
    assertEquals(1, w.size(), r.diagnostics().toString());
    assertTrue(w.get(0).message().contains("'spare'"));
    // A file without a train (a part library opened alone) is not checked.
    assertEquals(0, coded(check("polarizer spare { axis 0 deg }\n"), "J517").size());
  }

  @Test
  void aTemperatureMovesTheIndexOnlyWherePublishedDataSayHow() {
    CatalogMaterial silica = MaterialCatalog.lookup("fused_silica").orElseThrow();
    ThermoOptic thermo = ThermoOptic.of("fused_silica").orElseThrow();
    // dn/dT = 8.45e-6 /K (Leviton & Frey, Proc. SPIE 6273, 62732K, 2006): 15 K above the
    // entry's 20 °C (Malitson 1965) raises n by 1.2675e-4.
    double shift =
        thermo.index(silica, 1064e-9, 308.15).getReal() - silica.absoluteIndex(1064e-9).getReal();
    // Leviton & Frey 2006, Table 3 region (dn/dT near 1 µm, from memory of the table number).
    assertEquals(8.45e-6 * 15, shift, 1e-9);
    String spec =
        "source s { wavelength 1064 nm; power 1 W }\nmaterial g { %s }\n"
            + "window w { material g; thickness 1 mm }\nprobe p\ndump d\n"
            + "train t {\n  s -> 10 mm -> w -> 10 mm -> p\n  w.reflected -> 10 mm -> d\n}\n";
    assertEquals(
        0,
        check(spec.formatted("catalog fused_silica; temperature 35 degC"))
            .count(jonquil.diag.Severity.ERROR));
    assertEquals(1, coded(check(spec.formatted("index 1.5; temperature 35 degC")), "J410").size());
    assertEquals(
        1, coded(check(spec.formatted("catalog sapphire; temperature 35 degC")), "J410").size());
    assertEquals(
        1,
        coded(check(spec.formatted("catalog fused_silica; temperature 80 degC")), "J405").size());
  }
}
