package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import jonquil.Result;
import jonquil.ide.EditorFeatures;
import jonquil.ide.HoverInfo;
import jonquil.source.TextRange;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.DocumentSymbolParams;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.InitializeResult;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.TextDocumentSyncKind;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The server's protocol behaviour, exercised through a real LSP4J client over pipes. */
class ProtocolTest {
  static final String BROKEN = "mirror m1 { reflectance 101 % }\n";
  static final String VALID = "material glass = index 1.5\n";

  @TempDir Path dir;

  private String uriOf(String name, String text) throws Exception {
    Files.writeString(dir.resolve(".jonquil-root"), "");
    Path file = dir.resolve(name);
    Files.writeString(file, text);
    return file.toUri().toString();
  }

  private static ResponseErrorException responseError(ExecutionException e) {
    return assertInstanceOf(ResponseErrorException.class, e.getCause());
  }

  @Test
  void refusesRequestsBeforeInitializeThenAnnouncesItsCapabilities() throws Exception {
    try (LspHarness h = new LspHarness()) {
      ExecutionException early =
          org.junit.jupiter.api.Assertions.assertThrows(
              ExecutionException.class,
              () ->
                  h.remote
                      .getTextDocumentService()
                      .hover(
                          new HoverParams(
                              new TextDocumentIdentifier("file:///x.jonq"), new Position(0, 0)))
                      .get(10, TimeUnit.SECONDS));
      assertEquals(
          ResponseErrorCode.ServerNotInitialized.getValue(),
          responseError(early).getResponseError().getCode());

      InitializeResult init = h.initialize(dir);
      assertEquals("jonquil", init.getServerInfo().getName());
      assertNotNull(init.getServerInfo().getVersion());
      var caps = init.getCapabilities();
      assertEquals("utf-16", caps.getPositionEncoding());
      assertEquals(
          TextDocumentSyncKind.Incremental, caps.getTextDocumentSync().getRight().getChange());
      assertTrue(caps.getTextDocumentSync().getRight().getOpenClose());
      assertTrue(caps.getHoverProvider().getLeft());
      assertTrue(caps.getDefinitionProvider().getLeft());
      assertTrue(caps.getReferencesProvider().getLeft());
      assertNotNull(caps.getRenameProvider());
      assertTrue(caps.getDocumentSymbolProvider().getLeft());
      assertTrue(caps.getWorkspaceSymbolProvider().getLeft());
    }
  }

  @Test
  void brokenSpecIsReportedWithItsVersionAndClearedWhenFixedAndWhenClosed() throws Exception {
    String uri = uriOf("bench.jonq", BROKEN);
    try (LspHarness h = new LspHarness()) {
      h.initialize(dir);
      h.open(uri, 1, BROKEN);
      PublishDiagnosticsParams first = h.client.await(uri, p -> !p.getDiagnostics().isEmpty());
      assertEquals(1, first.getVersion());
      Diagnostic d = first.getDiagnostics().get(0);
      assertEquals("J405", d.getCode().getLeft());
      assertEquals("jonquil", d.getSource());
      assertEquals(new Range(new Position(0, 24), new Position(0, 29)), d.getRange());

      h.changeAll(uri, 2, VALID);
      PublishDiagnosticsParams fixed =
          h.client.await(uri, p -> Integer.valueOf(2).equals(p.getVersion()));
      assertEquals(List.of(), fixed.getDiagnostics());

      h.changeAll(uri, 3, BROKEN);
      h.client.await(
          uri, p -> Integer.valueOf(3).equals(p.getVersion()) && !p.getDiagnostics().isEmpty());
      int before = h.client.publishedFor(uri).size();
      h.close(uri);
      PublishDiagnosticsParams closed =
          h.client.await(
              uri,
              p -> p.getDiagnostics().isEmpty() && h.client.publishedFor(uri).indexOf(p) >= before);
      assertNull(closed.getVersion());
    }
  }

  @Test
  void rapidChangesEndWithTheLastVersionAndNeverGoBack() throws Exception {
    String uri = uriOf("typing.jonq", BROKEN);
    try (LspHarness h = new LspHarness()) {
      h.initialize(dir);
      h.open(uri, 1, BROKEN);
      for (int v = 2; v <= 21; v++) {
        h.changeAll(uri, v, v % 2 == 0 ? VALID : BROKEN);
      }
      PublishDiagnosticsParams last =
          h.client.await(uri, p -> Integer.valueOf(21).equals(p.getVersion()));
      assertFalse(last.getDiagnostics().isEmpty(), "version 21 is the broken text");
      Thread.sleep(2 * JonquilLanguageServer.DEBOUNCE.toMillis() + 200);
      List<PublishDiagnosticsParams> all = h.client.publishedFor(uri);
      assertEquals(21, all.get(all.size() - 1).getVersion());
      for (int i = 1; i < all.size(); i++) {
        assertTrue(all.get(i).getVersion() >= all.get(i - 1).getVersion(), "went back: " + all);
      }
    }
  }

  @Test
  void positionsAfterAnEmojiCountUtf16UnitsAndIncrementalEditsUseThem() throws Exception {
    String text = "use \"😀é\" x\n";
    String uri = uriOf("emoji.jonq", text);
    try (LspHarness h = new LspHarness()) {
      h.initialize(dir);
      h.open(uri, 1, text);
      PublishDiagnosticsParams p = h.client.await(uri, q -> q.getDiagnostics().size() == 2);
      Diagnostic unexpected = byCode(p, "J101");
      assertEquals(new Range(new Position(0, 10), new Position(0, 11)), unexpected.getRange());
      assertEquals(new Range(new Position(0, 4), new Position(0, 9)), byCode(p, "J203").getRange());

      // Delete the 'x' by its UTF-16 range: only the missing file is left.
      h.change(
          uri,
          2,
          new TextDocumentContentChangeEvent(
              new Range(new Position(0, 9), new Position(0, 11)), ""));
      PublishDiagnosticsParams after =
          h.client.await(uri, q -> Integer.valueOf(2).equals(q.getVersion()));
      assertEquals(
          List.of("J203"),
          after.getDiagnostics().stream().map(d -> d.getCode().getLeft()).toList());
    }
  }

  @Test
  void aClientPreferringUtf8GetsByteColumns() throws Exception {
    String text = "use \"😀é\" x\n";
    String uri = uriOf("emoji8.jonq", text);
    try (LspHarness h = new LspHarness()) {
      InitializeResult init = h.initialize(dir, "utf-8", "utf-16");
      assertEquals("utf-8", init.getCapabilities().getPositionEncoding());
      h.open(uri, 1, text);
      PublishDiagnosticsParams p = h.client.await(uri, q -> q.getDiagnostics().size() == 2);
      assertEquals(
          new Range(new Position(0, 13), new Position(0, 14)), byCode(p, "J101").getRange());
    }
  }

  @Test
  void crlfAndLfGiveTheSameRanges() throws Exception {
    String lf = "// a bench\nmirror m1 { reflectance 101 % }\nsplitter s { ratio 150 % }\n";
    String crlf = lf.replace("\n", "\r\n");
    String uriLf = uriOf("lf.jonq", lf);
    String uriCrlf = uriOf("crlf.jonq", crlf);
    try (LspHarness h = new LspHarness()) {
      h.initialize(dir);
      h.open(uriLf, 1, lf);
      h.open(uriCrlf, 1, crlf);
      List<Range> a =
          h.client.await(uriLf, p -> !p.getDiagnostics().isEmpty()).getDiagnostics().stream()
              .map(Diagnostic::getRange)
              .toList();
      List<Range> b =
          h.client.await(uriCrlf, p -> !p.getDiagnostics().isEmpty()).getDiagnostics().stream()
              .map(Diagnostic::getRange)
              .toList();
      assertEquals(a, b);
      assertEquals(1, a.get(0).getStart().getLine());
    }
  }

  @Test
  void differentSpellingsOfOneUriAreOneDocument() throws Exception {
    uriOf("[x].jonq", BROKEN);
    String upper = "file://" + dir.toAbsolutePath().toString().replace("\\", "/") + "/%5Bx%5D.jonq";
    String lower = upper.replace("%5B", "%5b").replace("%5D", "%5d");
    try (LspHarness h = new LspHarness()) {
      h.initialize(dir);
      h.open(upper, 1, BROKEN);
      h.client.await(upper, p -> !p.getDiagnostics().isEmpty());
      h.changeAll(lower, 2, VALID);
      PublishDiagnosticsParams fixed =
          h.client.await(upper, p -> Integer.valueOf(2).equals(p.getVersion()));
      assertEquals(List.of(), fixed.getDiagnostics());
      assertTrue(
          h.client.publishedFor(lower).isEmpty(),
          "published under the client's first spelling only");
    }
  }

  @Test
  void diagnosticsOfAUsedFileArePublishedToo() throws Exception {
    uriOf("lib.jonq", BROKEN);
    String libUri = dir.resolve("lib.jonq").toUri().toString();
    String main = "use \"lib.jonq\"\nprobe p\n";
    String uri = uriOf("main.jonq", main);
    try (LspHarness h = new LspHarness()) {
      h.initialize(dir);
      h.open(uri, 1, main);
      PublishDiagnosticsParams lib = h.client.await(libUri, p -> !p.getDiagnostics().isEmpty());
      assertNull(lib.getVersion(), "the used file is not open, so it has no version");
      assertEquals("J405", lib.getDiagnostics().get(0).getCode().getLeft());
    }
  }

  @Test
  void aFailingHandlerGivesInternalErrorAndTheServerKeepsAnswering() throws Exception {
    String uri = uriOf("hover.jonq", VALID);
    EditorFeatures throwing =
        new StandIn() {
          @Override
          public Optional<HoverInfo> hover(Result result, Path file, int offset) {
            throw new IllegalStateException("boom");
          }
        };
    try (LspHarness h = new LspHarness(throwing)) {
      h.initialize(dir);
      h.open(uri, 1, VALID);
      h.client.await(uri, p -> Integer.valueOf(1).equals(p.getVersion()));
      ExecutionException e =
          org.junit.jupiter.api.Assertions.assertThrows(
              ExecutionException.class,
              () ->
                  h.remote
                      .getTextDocumentService()
                      .hover(new HoverParams(new TextDocumentIdentifier(uri), new Position(0, 3)))
                      .get(10, TimeUnit.SECONDS));
      assertEquals(
          ResponseErrorCode.InternalError.getValue(),
          responseError(e).getResponseError().getCode());
      assertTrue(responseError(e).getResponseError().getMessage().contains("boom"));
      var symbols =
          h.remote
              .getTextDocumentService()
              .documentSymbol(new DocumentSymbolParams(new TextDocumentIdentifier(uri)))
              .get(10, TimeUnit.SECONDS);
      assertEquals(List.of(), symbols);
    }
  }

  @Test
  void hoverIsRelayedFromTheEditorAnswersInUtf16() throws Exception {
    String text = "// 😀\nmaterial glass = index 1.5\n";
    String uri = uriOf("h.jonq", text);
    int[] asked = new int[1];
    EditorFeatures answers =
        new StandIn() {
          @Override
          public Optional<HoverInfo> hover(Result result, Path file, int offset) {
            asked[0] = offset;
            return Optional.of(new HoverInfo("**glass**", TextRange.of(offset, offset + 5)));
          }
        };
    try (LspHarness h = new LspHarness(answers)) {
      h.initialize(dir);
      h.open(uri, 1, text);
      var hover =
          h.remote
              .getTextDocumentService()
              .hover(new HoverParams(new TextDocumentIdentifier(uri), new Position(1, 9)))
              .get(10, TimeUnit.SECONDS);
      assertEquals(text.indexOf("glass"), asked[0]);
      // This client names no hover contentFormat, so it gets plain text: the Markdown marks are
      // stripped.
      assertEquals("plaintext", hover.getContents().getRight().getKind());
      assertEquals("glass", hover.getContents().getRight().getValue());
      assertEquals(new Range(new Position(1, 9), new Position(1, 14)), hover.getRange());
    }
  }

  @Test
  void shutdownThenExitEndsWithZero() throws Exception {
    try (LspHarness h = new LspHarness()) {
      h.initialize(dir);
      h.remote.shutdown().get(10, TimeUnit.SECONDS);
      h.remote.exit();
      assertEquals(0, h.server.exitCode().get(10, TimeUnit.SECONDS));
    }
  }

  @Test
  void exitWithoutShutdownEndsWithOne() throws Exception {
    try (LspHarness h = new LspHarness()) {
      h.initialize(dir);
      h.remote.exit();
      assertEquals(1, h.server.exitCode().get(10, TimeUnit.SECONDS));
    }
  }

  private static Diagnostic byCode(PublishDiagnosticsParams p, String code) {
    return p.getDiagnostics().stream()
        .filter(d -> code.equals(d.getCode().getLeft()))
        .findFirst()
        .orElseThrow(() -> new AssertionError("no " + code + " in " + p));
  }
}
