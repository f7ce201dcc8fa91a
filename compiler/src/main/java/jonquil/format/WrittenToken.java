package jonquil.format;

import java.util.ArrayList;
import java.util.List;
import jonquil.syntax.Token;
import jonquil.syntax.TokenKind;
import jonquil.syntax.Tokens;

/**
 * One token with the whitespace its writer put around it, which is all the layout needs to know
 * about the original. Blanks are dropped: the layout writes its own.
 *
 * @param startsLine only whitespace lies between the previous line break (or the file start) and it
 * @param spaceBefore whitespace lies directly before it (always true when it starts a line)
 * @param endsLine only whitespace lies between it and the next line break (or the file end)
 */
record WrittenToken(Token token, boolean startsLine, boolean spaceBefore, boolean endsLine) {

  /** The tokens of {@code text} without its blanks, each with the blanks that were around it. */
  static List<WrittenToken> of(String text) {
    List<Token> tokens = Tokens.scan(text);
    List<WrittenToken> out = new ArrayList<>(tokens.size());
    boolean atLineStart = true;
    for (int i = 0; i < tokens.size(); i++) {
      Token t = tokens.get(i);
      if (t.kind() == TokenKind.WHITESPACE) {
        continue;
      }
      boolean space = atLineStart || (i > 0 && tokens.get(i - 1).kind() == TokenKind.WHITESPACE);
      int next =
          i + 1 < tokens.size() && tokens.get(i + 1).kind() == TokenKind.WHITESPACE ? i + 2 : i + 1;
      boolean endsLine = next >= tokens.size() || tokens.get(next).kind() == TokenKind.NEWLINE;
      out.add(new WrittenToken(t, atLineStart, space, endsLine));
      atLineStart = t.kind() == TokenKind.NEWLINE;
    }
    return List.copyOf(out);
  }

  TokenKind kind() {
    return token.kind();
  }

  /** The token's text; a line comment loses its trailing blanks, which are layout. */
  String text() {
    return kind() == TokenKind.LINE_COMMENT ? stripTrailingSpace(token.text()) : token.text();
  }

  boolean isComment() {
    return kind().isComment();
  }

  /** Tokens that carry meaning for the parser; comments and line breaks do not. */
  boolean significant() {
    return !kind().isComment() && kind() != TokenKind.NEWLINE;
  }

  static String stripTrailingSpace(String s) {
    int end = s.length();
    while (end > 0 && Tokens.isBlank(s.charAt(end - 1))) {
      end--;
    }
    return s.substring(0, end);
  }
}
