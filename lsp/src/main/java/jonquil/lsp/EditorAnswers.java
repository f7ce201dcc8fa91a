package jonquil.lsp;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import jonquil.Result;
import jonquil.diag.Edit;
import jonquil.source.TextRange;

/** What the server asks the compiler's editor answers, in compiler types and UTF-16 offsets, so the protocol layer computes nothing. */
public interface EditorAnswers {

  /** Markdown to show for the thing at an offset, and the range it covers (null when unknown). */
  record HoverInfo(String markdown, TextRange range) {}

  /** A place in a file. */
  record Location(Path file, TextRange range) {}

  /** The edits of a rename, or the reason it cannot be done (then {@code edits} is empty). */
  record RenameResult(Map<Path, List<Edit>> edits, String error) {}

  /** One named thing of a file, with the range of its whole declaration and of its name. */
  record SymbolInfo(String name, String kind, TextRange range, TextRange selectionRange, List<SymbolInfo> children) {}

  /** A symbol together with the file that declares it, as a workspace-wide search returns it. */
  record FileSymbol(Path file, SymbolInfo symbol) {}

  Optional<HoverInfo> hover(Result result, Path file, int offset);

  List<Location> definition(Result result, Path file, int offset);

  List<Location> references(Result result, Path file, int offset, boolean includeDeclaration);

  Optional<TextRange> prepareRename(Result result, Path file, int offset);

  RenameResult rename(Result result, Path file, int offset, String newName);

  List<SymbolInfo> documentSymbols(Result result, Path file);

  List<FileSymbol> workspaceSymbols(Result result, String query);
}
