package jonquil.lsp;

import java.util.List;
import java.util.concurrent.CompletableFuture;
import org.eclipse.lsp4j.CodeAction;
import org.eclipse.lsp4j.CodeActionParams;
import org.eclipse.lsp4j.Command;
import org.eclipse.lsp4j.CompletionItem;
import org.eclipse.lsp4j.CompletionList;
import org.eclipse.lsp4j.CompletionParams;
import org.eclipse.lsp4j.DefinitionParams;
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
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.WorkspaceEdit;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.eclipse.lsp4j.jsonrpc.messages.Either3;
import org.eclipse.lsp4j.services.TextDocumentService;

/** The textDocument/* methods as LSP4J names them, each handed to the class that holds its job. */
final class JonquilTextDocumentService implements TextDocumentService {
  private final SemanticTokenRequests tokens;
  private final DocumentSync sync;
  private final DisplayRequests display;
  private final NavigationRequests navigation;
  private final RenameRequests renames;
  private final CompletionRequests completions;
  private final InlayHintRequests hints;
  private final CodeActionRequests actions;
  private final FormattingRequests formatting;

  JonquilTextDocumentService(JonquilLanguageServer server) {
    this.tokens = new SemanticTokenRequests(server);
    this.sync = new DocumentSync(server, tokens::forget);
    this.display = new DisplayRequests(server);
    this.navigation = new NavigationRequests(server);
    this.renames = new RenameRequests(server);
    this.completions = new CompletionRequests(server);
    this.hints = new InlayHintRequests(server);
    this.actions = new CodeActionRequests(server);
    this.formatting = new FormattingRequests(server);
  }

  @Override
  public void didOpen(DidOpenTextDocumentParams params) {
    sync.didOpen(params);
  }

  @Override
  public void didChange(DidChangeTextDocumentParams params) {
    sync.didChange(params);
  }

  @Override
  public void didSave(DidSaveTextDocumentParams params) {
    // The open buffer is already what the checker reads; saving changes nothing for it.
  }

  @Override
  public void didClose(DidCloseTextDocumentParams params) {
    sync.didClose(params);
  }

  @Override
  public CompletableFuture<DocumentDiagnosticReport> diagnostic(DocumentDiagnosticParams params) {
    return display.diagnostic(params);
  }

  @Override
  public CompletableFuture<Hover> hover(HoverParams params) {
    return display.hover(params);
  }

  @Override
  public CompletableFuture<List<FoldingRange>> foldingRange(FoldingRangeRequestParams params) {
    return display.foldingRange(params);
  }

  @Override
  public CompletableFuture<List<InlayHint>> inlayHint(InlayHintParams params) {
    return hints.inlayHint(params);
  }

  @Override
  public CompletableFuture<SemanticTokens> semanticTokensFull(SemanticTokensParams params) {
    return tokens.full(params);
  }

  @Override
  public CompletableFuture<Either<SemanticTokens, SemanticTokensDelta>> semanticTokensFullDelta(
      SemanticTokensDeltaParams params) {
    return tokens.delta(params);
  }

  @Override
  public CompletableFuture<InlayHint> resolveInlayHint(InlayHint unresolved) {
    return hints.resolve(unresolved);
  }

  @Override
  public CompletableFuture<Either<List<? extends Location>, List<? extends LocationLink>>>
      definition(DefinitionParams params) {
    return navigation.definition(params);
  }

  @Override
  public CompletableFuture<List<? extends Location>> references(ReferenceParams params) {
    return navigation.references(params);
  }

  @Override
  public CompletableFuture<List<Either<SymbolInformation, DocumentSymbol>>> documentSymbol(
      DocumentSymbolParams params) {
    return navigation.documentSymbol(params);
  }

  @Override
  public CompletableFuture<List<DocumentLink>> documentLink(DocumentLinkParams params) {
    return navigation.documentLink(params);
  }

  @Override
  public CompletableFuture<Either3<Range, PrepareRenameResult, PrepareRenameDefaultBehavior>>
      prepareRename(PrepareRenameParams params) {
    return renames.prepareRename(params);
  }

  @Override
  public CompletableFuture<WorkspaceEdit> rename(RenameParams params) {
    return renames.rename(params);
  }

  @Override
  public CompletableFuture<Either<List<CompletionItem>, CompletionList>> completion(
      CompletionParams params) {
    return completions.completion(params);
  }

  @Override
  public CompletableFuture<List<Either<Command, CodeAction>>> codeAction(CodeActionParams params) {
    return actions.codeAction(params);
  }

  @Override
  public CompletableFuture<CompletionItem> resolveCompletionItem(CompletionItem unresolved) {
    return completions.resolveCompletionItem(unresolved);
  }

  @Override
  public CompletableFuture<List<? extends TextEdit>> formatting(DocumentFormattingParams params) {
    return formatting.formatting(params);
  }

  @Override
  public CompletableFuture<List<? extends TextEdit>> rangeFormatting(
      DocumentRangeFormattingParams params) {
    return formatting.rangeFormatting(params);
  }
}
