package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import jonquil.ide.EditorFeatures;
import jonquil.source.ProjectRoot;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.CodeAction;
import org.eclipse.lsp4j.CodeActionCapabilities;
import org.eclipse.lsp4j.CodeActionContext;
import org.eclipse.lsp4j.CodeActionKind;
import org.eclipse.lsp4j.CodeActionKindCapabilities;
import org.eclipse.lsp4j.CodeActionLiteralSupportCapabilities;
import org.eclipse.lsp4j.CodeActionParams;
import org.eclipse.lsp4j.CompletionParams;
import org.eclipse.lsp4j.DefinitionParams;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.DiagnosticSeverity;
import org.eclipse.lsp4j.DocumentDiagnosticParams;
import org.eclipse.lsp4j.DocumentFormattingParams;
import org.eclipse.lsp4j.DocumentLinkParams;
import org.eclipse.lsp4j.DocumentRangeFormattingParams;
import org.eclipse.lsp4j.DocumentSymbolParams;
import org.eclipse.lsp4j.FoldingRangeRequestParams;
import org.eclipse.lsp4j.FormattingOptions;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.InlayHintParams;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.PrepareRenameParams;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.ReferenceContext;
import org.eclipse.lsp4j.ReferenceParams;
import org.eclipse.lsp4j.RenameParams;
import org.eclipse.lsp4j.SemanticTokensParams;
import org.eclipse.lsp4j.TextDocumentClientCapabilities;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.WorkspaceEdit;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Files outside every workspace folder. One the client opens is served like any other, checked
 * under its own project root; the files it uses are served read-only: the server answers about them
 * but proposes no edit (rename, code action, formatting) to a file that is neither open in the
 * editor nor under a workspace folder. A URI that names no file gets empty answers.
 */
class OutsideRootsTest {
  private static final long SECONDS = 20;

  /** Used through '..': only a root above 'benches' (the '.jonquil-root' marker) lets it in. */
  static final String BENCH =
      """
      use "../parts/parts.jonq"
      source seed { wavelength 1064 nm; power 2 W }
      probe spot
      train main {
        seed -> 100 mm -> fold -> 20 mm -> spot
      }
      """;

  /** 'spare' has a misspelled parameter, whose diagnostic carries a quick fix. */
  static final String PARTS =
      """
      mirror fold { metal silver; aoi 45 deg }
      mirror spare { metl silver; aoi 45 deg }
      """;

  static final Position ON_FOLD = new Position(4, 21);
  static final Range FOLD_USE = new Range(new Position(4, 20), new Position(4, 24));
  static final Range FOLD_DECLARATION = new Range(new Position(0, 7), new Position(0, 11));
  static final Position ON_SPOT = new Position(2, 7);

  @TempDir Path dir;

  private Path folder;
  private String benchUri;
  private String partsUri;

  private void write() throws Exception {
    folder = Files.createDirectories(dir.resolve("ws")).toAbsolutePath().normalize();
    Files.writeString(folder.resolve("inside.jonq"), "probe p\n");
    Path outside = Files.createDirectories(dir.resolve("outside")).toAbsolutePath().normalize();
    Files.writeString(outside.resolve(ProjectRoot.MARKER), "");
    Path bench = Files.createDirectories(outside.resolve("benches")).resolve("bench.jonq");
    Path parts = Files.createDirectories(outside.resolve("parts")).resolve("parts.jonq");
    Files.writeString(bench, BENCH);
    Files.writeString(parts, PARTS);
    benchUri = bench.toUri().toString();
    partsUri = parts.toUri().toString();
  }

  /** A client that takes literal code actions, so that quick fixes are offered to it at all. */
  static ClientCapabilities fixingClient() {
    ClientCapabilities caps = new ClientCapabilities();
    TextDocumentClientCapabilities text = new TextDocumentClientCapabilities();
    text.setCodeAction(
        new CodeActionCapabilities(
            new CodeActionLiteralSupportCapabilities(
                new CodeActionKindCapabilities(List.of(CodeActionKind.QuickFix))),
            false));
    caps.setTextDocument(text);
    return caps;
  }

  private LspHarness openBench() throws Exception {
    write();
    LspHarness h = new LspHarness(EditorFeatures.standard());
    h.initialize(List.of(folder), fixingClient());
    h.open(benchUri, 1, BENCH);
    return h;
  }

  private static <T> T get(CompletableFuture<T> future) throws Exception {
    return future.get(SECONDS, TimeUnit.SECONDS);
  }

  private static ResponseErrorException refusal(CompletableFuture<?> future) throws Exception {
    try {
      Object answer = get(future);
      throw new AssertionError("expected a refusal, got " + answer);
    } catch (ExecutionException e) {
      return assertInstanceOf(ResponseErrorException.class, e.getCause());
    }
  }

  /** The files a workspace edit touches, by URI. */
  private static Set<String> touched(WorkspaceEdit edit) {
    Set<String> out =
        new TreeSet<>(edit.getChanges() == null ? Set.of() : edit.getChanges().keySet());
    if (edit.getDocumentChanges() != null) {
      edit.getDocumentChanges().forEach(c -> out.add(c.getLeft().getTextDocument().getUri()));
    }
    return out;
  }

  private static List<CodeAction> fixes(LspHarness h, String uri, Diagnostic d) throws Exception {
    return get(
            h.remote
                .getTextDocumentService()
                .codeAction(
                    new CodeActionParams(
                        new TextDocumentIdentifier(uri),
                        d.getRange(),
                        new CodeActionContext(List.of(d)))))
        .stream()
        .map(e -> e.getRight())
        .toList();
  }

  @Test
  void anOpenFileOutsideEveryFolderIsServedUnderItsOwnRootAndSoAreTheFilesItUses()
      throws Exception {
    try (LspHarness h = openBench()) {
      var service = h.remote.getTextDocumentService();
      PublishDiagnosticsParams bench =
          h.client.await(benchUri, p -> Integer.valueOf(1).equals(p.getVersion()));
      assertEquals(
          List.of(),
          bench.getDiagnostics(),
          "the 'use' through '..' stays inside the marker's root");
      PublishDiagnosticsParams parts = h.client.await(partsUri, p -> !p.getDiagnostics().isEmpty());
      assertTrue(
          parts.getDiagnostics().stream().anyMatch(d -> "J401".equals(d.getCode().getLeft())),
          parts.toString());

      Hover hover =
          get(service.hover(new HoverParams(new TextDocumentIdentifier(benchUri), ON_FOLD)));
      assertNotNull(hover);
      assertTrue(hover.getContents().getRight().getValue().contains("fold"), hover.toString());
      assertEquals(FOLD_USE, hover.getRange());
      var definition =
          get(
              service.definition(
                  new DefinitionParams(new TextDocumentIdentifier(benchUri), ON_FOLD)));
      assertEquals(List.of(new Location(partsUri, FOLD_DECLARATION)), definition.getLeft());
      var symbols =
          get(
              service.documentSymbol(
                  new DocumentSymbolParams(new TextDocumentIdentifier(benchUri))));
      assertTrue(
          symbols.stream()
              .map(s -> s.getLeft().getName())
              .toList()
              .containsAll(List.of("seed", "spot", "main")),
          symbols.toString());

      // After a jump into the unopened library, it answers too (read-only is not dark).
      Hover there =
          get(
              service.hover(
                  new HoverParams(new TextDocumentIdentifier(partsUri), new Position(0, 8))));
      assertNotNull(there, "hover in the unopened library");
      var partSymbols =
          get(
              service.documentSymbol(
                  new DocumentSymbolParams(new TextDocumentIdentifier(partsUri))));
      assertTrue(
          partSymbols.stream()
              .map(s -> s.getLeft().getName())
              .toList()
              .containsAll(List.of("fold", "spare")),
          partSymbols.toString());
      var references =
          get(
              service.references(
                  new ReferenceParams(
                      new TextDocumentIdentifier(partsUri),
                      new Position(0, 8),
                      new ReferenceContext(true))));
      assertEquals(
          Set.of(new Location(partsUri, FOLD_DECLARATION), new Location(benchUri, FOLD_USE)),
          Set.copyOf(references));
    }
  }

  @Test
  void noEditIsProposedToAFileNeitherOpenNorInAFolder() throws Exception {
    try (LspHarness h = openBench()) {
      var service = h.remote.getTextDocumentService();
      h.client.await(benchUri, p -> Integer.valueOf(1).equals(p.getVersion()));
      Diagnostic typo =
          h.client.await(partsUri, p -> !p.getDiagnostics().isEmpty()).getDiagnostics().stream()
              .filter(d -> "J401".equals(d.getCode().getLeft()))
              .findFirst()
              .orElseThrow();
      TextDocumentIdentifier bench = new TextDocumentIdentifier(benchUri);
      TextDocumentIdentifier parts = new TextDocumentIdentifier(partsUri);

      // 'fold' is declared in the read-only library: renaming it there is refused, with the reason.
      ResponseErrorException refused =
          refusal(service.rename(new RenameParams(bench, ON_FOLD, "turn")));
      assertEquals(
          ResponseErrorCode.RequestFailed.getValue(), refused.getResponseError().getCode());
      assertTrue(
          refused.getResponseError().getMessage().contains("parts.jonq"), refused.getMessage());
      ResponseErrorException prepared =
          refusal(service.prepareRename(new PrepareRenameParams(bench, ON_FOLD)));
      assertEquals(
          ResponseErrorCode.RequestFailed.getValue(), prepared.getResponseError().getCode());
      // 'spot' lives in the open file only: renaming it is an edit of that file alone.
      WorkspaceEdit spot = get(service.rename(new RenameParams(bench, ON_SPOT, "camera")));
      assertEquals(Set.of(benchUri), touched(spot));
      // The library's quick fix and formatting would edit it: nothing is offered.
      assertEquals(List.of(), fixes(h, partsUri, typo));
      FormattingOptions options = new FormattingOptions(2, true);
      assertEquals(
          List.of(), get(service.formatting(new DocumentFormattingParams(parts, options))));
      assertEquals(
          List.of(),
          get(
              service.rangeFormatting(
                  new DocumentRangeFormattingParams(
                      parts, options, new Range(new Position(0, 0), new Position(2, 0))))));

      // Opened in the editor, the library takes edits like any open file.
      h.open(partsUri, 1, PARTS);
      h.client.await(partsUri, p -> Integer.valueOf(1).equals(p.getVersion()));
      WorkspaceEdit fold = get(service.rename(new RenameParams(bench, ON_FOLD, "turn")));
      assertEquals(
          Map.of(
              benchUri,
              List.of(new TextEdit(FOLD_USE, "turn")),
              partsUri,
              List.of(new TextEdit(FOLD_DECLARATION, "turn"))),
          fold.getChanges());
      assertEquals(
          List.of("change 'metl' to 'metal'"),
          fixes(h, partsUri, typo).stream().map(CodeAction::getTitle).toList());
    }
  }

  @Test
  void anUnopenedFileUnderAWorkspaceFolderStillTakesEdits() throws Exception {
    write();
    Files.writeString(folder.resolve("lib.jonq"), PARTS);
    Path main = folder.resolve("main.jonq");
    String text = BENCH.replace("../parts/parts.jonq", "lib.jonq");
    Files.writeString(main, text);
    String mainUri = main.toUri().toString();
    String libUri = folder.resolve("lib.jonq").toUri().toString();
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(List.of(folder), fixingClient());
      h.open(mainUri, 1, text);
      h.client.await(mainUri, p -> Integer.valueOf(1).equals(p.getVersion()));
      WorkspaceEdit fold =
          get(
              h.remote
                  .getTextDocumentService()
                  .rename(new RenameParams(new TextDocumentIdentifier(mainUri), ON_FOLD, "turn")));
      assertEquals(Set.of(mainUri, libUri), touched(fold));
      Diagnostic typo =
          h.client.await(libUri, p -> !p.getDiagnostics().isEmpty()).getDiagnostics().stream()
              .filter(d -> "J401".equals(d.getCode().getLeft()))
              .findFirst()
              .orElseThrow();
      assertEquals(
          List.of("change 'metl' to 'metal'"),
          fixes(h, libUri, typo).stream().map(CodeAction::getTitle).toList());
    }
  }

  @Test
  void aUriThatNamesNoFileGetsEmptyAnswersAndTheServerCarriesOn() throws Exception {
    try (LspHarness h = openBench()) {
      var service = h.remote.getTextDocumentService();
      h.client.await(benchUri, p -> Integer.valueOf(1).equals(p.getVersion()));
      for (String uri : List.of("untitled:Untitled-1", "file:///broken%zz.jonq")) {
        h.open(uri, 1, BENCH);
        h.changeAll(uri, 2, BENCH + "probe extra\n");
        TextDocumentIdentifier doc = new TextDocumentIdentifier(uri);
        Range all = new Range(new Position(0, 0), new Position(6, 0));
        FormattingOptions options = new FormattingOptions(2, true);
        List<Object> answers = new ArrayList<>();
        answers.add(get(service.hover(new HoverParams(doc, ON_FOLD))));
        answers.add(
            get(service.completion(new CompletionParams(doc, ON_FOLD))).getRight().getItems());
        answers.add(get(service.documentSymbol(new DocumentSymbolParams(doc))));
        answers.add(get(service.definition(new DefinitionParams(doc, ON_FOLD))).getLeft());
        answers.add(
            get(service.references(new ReferenceParams(doc, ON_FOLD, new ReferenceContext(true)))));
        answers.add(get(service.prepareRename(new PrepareRenameParams(doc, ON_FOLD))));
        answers.add(get(service.rename(new RenameParams(doc, ON_FOLD, "turn"))));
        answers.add(get(service.formatting(new DocumentFormattingParams(doc, options))));
        answers.add(
            get(service.rangeFormatting(new DocumentRangeFormattingParams(doc, options, all))));
        answers.add(
            get(
                service.codeAction(
                    new CodeActionParams(doc, all, new CodeActionContext(List.of())))));
        answers.add(get(service.inlayHint(new InlayHintParams(doc, all))));
        answers.add(get(service.foldingRange(new FoldingRangeRequestParams(doc))));
        answers.add(get(service.documentLink(new DocumentLinkParams(doc))));
        answers.add(get(service.semanticTokensFull(new SemanticTokensParams(doc))).getData());
        answers.add(
            get(service.diagnostic(new DocumentDiagnosticParams(doc))).getLeft().getItems());
        for (Object answer : answers) {
          assertTrue(
              answer == null || (answer instanceof List && ((List<?>) answer).isEmpty()),
              uri + ": nothing to say about a document that is no file, got " + answer);
        }
        h.close(uri);
        assertEquals(List.of(), h.client.publishedFor(uri), "no diagnostics for " + uri);
      }
      synchronized (h.responses) {
        assertEquals(
            List.of(),
            h.responses.stream().filter(r -> r.getError() != null).toList(),
            "no error response");
      }
      // The real file is still served.
      h.changeAll(benchUri, 2, BENCH.replace("-> spot", "-> spt"));
      PublishDiagnosticsParams broken =
          h.client.await(benchUri, p -> Integer.valueOf(2).equals(p.getVersion()));
      assertTrue(
          broken.getDiagnostics().stream()
              .anyMatch(d -> d.getSeverity() == DiagnosticSeverity.Error),
          broken.toString());
    }
  }
}
