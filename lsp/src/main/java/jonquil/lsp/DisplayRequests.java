package jonquil.lsp;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.concurrent.CompletableFuture;
import jonquil.source.SourceFile;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.DocumentDiagnosticParams;
import org.eclipse.lsp4j.DocumentDiagnosticReport;
import org.eclipse.lsp4j.FoldingRange;
import org.eclipse.lsp4j.FoldingRangeRequestParams;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.HoverParams;

/** Hover, folding ranges and pulled diagnostics, answered from the latest check. */
final class DisplayRequests {
  private final JonquilLanguageServer server;

  DisplayRequests(JonquilLanguageServer server) {
    this.server = server;
  }

  /** Hover, as Markdown or, for a client without Markdown, as plain text. */
  CompletableFuture<Hover> hover(HoverParams params) {
    boolean markdown = server.clientSupport().markdownHover();
    return server.requests.atPosition(
        "textDocument/hover",
        params,
        null,
        at ->
            server
                .answers
                .hover(at.result(), at.path(), at.offset())
                .map(info -> ProtocolAnswers.hover(at.convert(), info, at.source(), markdown))
                .orElse(null));
  }

  /** Folding ranges, whole lines for a line-folding client, at most as many as it asks for. */
  CompletableFuture<List<FoldingRange>> foldingRange(FoldingRangeRequestParams params) {
    boolean linesOnly = server.clientSupport().lineFoldingOnly();
    Integer limit = server.clientSupport().foldingRangeLimit();
    return server.requests.wholeDocument(
        "textDocument/foldingRange",
        params.getTextDocument().getUri(),
        at ->
            server.answers.foldingRanges(at.result(), at.path()).stream()
                .map(f -> ProtocolAnswers.foldingRange(at.convert(), at.source(), f, linesOnly))
                .filter(Objects::nonNull)
                .limit(limit == null ? Long.MAX_VALUE : Math.max(0, limit))
                .toList());
  }

  /**
   * Pull diagnostics: the document's diagnostics from the check of its current version. The result
   * id is that version plus a hash of the text and of the report, so a change in a used file (same
   * version, same text) still gives a new id.
   */
  CompletableFuture<DocumentDiagnosticReport> diagnostic(DocumentDiagnosticParams params) {
    String previous = params.getPreviousResultId();
    return server.requests.answer(
        "textDocument/diagnostic",
        params.getTextDocument().getUri(),
        (snapshot, path) -> {
          List<Diagnostic> items = new ArrayList<>();
          if (path == null) {
            return Convert.diagnosticReport("none", previous, items);
          }
          Map<Path, SourceFile> sources = CheckCycle.sources(snapshot.results());
          Convert conv = server.convert();
          for (jonquil.diag.Diagnostic d :
              CheckCycle.byFile(snapshot.results()).getOrDefault(path, Set.of())) {
            items.add(conv.diagnostic(d, sources::get));
          }
          SourceFile source = sources.get(path);
          Integer version = snapshot.versions().get(path);
          String resultId =
              (version == null ? "disk" : "v" + version)
                  + "-"
                  + Integer.toHexString(source == null ? 0 : source.text().hashCode())
                  + "-"
                  + Integer.toHexString(items.hashCode());
          return Convert.diagnosticReport(resultId, previous, items);
        });
  }
}
