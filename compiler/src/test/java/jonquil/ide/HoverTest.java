package jonquil.ide;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import jonquil.safety.Outcome;
import jonquil.testing.Golden;
import jonquil.testing.Repo;
import org.junit.jupiter.api.Test;

/** Hover, one golden Markdown file per kind of node, the cursor marked $0 in an inline spec. */
class HoverTest {
  private static final Path GOLDEN = Repo.root().resolve("compiler/src/test/resources/ide/hover");

  /** The bench with $0 placed before the n-th occurrence of a word. */
  private static String bench(String word, int nth) {
    String text = Specs.BENCH;
    int at = -1;
    for (int i = 0; i <= nth; i++) {
      at = text.indexOf(word, at + 1);
    }
    return text.substring(0, at) + "$0" + text.substring(at);
  }

  private static String hover(String spec) {
    return hover(Map.of("main.jonq", spec));
  }

  private static String hover(Map<String, String> files) {
    Specs.Checked c = Specs.check(files);
    HoverInfo h =
        EditorFeatures.standard()
            .hover(c.result(), c.file(), c.offset())
            .orElseThrow(() -> new AssertionError("no hover"));
    assertTrue(h.range().contains(c.offset()), "the hover range covers the cursor");
    String under = c.result().files().get(c.file()).slice(h.range());
    return "<!-- hover over '" + under.replaceAll("\\s+", " ") + "' -->\n\n" + h.markdown() + "\n";
  }

  @Test
  void anElementUseShowsItsParametersLightPolarizationAndDamageMargin() {
    String md = hover(bench("m1", 1));
    assertTrue(md.contains("as seen by the receiver, looking back towards the source"));
    Golden.check(GOLDEN.resolve("element.md"), md);
  }

  @Test
  void aYieldShowsItsIntervalItsBuildsAndItsSeed() {
    String md =
        hover(
            """
            source s { wavelength 633 nm; power 10 mW; polarization linear 0 deg }
            polarizer p45 { axis 45 deg ± 10 deg }
            probe mid
            train t { s -> 10 mm -> p45 -> 10 mm -> mid }
            require {
              $0yield >= 50 % over 300 builds for power at mid >= 5 mW
            }
            """);
    assertTrue(md.contains("95 % Wilson score interval"), md);
    assertTrue(md.contains(" of 300 builds (seed "), md);
    assertTrue(md.contains("not settled, raise the builds"), md);
  }

  @Test
  void aWindowShowsBothOfItsPorts() {
    Golden.check(GOLDEN.resolve("window.md"), hover(bench("w1", 0)));
  }

  @Test
  void aWaveplateShowsItsJonesMatrix() {
    String md = hover(bench("qwp", 1));
    // A quarter-wave plate with its fast axis at 45°: (1/√2)[[1, −i], [−i, 1]] up to a global phase
    // (E. Hecht, Optics, 5th ed., 2017, §8.13.2, Table 8.6, from memory). The checker splits the
    // retardance symmetrically, e^{∓iπ/4}, so the same matrix times e^{iπ/4}: entries (1 ± i)/2.
    assertTrue(md.contains("**Jones matrix**, out `out`"), md);
    assertTrue(
        md.contains("| to x | 0.5 + 0.5i | 0.5 - 0.5i |")
            && md.contains("| to y | 0.5 - 0.5i | 0.5 + 0.5i |"),
        md);
    Golden.check(GOLDEN.resolve("waveplate.md"), md);
  }

  @Test
  void anInterfaceShowsItsReflectancesAndItsBrewsterAndCriticalAngles() {
    String spec = Specs.read("interface.jonq");
    String md = hover(spec);
    // From 1 into 1.5 at 45°, by the Fresnel equations (E. Hecht, Optics, 5th ed., 2017, eqs.
    // 4.42-4.43,
    // from memory), worked by hand: θt = 28.13°, rs = −0.3033, rp = 0.0920, so Rs = 9.201 %,
    // Rp = 0.8466 %; Brewster angle arctan 1.5 = 56.31° (Hecht eq. 4.52, from memory).
    assertTrue(md.contains("| 9.201 % | 0.8466 % | 90.8 % | 99.15 % |"), md);
    assertTrue(md.contains("Brewster angle 56.31°"), md);
    assertTrue(md.contains("no critical angle"), md);
    Golden.check(GOLDEN.resolve("interface.md"), md);

    String inside =
        hover(spec.replace("$0entry", "entry").replace("interface exit", "interface $0exit"));
    // From 1.5 into 1: critical angle arcsin(1/1.5) = 41.81°; at normal incidence R =
    // ((n−1)/(n+1))² = 4 %.
    assertTrue(
        inside.contains("critical angle 41.81°") && inside.contains("| 4 % | 4 % | 96 % | 96 % |"),
        inside);
  }

  @Test
  void aSourceShowsItsLinesBeamAndEyeSafetyWithTheCaution() {
    String md = hover(bench("seed", 0));
    assertTrue(md.contains(Outcome.CAUTION));
    Golden.check(GOLDEN.resolve("source.md"), md);
  }

  /** The two-line bench (lines.jonq) with $0 placed before the n-th occurrence of a word. */
  private static String twoLines(String word, int nth) {
    String text = Specs.read("lines.jonq");
    int at = -1;
    for (int i = 0; i <= nth; i++) {
      at = text.indexOf(word, at + 1);
    }
    return text.substring(0, at) + "$0" + text.substring(at);
  }

  @Test
  void aSourceOfSeveralLinesShowsEachLinesOwnFigures() {
    String md = hover(twoLines("duo", 1));
    assertTrue(md.contains("### Line 488 nm") && md.contains("### Line 561 nm"), md);
    // Each line's own stated power (definition of 'line'), not only their 50 mW total.
    assertTrue(md.contains("| out `out` | 20 mW |") && md.contains("| out `out` | 30 mW |"), md);
    // Each line's own far-field divergence θ = λ/(π w0) (A. E. Siegman, Lasers, 1986, ch. 17):
    // 488 nm / (π · 0.5 mm) = 0.3106 mrad, 561 nm / (π · 0.5 mm) = 0.357 mrad.
    assertTrue(md.contains("0.3106 mrad") && md.contains("0.357 mrad"), md);
    // Eye safety is each line's own: one set of figures per line, one caution after them all.
    assertEquals(2, md.split("- hazard class: ", -1).length - 1, md);
    assertEquals(1, md.split(java.util.regex.Pattern.quote(Outcome.CAUTION), -1).length - 1, md);
    Golden.check(GOLDEN.resolve("source-lines.md"), md);
  }

  @Test
  void anElementOnTheLightOfSeveralLinesShowsEachLinesOwnFigures() {
    String md = hover(twoLines("dc", 1));
    // Inside its band the splitter reflects 'ratio' (90 % of 30 mW = 27 mW); outside it, what it
    // reflected it transmits (90 % of 20 mW = 18 mW): the dichroic rule (definition, README).
    assertTrue(md.contains("| out `reflected` | 27 mW |"), md);
    assertTrue(md.contains("| out `through` | 18 mW |"), md);
    assertTrue(md.contains("out `through` at 488 nm") && md.contains("out `through` at 561 nm"));
    Golden.check(GOLDEN.resolve("element-lines.md"), md);
  }

  @Test
  void aPortOnTheLightOfSeveralLinesShowsEachLinesOwnFigures() {
    String md = hover(twoLines("through", 1));
    // 10 % of 30 mW and 90 % of 20 mW leave by 'through' (definition of the dichroic split).
    assertTrue(md.contains("| out `through` | 3 mW |") && md.contains("| out `through` | 18 mW |"));
    Golden.check(GOLDEN.resolve("port-lines.md"), md);
  }

  @Test
  void aRequirementOnOneLineShowsThatLinesFigures() {
    String md = hover(twoLines("power at spot", 0));
    assertTrue(md.contains("### Line 561 nm at `spot`"), md);
    // 10 % of the 561 nm line's 30 mW passes the dichroic (definition of 'ratio').
    assertTrue(md.contains("| in | 3 mW |"), md);
    Golden.check(GOLDEN.resolve("requirement-line.md"), md);
  }

  @Test
  void aDeclaredMaterialShowsItsIndexAtTheTrainsWavelengths() {
    Golden.check(GOLDEN.resolve("material-declared.md"), hover(bench("slab_glass", 1)));
  }

  @Test
  void aCatalogMaterialCitesItsReference() {
    String md = hover(bench("silver", 0));
    assertTrue(md.contains("Johnson and R. W. Christy"));
    Golden.check(GOLDEN.resolve("material-catalog.md"), md);
  }

  @Test
  void aQuantityShowsItsSiValueAndAlternatives() {
    Golden.check(GOLDEN.resolve("quantity.md"), hover(bench("5 kW/cm2", 0)));
  }

  @Test
  void aFailedRequirementShowsValueBoundMarginAndItsFinding() {
    String md = hover(bench("power at spot >= 1.95", 0));
    assertTrue(md.contains("J609"));
    Golden.check(GOLDEN.resolve("requirement.md"), md);
  }

  @Test
  void aSpecWithErrorsSaysThatNothingWasComputed() {
    String spec =
        """
        source seed { wavelength 1064 nm; power 2 W }
        mirror m1 { reflectance 140 % }
        dump d1
        train main { seed -> 10 mm -> $0m1 -> 10 mm -> d1 }
        """;
    String md = hover(spec);
    assertTrue(md.contains("No beam analysis"));
    Golden.check(GOLDEN.resolve("no-analysis.md"), md);
  }

  @Test
  void anElementFromAPartLibrarySaysWhereItIsDeclared() {
    Map<String, String> files =
        Map.of(
            "main.jonq",
                """
                use "parts/optics.jonq"
                source seed { wavelength 532 nm; power 10 mW; beam waist 0.5 mm }
                dump d1
                train main { seed -> 10 mm -> $0fold -> 10 mm -> d1 }
                """,
            "parts/optics.jonq", "mirror fold { reflectance 99 %; aoi 45 deg }\n");
    Golden.check(GOLDEN.resolve("element-from-library.md"), hover(files));
  }
}
