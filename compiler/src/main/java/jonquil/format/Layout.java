package jonquil.format;

import java.util.ArrayList;
import java.util.List;
import jonquil.syntax.TokenKind;

/**
 * Turns the tokens of a well-formed spec into canonical lines: one statement or block parameter per
 * line, blocks indented one level, at most one blank line in a row, and every comment between the
 * same two tokens as before. The grammar is flat (blocks never nest), so a depth of 0 or 1 and
 * whether the block is a train is all the state it needs.
 */
final class Layout {
  private final List<WrittenToken> tokens;
  private final FormatOptions options;
  private final List<Line> out = new ArrayList<>();
  private final List<WrittenToken> statement = new ArrayList<>();
  private int depth;
  private boolean inTrain;
  private int lineBreaks;
  private final int[] previousSignificant;
  private final int[] nextSignificant;

  private Layout(List<WrittenToken> tokens, FormatOptions options) {
    this.tokens = tokens;
    this.options = options;
    this.previousSignificant = previousSignificant(tokens);
    this.nextSignificant = nextSignificant(tokens);
  }

  static List<Line> lines(List<WrittenToken> tokens, FormatOptions options) {
    Layout layout = new Layout(tokens, options);
    layout.run();
    return List.copyOf(layout.out);
  }

  private void run() {
    for (int i = 0; i < tokens.size(); i++) {
      WrittenToken t = tokens.get(i);
      switch (t.kind().role()) {
        case LINE_BREAK -> {
          lineBreaks++;
          if (!(inTrain && continuesPath(i))) {
            flush();
          }
        }
        case STATEMENT_END -> flush(); // ';' is a line break written inline
        case BLOCK_OPEN -> {
          add(t);
          inTrain =
              statement.stream()
                  .filter(WrittenToken::significant)
                  .findFirst()
                  .map(first -> first.kind() == TokenKind.KEYWORD && first.text().equals("train"))
                  .orElse(false);
          flush();
          out.set(out.size() - 1, withOpensBlock(out.get(out.size() - 1)));
          depth = 1;
        }
        case BLOCK_CLOSE -> {
          flush();
          depth = 0;
          inTrain = false;
          close(t);
        }
        case COMMENT -> {
          if (statement.isEmpty()
              && !t.startsLine()
              && !out.isEmpty()
              && last().takesTrailingComment()) {
            out.set(out.size() - 1, last().append(" ", t));
            lineBreaks = 0;
          } else {
            add(t);
          }
        }
        case NAME, KEYWORD, NUMBER, STRING, OPERATOR, UNIT_OPERATOR, SIGN, PUNCTUATION -> add(t);
        case BLANK, BAD -> add(t);
      }
    }
    flush();
    while (!out.isEmpty() && last().blank()) {
      out.remove(out.size() - 1);
    }
  }

  private Line last() {
    return out.get(out.size() - 1);
  }

  private static Line withOpensBlock(Line line) {
    return new Line(line.text(), true, line.last());
  }

  /**
   * A line break inside a train continues the path when an arrow ends the line before it or starts
   * the line after it (comments and blank lines in between do not count).
   */
  private boolean continuesPath(int nl) {
    return isArrow(previousSignificant[nl]) || isArrow(nextSignificant[nl]);
  }

  private boolean isArrow(int index) {
    return index >= 0 && tokens.get(index).kind() == TokenKind.ARROW;
  }

  /**
   * For each token, the index of the nearest significant token before it (-1 if none): one pass,
   * not one per line break.
   */
  private static int[] previousSignificant(List<WrittenToken> tokens) {
    int[] result = new int[tokens.size()];
    int last = -1;
    for (int i = 0; i < tokens.size(); i++) {
      result[i] = last;
      if (tokens.get(i).significant()) {
        last = i;
      }
    }
    return result;
  }

  /** For each token, the index of the nearest significant token after it (-1 if none). */
  private static int[] nextSignificant(List<WrittenToken> tokens) {
    int[] result = new int[tokens.size()];
    int next = -1;
    for (int i = tokens.size() - 1; i >= 0; i--) {
      result[i] = next;
      if (tokens.get(i).significant()) {
        next = i;
      }
    }
    return result;
  }

  private void add(WrittenToken t) {
    if (statement.isEmpty()) {
      blankLineIfWritten();
    }
    statement.add(t);
    lineBreaks = 0;
  }

  /** Keeps one blank line where the writer left one or more, except at the edges of a block. */
  private void blankLineIfWritten() {
    if (lineBreaks >= 2 && !out.isEmpty() && !last().blank() && !last().opensBlock()) {
      out.add(Line.BLANK);
    }
  }

  /**
   * An empty block closes on its opening line ({@code probe p {}}); any other on a line of its own.
   */
  private void close(WrittenToken brace) {
    if (!out.isEmpty() && last().opensBlock() && last().last() == TokenKind.LBRACE) {
      Line closed = last().append("", brace);
      out.set(out.size() - 1, new Line(closed.text(), false, closed.last()));
    } else {
      if (!out.isEmpty() && last().blank()) {
        out.remove(out.size() - 1);
      }
      statement.add(brace);
      flush();
    }
    lineBreaks = 0;
  }

  private void flush() {
    if (statement.isEmpty()) {
      return;
    }
    String indent = options.unit().repeat(depth);
    if (inTrain && depth == 1 && statement.stream().anyMatch(t -> t.kind() == TokenKind.ARROW)) {
      out.addAll(PathLayout.lines(statement, indent, options));
    } else {
      WrittenToken lastToken = statement.get(statement.size() - 1);
      out.add(new Line(indent + Spacing.join(statement), false, lastToken.kind()));
    }
    statement.clear();
  }
}
