package jonquil.ide;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import jonquil.Result;
import org.junit.jupiter.api.Test;

/**
 * Inlay hints show the solved power after each element step of a path, only inside the range asked
 * for.
 */
class InlayHintsTest {
  /** Each hint as "text before it|label", so a reader sees where it lands. */
  private static String render(String text, List<InlayHint> hints) {
    StringBuilder out = new StringBuilder();
    for (InlayHint h : hints) {
      int lineStart = text.lastIndexOf('\n', h.offset() - 1) + 1;
      out.append(text, lineStart, h.offset())
          .append(" |")
          .append(h.label())
          .append("   ")
          .append(h.tooltip())
          .append('\n');
    }
    return out.toString();
  }

  @Test
  void afterEveryElementStepThePowerLeavingIt() {
    Result r = Specs.check(Specs.BENCH).result();
    String text = r.files().get(Specs.MAIN).text();
    String actual =
        render(text, EditorFeatures.standard().inlayHints(r, Specs.MAIN, 0, text.length()));
    String rx = " (as seen by the receiver, looking back towards the source)";
    assertEquals(
        """
          seed | 2 W   2 W leaving 'seed.out': linear 0°
          seed -> 100 mm -> w1.through | 1.852 W   1.852 W leaving 'w1.through': linear 0°
          seed -> 100 mm -> w1.through -> 50 mm -> qwp | 1.852 W   1.852 W leaving 'qwp.out': circular right%1$s
          seed -> 100 mm -> w1.through -> 50 mm -> qwp -> 80 mm -> m1 | 1.847 W   1.847 W leaving 'm1.out': \
        elliptical 45.15°, ellipticity -39.71°, left%1$s
          seed -> 100 mm -> w1.through -> 50 mm -> qwp -> 80 mm -> m1 -> 20 mm -> spot | 1.847 W   1.847 W \
        leaving 'spot.out': elliptical 45.15°, ellipticity -39.71°, left%1$s
          w1.reflected | 147.6 mW   147.6 mW leaving 'w1.reflected': linear 0°
          w1.reflected -> 30 mm -> d1 | 147.6 mW   147.6 mW arriving at 'd1': linear 0°
        """
            .formatted(rx),
        actual);
  }

  @Test
  void onlyHintsInsideTheRequestedRange() {
    Result r = Specs.check(Specs.BENCH).result();
    int branch = Specs.offsetOf(r, Specs.MAIN, "w1.reflected", 0);
    List<InlayHint> hints =
        EditorFeatures.standard()
            .inlayHints(r, Specs.MAIN, branch, branch + "w1.reflected -> 30 mm -> d1".length());
    assertEquals(2, hints.size());
    assertTrue(hints.stream().allMatch(h -> h.offset() >= branch));
    assertEquals(List.of(), EditorFeatures.standard().inlayHints(r, Specs.MAIN, 0, 10));
  }

  @Test
  void noHintsWithoutAnAnalysis() {
    Result r = Specs.check(Specs.BENCH.replace("power         2 W", "power         2 kg")).result();
    assertEquals(
        List.of(), EditorFeatures.standard().inlayHints(r, Specs.MAIN, 0, Integer.MAX_VALUE));
  }
}
