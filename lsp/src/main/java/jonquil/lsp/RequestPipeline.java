package jonquil.lsp;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.RejectedExecutionException;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BiFunction;
import java.util.function.Consumer;
import java.util.function.Function;
import java.util.function.Supplier;
import jonquil.CheckOptions;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import jonquil.source.ProjectRoot;
import jonquil.source.SourceFile;
import org.eclipse.lsp4j.MessageType;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.TextDocumentPositionParams;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseError;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;

/**
 * The request pipeline: every request is answered off the reader thread, on a pool of two workers,
 * from a snapshot that saw the document, as its own task so that {@code $/cancelRequest} answers
 * -32800 at once and interrupts the worker; any failure becomes an error response, never a dead
 * server.
 */
final class RequestPipeline {
  private final JonquilLanguageServer server;
  private final ExecutorService requests;

  /**
   * Completes replies, which makes LSP4J write them: a thread that is never interrupted, so a
   * cancel (which interrupts the request worker) can never land mid-write. On a channel-backed
   * stream that interrupt would close the channel, and the connection with it.
   */
  private final ExecutorService replies;

  RequestPipeline(JonquilLanguageServer server) {
    this.server = server;
    AtomicInteger n = new AtomicInteger();
    ThreadGroup group = new ThreadGroup("jonquil-requests");
    this.requests =
        Executors.newFixedThreadPool(
            2,
            r -> {
              Thread t =
                  new Thread(
                      group,
                      r,
                      "jonquil-request-" + n.incrementAndGet(),
                      CheckScheduler.STACK_BYTES);
              t.setDaemon(true);
              return t;
            });
    this.replies =
        Executors.newSingleThreadExecutor(
            r -> {
              Thread t = new Thread(group, r, "jonquil-replies");
              t.setDaemon(true);
              return t;
            });
  }

  /** Stops the request workers. */
  void close() {
    requests.shutdownNow();
    replies.shutdown();
  }

  /**
   * A request about a position in a document, answered on the request pool from a snapshot that saw
   * the document; {@code versions} are the document versions that result read (for versioned
   * edits).
   */
  record At(
      Result result,
      Path path,
      SourceFile source,
      int offset,
      Convert convert,
      Map<Path, Integer> versions) {
    /** The check's copy of a file, or null when the check did not read it. */
    SourceFile checked(Path file) {
      return result.files().get(file);
    }

    /** The text a location's offsets refer to: the check's copy, else the workspace index's. */
    SourceFile sourceOf(Path file, IndexSnapshot index) {
      SourceFile checked = checked(file);
      return checked != null ? checked : index.source(file);
    }
  }

  /** A request about a whole document, answered with an empty list when no check saw it. */
  <T> CompletableFuture<List<T>> wholeDocument(
      String method, String uri, Function<At, List<T>> body) {
    return wholeDocument(method, uri, List.of(), body);
  }

  /** A request about a whole document, answered with {@code none} when no check saw it. */
  <T> CompletableFuture<T> wholeDocument(String method, String uri, T none, Function<At, T> body) {
    return atPosition(method, uri, null, null, none, body);
  }

  /**
   * A request about the position {@code params} name, answered with {@code none} when no check saw
   * it.
   */
  <T> CompletableFuture<T> atPosition(
      String method, TextDocumentPositionParams params, T none, Function<At, T> body) {
    return atPosition(
        method, params.getTextDocument().getUri(), null, params.getPosition(), none, body);
  }

  /**
   * As {@link #atPosition(String, TextDocumentPositionParams, Object, Function)}, once the
   * workspace index has caught up (see {@link WorkspaceIndex#fresh}); {@code body} also gets the
   * index.
   */
  <T> CompletableFuture<T> withIndex(
      String method,
      TextDocumentPositionParams params,
      T none,
      BiFunction<At, IndexSnapshot, T> body) {
    return atPosition(
        method,
        params.getTextDocument().getUri(),
        server.index::fresh,
        params.getPosition(),
        none,
        at -> body.apply(at, server.index.latest()));
  }

  /** Answered once {@code before} is done too (e.g. a fresh workspace index). */
  private <T> CompletableFuture<T> atPosition(
      String method,
      String uri,
      Supplier<? extends CompletableFuture<?>> before,
      Position position,
      T none,
      Function<At, T> body) {
    return answer(
        method,
        uri,
        before,
        (snapshot, path) -> {
          Optional<Result> result = snapshot.resultFor(path);
          if (result.isEmpty()) {
            return none;
          }
          SourceFile source = result.get().files().get(path);
          Convert conv = server.convert();
          int offset = position == null ? 0 : conv.offset(source, position);
          return body.apply(new At(result.get(), path, source, offset, conv, snapshot.versions()));
        });
  }

  /**
   * Like {@link #atPosition}, but answered at once from the document's text as the request found
   * it: from the latest check when that read the same text, else from a check of the buffer run
   * here, on the request pool. For answers that read the text around the cursor (completion), where
   * waiting for the debounced check would lag the typing.
   */
  <T> CompletableFuture<T> atBuffer(
      String method, TextDocumentPositionParams params, T none, Function<At, T> body) {
    Position position = params.getPosition();
    // Read on the reader thread, so the text is the one every earlier didChange made.
    Optional<Documents.Doc> doc = server.documents.get(params.getTextDocument().getUri());
    return answer(
        method,
        null,
        (snapshot, ignored) -> {
          if (doc.isEmpty()) {
            return none;
          }
          Documents.Doc d = doc.get();
          Path path = d.path();
          Map<Path, Integer> versions = snapshot.versions();
          Result result =
              snapshot
                  .resultFor(path)
                  .filter(r -> d.text().equals(r.files().get(path).text()))
                  .orElse(null);
          if (result == null) {
            result = checkBuffer(d);
            Map<Path, Integer> seen = new HashMap<>(versions);
            seen.put(path, d.version());
            versions = seen;
          }
          SourceFile source = result.files().get(path);
          if (source == null) {
            return none;
          }
          Convert conv = server.convert();
          int offset = position == null ? 0 : conv.offset(source, position);
          return body.apply(new At(result, path, source, offset, conv, versions));
        });
  }

  /**
   * A check of one document's text as given, the other open buffers overlaid, rooted as the check
   * cycle roots it.
   */
  private Result checkBuffer(Documents.Doc doc) {
    Map<Path, String> buffers = new HashMap<>();
    server.documents.snapshot().forEach((p, open) -> buffers.put(p, open.text()));
    buffers.put(doc.path(), doc.text());
    Path root = ProjectRoot.owning(doc.path(), server.folderState().paths());
    return Checker.check(
        Workspace.withOverlay(root, buffers), List.of(doc.path()), CheckOptions.EDITOR);
  }

  /**
   * The functional shape of a request body: the snapshot to answer from and the document's path
   * (null when none).
   */
  interface Body<T> {
    T apply(Snapshots.Snapshot snapshot, Path path);
  }

  /**
   * Answers a request off the reader thread: refuses it before initialize (-32002) and after
   * shutdown, waits (without blocking) for a check that saw the document's current version, and
   * turns any exception into an internal-error response plus a log line.
   */
  <T> CompletableFuture<T> answer(String method, String uri, Body<T> body) {
    return answer(method, uri, null, body);
  }

  /**
   * As above, also waiting (without blocking) for {@code before}, when given, e.g. a fresh
   * workspace index.
   */
  <T> CompletableFuture<T> answer(
      String method, String uri, Supplier<? extends CompletableFuture<?>> before, Body<T> body) {
    try {
      if (server.notYetInitialized()) {
        return CompletableFuture.failedFuture(notInitialized());
      }
      if (!server.running()) {
        return CompletableFuture.failedFuture(shuttingDown());
      }
      Path path = uri == null ? null : Documents.pathOf(uri).orElse(null);
      Integer version =
          path == null ? null : server.documents.get(path).map(Documents.Doc::version).orElse(null);
      CompletableFuture<Snapshots.Snapshot> checked =
          server.snapshots.fresh(
              path, version, server.folderState().generation(), JonquilLanguageServer.FRESH_WAIT);
      CompletableFuture<Snapshots.Snapshot> fresh =
          before == null
              ? checked
              : checked.thenCombine(before.get(), (snapshot, ignored) -> snapshot);
      CompletableFuture<T> reply = new CompletableFuture<>();
      long start = System.nanoTime();
      // Written before the reply is completed, so the line is on stderr before the answer leaves.
      Consumer<Throwable> logged =
          !server.debugging()
              ? error -> {}
              : error ->
                  server.debug(
                      "request "
                          + method
                          + ": "
                          + (error == null
                              ? "answered"
                              : "failed (" + JonquilLanguageServer.describe(error) + ")")
                          + " in "
                          + JonquilLanguageServer.millisSince(start)
                          + " ms");
      AtomicReference<Future<?>> running = new AtomicReference<>();
      fresh.whenComplete(
          (snapshot, waitError) -> {
            if (reply.isDone()) {
              return; // cancelled while waiting for a fresh check
            }
            if (waitError != null) {
              settle(reply, null, asResponseError(method, waitError), logged);
              return;
            }
            try {
              running.set(
                  requests.submit(
                      () -> {
                        if (reply.isDone()) {
                          return;
                        }
                        try {
                          T value = body.apply(snapshot, path);
                          replies.execute(() -> settle(reply, value, null, logged));
                        } catch (Throwable error) {
                          if (!reply
                              .isDone()) { // after a cancel, the interrupt's own failure is no
                            // error to report
                            Throwable response = asResponseError(method, error);
                            replies.execute(() -> settle(reply, null, response, logged));
                          }
                        }
                      }));
            } catch (RejectedExecutionException e) {
              settle(reply, null, shuttingDown(), logged);
            }
            if (reply.isCancelled()) {
              cancel(running.get());
            }
          });
      reply.whenComplete(
          (value, error) -> {
            if (reply.isCancelled()) {
              // $/cancelRequest: LSP4J answers -32800 at once; interrupting frees the worker for
              // the next request.
              logged.accept(error);
              fresh.cancel(false);
              checked.cancel(false);
              cancel(running.get());
            }
          });
      return reply;
    } catch (RuntimeException | StackOverflowError e) {
      return CompletableFuture.failedFuture(asResponseError(method, e));
    }
  }

  /**
   * Writes the request's debug line, then answers: completing the reply hands it to the protocol
   * writer at once, so a line written after it would trail the answer it describes.
   */
  private static <T> void settle(
      CompletableFuture<T> reply, T value, Throwable error, Consumer<Throwable> logged) {
    if (reply.isDone()) {
      return; // cancelled meanwhile: the cancel logs and answers
    }
    logged.accept(error);
    if (error == null) {
      reply.complete(value);
    } else {
      reply.completeExceptionally(error);
    }
  }

  private static void cancel(Future<?> task) {
    if (task != null) {
      task.cancel(true);
    }
  }

  private static ResponseErrorException shuttingDown() {
    return new ResponseErrorException(
        new ResponseError(ResponseErrorCode.InvalidRequest, "the server is shutting down", null));
  }

  static ResponseErrorException notInitialized() {
    return new ResponseErrorException(
        new ResponseError(
            ResponseErrorCode.ServerNotInitialized, "the server is not initialized yet", null));
  }

  /** A response error for a failed handler; anything unexpected becomes -32603 and is logged. */
  Throwable asResponseError(String method, Throwable error) {
    Throwable cause = error;
    while ((cause instanceof CompletionException || cause instanceof ExecutionException)
        && cause.getCause() != null) {
      cause = cause.getCause();
    }
    if (cause instanceof ResponseErrorException || cause instanceof CancellationException) {
      return cause;
    }
    String message = "internal error in " + method + ": " + JonquilLanguageServer.describe(cause);
    server.log(MessageType.Error, message);
    cause.printStackTrace(System.err);
    return new ResponseErrorException(
        new ResponseError(ResponseErrorCode.InternalError, message, null));
  }
}
