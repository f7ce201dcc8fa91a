package jonquil.syntax;

/**
 * What one token of spec text is, as the language's lexer reads it; whitespace, line breaks and
 * comments are tokens too, so that the tokens of a text always rebuild it exactly.
 */
public enum TokenKind {
  IDENTIFIER,
  /** A word the lexer reserves ({@code use}, {@code at}, {@code linear}, {@code OD}, ...). */
  KEYWORD,
  NUMBER,
  STRING,
  LINE_COMMENT,
  BLOCK_COMMENT,
  NEWLINE,
  /** Blanks between tokens: spaces, tabs, form feeds and byte-order marks. */
  WHITESPACE,
  ARROW,
  RANGE,
  /** {@code ±} or {@code +-}. */
  PLUS_MINUS,
  /** {@code <=}, {@code ≤}, {@code >=}, {@code ≥}, {@code <}, {@code >} or {@code ==}. */
  COMPARISON,
  EQUALS,
  LBRACE,
  RBRACE,
  LPAREN,
  RPAREN,
  COMMA,
  SEMICOLON,
  DOT,
  SLASH,
  STAR,
  MIDDOT,
  CARET,
  PERCENT,
  /** {@code °}, {@code °C} or {@code °F}. */
  DEGREE,
  PLUS,
  /** {@code -} or the minus sign {@code −}. */
  MINUS,
  /** A string that reaches the end of its line without its closing quote. */
  UNTERMINATED_STRING,
  /** A block comment with no {@code *}{@code /} anywhere after it. */
  UNTERMINATED_COMMENT,
  /** One character that has no meaning in the language. */
  BAD_CHARACTER;

  /** Tokens that the checker reports as errors wherever they stand. */
  public boolean isError() {
    return switch (this) {
      case UNTERMINATED_STRING, UNTERMINATED_COMMENT, BAD_CHARACTER -> true;
      case IDENTIFIER,
          KEYWORD,
          NUMBER,
          STRING,
          LINE_COMMENT,
          BLOCK_COMMENT,
          NEWLINE,
          WHITESPACE,
          ARROW,
          RANGE,
          PLUS_MINUS,
          COMPARISON,
          EQUALS,
          LBRACE,
          RBRACE,
          LPAREN,
          RPAREN,
          COMMA,
          SEMICOLON,
          DOT,
          SLASH,
          STAR,
          MIDDOT,
          CARET,
          PERCENT,
          DEGREE,
          PLUS,
          MINUS ->
          false;
    };
  }

  /** Comments, closed or not. */
  public boolean isComment() {
    return this == LINE_COMMENT || this == BLOCK_COMMENT || this == UNTERMINATED_COMMENT;
  }

  /** Identifiers and keywords: what a person reads as a word. */
  public boolean isWord() {
    return this == IDENTIFIER || this == KEYWORD;
  }

  /** The operators between values: arrows, ranges, tolerances, comparisons and '='. */
  public boolean isOperator() {
    return switch (this) {
      case ARROW, RANGE, PLUS_MINUS, COMPARISON, EQUALS -> true;
      case IDENTIFIER,
          KEYWORD,
          NUMBER,
          STRING,
          LINE_COMMENT,
          BLOCK_COMMENT,
          NEWLINE,
          WHITESPACE,
          LBRACE,
          RBRACE,
          LPAREN,
          RPAREN,
          COMMA,
          SEMICOLON,
          DOT,
          SLASH,
          STAR,
          MIDDOT,
          CARET,
          PERCENT,
          DEGREE,
          PLUS,
          MINUS,
          UNTERMINATED_STRING,
          UNTERMINATED_COMMENT,
          BAD_CHARACTER ->
          false;
    };
  }

  /** Operators that join the factors of a compound unit ({@code kW/cm2}, {@code J/cm^2}). */
  public boolean isUnitOperator() {
    return this == SLASH || this == STAR || this == MIDDOT || this == CARET;
  }

  /** Signs written before a number ({@code -50 mm}). */
  public boolean isSign() {
    return this == PLUS || this == MINUS;
  }
}
