package jonquil.lsp;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import jonquil.Result;
import jonquil.ide.CodeActionInfo;
import jonquil.ide.CompletionItemInfo;
import jonquil.ide.DocumentLinkInfo;
import jonquil.ide.FoldingRangeInfo;
import jonquil.ide.FoundSymbol;
import jonquil.ide.HoverInfo;
import jonquil.ide.InlayHint;
import jonquil.ide.Location;
import jonquil.ide.RenameResult;
import jonquil.ide.SemanticToken;
import jonquil.ide.SymbolInfo;
import jonquil.source.TextRange;

/** Editor answers that forward to another, so a test can override the one answer it is about. */
class Delegating implements EditorAnswers {
  private final EditorAnswers to;

  Delegating(EditorAnswers to) {
    this.to = to;
  }

  @Override
  public Optional<HoverInfo> hover(Result result, Path file, int offset) {
    return to.hover(result, file, offset);
  }

  @Override
  public List<Location> definition(Result result, Path file, int offset) {
    return to.definition(result, file, offset);
  }

  @Override
  public List<Location> references(
      Result result, Path file, int offset, boolean includeDeclaration) {
    return to.references(result, file, offset, includeDeclaration);
  }

  @Override
  public Optional<TextRange> prepareRename(Result result, Path file, int offset) {
    return to.prepareRename(result, file, offset);
  }

  @Override
  public RenameResult rename(Result result, Path file, int offset, String newName) {
    return to.rename(result, file, offset, newName);
  }

  @Override
  public List<SymbolInfo> documentSymbols(Result result, Path file) {
    return to.documentSymbols(result, file);
  }

  @Override
  public List<FoundSymbol> workspaceSymbols(Result result, String query) {
    return to.workspaceSymbols(result, query);
  }

  @Override
  public List<CompletionItemInfo> completions(Result result, Path file, int offset) {
    return to.completions(result, file, offset);
  }

  @Override
  public List<SemanticToken> semanticTokens(Result result, Path file) {
    return to.semanticTokens(result, file);
  }

  @Override
  public List<InlayHint> inlayHints(Result result, Path file, int start, int end) {
    return to.inlayHints(result, file, start, end);
  }

  @Override
  public List<FoldingRangeInfo> foldingRanges(Result result, Path file) {
    return to.foldingRanges(result, file);
  }

  @Override
  public List<DocumentLinkInfo> documentLinks(Result result, Path file) {
    return to.documentLinks(result, file);
  }

  @Override
  public List<CodeActionInfo> codeActions(Result result, Path file, TextRange range) {
    return to.codeActions(result, file, range);
  }

  @Override
  public Optional<jonquil.ide.FileIndex> index(Result result, Path file) {
    return to.index(result, file);
  }

  @Override
  public List<FoundSymbol> workspaceSymbols(
      java.util.Collection<jonquil.ide.FileIndex> indexed, String query) {
    return to.workspaceSymbols(indexed, query);
  }
}
