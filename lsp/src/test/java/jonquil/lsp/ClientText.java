package jonquil.lsp;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.TextEdit;

/**
 * The client's side of a buffer: UTF-16 positions over LF, CRLF and CR lines, and applying text
 * edits, written apart from the server's code.
 */
final class ClientText {
  private ClientText() {}

  static int offset(String text, Position p) {
    int line = 0;
    int i = 0;
    while (line < p.getLine() && i < text.length()) {
      char c = text.charAt(i++);
      if (c == '\r' && i < text.length() && text.charAt(i) == '\n') {
        i++;
      }
      if (c == '\n' || c == '\r') {
        line++;
      }
    }
    int end = i;
    while (end < text.length() && text.charAt(end) != '\n' && text.charAt(end) != '\r') {
      end++;
    }
    return Math.min(end, i + p.getCharacter());
  }

  static Position position(String text, int offset) {
    int line = 0;
    int lineStart = 0;
    for (int i = 0; i < offset; i++) {
      char c = text.charAt(i);
      if (c == '\r' && i + 1 < text.length() && text.charAt(i + 1) == '\n') {
        continue; // the '\n' ends this line
      }
      if (c == '\n' || c == '\r') {
        line++;
        lineStart = i + 1;
      }
    }
    return new Position(line, offset - lineStart);
  }

  /**
   * Applies edits that do not overlap, as an editor does: all ranges refer to the text before any
   * of them.
   */
  static String apply(String text, List<? extends TextEdit> edits) {
    List<TextEdit> sorted = new ArrayList<>(edits);
    sorted.sort(
        Comparator.comparingInt((TextEdit e) -> offset(text, e.getRange().getStart())).reversed());
    String out = text;
    for (TextEdit e : sorted) {
      int start = offset(text, e.getRange().getStart());
      int end = offset(text, e.getRange().getEnd());
      out = out.substring(0, start) + e.getNewText() + out.substring(end);
    }
    return out;
  }
}
