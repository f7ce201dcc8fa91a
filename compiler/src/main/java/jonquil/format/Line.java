package jonquil.format;

import jonquil.syntax.TokenKind;

/**
 * One output line before line endings are chosen: its full text with indentation, and the facts the
 * next token needs to decide whether it may join it.
 *
 * @param opensBlock the line ends with the '{' of a block that has nothing in it yet
 * @param last the kind of its last token, or null for a blank line
 */
record Line(String text, boolean opensBlock, TokenKind last) {
  static final Line BLANK = new Line("", false, null);

  boolean blank() {
    return last == null;
  }

  /**
   * A comment written after this line's last token may stay on it; nothing can follow a line
   * comment.
   */
  boolean takesTrailingComment() {
    return !blank() && last != TokenKind.LINE_COMMENT;
  }

  /** This line with one more token at its end; a block it opens stays open. */
  Line append(String separator, WrittenToken lexeme) {
    return new Line(text + separator + lexeme.text(), opensBlock, lexeme.kind());
  }
}
