package jonquil.ide;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import jonquil.Result;
import jonquil.source.TextRange;

/**
 * Answers an editor's questions (hover, navigation, rename, symbols, completion, highlighting,
 * hints, folding, links, quick fixes) from one check {@link Result}, in plain records, so the
 * language server only translates them.
 */
public final class Ide {
  private Ide() {}

  public static Optional<HoverInfo> hover(Result r, Path file, int offset) {
    return Hover.at(r, OwningModels.norm(file), offset);
  }

  public static List<Location> definition(Result r, Path file, int offset) {
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
        .map(u -> useTarget(f, u.target()))
        .filter(target -> r.files().containsKey(target))
        .map(target -> List.of(new Location(target, TextRange.EMPTY)))
        .orElse(List.of());
  }

  public static List<Location> references(
      Result r, Path file, int offset, boolean includeDeclaration) {
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

  public static Optional<TextRange> prepareRename(Result r, Path file, int offset) {
    return Renamer.renamable(SymbolUses.of(r), OwningModels.norm(file), offset)
        .map(SymbolUses.Occurrence::range);
  }

  public static RenameResult rename(Result r, Path file, int offset, String newName) {
    return Renamer.rename(r, OwningModels.norm(file), offset, newName);
  }

  public static List<SymbolInfo> documentSymbols(Result r, Path file) {
    return Outline.of(r, OwningModels.norm(file));
  }

  public static List<SymbolInfo> workspaceSymbols(Result r, String query) {
    return Outline.search(r, query);
  }

  /**
   * The file of each {@link #workspaceSymbols} answer, in the same order: a {@link SymbolInfo}
   * carries no file, and a workspace symbol needs one.
   */
  public static List<Location> workspaceSymbolLocations(Result r, String query) {
    return Outline.searchLocations(r, query);
  }

  /**
   * What a workspace index keeps of a file that {@code r} checked as a root (see {@link
   * FileIndex}); empty when {@code r} did not read it as a spec.
   */
  public static Optional<FileIndex> index(Result r, Path file) {
    return CrossFileNavigation.index(r, OwningModels.norm(file));
  }

  /**
   * The declarations of indexed files whose name contains the query (ignoring case), by path,
   * capped.
   */
  public static List<FoundSymbol> workspaceSymbols(
      java.util.Collection<FileIndex> indexed, String query) {
    return Outline.search(indexed, query);
  }

  /**
   * As {@link #references(Result, Path, int, boolean)}, and also the uses in indexed files that
   * {@code r} did not read (a file using a part library that no open file uses).
   */
  public static List<Location> references(
      Result r,
      Path file,
      int offset,
      boolean includeDeclaration,
      java.util.Collection<FileIndex> elsewhere) {
    return CrossFileNavigation.references(
        r, OwningModels.norm(file), offset, includeDeclaration, elsewhere);
  }

  /**
   * As {@link #rename(Result, Path, int, String)}, and also the uses in indexed files that {@code
   * r} did not read; refused when the new name is already visible in one of them.
   */
  public static RenameResult rename(
      Result r, Path file, int offset, String newName, java.util.Collection<FileIndex> elsewhere) {
    return CrossFileNavigation.rename(r, OwningModels.norm(file), offset, newName, elsewhere);
  }

  /**
   * What may be written at the offset: kinds, parameters, names, ports, materials, units, measures
   * and keywords, read from the text before the cursor (however broken) and the names of this
   * result.
   */
  public static List<CompletionItemInfo> completions(Result r, Path file, int offset) {
    return Completions.at(r, OwningModels.norm(file), offset);
  }

  /** Every classified span of the file, sorted by start and never overlapping. */
  public static List<SemanticToken> semanticTokens(Result r, Path file) {
    return SemanticTokens.of(r, OwningModels.norm(file));
  }

  /**
   * The power leaving each element step of the file's train paths, for steps ending within [start,
   * end].
   */
  public static List<InlayHint> inlayHints(Result r, Path file, int start, int end) {
    return InlayHints.of(r, OwningModels.norm(file), start, end);
  }

  public static List<FoldingRangeInfo> foldingRanges(Result r, Path file) {
    return Folding.of(r, OwningModels.norm(file));
  }

  /** The {@code use} and {@code table} strings that name files that exist. */
  public static List<DocumentLinkInfo> documentLinks(Result r, Path file) {
    return DocumentLinks.of(r, OwningModels.norm(file));
  }

  /**
   * Quick fixes for the diagnostics of the file that overlap the range; the first of each
   * diagnostic is preferred.
   */
  public static List<CodeActionInfo> codeActions(Result r, Path file, TextRange range) {
    return CodeActions.of(r, OwningModels.norm(file), range);
  }

  /** The file a {@code use} line names, relative to the file that contains it. */
  static Path useTarget(Path file, String target) {
    Path dir = file.getParent();
    return OwningModels.norm(dir == null ? Path.of(target) : dir.resolve(target));
  }
}
