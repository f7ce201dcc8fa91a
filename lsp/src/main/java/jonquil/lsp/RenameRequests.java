package jonquil.lsp;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import jonquil.ide.RenameResult;
import jonquil.source.TextRange;
import org.eclipse.lsp4j.PrepareRenameDefaultBehavior;
import org.eclipse.lsp4j.PrepareRenameParams;
import org.eclipse.lsp4j.PrepareRenameResult;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.RenameParams;
import org.eclipse.lsp4j.WorkspaceEdit;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.jsonrpc.messages.Either3;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseError;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;

/** Rename requests: prepareRename and rename, refused when they would edit a read-only file. */
final class RenameRequests {
  private final JonquilLanguageServer server;

  RenameRequests(JonquilLanguageServer server) {
    this.server = server;
  }

  CompletableFuture<Either3<Range, PrepareRenameResult, PrepareRenameDefaultBehavior>>
      prepareRename(PrepareRenameParams params) {
    return server.requests.atPosition(
        "textDocument/prepareRename",
        params,
        null,
        at -> {
          Optional<TextRange> range =
              server.answers.prepareRename(at.result(), at.path(), at.offset());
          if (range.isPresent()) {
            EditableFiles.refuseReadOnly(
                server,
                server.answers.references(at.result(), at.path(), at.offset(), true).stream()
                    .map(jonquil.ide.Location::file)
                    .toList());
          }
          return range
              .<Either3<Range, PrepareRenameResult, PrepareRenameDefaultBehavior>>map(
                  r -> Either3.forFirst(at.convert().range(at.source(), r)))
              .orElse(null);
        });
  }

  CompletableFuture<WorkspaceEdit> rename(RenameParams params) {
    return server.requests.withIndex(
        "textDocument/rename",
        params,
        null,
        (at, index) -> {
          RenameResult result =
              server.answers.rename(
                  at.result(), at.path(), at.offset(), params.getNewName(), index.files());
          if (result.error() != null) {
            throw new ResponseErrorException(
                new ResponseError(ResponseErrorCode.RequestFailed, result.error(), null));
          }
          Map<Path, List<jonquil.diag.Edit>> edits =
              result.edits() == null ? Map.of() : new LinkedHashMap<>(result.edits());
          EditableFiles.refuseReadOnly(server, edits.keySet());
          // A file only the index read is edited at the buffer version it read (null: read from
          // disk).
          return at.convert()
              .workspaceEdit(
                  edits,
                  file -> at.sourceOf(file, index),
                  file ->
                      at.result().files().containsKey(file)
                          ? server.documents.get(file).map(Documents.Doc::version).orElse(null)
                          : index.version(file),
                  server.clientSupport().documentChanges());
        });
  }
}
