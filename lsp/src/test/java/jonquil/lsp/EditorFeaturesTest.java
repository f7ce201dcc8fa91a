package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import jonquil.ide.EditorFeatures;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.CodeAction;
import org.eclipse.lsp4j.CodeActionCapabilities;
import org.eclipse.lsp4j.CodeActionContext;
import org.eclipse.lsp4j.CodeActionKind;
import org.eclipse.lsp4j.CodeActionKindCapabilities;
import org.eclipse.lsp4j.CodeActionLiteralSupportCapabilities;
import org.eclipse.lsp4j.CodeActionParams;
import org.eclipse.lsp4j.CompletionCapabilities;
import org.eclipse.lsp4j.CompletionItem;
import org.eclipse.lsp4j.CompletionItemCapabilities;
import org.eclipse.lsp4j.CompletionItemKind;
import org.eclipse.lsp4j.CompletionItemResolveSupportCapabilities;
import org.eclipse.lsp4j.CompletionParams;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.DocumentLink;
import org.eclipse.lsp4j.DocumentLinkParams;
import org.eclipse.lsp4j.FoldingRange;
import org.eclipse.lsp4j.FoldingRangeCapabilities;
import org.eclipse.lsp4j.FoldingRangeKind;
import org.eclipse.lsp4j.FoldingRangeRequestParams;
import org.eclipse.lsp4j.InlayHint;
import org.eclipse.lsp4j.InlayHintParams;
import org.eclipse.lsp4j.InsertTextFormat;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.SemanticTokens;
import org.eclipse.lsp4j.SemanticTokensDelta;
import org.eclipse.lsp4j.SemanticTokensDeltaParams;
import org.eclipse.lsp4j.SemanticTokensEdit;
import org.eclipse.lsp4j.SemanticTokensParams;
import org.eclipse.lsp4j.ServerCapabilities;
import org.eclipse.lsp4j.TextDocumentClientCapabilities;
import org.eclipse.lsp4j.TextDocumentEdit;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.WorkspaceClientCapabilities;
import org.eclipse.lsp4j.WorkspaceEdit;
import org.eclipse.lsp4j.WorkspaceEditCapabilities;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Completion, semantic tokens, inlay hints, folding, document links and code actions, driven
 * through the real server and the compiler's jonquil.ide over pipes.
 */
class EditorFeaturesTest {
  private static final long SECONDS = 20;

  /** A bench being written, from the compiler's completion tests. */
  static final String BENCH =
      """
      source seed { wavelength 1064 nm; power 2 W }
      material slab_glass = index 1.5
      splitter  pbs { polarizing }
      lens      l1  { focal 100 mm }
      probe     spot
      dump      d1
      train main {
        seed -> 100 mm -> pbs -> 50 mm -> spot
        pbs.reflected -> 30 mm -> d1
      }
      """;

  /** A bench that checks clean, from the compiler's code action tests. */
  static final String CLEAN =
      """
      source seed { wavelength 1064 nm; power 2 W }
      splitter pbs { polarizing }
      mirror m1 { metal silver; aoi 45 deg }
      probe spot
      dump d1

      train main {
        seed -> 100 mm -> pbs.through -> 50 mm -> m1 -> 20 mm -> spot
        pbs.reflected -> 30 mm -> d1
      }
      """;

  @TempDir Path dir;

  private String write(String name, String text) throws Exception {
    Files.writeString(dir.resolve(".jonquil-root"), "");
    Path file = dir.resolve(name);
    Files.writeString(file, text);
    return file.toAbsolutePath().normalize().toUri().toString();
  }

  private static TextDocumentClientCapabilities textDocument(ClientCapabilities caps) {
    if (caps.getTextDocument() == null) {
      caps.setTextDocument(new TextDocumentClientCapabilities());
    }
    return caps.getTextDocument();
  }

  /**
   * A client that resolves completion documentation lazily and takes literal, preferred code
   * actions.
   */
  private static ClientCapabilities modernClient(boolean documentChanges) {
    ClientCapabilities caps = new ClientCapabilities();
    CompletionItemCapabilities item = new CompletionItemCapabilities(false);
    item.setResolveSupport(
        new CompletionItemResolveSupportCapabilities(List.of("documentation", "detail")));
    textDocument(caps).setCompletion(new CompletionCapabilities(item));
    CodeActionCapabilities actions =
        new CodeActionCapabilities(
            new CodeActionLiteralSupportCapabilities(
                new CodeActionKindCapabilities(List.of(CodeActionKind.QuickFix))),
            false);
    actions.setIsPreferredSupport(true);
    textDocument(caps).setCodeAction(actions);
    FoldingRangeCapabilities folding = new FoldingRangeCapabilities();
    folding.setLineFoldingOnly(true);
    textDocument(caps).setFoldingRange(folding);
    WorkspaceClientCapabilities workspace = new WorkspaceClientCapabilities();
    workspace.setWorkspaceEdit(new WorkspaceEditCapabilities(documentChanges));
    caps.setWorkspace(workspace);
    return caps;
  }

  private static List<CompletionItem> complete(LspHarness h, String uri, String text, int offset)
      throws Exception {
    return h.remote
        .getTextDocumentService()
        .completion(
            new CompletionParams(
                new TextDocumentIdentifier(uri), ClientText.position(text, offset)))
        .get(SECONDS, TimeUnit.SECONDS)
        .getRight()
        .getItems();
  }

  private static List<String> labels(List<CompletionItem> items, CompletionItemKind kind) {
    return items.stream().filter(i -> i.getKind() == kind).map(CompletionItem::getLabel).toList();
  }

  @Test
  void announcesTheNewProviders() throws Exception {
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      ServerCapabilities caps = h.initialize(dir, modernClient(false)).getCapabilities();
      assertTrue(caps.getCompletionProvider().getResolveProvider());
      assertEquals(List.of("."), caps.getCompletionProvider().getTriggerCharacters());
      assertEquals(
          SemanticTokenEncoding.TOKEN_TYPES,
          caps.getSemanticTokensProvider().getLegend().getTokenTypes());
      assertEquals(
          List.of("declaration"), caps.getSemanticTokensProvider().getLegend().getTokenModifiers());
      assertTrue(caps.getSemanticTokensProvider().getFull().getRight().getDelta());
      assertTrue(caps.getInlayHintProvider().getRight().getResolveProvider());
      assertTrue(caps.getFoldingRangeProvider().getLeft());
      assertNotNull(caps.getDocumentLinkProvider());
      assertEquals(
          List.of(CodeActionKind.QuickFix),
          caps.getCodeActionProvider().getRight().getCodeActionKinds());
    }
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      ServerCapabilities caps = h.initialize(dir).getCapabilities();
      assertFalse(
          caps.getCodeActionProvider().getLeft(),
          "no code actions for a client without literal ones");
    }
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      ClientCapabilities client = new ClientCapabilities();
      org.eclipse.lsp4j.SemanticTokensCapabilities tokens =
          new org.eclipse.lsp4j.SemanticTokensCapabilities(false);
      tokens.setTokenTypes(List.of("keyword", "unit"));
      textDocument(client).setSemanticTokens(tokens);
      List<String> legend =
          h.initialize(dir, client)
              .getCapabilities()
              .getSemanticTokensProvider()
              .getLegend()
              .getTokenTypes();
      assertEquals(
          "unit",
          legend.get(legend.size() - 1),
          "a client that knows a 'unit' type gets units as such");
    }
  }

  @Test
  void completionAtTheCursorAndResolveAddsTheDocumentation() throws Exception {
    String text = BENCH.replace("-> 50 mm -> spot", "-> 50 mm -> ");
    String uri = write("bench.jonq", text);
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir, modernClient(false));
      h.open(uri, 1, text);
      List<CompletionItem> items =
          complete(h, uri, text, text.indexOf("-> 50 mm -> ") + "-> 50 mm -> ".length());
      assertEquals(
          List.of("d1", "l1", "pbs", "seed", "spot"), labels(items, CompletionItemKind.Variable));
      assertEquals(
          List.of("pbs.through", "pbs.reflected"), labels(items, CompletionItemKind.Field));
      assertTrue(
          items.stream().allMatch(i -> i.getInsertTextFormat() == InsertTextFormat.PlainText));

      String inLens = text.replace("focal 100 mm }", "focal 100 mm\n  \n}");
      h.changeAll(uri, 2, inLens);
      List<CompletionItem> params = complete(h, uri, inLens, inLens.indexOf("mm\n  \n}") + 5);
      assertTrue(labels(params, CompletionItemKind.Property).contains("focal"), params.toString());
      CompletionItem focal =
          params.stream().filter(i -> i.getLabel().equals("focal")).findFirst().orElseThrow();
      assertNull(focal.getDocumentation(), "documentation waits for resolve");
      assertEquals("required parameter of lens", focal.getDetail());
      CompletionItem resolved =
          h.remote
              .getTextDocumentService()
              .resolveCompletionItem(focal)
              .get(SECONDS, TimeUnit.SECONDS);
      assertEquals("focal length (negative: diverging)", resolved.getDocumentation().getLeft());
    }
  }

  @Test
  void afterAnElementsDotInAPathItsPortsAndFacesComeWithTheirMeaning() throws Exception {
    String text = BENCH.replace("-> 50 mm -> spot", "-> 50 mm -> spot\n  pbs.");
    String uri = write("faces.jonq", text);
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir, modernClient(false));
      h.open(uri, 1, text);
      List<CompletionItem> items =
          complete(h, uri, text, text.indexOf("  pbs.") + "  pbs.".length());
      assertEquals(
          List.of("through", "reflected", "front", "back", "side"),
          labels(items, CompletionItemKind.Field));
      assertTrue(
          items.stream().allMatch(i -> i.getDetail() != null && !i.getDetail().isEmpty()),
          items.toString());
    }
  }

  @Test
  void aClientThatDoesNotResolveGetsTheDocumentationAtOnce() throws Exception {
    String text = BENCH.replace("focal 100 mm }", "focal 100 mm\n  \n}");
    String uri = write("eager.jonq", text);
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir);
      h.open(uri, 1, text);
      CompletionItem focal =
          complete(h, uri, text, text.indexOf("mm\n  \n}") + 5).stream()
              .filter(i -> i.getLabel().equals("focal"))
              .findFirst()
              .orElseThrow();
      assertEquals("focal length (negative: diverging)", focal.getDocumentation().getLeft());
      assertNull(focal.getData());
    }
  }

  @Test
  void completionReadsTheBufferEvenBeforeItsCheck() throws Exception {
    String text = BENCH.replace("-> 50 mm -> spot", "-> 50 mm -> ");
    String uri = write("stale.jonq", BENCH);
    // The debounce never ends within the test and nothing runs early: no check runs, so no snapshot
    // saw this text.
    try (LspHarness h = new LspHarness(EditorFeatures.standard(), Duration.ofMinutes(5), false)) {
      h.initialize(dir, modernClient(false));
      h.open(uri, 1, text);
      int cursor = text.indexOf("-> 50 mm -> ") + "-> 50 mm -> ".length();
      assertEquals(
          List.of("d1", "l1", "pbs", "seed", "spot"),
          labels(complete(h, uri, text, cursor), CompletionItemKind.Variable));

      String more = "probe late\n" + text;
      h.changeAll(uri, 2, more);
      assertEquals(
          List.of("d1", "l1", "late", "pbs", "seed", "spot"),
          labels(
              complete(h, uri, more, cursor + "probe late\n".length()),
              CompletionItemKind.Variable));
      assertTrue(h.client.publishedFor(uri).isEmpty(), "answered without the debounced check");
    }
  }

  /**
   * One decoded token: absolute line and UTF-16 column, length, type name, and whether it declares.
   */
  record Token(int line, int character, int length, String type, boolean declaration) {}

  static List<Token> decode(List<Integer> data, List<String> legend) {
    List<Token> out = new ArrayList<>();
    int line = 0;
    int character = 0;
    for (int i = 0; i + 4 < data.size(); i += 5) {
      character = data.get(i) == 0 ? character + data.get(i + 1) : data.get(i + 1);
      line += data.get(i);
      out.add(
          new Token(
              line,
              character,
              data.get(i + 2),
              legend.get(data.get(i + 3)),
              (data.get(i + 4) & 1) != 0));
    }
    return out;
  }

  static List<Integer> applyDelta(List<Integer> data, List<SemanticTokensEdit> edits) {
    List<Integer> out = new ArrayList<>(data);
    List<SemanticTokensEdit> sorted = new ArrayList<>(edits);
    sorted.sort((a, b) -> Integer.compare(b.getStart(), a.getStart()));
    for (SemanticTokensEdit e : sorted) {
      out.subList(e.getStart(), e.getStart() + e.getDeleteCount()).clear();
      out.addAll(e.getStart(), e.getData() == null ? List.of() : e.getData());
    }
    return out;
  }

  @Test
  void semanticTokensDecodeToTheFixturesTokensInUtf16() throws Exception {
    String text = "// é😀\nmirror m1 { reflectance 99 % }\n/* 😀 */ probe p\n";
    String uri = write("tokens.jonq", text);
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      List<String> legend =
          h.initialize(dir)
              .getCapabilities()
              .getSemanticTokensProvider()
              .getLegend()
              .getTokenTypes();
      h.open(uri, 1, text);
      TextDocumentIdentifier doc = new TextDocumentIdentifier(uri);
      SemanticTokens full =
          h.remote
              .getTextDocumentService()
              .semanticTokensFull(new SemanticTokensParams(doc))
              .get(SECONDS, TimeUnit.SECONDS);
      assertEquals(
          List.of(
              new Token(0, 0, 6, "comment", false),
              new Token(1, 0, 6, "type", false),
              new Token(1, 7, 2, "variable", true),
              new Token(1, 12, 11, "property", false),
              new Token(1, 24, 2, "number", false),
              new Token(
                  1, 27, 1, "type",
                  false), // the unit '%': "type" for a client that knows no "unit" type
              new Token(2, 0, 8, "comment", false),
              new Token(2, 9, 5, "type", false),
              new Token(2, 15, 1, "variable", true)),
          decode(full.getData(), legend));
      assertNotNull(full.getResultId());

      String renamed = text.replace("m1", "mirror_one");
      h.changeAll(uri, 2, renamed);
      var delta =
          h.remote
              .getTextDocumentService()
              .semanticTokensFullDelta(new SemanticTokensDeltaParams(doc, full.getResultId()))
              .get(SECONDS, TimeUnit.SECONDS);
      assertTrue(delta.isRight(), "a delta against the result the client holds");
      SemanticTokensDelta d = delta.getRight();
      assertEquals(1, d.getEdits().size());
      List<Integer> patched = applyDelta(full.getData(), d.getEdits());
      SemanticTokens again =
          h.remote
              .getTextDocumentService()
              .semanticTokensFull(new SemanticTokensParams(doc))
              .get(SECONDS, TimeUnit.SECONDS);
      assertEquals(again.getData(), patched);
      assertEquals(new Token(1, 7, 10, "variable", true), decode(patched, legend).get(2));

      var unknown =
          h.remote
              .getTextDocumentService()
              .semanticTokensFullDelta(new SemanticTokensDeltaParams(doc, "no-such-result"))
              .get(SECONDS, TimeUnit.SECONDS);
      assertEquals(
          again.getData(),
          unknown.getLeft().getData(),
          "an unknown previous result gets the full tokens");
    }
  }

  @Test
  void inlayHintsOnlyInsideTheRequestedRange() throws Exception {
    String text = InlayHintResolveTest.BENCH;
    String uri = write("hints.jonq", text);
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir);
      h.open(uri, 1, text);
      TextDocumentIdentifier doc = new TextDocumentIdentifier(uri);
      List<InlayHint> all =
          h.remote
              .getTextDocumentService()
              .inlayHint(
                  new InlayHintParams(doc, new Range(new Position(0, 0), new Position(9, 0))))
              .get(SECONDS, TimeUnit.SECONDS);
      assertEquals(
          List.of(
              new Position(5, 6),
              new Position(5, 29),
              new Position(5, 44),
              new Position(6, 14),
              new Position(6, 29)),
          all.stream().map(InlayHint::getPosition).toList());
      assertEquals(" 10 mW", all.get(0).getLabel().getLeft());
      assertEquals(" 5 mW", all.get(4).getLabel().getLeft());
      assertTrue(
          all.get(0).getTooltip().getLeft().startsWith("10 mW leaving 'seed.out'"),
          all.get(0).toString());

      List<InlayHint> branch =
          h.remote
              .getTextDocumentService()
              .inlayHint(
                  new InlayHintParams(doc, new Range(new Position(6, 0), new Position(6, 30))))
              .get(SECONDS, TimeUnit.SECONDS);
      assertEquals(all.subList(3, 5), branch);
      assertEquals(
          List.of(),
          h.remote
              .getTextDocumentService()
              .inlayHint(
                  new InlayHintParams(doc, new Range(new Position(0, 0), new Position(4, 0))))
              .get(SECONDS, TimeUnit.SECONDS));
    }
  }

  static final String FOLDS =
      """
      // bench notes
      // second line
      source seed {
        wavelength 1064 nm
        power 2 W
      }
      probe spot
      /* a block
         comment */
      train main {
        seed -> 10 mm -> spot
      }
      """;

  private static List<FoldingRange> fold(LspHarness h, String uri) throws Exception {
    return h.remote
        .getTextDocumentService()
        .foldingRange(new FoldingRangeRequestParams(new TextDocumentIdentifier(uri)))
        .get(SECONDS, TimeUnit.SECONDS);
  }

  private static FoldingRange range(
      int start, int end, String kind, Integer startChar, Integer endChar) {
    FoldingRange r = new FoldingRange(start, end);
    r.setKind(kind);
    r.setStartCharacter(startChar);
    r.setEndCharacter(endChar);
    return r;
  }

  @Test
  void foldingRangesForALineFoldingClientAreWholeLinesAndKeepTheClosingBrace() throws Exception {
    String uri = write("folds.jonq", FOLDS);
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir, modernClient(false));
      h.open(uri, 1, FOLDS);
      assertEquals(
          List.of(
              range(0, 1, FoldingRangeKind.Comment, null, null),
              range(2, 4, FoldingRangeKind.Region, null, null),
              range(7, 8, FoldingRangeKind.Comment, null, null),
              range(9, 10, FoldingRangeKind.Region, null, null)),
          fold(h, uri));
    }
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir);
      h.open(uri, 1, FOLDS);
      assertEquals(
          List.of(
              range(0, 1, FoldingRangeKind.Comment, 0, 14),
              range(2, 5, FoldingRangeKind.Region, 0, 1),
              range(7, 8, FoldingRangeKind.Comment, 0, 13),
              range(9, 11, FoldingRangeKind.Region, 0, 1)),
          fold(h, uri));
    }
  }

  @Test
  void documentLinksPointAtTheUsedFilesThatExist() throws Exception {
    String main = "use \"parts.jonq\"\nuse \"missing.jonq\"\nprobe p\n";
    String partsUri = write("parts.jonq", "probe spare\n");
    String uri = write("main.jonq", main);
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir);
      h.open(uri, 1, main);
      List<DocumentLink> links =
          h.remote
              .getTextDocumentService()
              .documentLink(new DocumentLinkParams(new TextDocumentIdentifier(uri)))
              .get(SECONDS, TimeUnit.SECONDS);
      assertEquals(
          List.of(new DocumentLink(new Range(new Position(0, 5), new Position(0, 15)), partsUri)),
          links);
    }
  }

  /**
   * The quick fixes offered for one published diagnostic, asked as an editor asks: its range and
   * itself.
   */
  private static List<CodeAction> actions(LspHarness h, String uri, Diagnostic d, List<String> only)
      throws Exception {
    CodeActionContext context = new CodeActionContext(List.of(d));
    context.setOnly(only);
    return h
        .remote
        .getTextDocumentService()
        .codeAction(new CodeActionParams(new TextDocumentIdentifier(uri), d.getRange(), context))
        .get(SECONDS, TimeUnit.SECONDS)
        .stream()
        .map(e -> e.getRight())
        .toList();
  }

  private static Diagnostic only(PublishDiagnosticsParams p, String code) {
    List<Diagnostic> found =
        p.getDiagnostics().stream().filter(d -> code.equals(d.getCode().getLeft())).toList();
    assertEquals(1, found.size(), p.toString());
    return found.get(0);
  }

  @Test
  void applyingTheQuickFixForAMisspelledElementRemovesItsDiagnostic() throws Exception {
    String text = CLEAN.replace("-> m1 ->", "-> m11 ->");
    String uri = write("typo.jonq", text);
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir, modernClient(false));
      h.open(uri, 1, text);
      Diagnostic d =
          only(h.client.await(uri, p -> Integer.valueOf(1).equals(p.getVersion())), "J202");
      assertEquals(
          List.of(),
          actions(h, uri, d, List.of(CodeActionKind.Refactor)),
          "only quick fixes are offered");
      List<CodeAction> fixes = actions(h, uri, d, List.of(CodeActionKind.QuickFix));
      assertEquals(
          List.of("change 'm11' to 'm1'"), fixes.stream().map(CodeAction::getTitle).toList());
      CodeAction fix = fixes.get(0);
      assertEquals(CodeActionKind.QuickFix, fix.getKind());
      assertTrue(fix.getIsPreferred());
      assertEquals(List.of(d), fix.getDiagnostics());
      WorkspaceEdit edit = fix.getEdit();
      assertNull(edit.getDocumentChanges(), "this client takes plain changes only");
      String fixed = ClientText.apply(text, edit.getChanges().get(uri));
      assertEquals(CLEAN, fixed);
      h.changeAll(uri, 2, fixed);
      PublishDiagnosticsParams after =
          h.client.await(uri, p -> Integer.valueOf(2).equals(p.getVersion()));
      assertTrue(
          after.getDiagnostics().stream().noneMatch(x -> "J202".equals(x.getCode().getLeft())),
          after.toString());
    }
  }

  @Test
  void addingADumpForAnUnfollowedPortIsAVersionedEditThatRemovesTheWarning() throws Exception {
    String text = CLEAN.replace("  pbs.reflected -> 30 mm -> d1\n", "");
    String uri = write("stray.jonq", text);
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir, modernClient(true));
      h.open(uri, 7, text);
      Diagnostic d =
          only(h.client.await(uri, p -> Integer.valueOf(7).equals(p.getVersion())), "J510");
      List<CodeAction> fixes = actions(h, uri, d, null);
      assertEquals(
          List.of("add a dump for the stray beam"),
          fixes.stream().map(CodeAction::getTitle).toList());
      List<TextDocumentEdit> changes =
          fixes.get(0).getEdit().getDocumentChanges().stream().map(e -> e.getLeft()).toList();
      assertEquals(1, changes.size());
      assertEquals(uri, changes.get(0).getTextDocument().getUri());
      assertEquals(
          7,
          changes.get(0).getTextDocument().getVersion(),
          "the version the fix was computed from");
      List<TextEdit> edits = changes.get(0).getEdits();
      String fixed = ClientText.apply(text, edits);
      h.changeAll(uri, 8, fixed);
      PublishDiagnosticsParams after =
          h.client.await(uri, p -> Integer.valueOf(8).equals(p.getVersion()));
      assertTrue(
          after.getDiagnostics().stream().noneMatch(x -> "J510".equals(x.getCode().getLeft())),
          fixed);
      assertTrue(fixed.contains("pbs.reflected -> 50 mm -> reflected_dump"), fixed);
    }
  }
}
