package jonquil.lsp;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
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

/**
 * Editor answers that know nothing, so the server runs before the compiler's answers are wired in.
 */
public final class NoAnswers implements EditorAnswers {
  @Override
  public Optional<HoverInfo> hover(Result result, Path file, int offset) {
    return Optional.empty();
  }

  @Override
  public List<Location> definition(Result result, Path file, int offset) {
    return List.of();
  }

  @Override
  public List<Location> references(
      Result result, Path file, int offset, boolean includeDeclaration) {
    return List.of();
  }

  @Override
  public Optional<TextRange> prepareRename(Result result, Path file, int offset) {
    return Optional.empty();
  }

  @Override
  public RenameResult rename(Result result, Path file, int offset, String newName) {
    return new RenameResult(Map.of(), "nothing to rename here");
  }

  @Override
  public List<SymbolInfo> documentSymbols(Result result, Path file) {
    return List.of();
  }

  @Override
  public List<FoundSymbol> workspaceSymbols(Result result, String query) {
    return List.of();
  }

  @Override
  public List<CompletionItemInfo> completions(Result result, Path file, int offset) {
    return List.of();
  }

  @Override
  public List<SemanticToken> semanticTokens(Result result, Path file) {
    return List.of();
  }

  @Override
  public List<InlayHint> inlayHints(Result result, Path file, int start, int end) {
    return List.of();
  }

  @Override
  public List<FoldingRangeInfo> foldingRanges(Result result, Path file) {
    return List.of();
  }

  @Override
  public List<DocumentLinkInfo> documentLinks(Result result, Path file) {
    return List.of();
  }

  @Override
  public List<CodeActionInfo> codeActions(Result result, Path file, TextRange range) {
    return List.of();
  }
}
