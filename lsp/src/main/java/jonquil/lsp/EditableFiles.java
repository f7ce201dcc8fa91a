package jonquil.lsp;

import java.nio.file.Path;
import java.util.Collection;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseError;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;

/** Which files the server may propose edits to; every other file it reads is read-only. */
final class EditableFiles {
  private EditableFiles() {}

  /**
   * One open in the editor, or one under a workspace folder. Any other file a check reads (a
   * library used by an open file outside every folder) is served read-only: answered about, never
   * edited.
   */
  static boolean editable(JonquilLanguageServer server, Path file) {
    return server.documents.get(file).isPresent()
        || server.folders().stream().anyMatch(file::startsWith);
  }

  /**
   * Refuses a rename that would touch a read-only file: changing only the other files would break
   * the spec.
   */
  static void refuseReadOnly(JonquilLanguageServer server, Collection<Path> files) {
    for (Path file : files) {
      if (!editable(server, file)) {
        throw new ResponseErrorException(
            new ResponseError(
                ResponseErrorCode.RequestFailed,
                "renaming this would "
                    + "change '"
                    + file
                    + "', which is neither open nor in a workspace folder; open it first",
                null));
      }
    }
  }
}
