package jonquil.lsp;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import org.eclipse.lsp4j.InlayHint;
import org.eclipse.lsp4j.InlayHintParams;
import org.eclipse.lsp4j.Range;

/** Inlay hints inside the requested range, and inlayHint/resolve, which fills in their tooltips. */
final class InlayHintRequests {
  private final JonquilLanguageServer server;

  InlayHintRequests(JonquilLanguageServer server) {
    this.server = server;
  }

  CompletableFuture<List<InlayHint>> inlayHint(InlayHintParams params) {
    boolean lazy = server.clientSupport().lazyInlayHintTooltips();
    Range range = params.getRange();
    String uri = params.getTextDocument().getUri();
    return server.requests.wholeDocument(
        "textDocument/inlayHint",
        uri,
        at -> {
          int start = range == null ? 0 : at.convert().offset(at.source(), range.getStart());
          int end =
              range == null
                  ? at.source().text().length()
                  : at.convert().offset(at.source(), range.getEnd());
          Integer version = at.versions().get(at.path());
          int textHash = at.source().text().hashCode();
          return server
              .answers
              .inlayHints(at.result(), at.path(), Math.min(start, end), Math.max(start, end))
              .stream()
              .map(
                  h ->
                      ProtocolAnswers.inlayHint(
                          at.convert(),
                          at.source(),
                          h,
                          lazy
                              ? new ResolveKeys.HintKey(uri, version, textHash, h.offset())
                              : null))
              .toList();
        });
  }

  /**
   * Fills a hint's tooltip, recomputed by the editor answers for the document state the hint came
   * from; a hint whose document has changed or closed since, or that is not ours, comes back as it
   * was.
   */
  CompletableFuture<InlayHint> resolve(InlayHint unresolved) {
    Optional<ResolveKeys.HintKey> key = ResolveKeys.hintKey(unresolved);
    return server.requests.answer(
        "inlayHint/resolve",
        key.map(ResolveKeys.HintKey::uri).orElse(null),
        (snapshot, path) -> {
          if (key.isEmpty() || path == null) {
            return unresolved;
          }
          ResolveKeys.HintKey k = key.get();
          Integer open = server.documents.get(path).map(Documents.Doc::version).orElse(null);
          if (!Objects.equals(open, k.version())
              || !Objects.equals(snapshot.versions().get(path), k.version())) {
            return unresolved;
          }
          Optional<jonquil.Result> result = snapshot.resultFor(path);
          if (result.isEmpty()
              || result.get().files().get(path).text().hashCode() != k.textHash()) {
            return unresolved;
          }
          String label = ProtocolAnswers.hintLabel(unresolved);
          for (jonquil.ide.InlayHint h :
              server.answers.inlayHints(result.get(), path, k.offset(), k.offset())) {
            if (h.offset() == k.offset() && h.label().equals(label)) {
              return ProtocolAnswers.withTooltip(unresolved, h.tooltip());
            }
          }
          return unresolved;
        });
  }
}
