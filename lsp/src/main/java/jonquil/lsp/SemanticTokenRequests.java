package jonquil.lsp;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicLong;
import org.eclipse.lsp4j.SemanticTokens;
import org.eclipse.lsp4j.SemanticTokensDelta;
import org.eclipse.lsp4j.SemanticTokensDeltaParams;
import org.eclipse.lsp4j.SemanticTokensParams;
import org.eclipse.lsp4j.jsonrpc.messages.Either;

/** Semantic tokens, full and delta, with the token data last sent for each open document. */
final class SemanticTokenRequests {
  /** The token data last sent for a document, which a delta request names by its result id. */
  private record SentTokens(String resultId, List<Integer> data) {}

  private final JonquilLanguageServer server;
  private final AtomicLong ids = new AtomicLong();
  private final Map<Path, SentTokens> sentTokens = new ConcurrentHashMap<>();

  SemanticTokenRequests(JonquilLanguageServer server) {
    this.server = server;
  }

  /** Closing a document forgets its tokens. */
  void forget(Path document) {
    sentTokens.remove(document);
  }

  CompletableFuture<SemanticTokens> full(SemanticTokensParams params) {
    return server.requests.wholeDocument(
        "textDocument/semanticTokens/full",
        params.getTextDocument().getUri(),
        SemanticTokenEncoding.full(null, List.of()),
        at -> {
          SentTokens sent = tokens(at);
          return SemanticTokenEncoding.full(sent.resultId(), sent.data());
        });
  }

  /** The edits from the tokens the client names by result id, or all tokens when those are gone. */
  CompletableFuture<Either<SemanticTokens, SemanticTokensDelta>> delta(
      SemanticTokensDeltaParams params) {
    String previous = params.getPreviousResultId();
    return server.requests.wholeDocument(
        "textDocument/semanticTokens/full/delta",
        params.getTextDocument().getUri(),
        Either.forLeft(SemanticTokenEncoding.full(null, List.of())),
        at -> {
          SentTokens before = sentTokens.get(at.path());
          SentTokens now = tokens(at);
          if (before == null || previous == null || !previous.equals(before.resultId())) {
            return Either.forLeft(SemanticTokenEncoding.full(now.resultId(), now.data()));
          }
          return Either.forRight(
              SemanticTokenEncoding.delta(now.resultId(), before.data(), now.data()));
        });
  }

  /** Computes, encodes and remembers the document's tokens under a new result id. */
  private SentTokens tokens(RequestPipeline.At at) {
    List<Integer> data =
        server
            .tokenEncoding()
            .data(at.convert(), at.source(), server.answers.semanticTokens(at.result(), at.path()));
    SentTokens sent = new SentTokens(Long.toString(ids.incrementAndGet()), List.copyOf(data));
    if (server.documents.get(at.path()).isPresent()) {
      sentTokens.put(at.path(), sent); // a file never opened has none kept
    }
    return sent;
  }
}
