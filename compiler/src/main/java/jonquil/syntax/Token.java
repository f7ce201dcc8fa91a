package jonquil.syntax;

import jonquil.source.TextRange;

/**
 * One token of spec text: what it is, where it stands (UTF-16 offsets) and its exact text.
 *
 * @param text exactly the text the range covers
 */
public record Token(TokenKind kind, TextRange range, String text) {
  public Token {
    if (text.length() != range.length()) {
      throw new IllegalArgumentException("text '" + text + "' does not fit range " + range);
    }
  }

  public int start() {
    return range.start();
  }

  public int end() {
    return range.end();
  }

  /** True when the token's text is exactly {@code s}. */
  public boolean is(String s) {
    return text.equals(s);
  }
}
