package jonquil.lsp;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.CompletableFuture;
import jonquil.Result;
import org.eclipse.lsp4j.DidChangeConfigurationParams;
import org.eclipse.lsp4j.DidChangeWatchedFilesParams;
import org.eclipse.lsp4j.DidChangeWorkspaceFoldersParams;
import org.eclipse.lsp4j.SymbolInformation;
import org.eclipse.lsp4j.WorkspaceFolder;
import org.eclipse.lsp4j.WorkspaceSymbol;
import org.eclipse.lsp4j.WorkspaceSymbolParams;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.eclipse.lsp4j.services.WorkspaceService;

/** The workspace/* methods: symbol search through the editor answers, and re-checks when files or folders change. */
final class JonquilWorkspaceService implements WorkspaceService {
  /** At most this many symbols per search, so a one-letter query stays cheap to send. */
  static final int MAX_SYMBOLS = 200;

  private final JonquilLanguageServer server;

  JonquilWorkspaceService(JonquilLanguageServer server) {
    this.server = server;
  }

  @Override
  public CompletableFuture<Either<List<? extends SymbolInformation>, List<? extends WorkspaceSymbol>>> symbol(
      WorkspaceSymbolParams params) {
    String query = params.getQuery() == null ? "" : params.getQuery();
    return server.answer("workspace/symbol", null, (snapshot, none) -> {
      Set<EditorAnswers.FileSymbol> found = new LinkedHashSet<>();
      for (Result r : snapshot.results()) {
        found.addAll(server.answers.workspaceSymbols(r, query));
      }
      List<WorkspaceSymbol> out = new ArrayList<>();
      Convert convert = server.convert();
      for (EditorAnswers.FileSymbol s : found) {
        if (out.size() == MAX_SYMBOLS) {
          break;
        }
        out.add(convert.workspaceSymbol(s, file -> snapshot.resultFor(file).map(r -> r.files().get(file)).orElse(null)));
      }
      return Either.forRight(out);
    });
  }

  @Override
  public void didChangeConfiguration(DidChangeConfigurationParams params) {
    // No settings yet.
  }

  @Override
  public void didChangeWatchedFiles(DidChangeWatchedFilesParams params) {
    server.onNotification("workspace/didChangeWatchedFiles", server::scheduleCheck);
  }

  @Override
  public void didChangeWorkspaceFolders(DidChangeWorkspaceFoldersParams params) {
    server.onNotification("workspace/didChangeWorkspaceFolders", () -> {
      Set<Path> folders = new LinkedHashSet<>(server.folders());
      if (params.getEvent() != null) {
        for (WorkspaceFolder f : nonNull(params.getEvent().getRemoved())) {
          Documents.pathOf(f.getUri()).ifPresent(folders::remove);
        }
        for (WorkspaceFolder f : nonNull(params.getEvent().getAdded())) {
          Documents.pathOf(f.getUri()).ifPresent(folders::add);
        }
      }
      server.setFolders(new ArrayList<>(folders));
      server.scheduleCheck();
    });
  }

  private static List<WorkspaceFolder> nonNull(List<WorkspaceFolder> list) {
    return list == null ? List.of() : list;
  }
}
