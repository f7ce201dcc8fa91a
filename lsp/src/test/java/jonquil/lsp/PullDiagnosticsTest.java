package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.DiagnosticCapabilities;
import org.eclipse.lsp4j.DocumentDiagnosticParams;
import org.eclipse.lsp4j.DocumentDiagnosticReport;
import org.eclipse.lsp4j.InitializeResult;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.RelatedFullDocumentDiagnosticReport;
import org.eclipse.lsp4j.TextDocumentClientCapabilities;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Pull diagnostics for clients that advertise textDocument.diagnostic (full, then unchanged, never
 * pushed); push for the others.
 */
class PullDiagnosticsTest {
  static final String BROKEN = ProtocolTest.BROKEN;
  static final String VALID = ProtocolTest.VALID;

  @TempDir Path dir;

  private String write(String name, String text) throws Exception {
    Files.writeString(dir.resolve(".jonquil-root"), "");
    Path file = dir.resolve(name).toAbsolutePath().normalize();
    Files.writeString(file, text);
    return file.toUri().toString();
  }

  private static ClientCapabilities pullClient() {
    ClientCapabilities caps = new ClientCapabilities();
    TextDocumentClientCapabilities text = new TextDocumentClientCapabilities();
    text.setDiagnostic(new DiagnosticCapabilities(false, false));
    caps.setTextDocument(text);
    return caps;
  }

  private static DocumentDiagnosticReport pull(LspHarness h, String uri, String previous)
      throws Exception {
    DocumentDiagnosticParams params = new DocumentDiagnosticParams(new TextDocumentIdentifier(uri));
    params.setPreviousResultId(previous);
    return h.remote.getTextDocumentService().diagnostic(params).get(20, TimeUnit.SECONDS);
  }

  @Test
  void aPullingClientGetsFullThenUnchangedAndNoPushForTheDocument() throws Exception {
    String uri = write("pulled.jonq", BROKEN);
    try (LspHarness h = new LspHarness()) {
      InitializeResult init = h.initialize(dir, pullClient());
      assertNotNull(
          init.getCapabilities().getDiagnosticProvider(), "the diagnostic provider is advertised");
      assertTrue(init.getCapabilities().getDiagnosticProvider().isInterFileDependencies());
      assertFalse(init.getCapabilities().getDiagnosticProvider().isWorkspaceDiagnostics());

      h.open(uri, 1, BROKEN);
      DocumentDiagnosticReport first = pull(h, uri, null);
      assertTrue(first.isLeft(), "a first pull is a full report: " + first);
      RelatedFullDocumentDiagnosticReport full = first.getLeft();
      assertNotNull(full.getResultId());
      assertEquals(1, full.getItems().size());
      assertEquals("J405", full.getItems().get(0).getCode().getLeft());
      assertEquals(
          new Range(new Position(0, 24), new Position(0, 29)), full.getItems().get(0).getRange());

      DocumentDiagnosticReport again = pull(h, uri, full.getResultId());
      assertTrue(again.isRight(), "the same result id gives unchanged: " + again);
      assertEquals(full.getResultId(), again.getRight().getResultId());

      h.changeAll(uri, 2, VALID);
      DocumentDiagnosticReport fixed = pull(h, uri, full.getResultId());
      assertTrue(fixed.isLeft(), "a new version gives a full report: " + fixed);
      assertEquals(List.of(), fixed.getLeft().getItems());
      assertNotEquals(full.getResultId(), fixed.getLeft().getResultId());

      h.close(uri);
      Thread.sleep(2 * JonquilLanguageServer.DEBOUNCE.toMillis() + 300);
      assertEquals(List.of(), h.client.publishedFor(uri), "nothing pushed for a pulled document");
    }
  }

  @Test
  void aClientWithoutPullKeepsPushAndIsOfferedNoProvider() throws Exception {
    String uri = write("pushed.jonq", BROKEN);
    try (LspHarness h = new LspHarness()) {
      InitializeResult init = h.initialize(dir);
      assertNull(init.getCapabilities().getDiagnosticProvider());
      h.open(uri, 1, BROKEN);
      var pushed = h.client.await(uri, p -> Integer.valueOf(1).equals(p.getVersion()));
      assertEquals("J405", pushed.getDiagnostics().get(0).getCode().getLeft());
    }
  }
}
