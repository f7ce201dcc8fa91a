package jonquil.lsp;

import java.io.IOException;
import java.nio.file.FileVisitOption;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.nio.file.attribute.FileTime;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import java.util.function.BiConsumer;
import org.eclipse.lsp4j.MessageType;

/**
 * Which spec files under the workspace folders the index takes: the walk of a folder (hidden
 * directories, build output and nested folders skipped), the stamps that tell a file changed on
 * disk, and the limits on file size, file count and total text.
 */
final class SpecFolderWalk {
  /**
   * Spec files indexed across all folders; a workspace with more is not a spec project, and the
   * rest is left out.
   */
  static final int MAX_FILES = 5_000;

  /**
   * Larger files are left out (precedent: editors cap at about 1 MiB; specs are hand-written and
   * far smaller).
   */
  static final long MAX_FILE_BYTES = 1L << 20;

  /**
   * The index keeps every file's text (positions are converted from it), so the first pass caps the
   * total too.
   */
  static final long MAX_TOTAL_BYTES = 64L << 20;

  /** What says a file on disk changed since it was indexed. */
  record Stamp(FileTime modified, long size, Object key) {
    static Stamp of(BasicFileAttributes a) {
      return new Stamp(a.lastModifiedTime(), a.size(), a.fileKey());
    }
  }

  /** What a walk may still take, and what it left out. */
  static final class Budget {
    int files;
    long bytes;
    int tooLarge;
    boolean capped;
  }

  private final BiConsumer<MessageType, String> log;

  SpecFolderWalk(BiConsumer<MessageType, String> log) {
    this.log = log;
  }

  /**
   * The spec files below {@code folder} with their stamps, by path, within the budget; nested
   * folders are theirs.
   */
  Map<Path, Stamp> walk(Path folder, List<Path> folders, Budget budget) {
    Map<Path, Stamp> out = new TreeMap<>();
    try {
      Files.walkFileTree(
          folder,
          EnumSet.noneOf(FileVisitOption.class),
          Integer.MAX_VALUE,
          new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult preVisitDirectory(Path dir, BasicFileAttributes attrs) {
              if (!dir.equals(folder)
                  && (skippedDirectory(dir.getFileName().toString()) || folders.contains(dir))) {
                return FileVisitResult.SKIP_SUBTREE;
              }
              return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) {
              if (!attrs.isRegularFile() || !file.getFileName().toString().endsWith(".jonq")) {
                return FileVisitResult.CONTINUE;
              }
              if (attrs.size() > MAX_FILE_BYTES) {
                budget.tooLarge++;
                return FileVisitResult.CONTINUE;
              }
              if (budget.files >= MAX_FILES || budget.bytes + attrs.size() > MAX_TOTAL_BYTES) {
                budget.capped = true;
                return FileVisitResult.TERMINATE;
              }
              budget.files++;
              budget.bytes += attrs.size();
              out.put(file, Stamp.of(attrs));
              return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult visitFileFailed(Path file, IOException e) {
              return FileVisitResult.CONTINUE; // unreadable or gone: not indexed
            }
          });
    } catch (IOException | RuntimeException e) {
      log.accept(
          MessageType.Warning,
          "could not list the spec files under '"
              + folder
              + "' ("
              + JonquilLanguageServer.describe(e)
              + ")");
    }
    return out;
  }

  /**
   * The folders strictly inside {@code folder}: their files are indexed under them, not under it.
   */
  static Set<Path> nested(Path folder, List<Path> all) {
    Set<Path> out = new HashSet<>();
    for (Path f : all) {
      if (!f.equals(folder) && f.startsWith(folder)) {
        out.add(f);
      }
    }
    return out;
  }

  /** A spec file below {@code folder} in no hidden directory and no build output. */
  static boolean eligible(Path folder, Path file) {
    if (!file.getFileName().toString().endsWith(".jonq")) {
      return false;
    }
    Path relative = folder.relativize(file);
    for (int i = 0; i < relative.getNameCount() - 1; i++) {
      if (skippedDirectory(relative.getName(i).toString())) {
        return false;
      }
    }
    return true;
  }

  /**
   * Hidden directories (.git, editor state) and Maven's build output hold no specs of the project.
   */
  private static boolean skippedDirectory(String name) {
    return name.startsWith(".") || name.equals("target");
  }

  static Optional<Stamp> stamp(Path file) {
    try {
      return Optional.of(Stamp.of(Files.readAttributes(file, BasicFileAttributes.class)));
    } catch (IOException | RuntimeException e) {
      return Optional.empty();
    }
  }

  static long size(Path file) {
    return stamp(file).map(Stamp::size).orElse(Long.MAX_VALUE);
  }
}
