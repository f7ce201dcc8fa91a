package jonquil.lsp;

import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.BiConsumer;
import java.util.function.Supplier;
import org.eclipse.lsp4j.MessageType;
import org.eclipse.lsp4j.ProgressParams;
import org.eclipse.lsp4j.WorkDoneProgressBegin;
import org.eclipse.lsp4j.WorkDoneProgressCreateParams;
import org.eclipse.lsp4j.WorkDoneProgressEnd;
import org.eclipse.lsp4j.WorkDoneProgressReport;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.eclipse.lsp4j.services.LanguageClient;

/**
 * Work-done progress of the workspace index's passes (begin, a report per batch, end), only for a
 * client that takes it and only under a token it accepted; and its cancel.
 */
final class IndexProgress {
  static final String TITLE = "Indexing Jonquil specs";

  private final Supplier<LanguageClient> client;
  private final BiConsumer<MessageType, String> log;
  private final AtomicLong tokens = new AtomicLong();
  private volatile boolean enabled;
  private volatile String progressToken;
  private volatile boolean cancelRequested;

  IndexProgress(Supplier<LanguageClient> client, BiConsumer<MessageType, String> log) {
    this.client = client;
    this.log = log;
  }

  /** The client takes work-done progress. */
  void enable(boolean enabled) {
    this.enabled = enabled;
  }

  /**
   * Begins reporting a pass over {@code total} files under a new token the client accepted; null
   * (nothing is reported) for a client that does not take progress or refuses the token.
   */
  String begin(int total) {
    LanguageClient c = client.get();
    if (!enabled || c == null) {
      return null;
    }
    String token = "jonquil-index-" + tokens.incrementAndGet();
    cancelRequested = false;
    progressToken = token; // set before asking, so a cancel that overtakes the reply still counts
    try {
      // Waiting here is safe: this is the index worker, and the reader thread delivers the reply.
      c.createProgress(progressCreate(token))
          .get(JonquilLanguageServer.FRESH_WAIT.toMillis(), TimeUnit.MILLISECONDS);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      progressToken = null;
      return null;
    } catch (ExecutionException | TimeoutException | RuntimeException e) {
      progressToken = null;
      log.accept(
          MessageType.Log,
          "the editor did not accept a progress token ("
              + JonquilLanguageServer.describe(e)
              + "); indexing without progress");
      return null;
    }
    c.notifyProgress(progressBegin(token, TITLE, total + " spec files"));
    return token;
  }

  /** Whether the editor cancelled the progress under {@code token}. */
  boolean cancelled(String token) {
    return token != null && cancelRequested && token.equals(progressToken);
  }

  void report(String token, int done, int total) {
    LanguageClient c = client.get();
    if (token != null && c != null) {
      c.notifyProgress(
          progressReport(token, done + "/" + total + " files", done * 100 / Math.max(1, total)));
    }
  }

  void end(String token, String message) {
    LanguageClient c = client.get();
    if (token != null && c != null) {
      c.notifyProgress(progressEnd(token, message));
    }
    if (token != null && token.equals(progressToken)) {
      progressToken = null;
    }
  }

  /** window/workDoneProgress/cancel: stops the pass that reports under this token. */
  void cancel(String token) {
    if (token != null && token.equals(progressToken)) {
      cancelRequested = true;
    }
  }

  private static WorkDoneProgressCreateParams progressCreate(String token) {
    return new WorkDoneProgressCreateParams(Either.forLeft(token));
  }

  private static ProgressParams progressBegin(String token, String title, String message) {
    WorkDoneProgressBegin begin = new WorkDoneProgressBegin();
    begin.setTitle(title);
    begin.setMessage(message);
    begin.setCancellable(true);
    begin.setPercentage(0);
    return new ProgressParams(Either.forLeft(token), Either.forLeft(begin));
  }

  private static ProgressParams progressReport(String token, String message, int percentage) {
    WorkDoneProgressReport report = new WorkDoneProgressReport();
    report.setMessage(message);
    report.setPercentage(Math.max(0, Math.min(100, percentage)));
    return new ProgressParams(Either.forLeft(token), Either.forLeft(report));
  }

  private static ProgressParams progressEnd(String token, String message) {
    WorkDoneProgressEnd end = new WorkDoneProgressEnd();
    end.setMessage(message);
    return new ProgressParams(Either.forLeft(token), Either.forLeft(end));
  }

  /** A progress token as one string, whichever of the two forms the client sent. */
  static String progressToken(Either<String, Integer> token) {
    if (token == null) {
      return null;
    }
    return token.isLeft() ? token.getLeft() : String.valueOf(token.getRight());
  }
}
