package jonquil.lsp;

import jonquil.ide.HoverInfo;
import jonquil.ide.Location;
import jonquil.ide.RenameResult;
import jonquil.ide.SymbolInfo;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import jonquil.Result;
import jonquil.diag.Edit;
import jonquil.source.TextRange;

/**
 * What the server asks the compiler's editor answers (jonquil.ide), in compiler types and
 * UTF-16 offsets, so the protocol layer computes nothing; an interface so tests can stand in.
 */
public interface EditorAnswers {

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
