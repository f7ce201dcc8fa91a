package jonquil.lsp;

import java.nio.file.Path;
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
import jonquil.ide.InlayHint;
import jonquil.ide.Location;
import jonquil.ide.RenameResult;
import jonquil.ide.SemanticToken;
import jonquil.ide.SymbolInfo;
import jonquil.source.TextRange;

/**
 * What the server asks the compiler's editor answers (jonquil.ide), in compiler types and UTF-16
 * offsets, so the protocol layer computes nothing; an interface so tests can stand in.
 */
public interface EditorAnswers {

  Optional<HoverInfo> hover(Result result, Path file, int offset);

  List<Location> definition(Result result, Path file, int offset);

  List<Location> references(Result result, Path file, int offset, boolean includeDeclaration);

  Optional<TextRange> prepareRename(Result result, Path file, int offset);

  RenameResult rename(Result result, Path file, int offset, String newName);

  List<SymbolInfo> documentSymbols(Result result, Path file);

  List<FoundSymbol> workspaceSymbols(Result result, String query);

  /** What may be written at the offset; {@code result} must have read the text the editor shows. */
  List<CompletionItemInfo> completions(Result result, Path file, int offset);

  /** The file's classified spans, sorted by start and never overlapping. */
  List<SemanticToken> semanticTokens(Result result, Path file);

  /** Hints for the train steps that end within [start, end]. */
  List<InlayHint> inlayHints(Result result, Path file, int start, int end);

  List<FoldingRangeInfo> foldingRanges(Result result, Path file);

  List<DocumentLinkInfo> documentLinks(Result result, Path file);

  /** Quick fixes for the file's diagnostics that overlap the range. */
  List<CodeActionInfo> codeActions(Result result, Path file, TextRange range);

  // ---- the workspace index: stand-ins that know nothing index nothing ----

  /**
   * What the workspace index keeps of a file that {@code result} checked as a root; empty when
   * nothing is known.
   */
  default Optional<FileIndex> index(Result result, Path file) {
    return Optional.empty();
  }

  /** Declarations of indexed files matching the query, capped. */
  default List<FoundSymbol> workspaceSymbols(Collection<FileIndex> indexed, String query) {
    return List.of();
  }

  /** The references in {@code result}, and in the indexed files it did not read. */
  default List<Location> references(
      Result result,
      Path file,
      int offset,
      boolean includeDeclaration,
      Collection<FileIndex> elsewhere) {
    return references(result, file, offset, includeDeclaration);
  }

  /** A rename's edits in {@code result}, and in the indexed files it did not read. */
  default RenameResult rename(
      Result result, Path file, int offset, String newName, Collection<FileIndex> elsewhere) {
    return rename(result, file, offset, newName);
  }
}
