package jonquil.lsp;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.atomic.AtomicReference;
import jonquil.format.FormatHunks;
import jonquil.format.Formatter;
import jonquil.ide.CodeActionInfo;
import jonquil.ide.CompletionItemInfo;
import jonquil.ide.DocumentLinkInfo;
import jonquil.ide.FoldingRangeInfo;
import jonquil.ide.RenameResult;
import jonquil.ide.SymbolInfo;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import org.eclipse.lsp4j.CodeAction;
import org.eclipse.lsp4j.CodeActionParams;
import org.eclipse.lsp4j.Command;
import org.eclipse.lsp4j.CompletionItem;
import org.eclipse.lsp4j.CompletionList;
import org.eclipse.lsp4j.CompletionParams;
import org.eclipse.lsp4j.DefinitionParams;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.DidChangeTextDocumentParams;
import org.eclipse.lsp4j.DidCloseTextDocumentParams;
import org.eclipse.lsp4j.DidOpenTextDocumentParams;
import org.eclipse.lsp4j.DidSaveTextDocumentParams;
import org.eclipse.lsp4j.DocumentDiagnosticParams;
import org.eclipse.lsp4j.DocumentDiagnosticReport;
import org.eclipse.lsp4j.DocumentFormattingParams;
import org.eclipse.lsp4j.DocumentLink;
import org.eclipse.lsp4j.DocumentLinkParams;
import org.eclipse.lsp4j.DocumentRangeFormattingParams;
import org.eclipse.lsp4j.DocumentSymbol;
import org.eclipse.lsp4j.DocumentSymbolParams;
import org.eclipse.lsp4j.FoldingRange;
import org.eclipse.lsp4j.FoldingRangeRequestParams;
import org.eclipse.lsp4j.FormattingOptions;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.InlayHint;
import org.eclipse.lsp4j.InlayHintParams;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.LocationLink;
import org.eclipse.lsp4j.PrepareRenameDefaultBehavior;
import org.eclipse.lsp4j.PrepareRenameParams;
import org.eclipse.lsp4j.PrepareRenameResult;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.ReferenceParams;
import org.eclipse.lsp4j.RenameParams;
import org.eclipse.lsp4j.SemanticTokens;
import org.eclipse.lsp4j.SemanticTokensDelta;
import org.eclipse.lsp4j.SemanticTokensDeltaParams;
import org.eclipse.lsp4j.SemanticTokensParams;
import org.eclipse.lsp4j.SymbolInformation;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.WorkspaceEdit;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.eclipse.lsp4j.jsonrpc.messages.Either3;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseError;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;
import org.eclipse.lsp4j.services.TextDocumentService;

/**
 * The textDocument/* methods: records edits for the check worker and relays questions to the editor
 * answers.
 */
final class JonquilTextDocumentService implements TextDocumentService {
  /** The items of the last completion answer, which completionItem/resolve fills in from. */
  private record CompletionAnswer(long id, List<CompletionItemInfo> items) {}

  /** The token data last sent for a document, which a delta request names by its result id. */
  private record SentTokens(String resultId, List<Integer> data) {}

  private final JonquilLanguageServer server;
  private final AtomicLong ids = new AtomicLong();
  private final AtomicReference<CompletionAnswer> lastCompletion = new AtomicReference<>();
  private final Map<Path, SentTokens> sentTokens = new ConcurrentHashMap<>();

  JonquilTextDocumentService(JonquilLanguageServer server) {
    this.server = server;
  }

  // ---- synchronisation: record and schedule, nothing more ----

  @Override
  public void didOpen(DidOpenTextDocumentParams params) {
    server.onNotification(
        "textDocument/didOpen",
        () -> {
          var doc = params.getTextDocument();
          server.documents.open(
              doc.getUri(), doc.getVersion(), doc.getText() == null ? "" : doc.getText());
          server.scheduleCheck();
        });
  }

  @Override
  public void didChange(DidChangeTextDocumentParams params) {
    server.onNotification(
        "textDocument/didChange",
        () -> {
          var id = params.getTextDocument();
          Convert convert = server.convert();
          List<TextDocumentContentChangeEvent> changes = params.getContentChanges();
          server.documents.change(
              id.getUri(),
              id.getVersion(),
              text -> {
                String now = text;
                for (TextDocumentContentChangeEvent change : changes) {
                  now = convert.applyChange(now, change);
                }
                return now;
              });
          server.scheduleCheck();
        });
  }

  @Override
  public void didClose(DidCloseTextDocumentParams params) {
    server.onNotification(
        "textDocument/didClose",
        () -> {
          server
              .documents
              .close(params.getTextDocument().getUri())
              .ifPresent(doc -> sentTokens.remove(doc.path()));
          server.scheduleCheck();
        });
  }

  @Override
  public void didSave(DidSaveTextDocumentParams params) {
    // The open buffer is already what the checker reads; saving changes nothing for it.
  }

  // ---- questions, answered from the latest check ----

  /**
   * Pull diagnostics: the document's diagnostics from the check of its current version. The result
   * id is that version plus a hash of the text and of the report, so a change in a used file (same
   * version, same text) still gives a new id.
   */
  @Override
  public CompletableFuture<DocumentDiagnosticReport> diagnostic(DocumentDiagnosticParams params) {
    String previous = params.getPreviousResultId();
    return server.requests.answer(
        "textDocument/diagnostic",
        params.getTextDocument().getUri(),
        (snapshot, path) -> {
          List<Diagnostic> items = new ArrayList<>();
          if (path == null) {
            return Convert.diagnosticReport("none", previous, items);
          }
          Map<Path, SourceFile> sources = CheckCycle.sources(snapshot.results());
          Convert conv = server.convert();
          for (jonquil.diag.Diagnostic d :
              CheckCycle.byFile(snapshot.results()).getOrDefault(path, Set.of())) {
            items.add(conv.diagnostic(d, sources::get));
          }
          SourceFile source = sources.get(path);
          Integer version = snapshot.versions().get(path);
          String resultId =
              (version == null ? "disk" : "v" + version)
                  + "-"
                  + Integer.toHexString(source == null ? 0 : source.text().hashCode())
                  + "-"
                  + Integer.toHexString(items.hashCode());
          return Convert.diagnosticReport(resultId, previous, items);
        });
  }

  @Override
  public CompletableFuture<Hover> hover(HoverParams params) {
    boolean markdown = ClientSupport.markdownHover(server.clientCapabilities());
    return server.requests.atPosition(
        "textDocument/hover",
        params.getTextDocument().getUri(),
        params.getPosition(),
        null,
        at ->
            server
                .answers
                .hover(at.result(), at.path(), at.offset())
                .map(info -> ProtocolAnswers.hover(at.convert(), info, at.source(), markdown))
                .orElse(null));
  }

  @Override
  public CompletableFuture<Either<List<? extends Location>, List<? extends LocationLink>>>
      definition(DefinitionParams params) {
    boolean links = ClientSupport.definitionLinks(server.clientCapabilities());
    return server.requests.atPosition(
        "textDocument/definition",
        params.getTextDocument().getUri(),
        params.getPosition(),
        Either.forLeft(List.of()),
        at -> {
          List<jonquil.ide.Location> targets =
              server.answers.definition(at.result(), at.path(), at.offset());
          if (links) {
            TextRange origin = nameUnderCursor(at);
            List<LocationLink> out = new ArrayList<>();
            for (jonquil.ide.Location l : targets) {
              out.add(at.convert().locationLink(l, at.result().files()::get, at.source(), origin));
            }
            return Either.forRight(out);
          }
          List<Location> out = new ArrayList<>();
          for (jonquil.ide.Location l : targets) {
            out.add(at.convert().location(l, at.result().files()::get));
          }
          return Either.forLeft(out);
        });
  }

  /**
   * The occurrence of a name that holds the cursor, as the editor answers list it among the name's
   * references; null when the cursor is on no name (e.g. inside a 'use' path).
   */
  private TextRange nameUnderCursor(RequestPipeline.At at) {
    for (jonquil.ide.Location l :
        server.answers.references(at.result(), at.path(), at.offset(), true)) {
      if (l.file().equals(at.path())
          && l.range().start() <= at.offset()
          && at.offset() <= l.range().end()) {
        return l.range();
      }
    }
    return null;
  }

  /**
   * Whether the server may propose edits to a file: one open in the editor, or one under a
   * workspace folder. Any other file a check reads (a library used by an open file outside every
   * folder) is served read-only: answered about, never edited.
   */
  private boolean editable(Path file) {
    return server.documents.get(file).isPresent()
        || server.folders().stream().anyMatch(file::startsWith);
  }

  /**
   * Refuses a rename that would touch a read-only file: changing only the other files would break
   * the spec.
   */
  private void refuseReadOnly(java.util.Collection<Path> files) {
    for (Path file : files) {
      if (!editable(file)) {
        throw new ResponseErrorException(
            new ResponseError(
                ResponseErrorCode.RequestFailed,
                "renaming this would "
                    + "change '"
                    + file
                    + "', which is neither open nor in a workspace folder; open it first",
                null));
      }
    }
  }

  @Override
  public CompletableFuture<List<? extends Location>> references(ReferenceParams params) {
    boolean withDeclaration =
        params.getContext() != null && params.getContext().isIncludeDeclaration();
    return server.requests.atPosition(
        "textDocument/references",
        params.getTextDocument().getUri(),
        server.index::fresh,
        params.getPosition(),
        List.of(),
        at -> {
          WorkspaceIndex.Snapshot index = server.index.latest();
          List<Location> out = new ArrayList<>();
          for (jonquil.ide.Location l :
              server.answers.references(
                  at.result(), at.path(), at.offset(), withDeclaration, index.files())) {
            out.add(at.convert().location(l, file -> sourceOf(at, index, file)));
          }
          return out;
        });
  }

  @Override
  public CompletableFuture<Either3<Range, PrepareRenameResult, PrepareRenameDefaultBehavior>>
      prepareRename(PrepareRenameParams params) {
    return server.requests.atPosition(
        "textDocument/prepareRename",
        params.getTextDocument().getUri(),
        params.getPosition(),
        null,
        at -> {
          Optional<TextRange> range =
              server.answers.prepareRename(at.result(), at.path(), at.offset());
          if (range.isPresent()) {
            List<Path> touched = new ArrayList<>();
            server
                .answers
                .references(at.result(), at.path(), at.offset(), true)
                .forEach(l -> touched.add(l.file()));
            refuseReadOnly(touched);
          }
          return range
              .<Either3<Range, PrepareRenameResult, PrepareRenameDefaultBehavior>>map(
                  r -> Either3.forFirst(at.convert().range(at.source(), r)))
              .orElse(null);
        });
  }

  @Override
  public CompletableFuture<WorkspaceEdit> rename(RenameParams params) {
    boolean documentChanges = ClientSupport.documentChanges(server.clientCapabilities());
    return server.requests.atPosition(
        "textDocument/rename",
        params.getTextDocument().getUri(),
        server.index::fresh,
        params.getPosition(),
        null,
        at -> {
          WorkspaceIndex.Snapshot index = server.index.latest();
          RenameResult result =
              server.answers.rename(
                  at.result(), at.path(), at.offset(), params.getNewName(), index.files());
          if (result.error() != null) {
            throw new ResponseErrorException(
                new ResponseError(ResponseErrorCode.RequestFailed, result.error(), null));
          }
          Map<Path, List<jonquil.diag.Edit>> edits =
              result.edits() == null ? Map.of() : new LinkedHashMap<>(result.edits());
          refuseReadOnly(edits.keySet());
          // A file only the index read is edited at the buffer version it read (null: read from
          // disk).
          return at.convert()
              .workspaceEdit(
                  edits,
                  file -> sourceOf(at, index, file),
                  file ->
                      at.result().files().containsKey(file)
                          ? server.documents.get(file).map(Documents.Doc::version).orElse(null)
                          : index.version(file),
                  documentChanges);
        });
  }

  /** The text a location's offsets refer to: the check's copy, else the workspace index's. */
  private static SourceFile sourceOf(
      RequestPipeline.At at, WorkspaceIndex.Snapshot index, Path file) {
    SourceFile checked = at.result().files().get(file);
    return checked != null ? checked : index.source(file);
  }

  @Override
  public CompletableFuture<List<Either<SymbolInformation, DocumentSymbol>>> documentSymbol(
      DocumentSymbolParams params) {
    boolean hierarchical = ClientSupport.hierarchicalSymbols(server.clientCapabilities());
    return server.requests.atPosition(
        "textDocument/documentSymbol",
        params.getTextDocument().getUri(),
        null,
        List.of(),
        at -> {
          SourceFile source = at.source();
          List<Either<SymbolInformation, DocumentSymbol>> out = new ArrayList<>();
          for (SymbolInfo s : server.answers.documentSymbols(at.result(), at.path())) {
            if (hierarchical) {
              out.add(Either.forRight(ProtocolAnswers.documentSymbol(at.convert(), s, source)));
            } else {
              List<SymbolInformation> flat = new ArrayList<>();
              ProtocolAnswers.flatten(at.convert(), s, source, null, flat);
              flat.forEach(f -> out.add(Either.forLeft(f)));
            }
          }
          return out;
        });
  }

  // ---- completion: from the buffer's text as the request found it ----

  @Override
  public CompletableFuture<Either<List<CompletionItem>, CompletionList>> completion(
      CompletionParams params) {
    boolean lazy = ClientSupport.lazyCompletionDocumentation(server.clientCapabilities());
    return server.requests.atBuffer(
        "textDocument/completion",
        params.getTextDocument().getUri(),
        params.getPosition(),
        Either.forRight(new CompletionList(false, List.of())),
        at -> {
          List<CompletionItemInfo> infos =
              server.answers.completions(at.result(), at.path(), at.offset());
          long id = ids.incrementAndGet();
          if (lazy) {
            lastCompletion.set(new CompletionAnswer(id, List.copyOf(infos)));
          }
          List<CompletionItem> items = new ArrayList<>();
          for (int i = 0; i < infos.size(); i++) {
            items.add(
                ProtocolAnswers.completionItem(
                    infos.get(i), lazy ? new ResolveKeys.CompletionKey(id, i) : null));
          }
          return Either.forRight(new CompletionList(false, items));
        });
  }

  @Override
  public CompletableFuture<CompletionItem> resolveCompletionItem(CompletionItem unresolved) {
    return server.requests.answer(
        "completionItem/resolve",
        null,
        (snapshot, none) -> {
          Optional<ResolveKeys.CompletionKey> key = ResolveKeys.completionKey(unresolved);
          CompletionAnswer last = lastCompletion.get();
          if (key.isEmpty()
              || last == null
              || last.id() != key.get().answer()
              || key.get().index() < 0
              || key.get().index() >= last.items().size()) {
            return unresolved; // an item of an older answer: it stays as it was
          }
          CompletionItemInfo info = last.items().get(key.get().index());
          return info.label().equals(unresolved.getLabel())
              ? ProtocolAnswers.withDocumentation(unresolved, info.documentation())
              : unresolved;
        });
  }

  // ---- highlighting, hints, folding, links and quick fixes, from the check of the current version
  // ----

  @Override
  public CompletableFuture<SemanticTokens> semanticTokensFull(SemanticTokensParams params) {
    return server.requests.atPosition(
        "textDocument/semanticTokens/full",
        params.getTextDocument().getUri(),
        null,
        SemanticTokenEncoding.full(null, List.of()),
        at -> {
          SentTokens sent = tokens(at);
          return SemanticTokenEncoding.full(sent.resultId(), sent.data());
        });
  }

  @Override
  public CompletableFuture<Either<SemanticTokens, SemanticTokensDelta>> semanticTokensFullDelta(
      SemanticTokensDeltaParams params) {
    String previous = params.getPreviousResultId();
    return server.requests.atPosition(
        "textDocument/semanticTokens/full/delta",
        params.getTextDocument().getUri(),
        null,
        Either.forLeft(SemanticTokenEncoding.full(null, List.of())),
        at -> {
          SentTokens before = sentTokens.get(at.path());
          SentTokens now = tokens(at);
          if (before == null || previous == null || !previous.equals(before.resultId())) {
            return Either.forLeft(SemanticTokenEncoding.full(now.resultId(), now.data()));
          }
          return Either.forRight(
              SemanticTokenEncoding.delta(now.resultId(), before.data(), now.data()));
        });
  }

  /** Computes, encodes and remembers the document's tokens under a new result id. */
  private SentTokens tokens(RequestPipeline.At at) {
    List<Integer> data =
        server
            .tokenEncoding()
            .data(at.convert(), at.source(), server.answers.semanticTokens(at.result(), at.path()));
    SentTokens sent = new SentTokens(Long.toString(ids.incrementAndGet()), List.copyOf(data));
    if (server.documents.get(at.path()).isPresent()) {
      sentTokens.put(
          at.path(),
          sent); // closing a document forgets its tokens; a file never opened has none kept
    }
    return sent;
  }

  @Override
  public CompletableFuture<List<InlayHint>> inlayHint(InlayHintParams params) {
    boolean lazy = ClientSupport.lazyInlayHintTooltips(server.clientCapabilities());
    Range range = params.getRange();
    String uri = params.getTextDocument().getUri();
    return server.requests.atPosition(
        "textDocument/inlayHint",
        uri,
        null,
        List.of(),
        at -> {
          int start = range == null ? 0 : at.convert().offset(at.source(), range.getStart());
          int end =
              range == null
                  ? at.source().text().length()
                  : at.convert().offset(at.source(), range.getEnd());
          Integer version = at.versions().get(at.path());
          int textHash = at.source().text().hashCode();
          List<InlayHint> out = new ArrayList<>();
          for (jonquil.ide.InlayHint h :
              server.answers.inlayHints(
                  at.result(), at.path(), Math.min(start, end), Math.max(start, end))) {
            out.add(
                ProtocolAnswers.inlayHint(
                    at.convert(),
                    at.source(),
                    h,
                    lazy ? new ResolveKeys.HintKey(uri, version, textHash, h.offset()) : null));
          }
          return out;
        });
  }

  /**
   * Fills a hint's tooltip, recomputed by the editor answers for the document state the hint came
   * from; a hint whose document has changed or closed since, or that is not ours, comes back as it
   * was.
   */
  @Override
  public CompletableFuture<InlayHint> resolveInlayHint(InlayHint unresolved) {
    Optional<ResolveKeys.HintKey> key = ResolveKeys.hintKey(unresolved);
    return server.requests.answer(
        "inlayHint/resolve",
        key.map(ResolveKeys.HintKey::uri).orElse(null),
        (snapshot, path) -> {
          if (key.isEmpty() || path == null) {
            return unresolved;
          }
          ResolveKeys.HintKey k = key.get();
          Integer open = server.documents.get(path).map(Documents.Doc::version).orElse(null);
          if (!Objects.equals(open, k.version())
              || !Objects.equals(snapshot.versions().get(path), k.version())) {
            return unresolved;
          }
          Optional<jonquil.Result> result = snapshot.resultFor(path);
          if (result.isEmpty()
              || result.get().files().get(path).text().hashCode() != k.textHash()) {
            return unresolved;
          }
          String label = ProtocolAnswers.hintLabel(unresolved);
          for (jonquil.ide.InlayHint h :
              server.answers.inlayHints(result.get(), path, k.offset(), k.offset())) {
            if (h.offset() == k.offset() && h.label().equals(label)) {
              return ProtocolAnswers.withTooltip(unresolved, h.tooltip());
            }
          }
          return unresolved;
        });
  }

  @Override
  public CompletableFuture<List<FoldingRange>> foldingRange(FoldingRangeRequestParams params) {
    boolean linesOnly = ClientSupport.lineFoldingOnly(server.clientCapabilities());
    Integer limit = ClientSupport.foldingRangeLimit(server.clientCapabilities());
    return server.requests.atPosition(
        "textDocument/foldingRange",
        params.getTextDocument().getUri(),
        null,
        List.of(),
        at -> {
          List<FoldingRange> out = new ArrayList<>();
          for (FoldingRangeInfo f : server.answers.foldingRanges(at.result(), at.path())) {
            FoldingRange range =
                ProtocolAnswers.foldingRange(at.convert(), at.source(), f, linesOnly);
            if (range != null && (limit == null || out.size() < limit)) {
              out.add(range);
            }
          }
          return out;
        });
  }

  @Override
  public CompletableFuture<List<DocumentLink>> documentLink(DocumentLinkParams params) {
    return server.requests.atPosition(
        "textDocument/documentLink",
        params.getTextDocument().getUri(),
        null,
        List.of(),
        at -> {
          List<DocumentLink> out = new ArrayList<>();
          for (DocumentLinkInfo link : server.answers.documentLinks(at.result(), at.path())) {
            out.add(ProtocolAnswers.documentLink(at.convert(), at.source(), link));
          }
          return out;
        });
  }

  @Override
  public CompletableFuture<List<Either<Command, CodeAction>>> codeAction(CodeActionParams params) {
    var caps = server.clientCapabilities();
    boolean literals = ClientSupport.codeActionLiterals(caps);
    boolean preferred = ClientSupport.preferredCodeActions(caps);
    boolean documentChanges = ClientSupport.documentChanges(caps);
    Range range = params.getRange();
    List<String> only = params.getContext() == null ? null : params.getContext().getOnly();
    return server.requests.atPosition(
        "textDocument/codeAction",
        params.getTextDocument().getUri(),
        null,
        List.of(),
        at -> {
          if (!literals) {
            return List.of(); // such a client could only take commands, and a fix is an edit
          }
          int start = range == null ? 0 : at.convert().offset(at.source(), range.getStart());
          int end = range == null ? start : at.convert().offset(at.source(), range.getEnd());
          List<Either<Command, CodeAction>> out = new ArrayList<>();
          for (CodeActionInfo a :
              server.answers.codeActions(
                  at.result(),
                  at.path(),
                  new TextRange(Math.min(start, end), Math.max(start, end)))) {
            if (ProtocolAnswers.kindRequested(a.kind(), only)
                && a.edits().keySet().stream().allMatch(this::editable)) {
              out.add(
                  Either.forRight(
                      ProtocolAnswers.codeAction(
                          at.convert(),
                          a,
                          at.result().files()::get,
                          file -> at.versions().get(file),
                          documentChanges,
                          preferred)));
            }
          }
          return out;
        });
  }

  // ---- formatting: from the buffer as the request found it, never waiting for a check ----

  @Override
  public CompletableFuture<List<? extends TextEdit>> formatting(DocumentFormattingParams params) {
    Optional<Documents.Doc> doc = server.documents.get(params.getTextDocument().getUri());
    FormattingOptions options = params.getOptions();
    return server.requests.answer(
        "textDocument/formatting",
        null,
        (snapshot, none) -> {
          if (doc.isEmpty()) {
            return List.of();
          }
          SourceFile source = new SourceFile(doc.get().path(), doc.get().text());
          return server
              .convert()
              .textEdits(source, Formatter.edits(source, Convert.formatOptions(options)));
        });
  }

  @Override
  public CompletableFuture<List<? extends TextEdit>> rangeFormatting(
      DocumentRangeFormattingParams params) {
    Optional<Documents.Doc> doc = server.documents.get(params.getTextDocument().getUri());
    FormattingOptions options = params.getOptions();
    int[] lines = Convert.lines(params.getRange());
    return server.requests.answer(
        "textDocument/rangeFormatting",
        null,
        (snapshot, none) -> {
          if (doc.isEmpty()) {
            return List.of();
          }
          SourceFile source = new SourceFile(doc.get().path(), doc.get().text());
          Optional<String> formatted = Formatter.format(source, Convert.formatOptions(options));
          if (formatted.isEmpty() || formatted.get().equals(source.text())) {
            return List.of();
          }
          return server
              .convert()
              .textEdits(
                  source,
                  FormatHunks.within(
                      source.path(), source.text(), formatted.get(), lines[0], lines[1]));
        });
  }
}
