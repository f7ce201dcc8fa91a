package jonquil.lsp;

import java.nio.file.Path;
import java.time.Duration;
import java.util.Collection;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.Executors;
import java.util.concurrent.RejectedExecutionException;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.BiConsumer;
import java.util.function.Supplier;
import jonquil.ide.EditorFeatures;
import org.eclipse.lsp4j.MessageType;
import org.eclipse.lsp4j.services.LanguageClient;

/** The workspace index: every spec under the workspace folders, kept fresh on its own thread. */
final class WorkspaceIndex implements AutoCloseable {
  // So that workspace/symbol, references and rename reach files no open document uses (checklist
  // trap 8). Files are read from disk with the open buffers laid over it and kept as the compiler's
  // FileIndex entries. This class takes the reader thread's calls and queues the IndexWorker's work
  // on one thread of its own, never LSP4J's reader thread; answers read the immutable
  // IndexSnapshot.

  /** Quiet time after an edit of an open buffer before the index reads the buffers again. */
  static final Duration BUFFER_DEBOUNCE = Duration.ofMillis(300);

  private final ScheduledExecutorService worker;
  private final IndexProgress progress;
  private final BiConsumer<MessageType, String> log;
  private final IndexedFiles files = new IndexedFiles();
  private final IndexWorker work;
  private final AtomicLong generation = new AtomicLong();
  private final ConcurrentLinkedQueue<Path> diskChanges = new ConcurrentLinkedQueue<>();
  private final AtomicBoolean bufferSyncQueued = new AtomicBoolean();
  private final Object syncLock = new Object();

  /**
   * A sync that is queued and has not started yet, which later requests join; guarded by syncLock.
   */
  private CompletableFuture<IndexSnapshot> queuedSync;

  private volatile boolean started;
  private volatile boolean watched;
  private volatile List<Path> wanted = List.of();

  WorkspaceIndex(
      EditorFeatures answers,
      Documents documents,
      Supplier<LanguageClient> client,
      BiConsumer<MessageType, String> log) {
    this.log = log;
    this.progress = new IndexProgress(client, log);
    this.work = new IndexWorker(answers, documents, files, progress, log);
    ThreadGroup group = new ThreadGroup("jonquil-index");
    this.worker =
        Executors.newSingleThreadScheduledExecutor(
            r -> {
              Thread t = new Thread(group, r, "jonquil-index", CheckScheduler.STACK_BYTES);
              t.setDaemon(true);
              return t;
            });
  }

  // ---- called from LSP4J's reader thread: record and queue, never wait ----

  /**
   * Starts the first pass over {@code folders}. {@code progress}: the client takes work-done
   * progress; {@code watched}: the client reports file changes, so requests need not re-scan.
   */
  void start(List<Path> folders, boolean progress, boolean watched) {
    this.progress.enable(progress);
    this.watched = watched;
    this.started = true;
    setFolders(folders);
  }

  /**
   * A new set of workspace folders: added folders are indexed, removed ones dropped, the others
   * kept.
   */
  void setFolders(List<Path> folders) {
    wanted = List.copyOf(folders);
    if (!started) {
      return;
    }
    long g = generation.incrementAndGet();
    submit(
        () -> {
          if (g == generation.get()) { // else a newer set of folders is queued behind this one
            work.pass(g, wanted, generation::get);
          }
        });
  }

  /**
   * The client will not report file changes after all (it refused the registration): requests
   * re-scan.
   */
  void notWatched() {
    watched = false;
  }

  /**
   * Files the client reports changed, created or deleted on disk: read after a quiet time, with the
   * open buffers. (Edits of open buffers alone wait for the next request that needs the index:
   * {@link #fresh()} reads them.)
   */
  void filesChanged(Collection<Path> files) {
    diskChanges.addAll(files);
    if (started && bufferSyncQueued.compareAndSet(false, true)) {
      try {
        worker.schedule(
            guarded(
                () -> {
                  bufferSyncQueued.set(false);
                  work.sync(diskChanges, false);
                }),
            BUFFER_DEBOUNCE.toMillis(),
            TimeUnit.MILLISECONDS);
      } catch (RejectedExecutionException e) {
        // closed: nothing left to keep fresh
      }
    }
  }

  /** window/workDoneProgress/cancel: stops the pass that reports under this token. */
  void cancelProgress(String token) {
    progress.cancel(token);
  }

  IndexSnapshot latest() {
    return files.latest();
  }

  /**
   * The index once it has read the current buffers, the reported file changes and (for a client
   * that does not watch files) every file whose size or modification time changed; after {@code
   * JonquilLanguageServer.FRESH_WAIT} (e.g. while a large first pass runs), the latest one whatever
   * it holds. Never blocks the caller.
   */
  CompletableFuture<IndexSnapshot> fresh() {
    if (!started) {
      return CompletableFuture.completedFuture(files.latest());
    }
    CompletableFuture<IndexSnapshot> sync;
    synchronized (syncLock) {
      if (queuedSync == null) {
        CompletableFuture<IndexSnapshot> mine = new CompletableFuture<>();
        queuedSync = mine;
        boolean scan = !watched;
        if (!submit(
            () -> {
              synchronized (syncLock) {
                if (queuedSync == mine) {
                  queuedSync = null;
                }
              }
              try {
                work.sync(diskChanges, scan);
              } finally {
                mine.complete(files.latest());
              }
            })) {
          queuedSync = null;
          mine.complete(files.latest());
        }
      }
      sync = queuedSync != null ? queuedSync : CompletableFuture.completedFuture(files.latest());
    }
    return sync.copy()
        .completeOnTimeout(null, JonquilLanguageServer.FRESH_WAIT.toMillis(), TimeUnit.MILLISECONDS)
        .thenApply(s -> s != null ? s : files.latest());
  }

  @Override
  public void close() {
    worker.shutdownNow();
  }

  // ---- the worker ----

  private boolean submit(Runnable task) {
    try {
      worker.execute(guarded(task));
      return true;
    } catch (RejectedExecutionException e) {
      return false;
    }
  }

  private Runnable guarded(Runnable task) {
    return () -> {
      try {
        task.run();
      } catch (Throwable t) {
        log.accept(
            MessageType.Error,
            "the workspace index failed ("
                + JonquilLanguageServer.describe(t)
                + "); workspace answers use what was indexed before");
        t.printStackTrace(System.err);
      }
    };
  }
}
