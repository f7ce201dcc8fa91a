package jonquil.ide;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import jonquil.syntax.Token;
import jonquil.syntax.TokenKind;
import jonquil.syntax.Tokens;

/**
 * Where the cursor stands, read from the text before it alone: which block it is in, the statement
 * typed so far, and the word being typed. Completion works on half-written text, which the parser
 * cannot be trusted with.
 */
record CursorContext(
    Block block,
    String header,
    List<Token> statement,
    String word,
    Optional<String> dotted,
    boolean inert) {
  /** The kind of block around the cursor. */
  enum Block {
    TOP,
    DECLARATION,
    TRAIN,
    REQUIRE
  }

  CursorContext {
    statement = List.copyOf(statement);
  }

  static CursorContext read(String text, int offset) {
    List<Token> tokens = Tokens.scan(text.substring(0, offset));
    if (insideLiteral(tokens)) {
      return new CursorContext(Block.TOP, "", List.of(), "", Optional.empty(), true);
    }
    List<Token> code = new ArrayList<>();
    tokens.stream()
        .filter(l -> !l.kind().isComment() && l.kind() != TokenKind.WHITESPACE)
        .forEach(code::add);
    String word = "";
    if (!code.isEmpty()
        && code.get(code.size() - 1).kind().isWord()
        && code.get(code.size() - 1).end() == offset) {
      word = code.remove(code.size() - 1).text();
    }
    Optional<String> dotted = Optional.empty();
    int n = code.size();
    if (n >= 2
        && code.get(n - 1).is(".")
        && code.get(n - 1).end() == offset - word.length()
        && code.get(n - 2).kind().isWord()) {
      dotted = Optional.of(code.get(n - 2).text());
      code = new ArrayList<>(code.subList(0, n - 2));
    }
    int open = innermostOpenBrace(code);
    List<Token> header = open < 0 ? List.of() : code.subList(statementStart(code, open), open);
    Block block = Block.TOP;
    String head = header.isEmpty() ? "" : header.get(0).text();
    if (open >= 0) {
      block =
          head.equals("train")
              ? Block.TRAIN
              : head.equals("require") ? Block.REQUIRE : Block.DECLARATION;
    }
    List<Token> statement = code.subList(statementStart(code, code.size()), code.size());
    return new CursorContext(block, head, statement, word, dotted, false);
  }

  /** The cursor is inside a comment or an unterminated string, where nothing is offered. */
  private static boolean insideLiteral(List<Token> tokens) {
    if (tokens.isEmpty()) {
      return false;
    }
    Token last = tokens.get(tokens.size() - 1);
    if (last.kind() == TokenKind.BAD_CHARACTER
        && last.is("\\")
        && tokens.size() >= 2
        && tokens.get(tokens.size() - 2).kind() == TokenKind.UNTERMINATED_STRING) {
      return true; // an escape begun at the cursor: the lexer leaves the '\\' outside the string
    }
    // A token that runs on to its line's end or the text's end takes in what is typed after it.
    return switch (last.kind().ending()) {
      case LINE_END, UNTERMINATED -> true;
      case CLOSED -> false;
    };
  }

  private static int innermostOpenBrace(List<Token> code) {
    List<Integer> stack = new ArrayList<>();
    for (int i = 0; i < code.size(); i++) {
      if (code.get(i).is("{")) {
        stack.add(i);
      } else if (code.get(i).is("}") && !stack.isEmpty()) {
        stack.remove(stack.size() - 1);
      }
    }
    return stack.isEmpty() ? -1 : stack.get(stack.size() - 1);
  }

  /**
   * A statement starts after a line break, ';', '{' or '}', unless it continues a path with '->'.
   */
  private static int statementStart(List<Token> code, int end) {
    int i = end;
    while (i > 0) {
      Token l = code.get(i - 1);
      boolean separator = l.kind() == TokenKind.NEWLINE || l.is(";") || l.is("{") || l.is("}");
      if (separator
          && !(l.kind() == TokenKind.NEWLINE && i < code.size() && code.get(i).is("->"))) {
        return i;
      }
      i--;
    }
    return 0;
  }

  /** The last token of the statement before the word being typed, or empty at its start. */
  Optional<Token> previous() {
    return statement.isEmpty()
        ? Optional.empty()
        : Optional.of(statement.get(statement.size() - 1));
  }

  /** The token before {@link #previous()}. */
  Optional<Token> beforePrevious() {
    return statement.size() < 2
        ? Optional.empty()
        : Optional.of(statement.get(statement.size() - 2));
  }

  boolean afterNumber() {
    return previous().map(l -> l.kind() == TokenKind.NUMBER).orElse(false);
  }

  boolean after(String word) {
    return previous().map(l -> l.is(word)).orElse(false);
  }

  /** How many numbers the statement holds, the one just written included. */
  int numbers() {
    return (int) statement.stream().filter(l -> l.kind() == TokenKind.NUMBER).count();
  }
}
