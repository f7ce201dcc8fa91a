package jonquil.lsp;

import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import jonquil.Result;

/**
 * The latest finished check that requests answer from, and a non-blocking wait for one that saw a
 * given document version.
 */
final class Snapshots {

  /**
   * The immutable results of one check, the document versions they were computed from, and the
   * generation of the workspace folders they were rooted by (it grows with every folder change).
   */
  record Snapshot(List<Result> results, Map<Path, Integer> versions, long folders) {
    static final Snapshot EMPTY = new Snapshot(List.of(), Map.of(), 0);

    Snapshot {
      results = List.copyOf(results);
      versions = Map.copyOf(versions);
    }

    /**
     * The result that read this file, if any check did; none for a document that names no file
     * (null).
     */
    Optional<Result> resultFor(Path file) {
      if (file == null) {
        return Optional.empty(); // the results' file maps reject null keys
      }
      for (Result r : results) {
        if (r.files().containsKey(file)) {
          return Optional.of(r);
        }
      }
      return Optional.empty();
    }
  }

  private record Waiter(
      Path path, Integer version, long folders, CompletableFuture<Snapshot> future) {}

  private volatile Snapshot latest = Snapshot.EMPTY;
  private final List<Waiter> waiters = new ArrayList<>();

  Snapshot latest() {
    return latest;
  }

  void publish(Snapshot snapshot) {
    latest = snapshot;
    List<Waiter> ready = new ArrayList<>();
    synchronized (waiters) {
      for (Iterator<Waiter> it = waiters.iterator(); it.hasNext(); ) {
        Waiter w = it.next();
        if (w.future.isDone() || saw(snapshot, w.path, w.version, w.folders)) {
          it.remove();
          ready.add(w);
        }
      }
    }
    ready.forEach(w -> w.future.complete(snapshot));
  }

  /** Lets every waiter go on with what there is, e.g. after a check failed. */
  void releaseAll() {
    List<Waiter> all;
    synchronized (waiters) {
      all = new ArrayList<>(waiters);
      waiters.clear();
    }
    Snapshot now = latest;
    all.forEach(w -> w.future.complete(now));
  }

  /**
   * A snapshot that saw at least {@code version} of the file ({@code null}: any will do) under at
   * least generation {@code folders} of the workspace folders; after {@code timeout}, the latest
   * one whatever it saw. Before the first check, a request about no document version gets the empty
   * snapshot at once. Never blocks the caller.
   */
  CompletableFuture<Snapshot> fresh(Path file, Integer version, long folders, Duration timeout) {
    Snapshot now = latest;
    if (saw(now, file, version, folders) || (version == null && now == Snapshot.EMPTY)) {
      return CompletableFuture.completedFuture(now);
    }
    CompletableFuture<Snapshot> future = new CompletableFuture<>();
    synchronized (waiters) {
      waiters.add(new Waiter(file, version, folders, future));
    }
    // A check may have finished between the test above and the registration.
    if (saw(latest, file, version, folders)) {
      future.complete(latest);
    }
    return future
        .completeOnTimeout(null, timeout.toMillis(), TimeUnit.MILLISECONDS)
        .thenApply(s -> s != null ? s : latest);
  }

  private static boolean saw(Snapshot snapshot, Path file, Integer version, long folders) {
    if (snapshot.folders() < folders) {
      return false; // checked under workspace folders that have changed since
    }
    if (version == null) {
      return true;
    }
    Integer seen = snapshot.versions().get(file);
    return seen != null && seen >= version;
  }
}
