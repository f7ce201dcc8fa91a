package jonquil.cli;

import java.nio.file.Files;
import java.nio.file.Path;

/** Finds the directory that relative `use` paths and report paths are anchored to. */
final class ProjectRoot {
  /** An empty file that marks a root where there is no version control, or overrides it. */
  static final String MARKER = ".jonquil-root";

  private ProjectRoot() {}

  /**
   * The nearest ancestor of {@code start} (itself included when it is a directory) holding {@code
   * .git} or the marker; {@code .git} is only tested for existence because in a worktree or
   * submodule it is a file.
   */
  static Path discover(Path start, Path fallback) {
    Path abs = start.toAbsolutePath().normalize();
    Path dir = Files.isDirectory(abs) ? abs : abs.getParent();
    for (Path d = dir; d != null; d = d.getParent()) {
      if (Files.exists(d.resolve(".git")) || Files.exists(d.resolve(MARKER))) {
        return d;
      }
    }
    return fallback.toAbsolutePath().normalize();
  }
}
