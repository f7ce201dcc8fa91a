package jonquil.lsp;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.atomic.AtomicReference;
import jonquil.ide.CompletionItemInfo;
import org.eclipse.lsp4j.CompletionItem;
import org.eclipse.lsp4j.CompletionList;
import org.eclipse.lsp4j.CompletionParams;
import org.eclipse.lsp4j.jsonrpc.messages.Either;

/** Completion at the buffer as it stands, and completionItem/resolve from its last answer. */
final class CompletionRequests {
  /** The items of the last completion answer, which completionItem/resolve fills in from. */
  private record CompletionAnswer(long id, List<CompletionItemInfo> items) {}

  private final JonquilLanguageServer server;
  private final AtomicLong ids = new AtomicLong();
  private final AtomicReference<CompletionAnswer> lastCompletion = new AtomicReference<>();

  CompletionRequests(JonquilLanguageServer server) {
    this.server = server;
  }

  CompletableFuture<Either<List<CompletionItem>, CompletionList>> completion(
      CompletionParams params) {
    boolean lazy = server.clientSupport().lazyCompletionDocumentation();
    return server.requests.atBuffer(
        "textDocument/completion",
        params,
        Either.forRight(new CompletionList(false, List.of())),
        at -> {
          List<CompletionItemInfo> infos =
              server.answers.completions(at.result(), at.path(), at.offset());
          long id = ids.incrementAndGet();
          if (lazy) {
            lastCompletion.set(new CompletionAnswer(id, List.copyOf(infos)));
          }
          List<CompletionItem> items = new ArrayList<>();
          for (int i = 0; i < infos.size(); i++) {
            items.add(
                ProtocolAnswers.completionItem(
                    infos.get(i), lazy ? new ResolveKeys.CompletionKey(id, i) : null));
          }
          return Either.forRight(new CompletionList(false, items));
        });
  }

  CompletableFuture<CompletionItem> resolveCompletionItem(CompletionItem unresolved) {
    return server.requests.answer(
        "completionItem/resolve",
        null,
        (snapshot, none) -> {
          Optional<ResolveKeys.CompletionKey> key = ResolveKeys.completionKey(unresolved);
          CompletionAnswer last = lastCompletion.get();
          if (key.isEmpty()
              || last == null
              || last.id() != key.get().answer()
              || key.get().index() < 0
              || key.get().index() >= last.items().size()) {
            return unresolved; // an item of an older answer: it stays as it was
          }
          CompletionItemInfo info = last.items().get(key.get().index());
          return info.label().equals(unresolved.getLabel())
              ? ProtocolAnswers.withDocumentation(unresolved, info.documentation())
              : unresolved;
        });
  }
}
