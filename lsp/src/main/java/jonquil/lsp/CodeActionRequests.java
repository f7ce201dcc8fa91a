package jonquil.lsp;

import java.util.List;
import java.util.concurrent.CompletableFuture;
import jonquil.source.TextRange;
import org.eclipse.lsp4j.CodeAction;
import org.eclipse.lsp4j.CodeActionParams;
import org.eclipse.lsp4j.Command;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.jsonrpc.messages.Either;

/** Code actions: the quick fixes in a range, for clients that take literal code actions. */
final class CodeActionRequests {
  private final JonquilLanguageServer server;

  CodeActionRequests(JonquilLanguageServer server) {
    this.server = server;
  }

  /** Only actions of the kinds asked for, and only those whose every edit may be proposed. */
  CompletableFuture<List<Either<Command, CodeAction>>> codeAction(CodeActionParams params) {
    ClientSupport client = server.clientSupport();
    Range range = params.getRange();
    List<String> only = params.getContext() == null ? null : params.getContext().getOnly();
    return server.requests.wholeDocument(
        "textDocument/codeAction",
        params.getTextDocument().getUri(),
        at -> {
          if (!client.codeActionLiterals()) {
            return List.of(); // such a client could only take commands, and a fix is an edit
          }
          int start = range == null ? 0 : at.convert().offset(at.source(), range.getStart());
          int end = range == null ? start : at.convert().offset(at.source(), range.getEnd());
          TextRange within = new TextRange(Math.min(start, end), Math.max(start, end));
          return server.answers.codeActions(at.result(), at.path(), within).stream()
              .filter(a -> ProtocolAnswers.kindRequested(a.kind(), only))
              .filter(
                  a ->
                      a.edits().keySet().stream()
                          .allMatch(file -> EditableFiles.editable(server, file)))
              .<Either<Command, CodeAction>>map(
                  a ->
                      Either.forRight(
                          ProtocolAnswers.codeAction(
                              at.convert(),
                              a,
                              at::checked,
                              file -> at.versions().get(file),
                              client.documentChanges(),
                              client.preferredCodeActions())))
              .toList();
        });
  }
}
