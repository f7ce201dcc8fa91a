package jonquil.lsp;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Queue;
import java.util.Set;
import java.util.function.BiConsumer;
import java.util.function.LongSupplier;
import jonquil.ide.EditorFeatures;
import jonquil.ide.FileIndex;
import jonquil.ide.IndexRebuild;
import org.eclipse.lsp4j.MessageType;

/** The index worker's jobs: the pass over new folders, and syncs of what changed since. */
final class IndexWorker {
  private final Documents documents;
  private final IndexedFiles files;
  private final IndexProgress progress;
  private final SpecFolderWalk walk;
  private final IndexLog log;
  private final FileIndexer indexer;

  IndexWorker(
      EditorFeatures answers,
      Documents documents,
      IndexedFiles files,
      IndexProgress progress,
      BiConsumer<MessageType, String> log) {
    this.documents = documents;
    this.files = files;
    this.progress = progress;
    this.walk = new SpecFolderWalk(log);
    this.log = new IndexLog(log);
    this.indexer = new FileIndexer(answers, documents, progress, files);
  }

  /**
   * Indexes {@code folders}, the folders of generation {@code g}; folders kept as they were are not
   * read again. Stops between batches once {@code generation} has moved on (the next pass starts
   * from what is indexed then).
   */
  void pass(long g, List<Path> folders, LongSupplier generation) {
    SpecFolderWalk.Budget budget = new SpecFolderWalk.Budget();
    List<Path> added = files.setFolders(folders, budget);
    files.publish();

    Map<Path, List<Path>> found = new LinkedHashMap<>();
    int total = 0;
    for (Path f : added) {
      List<Path> inFolder = new ArrayList<>(walk.walk(f, folders, budget).keySet());
      found.put(f, inFolder);
      total += inFolder.size();
    }
    String token = total > 0 ? progress.begin(total) : null;
    int done = 0;
    boolean cancelled = false;
    boolean superseded = false;
    try {
      for (Map.Entry<Path, List<Path>> e : found.entrySet()) {
        List<Path> inFolder = e.getValue();
        for (int i = 0; i < inFolder.size() && !superseded; i += FileIndexer.BATCH) {
          if (g != generation.getAsLong()) {
            superseded = true;
            break;
          }
          List<Path> batch = inFolder.subList(i, Math.min(inFolder.size(), i + FileIndexer.BATCH));
          int n = cancelled ? 0 : indexer.index(e.getKey(), batch, token);
          done += n;
          cancelled |= n < batch.size() || progress.cancelled(token);
          if (cancelled) {
            files.notReached(batch.subList(n, batch.size()));
            continue;
          }
          files.publish();
          progress.report(token, done, total);
        }
      }
    } finally {
      files.publish();
      progress.end(
          token,
          superseded
              ? "the workspace folders changed; indexing them again"
              : cancelled
                  ? "stopped after " + done + " of " + total + " files"
                  : "indexed " + done + " files");
    }
    if (!superseded) {
      log.pass(done, total, folders.size(), budget, cancelled);
    }
  }

  /**
   * Reads what changed since the last sync: the reported disk changes, the open buffers, and with
   * {@code scan} every file whose stamp changed; re-indexes them and the files that read them.
   */
  void sync(Queue<Path> diskChanges, boolean scan) {
    Set<Path> changed = new LinkedHashSet<>();
    for (Path p; (p = diskChanges.poll()) != null; ) {
      changed.add(p);
    }
    Map<Path, Documents.Doc> open = documents.snapshot();
    changed.addAll(files.changedBuffers(open));
    if (scan) {
      changed.addAll(files.changedOnDisk(walk, open.keySet()));
    }
    if (changed.isEmpty()) {
      return;
    }
    Map<Path, FileIndex> before = new HashMap<>();
    Map<Path, FileIndex> all = files.entries();
    for (Path p : changed) {
      if (all.containsKey(p)) {
        before.put(p, all.get(p));
      }
    }
    reindex(changed);
    // Then the files whose entries depend on what changed in these.
    Set<Path> affected = IndexRebuild.dependents(changed, before, files.entries());
    if (!affected.isEmpty()) {
      reindex(affected);
    }
    files.publish();
  }

  /**
   * Indexes the files again, or forgets those that are gone, unreadable, too large or outside every
   * folder.
   */
  private void reindex(Set<Path> changed) {
    Set<Path> open = documents.snapshot().keySet();
    int count = files.size();
    Map<Path, List<Path>> toIndex = new LinkedHashMap<>();
    for (Path p : changed) {
      Path folder = files.owner(p);
      boolean readable =
          open.contains(p)
              || (Files.isRegularFile(p)
                  && SpecFolderWalk.size(p) <= SpecFolderWalk.MAX_FILE_BYTES);
      if (folder == null || !SpecFolderWalk.eligible(folder, p) || !readable) {
        files.forget(p);
        continue;
      }
      if (!files.indexed(p)) {
        if (count >= SpecFolderWalk.MAX_FILES) {
          log.full();
          continue;
        }
        count++;
      }
      toIndex.computeIfAbsent(folder, k -> new ArrayList<>()).add(p);
    }
    toIndex.forEach(
        (folder, list) -> {
          list.sort(null);
          indexer.indexAll(folder, list);
        });
  }
}
