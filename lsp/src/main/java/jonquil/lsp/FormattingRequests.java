package jonquil.lsp;

import java.util.List;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.function.Function;
import jonquil.format.FormatHunks;
import jonquil.format.Formatter;
import jonquil.source.SourceFile;
import org.eclipse.lsp4j.DocumentFormattingParams;
import org.eclipse.lsp4j.DocumentRangeFormattingParams;
import org.eclipse.lsp4j.FormattingOptions;
import org.eclipse.lsp4j.TextEdit;

/** Formatting and range formatting of an open buffer, never waiting for a check. */
final class FormattingRequests {
  private final JonquilLanguageServer server;

  FormattingRequests(JonquilLanguageServer server) {
    this.server = server;
  }

  CompletableFuture<List<? extends TextEdit>> formatting(DocumentFormattingParams params) {
    FormattingOptions options = params.getOptions();
    return ofBuffer(
        "textDocument/formatting",
        params.getTextDocument().getUri(),
        source -> Formatter.edits(source, Convert.formatOptions(options)));
  }

  /** Only the changed line blocks that the range's lines touch. */
  CompletableFuture<List<? extends TextEdit>> rangeFormatting(
      DocumentRangeFormattingParams params) {
    FormattingOptions options = params.getOptions();
    int[] lines = Convert.lines(params.getRange());
    return ofBuffer(
        "textDocument/rangeFormatting",
        params.getTextDocument().getUri(),
        source -> {
          Optional<String> formatted = Formatter.format(source, Convert.formatOptions(options));
          if (formatted.isEmpty() || formatted.get().equals(source.text())) {
            return List.of();
          }
          return FormatHunks.within(
              source.path(), source.text(), formatted.get(), lines[0], lines[1]);
        });
  }

  /** The edits {@code format} finds in the open buffer's text, read on the reader thread. */
  private CompletableFuture<List<? extends TextEdit>> ofBuffer(
      String method, String uri, Function<SourceFile, List<jonquil.diag.Edit>> format) {
    Optional<Documents.Doc> doc = server.documents.get(uri);
    return server.requests.answer(
        method,
        null,
        (snapshot, none) -> {
          if (doc.isEmpty()) {
            return List.of();
          }
          SourceFile source = new SourceFile(doc.get().path(), doc.get().text());
          return server.convert().textEdits(source, format.apply(source));
        });
  }
}
