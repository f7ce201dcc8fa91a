package jonquil.lsp;

import java.nio.file.Path;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import jonquil.Result;
import jonquil.ide.CodeActionInfo;
import jonquil.ide.CompletionItemInfo;
import jonquil.ide.DocumentLinkInfo;
import jonquil.ide.EditorFeatures;
import jonquil.ide.FileIndex;
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
 * Editor features for the server's tests: with no others given it knows nothing (so the server runs
 * without the compiler's answers), else it forwards to them; a test overrides the one answer it is
 * about. Knowing nothing, the index-aware references and rename go through the plain ones, so an
 * override of those is what the server gets.
 */
class StandIn implements EditorFeatures {
  private final EditorFeatures to;

  /** Knows nothing. */
  StandIn() {
    this(null);
  }

  /** Forwards every question to {@code to}. */
  StandIn(EditorFeatures to) {
    this.to = to;
  }

  @Override
  public Optional<HoverInfo> hover(Result result, Path file, int offset) {
    return to == null ? Optional.empty() : to.hover(result, file, offset);
  }

  @Override
  public List<Location> definition(Result result, Path file, int offset) {
    return to == null ? List.of() : to.definition(result, file, offset);
  }

  @Override
  public List<Location> references(
      Result result, Path file, int offset, boolean includeDeclaration) {
    return to == null ? List.of() : to.references(result, file, offset, includeDeclaration);
  }

  @Override
  public List<Location> references(
      Result result,
      Path file,
      int offset,
      boolean includeDeclaration,
      Collection<FileIndex> elsewhere) {
    return to == null
        ? references(result, file, offset, includeDeclaration)
        : to.references(result, file, offset, includeDeclaration, elsewhere);
  }

  @Override
  public Optional<TextRange> prepareRename(Result result, Path file, int offset) {
    return to == null ? Optional.empty() : to.prepareRename(result, file, offset);
  }

  @Override
  public RenameResult rename(Result result, Path file, int offset, String newName) {
    return to == null
        ? new RenameResult(Map.of(), "nothing to rename here")
        : to.rename(result, file, offset, newName);
  }

  @Override
  public RenameResult rename(
      Result result, Path file, int offset, String newName, Collection<FileIndex> elsewhere) {
    return to == null
        ? rename(result, file, offset, newName)
        : to.rename(result, file, offset, newName, elsewhere);
  }

  @Override
  public List<SymbolInfo> documentSymbols(Result result, Path file) {
    return to == null ? List.of() : to.documentSymbols(result, file);
  }

  @Override
  public List<FoundSymbol> workspaceSymbols(Result result, String query) {
    return to == null ? List.of() : to.workspaceSymbols(result, query);
  }

  @Override
  public List<FoundSymbol> workspaceSymbols(Collection<FileIndex> indexed, String query) {
    return to == null ? List.of() : to.workspaceSymbols(indexed, query);
  }

  @Override
  public Optional<FileIndex> index(Result result, Path file) {
    return to == null ? Optional.empty() : to.index(result, file);
  }

  @Override
  public List<CompletionItemInfo> completions(Result result, Path file, int offset) {
    return to == null ? List.of() : to.completions(result, file, offset);
  }

  @Override
  public List<SemanticToken> semanticTokens(Result result, Path file) {
    return to == null ? List.of() : to.semanticTokens(result, file);
  }

  @Override
  public List<InlayHint> inlayHints(Result result, Path file, int start, int end) {
    return to == null ? List.of() : to.inlayHints(result, file, start, end);
  }

  @Override
  public List<FoldingRangeInfo> foldingRanges(Result result, Path file) {
    return to == null ? List.of() : to.foldingRanges(result, file);
  }

  @Override
  public List<DocumentLinkInfo> documentLinks(Result result, Path file) {
    return to == null ? List.of() : to.documentLinks(result, file);
  }

  @Override
  public List<CodeActionInfo> codeActions(Result result, Path file, TextRange range) {
    return to == null ? List.of() : to.codeActions(result, file, range);
  }
}
