package jonquil.source;

/**
 * A half-open span [start, end) of UTF-16 char offsets into one source text. Offsets are Java
 * string indices so that every layer can slice text directly; line/column forms for people and for
 * LSP are derived by {@link LineIndex}.
 */
public record TextRange(int start, int end) implements Comparable<TextRange> {
  public static final TextRange EMPTY = new TextRange(0, 0);

  public TextRange {
    if (start < 0 || end < start) {
      throw new IllegalArgumentException("bad range [" + start + ", " + end + ")");
    }
  }

  public static TextRange of(int start, int end) {
    return new TextRange(start, end);
  }

  public static TextRange span(TextRange first, TextRange last) {
    return new TextRange(Math.min(first.start, last.start), Math.max(first.end, last.end));
  }

  public int length() {
    return end - start;
  }

  public boolean contains(int offset) {
    return offset >= start && offset <= end;
  }

  public boolean contains(TextRange other) {
    return other.start >= start && other.end <= end;
  }

  @Override
  public int compareTo(TextRange o) {
    return start != o.start ? Integer.compare(start, o.start) : Integer.compare(end, o.end);
  }
}
