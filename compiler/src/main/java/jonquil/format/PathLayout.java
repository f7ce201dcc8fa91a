package jonquil.format;

import java.util.ArrayList;
import java.util.List;
import jonquil.syntax.TokenKind;

/**
 * Lays out one beam path of a train: on one line when it fits, otherwise broken before an arrow,
 * with each continuation line starting with '->' aligned under the path's first arrow. Comments
 * stay between the same two tokens; a line comment or a comment the writer put on its own line
 * keeps its line.
 */
final class PathLayout {
  /** Columns a path line may take before it is broken at an arrow. */
  static final int MAX_COLUMNS = 100;

  private PathLayout() {}

  static List<Line> lines(List<WrittenToken> path, String indent, FormatOptions options) {
    String continuation = indent + " ".repeat(firstStepWidth(path) + 1);
    List<Line> lines = new ArrayList<>();
    List<WrittenToken> line = new ArrayList<>();
    String prefix = indent;
    for (int i = 0; i < path.size(); i++) {
      WrittenToken t = path.get(i);
      if (!line.isEmpty() && breaksBefore(path, i, prefix, line, options)) {
        lines.add(line(prefix, line));
        line.clear();
        prefix = continuation;
      }
      line.add(t);
      if (breaksAfter(t)) {
        lines.add(line(prefix, line));
        line.clear();
        prefix = continuation;
      }
    }
    if (!line.isEmpty()) {
      lines.add(line(prefix, line));
    }
    return lines;
  }

  private static Line line(String prefix, List<WrittenToken> tokens) {
    return new Line(prefix + Spacing.join(tokens), false, tokens.get(tokens.size() - 1).kind());
  }

  private static boolean breaksAfter(WrittenToken t) {
    return t.kind() == TokenKind.LINE_COMMENT || (t.isComment() && t.startsLine() && t.endsLine());
  }

  private static boolean breaksBefore(
      List<WrittenToken> path, int i, String prefix, List<WrittenToken> line, FormatOptions o) {
    WrittenToken t = path.get(i);
    if (t.isComment()) {
      return t.startsLine();
    }
    if (t.kind() != TokenKind.ARROW) {
      return false;
    }
    List<WrittenToken> joined = new ArrayList<>(line);
    joined.addAll(nextStep(path, i));
    return columns(prefix + Spacing.join(joined), o) > MAX_COLUMNS;
  }

  /** The arrow at {@code arrow} and what follows it up to the next arrow or forced break. */
  private static List<WrittenToken> nextStep(List<WrittenToken> path, int arrow) {
    List<WrittenToken> step = new ArrayList<>();
    step.add(path.get(arrow));
    for (int j = arrow + 1; j < path.size(); j++) {
      WrittenToken t = path.get(j);
      if (t.kind() == TokenKind.ARROW
          || t.kind() == TokenKind.LINE_COMMENT
          || (t.isComment() && t.startsLine())) {
        break;
      }
      step.add(t);
    }
    return step;
  }

  private static int firstStepWidth(List<WrittenToken> path) {
    List<WrittenToken> step = new ArrayList<>();
    for (WrittenToken t : path) {
      if (t.kind() == TokenKind.ARROW) {
        break;
      }
      if (!t.isComment()) {
        step.add(t);
      }
    }
    return columns(Spacing.join(step), FormatOptions.DEFAULT);
  }

  /**
   * Width of the last physical line of {@code text} in code points, a tab counting as one indent.
   */
  static int columns(String text, FormatOptions o) {
    int from = Math.max(text.lastIndexOf('\n'), text.lastIndexOf('\r')) + 1;
    int width = 0;
    for (int i = from; i < text.length(); i += Character.charCount(text.codePointAt(i))) {
      width += text.charAt(i) == '\t' ? Math.max(1, o.indent()) : 1;
    }
    return width;
  }
}
