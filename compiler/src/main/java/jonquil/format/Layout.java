package jonquil.format;

import java.util.ArrayList;
import java.util.List;

/**
 * Turns the lexemes of a well-formed spec into canonical lines: one statement or block parameter
 * per line, blocks indented one level, at most one blank line in a row, and every comment between
 * the same two tokens as before. The grammar is flat (blocks never nest), so a depth of 0 or 1 and
 * whether the block is a train is all the state it needs.
 */
final class Layout {
  private final List<Lexeme> lexemes;
  private final FormatOptions options;
  private final List<Line> out = new ArrayList<>();
  private final List<Lexeme> statement = new ArrayList<>();
  private int depth;
  private boolean inTrain;
  private int lineBreaks;
  private final int[] previousSignificant;
  private final int[] nextSignificant;

  private Layout(List<Lexeme> lexemes, FormatOptions options) {
    this.lexemes = lexemes;
    this.options = options;
    this.previousSignificant = previousSignificant(lexemes);
    this.nextSignificant = nextSignificant(lexemes);
  }

  static List<Line> lines(List<Lexeme> lexemes, FormatOptions options) {
    Layout layout = new Layout(lexemes, options);
    layout.run();
    return List.copyOf(layout.out);
  }

  private void run() {
    for (int i = 0; i < lexemes.size(); i++) {
      Lexeme t = lexemes.get(i);
      switch (t.kind()) {
        case NL -> {
          lineBreaks++;
          if (!(inTrain && continuesPath(i))) {
            flush();
          }
        }
        case SEMI -> flush(); // ';' is a line break written inline
        case LBRACE -> {
          add(t);
          inTrain =
              statement.stream()
                  .filter(Lexeme::significant)
                  .findFirst()
                  .map(first -> first.kind() == LexemeKind.WORD && first.text().equals("train"))
                  .orElse(false);
          flush();
          out.set(out.size() - 1, withOpensBlock(out.get(out.size() - 1)));
          depth = 1;
        }
        case RBRACE -> {
          flush();
          depth = 0;
          inTrain = false;
          close(t);
        }
        case LINE_COMMENT, BLOCK_COMMENT -> {
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
        default -> add(t);
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
    return index >= 0 && lexemes.get(index).kind() == LexemeKind.ARROW;
  }

  /**
   * For each lexeme, the index of the nearest significant lexeme before it (-1 if none): one pass,
   * not one per line break.
   */
  private static int[] previousSignificant(List<Lexeme> lexemes) {
    int[] result = new int[lexemes.size()];
    int last = -1;
    for (int i = 0; i < lexemes.size(); i++) {
      result[i] = last;
      if (lexemes.get(i).significant()) {
        last = i;
      }
    }
    return result;
  }

  /** For each lexeme, the index of the nearest significant lexeme after it (-1 if none). */
  private static int[] nextSignificant(List<Lexeme> lexemes) {
    int[] result = new int[lexemes.size()];
    int next = -1;
    for (int i = lexemes.size() - 1; i >= 0; i--) {
      result[i] = next;
      if (lexemes.get(i).significant()) {
        next = i;
      }
    }
    return result;
  }

  private void add(Lexeme t) {
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
  private void close(Lexeme brace) {
    if (!out.isEmpty() && last().opensBlock() && last().last() == LexemeKind.LBRACE) {
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
    if (inTrain && depth == 1 && statement.stream().anyMatch(t -> t.kind() == LexemeKind.ARROW)) {
      out.addAll(PathLayout.lines(statement, indent, options));
    } else {
      Lexeme lastToken = statement.get(statement.size() - 1);
      out.add(new Line(indent + Spacing.join(statement), false, lastToken.kind()));
    }
    statement.clear();
  }
}
