package jonquil.lsp;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import jonquil.ide.FileIndex;
import jonquil.source.SourceFile;

/** The workspace index as answers read it: entries by folder, and the buffer versions read. */
record IndexSnapshot(Map<Path, Map<Path, FileIndex>> folders, Map<Path, Integer> versions) {
  static final IndexSnapshot EMPTY = new IndexSnapshot(Map.of(), Map.of());

  IndexSnapshot {
    Map<Path, Map<Path, FileIndex>> copy = new LinkedHashMap<>();
    folders.forEach((folder, files) -> copy.put(folder, Map.copyOf(files)));
    folders = Collections.unmodifiableMap(copy);
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
