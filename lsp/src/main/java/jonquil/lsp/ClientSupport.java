package jonquil.lsp;

import java.util.List;
import java.util.Optional;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.CodeActionCapabilities;
import org.eclipse.lsp4j.CompletionCapabilities;
import org.eclipse.lsp4j.CompletionItemCapabilities;
import org.eclipse.lsp4j.CompletionItemResolveSupportCapabilities;
import org.eclipse.lsp4j.DefinitionCapabilities;
import org.eclipse.lsp4j.DidChangeWatchedFilesCapabilities;
import org.eclipse.lsp4j.DocumentSymbolCapabilities;
import org.eclipse.lsp4j.FoldingRangeCapabilities;
import org.eclipse.lsp4j.HoverCapabilities;
import org.eclipse.lsp4j.InlayHintCapabilities;
import org.eclipse.lsp4j.InlayHintResolveSupportCapabilities;
import org.eclipse.lsp4j.RenameCapabilities;
import org.eclipse.lsp4j.SemanticTokensCapabilities;
import org.eclipse.lsp4j.TextDocumentClientCapabilities;
import org.eclipse.lsp4j.WindowClientCapabilities;
import org.eclipse.lsp4j.WorkspaceClientCapabilities;
import org.eclipse.lsp4j.WorkspaceEditCapabilities;

/** What the client said it supports, read once from its capabilities at initialize. */
record ClientSupport(
    boolean prepareRename,
    boolean definitionLinks,
    boolean hierarchicalSymbols,
    boolean lineFoldingOnly,
    boolean preferredCodeActions,
    boolean workDoneProgress,
    boolean watchedFilesRegistration,
    boolean documentChanges,
    // pulls document diagnostics (textDocument/diagnostic), so they are not pushed to it
    boolean pullDiagnostics,
    boolean codeActionLiterals,
    // the most folding ranges it wants, or null when it sets no limit
    Integer foldingRangeLimit,
    boolean markdownHover,
    // resolves completion items, documentation included; inlay hints, tooltips included
    boolean lazyCompletionDocumentation,
    boolean lazyInlayHintTooltips,
    List<String> semanticTokenTypes) {

  ClientSupport {
    semanticTokenTypes = List.copyOf(semanticTokenTypes);
  }

  /** Reads {@code c}, which may be null or omit any part: what a client omits, it lacks. */
  static ClientSupport of(ClientCapabilities c) {
    Optional<ClientCapabilities> all = Optional.ofNullable(c);
    Optional<TextDocumentClientCapabilities> text = all.map(ClientCapabilities::getTextDocument);
    Optional<WorkspaceClientCapabilities> workspace = all.map(ClientCapabilities::getWorkspace);
    var rename = text.map(TextDocumentClientCapabilities::getRename);
    var definition = text.map(TextDocumentClientCapabilities::getDefinition);
    var symbols = text.map(TextDocumentClientCapabilities::getDocumentSymbol);
    var folding = text.map(TextDocumentClientCapabilities::getFoldingRange);
    var codeAction = text.map(TextDocumentClientCapabilities::getCodeAction);
    var window = all.map(ClientCapabilities::getWindow);
    var watching = workspace.map(WorkspaceClientCapabilities::getDidChangeWatchedFiles);
    var edits = workspace.map(WorkspaceClientCapabilities::getWorkspaceEdit);
    var completionResolve =
        text.map(TextDocumentClientCapabilities::getCompletion)
            .map(CompletionCapabilities::getCompletionItem)
            .map(CompletionItemCapabilities::getResolveSupport)
            .map(CompletionItemResolveSupportCapabilities::getProperties);
    var hintResolve =
        text.map(TextDocumentClientCapabilities::getInlayHint)
            .map(InlayHintCapabilities::getResolveSupport)
            .map(InlayHintResolveSupportCapabilities::getProperties);
    return new ClientSupport(
        yes(rename.map(RenameCapabilities::getPrepareSupport)),
        yes(definition.map(DefinitionCapabilities::getLinkSupport)),
        yes(symbols.map(DocumentSymbolCapabilities::getHierarchicalDocumentSymbolSupport)),
        yes(folding.map(FoldingRangeCapabilities::getLineFoldingOnly)),
        yes(codeAction.map(CodeActionCapabilities::getIsPreferredSupport)),
        yes(window.map(WindowClientCapabilities::getWorkDoneProgress)),
        yes(watching.map(DidChangeWatchedFilesCapabilities::getDynamicRegistration)),
        yes(edits.map(WorkspaceEditCapabilities::getDocumentChanges)),
        text.map(TextDocumentClientCapabilities::getDiagnostic).isPresent(),
        codeAction.map(CodeActionCapabilities::getCodeActionLiteralSupport).isPresent(),
        folding.map(FoldingRangeCapabilities::getRangeLimit).orElse(null),
        listed(
                text.map(TextDocumentClientCapabilities::getHover)
                    .map(HoverCapabilities::getContentFormat))
            .contains("markdown"),
        listed(completionResolve).contains("documentation"),
        listed(hintResolve).contains("tooltip"),
        listed(
            text.map(TextDocumentClientCapabilities::getSemanticTokens)
                .map(SemanticTokensCapabilities::getTokenTypes)));
  }

  /** The client names this token type among those it knows. */
  boolean semanticTokenType(String type) {
    return semanticTokenTypes.contains(type);
  }

  /** True only when the client says true. */
  private static boolean yes(Optional<Boolean> flag) {
    return flag.orElse(false);
  }

  /** A list the client sent, empty when it sent none. */
  private static List<String> listed(Optional<List<String>> values) {
    return values.orElse(List.of());
  }
}
