package jonquil.ide;

import java.nio.file.Path;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Which entries of a workspace index to compute again after some files were: a file's entry depends
 * on the files it reads and uses, so when a changed file's declared names, {@code use} lines or
 * read files changed (or it came or went), every file that reads or uses it, however indirectly, is
 * indexed again. Editing the body of a library that many files use re-reads the library alone.
 */
public final class IndexRebuild {
  private IndexRebuild() {}

  /** What other files' entries depend on: the names a file declares, its uses and its reads. */
  record Signature(Set<String> declared, List<Path> uses, List<Path> reads) {
    static Signature of(FileIndex f) {
      Set<String> declared = new HashSet<>();
      f.names().stream()
          .filter(FileIndex.NameUse::declaration)
          .forEach(n -> declared.add(n.name()));
      return new Signature(declared, f.uses(), f.reads());
    }
  }

  /**
   * The files to index again, {@code changed} excluded, after {@code changed} were indexed again.
   *
   * @param before the entries the changed files had (none for a file that was not indexed)
   * @param now every entry of the index as it is now, by file, in the index's order
   */
  public static Set<Path> dependents(
      Set<Path> changed, Map<Path, FileIndex> before, Map<Path, FileIndex> now) {
    Set<Path> affected = new LinkedHashSet<>();
    for (Path p : changed) {
      FileIndex after = now.get(p);
      FileIndex was = before.get(p);
      if (after == null || was == null || !Signature.of(after).equals(Signature.of(was))) {
        affected.add(p);
      }
    }
    for (boolean grew = true; grew; ) {
      grew = false;
      for (FileIndex f : now.values()) {
        if (!affected.contains(f.file())
            && (anyIn(f.reads(), affected) || anyIn(f.uses(), affected))) {
          affected.add(f.file());
          grew = true;
        }
      }
    }
    affected.removeAll(changed);
    return affected;
  }

  private static boolean anyIn(List<Path> paths, Set<Path> set) {
    for (Path p : paths) {
      if (set.contains(p)) {
        return true;
      }
    }
    return false;
  }
}
