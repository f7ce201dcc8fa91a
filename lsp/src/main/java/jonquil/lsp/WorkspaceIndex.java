package jonquil.lsp;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
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
import jonquil.CheckOptions;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import jonquil.ide.EditorFeatures;
import jonquil.ide.FileIndex;
import jonquil.ide.IndexRebuild;
import jonquil.source.SourceFile;
import org.eclipse.lsp4j.MessageType;
import org.eclipse.lsp4j.services.LanguageClient;

/**
 * The workspace index (shared checklist, trap 8): every spec file under the workspace folders, read
 * from disk with the open buffers laid over it, kept as the compiler's {@link FileIndex} entries,
 * so that workspace/symbol, references and rename reach files that no open document uses. Each file
 * is checked names-only under its innermost folder, as the check cycle roots it. All work runs on
 * one worker thread of its own, never on LSP4J's reader thread; answers read the immutable {@link
 * Snapshot}.
 */
final class WorkspaceIndex implements AutoCloseable {

  /**
   * Files checked together, so that a library they share is parsed once; progress is reported per
   * batch.
   */
  static final int BATCH = 32;

  /** Quiet time after an edit of an open buffer before the index reads the buffers again. */
  static final Duration BUFFER_DEBOUNCE = Duration.ofMillis(300);

  /**
   * The index as answers read it: each folder's entries by file, and the buffer versions the
   * entries read.
   */
  record Snapshot(Map<Path, Map<Path, FileIndex>> folders, Map<Path, Integer> versions) {
    static final Snapshot EMPTY = new Snapshot(Map.of(), Map.of());

    Snapshot {
      Map<Path, Map<Path, FileIndex>> copy = new LinkedHashMap<>();
      folders.forEach((folder, files) -> copy.put(folder, Map.copyOf(files)));
      folders = java.util.Collections.unmodifiableMap(copy);
      versions = Map.copyOf(versions);
    }

    List<FileIndex> files() {
      List<FileIndex> out = new ArrayList<>();
      folders.values().forEach(m -> out.addAll(m.values()));
      return out;
    }

    /** The text an entry's ranges refer to, or null when the file is not indexed. */
    SourceFile source(Path file) {
      for (Map<Path, FileIndex> m : folders.values()) {
        FileIndex f = m.get(file);
        if (f != null) {
          return f.source();
        }
      }
      return null;
    }

    /** The version of the open buffer an entry was read from; null when it was read from disk. */
    Integer version(Path file) {
      return versions.get(file);
    }
  }

  private final EditorFeatures answers;
  private final Documents documents;
  private final Supplier<LanguageClient> client;
  private final BiConsumer<MessageType, String> log;
  private final ScheduledExecutorService worker;
  private final SpecFolderWalk walk;
  private final IndexProgress progress;
  private final AtomicLong generation = new AtomicLong();
  private final ConcurrentLinkedQueue<Path> diskChanges = new ConcurrentLinkedQueue<>();
  private final AtomicBoolean bufferSyncQueued = new AtomicBoolean();
  private final Object syncLock = new Object();

  /**
   * A sync that is queued and has not started yet, which later requests join; guarded by syncLock.
   */
  private CompletableFuture<Snapshot> queuedSync;

  private volatile boolean started;
  private volatile boolean watched;
  private volatile List<Path> wanted = List.of();
  private volatile Snapshot latest = Snapshot.EMPTY;

  // Touched by the worker thread only.
  private Map<Path, Map<Path, FileIndex>> byFolder = new LinkedHashMap<>();
  private List<Path> indexedFolders = List.of();
  private final Map<Path, SpecFolderWalk.Stamp> stamps = new HashMap<>();

  /**
   * The open buffers the entries read (text and version), so that a changed or closed buffer is
   * read again.
   */
  private final Map<Path, Documents.Doc> overlaid = new HashMap<>();

  /** Files a cancelled pass did not reach: left out until the folders change. */
  private final Set<Path> notReached = new HashSet<>();

  private boolean fullLogged;

  WorkspaceIndex(
      EditorFeatures answers,
      Documents documents,
      Supplier<LanguageClient> client,
      BiConsumer<MessageType, String> log) {
    this.answers = answers;
    this.documents = documents;
    this.client = client;
    this.log = log;
    this.walk = new SpecFolderWalk(log);
    this.progress = new IndexProgress(client, log);
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
    submit(() -> pass(g));
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
    syncSoon();
  }

  private void syncSoon() {
    if (started && bufferSyncQueued.compareAndSet(false, true)) {
      try {
        worker.schedule(
            guarded(
                () -> {
                  bufferSyncQueued.set(false);
                  sync(false);
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

  Snapshot latest() {
    return latest;
  }

  /**
   * The index once it has read the current buffers, the reported file changes and (for a client
   * that does not watch files) every file whose size or modification time changed; after {@code
   * JonquilLanguageServer.FRESH_WAIT} (e.g. while a large first pass runs), the latest one whatever
   * it holds. Never blocks the caller.
   */
  CompletableFuture<Snapshot> fresh() {
    if (!started) {
      return CompletableFuture.completedFuture(latest);
    }
    CompletableFuture<Snapshot> sync;
    synchronized (syncLock) {
      if (queuedSync == null) {
        CompletableFuture<Snapshot> mine = new CompletableFuture<>();
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
                sync(scan);
              } finally {
                mine.complete(latest);
              }
            })) {
          queuedSync = null;
          mine.complete(latest);
        }
      }
      sync = queuedSync != null ? queuedSync : CompletableFuture.completedFuture(latest);
    }
    return sync.copy()
        .completeOnTimeout(null, JonquilLanguageServer.FRESH_WAIT.toMillis(), TimeUnit.MILLISECONDS)
        .thenApply(s -> s != null ? s : latest);
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

  /**
   * A full pass for the folders of generation {@code g}: folders kept as they were are not read
   * again.
   */
  private void pass(long g) {
    if (g != generation.get()) {
      return; // a newer set of folders is queued behind this one
    }
    List<Path> folders = wanted;
    Map<Path, Map<Path, FileIndex>> next = new LinkedHashMap<>();
    List<Path> added = new ArrayList<>();
    SpecFolderWalk.Budget budget = new SpecFolderWalk.Budget();
    for (Path f : folders) {
      Map<Path, FileIndex> kept = byFolder.get(f);
      if (kept != null
          && SpecFolderWalk.nested(f, folders).equals(SpecFolderWalk.nested(f, indexedFolders))) {
        next.put(f, kept);
        budget.files += kept.size();
        kept.values().forEach(e -> budget.bytes += e.source().text().length());
      } else {
        next.put(f, new LinkedHashMap<>());
        added.add(f);
      }
    }
    byFolder = next;
    indexedFolders = folders;
    stamps.keySet().removeIf(p -> !inSomeFolder(p));
    overlaid.keySet().removeIf(p -> !inSomeFolder(p));
    notReached.removeIf(p -> added.contains(owner(p)) || owner(p) == null);
    publish();

    Map<Path, List<Path>> found = new LinkedHashMap<>();
    int total = 0;
    for (Path f : added) {
      List<Path> files = new ArrayList<>(walk.walk(f, folders, budget).keySet());
      found.put(f, files);
      total += files.size();
    }
    String token = total > 0 ? progress.begin(total) : null;
    int done = 0;
    boolean cancelled = false;
    boolean superseded = false;
    try {
      for (Map.Entry<Path, List<Path>> e : found.entrySet()) {
        List<Path> files = e.getValue();
        for (int i = 0; i < files.size() && !superseded; i += BATCH) {
          if (g != generation.get()) {
            superseded = true; // the next pass starts from what is indexed now
            break;
          }
          List<Path> batch = files.subList(i, Math.min(files.size(), i + BATCH));
          int n = cancelled ? 0 : index(e.getKey(), batch, token);
          done += n;
          cancelled |= n < batch.size() || progress.cancelled(token);
          if (cancelled) {
            notReached.addAll(batch.subList(n, batch.size()));
            continue;
          }
          publish();
          progress.report(token, done, total);
        }
      }
    } finally {
      publish();
      progress.end(
          token,
          superseded
              ? "the workspace folders changed; indexing them again"
              : cancelled
                  ? "stopped after " + done + " of " + total + " files"
                  : "indexed " + done + " files");
    }
    if (!superseded) {
      logPass(done, total, folders.size(), budget, cancelled);
    }
  }

  /**
   * Reads what changed since the last sync: the reported disk changes, the open buffers, and with
   * {@code scan} every file whose stamp changed; re-indexes them and the files that read them.
   */
  private void sync(boolean scan) {
    Set<Path> changed = new LinkedHashSet<>();
    for (Path p; (p = diskChanges.poll()) != null; ) {
      changed.add(p);
    }
    Map<Path, Documents.Doc> open = documents.snapshot();
    open.forEach(
        (p, doc) -> {
          Documents.Doc seen = overlaid.get(p);
          if (owner(p) != null
              && (seen == null
                  || seen.version() != doc.version()
                  || !seen.text().equals(doc.text()))) {
            changed.add(p);
          }
        });
    for (Path p : overlaid.keySet()) {
      if (!open.containsKey(p)) {
        changed.add(p); // closed: the disk has the text now
      }
    }
    if (scan) {
      changed.addAll(changedOnDisk(open.keySet()));
    }
    if (!changed.isEmpty()) {
      refresh(changed);
      publish();
    }
  }

  /**
   * Files created, changed or deleted on disk since they were indexed (the cheap check: size, time,
   * file key).
   */
  private Set<Path> changedOnDisk(Set<Path> open) {
    Set<Path> out = new LinkedHashSet<>();
    SpecFolderWalk.Budget budget = new SpecFolderWalk.Budget();
    for (Path folder : indexedFolders) {
      Map<Path, SpecFolderWalk.Stamp> now = walk.walk(folder, indexedFolders, budget);
      now.forEach(
          (p, stamp) -> {
            if (!notReached.contains(p) && !stamp.equals(stamps.get(p))) {
              out.add(p);
            }
          });
      for (Path p : byFolder.getOrDefault(folder, Map.of()).keySet()) {
        if (!now.containsKey(p) && !open.contains(p)) {
          out.add(p);
        }
      }
    }
    return out;
  }

  /**
   * Re-indexes the changed files, then the files whose entries depend on what changed in them (see
   * {@link IndexRebuild}).
   */
  private void refresh(Set<Path> changed) {
    Map<Path, FileIndex> before = new HashMap<>();
    Map<Path, FileIndex> all = entries();
    for (Path p : changed) {
      if (all.containsKey(p)) {
        before.put(p, all.get(p));
      }
    }
    reindex(changed);
    Set<Path> affected = IndexRebuild.dependents(changed, before, entries());
    if (!affected.isEmpty()) {
      reindex(affected);
    }
  }

  /** Every entry, folder by folder. */
  private Map<Path, FileIndex> entries() {
    Map<Path, FileIndex> out = new LinkedHashMap<>();
    byFolder.values().forEach(out::putAll);
    return out;
  }

  /**
   * Indexes the files again, or forgets those that are gone, unreadable, too large or outside every
   * folder.
   */
  private void reindex(Set<Path> files) {
    Set<Path> open = documents.snapshot().keySet();
    int count = byFolder.values().stream().mapToInt(Map::size).sum();
    Map<Path, List<Path>> toIndex = new LinkedHashMap<>();
    for (Path p : files) {
      Path folder = owner(p);
      boolean readable =
          open.contains(p)
              || (Files.isRegularFile(p)
                  && SpecFolderWalk.size(p) <= SpecFolderWalk.MAX_FILE_BYTES);
      if (folder == null || !SpecFolderWalk.eligible(folder, p) || !readable) {
        forget(p);
        continue;
      }
      if (!indexed(p)) {
        if (count >= SpecFolderWalk.MAX_FILES) {
          logFull();
          continue;
        }
        count++;
      }
      toIndex.computeIfAbsent(folder, k -> new ArrayList<>()).add(p);
    }
    toIndex.forEach(
        (folder, list) -> {
          list.sort(null);
          for (int i = 0; i < list.size(); i += BATCH) {
            index(folder, list.subList(i, Math.min(list.size(), i + BATCH)), null);
          }
        });
  }

  /**
   * Checks the files names-only under their folder, with the open buffers overlaid, and stores
   * their entries; returns how many it stored, fewer when the progress under {@code token} was
   * cancelled.
   */
  private int index(Path folder, List<Path> files, String token) {
    Map<Path, Documents.Doc> open = documents.snapshot();
    Map<Path, String> buffers = new HashMap<>();
    open.forEach((p, doc) -> buffers.put(p, doc.text()));
    Map<Path, SpecFolderWalk.Stamp> before = new HashMap<>();
    for (Path f : files) {
      SpecFolderWalk.stamp(f)
          .ifPresent(
              s ->
                  before.put(
                      f, s)); // taken before reading, so a write during the check shows next time
    }
    Result result =
        Checker.check(Workspace.withOverlay(folder, buffers), files, CheckOptions.NAMES);
    Map<Path, FileIndex> into = byFolder.get(folder);
    int stored = 0;
    for (Path f : files) {
      Optional<FileIndex> entry = answers.index(result, f);
      if (entry.isPresent()) {
        into.put(f, entry.get());
      } else {
        into.remove(f);
      }
      if (before.containsKey(f)) {
        stamps.put(f, before.get(f));
      } else {
        stamps.remove(f);
      }
      if (open.containsKey(f)) {
        overlaid.put(f, open.get(f));
      } else {
        overlaid.remove(f);
      }
      notReached.remove(f);
      stored++;
      if (progress.cancelled(token)) {
        break; // the file in hand is kept; the rest waits for the next change of folders
      }
    }
    return stored;
  }

  private void forget(Path file) {
    byFolder.values().forEach(m -> m.remove(file));
    stamps.remove(file);
    overlaid.remove(file);
  }

  private void publish() {
    Map<Path, Integer> versions = new HashMap<>();
    overlaid.forEach((p, doc) -> versions.put(p, doc.version()));
    latest = new Snapshot(byFolder, versions);
  }

  /** Indexed, or at least looked at (a file that could not be read has a stamp and no entry). */
  private boolean indexed(Path file) {
    return inSomeFolder(file) || stamps.containsKey(file);
  }

  private boolean inSomeFolder(Path file) {
    return byFolder.values().stream().anyMatch(m -> m.containsKey(file));
  }

  /**
   * The innermost indexed folder holding the file, as the check cycle roots it; null outside every
   * folder.
   */
  private Path owner(Path file) {
    Path best = null;
    for (Path folder : indexedFolders) {
      if (file.startsWith(folder)
          && (best == null || folder.getNameCount() > best.getNameCount())) {
        best = folder;
      }
    }
    return best;
  }

  private void logPass(
      int done, int total, int folders, SpecFolderWalk.Budget budget, boolean cancelled) {
    StringBuilder m =
        new StringBuilder(
            "workspace index: "
                + done
                + " of "
                + total
                + " new spec files indexed under "
                + folders
                + " folder(s)");
    if (cancelled) {
      m.append("; stopped by the editor, the rest is indexed when the folders change");
    }
    if (budget.capped) {
      m.append(
          "; stopped at the cap of "
              + SpecFolderWalk.MAX_FILES
              + " files or "
              + (SpecFolderWalk.MAX_TOTAL_BYTES >> 20)
              + " MiB of text");
    }
    if (budget.tooLarge > 0) {
      m.append(
          "; "
              + budget.tooLarge
              + " file(s) over "
              + (SpecFolderWalk.MAX_FILE_BYTES >> 20)
              + " MiB left out");
    }
    log.accept(
        budget.capped || budget.tooLarge > 0 ? MessageType.Warning : MessageType.Log, m.toString());
  }

  private void logFull() {
    if (!fullLogged) {
      fullLogged = true;
      log.accept(
          MessageType.Warning,
          "workspace index: "
              + SpecFolderWalk.MAX_FILES
              + " files reached; new files are left out");
    }
  }
}
