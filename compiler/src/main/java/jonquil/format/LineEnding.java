package jonquil.format;

/** Picks the line ending to write: the file's own, so a CRLF checkout stays CRLF. */
final class LineEnding {
  private LineEnding() {}

  /** The first line ending in {@code text}; LF when there is none. */
  static String of(String text) {
    for (int i = 0; i < text.length(); i++) {
      char c = text.charAt(i);
      if (c == '\n') {
        return "\n";
      }
      if (c == '\r') {
        return i + 1 < text.length() && text.charAt(i + 1) == '\n' ? "\r\n" : "\r";
      }
    }
    return "\n";
  }
}
