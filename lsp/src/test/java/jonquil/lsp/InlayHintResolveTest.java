package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonPrimitive;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import jonquil.ide.EditorFeatures;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.InlayHint;
import org.eclipse.lsp4j.InlayHintCapabilities;
import org.eclipse.lsp4j.InlayHintParams;
import org.eclipse.lsp4j.InlayHintResolveSupportCapabilities;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.ServerCapabilities;
import org.eclipse.lsp4j.TextDocumentClientCapabilities;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * inlayHint/resolve: a client that can resolve tooltips lazily gets hints without them and the
 * tooltip on resolve, the same text a client without that capability gets inline; a hint whose
 * document has changed or closed since comes back unchanged, never as an error.
 */
class InlayHintResolveTest {
  private static final long SECONDS = 20;
  static final String BENCH =
      """
      source seed { wavelength 532 nm; power 10 mW }
      splitter bs { ratio 50 % }
      dump d1
      dump d2
      train main {
        seed -> 10 mm -> bs.through -> 20 mm -> d1
        bs.reflected -> 30 mm -> d2
      }
      """;
  static final Range ALL = new Range(new Position(0, 0), new Position(9, 0));

  @TempDir Path dir;

  private String write(String text) throws Exception {
    Files.writeString(dir.resolve(".jonquil-root"), "");
    Path file = dir.resolve("hints.jonq");
    Files.writeString(file, text);
    return file.toAbsolutePath().normalize().toUri().toString();
  }

  /** A client that resolves these inlay hint properties lazily. */
  static ClientCapabilities resolvingClient(String... properties) {
    ClientCapabilities caps = new ClientCapabilities();
    TextDocumentClientCapabilities text = new TextDocumentClientCapabilities();
    InlayHintCapabilities hints = new InlayHintCapabilities(false);
    hints.setResolveSupport(new InlayHintResolveSupportCapabilities(List.of(properties)));
    text.setInlayHint(hints);
    caps.setTextDocument(text);
    return caps;
  }

  private static List<InlayHint> hints(LspHarness h, String uri) throws Exception {
    return h.remote
        .getTextDocumentService()
        .inlayHint(new InlayHintParams(new TextDocumentIdentifier(uri), ALL))
        .get(SECONDS, TimeUnit.SECONDS);
  }

  private static InlayHint resolve(LspHarness h, InlayHint hint) throws Exception {
    return h.remote.getTextDocumentService().resolveInlayHint(hint).get(SECONDS, TimeUnit.SECONDS);
  }

  private static void assertNoErrorResponse(LspHarness h) {
    synchronized (h.responses) {
      assertEquals(
          List.of(),
          h.responses.stream().filter(r -> r.getError() != null).toList(),
          "no error response");
    }
  }

  /**
   * The hints a client without lazy tooltips gets for the text: each with its tooltip inline, and
   * no data.
   */
  private List<InlayHint> inlineHints(String uri, String text) throws Exception {
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      ServerCapabilities caps = h.initialize(dir, new ClientCapabilities()).getCapabilities();
      assertTrue(
          caps.getInlayHintProvider().getRight().getResolveProvider(),
          "resolve is offered to every client");
      h.open(uri, 1, text);
      List<InlayHint> out = hints(h, uri);
      for (InlayHint hint : out) {
        assertNotNull(hint.getTooltip(), "inline tooltip: " + hint);
        assertNull(hint.getData(), "nothing to resolve: " + hint);
        assertEquals(hint, resolve(h, hint), "resolving a complete hint changes nothing");
      }
      assertNoErrorResponse(h);
      return out;
    }
  }

  @Test
  void aResolvingClientGetsTheTooltipOnResolveAndOthersGetItInline() throws Exception {
    String uri = write(BENCH);
    List<InlayHint> inline = inlineHints(uri, BENCH);
    assertEquals(5, inline.size());
    assertTrue(
        inline.get(0).getTooltip().getLeft().startsWith("10 mW leaving 'seed.out'"),
        inline.get(0).toString());

    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      ServerCapabilities caps = h.initialize(dir, resolvingClient("tooltip")).getCapabilities();
      assertTrue(caps.getInlayHintProvider().getRight().getResolveProvider());
      h.open(uri, 1, BENCH);
      List<InlayHint> lazy = hints(h, uri);
      assertEquals(
          inline.stream().map(InlayHint::getPosition).toList(),
          lazy.stream().map(InlayHint::getPosition).toList());
      assertEquals(
          inline.stream().map(InlayHint::getLabel).toList(),
          lazy.stream().map(InlayHint::getLabel).toList());
      List<InlayHint> resolved = new ArrayList<>();
      for (InlayHint hint : lazy) {
        assertNull(hint.getTooltip(), "the tooltip waits for resolve: " + hint);
        assertNotNull(hint.getData(), "the hint says where to resolve it from: " + hint);
        resolved.add(resolve(h, hint));
      }
      for (int i = 0; i < inline.size(); i++) {
        assertEquals(
            inline.get(i).getTooltip(), resolved.get(i).getTooltip(), "tooltip of hint " + i);
        assertEquals(inline.get(i).getPosition(), resolved.get(i).getPosition());
        assertEquals(inline.get(i).getLabel(), resolved.get(i).getLabel());
      }
      assertNoErrorResponse(h);
    }
  }

  @Test
  void aClientResolvingOtherPropertiesOnlyGetsTooltipsInline() throws Exception {
    String uri = write(BENCH);
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir, resolvingClient("label.location", "textEdits"));
      h.open(uri, 1, BENCH);
      for (InlayHint hint : hints(h, uri)) {
        assertNotNull(hint.getTooltip(), hint.toString());
        assertNull(hint.getData(), hint.toString());
      }
    }
  }

  @Test
  void aHintWhoseDocumentChangedOrClosedResolvesToItselfWithoutError() throws Exception {
    String uri = write(BENCH);
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir, resolvingClient("tooltip"));
      h.open(uri, 1, BENCH);
      InlayHint first = hints(h, uri).get(0);

      String stronger = BENCH.replace("power 10 mW", "power 20 mW");
      h.changeAll(uri, 2, stronger);
      h.client.await(uri, p -> Integer.valueOf(2).equals(p.getVersion()));
      assertEquals(first, resolve(h, first), "a hint of version 1 after the change to version 2");
      InlayHint now = hints(h, uri).get(0);
      assertEquals(" 20 mW", now.getLabel().getLeft());
      assertTrue(resolve(h, now).getTooltip().getLeft().startsWith("20 mW leaving 'seed.out'"));

      // The same text again under a new version: the hint names a version the document no longer
      // has.
      h.changeAll(uri, 3, stronger);
      assertEquals(now, resolve(h, now), "a hint of version 2 after version 3");
      InlayHint third = hints(h, uri).get(0);

      h.close(uri);
      assertEquals(third, resolve(h, third), "a hint of a closed document");

      InlayHint foreign =
          new InlayHint(
              new Position(0, 0), org.eclipse.lsp4j.jsonrpc.messages.Either.forLeft(" x"));
      foreign.setData(new JsonPrimitive("not ours"));
      assertEquals(foreign, resolve(h, foreign), "a hint with someone else's data");
      InlayHint bare =
          new InlayHint(
              new Position(0, 0), org.eclipse.lsp4j.jsonrpc.messages.Either.forLeft(" y"));
      assertEquals(bare, resolve(h, bare), "a hint without data");
      assertNoErrorResponse(h);
    }
  }
}
