package jonquil.ide;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import jonquil.Result;
import org.junit.jupiter.api.Test;

/**
 * An element that light meets twice, in the editor: its hover lists each pass, the step that enters
 * it again has its own inlay hint, and its name in that step navigates like any other.
 */
class ReturnPassesInTheEditorTest {
  static final String BENCH =
      """
      source laser { wavelength 1064 nm; power 20 mW; polarization linear 0 deg }
      splitter pbs { polarizing; extinction 1000; aoi 45 deg }
      waveplate qwp { retardance 0.25 wave at 1064 nm; fast_axis 45 deg }
      mirror retro { reflectance 100 %; aoi 0 deg }
      probe camera
      dump d1
      train t {
        laser -> 100 mm -> pbs -> 30 mm -> qwp -> 50 mm -> retro -> 50 mm -> qwp.back -> 30 mm
          -> pbs.back
        pbs.side -> 80 mm -> camera
        pbs.reflected -> 40 mm -> d1
      }
      """;

  @Test
  void theHoverOfAnElementMetTwiceListsEachPassInOrder() {
    Result r = Specs.check(BENCH).result();
    int at = Specs.offsetOf(r, Specs.MAIN, "qwp", 0);
    String md = EditorFeatures.standard().hover(r, Specs.MAIN, at).orElseThrow().markdown();
    assertTrue(md.contains("**Passes**"), md);
    int forward = md.indexOf("| 1 | `front` | forward |");
    int backward = md.indexOf("| 2 | `back` | backward |");
    assertTrue(forward > 0 && backward > forward, md);
  }

  @Test
  void theHoverOfTheSourceShowsTheLightReturnedToItsOutput() {
    Result r = Specs.check(BENCH).result();
    int at = Specs.offsetOf(r, Specs.MAIN, "laser", 0);
    String md = EditorFeatures.standard().hover(r, Specs.MAIN, at).orElseThrow().markdown();
    assertTrue(md.contains("Returned to its output (traced back through the train): "), md);
  }

  @Test
  void theStepThatEntersAgainHasItsOwnHint() {
    Result r = Specs.check(BENCH).result();
    String text = r.files().get(Specs.MAIN).text();
    int end = Specs.offsetOf(r, Specs.MAIN, "qwp.back", 0) + "qwp.back".length();
    List<InlayHint> hints = EditorFeatures.standard().inlayHints(r, Specs.MAIN, 0, text.length());
    InlayHint hint =
        hints.stream()
            .filter(h -> h.offset() == end)
            .findFirst()
            .orElseThrow(() -> new AssertionError(hints));
    // 20 mW × 95 % (the polarizing splitter's default p transmission) comes back whole.
    assertEquals(" 19 mW", hint.label());
    assertTrue(hint.tooltip().contains("in by 'back'"), hint.tooltip());
  }

  @Test
  void theNameInAFaceStepGoesToItsDeclarationAndIsAReference() {
    Result r = Specs.check(BENCH).result();
    int use = Specs.offsetOf(r, Specs.MAIN, "qwp.back", 0);
    List<Location> definition = EditorFeatures.standard().definition(r, Specs.MAIN, use);
    assertEquals(Specs.offsetOf(r, Specs.MAIN, "qwp", 0), definition.get(0).range().start());
    List<Location> refs = EditorFeatures.standard().references(r, Specs.MAIN, use, false);
    assertEquals(2, refs.size(), refs.toString()); // placed once, entered once
  }
}
