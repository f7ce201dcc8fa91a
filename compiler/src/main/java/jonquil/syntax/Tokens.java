package jonquil.syntax;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import jonquil.grammar.internal.JonquilLexer;
import jonquil.source.TextRange;
import org.antlr.v4.runtime.CharStreams;
import org.antlr.v4.runtime.Vocabulary;

/**
 * The one tokenizer of spec text. It runs the language's own lexer (the one the parser reads) and
 * adds back the blanks that lexer skips, so the formatter, the editor features and the checker
 * never disagree on where a token ends or what it is. Never throws on input.
 */
public final class Tokens {
  private static final Vocabulary VOCABULARY = JonquilLexer.VOCABULARY;

  /**
   * The lexer's reserved words: its literal tokens written in letters alone, read from the
   * grammar's vocabulary so that a word added to the lexer is reserved everywhere at once.
   */
  private static final Set<String> KEYWORDS = keywordsOfVocabulary();

  /** The kind of each of the lexer's token types, indexed by type. */
  private static final TokenKind[] KINDS = kindsOfVocabulary();

  private Tokens() {}

  /** The tokens of {@code text}, contiguous from its start to its end; their texts rebuild it. */
  public static List<Token> scan(String text) {
    JonquilLexer lexer = lexer(text, "<text>");
    OffsetMap offsets = new OffsetMap(text);
    List<Token> out = new ArrayList<>();
    int pos = 0;
    for (org.antlr.v4.runtime.Token t = lexer.nextToken();
        t.getType() != org.antlr.v4.runtime.Token.EOF;
        t = lexer.nextToken()) {
      int start = offsets.toUtf16(t.getStartIndex());
      int end = offsets.toUtf16(t.getStopIndex() + 1);
      if (end <= start) {
        continue; // only a zero-width match, which this grammar does not produce
      }
      whitespace(text, pos, start, out);
      out.add(
          new Token(kindOf(t.getType()), new TextRange(start, end), text.substring(start, end)));
      pos = end;
    }
    whitespace(text, pos, text.length(), out);
    return List.copyOf(out);
  }

  /** The only text the lexer skips is its blanks; they become tokens here. */
  private static void whitespace(String text, int from, int to, List<Token> out) {
    if (from < to) {
      out.add(new Token(TokenKind.WHITESPACE, new TextRange(from, to), text.substring(from, to)));
    }
  }

  /** True when {@code text} is exactly one identifier: something that may be declared as a name. */
  public static boolean isIdentifier(String text) {
    if (text == null || text.isEmpty()) {
      return false;
    }
    List<Token> tokens = scan(text);
    return tokens.size() == 1 && tokens.get(0).kind() == TokenKind.IDENTIFIER;
  }

  /** True when {@code text} is one of the lexer's reserved words. */
  public static boolean isKeyword(String text) {
    return text != null && KEYWORDS.contains(text);
  }

  /** The lexer's reserved words, sorted. */
  public static Set<String> keywords() {
    return KEYWORDS;
  }

  /**
   * True for the characters the lexer skips as blanks between tokens (its WS rule); {@code
   * OneTokenizerTest} checks this against the lexer for every character.
   */
  public static boolean isBlank(char c) {
    return c == ' ' || c == '\t' || c == '\f' || c == '\uFEFF';
  }

  /** The language's lexer on {@code text}, reporting nothing: every problem is a token. */
  static JonquilLexer lexer(String text, String sourceName) {
    JonquilLexer lexer = new JonquilLexer(CharStreams.fromString(text, sourceName));
    lexer.removeErrorListeners();
    return lexer;
  }

  /** The kind of a token type of the lexer. */
  static TokenKind kindOf(int type) {
    return KINDS[type];
  }

  private static Set<String> keywordsOfVocabulary() {
    Set<String> words = new TreeSet<>();
    for (int type = 1; type <= VOCABULARY.getMaxTokenType(); type++) {
      String word = literal(type);
      if (word != null && !word.isEmpty() && word.codePoints().allMatch(Character::isLetter)) {
        words.add(word);
      }
    }
    return Collections.unmodifiableSet(words);
  }

  /** The one text a token type always has, or null when it has many (names, numbers, ...). */
  private static String literal(int type) {
    String quoted = VOCABULARY.getLiteralName(type);
    return quoted == null ? null : quoted.substring(1, quoted.length() - 1);
  }

  private static TokenKind[] kindsOfVocabulary() {
    TokenKind[] kinds = new TokenKind[VOCABULARY.getMaxTokenType() + 1];
    for (int type = 1; type < kinds.length; type++) {
      String word = literal(type);
      kinds[type] =
          word != null && KEYWORDS.contains(word) ? TokenKind.KEYWORD : kindOfSymbol(type);
    }
    return kinds;
  }

  /**
   * The kind of every token type that is not a reserved word. A token type added to the lexer
   * without a kind here fails the first use of this class, so no test run can miss it.
   */
  private static TokenKind kindOfSymbol(int type) {
    return switch (type) {
      case JonquilLexer.IDENT -> TokenKind.IDENTIFIER;
      case JonquilLexer.NUMBER -> TokenKind.NUMBER;
      case JonquilLexer.STRING -> TokenKind.STRING;
      case JonquilLexer.UNTERMINATED_STRING -> TokenKind.UNTERMINATED_STRING;
      case JonquilLexer.LINE_COMMENT -> TokenKind.LINE_COMMENT;
      case JonquilLexer.BLOCK_COMMENT -> TokenKind.BLOCK_COMMENT;
      case JonquilLexer.UNTERMINATED_COMMENT -> TokenKind.UNTERMINATED_COMMENT;
      case JonquilLexer.NL -> TokenKind.NEWLINE;
      case JonquilLexer.WS -> TokenKind.WHITESPACE;
      case JonquilLexer.ERROR_CHAR -> TokenKind.BAD_CHARACTER;
      case JonquilLexer.ARROW -> TokenKind.ARROW;
      case JonquilLexer.RANGE -> TokenKind.RANGE;
      case JonquilLexer.PLUSMINUS -> TokenKind.PLUS_MINUS;
      case JonquilLexer.LE, JonquilLexer.GE, JonquilLexer.LT, JonquilLexer.GT, JonquilLexer.EQEQ ->
          TokenKind.COMPARISON;
      case JonquilLexer.EQ -> TokenKind.EQUALS;
      case JonquilLexer.LBRACE -> TokenKind.LBRACE;
      case JonquilLexer.RBRACE -> TokenKind.RBRACE;
      case JonquilLexer.LPAREN -> TokenKind.LPAREN;
      case JonquilLexer.RPAREN -> TokenKind.RPAREN;
      case JonquilLexer.COMMA -> TokenKind.COMMA;
      case JonquilLexer.SEMI -> TokenKind.SEMICOLON;
      case JonquilLexer.DOT -> TokenKind.DOT;
      case JonquilLexer.SLASH -> TokenKind.SLASH;
      case JonquilLexer.STAR -> TokenKind.STAR;
      case JonquilLexer.MIDDOT -> TokenKind.MIDDOT;
      case JonquilLexer.CARET -> TokenKind.CARET;
      case JonquilLexer.PERCENT -> TokenKind.PERCENT;
      case JonquilLexer.DEGREE -> TokenKind.DEGREE;
      case JonquilLexer.PLUS -> TokenKind.PLUS;
      case JonquilLexer.MINUS -> TokenKind.MINUS;
      default ->
          throw new IllegalStateException(
              "lexer token " + VOCABULARY.getSymbolicName(type) + " has no TokenKind");
    };
  }
}
