package jonquil.format;

import java.util.ArrayList;
import java.util.List;

/**
 * Splits spec text into {@link Lexeme}s by the same rules as the language's lexer, keeping comments
 * and line breaks, because layout is about exactly what the parser throws away. It is only trusted
 * on text that parsed without errors; on anything else it still never throws.
 */
final class Lexer {
  private final String text;
  private final List<Lexeme> out = new ArrayList<>();
  private int pos;
  private boolean atLineStart = true;
  private boolean space;

  private Lexer(String text) {
    this.text = text;
  }

  static List<Lexeme> lex(String text) {
    Lexer lexer = new Lexer(text);
    lexer.run();
    return lexer.withLineEnds();
  }

  static boolean isSpace(char c) {
    return c == ' ' || c == '\t' || c == '\f' || c == '\uFEFF';
  }

  private void run() {
    while (pos < text.length()) {
      char c = text.charAt(pos);
      if (isSpace(c)) {
        pos++;
        space = true;
      } else if (c == '\r' || c == '\n') {
        int end =
            c == '\r' && pos + 1 < text.length() && text.charAt(pos + 1) == '\n'
                ? pos + 2
                : pos + 1;
        emit(LexemeKind.NL, end);
        atLineStart = true;
      } else {
        emit(kindAt(c), end(c));
      }
    }
  }

  private void emit(LexemeKind kind, int end) {
    String lexeme = text.substring(pos, end);
    if (kind == LexemeKind.LINE_COMMENT) {
      lexeme = stripTrailingSpace(lexeme); // trailing blanks are layout, even inside a line comment
    }
    out.add(new Lexeme(kind, lexeme, pos, atLineStart, space || atLineStart, false));
    pos = end;
    atLineStart = false;
    space = false;
  }

  private List<Lexeme> withLineEnds() {
    List<Lexeme> result = new ArrayList<>(out.size());
    for (int i = 0; i < out.size(); i++) {
      Lexeme l = out.get(i);
      boolean endsLine = i + 1 == out.size() || out.get(i + 1).kind() == LexemeKind.NL;
      result.add(
          new Lexeme(l.kind(), l.text(), l.start(), l.startsLine(), l.spaceBefore(), endsLine));
    }
    return List.copyOf(result);
  }

  static String stripTrailingSpace(String s) {
    int end = s.length();
    while (end > 0 && isSpace(s.charAt(end - 1))) {
      end--;
    }
    return s.substring(0, end);
  }

  private char peek(int ahead) {
    int at = pos + ahead;
    return at < text.length() ? text.charAt(at) : '\0';
  }

  private LexemeKind kindAt(char c) {
    char next = peek(1);
    if (isDigit(c) || (c == '.' && isDigit(next))) {
      return LexemeKind.NUMBER;
    }
    if (c == '_' || Character.isLetter(text.codePointAt(pos))) {
      return LexemeKind.WORD;
    }
    switch (c) {
      case '/':
        return next == '/'
            ? LexemeKind.LINE_COMMENT
            : next == '*' ? LexemeKind.BLOCK_COMMENT : LexemeKind.SLASH;
      case '"':
        return LexemeKind.STRING;
      case '-':
        return next == '>' ? LexemeKind.ARROW : LexemeKind.SIGN;
      case '\u2212':
        return LexemeKind.SIGN;
      case '+':
        return next == '-' ? LexemeKind.PLUSMINUS : LexemeKind.SIGN;
      case '\u00B1':
        return LexemeKind.PLUSMINUS;
      case '<':
      case '>':
      case '\u2264':
      case '\u2265':
        return LexemeKind.COMPARE;
      case '=':
        return next == '=' ? LexemeKind.COMPARE : LexemeKind.EQ;
      case '.':
        return next == '.' ? LexemeKind.RANGE : LexemeKind.DOT;
      case '{':
        return LexemeKind.LBRACE;
      case '}':
        return LexemeKind.RBRACE;
      case ',':
        return LexemeKind.COMMA;
      case ';':
        return LexemeKind.SEMI;
      case '*':
        return LexemeKind.STAR;
      case '\u00B7':
        return LexemeKind.MIDDOT;
      case '^':
        return LexemeKind.CARET;
      case '%':
        return LexemeKind.PERCENT;
      case '\u00B0':
        return LexemeKind.DEGREE;
      default:
        return LexemeKind.OTHER;
    }
  }

  /**
   * Where the token starting here with {@code c} ends: the longest match, as the language's lexer
   * takes it.
   */
  private int end(char c) {
    switch (kindAt(c)) {
      case NUMBER:
        return numberEnd();
      case WORD:
        return wordEnd();
      case LINE_COMMENT:
        return lineEnd(pos);
      case BLOCK_COMMENT:
        {
          int close = text.indexOf("*/", pos + 2);
          return close < 0 ? text.length() : close + 2;
        }
      case STRING:
        return stringEnd();
      case ARROW:
      case RANGE:
        return pos + 2;
      case PLUSMINUS:
        return c == '+' ? pos + 2 : pos + 1;
      case COMPARE:
        return (c == '<' || c == '>' || c == '=') && peek(1) == '=' ? pos + 2 : pos + 1;
      case DEGREE:
        return peek(1) == 'C' || peek(1) == 'F' ? pos + 2 : pos + 1;
      case OTHER:
        return pos + Character.charCount(text.codePointAt(pos));
      default:
        return pos + 1;
    }
  }

  private static boolean isDigit(char c) {
    return c >= '0' && c <= '9';
  }

  private int digitsEnd(int from) {
    int i = from;
    while (i < text.length() && isDigit(text.charAt(i))) {
      i++;
    }
    return i;
  }

  private int numberEnd() {
    int i = digitsEnd(pos);
    if (i < text.length()
        && text.charAt(i) == '.'
        && i + 1 < text.length()
        && isDigit(text.charAt(i + 1))) {
      i = digitsEnd(i + 1);
    }
    if (i < text.length() && (text.charAt(i) == 'e' || text.charAt(i) == 'E')) {
      int j = i + 1;
      if (j < text.length() && (text.charAt(j) == '+' || text.charAt(j) == '-')) {
        j++;
      }
      if (j < text.length() && isDigit(text.charAt(j))) {
        i = digitsEnd(j);
      }
    }
    return i;
  }

  private int wordEnd() {
    int i = pos;
    while (i < text.length()) {
      int cp = text.codePointAt(i);
      int type = Character.getType(cp);
      boolean part =
          cp == '_'
              || Character.isLetter(cp)
              || type == Character.DECIMAL_DIGIT_NUMBER
              || type == Character.LETTER_NUMBER
              || type == Character.OTHER_NUMBER;
      if (!part) {
        break;
      }
      i += Character.charCount(cp);
    }
    return i;
  }

  private int lineEnd(int from) {
    int i = from;
    while (i < text.length() && text.charAt(i) != '\r' && text.charAt(i) != '\n') {
      i++;
    }
    return i;
  }

  private int stringEnd() {
    int i = pos + 1;
    while (i < text.length()) {
      char ch = text.charAt(i);
      if (ch == '"') {
        return i + 1;
      }
      if (ch == '\r' || ch == '\n') {
        return i;
      }
      if (ch == '\\') {
        if (i + 1 >= text.length() || text.charAt(i + 1) == '\r' || text.charAt(i + 1) == '\n') {
          return i;
        }
        i += 2;
      } else {
        i++;
      }
    }
    return text.length();
  }
}
