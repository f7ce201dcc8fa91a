package jonquil.lsp;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Optional;
import jonquil.Result;
import jonquil.ide.CodeActionInfo;
import jonquil.ide.CompletionItemInfo;
import jonquil.ide.DocumentLinkInfo;
import jonquil.ide.FileIndex;
import jonquil.ide.FoldingRangeInfo;
import jonquil.ide.FoundSymbol;
import jonquil.ide.HoverInfo;
import jonquil.ide.Ide;
import jonquil.ide.InlayHint;
import jonquil.ide.Location;
import jonquil.ide.RenameResult;
import jonquil.ide.SemanticToken;
import jonquil.ide.SymbolInfo;
import jonquil.source.TextRange;

/** The real editor answers: each call goes straight to the compiler's jonquil.ide. */
final class IdeAnswers implements EditorAnswers {
  @Override
  public Optional<HoverInfo> hover(Result result, Path file, int offset) {
    return Ide.hover(result, file, offset);
  }

  @Override
  public List<Location> definition(Result result, Path file, int offset) {
    return Ide.definition(result, file, offset);
  }

  @Override
  public List<Location> references(
      Result result, Path file, int offset, boolean includeDeclaration) {
    return Ide.references(result, file, offset, includeDeclaration);
  }

  @Override
  public Optional<TextRange> prepareRename(Result result, Path file, int offset) {
    return Ide.prepareRename(result, file, offset);
  }

  @Override
  public RenameResult rename(Result result, Path file, int offset, String newName) {
    return Ide.rename(result, file, offset, newName);
  }

  @Override
  public List<SymbolInfo> documentSymbols(Result result, Path file) {
    return Ide.documentSymbols(result, file);
  }

  @Override
  public List<FoundSymbol> workspaceSymbols(Result result, String query) {
    List<SymbolInfo> symbols = Ide.workspaceSymbols(result, query);
    List<Location> places = Ide.workspaceSymbolLocations(result, query);
    List<FoundSymbol> out = new ArrayList<>();
    for (int i = 0; i < symbols.size() && i < places.size(); i++) {
      out.add(new FoundSymbol(places.get(i).file(), symbols.get(i)));
    }
    return out;
  }

  @Override
  public Optional<FileIndex> index(Result result, Path file) {
    return Ide.index(result, file);
  }

  @Override
  public List<FoundSymbol> workspaceSymbols(Collection<FileIndex> indexed, String query) {
    return Ide.workspaceSymbols(indexed, query);
  }

  @Override
  public List<Location> references(
      Result result,
      Path file,
      int offset,
      boolean includeDeclaration,
      Collection<FileIndex> elsewhere) {
    return Ide.references(result, file, offset, includeDeclaration, elsewhere);
  }

  @Override
  public RenameResult rename(
      Result result, Path file, int offset, String newName, Collection<FileIndex> elsewhere) {
    return Ide.rename(result, file, offset, newName, elsewhere);
  }

  @Override
  public List<CompletionItemInfo> completions(Result result, Path file, int offset) {
    return Ide.completions(result, file, offset);
  }

  @Override
  public List<SemanticToken> semanticTokens(Result result, Path file) {
    return Ide.semanticTokens(result, file);
  }

  @Override
  public List<InlayHint> inlayHints(Result result, Path file, int start, int end) {
    return Ide.inlayHints(result, file, start, end);
  }

  @Override
  public List<FoldingRangeInfo> foldingRanges(Result result, Path file) {
    return Ide.foldingRanges(result, file);
  }

  @Override
  public List<DocumentLinkInfo> documentLinks(Result result, Path file) {
    return Ide.documentLinks(result, file);
  }

  @Override
  public List<CodeActionInfo> codeActions(Result result, Path file, TextRange range) {
    return Ide.codeActions(result, file, range);
  }
}
