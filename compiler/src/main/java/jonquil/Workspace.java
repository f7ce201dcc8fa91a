package jonquil;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.Map;
import jonquil.syntax.ParseMemo;

/**
 * Where a check reads its files from: a project root (no `use` may leave it) and a reader that sees
 * the disk, optionally overlaid with unsaved editor buffers; and, for an editor that checks again
 * after every edit, the memory of earlier parses (null: none).
 */
public record Workspace(Path root, Reader reader, ParseMemo memo) {

  /**
   * Reads the text of one file, of at most {@code limit} bytes; throws when it does not exist or
   * cannot be read ({@link FileText.Refused} says why in plain words).
   */
  @FunctionalInterface
  public interface Reader {
    String read(Path file, long limit) throws IOException;

    /** True when something is there to read, or to refuse with a reason (a FIFO, a directory). */
    default boolean exists(Path file) {
      return Files.exists(file);
    }

    /** The spec files in a folder, for "did you mean" on a mistyped 'use' path. */
    default java.util.List<Path> specsIn(Path folder) {
      try (var files = Files.list(folder)) {
        return files.filter(f -> f.toString().endsWith(".jonq")).sorted().toList();
      } catch (IOException | RuntimeException e) {
        return java.util.List.of();
      }
    }
  }

  public Workspace {
    root = root.toAbsolutePath().normalize();
  }

  public Workspace(Path root, Reader reader) {
    this(root, reader, null);
  }

  /**
   * This workspace, parsing with {@code memo}'s memory of earlier parses (one memo per checking
   * thread).
   */
  public Workspace withMemo(ParseMemo memo) {
    return new Workspace(root, reader, memo);
  }

  /**
   * True when {@code file} lies inside the root with every link on its way followed, so a link
   * cannot lead a 'use' or 'table' out of the project. A path that names nothing on disk (an
   * unsaved buffer, a missing file) is judged by its text: it leads nowhere.
   */
  public boolean contains(Path file) {
    Path path = file.toAbsolutePath().normalize();
    if (!path.startsWith(root)) {
      return false;
    }
    if (!Files.exists(path, LinkOption.NOFOLLOW_LINKS)) {
      return true;
    }
    try {
      return path.toRealPath().startsWith(root.toRealPath());
    } catch (IOException | SecurityException e) {
      return true; // a dangling link: reading it fails, and the failure names no target
    }
  }

  public static Workspace onDisk(Path root) {
    return new Workspace(root, FileText::read);
  }

  /** The disk, with open buffers taking precedence over what is saved. */
  public static Workspace withOverlay(Path root, Map<Path, String> buffers) {
    Map<Path, String> copy = Map.copyOf(buffers);
    return new Workspace(
        root,
        new Reader() {
          @Override
          public String read(Path file, long limit) throws IOException {
            String open = copy.get(file.toAbsolutePath().normalize());
            return open != null ? open : FileText.read(file, limit);
          }

          @Override
          public boolean exists(Path file) {
            return copy.containsKey(file.toAbsolutePath().normalize()) || Files.exists(file);
          }
        });
  }
}
