package jonquil.source;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * Finds the directory that relative `use` paths and report paths are anchored to, for the command
 * line and the language server alike.
 */
public final class ProjectRoot {
  /** An empty file that marks a root where there is no version control, or overrides it. */
  public static final String MARKER = ".jonquil-root";

  private ProjectRoot() {}

  /**
   * The nearest ancestor of {@code start} (itself included when it is a directory) holding {@code
   * .git} or the marker, else {@code fallback}; {@code .git} is only tested for existence because
   * in a worktree or submodule it is a file.
   */
  public static Path discover(Path start, Path fallback) {
    Path abs = start.toAbsolutePath().normalize();
    Path dir = Files.isDirectory(abs) ? abs : abs.getParent();
    for (Path d = dir; d != null; d = d.getParent()) {
      if (Files.exists(d.resolve(".git")) || Files.exists(d.resolve(MARKER))) {
        return d;
      }
    }
    return fallback.toAbsolutePath().normalize();
  }

  /**
   * The root of a file an editor has open: the innermost of the workspace {@code folders} holding
   * it, else as {@link #discover} finds it from the file, else the file's folder.
   */
  public static Path owning(Path file, List<Path> folders) {
    Path best = null;
    for (Path folder : folders) {
      if (file.startsWith(folder)
          && (best == null || folder.getNameCount() > best.getNameCount())) {
        best = folder;
      }
    }
    if (best != null) {
      return best;
    }
    Path dir = file.toAbsolutePath().normalize().getParent();
    return discover(file, dir != null ? dir : file);
  }
}
