package jonquil.lsp;

import org.eclipse.lsp4j.ClientCapabilities;

/** Null-safe reads of optional client capabilities (clients omit what they do not support). */
final class ClientSupport {
  private ClientSupport() {}

  static boolean prepareRename(ClientCapabilities c) {
    return c != null
        && c.getTextDocument() != null
        && c.getTextDocument().getRename() != null
        && Boolean.TRUE.equals(c.getTextDocument().getRename().getPrepareSupport());
  }

  static boolean markdownHover(ClientCapabilities c) {
    return c != null
        && c.getTextDocument() != null
        && c.getTextDocument().getHover() != null
        && c.getTextDocument().getHover().getContentFormat() != null
        && c.getTextDocument().getHover().getContentFormat().contains("markdown");
  }

  /**
   * The client pulls document diagnostics (textDocument/diagnostic), so they are not pushed to it.
   */
  static boolean pullDiagnostics(ClientCapabilities c) {
    return c != null && c.getTextDocument() != null && c.getTextDocument().getDiagnostic() != null;
  }

  static boolean definitionLinks(ClientCapabilities c) {
    return c != null
        && c.getTextDocument() != null
        && c.getTextDocument().getDefinition() != null
        && Boolean.TRUE.equals(c.getTextDocument().getDefinition().getLinkSupport());
  }

  static boolean hierarchicalSymbols(ClientCapabilities c) {
    return c != null
        && c.getTextDocument() != null
        && c.getTextDocument().getDocumentSymbol() != null
        && Boolean.TRUE.equals(
            c.getTextDocument().getDocumentSymbol().getHierarchicalDocumentSymbolSupport());
  }

  static boolean workDoneProgress(ClientCapabilities c) {
    return c != null
        && c.getWindow() != null
        && Boolean.TRUE.equals(c.getWindow().getWorkDoneProgress());
  }

  static boolean watchedFilesRegistration(ClientCapabilities c) {
    return c != null
        && c.getWorkspace() != null
        && c.getWorkspace().getDidChangeWatchedFiles() != null
        && Boolean.TRUE.equals(
            c.getWorkspace().getDidChangeWatchedFiles().getDynamicRegistration());
  }

  /** The client resolves completion items lazily and takes their documentation that way. */
  static boolean lazyCompletionDocumentation(ClientCapabilities c) {
    return c != null
        && c.getTextDocument() != null
        && c.getTextDocument().getCompletion() != null
        && c.getTextDocument().getCompletion().getCompletionItem() != null
        && c.getTextDocument().getCompletion().getCompletionItem().getResolveSupport() != null
        && c.getTextDocument()
                .getCompletion()
                .getCompletionItem()
                .getResolveSupport()
                .getProperties()
            != null
        && c.getTextDocument()
            .getCompletion()
            .getCompletionItem()
            .getResolveSupport()
            .getProperties()
            .contains("documentation");
  }

  /** The client resolves inlay hints lazily and takes their tooltips that way. */
  static boolean lazyInlayHintTooltips(ClientCapabilities c) {
    return c != null
        && c.getTextDocument() != null
        && c.getTextDocument().getInlayHint() != null
        && c.getTextDocument().getInlayHint().getResolveSupport() != null
        && c.getTextDocument().getInlayHint().getResolveSupport().getProperties() != null
        && c.getTextDocument()
            .getInlayHint()
            .getResolveSupport()
            .getProperties()
            .contains("tooltip");
  }

  /** The client names this token type among those it knows. */
  static boolean semanticTokenType(ClientCapabilities c, String type) {
    return c != null
        && c.getTextDocument() != null
        && c.getTextDocument().getSemanticTokens() != null
        && c.getTextDocument().getSemanticTokens().getTokenTypes() != null
        && c.getTextDocument().getSemanticTokens().getTokenTypes().contains(type);
  }

  static boolean lineFoldingOnly(ClientCapabilities c) {
    return c != null
        && c.getTextDocument() != null
        && c.getTextDocument().getFoldingRange() != null
        && Boolean.TRUE.equals(c.getTextDocument().getFoldingRange().getLineFoldingOnly());
  }

  /** The most folding ranges the client wants, or null when it sets no limit. */
  static Integer foldingRangeLimit(ClientCapabilities c) {
    return c == null || c.getTextDocument() == null || c.getTextDocument().getFoldingRange() == null
        ? null
        : c.getTextDocument().getFoldingRange().getRangeLimit();
  }

  static boolean codeActionLiterals(ClientCapabilities c) {
    return c != null
        && c.getTextDocument() != null
        && c.getTextDocument().getCodeAction() != null
        && c.getTextDocument().getCodeAction().getCodeActionLiteralSupport() != null;
  }

  static boolean preferredCodeActions(ClientCapabilities c) {
    return c != null
        && c.getTextDocument() != null
        && c.getTextDocument().getCodeAction() != null
        && Boolean.TRUE.equals(c.getTextDocument().getCodeAction().getIsPreferredSupport());
  }

  static boolean documentChanges(ClientCapabilities c) {
    return c != null
        && c.getWorkspace() != null
        && c.getWorkspace().getWorkspaceEdit() != null
        && Boolean.TRUE.equals(c.getWorkspace().getWorkspaceEdit().getDocumentChanges());
  }
}
