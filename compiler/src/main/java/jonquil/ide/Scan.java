package jonquil.ide;

import java.util.ArrayList;
import java.util.List;

/**
 * Splits text into {@link Lexeme}s by the language's token rules, keeping comments and line breaks:
 * completion reads half-typed text, and semantic tokens need the keywords and operators the syntax
 * tree does not keep. It never throws.
 */
final class Scan {
  private static final List<String> OPERATORS =
      List.of("->", "..", "+-", "<=", ">=", "==", "\u2264", "\u2265", "\u00B1", "<", ">", "=");

  private Scan() {}

  static List<Lexeme> lex(String text) {
    List<Lexeme> out = new ArrayList<>();
    int pos = 0;
    int n = text.length();
    while (pos < n) {
      char c = text.charAt(pos);
      int end;
      Lexeme.Type type;
      if (c == ' ' || c == '\t' || c == '\f' || c == '\uFEFF') {
        pos++;
        continue;
      } else if (c == '\r' || c == '\n') {
        end = c == '\r' && pos + 1 < n && text.charAt(pos + 1) == '\n' ? pos + 2 : pos + 1;
        type = Lexeme.Type.NEWLINE;
      } else if (text.startsWith("//", pos)) {
        end = lineEnd(text, pos);
        type = Lexeme.Type.COMMENT;
      } else if (text.startsWith("/*", pos)) {
        int close = text.indexOf("*/", pos + 2);
        end = close < 0 ? n : close + 2;
        type = Lexeme.Type.COMMENT;
      } else if (c == '"') {
        end = string(text, pos);
        type = Lexeme.Type.STRING;
      } else if (Character.isDigit(c)
          || (c == '.' && pos + 1 < n && Character.isDigit(text.charAt(pos + 1)))) {
        end = number(text, pos);
        type = Lexeme.Type.NUMBER;
      } else if (Character.isLetter(c) || c == '_') {
        end = pos + 1;
        while (end < n
            && (Character.isLetterOrDigit(text.charAt(end)) || text.charAt(end) == '_')) {
          end++;
        }
        type = Lexeme.Type.WORD;
      } else {
        String op = operatorAt(text, pos);
        end = pos + (op == null ? Character.charCount(text.codePointAt(pos)) : op.length());
        type = op == null ? Lexeme.Type.PUNCT : Lexeme.Type.OPERATOR;
      }
      out.add(new Lexeme(type, text.substring(pos, end), pos));
      pos = end;
    }
    return out;
  }

  private static String operatorAt(String text, int pos) {
    for (String op : OPERATORS) {
      if (text.startsWith(op, pos)) {
        return op;
      }
    }
    return null;
  }

  private static int lineEnd(String text, int pos) {
    int end = pos;
    while (end < text.length() && text.charAt(end) != '\n' && text.charAt(end) != '\r') {
      end++;
    }
    return end;
  }

  /** A string runs to its closing quote, or to the end of its line when unterminated. */
  private static int string(String text, int pos) {
    int end = pos + 1;
    while (end < text.length()) {
      char c = text.charAt(end);
      if (c == '"') {
        return end + 1;
      }
      if (c == '\n' || c == '\r') {
        return end;
      }
      end += c == '\\' && end + 1 < text.length() && text.charAt(end + 1) != '\n' ? 2 : 1;
    }
    return text.length();
  }

  /**
   * Digits, an optional fraction (only when a digit follows the point, so '1..2' is a range) and
   * exponent.
   */
  private static int number(String text, int pos) {
    int end = digits(text, pos);
    if (end + 1 < text.length()
        && text.charAt(end) == '.'
        && Character.isDigit(text.charAt(end + 1))) {
      end = digits(text, end + 1);
    }
    if (end < text.length() && (text.charAt(end) == 'e' || text.charAt(end) == 'E')) {
      int exp = end + 1;
      if (exp < text.length() && (text.charAt(exp) == '+' || text.charAt(exp) == '-')) {
        exp++;
      }
      if (exp < text.length() && Character.isDigit(text.charAt(exp))) {
        end = digits(text, exp);
      }
    }
    return end;
  }

  private static int digits(String text, int pos) {
    int end = pos;
    while (end < text.length() && Character.isDigit(text.charAt(end))) {
      end++;
    }
    return end;
  }
}
