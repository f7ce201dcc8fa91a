package jonquil.cli;

import java.nio.file.Path;
import java.util.Map;
import jonquil.source.SourceFile;

/**
 * A place in a file as reports show it: 1-based line, 1-based column in code points, and the UTF-16
 * offset it came from.
 */
record Position(int line, int column, int offset) {

  /** Looks offsets up in the texts the checker read, so reports match exactly what was checked. */
  static Position of(Map<Path, SourceFile> files, Path file, int offset) {
    SourceFile source = files.get(file.toAbsolutePath().normalize());
    if (source == null) {
      // The checker reported on a text it did not hand back; the start is the only honest place.
      return new Position(1, 1, offset);
    }
    return new Position(source.humanLine(offset), source.humanColumn(offset), offset);
  }
}
