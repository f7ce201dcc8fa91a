package jonquil.ide;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import jonquil.resolve.CatalogSpellings;
import jonquil.resolve.ElementKind;
import jonquil.resolve.Measure;
import org.junit.jupiter.api.Test;

/**
 * Completion offers what is valid at the cursor, on the half-typed text of a spec being written.
 */
class CompletionTest {
  /** A bench being written: the cursor is wherever the test puts {@code $0}. */
  private static final String BENCH =
      """
      source seed { wavelength 1064 nm; power 2 W }
      material slab_glass = index 1.5
      splitter  pbs { polarizing }
      lens      l1  { focal 100 mm }
      probe     spot
      dump      d1
      @
      train main {
        seed -> 100 mm -> pbs -> 50 mm -> spot
        pbs.reflected -> 30 mm -> d1
      }

      require {
        power at spot >= 1 W
      }
      """;

  private static List<CompletionItemInfo> at(String spec) {
    Specs.Checked c = Specs.check(spec.replace("@\n", ""));
    return EditorFeatures.standard().completions(c.result(), c.file(), c.offset());
  }

  private static List<String> labels(List<CompletionItemInfo> items) {
    return items.stream().map(CompletionItemInfo::label).toList();
  }

  private static List<String> labels(List<CompletionItemInfo> items, String kind) {
    return items.stream()
        .filter(i -> i.kind().word().equals(kind))
        .map(CompletionItemInfo::label)
        .toList();
  }

  @Test
  void atTheStartOfATopLevelLineEveryKindAndTheBlockKeywords() {
    List<CompletionItemInfo> items = at(BENCH.replace("@", "$0"));
    assertEquals(ElementKind.words(), labels(items, "kind"));
    assertEquals(List.of("use", "train", "require", "standard"), labels(items, "keyword"));
  }

  @Test
  void afterStandardTheStandardsByTheirWords() {
    List<CompletionItemInfo> items = at(BENCH.replace("@", "standard $0"));
    assertEquals(List.of("iec", "directive", "ansi"), labels(items, "keyword"));
    assertTrue(items.get(1).documentation().contains("2006/25/EC"), items.toString());
  }

  @Test
  void aSafetyRequirementOffersForAndItsViewingWords() {
    String exposure = "power at spot >= 1 W\n  exposure at spot <= 100 % ";
    assertTrue(labels(at(BENCH.replace("power at spot >= 1 W", exposure + "$0"))).contains("for"));
    assertFalse(
        labels(at(BENCH.replace("power at spot >= 1 W", "power at spot >= 1 W $0")))
            .contains("for"),
        "power does not depend on how the light is viewed");
    assertEquals(
        List.of("viewing", "duration", "reflectance", "subtense", "distance"),
        labels(at(BENCH.replace("power at spot >= 1 W", exposure + "for $0")), "keyword"));
    assertEquals(
        List.of("direct", "specular", "diffuse"),
        labels(at(BENCH.replace("power at spot >= 1 W", exposure + "for viewing $0")), "keyword"));
  }

  @Test
  void aHalfTypedKindWordStillOffersTheKinds() {
    assertTrue(labels(at(BENCH.replace("@", "mirr$0"))).contains("mirror"));
  }

  @Test
  void insideALensBlockTheLensParametersWithTheirDocs() {
    List<CompletionItemInfo> items = at(BENCH.replace("focal 100 mm }", "focal 100 mm\n  $0\n}"));
    assertEquals(
        ElementKind.LENS.params().stream().map(p -> p.name()).toList(), labels(items, "parameter"));
    CompletionItemInfo focal =
        items.stream().filter(i -> i.label().equals("focal")).findFirst().orElseThrow();
    assertEquals(
        new CompletionItemInfo(
            "focal",
            CompletionItemInfo.Kind.PARAMETER,
            "required parameter of lens",
            "focal length (negative: diverging)"),
        focal);
  }

  @Test
  void afterAnArrowTheElementsAndTheirPorts() {
    List<CompletionItemInfo> items = at(BENCH.replace("-> 50 mm -> spot", "-> 50 mm -> $0"));
    assertEquals(List.of("d1", "l1", "pbs", "seed", "spot"), labels(items, "element"));
    assertEquals(List.of("pbs.through", "pbs.reflected"), labels(items, "port"));
    assertFalse(labels(items).contains("slab_glass"), "a material cannot stand in a path");
  }

  @Test
  void aHalfTypedNameIsOneWordAsTheLexerReadsIt() {
    // The lexer reads 'sp²' and 'spä' as single names, so the elements are offered for them.
    for (String typed : List.of("sp²", "spä", "s𝑥")) {
      List<CompletionItemInfo> items =
          at(BENCH.replace("-> 50 mm -> spot", "-> 50 mm -> " + typed + "$0"));
      assertTrue(labels(items, "element").contains("spot"), typed);
    }
  }

  @Test
  void afterADotInARequirementThePortsOfThatElement() {
    assertEquals(
        List.of("through", "reflected"),
        labels(at(BENCH.replace("power at spot", "power at pbs.$0"))));
  }

  @Test
  void afterADotInAPathTheElementsPortsAndFacesEachWithWhatItMeans() {
    // A four-port: its two ports, then the faces light enters by again, then the side exit.
    List<CompletionItemInfo> splitter = at(BENCH.replace("pbs.reflected", "pbs.$0"));
    assertEquals(List.of("through", "reflected", "front", "back", "side"), labels(splitter));
    assertEquals(
        "face: a return pass, against the light that left by 'through'",
        splitter.stream().filter(i -> i.label().equals("back")).findFirst().orElseThrow().detail());
    assertTrue(splitter.stream().allMatch(i -> i.kind() == CompletionItemInfo.Kind.PORT));
    // A lens has one way out, which is not written: only its faces, front also as a path start.
    List<CompletionItemInfo> lens = at(BENCH.replace("-> 50 mm -> spot", "-> 50 mm -> l1.$0"));
    assertEquals(List.of("front", "back"), labels(lens));
    assertTrue(lens.stream().allMatch(i -> !i.detail().isEmpty()), lens.toString());
    // A dump stops the light: nothing follows its name.
    assertEquals(List.of(), at(BENCH.replace("-> 30 mm -> d1", "-> 30 mm -> d1.$0")));
  }

  @Test
  void afterANumberInAPathLengthUnits() {
    assertEquals(
        List.of("nm", "um", "mm", "cm", "m"), labels(at(BENCH.replace("-> 50 mm ->", "-> 50 $0"))));
  }

  @Test
  void afterANumberInAParameterTheUnitsOfItsDimension() {
    assertEquals(
        List.of("uW", "mW", "W", "kW"), labels(at(BENCH.replace("power 2 W", "power 2 $0"))));
    assertEquals(
        List.of("nm", "um", "mm", "cm", "m"), labels(at(BENCH.replace("1064 nm", "1064$0"))));
    List<CompletionItemInfo> units =
        at(BENCH.replace("power 2 W }", "power 2 W; pulse_duration 8 $0 }"));
    assertEquals(List.of("fs", "ps", "ns", "us", "ms", "s"), labels(units));
    assertEquals("unit of time", units.get(0).detail());
  }

  @Test
  void theWordBeforeANumberPicksItsSlot() {
    String spec = BENCH.replace("@", "waveplate hwp { retardance 0.5 wave at 1064 $0 }");
    assertEquals(List.of("nm", "um", "mm", "cm", "m"), labels(at(spec)));
    String beam = BENCH.replace("power 2 W }", "power 2 W; beam waist 1 $0 }");
    assertEquals(List.of("nm", "um", "mm", "cm", "m"), labels(at(beam)));
  }

  @Test
  void afterMetalOnlyMetalsAfterMaterialEveryMaterial() {
    List<CompletionItemInfo> metals = at(BENCH.replace("@", "mirror m1 { metal $0 }"));
    assertEquals(
        List.of("slab_glass", "silver", "gold", "aluminium", "aluminum", "copper"), labels(metals));
    assertEquals("catalog material (metal)", metals.get(1).detail());
    List<CompletionItemInfo> all = at(BENCH.replace("@", "window w1 {\n  material $0\n}"));
    assertTrue(labels(all).containsAll(CatalogSpellings.spellings()));
    assertEquals("slab_glass", all.get(0).label());
  }

  @Test
  void afterInInAPathTheMedia() {
    assertTrue(labels(at(BENCH.replace("-> 100 mm ->", "-> 100 mm in wa$0"))).contains("water"));
  }

  @Test
  void atTheStartOfARequirementTheMeasures() {
    List<CompletionItemInfo> items =
        at(BENCH.replace("power at spot >= 1 W", "power at spot >= 1 W\n  $0"));
    assertEquals(Measure.spellings(), labels(items, "measure"));
    assertEquals(List.of("yield"), labels(items, "keyword"));
  }

  @Test
  void inARequirementPlacesStatesAndUnitsOfTheMeasure() {
    assertTrue(labels(at(BENCH.replace("power at spot", "power at $0"))).contains("spot"));
    assertEquals(List.of("uW", "mW", "W", "kW"), labels(at(BENCH.replace(">= 1 W", ">= 1 $0"))));
    assertEquals(
        List.of("linear", "circular", "elliptical", "unpolarized", "partial"),
        labels(at(BENCH.replace("power at spot >= 1 W", "polarization at spot is $0"))));
  }

  @Test
  void nothingInsideCommentsOrStrings() {
    assertEquals(List.of(), at(BENCH.replace("@", "// a note about $0")));
    assertEquals(List.of(), at(BENCH.replace("@", "use \"parts/$0")));
    assertEquals(List.of(), at(BENCH.replace("@", "use \"parts\\$0")));
    assertEquals(List.of(), at(BENCH.replace("@", "/* a note\n about $0")));
  }

  @Test
  void brokenTextAndAnyOffsetNeverThrow() {
    String broken = "source s { wavelength 10\nlens l { focal 3 mm \ntrain { s -> 4 mm -> ";
    Specs.Checked c = Specs.check(broken);
    for (int i = -2; i <= broken.length() + 2; i++) {
      EditorFeatures.standard().completions(c.result(), Specs.MAIN, i);
    }
    assertEquals(
        List.of("nm", "um", "mm", "cm", "m"),
        labels(
            EditorFeatures.standard()
                .completions(c.result(), Specs.MAIN, broken.indexOf("10") + 2)));
    assertTrue(
        labels(EditorFeatures.standard().completions(c.result(), Specs.MAIN, broken.length()))
            .contains("l"));
  }
}
