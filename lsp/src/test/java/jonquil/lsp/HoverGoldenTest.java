package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import jonquil.ide.EditorFeatures;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.MarkupKind;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Hover through the real server, at each kind of node, equals the golden Markdown the compiler's
 * HoverTest keeps (compiler/src/test/resources/ide/hover/): the same spec files, the same cursor,
 * and the hover's range converted back to the text it covers.
 */
class HoverGoldenTest {
  private static final Path IDE = ParityTest.REPO.resolve("compiler/src/test/resources/ide");

  /** A golden file, the spec it hovers in, and the cursor: before the n-th occurrence of a word. */
  private record Case(String golden, String spec, String word, int nth) {}

  private static final List<Case> CASES =
      List.of(
          new Case("element.md", "bench.jonq", "m1", 1),
          new Case("window.md", "bench.jonq", "w1", 0),
          new Case("waveplate.md", "bench.jonq", "qwp", 1),
          new Case("source.md", "bench.jonq", "seed", 0),
          new Case("material-declared.md", "bench.jonq", "slab_glass", 1),
          new Case("material-catalog.md", "bench.jonq", "silver", 0),
          new Case("quantity.md", "bench.jonq", "5 kW/cm2", 0),
          new Case("requirement.md", "bench.jonq", "power at spot >= 1.95", 0),
          new Case("interface.md", "interface.jonq", "$0", 0),
          new Case("source-lines.md", "lines.jonq", "duo", 1),
          new Case("element-lines.md", "lines.jonq", "dc", 1),
          new Case("port-lines.md", "lines.jonq", "through", 1),
          new Case("requirement-line.md", "lines.jonq", "power at spot", 0));

  @TempDir Path dir;

  @Test
  void hoverAtEachKindOfNodeEqualsItsGoldenMarkdown() throws Exception {
    Files.writeString(dir.resolve(".jonquil-root"), "");
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir, HoverFormatTest.hoverClient(MarkupKind.MARKDOWN));
      int version = 0;
      for (Case c : CASES) {
        String text = Files.readString(IDE.resolve(c.spec()));
        int at = -1;
        for (int i = 0; i <= c.nth(); i++) {
          at = text.indexOf(c.word(), at + 1);
        }
        text = text.replace("$0", "");
        Path file = dir.resolve("hover_" + (++version) + ".jonq");
        Files.writeString(file, text);
        String uri = file.toUri().toString();
        h.open(uri, 1, text);
        Position cursor = position(text, at);
        Hover hover =
            h.remote
                .getTextDocumentService()
                .hover(new HoverParams(new TextDocumentIdentifier(uri), cursor))
                .get(20, TimeUnit.SECONDS);
        assertNotNull(hover, c.golden());
        Range r = hover.getRange();
        String under = text.substring(offset(text, r.getStart()), offset(text, r.getEnd()));
        String got =
            "<!-- hover over '"
                + under.replaceAll("\\s+", " ")
                + "' -->\n\n"
                + hover.getContents().getRight().getValue()
                + "\n";
        assertEquals(Files.readString(IDE.resolve("hover").resolve(c.golden())), got, c.golden());
      }
    }
  }

  /** Line and UTF-16 column of an offset (the specs here are ASCII and LF). */
  private static Position position(String text, int offset) {
    int line = 0;
    int start = 0;
    for (int i = 0; i < offset; i++) {
      if (text.charAt(i) == '\n') {
        line++;
        start = i + 1;
      }
    }
    return new Position(line, offset - start);
  }

  private static int offset(String text, Position p) {
    int at = 0;
    for (int line = 0; line < p.getLine(); line++) {
      at = text.indexOf('\n', at) + 1;
    }
    return at + p.getCharacter();
  }
}
