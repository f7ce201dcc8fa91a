package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import jonquil.ide.EditorFeatures;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.HoverCapabilities;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.MarkupKind;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.TextDocumentClientCapabilities;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Hover honours the client's contentFormat: Markdown when it takes Markdown, plain text (Markdown
 * stripped) otherwise.
 */
class HoverFormatTest {
  @TempDir Path dir;

  /** A client whose hover takes these formats, in order of preference. */
  static ClientCapabilities hoverClient(String... formats) {
    ClientCapabilities caps = new ClientCapabilities();
    TextDocumentClientCapabilities text = new TextDocumentClientCapabilities();
    HoverCapabilities hover = new HoverCapabilities(false);
    hover.setContentFormat(List.of(formats));
    text.setHover(hover);
    caps.setTextDocument(text);
    return caps;
  }

  private Hover hoverOnMirror(ClientCapabilities caps) throws Exception {
    Files.writeString(dir.resolve(".jonquil-root"), "");
    Path file = dir.resolve("bench.jonq").toAbsolutePath().normalize();
    Files.writeString(file, EditorFeaturesTest.CLEAN);
    String uri = file.toUri().toString();
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir, caps);
      h.open(uri, 1, EditorFeaturesTest.CLEAN);
      h.client.await(uri, p -> Integer.valueOf(1).equals(p.getVersion()));
      int line = 2; // "mirror m1 { ... }"
      return h.remote
          .getTextDocumentService()
          .hover(new HoverParams(new TextDocumentIdentifier(uri), new Position(line, 8)))
          .get(20, TimeUnit.SECONDS);
    }
  }

  @Test
  void markdownWhenTheClientTakesIt() throws Exception {
    Hover hover = hoverOnMirror(hoverClient(MarkupKind.MARKDOWN, MarkupKind.PLAINTEXT));
    assertNotNull(hover);
    assertEquals(MarkupKind.MARKDOWN, hover.getContents().getRight().getKind());
    String value = hover.getContents().getRight().getValue();
    assertTrue(value.contains("**mirror** `m1`"), value);
    assertTrue(value.contains("|---|"), value);
  }

  @Test
  void plainTextWhenTheClientTakesOnlyPlainTextOrSaysNothing() throws Exception {
    for (ClientCapabilities caps :
        List.of(hoverClient(MarkupKind.PLAINTEXT), new ClientCapabilities())) {
      Hover hover = hoverOnMirror(caps);
      assertNotNull(hover);
      assertEquals(MarkupKind.PLAINTEXT, hover.getContents().getRight().getKind());
      String value = hover.getContents().getRight().getValue();
      assertTrue(value.startsWith("mirror m1"), value);
      for (String mark : List.of("**", "`", "|---", "```")) {
        assertFalse(value.contains(mark), "'" + mark + "' left in: " + value);
      }
      assertTrue(value.contains("metal silver"), "the fenced excerpt stays as text: " + value);
    }
  }

  @Test
  void strippingKeepsTheWordsAndTheTableCells() {
    String md =
        "## Title\n\n"
            + "**mirror** `m_1` — see [docs](https://x.test)\n\n"
            + "```jonquil\n"
            + "aoi 45 deg\n"
            + "```\n\n"
            + "| | power |\n"
            + "|---|---|\n"
            + "| in `out` | 1 W \\| 2 W |\n";
    assertEquals(
        "Title\n\n"
            + "mirror m_1 — see docs (https://x.test)\n\n"
            + "aoi 45 deg\n\n"
            + "| power\n"
            + "in out | 1 W | 2 W",
        PlainMarkdown.strip(md));
  }
}
