package jonquil.format;

/**
 * The token classes the layout rules tell apart; finer distinctions never change where spaces go.
 */
enum LexemeKind {
  WORD,
  NUMBER,
  STRING,
  LINE_COMMENT,
  BLOCK_COMMENT,
  NL,
  SEMI,
  LBRACE,
  RBRACE,
  ARROW,
  RANGE,
  PLUSMINUS,
  COMPARE,
  EQ,
  COMMA,
  DOT,
  SLASH,
  STAR,
  MIDDOT,
  CARET,
  PERCENT,
  DEGREE,
  SIGN,
  OTHER;

  boolean isComment() {
    return this == LINE_COMMENT || this == BLOCK_COMMENT;
  }

  /** Operators that join the factors of a compound unit ({@code kW/cm2}, {@code J/cm^2}). */
  boolean isUnitOperator() {
    return this == SLASH || this == STAR || this == MIDDOT || this == CARET;
  }
}
