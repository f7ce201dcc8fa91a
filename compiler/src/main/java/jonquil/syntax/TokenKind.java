package jonquil.syntax;

/**
 * What one token of spec text is, as the language's lexer reads it; whitespace, line breaks and
 * comments are tokens too, so that the tokens of a text always rebuild it exactly.
 *
 * <p>Each kind names its {@link Role} and its {@link Ending} here, and every reader of tokens
 * (highlighting, completion, the formatter) dispatches on those: a new kind is one decision, made
 * on its constant.
 */
public enum TokenKind {
  IDENTIFIER(Role.NAME, Ending.CLOSED),
  /** A word the lexer reserves ({@code use}, {@code at}, {@code linear}, {@code OD}, ...). */
  KEYWORD(Role.KEYWORD, Ending.CLOSED),
  NUMBER(Role.NUMBER, Ending.CLOSED),
  STRING(Role.STRING, Ending.CLOSED),
  LINE_COMMENT(Role.COMMENT, Ending.LINE_END),
  BLOCK_COMMENT(Role.COMMENT, Ending.CLOSED),
  NEWLINE(Role.LINE_BREAK, Ending.CLOSED),
  /** Blanks between tokens: spaces, tabs, form feeds and byte-order marks. */
  WHITESPACE(Role.BLANK, Ending.CLOSED),
  ARROW(Role.OPERATOR, Ending.CLOSED),
  RANGE(Role.OPERATOR, Ending.CLOSED),
  /** {@code ±} or {@code +-}. */
  PLUS_MINUS(Role.OPERATOR, Ending.CLOSED),
  /** {@code <=}, {@code ≤}, {@code >=}, {@code ≥}, {@code <}, {@code >} or {@code ==}. */
  COMPARISON(Role.OPERATOR, Ending.CLOSED),
  EQUALS(Role.OPERATOR, Ending.CLOSED),
  LBRACE(Role.BLOCK_OPEN, Ending.CLOSED),
  RBRACE(Role.BLOCK_CLOSE, Ending.CLOSED),
  LPAREN(Role.PUNCTUATION, Ending.CLOSED),
  RPAREN(Role.PUNCTUATION, Ending.CLOSED),
  COMMA(Role.PUNCTUATION, Ending.CLOSED),
  SEMICOLON(Role.STATEMENT_END, Ending.CLOSED),
  DOT(Role.PUNCTUATION, Ending.CLOSED),
  SLASH(Role.UNIT_OPERATOR, Ending.CLOSED),
  STAR(Role.UNIT_OPERATOR, Ending.CLOSED),
  MIDDOT(Role.UNIT_OPERATOR, Ending.CLOSED),
  CARET(Role.UNIT_OPERATOR, Ending.CLOSED),
  PERCENT(Role.PUNCTUATION, Ending.CLOSED),
  /** {@code °}, {@code °C} or {@code °F}. */
  DEGREE(Role.PUNCTUATION, Ending.CLOSED),
  PLUS(Role.SIGN, Ending.CLOSED),
  /** {@code -} or the minus sign {@code −}. */
  MINUS(Role.SIGN, Ending.CLOSED),
  /** A string that reaches the end of its line without its closing quote. */
  UNTERMINATED_STRING(Role.STRING, Ending.UNTERMINATED),
  /** A block comment with no {@code *}{@code /} anywhere after it. */
  UNTERMINATED_COMMENT(Role.COMMENT, Ending.UNTERMINATED),
  /** One character that has no meaning in the language. */
  BAD_CHARACTER(Role.BAD, Ending.CLOSED);

  /** What a token does in the text, in the terms every reader of tokens asks about. */
  public enum Role {
    /** An identifier: a declared name, a reference or a parameter's word. */
    NAME,
    KEYWORD,
    NUMBER,
    /** A string literal, closed or not. */
    STRING,
    /** A comment of either form, closed or not. */
    COMMENT,
    /** Blanks within a line. */
    BLANK,
    /** A line break: it ends a statement, unless an arrow continues a path across it. */
    LINE_BREAK,
    /** ';', which ends a statement within a line. */
    STATEMENT_END,
    /** '{', which opens a block. */
    BLOCK_OPEN,
    /** '}', which closes a block. */
    BLOCK_CLOSE,
    /** The operators between values: arrows, ranges, tolerances, comparisons and '='. */
    OPERATOR,
    /** Operators that join the factors of a compound unit ({@code kW/cm2}, {@code J/cm^2}). */
    UNIT_OPERATOR,
    /** Signs written before a number ({@code -50 mm}). */
    SIGN,
    /** Parentheses, commas, dots, and the symbols {@code %} and {@code °} after a number. */
    PUNCTUATION,
    /** A character that has no meaning in the language. */
    BAD
  }

  /** Where a token's text stops: where its own form ends, or where its line or the text does. */
  public enum Ending {
    /** Where its form ends: a closing quote or mark, or the last character it can take. */
    CLOSED,
    /** At the end of its line, by design: a line comment. */
    LINE_END,
    /** At its line's or the text's end, for want of its closing mark: always an error. */
    UNTERMINATED
  }

  private final Role role;
  private final Ending ending;

  TokenKind(Role role, Ending ending) {
    this.role = role;
    this.ending = ending;
  }

  /** Tokens that the checker reports as errors wherever they stand. */
  public boolean isError() {
    return role == Role.BAD || ending == Ending.UNTERMINATED;
  }

  /** Comments, closed or not. */
  public boolean isComment() {
    return role == Role.COMMENT;
  }

  /** Identifiers and keywords: what a person reads as a word. */
  public boolean isWord() {
    return role == Role.NAME || role == Role.KEYWORD;
  }

  /** The operators between values: arrows, ranges, tolerances, comparisons and '='. */
  public boolean isOperator() {
    return role == Role.OPERATOR;
  }

  /** Operators that join the factors of a compound unit ({@code kW/cm2}, {@code J/cm^2}). */
  public boolean isUnitOperator() {
    return role == Role.UNIT_OPERATOR;
  }

  /** Signs written before a number ({@code -50 mm}). */
  public boolean isSign() {
    return role == Role.SIGN;
  }

  /** What the token does; readers of tokens dispatch on this rather than on the kind. */
  public Role role() {
    return role;
  }

  /** Where the token's text stops. */
  public Ending ending() {
    return ending;
  }
}
