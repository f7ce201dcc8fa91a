package jonquil.format;

/**
 * One token as the formatter sees it: its text, where it starts, and the whitespace the writer put
 * around it, which is all the layout needs to know about the original.
 *
 * @param startsLine only whitespace lies between the previous line break (or the file start) and it
 * @param spaceBefore whitespace lies directly before it (always true when it starts a line)
 * @param endsLine only whitespace lies between it and the next line break (or the file end)
 */
record Lexeme(
    LexemeKind kind,
    String text,
    int start,
    boolean startsLine,
    boolean spaceBefore,
    boolean endsLine) {

  boolean isComment() {
    return kind.isComment();
  }

  /** Tokens that carry meaning for the parser; comments and line breaks do not. */
  boolean significant() {
    return !kind.isComment() && kind != LexemeKind.NL;
  }
}
