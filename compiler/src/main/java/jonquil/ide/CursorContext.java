package jonquil.ide;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Where the cursor stands, read from the text before it alone: which block it is in, the statement
 * typed so far, and the word being typed. Completion works on half-written text, which the parser
 * cannot be trusted with.
 */
record CursorContext(
    Block block,
    String header,
    List<Lexeme> statement,
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
    List<Lexeme> lexemes = Scan.lex(text.substring(0, offset));
    if (!lexemes.isEmpty() && insideLiteral(lexemes.get(lexemes.size() - 1), offset)) {
      return new CursorContext(Block.TOP, "", List.of(), "", Optional.empty(), true);
    }
    List<Lexeme> code = new ArrayList<>();
    lexemes.stream().filter(l -> l.type() != Lexeme.Type.COMMENT).forEach(code::add);
    String word = "";
    if (!code.isEmpty()
        && code.get(code.size() - 1).type() == Lexeme.Type.WORD
        && code.get(code.size() - 1).end() == offset) {
      word = code.remove(code.size() - 1).text();
    }
    Optional<String> dotted = Optional.empty();
    int n = code.size();
    if (n >= 2
        && code.get(n - 1).is(".")
        && code.get(n - 1).end() == offset - word.length()
        && code.get(n - 2).type() == Lexeme.Type.WORD) {
      dotted = Optional.of(code.get(n - 2).text());
      code = new ArrayList<>(code.subList(0, n - 2));
    }
    int open = innermostOpenBrace(code);
    List<Lexeme> header = open < 0 ? List.of() : code.subList(statementStart(code, open), open);
    Block block = Block.TOP;
    String head = header.isEmpty() ? "" : header.get(0).text();
    if (open >= 0) {
      block =
          head.equals("train")
              ? Block.TRAIN
              : head.equals("require") ? Block.REQUIRE : Block.DECLARATION;
    }
    List<Lexeme> statement = code.subList(statementStart(code, code.size()), code.size());
    return new CursorContext(block, head, statement, word, dotted, false);
  }

  /** The cursor is inside a comment or an unterminated string, where nothing is offered. */
  private static boolean insideLiteral(Lexeme last, int offset) {
    if (last.end() != offset) {
      return false;
    }
    if (last.type() == Lexeme.Type.COMMENT) {
      return last.text().startsWith("//")
          || !last.text().endsWith("*/")
          || last.text().length() < 4;
    }
    return last.type() == Lexeme.Type.STRING
        && (last.text().length() < 2 || !last.text().endsWith("\""));
  }

  private static int innermostOpenBrace(List<Lexeme> code) {
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
  private static int statementStart(List<Lexeme> code, int end) {
    int i = end;
    while (i > 0) {
      Lexeme l = code.get(i - 1);
      boolean separator = l.type() == Lexeme.Type.NEWLINE || l.is(";") || l.is("{") || l.is("}");
      if (separator
          && !(l.type() == Lexeme.Type.NEWLINE && i < code.size() && code.get(i).is("->"))) {
        return i;
      }
      i--;
    }
    return 0;
  }

  /** The last token of the statement before the word being typed, or empty at its start. */
  Optional<Lexeme> previous() {
    return statement.isEmpty()
        ? Optional.empty()
        : Optional.of(statement.get(statement.size() - 1));
  }

  /** The token before {@link #previous()}. */
  Optional<Lexeme> beforePrevious() {
    return statement.size() < 2
        ? Optional.empty()
        : Optional.of(statement.get(statement.size() - 2));
  }

  boolean afterNumber() {
    return previous().map(l -> l.type() == Lexeme.Type.NUMBER).orElse(false);
  }

  boolean after(String word) {
    return previous().map(l -> l.is(word)).orElse(false);
  }

  /** How many numbers the statement holds, the one just written included. */
  int numbers() {
    return (int) statement.stream().filter(l -> l.type() == Lexeme.Type.NUMBER).count();
  }
}
