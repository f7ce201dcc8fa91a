package jonquil.lsp;

import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;
import org.eclipse.lsp4j.DidChangeTextDocumentParams;
import org.eclipse.lsp4j.DidCloseTextDocumentParams;
import org.eclipse.lsp4j.DidOpenTextDocumentParams;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;

/** Document synchronisation: opens, edits and closes recorded in the open buffers. */
final class DocumentSync {
  private final JonquilLanguageServer server;

  /** Told the path of each document that closes, so what was kept for it goes too. */
  private final Consumer<Path> closed;

  DocumentSync(JonquilLanguageServer server, Consumer<Path> closed) {
    this.server = server;
    this.closed = closed;
  }

  void didOpen(DidOpenTextDocumentParams params) {
    server.onNotification(
        "textDocument/didOpen",
        () -> {
          var doc = params.getTextDocument();
          server.documents.open(
              doc.getUri(), doc.getVersion(), doc.getText() == null ? "" : doc.getText());
          server.scheduleCheck();
        });
  }

  void didChange(DidChangeTextDocumentParams params) {
    server.onNotification(
        "textDocument/didChange",
        () -> {
          var id = params.getTextDocument();
          Convert convert = server.convert();
          List<TextDocumentContentChangeEvent> changes = params.getContentChanges();
          server.documents.change(
              id.getUri(),
              id.getVersion(),
              text -> {
                String now = text;
                for (TextDocumentContentChangeEvent change : changes) {
                  now = convert.applyChange(now, change);
                }
                return now;
              });
          server.scheduleCheck();
        });
  }

  void didClose(DidCloseTextDocumentParams params) {
    server.onNotification(
        "textDocument/didClose",
        () -> {
          server
              .documents
              .close(params.getTextDocument().getUri())
              .ifPresent(doc -> closed.accept(doc.path()));
          server.scheduleCheck();
        });
  }
}
