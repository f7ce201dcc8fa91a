package jonquil.ide;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import jonquil.Result;
import org.junit.jupiter.api.Test;

/**
 * Folding ranges cover multi-line blocks and comments; document links point at the files a spec
 * names.
 */
class FoldingAndLinksTest {
  private static String render(String text, List<FoldingRangeInfo> ranges) {
    StringBuilder out = new StringBuilder();
    for (FoldingRangeInfo f : ranges) {
      String span = text.substring(f.startOffset(), f.endOffset());
      String first = span.lines().findFirst().orElse("");
      String last = span.lines().reduce((a, b) -> b).orElse("");
      out.append(f.kind())
          .append(": ")
          .append(first)
          .append(" ... ")
          .append(last.strip())
          .append('\n');
    }
    return out.toString();
  }

  @Test
  void blocksAndCommentsThatSpanLinesFold() {
    String spec =
        """
        // bench notes
        // second line
        source seed {
          wavelength 1064 nm
          power 2 W
        }
        probe spot   // alone: no fold
        lens l1 { focal 50 mm }
        /* a block
           comment */
        train main {
          seed -> 10 mm -> l1 -> 40 mm -> spot
        }
        require {
          power at spot >= 1 W
        }
        """;
    Result r = Specs.check(spec).result();
    assertEquals(
        """
        comment: // bench notes ... // second line
        region: source seed { ... }
        comment: /* a block ... comment */
        region: train main { ... }
        region: require { ... }
        """,
        render(spec, EditorFeatures.standard().foldingRanges(r, Specs.MAIN)));
  }

  @Test
  void linksForUseAndTableStringsThatNameExistingFiles() {
    String main =
        """
        use "parts/optics.jonq"
        use "parts/missing.jonq"
        material glass { table "data/glass.nk" }
        material other { table "data/none.nk" }
        source seed { wavelength 532 nm; power 10 mW }
        dump d1
        train main { seed -> 10 mm in glass -> d1 }
        """;
    Specs.Checked c =
        Specs.check(
            Map.of(
                "main.jonq",
                main,
                "parts/optics.jonq",
                "probe spare\n",
                "data/glass.nk",
                "500 nm 1.5 0\n600 nm 1.49 0\n"));
    Result r = c.result();
    List<DocumentLinkInfo> links = EditorFeatures.standard().documentLinks(r, Specs.MAIN);
    assertEquals(
        List.of("parts/optics.jonq", "data/glass.nk"),
        links.stream().map(l -> main.substring(l.range().start(), l.range().end())).toList());
    assertEquals(
        List.of(Specs.ROOT.resolve("parts/optics.jonq"), Specs.ROOT.resolve("data/glass.nk")),
        links.stream().map(DocumentLinkInfo::target).toList());
  }
}
