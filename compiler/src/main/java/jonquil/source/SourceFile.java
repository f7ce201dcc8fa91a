package jonquil.source;

import java.nio.file.Path;
import java.util.Objects;

/** The text of one .jonq file as it was checked, with its line index. */
public final class SourceFile {
  private final Path path;
  private final String text;
  private final LineIndex lines;

  public SourceFile(Path path, String text) {
    this.path = Objects.requireNonNull(path).toAbsolutePath().normalize();
    this.text = Objects.requireNonNull(text);
    this.lines = new LineIndex(text);
  }

  public Path path() {
    return path;
  }

  public String text() {
    return text;
  }

  public LineIndex lines() {
    return lines;
  }

  public String slice(TextRange range) {
    return text.substring(
        Math.min(range.start(), text.length()), Math.min(range.end(), text.length()));
  }

  /** 1-based line of an offset, for people. */
  public int humanLine(int offset) {
    return lines.line(offset) + 1;
  }

  /** 1-based column of an offset in Unicode code points, for people. */
  public int humanColumn(int offset) {
    return lines.codePointColumn(offset) + 1;
  }

  @Override
  public String toString() {
    return path.toString();
  }
}
