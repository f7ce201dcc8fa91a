package jonquil.ide;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Optional;
import jonquil.Result;
import jonquil.source.TextRange;

/** The editor features computed from the check result: each goes to the class that answers it. */
final class StandardEditorFeatures implements EditorFeatures {
  static final StandardEditorFeatures INSTANCE = new StandardEditorFeatures();

  private StandardEditorFeatures() {}

  @Override
  public Optional<HoverInfo> hover(Result r, Path file, int offset) {
    return Hover.at(r, OwningModels.norm(file), offset);
  }

  @Override
  public List<Location> definition(Result r, Path file, int offset) {
    Path f = OwningModels.norm(file);
    Optional<SymbolUses.Occurrence> at = SymbolUses.of(r).at(f, offset);
    if (at.isPresent()) {
      var s = at.get().symbol();
      if (s.isCatalog() || s.nameNode().isEmpty()) {
        return List.of();
      }
      return List.of(new Location(s.file(), s.nameNode().get().range()));
    }
    return OwningModels.tree(r, f)
        .flatMap(tree -> NodeAtCursor.use(tree, offset))
        .map(u -> UseTarget.of(f, u.target()))
        .filter(target -> r.files().containsKey(target))
        .map(target -> List.of(new Location(target, TextRange.EMPTY)))
        .orElse(List.of());
  }

  @Override
  public List<Location> references(Result r, Path file, int offset, boolean includeDeclaration) {
    SymbolUses names = SymbolUses.of(r);
    Optional<SymbolUses.Occurrence> at = names.at(OwningModels.norm(file), offset);
    if (at.isEmpty()) {
      return List.of();
    }
    List<Location> out = new ArrayList<>();
    for (SymbolUses.Occurrence o : names.of(at.get().key())) {
      if (includeDeclaration || !o.declaration()) {
        out.add(new Location(o.file(), o.range()));
      }
    }
    return out;
  }

  @Override
  public List<Location> references(
      Result r,
      Path file,
      int offset,
      boolean includeDeclaration,
      Collection<FileIndex> elsewhere) {
    return CrossFileNavigation.references(
        r, OwningModels.norm(file), offset, includeDeclaration, elsewhere);
  }

  @Override
  public Optional<TextRange> prepareRename(Result r, Path file, int offset) {
    return Renamer.renamable(SymbolUses.of(r), OwningModels.norm(file), offset)
        .map(SymbolUses.Occurrence::range);
  }

  @Override
  public RenameResult rename(Result r, Path file, int offset, String newName) {
    return Renamer.rename(r, OwningModels.norm(file), offset, newName);
  }

  @Override
  public RenameResult rename(
      Result r, Path file, int offset, String newName, Collection<FileIndex> elsewhere) {
    return CrossFileNavigation.rename(r, OwningModels.norm(file), offset, newName, elsewhere);
  }

  @Override
  public List<SymbolInfo> documentSymbols(Result r, Path file) {
    return Outline.of(r, OwningModels.norm(file));
  }

  @Override
  public List<FoundSymbol> workspaceSymbols(Result r, String query) {
    return Outline.search(r, query);
  }

  @Override
  public List<FoundSymbol> workspaceSymbols(Collection<FileIndex> indexed, String query) {
    return Outline.search(indexed, query);
  }

  @Override
  public Optional<FileIndex> index(Result r, Path file) {
    return CrossFileNavigation.index(r, OwningModels.norm(file));
  }

  @Override
  public List<CompletionItemInfo> completions(Result r, Path file, int offset) {
    return Completions.at(r, OwningModels.norm(file), offset);
  }

  @Override
  public List<SemanticToken> semanticTokens(Result r, Path file) {
    return SemanticTokens.of(r, OwningModels.norm(file));
  }

  @Override
  public List<InlayHint> inlayHints(Result r, Path file, int start, int end) {
    return InlayHints.of(r, OwningModels.norm(file), start, end);
  }

  @Override
  public List<FoldingRangeInfo> foldingRanges(Result r, Path file) {
    return Folding.of(r, OwningModels.norm(file));
  }

  @Override
  public List<DocumentLinkInfo> documentLinks(Result r, Path file) {
    return DocumentLinks.of(r, OwningModels.norm(file));
  }

  @Override
  public List<CodeActionInfo> codeActions(Result r, Path file, TextRange range) {
    return CodeActions.of(r, OwningModels.norm(file), range);
  }
}
