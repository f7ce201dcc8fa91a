package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import jonquil.ide.EditorFeatures;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.DefinitionCapabilities;
import org.eclipse.lsp4j.DefinitionParams;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.LocationLink;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextDocumentClientCapabilities;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Go to definition into a used file that is not open: a LocationLink only for clients that take
 * links, else a Location.
 */
class DefinitionTest {
  static final String LIB = "mirror m1 { metal silver; aoi 45 deg }\n";
  static final String MAIN =
      """
      use "lib.jonq"
      source seed { wavelength 1064 nm; power 2 W }
      probe spot
      train main {
        seed -> 100 mm -> m1 -> 20 mm -> spot
      }
      """;

  /** Where 'm1' is in MAIN: line 4, UTF-16 columns 20 to 22. */
  static final Range ORIGIN = new Range(new Position(4, 20), new Position(4, 22));

  static final Range TARGET = new Range(new Position(0, 7), new Position(0, 9));

  @TempDir Path dir;

  private String libUri;
  private String mainUri;

  private void write() throws Exception {
    Files.writeString(dir.resolve(".jonquil-root"), "");
    Path lib = dir.resolve("lib.jonq").toAbsolutePath().normalize();
    Path main = dir.resolve("main.jonq").toAbsolutePath().normalize();
    Files.writeString(lib, LIB);
    Files.writeString(main, MAIN);
    libUri = lib.toUri().toString();
    mainUri = main.toUri().toString();
  }

  private static ClientCapabilities linkClient(boolean links) {
    ClientCapabilities caps = new ClientCapabilities();
    TextDocumentClientCapabilities text = new TextDocumentClientCapabilities();
    DefinitionCapabilities definition = new DefinitionCapabilities(false);
    definition.setLinkSupport(links);
    text.setDefinition(definition);
    caps.setTextDocument(text);
    return caps;
  }

  private Either<List<? extends Location>, List<? extends LocationLink>> definition(
      LspHarness h, Position at) throws Exception {
    return h.remote
        .getTextDocumentService()
        .definition(new DefinitionParams(new TextDocumentIdentifier(mainUri), at))
        .get(20, TimeUnit.SECONDS);
  }

  @Test
  void aClientWithLinkSupportGetsLinksWithTheNameUnderTheCursor() throws Exception {
    write();
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir, linkClient(true));
      h.open(mainUri, 1, MAIN);
      h.client.await(mainUri, p -> Integer.valueOf(1).equals(p.getVersion()));

      var answer = definition(h, new Position(4, 21));
      assertTrue(answer.isRight(), "links for a client with linkSupport: " + answer);
      assertEquals(1, answer.getRight().size());
      LocationLink link = answer.getRight().get(0);
      assertEquals(libUri, link.getTargetUri());
      assertEquals(TARGET, link.getTargetRange());
      assertEquals(TARGET, link.getTargetSelectionRange());
      assertEquals(ORIGIN, link.getOriginSelectionRange());

      // On the 'use' path there is no name: the link goes to the file, with no origin range.
      var use = definition(h, new Position(0, 7));
      assertTrue(use.isRight());
      assertEquals(1, use.getRight().size());
      assertEquals(libUri, use.getRight().get(0).getTargetUri());
      assertNull(use.getRight().get(0).getOriginSelectionRange());
    }
  }

  @Test
  void aClientWithoutLinkSupportGetsLocations() throws Exception {
    write();
    for (ClientCapabilities caps : List.of(new ClientCapabilities(), linkClient(false))) {
      try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
        h.initialize(dir, caps);
        h.open(mainUri, 1, MAIN);
        h.client.await(mainUri, p -> Integer.valueOf(1).equals(p.getVersion()));
        var answer = definition(h, new Position(4, 21));
        assertTrue(answer.isLeft(), "plain locations without linkSupport: " + answer);
        assertEquals(List.of(new Location(libUri, TARGET)), answer.getLeft());
      }
    }
  }
}
