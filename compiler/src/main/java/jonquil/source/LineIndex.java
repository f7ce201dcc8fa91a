package jonquil.source;

import java.util.Arrays;

/**
 * Maps UTF-16 offsets to lines and columns and back. The one line splitter of the project: '\n',
 * "\r\n" and '\r' all end a line, and no position ever points between '\r' and '\n'. Parser, CLI
 * and language server all use it.
 */
public final class LineIndex {
  private final String text;
  private final int[] lineStarts;

  public LineIndex(String text) {
    this.text = text;
    int[] starts = new int[16];
    int count = 0;
    starts[count++] = 0;
    for (int i = 0; i < text.length(); i++) {
      char c = text.charAt(i);
      if (c == '\r' && i + 1 < text.length() && text.charAt(i + 1) == '\n') {
        i++;
      }
      if (c == '\n' || c == '\r') {
        if (count == starts.length) {
          starts = Arrays.copyOf(starts, count * 2);
        }
        starts[count++] = i + 1;
      }
    }
    this.lineStarts = Arrays.copyOf(starts, count);
  }

  public int lineCount() {
    return lineStarts.length;
  }

  /** 0-based line containing the offset (offsets past the end clamp to the last line). */
  public int line(int offset) {
    int clamped = Math.max(0, Math.min(offset, text.length()));
    int found = Arrays.binarySearch(lineStarts, clamped);
    return found >= 0 ? found : -found - 2;
  }

  public int lineStart(int line) {
    return lineStarts[Math.max(0, Math.min(line, lineStarts.length - 1))];
  }

  /** Offset just past the last character of the line, before its line terminator. */
  public int lineContentEnd(int line) {
    int l = Math.max(0, Math.min(line, lineStarts.length - 1));
    int end = l + 1 < lineStarts.length ? lineStarts[l + 1] : text.length();
    while (end > lineStarts[l] && (text.charAt(end - 1) == '\n' || text.charAt(end - 1) == '\r')) {
      end--;
    }
    return end;
  }

  /** 0-based column in UTF-16 code units, as LSP counts by default. */
  public int utf16Column(int offset) {
    int clamped = Math.max(0, Math.min(offset, text.length()));
    return clamped - lineStart(line(clamped));
  }

  /** 0-based column in Unicode code points, as the CLI reports (1-based there). */
  public int codePointColumn(int offset) {
    int clamped = Math.max(0, Math.min(offset, text.length()));
    int start = lineStart(line(clamped));
    return text.codePointCount(start, clamped);
  }

  /** 0-based column in UTF-8 bytes. */
  public int utf8Column(int offset) {
    int clamped = Math.max(0, Math.min(offset, text.length()));
    int start = lineStart(line(clamped));
    int bytes = 0;
    for (int i = start; i < clamped; ) {
      int cp = text.codePointAt(i);
      bytes += cp < 0x80 ? 1 : cp < 0x800 ? 2 : cp < 0x10000 ? 3 : 4;
      i += Character.charCount(cp);
    }
    return bytes;
  }

  /** Offset of a (line, UTF-16 column) position; a column past the line end clamps to it. */
  public int offsetOfUtf16(int line, int column) {
    if (line >= lineStarts.length) {
      return text.length();
    }
    int start = lineStart(line);
    int end = lineContentEnd(line);
    int offset = Math.min(start + Math.max(0, column), end);
    if (offset > start
        && offset < text.length()
        && Character.isLowSurrogate(text.charAt(offset))
        && Character.isHighSurrogate(text.charAt(offset - 1))) {
      offset--; // never split a surrogate pair
    }
    return offset;
  }

  /** Offset of a (line, code-point column) position, clamped to the line. */
  public int offsetOfCodePoint(int line, int column) {
    if (line >= lineStarts.length) {
      return text.length();
    }
    int start = lineStart(line);
    int end = lineContentEnd(line);
    int offset = start;
    for (int i = 0; i < column && offset < end; i++) {
      offset += Character.charCount(text.codePointAt(offset));
    }
    return Math.min(offset, end);
  }
}
