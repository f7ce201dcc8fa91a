package jonquil.ide;

import java.nio.file.Path;
import java.util.Collection;
import java.util.List;
import java.util.Optional;
import jonquil.Result;
import jonquil.source.TextRange;

/**
 * The editor features (hover, navigation, rename, symbols, completion, highlighting, hints,
 * folding, links, quick fixes, the workspace index's entries) answered from one check {@link
 * Result} in plain records and UTF-16 offsets, so a language server only translates them; an
 * interface so a server's tests can stand in for it. {@link #standard()} gives the real answers.
 */
public interface EditorFeatures {

  /** The answers computed from the check result, as the language server and the tests use them. */
  static EditorFeatures standard() {
    return StandardEditorFeatures.INSTANCE;
  }

  Optional<HoverInfo> hover(Result result, Path file, int offset);

  List<Location> definition(Result result, Path file, int offset);

  List<Location> references(Result result, Path file, int offset, boolean includeDeclaration);

  /**
   * As {@link #references(Result, Path, int, boolean)}, and also the uses in indexed files that
   * {@code result} did not read (a file using a part library that no open file uses).
   */
  List<Location> references(
      Result result,
      Path file,
      int offset,
      boolean includeDeclaration,
      Collection<FileIndex> elsewhere);

  Optional<TextRange> prepareRename(Result result, Path file, int offset);

  RenameResult rename(Result result, Path file, int offset, String newName);

  /**
   * As {@link #rename(Result, Path, int, String)}, and also the uses in indexed files that {@code
   * result} did not read; refused when the new name is already visible in one of them.
   */
  RenameResult rename(
      Result result, Path file, int offset, String newName, Collection<FileIndex> elsewhere);

  List<SymbolInfo> documentSymbols(Result result, Path file);

  /** The declarations of the files {@code result} read whose name contains the query, capped. */
  List<FoundSymbol> workspaceSymbols(Result result, String query);

  /**
   * The declarations of indexed files whose name contains the query (ignoring case), by path,
   * capped.
   */
  List<FoundSymbol> workspaceSymbols(Collection<FileIndex> indexed, String query);

  /**
   * What a workspace index keeps of a file that {@code result} checked as a root (see {@link
   * FileIndex}); empty when {@code result} did not read it as a spec.
   */
  Optional<FileIndex> index(Result result, Path file);

  /**
   * What may be written at the offset: kinds, parameters, names, ports, materials, units, measures
   * and keywords, read from the text before the cursor (however broken) and the names of {@code
   * result}, which must have read the text the editor shows.
   */
  List<CompletionItemInfo> completions(Result result, Path file, int offset);

  /** Every classified span of the file, sorted by start and never overlapping. */
  List<SemanticToken> semanticTokens(Result result, Path file);

  /**
   * The power leaving each element step of the file's train paths, for steps ending within [start,
   * end].
   */
  List<InlayHint> inlayHints(Result result, Path file, int start, int end);

  List<FoldingRangeInfo> foldingRanges(Result result, Path file);

  /** The {@code use} and {@code table} strings that name files that exist. */
  List<DocumentLinkInfo> documentLinks(Result result, Path file);

  /**
   * Quick fixes for the diagnostics of the file that overlap the range; the first of each
   * diagnostic is preferred.
   */
  List<CodeActionInfo> codeActions(Result result, Path file, TextRange range);
}
