package jonquil.lsp;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.CompletableFuture;
import jonquil.Result;
import jonquil.ide.FileIndex;
import jonquil.ide.FoundSymbol;
import org.eclipse.lsp4j.DidChangeConfigurationParams;
import org.eclipse.lsp4j.DidChangeWatchedFilesParams;
import org.eclipse.lsp4j.DidChangeWorkspaceFoldersParams;
import org.eclipse.lsp4j.FileEvent;
import org.eclipse.lsp4j.SymbolInformation;
import org.eclipse.lsp4j.WorkspaceFolder;
import org.eclipse.lsp4j.WorkspaceSymbol;
import org.eclipse.lsp4j.WorkspaceSymbolParams;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.eclipse.lsp4j.services.WorkspaceService;

/**
 * The workspace/* methods: symbol search through the editor answers over the open documents' checks
 * and the workspace index, and re-checks and re-indexing when files or folders change.
 */
final class JonquilWorkspaceService implements WorkspaceService {
  /** At most this many symbols per search, so a one-letter query stays cheap to send. */
  static final int MAX_SYMBOLS = 200;

  private final JonquilLanguageServer server;

  JonquilWorkspaceService(JonquilLanguageServer server) {
    this.server = server;
  }

  @Override
  public CompletableFuture<
          Either<List<? extends SymbolInformation>, List<? extends WorkspaceSymbol>>>
      symbol(WorkspaceSymbolParams params) {
    String query = params.getQuery() == null ? "" : params.getQuery();
    return server.requests.answer(
        "workspace/symbol",
        null,
        server.index::fresh,
        (snapshot, none) -> {
          // The checks of the open documents answer for the files they read; the workspace index
          // for all others.
          Set<FoundSymbol> found = new LinkedHashSet<>();
          Set<Path> checked = new HashSet<>();
          for (Result r : snapshot.results()) {
            found.addAll(server.answers.workspaceSymbols(r, query));
            checked.addAll(r.files().keySet());
          }
          IndexSnapshot index = server.index.latest();
          List<FileIndex> unchecked =
              index.files().stream().filter(f -> !checked.contains(f.file())).toList();
          found.addAll(server.answers.workspaceSymbols(unchecked, query));
          List<WorkspaceSymbol> out = new ArrayList<>();
          Convert convert = server.convert();
          for (FoundSymbol s : found) {
            if (out.size() == MAX_SYMBOLS) {
              break;
            }
            out.add(
                ProtocolAnswers.workspaceSymbol(
                    convert,
                    s,
                    file ->
                        snapshot
                            .resultFor(file)
                            .map(r -> r.files().get(file))
                            .orElseGet(() -> index.source(file))));
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
    server.onNotification(
        "workspace/didChangeWatchedFiles",
        () -> {
          List<Path> files = new ArrayList<>();
          for (FileEvent e :
              params.getChanges() == null ? List.<FileEvent>of() : params.getChanges()) {
            Documents.pathOf(e.getUri()).ifPresent(files::add);
          }
          server.index.filesChanged(files);
          server.scheduleCheck();
        });
  }

  @Override
  public void didChangeWorkspaceFolders(DidChangeWorkspaceFoldersParams params) {
    server.onNotification(
        "workspace/didChangeWorkspaceFolders",
        () -> {
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
