package jonquil.ide;

import java.nio.file.Path;

/** Where a {@code use} line points: the one rule that hover, links and navigation share. */
final class UseTarget {
  private UseTarget() {}

  /** The file a {@code use} line names, relative to the file that contains it. */
  static Path of(Path file, String target) {
    Path dir = file.getParent();
    return OwningModels.norm(dir == null ? Path.of(target) : dir.resolve(target));
  }
}
