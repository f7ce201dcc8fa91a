package jonquil.lsp;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import jonquil.CheckOptions;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import jonquil.ide.EditorFeatures;

/** Indexes a batch of files: a names-only check under their folder, buffers laid over disk. */
final class FileIndexer {
  /**
   * Files checked together, so that a library they share is parsed once; progress is reported per
   * batch.
   */
  static final int BATCH = 32;

  private final EditorFeatures answers;
  private final Documents documents;
  private final IndexProgress progress;
  private final IndexedFiles files;

  FileIndexer(
      EditorFeatures answers, Documents documents, IndexProgress progress, IndexedFiles files) {
    this.answers = answers;
    this.documents = documents;
    this.progress = progress;
    this.files = files;
  }

  /**
   * Indexes {@code batch} (at most {@link #BATCH} files of {@code folder}); returns how many it
   * stored, fewer when the progress under {@code token} was cancelled.
   */
  int index(Path folder, List<Path> batch, String token) {
    Map<Path, Documents.Doc> open = documents.snapshot();
    Map<Path, String> buffers = new HashMap<>();
    open.forEach((p, doc) -> buffers.put(p, doc.text()));
    // Stamps taken before reading, so that a write during the check shows next time.
    Map<Path, SpecFolderWalk.Stamp> before = new HashMap<>();
    for (Path f : batch) {
      SpecFolderWalk.stamp(f).ifPresent(s -> before.put(f, s));
    }
    Result result =
        Checker.check(Workspace.withOverlay(folder, buffers), batch, CheckOptions.NAMES);
    int stored = 0;
    for (Path f : batch) {
      files.store(folder, f, answers.index(result, f), before.get(f), open.get(f));
      stored++;
      if (progress.cancelled(token)) {
        break; // the file in hand is kept; the rest waits for the next change of folders
      }
    }
    return stored;
  }

  /** Indexes files of one folder in batches, without progress. */
  void indexAll(Path folder, List<Path> sorted) {
    for (int i = 0; i < sorted.size(); i += BATCH) {
      index(folder, sorted.subList(i, Math.min(sorted.size(), i + BATCH)), null);
    }
  }
}
