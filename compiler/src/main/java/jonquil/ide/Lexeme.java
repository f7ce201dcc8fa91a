package jonquil.ide;

/**
 * One token of a spec's text as editor features see it, read even from text that does not parse.
 */
record Lexeme(Type type, String text, int start) {
  /** The classes an editor tells apart; the checker's finer distinctions do not matter here. */
  enum Type {
    WORD,
    NUMBER,
    STRING,
    COMMENT,
    NEWLINE,
    OPERATOR,
    PUNCT
  }

  int end() {
    return start + text.length();
  }

  boolean is(String s) {
    return text.equals(s);
  }
}
