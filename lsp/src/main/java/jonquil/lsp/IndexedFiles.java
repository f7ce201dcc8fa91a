package jonquil.lsp;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import jonquil.ide.FileIndex;

/** The workspace index's state: entries, disk stamps, overlaid buffers, the last snapshot. */
final class IndexedFiles {
  private volatile IndexSnapshot latest = IndexSnapshot.EMPTY;

  private Map<Path, Map<Path, FileIndex>> byFolder = new LinkedHashMap<>();
  private List<Path> folders = List.of();
  private final Map<Path, SpecFolderWalk.Stamp> stamps = new HashMap<>();

  /**
   * The open buffers the entries read (text and version), so that a changed or closed buffer is
   * read again.
   */
  private final Map<Path, Documents.Doc> overlaid = new HashMap<>();

  /** Files a cancelled pass did not reach: left out until the folders change. */
  private final Set<Path> notReached = new HashSet<>();

  /**
   * Takes a new set of folders: a folder whose nested folders are as before keeps its entries
   * (counted into {@code budget}); the others start empty and are returned, to be walked.
   */
  List<Path> setFolders(List<Path> next, SpecFolderWalk.Budget budget) {
    Map<Path, Map<Path, FileIndex>> kept = new LinkedHashMap<>();
    List<Path> added = new ArrayList<>();
    for (Path f : next) {
      Map<Path, FileIndex> had = byFolder.get(f);
      if (had != null && SpecFolderWalk.nested(f, next).equals(SpecFolderWalk.nested(f, folders))) {
        kept.put(f, had);
        budget.files += had.size();
        had.values().forEach(e -> budget.bytes += e.source().text().length());
      } else {
        kept.put(f, new LinkedHashMap<>());
        added.add(f);
      }
    }
    byFolder = kept;
    folders = next;
    stamps.keySet().removeIf(p -> !inSomeFolder(p));
    overlaid.keySet().removeIf(p -> !inSomeFolder(p));
    notReached.removeIf(p -> added.contains(owner(p)) || owner(p) == null);
    return added;
  }

  List<Path> folders() {
    return folders;
  }

  /** Every entry, folder by folder. */
  Map<Path, FileIndex> entries() {
    Map<Path, FileIndex> out = new LinkedHashMap<>();
    byFolder.values().forEach(out::putAll);
    return out;
  }

  int size() {
    return byFolder.values().stream().mapToInt(Map::size).sum();
  }

  /**
   * Stores what a check found for a file of {@code folder}: its entry (none: forgotten), the stamp
   * taken before reading it, and the open buffer read in place of the disk.
   */
  void store(
      Path folder,
      Path file,
      Optional<FileIndex> entry,
      SpecFolderWalk.Stamp stamp,
      Documents.Doc buffer) {
    Map<Path, FileIndex> into = byFolder.get(folder);
    entry.ifPresentOrElse(e -> into.put(file, e), () -> into.remove(file));
    putOrRemove(stamps, file, stamp);
    putOrRemove(overlaid, file, buffer);
    notReached.remove(file);
  }

  private static <V> void putOrRemove(Map<Path, V> map, Path file, V value) {
    if (value != null) {
      map.put(file, value);
    } else {
      map.remove(file);
    }
  }

  void notReached(List<Path> files) {
    notReached.addAll(files);
  }

  void forget(Path file) {
    byFolder.values().forEach(m -> m.remove(file));
    stamps.remove(file);
    overlaid.remove(file);
  }

  /** Publishes what is indexed now as the immutable view answers read. */
  void publish() {
    Map<Path, Integer> versions = new HashMap<>();
    overlaid.forEach((p, doc) -> versions.put(p, doc.version()));
    latest = new IndexSnapshot(byFolder, versions);
  }

  /** The view last published. */
  IndexSnapshot latest() {
    return latest;
  }

  /**
   * Open buffers that differ from what their entries read, under some folder, and files whose
   * buffer has closed since (the disk has their text now).
   */
  Set<Path> changedBuffers(Map<Path, Documents.Doc> open) {
    Set<Path> out = new LinkedHashSet<>();
    open.forEach(
        (p, doc) -> {
          Documents.Doc seen = overlaid.get(p);
          if (owner(p) != null
              && (seen == null
                  || seen.version() != doc.version()
                  || !seen.text().equals(doc.text()))) {
            out.add(p);
          }
        });
    for (Path p : overlaid.keySet()) {
      if (!open.containsKey(p)) {
        out.add(p);
      }
    }
    return out;
  }

  /**
   * Files created, changed or deleted on disk since they were indexed (the cheap check: size, time,
   * file key); a deleted file that is open is not counted.
   */
  Set<Path> changedOnDisk(SpecFolderWalk walk, Set<Path> open) {
    Set<Path> out = new LinkedHashSet<>();
    SpecFolderWalk.Budget budget = new SpecFolderWalk.Budget();
    for (Path folder : folders) {
      Map<Path, SpecFolderWalk.Stamp> now = walk.walk(folder, folders, budget);
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

  /** Indexed, or at least looked at (a file that could not be read has a stamp and no entry). */
  boolean indexed(Path file) {
    return inSomeFolder(file) || stamps.containsKey(file);
  }

  private boolean inSomeFolder(Path file) {
    return byFolder.values().stream().anyMatch(m -> m.containsKey(file));
  }

  /**
   * The innermost indexed folder holding the file, as the check cycle roots it; null outside every
   * folder.
   */
  Path owner(Path file) {
    Path best = null;
    for (Path folder : folders) {
      if (file.startsWith(folder)
          && (best == null || folder.getNameCount() > best.getNameCount())) {
        best = folder;
      }
    }
    return best;
  }
}
